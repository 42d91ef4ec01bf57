package dev.rootform.numeric.analysis;

import dev.rootform.numeric.roots.Enclosure;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.solve.Component;
import dev.rootform.symbolic.solve.ExactSolution;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import java.util.Map;
import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.Apfloat;

/**
 * Evaluates a fitted differential-equation solution y(t) = Σ_components Σ_α Σ_i c_i(α)·u^i·e^{αu},
 * u = t - t0, in apfloat complex arithmetic at a given working precision, from root values supplied
 * per factor. The result is approximate; {@link Analyzer} chooses the precision and confirms the
 * digits by repeating at a higher one.
 */
final class FunctionEvaluator {
    private final ExactSolution solution;
    private final Map<RationalPolynomial, List<Enclosure>> roots;

    FunctionEvaluator(ExactSolution solution, Map<RationalPolynomial, List<Enclosure>> roots) {
        this.solution = solution;
        this.roots = roots;
    }

    /** y(t) at {@code precision} significant digits of working precision, and the largest term magnitude. */
    Apfloat[] value(Rational t, long precision) {
        Apfloat u = toApfloat(t.subtract(solution.origin()), precision);
        Apcomplex sum = Apcomplex.ZERO;
        Apfloat largest = Apfloat.ZERO;
        for (Component c : solution.components()) {
            for (Apcomplex alpha : rootValues(c.factor().polynomial(), precision)) {
                Apcomplex e = ComplexExp.exp(alpha.multiply(u), precision);
                Apcomplex power = new Apfloat(1, precision);
                for (RationalPolynomial ci : c.coefficients()) {
                    Apcomplex term = evaluate(ci, alpha, precision).multiply(power).multiply(e);
                    Apfloat magnitude = ApcomplexMath.abs(term);
                    largest = magnitude.compareTo(largest) > 0 ? magnitude : largest;
                    sum = sum.add(term);
                    power = power.multiply(u);
                }
            }
        }
        return new Apfloat[] {sum.real(), largest};
    }

    private List<Apcomplex> rootValues(RationalPolynomial f, long precision) {
        if (f.degree() == 1) {
            return List.of(toApfloat(f.coefficient(0).negate(), precision));
        }
        return roots.get(f).stream()
                .map(r -> new Apcomplex(new Apfloat(r.re(), precision), new Apfloat(r.im(), precision)))
                .toList();
    }

    private static Apcomplex evaluate(RationalPolynomial c, Apcomplex alpha, long precision) {
        Apcomplex v = Apcomplex.ZERO;
        for (int j = c.degree(); j >= 0; j--) {
            v = v.multiply(alpha).add(toApfloat(c.coefficient(j), precision));
        }
        return v;
    }

    static Apfloat toApfloat(Rational r, long precision) {
        return new Apfloat(r.toBigDecimal(new MathContext((int) precision)), precision);
    }

    static BigDecimal toBigDecimal(Apfloat a, int digits) {
        return new BigDecimal(a.toString(true)).round(new MathContext(digits));
    }
}
