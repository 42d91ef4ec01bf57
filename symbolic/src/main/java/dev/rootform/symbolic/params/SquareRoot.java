package dev.rootform.symbolic.params;

import dev.rootform.symbolic.algebra.ParamFactor;
import dev.rootform.symbolic.algebra.ParamPolynomial;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.backend.JasMultivariate;
import java.util.List;
import java.util.Objects;

/**
 * A square root written as outside·√inside, with the square factors of a rational function taken
 * out of the root: √((c² − 4km)/(4m²)) = (1/(2m))·√(c² − 4km). The outside may stand for either
 * sign of the root; the forms it is used in (cosh, cos, sinh(ωt)/ω, sin(ωt)/ω) are even in it.
 *
 * @param outside the part taken out of the root
 * @param inside the square-free part left under it (1 when the whole is a square)
 * @since 0.3
 */
public record SquareRoot(ParamFunction outside, ParamFunction inside) {
    public SquareRoot {
        Objects.requireNonNull(outside, "outside");
        Objects.requireNonNull(inside, "inside");
    }

    /** True when nothing is left under the root. */
    public boolean rational() {
        return inside.isConstant() && inside.constantValue().isOne();
    }

    /** √f with the squares of f's numerator and denominator factors taken out. */
    static SquareRoot of(ParamFunction f) {
        ParamFunction out = ParamFunction.one(f.names());
        ParamFunction in = ParamFunction.one(f.names());
        for (int side = 0; side < 2; side++) {
            ParamPolynomial p = side == 0 ? f.numerator() : f.denominator();
            if (p.isConstant()) {
                Rational c = p.constantValue();
                SquareRoot r = rationalRoot(c, f.names());
                out = side == 0 ? out.multiply(r.outside) : out.divide(r.outside);
                in = side == 0 ? in.multiply(r.inside) : in.divide(r.inside);
                continue;
            }
            List<ParamFactor> factors = JasMultivariate.factor(p);
            SquareRoot unit = rationalRoot(factors.get(0).polynomial().constantValue(), f.names());
            ParamFunction o = unit.outside;
            ParamFunction i = unit.inside;
            for (ParamFactor factor : factors.subList(1, factors.size())) {
                Rational s = integralScale(factor.polynomial());
                ParamFunction base = ParamFunction.of(factor.polynomial().scale(s));
                SquareRoot fix = rationalRoot(s.pow(factor.multiplicity()).inverse(), f.names());
                o = o.multiply(fix.outside);
                i = i.multiply(fix.inside);
                o = o.multiply(base.pow(factor.multiplicity() / 2));
                i = i.multiply(base.pow(factor.multiplicity() % 2));
            }
            out = side == 0 ? out.multiply(o) : out.divide(o);
            in = side == 0 ? in.multiply(i) : in.multiply(i.pow(1)).multiply(ParamFunction.one(f.names()));
            if (side == 1 && !(i.isConstant() && i.constantValue().isOne())) {
                // 1/√q = √q/q: keep the root in the numerator
                out = out.divide(i);
            }
        }
        return new SquareRoot(out, in);
    }

    /** The positive s that makes s·p integral with coprime coefficients. */
    private static Rational integralScale(ParamPolynomial p) {
        java.math.BigInteger lcm = java.math.BigInteger.ONE;
        java.math.BigInteger gcd = java.math.BigInteger.ZERO;
        for (java.util.Map.Entry<int[], Rational> t : p.exponentVectors()) {
            java.math.BigInteger d = t.getValue().denominator();
            lcm = lcm.divide(lcm.gcd(d)).multiply(d);
            gcd = gcd.gcd(t.getValue().numerator());
        }
        return Rational.of(lcm, gcd);
    }

    /** √c for a rational c ≠ 0 as outside·√inside with an integer square-free-ish inside (squares up to 10^4 taken out). */
    private static SquareRoot rationalRoot(Rational c, List<String> names) {
        java.math.BigInteger top = c.numerator().multiply(c.denominator());
        java.math.BigInteger outside = java.math.BigInteger.ONE;
        for (long k = 2; k * k <= 10_000 && k * k <= top.abs().longValue() + 1; k++) {
            java.math.BigInteger sq = java.math.BigInteger.valueOf(k * k);
            while (top.signum() != 0 && top.mod(sq).signum() == 0) {
                top = top.divide(sq);
                outside = outside.multiply(java.math.BigInteger.valueOf(k));
            }
        }
        Rational o = Rational.of(outside, c.denominator());
        return new SquareRoot(ParamFunction.constant(names, o), ParamFunction.constant(names, Rational.of(top)));
    }
}
