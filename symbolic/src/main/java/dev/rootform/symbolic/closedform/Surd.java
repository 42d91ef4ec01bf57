package dev.rootform.symbolic.closedform;

import dev.rootform.symbolic.algebra.Rational;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.util.Objects;

/**
 * An exact real number a + b·√r with a, b rational and r a squarefree integer &ge; 2, or a plain
 * rational (b = 0, r = 1). Canonical, so equal values are equal objects.
 *
 * @since 0.1
 */
public record Surd(Rational rational, Rational coefficient, BigInteger radicand) {
    /** Largest prime tried when pulling square factors out of a radicand; bigger square factors stay inside. */
    private static final int TRIAL_LIMIT = 100_000;

    public Surd {
        Objects.requireNonNull(rational, "rational");
        Objects.requireNonNull(coefficient, "coefficient");
        Objects.requireNonNull(radicand, "radicand");
        boolean plain = radicand.equals(BigInteger.ONE) && coefficient.isZero();
        boolean root = radicand.compareTo(BigInteger.TWO) >= 0 && !coefficient.isZero();
        if (!plain && !root) {
            throw new IllegalArgumentException("not canonical: " + rational + " + " + coefficient + "·√" + radicand);
        }
    }

    public static Surd of(Rational value) {
        return new Surd(value, Rational.ZERO, BigInteger.ONE);
    }

    /** a + b·√q for any rational q &ge; 0, brought to canonical form. @throws ArithmeticException if q &lt; 0 */
    public static Surd of(Rational a, Rational b, Rational q) {
        if (q.signum() < 0) {
            throw new ArithmeticException("square root of negative " + q);
        }
        // √(p/s) = √(p·s)/s; then pull square factors out of p·s
        BigInteger[] split = squareSplit(q.numerator().multiply(q.denominator()));
        Rational outside = Rational.of(split[0], q.denominator());
        Rational b2 = b.multiply(outside);
        if (b2.isZero()) {
            return of(a);
        }
        if (split[1].equals(BigInteger.ONE)) {
            return of(a.add(b2));
        }
        return new Surd(a, b2, split[1]);
    }

    /** √q for rational q &ge; 0. */
    public static Surd sqrt(Rational q) {
        return of(Rational.ZERO, Rational.ONE, q);
    }

    public boolean isRational() {
        return coefficient.isZero();
    }

    public boolean isZero() {
        return isRational() && rational.isZero();
    }

    public Surd multiply(Rational f) {
        return isRational() ? of(rational.multiply(f)) : of(rational.multiply(f), coefficient.multiply(f), Rational.of(radicand));
    }

    /**
     * The exact sum. @throws ArithmeticException if both have a √ part with different radicands
     * (the sum is then not of the form a + b·√r)
     */
    public Surd add(Surd other) {
        BigInteger r = commonRadicand(other);
        return of(rational.add(other.rational), coefficient.add(other.coefficient), Rational.of(r));
    }

    /**
     * The exact product (a + b√r)(c + d√r) = (ac + bd·r) + (ad + bc)√r. @throws ArithmeticException if
     * both have a √ part with different radicands
     */
    public Surd multiply(Surd other) {
        BigInteger r = commonRadicand(other);
        Rational radicandValue = Rational.of(r);
        return of(rational.multiply(other.rational).add(coefficient.multiply(other.coefficient).multiply(radicandValue)),
                rational.multiply(other.coefficient).add(coefficient.multiply(other.rational)), radicandValue);
    }

    /** The exact inverse 1/(a + b√r) = (a - b√r)/(a² - b²r). @throws ArithmeticException if this is zero */
    public Surd inverse() {
        if (isZero()) {
            throw new ArithmeticException("zero has no inverse");
        }
        Rational r = Rational.of(radicand);
        Rational norm = rational.multiply(rational).subtract(coefficient.multiply(coefficient).multiply(r));
        return of(rational.divide(norm), coefficient.negate().divide(norm), r);
    }

    /** Whether {@link #add} and {@link #multiply} accept the pair (at most one radicand other than 1). */
    public boolean sameField(Surd other) {
        return isRational() || other.isRational() || radicand.equals(other.radicand);
    }

    private BigInteger commonRadicand(Surd other) {
        if (!sameField(other)) {
            throw new ArithmeticException("√" + radicand + " and √" + other.radicand + " in one number");
        }
        return isRational() ? other.radicand : radicand;
    }

    public Surd negate() {
        return multiply(Rational.MINUS_ONE);
    }

    /** The sign of the real value: -1, 0 or 1, decided exactly. */
    public int signum() {
        if (isRational()) {
            return rational.signum();
        }
        int sa = rational.signum();
        int sb = coefficient.signum();
        if (sa == 0 || sa == sb) {
            return sb;
        }
        // opposite signs: compare a² with b²·r
        int cmp = rational.multiply(rational).compareTo(coefficient.multiply(coefficient).multiply(Rational.of(radicand)));
        return cmp > 0 ? sa : -sa;
    }

    /** The value rounded to {@code context}. */
    public BigDecimal toBigDecimal(MathContext context) {
        MathContext wide = new MathContext(context.getPrecision() + 10);
        BigDecimal v = rational.toBigDecimal(wide);
        if (!isRational()) {
            v = v.add(coefficient.toBigDecimal(wide).multiply(new BigDecimal(radicand).sqrt(wide), wide));
        }
        return v.round(context);
    }

    public double doubleValue() {
        return toBigDecimal(MathContext.DECIMAL64).doubleValue();
    }

    /**
     * {s, r} with n = s²·r and r free of the squares of primes below the trial limit: each such prime
     * is divided out (squared into s, once into r); what is left has only larger prime factors and
     * goes into s when it is a square, else into r.
     */
    private static BigInteger[] squareSplit(BigInteger n) {
        BigInteger outside = BigInteger.ONE;
        BigInteger kept = BigInteger.ONE;
        BigInteger rest = n;
        BigInteger whole = rest.sqrt();
        if (whole.multiply(whole).equals(rest)) {
            return new BigInteger[] {whole, BigInteger.ONE};
        }
        for (int p = 2; p < TRIAL_LIMIT && BigInteger.valueOf((long) p * p).compareTo(rest) <= 0; p++) {
            BigInteger prime = BigInteger.valueOf(p);
            BigInteger sq = BigInteger.valueOf((long) p * p);
            while (rest.mod(sq).signum() == 0) {
                rest = rest.divide(sq);
                outside = outside.multiply(prime);
            }
            if (rest.mod(prime).signum() == 0) {
                rest = rest.divide(prime);
                kept = kept.multiply(prime);
            }
        }
        BigInteger root = rest.sqrt();
        if (root.multiply(root).equals(rest)) {
            return new BigInteger[] {outside.multiply(root), kept};
        }
        return new BigInteger[] {outside, kept.multiply(rest)};
    }

    /** e.g. {@code 3}, {@code √5}, {@code 1/2 + 3/2·√5}. */
    @Override
    public String toString() {
        if (isRational()) {
            return rational.toString();
        }
        String root = (coefficient.abs().isOne() ? "" : coefficient.abs() + "·") + "√" + radicand;
        if (rational.isZero()) {
            return (coefficient.signum() < 0 ? "-" : "") + root;
        }
        return rational + (coefficient.signum() < 0 ? " - " : " + ") + root;
    }
}
