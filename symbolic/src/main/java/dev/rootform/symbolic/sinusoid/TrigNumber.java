package dev.rootform.symbolic.sinusoid;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalFunction;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.util.Objects;

/**
 * An exact number a(c) + b(c)·s in Q(c)[s]/(s² + c² − 1), where c = cos ω and s = sin ω for a
 * frequency ω that is a nonzero rational. Such a c is transcendental (if c were algebraic, so would
 * be e^{iω} = c + i·√(1 − c²), against the Lindemann–Weierstrass theorem for the nonzero algebraic
 * iω), so Q(c) is a field of rational functions and 1 − c² is not a square in it: this ring is a
 * field, and every nonzero element has the inverse (a − b·s)/(a² − b²·(1 − c²)).
 *
 * @param rational a, the part free of s
 * @param sine b, the coefficient of s
 * @since 0.1
 */
public record TrigNumber(RationalFunction rational, RationalFunction sine) {
    public static final TrigNumber ZERO = of(RationalFunction.ZERO);
    public static final TrigNumber ONE = of(RationalFunction.ONE);
    /** c = cos ω. */
    public static final TrigNumber COSINE = of(RationalFunction.X);
    /** s = sin ω. */
    public static final TrigNumber SINE = new TrigNumber(RationalFunction.ZERO, RationalFunction.ONE);

    private static final RationalFunction SINE_SQUARED = RationalFunction.ONE.subtract(RationalFunction.X.multiply(RationalFunction.X));

    public TrigNumber {
        Objects.requireNonNull(rational, "rational");
        Objects.requireNonNull(sine, "sine");
    }

    /** The element a(c) free of s. */
    public static TrigNumber of(RationalFunction a) {
        return new TrigNumber(a, RationalFunction.ZERO);
    }

    /** The rational constant q. */
    public static TrigNumber of(Rational q) {
        return of(RationalFunction.of(q));
    }

    /** cos(dω) = T_|d|(c) (Chebyshev polynomial of the first kind; handbook identity). */
    public static TrigNumber cosineOfMultiple(long d) {
        return of(RationalFunction.of(chebyshev(Math.abs(d), RationalPolynomial.X)));
    }

    /** sin(dω) = sign(d)·s·U_{|d|−1}(c) (Chebyshev polynomial of the second kind; handbook identity). */
    public static TrigNumber sineOfMultiple(long d) {
        if (d == 0) {
            return ZERO;
        }
        RationalPolynomial u = chebyshev(Math.abs(d) - 1, RationalPolynomial.ofIntegers(0, 2));
        return SINE.multiply(of(RationalFunction.of(u.multiply(Rational.of(Long.signum(d))))));
    }

    /** P_k with P_0 = 1, P_1 = {@code first}, P_{k+1} = 2c·P_k − P_{k−1} (T for first = c, U for 2c). */
    private static RationalPolynomial chebyshev(long k, RationalPolynomial first) {
        RationalPolynomial previous = RationalPolynomial.ONE;
        RationalPolynomial current = first;
        if (k == 0) {
            return previous;
        }
        RationalPolynomial twoC = RationalPolynomial.ofIntegers(0, 2);
        for (long i = 1; i < k; i++) {
            RationalPolynomial next = twoC.multiply(current).subtract(previous);
            previous = current;
            current = next;
        }
        return current;
    }

    /** True when this is a rational constant (no c, no s). */
    public boolean isRational() {
        return sine.isZero() && rational.denominator().degree() == 0 && rational.numerator().degree() <= 0;
    }

    /** The rational constant. @throws IllegalStateException unless {@link #isRational} */
    public Rational toRational() {
        if (!isRational()) {
            throw new IllegalStateException(this + " depends on cos ω or sin ω");
        }
        return rational.numerator().coefficient(0);
    }

    /** q·this: both parts scaled, without the field product. */
    public TrigNumber multiply(Rational q) {
        return new TrigNumber(rational.multiply(q), sine.multiply(q));
    }

    public boolean isZero() {
        return rational.isZero() && sine.isZero();
    }

    public TrigNumber add(TrigNumber o) {
        return new TrigNumber(rational.add(o.rational), sine.add(o.sine));
    }

    public TrigNumber subtract(TrigNumber o) {
        return add(o.negate());
    }

    public TrigNumber negate() {
        return new TrigNumber(rational.negate(), sine.negate());
    }

    /** (a + bs)(a' + b's) = aa' + bb'(1 − c²) + (ab' + ba')s. */
    public TrigNumber multiply(TrigNumber o) {
        return new TrigNumber(rational.multiply(o.rational).add(sine.multiply(o.sine).multiply(SINE_SQUARED)),
                rational.multiply(o.sine).add(sine.multiply(o.rational)));
    }

    /** this / o. @throws ArithmeticException if o is zero */
    public TrigNumber divide(TrigNumber o) {
        RationalFunction norm = o.rational.multiply(o.rational).subtract(o.sine.multiply(o.sine).multiply(SINE_SQUARED));
        TrigNumber conjugate = new TrigNumber(o.rational, o.sine.negate());
        TrigNumber top = multiply(conjugate);
        return new TrigNumber(top.rational.divide(norm), top.sine.divide(norm));
    }

    /**
     * The value at a point (c, s): exact for rational coordinates. The identities of this field
     * hold at the point when c² + s² = 1 and no denominator vanishes there.
     */
    public Rational evaluate(Rational c, Rational s) {
        return rational.evaluate(c).add(sine.evaluate(c).multiply(s));
    }

    /** The number written with {@code cosine} and {@code sine} for c and s, e.g. {@code 1/2 + (1/(2c))·s}. */
    public String toString(String cosine, String sineName) {
        if (sine.isZero()) {
            return rational.toString(cosine);
        }
        String b = "(" + sine.toString(cosine) + ")·" + sineName;
        return rational.isZero() ? b : rational.toString(cosine) + " + " + b;
    }

    @Override
    public String toString() {
        return toString("c", "s");
    }
}
