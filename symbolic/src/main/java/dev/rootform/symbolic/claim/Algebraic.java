package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.algebra.Cyclotomic;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.Surd;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.util.Arrays;
import java.util.Optional;

/**
 * An exact number of an {@link ExactRing}, by its unique coordinates; immutable, and equal numbers
 * are equal objects.
 */
final class Algebraic {
    private final ExactRing ring;
    /** [power of λ][mask of adjoined square roots] → polynomial in ζ reduced modulo Φ_m. */
    private final RationalPolynomial[][] parts;

    Algebraic(ExactRing ring, RationalPolynomial[][] parts) {
        this.ring = ring;
        this.parts = parts;
    }

    ExactRing ring() {
        return ring;
    }

    /** The coordinates (not copied: callers must not change them). */
    RationalPolynomial[][] parts() {
        return parts;
    }

    boolean isZero() {
        for (RationalPolynomial[] row : parts) {
            for (RationalPolynomial p : row) {
                if (!p.isZero()) {
                    return false;
                }
            }
        }
        return true;
    }

    Algebraic add(Algebraic other) {
        RationalPolynomial[][] r = ring.empty();
        for (int j = 0; j < parts.length; j++) {
            for (int x = 0; x < parts[j].length; x++) {
                r[j][x] = parts[j][x].add(other.parts[j][x]);
            }
        }
        return new Algebraic(ring, r);
    }

    Algebraic negate() {
        RationalPolynomial[][] r = ring.empty();
        for (int j = 0; j < parts.length; j++) {
            for (int x = 0; x < parts[j].length; x++) {
                r[j][x] = parts[j][x].negate();
            }
        }
        return new Algebraic(ring, r);
    }

    Algebraic subtract(Algebraic other) {
        return add(other.negate());
    }

    Algebraic multiply(Rational q) {
        RationalPolynomial[][] r = ring.empty();
        for (int j = 0; j < parts.length; j++) {
            for (int x = 0; x < parts[j].length; x++) {
                r[j][x] = parts[j][x].multiply(q);
            }
        }
        return new Algebraic(ring, r);
    }

    /** The product, reduced modulo f in λ. */
    Algebraic multiply(Algebraic other) {
        int d = parts.length;
        if (d == 1) {
            return new Algebraic(ring, new RationalPolynomial[][] {ring.multiplyField(parts[0], other.parts[0])});
        }
        RationalPolynomial[][] full = new RationalPolynomial[2 * d - 1][];
        for (int i = 0; i < full.length; i++) {
            full[i] = zeroRow();
        }
        for (int i = 0; i < d; i++) {
            if (isZeroRow(parts[i])) {
                continue;
            }
            for (int j = 0; j < d; j++) {
                if (!isZeroRow(other.parts[j])) {
                    full[i + j] = addRows(full[i + j], ring.multiplyField(parts[i], other.parts[j]));
                }
            }
        }
        RationalPolynomial f = ring.root();
        for (int k = full.length - 1; k >= d; k--) {
            RationalPolynomial[] lead = full[k];
            if (isZeroRow(lead)) {
                continue;
            }
            for (int t = 0; t < d; t++) {
                Rational c = f.coefficient(t);
                if (!c.isZero()) {
                    full[k - d + t] = addRows(full[k - d + t], scaleRow(lead, c.negate()));
                }
            }
        }
        return new Algebraic(ring, Arrays.copyOf(full, d));
    }

    Algebraic pow(long exponent) {
        Algebraic base = exponent < 0 ? inverse() : this;
        long k = Math.abs(exponent);
        Algebraic result = ring.one();
        while (k > 0) {
            if ((k & 1) == 1) {
                result = result.multiply(base);
            }
            k >>= 1;
            if (k > 0) {
                base = base.multiply(base);
            }
        }
        return result;
    }

    /** True when the λ-coordinates above 0 are zero (a number of the field F). */
    boolean inField() {
        for (int j = 1; j < parts.length; j++) {
            if (!isZeroRow(parts[j])) {
                return false;
            }
        }
        return true;
    }

    /**
     * The inverse. Field elements invert in F; in F[λ]/(f) only the field elements and the powers of
     * λ (f(0) ≠ 0) are inverted.
     *
     * @throws ArithmeticException for zero
     * @throws NotExact for other elements of F[λ]/(f)
     */
    Algebraic inverse() {
        if (isZero()) {
            throw new ArithmeticException("division by zero");
        }
        if (inField()) {
            RationalPolynomial[][] r = ring.empty();
            r[0] = ring.inverseField(parts[0]);
            return new Algebraic(ring, r);
        }
        if (equals(ring.lambda())) {
            // λ⁻¹ = -(f(λ) - f(0))/(λ·f(0))
            RationalPolynomial f = ring.root();
            Rational f0 = f.coefficient(0);
            RationalPolynomial q = f.subtract(RationalPolynomial.constant(f0)).divide(RationalPolynomial.X)
                    .multiply(f0.inverse().negate());
            Algebraic sum = ring.zero();
            for (int j = q.degree(); j >= 0; j--) {
                sum = sum.multiply(ring.lambda()).add(ring.rational(q.coefficient(j)));
            }
            return sum;
        }
        throw new NotExact("division by an expression in λ");
    }

    Algebraic divide(Algebraic other) {
        return multiply(other.inverse());
    }

    /** The complex conjugate (field elements only). */
    Algebraic conjugate() {
        requireField();
        RationalPolynomial[][] r = ring.empty();
        r[0] = ring.conjugateField(parts[0]);
        return new Algebraic(ring, r);
    }

    /** (z + z̄)/2. */
    Algebraic realPart() {
        return add(conjugate()).multiply(Rational.of(1, 2));
    }

    /** (z - z̄)/(2i). */
    Algebraic imaginaryPart() {
        if (ring.order() == 1) {
            return ring.zero();
        }
        return subtract(conjugate()).multiply(ring.imaginaryUnit().negate()).multiply(Rational.of(1, 2));
    }

    boolean isReal() {
        return ring.order() == 1 || equals(conjugate());
    }

    /** Σ over the roots α of f of this element at α: a number of the field. */
    Algebraic trace() {
        RationalPolynomial[] sum = new RationalPolynomial[ring.masks()];
        Arrays.fill(sum, RationalPolynomial.ZERO);
        for (int j = 0; j < parts.length; j++) {
            sum = addRows(sum, scaleRow(parts[j], ring.powerSum(j)));
        }
        ExactRing field = ring.field();
        RationalPolynomial[][] r = field.empty();
        r[0] = sum;
        return new Algebraic(field, r);
    }

    /** The coefficient of λ^j, a number of the field. */
    Algebraic coordinate(int j) {
        ExactRing field = ring.field();
        RationalPolynomial[][] r = field.empty();
        r[0] = parts[j].clone();
        return new Algebraic(field, r);
    }

    /** The value at a root α of f given as a field element: Σ_j coordinate(j)·α^j. */
    Algebraic at(Algebraic alpha) {
        Algebraic v = alpha.ring().zero();
        for (int j = parts.length - 1; j >= 0; j--) {
            v = v.multiply(alpha).add(coordinate(j));
        }
        return v;
    }

    /** The rational value, if this is one. */
    Optional<Rational> toRational() {
        if (!inField() || parts[0][0].degree() > 0) {
            return Optional.empty();
        }
        for (int x = 1; x < parts[0].length; x++) {
            if (!parts[0][x].isZero()) {
                return Optional.empty();
            }
        }
        return Optional.of(parts[0][0].coefficient(0));
    }

    /** The value as a + b·√r when it is real and of that form. */
    Optional<Surd> toSurd() {
        if (!inField() || !isReal()) {
            return Optional.empty();
        }
        Optional<Rational> q = toRational();
        if (q.isPresent()) {
            return Optional.of(Surd.of(q.get()));
        }
        Rational a = realRationalPart();
        Algebraic rest = subtract(ring.rational(a));
        for (BigInteger r : FieldNeeds.radicandsOf(ring)) {
            Optional<Rational> b = rest.multiply(ring.sqrt(Rational.of(r))).toRational().map(v -> v.divide(Rational.of(r)));
            if (b.isPresent()) {
                return Optional.of(Surd.of(a, b.get(), Rational.of(r)));
            }
        }
        return Optional.empty();
    }

    /**
     * Tr_{F/Q}(z)/[F : Q]: the rational part a of z = a + b·√r, since √r (r not a square) has
     * trace 0. Only the 1-coordinate of the adjoined roots contributes; its trace is Σ c_j·Tr(ζ^j).
     */
    private Rational realRationalPart() {
        RationalPolynomial p = parts[0][0];
        Rational sum = Rational.ZERO;
        int m = ring.order();
        int phi = ring.cyclotomicDegree();
        for (int j = 0; j <= p.degree(); j++) {
            sum = sum.add(p.coefficient(j).multiply(cyclotomicTrace(j, m)));
        }
        return sum.divide(Rational.of(phi));
    }

    /** Tr_{Q(ζ_m)/Q}(ζ^j) = μ(m/g)·φ(m)/φ(m/g), g = gcd(j, m) (Ramanujan's sum; common practice). */
    private static Rational cyclotomicTrace(int j, int m) {
        if (m == 1) {
            return Rational.ONE;
        }
        int g = BigInteger.valueOf(j).gcd(BigInteger.valueOf(m)).intValueExact();
        int n = m / g;
        return Rational.of((long) FieldNeeds.moebius(n) * Cyclotomic.totient(m) / Cyclotomic.totient(n));
    }

    /** The value (real part, imaginary part) to the given precision; field elements only. */
    BigDecimal[] approximate(MathContext mc) {
        requireField();
        MathContext wide = new MathContext(mc.getPrecision() + 10);
        BigDecimal re = BigDecimal.ZERO;
        BigDecimal im = BigDecimal.ZERO;
        int m = ring.order();
        for (int x = 0; x < parts[0].length; x++) {
            RationalPolynomial p = parts[0][x];
            if (p.isZero()) {
                continue;
            }
            BigDecimal root = new BigDecimal(ring.primeProduct(x)).sqrt(wide);
            for (int j = 0; j <= p.degree(); j++) {
                Rational c = p.coefficient(j);
                if (c.isZero()) {
                    continue;
                }
                BigDecimal size = c.toBigDecimal(wide).multiply(root, wide);
                BigDecimal[] cs = m == 1 ? new BigDecimal[] {BigDecimal.ONE, BigDecimal.ZERO} : Trig.cosSinTwoPi(j, m, wide);
                re = re.add(size.multiply(cs[0], wide), wide);
                im = im.add(size.multiply(cs[1], wide), wide);
            }
        }
        return new BigDecimal[] {re.round(mc), im.round(mc)};
    }

    private void requireField() {
        if (!inField()) {
            throw new IllegalStateException("not a field element: " + this);
        }
    }

    private RationalPolynomial[] zeroRow() {
        RationalPolynomial[] row = new RationalPolynomial[ring.masks()];
        Arrays.fill(row, RationalPolynomial.ZERO);
        return row;
    }

    private static boolean isZeroRow(RationalPolynomial[] row) {
        for (RationalPolynomial p : row) {
            if (!p.isZero()) {
                return false;
            }
        }
        return true;
    }

    private static RationalPolynomial[] addRows(RationalPolynomial[] a, RationalPolynomial[] b) {
        RationalPolynomial[] r = new RationalPolynomial[a.length];
        for (int x = 0; x < a.length; x++) {
            r[x] = a[x].add(b[x]);
        }
        return r;
    }

    private static RationalPolynomial[] scaleRow(RationalPolynomial[] a, Rational c) {
        RationalPolynomial[] r = new RationalPolynomial[a.length];
        for (int x = 0; x < a.length; x++) {
            r[x] = a[x].multiply(c);
        }
        return r;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Algebraic a && ring.equals(a.ring) && Arrays.deepEquals(parts, a.parts);
    }

    @Override
    public int hashCode() {
        return Arrays.deepHashCode(parts);
    }

    @Override
    public String toString() {
        return Arrays.deepToString(parts) + " in " + ring;
    }
}
