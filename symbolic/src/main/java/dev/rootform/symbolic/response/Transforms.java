package dev.rootform.symbolic.response;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.ForcingTerm.Oscillation;
import dev.rootform.symbolic.algebra.RationalFunction;
import java.util.List;
import java.util.Optional;

/**
 * The one-sided Laplace transform (in s) of c·t^p·e^(at)·{1, cos ωt, sin ωt} and the z-transform
 * (in z) of c·n^p·b^n·{1, cos θn, sin θn}, exactly, when they are rational over Q. Textbook pairs
 * (from memory): e^(at) ↔ 1/(s − a), e^(at)cos ωt ↔ (s − a)/((s − a)² + ω²), e^(at)sin ωt ↔
 * ω/((s − a)² + ω²), t·f(t) ↔ −F'(s); b^n ↔ z/(z − b), b^n cos θn ↔ (z² − b cos θ z)/(z² − 2b cos θ z + b²),
 * b^n sin θn ↔ b sin θ z/(z² − 2b cos θ z + b²), n·x[n] ↔ −z X'(z).
 */
final class Transforms {
    private Transforms() {
    }

    /** The transform of a sum of terms, or empty when one term's transform is not rational over Q. */
    static Optional<RationalFunction> of(List<ForcingTerm> terms, Domain domain) {
        RationalFunction sum = RationalFunction.ZERO;
        for (ForcingTerm t : terms) {
            Optional<RationalFunction> f = of(t, domain);
            if (f.isEmpty()) {
                return Optional.empty();
            }
            sum = sum.add(f.get());
        }
        return Optional.of(sum);
    }

    /** The transform of one term, or empty when it is not rational over Q (ω a multiple of π in t; cos θ irrational in n). */
    static Optional<RationalFunction> of(ForcingTerm t, Domain domain) {
        Optional<RationalFunction> base = domain == Domain.DIFFERENTIAL ? laplace(t) : zTransform(t);
        if (base.isEmpty()) {
            return base;
        }
        RationalFunction f = base.get();
        for (int i = 0; i < t.power(); i++) {
            RationalFunction d = f.derivative().negate();
            f = domain == Domain.DIFFERENTIAL ? d : d.multiply(RationalFunction.X);
        }
        return Optional.of(f.multiply(t.coefficient()));
    }

    private static Optional<RationalFunction> laplace(ForcingTerm t) {
        Rational a = t.exponential();
        RationalPolynomial shifted = RationalPolynomial.of(a.negate(), Rational.ONE);
        if (t.oscillation() == Oscillation.NONE) {
            return Optional.of(new RationalFunction(RationalPolynomial.ONE, shifted));
        }
        if (t.frequencyTimesPi()) {
            return Optional.empty();
        }
        Rational w = t.frequency();
        RationalPolynomial den = shifted.multiply(shifted).add(RationalPolynomial.constant(w.multiply(w)));
        RationalPolynomial num = t.oscillation() == Oscillation.COS ? shifted : RationalPolynomial.constant(w);
        return Optional.of(new RationalFunction(num, den));
    }

    private static Optional<RationalFunction> zTransform(ForcingTerm t) {
        Rational b = t.exponential();
        if (t.oscillation() == Oscillation.NONE) {
            return Optional.of(new RationalFunction(RationalPolynomial.X, RationalPolynomial.of(b.negate(), Rational.ONE)));
        }
        if (!t.frequencyTimesPi()) {
            return Optional.empty();
        }
        Optional<Rational> cos = RationalTrig.cos(t.frequency());
        Optional<Rational> sin = RationalTrig.sin(t.frequency());
        if (cos.isEmpty() || (t.oscillation() == Oscillation.SIN && sin.isEmpty())) {
            return Optional.empty();
        }
        Rational bc = b.multiply(cos.get());
        RationalPolynomial den = RationalPolynomial.of(b.multiply(b), bc.multiply(-2), Rational.ONE);
        RationalPolynomial num = t.oscillation() == Oscillation.COS ? RationalPolynomial.of(Rational.ZERO, bc.negate(), Rational.ONE)
                : RationalPolynomial.of(Rational.ZERO, b.multiply(sin.get()));
        return Optional.of(new RationalFunction(num, den));
    }
}
