package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.algebra.Cyclotomic;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * The exact numbers of a claim: the field F = Q(ζ_m)(√p₁, …, √p_k) — a cyclotomic field with
 * square roots of primes adjoined — and, for the summand of a root sum Σ_{f(λ)=0}, the ring
 * F[λ]/(f) of polynomials in a root λ of f. Every real or complex number a claim writes exactly lies
 * in such a field: rationals, i = ζ_4, cos(qπ) = (ζ + ζ⁻¹)/2 with ζ = e^{iqπ}, and √q for rational q.
 *
 * <p>m is 1 (F has no roots of unity) or a multiple of 4, so i ∈ Q(ζ_m); then √p ∈ Q(ζ_m) for odd
 * p | m, through the Gauss sum g = Σ_{a=1}^{p-1} (a/p) ζ_p^a with g² = (−1)^{(p−1)/2}·p, and √2 =
 * ζ_8 + ζ_8⁻¹ when 8 | m (C. F. Gauss's quadratic Gauss sum; e.g. K. Ireland and M. Rosen, A
 * Classical Introduction to Modern Number Theory, ch. 6 — chapter from memory). The adjoined primes
 * are the others, so the √p are independent over Q(ζ_m) and F is a field of degree
 * φ(m)·2^k (Kummer theory; common practice). An element is stored by its unique coordinates: for
 * each power λ^j (j &lt; deg f) and each product √(p_{i1}·…) of adjoined primes, a rational polynomial
 * in ζ reduced modulo Φ_m. Equal numbers therefore have equal coordinates, and zero is decided
 * exactly. With f squarefree, an element of F[λ]/(f) is zero exactly when it vanishes at every root.
 */
final class ExactRing {
    /** Largest dimension φ(m)·2^k·deg f the exact path takes on; beyond, the check is numeric. */
    static final int MAX_DIMENSION = 4096;

    private final int order;
    private final RationalPolynomial cyclotomic;
    private final List<Integer> primes;
    private final RationalPolynomial root;
    /** Power sums Σ α^j over the roots α of f, j = 0..deg f - 1 (traces of λ^j). */
    private final List<Rational> powerSums;
    private final java.util.Map<RationalPolynomial, ExactRing> withRoot = new java.util.HashMap<>();

    /** The field F this ring extends (this ring itself when it is the field). */
    private final ExactRing parent;

    private ExactRing(int order, List<Integer> primes, RationalPolynomial root, ExactRing parent) {
        this.parent = parent == null ? this : parent;
        this.order = order;
        this.cyclotomic = order == 1 ? RationalPolynomial.of(Rational.MINUS_ONE, Rational.ONE) : Cyclotomic.polynomial(order);
        this.primes = List.copyOf(primes);
        this.root = root;
        this.powerSums = powerSums(root);
        if ((long) cyclotomic.degree() * (1L << primes.size()) * root.degree() > MAX_DIMENSION) {
            throw new NotExact("the claim's numbers need a field of dimension over "
                    + MAX_DIMENSION + " for an exact check");
        }
    }

    /** The field Q(ζ_order)(√p : p in primes); order is 1 or a multiple of 4. */
    static ExactRing field(int order, List<Integer> primes) {
        if (order != 1 && order % 4 != 0) {
            throw new IllegalArgumentException("order (" + order + ") must be 1 or a multiple of 4");
        }
        return new ExactRing(order, primes, RationalPolynomial.X, null);
    }

    /** F[λ]/(f) over this ring's field, for a monic squarefree f with f(0) ≠ 0 (one instance per f). */
    ExactRing withRoot(RationalPolynomial f) {
        if (parent != this) {
            return parent.withRoot(f);
        }
        return withRoot.computeIfAbsent(f, g -> new ExactRing(order, primes, g, this));
    }

    /** The field F itself (λ dropped). */
    ExactRing field() {
        return parent;
    }

    boolean isField() {
        return root.equals(RationalPolynomial.X);
    }

    /** m of Q(ζ_m). */
    int order() {
        return order;
    }

    List<Integer> primes() {
        return primes;
    }

    /** f of F[λ]/(f); x for the field itself. */
    RationalPolynomial root() {
        return root;
    }

    int cyclotomicDegree() {
        return cyclotomic.degree();
    }

    int masks() {
        return 1 << primes.size();
    }

    int lambdaDegree() {
        return root.degree();
    }

    // ---- embeddings ----

    Algebraic zero() {
        return new Algebraic(this, empty());
    }

    Algebraic one() {
        return rational(Rational.ONE);
    }

    Algebraic rational(Rational q) {
        RationalPolynomial[][] parts = empty();
        parts[0][0] = RationalPolynomial.constant(q);
        return new Algebraic(this, parts);
    }

    /** ζ_m^k. @throws NotExact if the ring has no roots of unity */
    Algebraic zeta(long k) {
        if (order == 1) {
            throw FieldTooSmall.rootsOfUnity(4);
        }
        RationalPolynomial[][] parts = empty();
        parts[0][0] = RationalPolynomial.monomial(Rational.ONE, (int) Math.floorMod(k, order)).mod(cyclotomic);
        return new Algebraic(this, parts);
    }

    /** e^{iπq}: a root of unity of order N = orderOfPiMultiple(q), which must divide m. */
    Algebraic expIPi(Rational q) {
        int n = Cyclotomic.orderOfPiMultiple(q);
        if (order == 1 || order % n != 0) {
            throw FieldTooSmall.rootsOfUnity(n);
        }
        // e^{iπq} = ζ_m^{q·m/2}
        Rational k = q.multiply(Rational.of(order, 2));
        return zeta(k.toBigInteger().mod(BigInteger.valueOf(order)).longValueExact());
    }

    /** i = √−1. */
    Algebraic imaginaryUnit() {
        return zeta(order / 4);
    }

    /** √q for rational q (√−1 = i). @throws NotExact if a prime of q is not in the field */
    Algebraic sqrt(Rational q) {
        if (q.isZero()) {
            return zero();
        }
        BigInteger product = q.numerator().abs().multiply(q.denominator());
        Rational scale = Rational.of(BigInteger.ONE, q.denominator());
        Algebraic result = one();
        for (BigInteger[] pe : FieldNeeds.factor(product)) {
            int p = pe[0].intValueExact();
            int e = pe[1].intValueExact();
            scale = scale.multiply(Rational.of(pe[0].pow(e / 2)));
            if (e % 2 == 1) {
                result = result.multiply(sqrtPrime(p));
            }
        }
        result = result.multiply(rational(scale));
        return q.signum() < 0 ? result.multiply(imaginaryUnit()) : result;
    }

    private Algebraic sqrtPrime(int p) {
        int index = primes.indexOf(p);
        if (index >= 0) {
            RationalPolynomial[][] parts = empty();
            parts[0][1 << index] = RationalPolynomial.ONE;
            return new Algebraic(this, parts);
        }
        if (p == 2 && order % 8 == 0) {
            return zeta(order / 8).add(zeta(-order / 8));
        }
        if (p > 2 && order % p == 0) {
            Algebraic g = zero();
            int step = order / p;
            for (int a = 1; a < p; a++) {
                g = legendre(a, p) > 0 ? g.add(zeta((long) step * a)) : g.subtract(zeta((long) step * a));
            }
            return p % 4 == 1 ? g : g.multiply(imaginaryUnit()).negate();
        }
        throw FieldTooSmall.squareRoot(p);
    }

    /** (a/p) by Euler's criterion. */
    private static int legendre(int a, int p) {
        return BigInteger.valueOf(a).modPow(BigInteger.valueOf((p - 1) / 2), BigInteger.valueOf(p)).equals(BigInteger.ONE) ? 1 : -1;
    }

    /** λ, the root of f. */
    Algebraic lambda() {
        RationalPolynomial[][] parts = empty();
        if (root.degree() == 1) {
            parts[0][0] = RationalPolynomial.constant(root.coefficient(0).negate());
        } else {
            parts[1][0] = RationalPolynomial.ONE;
        }
        return new Algebraic(this, parts);
    }

    /** An element of the field embedded in this ring (λ-degree 0). */
    Algebraic lift(Algebraic fieldElement) {
        if (fieldElement.ring() == this) {
            return fieldElement;
        }
        RationalPolynomial[][] parts = empty();
        RationalPolynomial[][] source = fieldElement.parts();
        for (int j = 1; j < source.length; j++) {
            for (RationalPolynomial c : source[j]) {
                if (!c.isZero()) {
                    throw new IllegalArgumentException("not a field element");
                }
            }
        }
        parts[0] = source[0].clone();
        return new Algebraic(this, parts);
    }

    // ---- arithmetic on coordinates ----

    RationalPolynomial[][] empty() {
        RationalPolynomial[][] parts = new RationalPolynomial[root.degree()][masks()];
        for (RationalPolynomial[] row : parts) {
            java.util.Arrays.fill(row, RationalPolynomial.ZERO);
        }
        return parts;
    }

    /** The product of two field elements (one λ-coordinate each). */
    RationalPolynomial[] multiplyField(RationalPolynomial[] a, RationalPolynomial[] b) {
        RationalPolynomial[] c = new RationalPolynomial[a.length];
        java.util.Arrays.fill(c, RationalPolynomial.ZERO);
        for (int x = 0; x < a.length; x++) {
            if (a[x].isZero()) {
                continue;
            }
            for (int y = 0; y < b.length; y++) {
                if (b[y].isZero()) {
                    continue;
                }
                RationalPolynomial product = a[x].multiply(b[y]);
                int common = x & y;
                if (common != 0) {
                    product = product.multiply(Rational.of(primeProduct(common)));
                }
                c[x ^ y] = c[x ^ y].add(product);
            }
        }
        for (int x = 0; x < c.length; x++) {
            c[x] = reduce(c[x]);
        }
        return c;
    }

    RationalPolynomial reduce(RationalPolynomial p) {
        return p.degree() < cyclotomic.degree() ? p : p.mod(cyclotomic);
    }

    /** The product of the adjoined primes in a mask. */
    BigInteger primeProduct(int mask) {
        BigInteger product = BigInteger.ONE;
        for (int i = 0; i < primes.size(); i++) {
            if ((mask & (1 << i)) != 0) {
                product = product.multiply(BigInteger.valueOf(primes.get(i)));
            }
        }
        return product;
    }

    /** The inverse of a nonzero field element, by conjugating away one adjoined root at a time. */
    RationalPolynomial[] inverseField(RationalPolynomial[] a) {
        return inverse(a, primes.size());
    }

    private RationalPolynomial[] inverse(RationalPolynomial[] a, int adjoined) {
        if (adjoined == 0) {
            RationalPolynomial[] r = new RationalPolynomial[a.length];
            java.util.Arrays.fill(r, RationalPolynomial.ZERO);
            r[0] = order == 1 ? RationalPolynomial.constant(a[0].coefficient(0).inverse()) : a[0].inverseModulo(cyclotomic);
            return r;
        }
        int bit = 1 << (adjoined - 1);
        RationalPolynomial[] conjugate = a.clone();
        for (int x = 0; x < a.length; x++) {
            if ((x & bit) != 0) {
                conjugate[x] = a[x].negate();
            }
        }
        RationalPolynomial[] norm = multiplyField(a, conjugate);
        return multiplyField(conjugate, inverse(norm, adjoined - 1));
    }

    /** The complex conjugate of a field element: ζ ↦ ζ⁻¹, the real √p fixed. */
    RationalPolynomial[] conjugateField(RationalPolynomial[] a) {
        RationalPolynomial[] r = new RationalPolynomial[a.length];
        for (int x = 0; x < a.length; x++) {
            RationalPolynomial p = a[x];
            Rational[] c = new Rational[order];
            java.util.Arrays.fill(c, Rational.ZERO);
            for (int j = 0; j <= p.degree(); j++) {
                c[Math.floorMod(-j, order)] = c[Math.floorMod(-j, order)].add(p.coefficient(j));
            }
            r[x] = reduce(RationalPolynomial.of(c));
        }
        return r;
    }

    /** Tr(λ^j) = Σ α^j over the roots of f. */
    Rational powerSum(int j) {
        return powerSums.get(j);
    }

    private static List<Rational> powerSums(RationalPolynomial f) {
        int d = f.degree();
        dev.rootform.symbolic.algebra.NumberField k = new dev.rootform.symbolic.algebra.NumberField(f);
        List<Rational> sums = new ArrayList<>(d);
        for (int j = 0; j < d; j++) {
            sums.add(k.trace(RationalPolynomial.monomial(Rational.ONE, j)));
        }
        return sums;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ExactRing r && order == r.order && primes.equals(r.primes) && root.equals(r.root);
    }

    @Override
    public int hashCode() {
        return Objects.hash(order, primes, root);
    }

    @Override
    public String toString() {
        return "Q(ζ_" + order + ")" + primes.stream().map(p -> "(√" + p + ")").reduce("", String::concat)
                + (isField() ? "" : "[λ]/(" + root + ")");
    }
}
