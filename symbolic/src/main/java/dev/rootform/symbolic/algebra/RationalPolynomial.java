package dev.rootform.symbolic.algebra;

import dev.rootform.symbolic.work.Deadline;
import java.util.Arrays;
import java.util.List;

/**
 * A polynomial with exact rational coefficients, stored in ascending order (index = power) with
 * no trailing zero coefficients; the zero polynomial has no coefficients and degree -1.
 * Immutable and canonical. The quadratic loops (product, division, powers, gcd, inverse) check
 * the current {@link Deadline} once per row, so exact work of any size can be cancelled.
 *
 * @since 0.1
 */
public final class RationalPolynomial {
    public static final RationalPolynomial ZERO = new RationalPolynomial(new Rational[0]);
    public static final RationalPolynomial ONE = constant(Rational.ONE);
    /** The polynomial x. */
    public static final RationalPolynomial X = of(Rational.ZERO, Rational.ONE);

    private final Rational[] coefficients;

    private RationalPolynomial(Rational[] coefficients) {
        int n = coefficients.length;
        while (n > 0 && coefficients[n - 1].isZero()) {
            n--;
        }
        this.coefficients = n == coefficients.length ? coefficients : Arrays.copyOf(coefficients, n);
    }

    /** The polynomial Σ coefficients[i]·x^i. */
    public static RationalPolynomial of(Rational... coefficients) {
        for (Rational c : coefficients) {
            java.util.Objects.requireNonNull(c, "coefficient");
        }
        return new RationalPolynomial(coefficients.clone());
    }

    /** The polynomial Σ coefficients.get(i)·x^i. */
    public static RationalPolynomial of(List<Rational> coefficients) {
        return of(coefficients.toArray(new Rational[0]));
    }

    /** The polynomial Σ coefficients[i]·x^i with integer coefficients. */
    public static RationalPolynomial ofIntegers(long... coefficients) {
        Rational[] c = new Rational[coefficients.length];
        for (int i = 0; i < c.length; i++) {
            c[i] = Rational.of(coefficients[i]);
        }
        return new RationalPolynomial(c);
    }

    public static RationalPolynomial constant(Rational value) {
        return new RationalPolynomial(new Rational[] {value});
    }

    /** c·x^power. */
    public static RationalPolynomial monomial(Rational c, int power) {
        Rational[] a = new Rational[power + 1];
        Arrays.fill(a, Rational.ZERO);
        a[power] = c;
        return new RationalPolynomial(a);
    }

    /** Degree; -1 for the zero polynomial. */
    public int degree() {
        return coefficients.length - 1;
    }

    public boolean isZero() {
        return coefficients.length == 0;
    }

    /** Coefficient of x^power; zero beyond the degree. */
    public Rational coefficient(int power) {
        return power >= 0 && power < coefficients.length ? coefficients[power] : Rational.ZERO;
    }

    /** The coefficients in ascending order. */
    public List<Rational> coefficients() {
        return List.of(coefficients);
    }

    /** Leading coefficient. @throws ArithmeticException for the zero polynomial */
    public Rational leadingCoefficient() {
        if (isZero()) {
            throw new ArithmeticException("the zero polynomial has no leading coefficient");
        }
        return coefficients[coefficients.length - 1];
    }

    public RationalPolynomial add(RationalPolynomial other) {
        Rational[] r = new Rational[Math.max(coefficients.length, other.coefficients.length)];
        for (int i = 0; i < r.length; i++) {
            r[i] = coefficient(i).add(other.coefficient(i));
        }
        return new RationalPolynomial(r);
    }

    public RationalPolynomial subtract(RationalPolynomial other) {
        return add(other.negate());
    }

    public RationalPolynomial negate() {
        return multiply(Rational.MINUS_ONE);
    }

    public RationalPolynomial multiply(Rational factor) {
        if (factor.isZero()) {
            return ZERO;
        }
        Rational[] r = new Rational[coefficients.length];
        for (int i = 0; i < r.length; i++) {
            r[i] = coefficients[i].multiply(factor);
        }
        return new RationalPolynomial(r);
    }

    public RationalPolynomial multiply(RationalPolynomial other) {
        if (isZero() || other.isZero()) {
            return ZERO;
        }
        Rational[] r = new Rational[coefficients.length + other.coefficients.length - 1];
        Arrays.fill(r, Rational.ZERO);
        for (int i = 0; i < coefficients.length; i++) {
            if (coefficients[i].isZero()) {
                continue;
            }
            Deadline.checkCurrent();
            for (int j = 0; j < other.coefficients.length; j++) {
                r[i + j] = r[i + j].add(coefficients[i].multiply(other.coefficients[j]));
            }
        }
        return new RationalPolynomial(r);
    }

    /** this^exponent, exponent &ge; 0. */
    public RationalPolynomial pow(int exponent) {
        RationalPolynomial result = ONE;
        for (int i = 0; i < exponent; i++) {
            Deadline.checkCurrent();
            result = result.multiply(this);
        }
        return result;
    }

    /**
     * Quotient and remainder of Euclidean division: this = q·divisor + r with deg r &lt; deg divisor.
     *
     * @throws ArithmeticException if {@code divisor} is zero
     */
    public RationalPolynomial[] divideAndRemainder(RationalPolynomial divisor) {
        if (divisor.isZero()) {
            throw new ArithmeticException("division by the zero polynomial");
        }
        Rational[] rem = coefficients.clone();
        int dd = divisor.degree();
        Rational lead = divisor.leadingCoefficient();
        int qLength = Math.max(0, coefficients.length - dd);
        Rational[] q = new Rational[qLength];
        Arrays.fill(q, Rational.ZERO);
        for (int i = coefficients.length - 1; i >= dd; i--) {
            Rational c = lead.isOne() ? rem[i] : rem[i].divide(lead);
            q[i - dd] = c;
            if (c.isZero()) {
                continue;
            }
            Deadline.checkCurrent();
            for (int j = 0; j <= dd; j++) {
                rem[i - dd + j] = rem[i - dd + j].subtract(c.multiply(divisor.coefficients[j]));
            }
        }
        Rational[] r = Arrays.copyOf(rem, Math.min(rem.length, Math.max(dd, 0)));
        return new RationalPolynomial[] {new RationalPolynomial(q), new RationalPolynomial(r)};
    }

    public RationalPolynomial divide(RationalPolynomial divisor) {
        return divideAndRemainder(divisor)[0];
    }

    public RationalPolynomial mod(RationalPolynomial divisor) {
        return divideAndRemainder(divisor)[1];
    }

    /** The same polynomial divided by its leading coefficient. */
    public RationalPolynomial monic() {
        return multiply(leadingCoefficient().inverse());
    }

    /** Monic greatest common divisor (zero if both are zero). */
    public RationalPolynomial gcd(RationalPolynomial other) {
        RationalPolynomial a = this;
        RationalPolynomial b = other;
        while (!b.isZero()) {
            Deadline.checkCurrent();
            RationalPolynomial r = a.mod(b);
            a = b;
            b = r;
        }
        return a.isZero() ? a : a.monic();
    }

    /**
     * The inverse of this polynomial modulo {@code modulus}: u with u·this ≡ 1 (mod modulus) and
     * deg u &lt; deg modulus.
     *
     * @throws ArithmeticException if this and {@code modulus} are not coprime
     */
    public RationalPolynomial inverseModulo(RationalPolynomial modulus) {
        RationalPolynomial r0 = modulus;
        RationalPolynomial r1 = mod(modulus);
        RationalPolynomial s0 = ZERO;
        RationalPolynomial s1 = ONE;
        while (!r1.isZero()) {
            Deadline.checkCurrent();
            RationalPolynomial[] qr = r0.divideAndRemainder(r1);
            r0 = r1;
            r1 = qr[1];
            RationalPolynomial s = s0.subtract(qr[0].multiply(s1));
            s0 = s1;
            s1 = s;
        }
        if (r0.degree() != 0) {
            throw new ArithmeticException("not invertible modulo " + modulus);
        }
        return s0.multiply(r0.leadingCoefficient().inverse()).mod(modulus);
    }

    public RationalPolynomial derivative() {
        if (coefficients.length <= 1) {
            return ZERO;
        }
        Rational[] r = new Rational[coefficients.length - 1];
        for (int i = 1; i < coefficients.length; i++) {
            r[i - 1] = coefficients[i].multiply(i);
        }
        return new RationalPolynomial(r);
    }

    /** The value at {@code x} (Horner). */
    public Rational evaluate(Rational x) {
        Rational v = Rational.ZERO;
        for (int i = coefficients.length - 1; i >= 0; i--) {
            v = v.multiply(x).add(coefficients[i]);
        }
        return v;
    }

    /** The polynomial p(x + shift). */
    public RationalPolynomial shift(Rational shift) {
        RationalPolynomial result = ZERO;
        RationalPolynomial base = of(shift, Rational.ONE);
        for (int i = coefficients.length - 1; i >= 0; i--) {
            result = result.multiply(base).add(constant(coefficients[i]));
        }
        return result;
    }

    /** x^deg·p(1/x): the coefficients in reverse order. */
    public RationalPolynomial reversed() {
        Rational[] r = new Rational[coefficients.length];
        for (int i = 0; i < r.length; i++) {
            r[i] = coefficients[coefficients.length - 1 - i];
        }
        return new RationalPolynomial(r);
    }

    /** Multiplicity of x = 0 as a root (0 if p(0) != 0). @throws ArithmeticException for zero */
    public int zeroRootMultiplicity() {
        if (isZero()) {
            throw new ArithmeticException("the zero polynomial");
        }
        int m = 0;
        while (coefficients[m].isZero()) {
            m++;
        }
        return m;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof RationalPolynomial p && Arrays.equals(coefficients, p.coefficients);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(coefficients);
    }

    /** Descending-order text in variable {@code variable}, e.g. {@code x^2 - x - 1}. */
    public String toString(String variable) {
        if (isZero()) {
            return "0";
        }
        StringBuilder sb = new StringBuilder();
        for (int i = coefficients.length - 1; i >= 0; i--) {
            Rational c = coefficients[i];
            if (c.isZero()) {
                continue;
            }
            boolean negative = c.signum() < 0;
            Rational a = c.abs();
            String mono = i == 0 ? "" : i == 1 ? variable : variable + "^" + i;
            String coef = a.isOne() && i > 0 ? "" : a.toString() + (i > 0 ? (a.isInteger() ? "" : " ") : "");
            String term = coef + mono;
            if (sb.length() == 0) {
                sb.append(negative ? "-" : "").append(term);
            } else {
                sb.append(negative ? " - " : " + ").append(term);
            }
        }
        return sb.toString();
    }

    @Override
    public String toString() {
        return toString("x");
    }
}
