package dev.rootform.symbolic.backend;

import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.work.Cancelled;
import dev.rootform.symbolic.work.Deadline;
import edu.jas.arith.BigInteger;
import edu.jas.kern.PreemptStatus;
import edu.jas.kern.PreemptingException;
import edu.jas.poly.ExpVector;
import edu.jas.poly.GenPolynomial;
import edu.jas.poly.GenPolynomialRing;
import edu.jas.poly.Monomial;
import edu.jas.ufd.FactorAbstract;
import edu.jas.ufd.FactorFactory;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.locks.ReentrantLock;

/**
 * Factorisation over Q into monic irreducible factors with multiplicities, by JAS over Z after
 * clearing denominators (measured 2–4× faster than over Q at degree 120). The only class that
 * touches JAS types. JAS's parallel GCD thread pool is switched off, so no non-daemon thread keeps
 * the JVM alive after use, and the work runs on the calling thread. JAS's classes are initialised
 * once by {@link JasStartup}, on a thread no time limit interrupts, so that no interrupt can break
 * them; this class's own initialiser touches no JAS class.
 *
 * <p>Cancellation: JAS checks {@link Thread#isInterrupted()} whenever it builds a polynomial in a
 * ring made while preemption is allowed ({@code PreemptStatus.setAllow()}, switched on before each
 * factorisation) and then throws its own unchecked exception, which this class turns into
 * {@link Cancelled}. So an interrupt of the calling thread (the front door's watchdog interrupts
 * it when the time limit passes) stops a long factorisation within one polynomial operation.
 * {@link Deadline#checkCurrent()} is consulted before the JAS call and in this class's own loops.
 *
 * <p>Threads: JAS is not safe for concurrent use. Its prime tables ({@code edu.jas.arith.PrimeList},
 * used by the modular factorisation and gcd) share one list per range among all instances and
 * append to it without synchronisation when a computation runs past the primes listed (seen in
 * its bytecode). So one factorisation runs at a time; a thread waiting for its turn still honours
 * its deadline.
 *
 * @since 0.1
 */
public final class JasFactorizer {
    /** One JAS factorisation at a time (see the class comment). */
    static final ReentrantLock JAS = new ReentrantLock();

    private static final int RECENT_SIZE = 64;
    /**
     * The most recently factored monic polynomials (a response factors its denominator for the
     * transfer function's poles and again as the equation's characteristic polynomial); the map's
     * lock is not held while factoring.
     */
    private static final Map<RationalPolynomial, List<Factor>> RECENT = java.util.Collections.synchronizedMap(
            new java.util.LinkedHashMap<>(16, 0.75f, true) {
                private static final long serialVersionUID = 1L;

                @Override
                protected boolean removeEldestEntry(Map.Entry<RationalPolynomial, List<Factor>> eldest) {
                    return size() > RECENT_SIZE;
                }
            });

    private JasFactorizer() {
    }

    /**
     * The factors f_i and multiplicities m_i with p = lc(p)·Π f_i^{m_i}, sorted by degree, then by
     * coefficients; the product is checked exactly before returning.
     *
     * @throws IllegalArgumentException if p has degree &lt; 1
     */
    public static List<Factor> factor(RationalPolynomial p) {
        if (p.degree() < 1) {
            throw new IllegalArgumentException("degree (" + p.degree() + ") must be >= 1");
        }
        RationalPolynomial key = p.monic();
        List<Factor> known = RECENT.get(key);
        if (known != null) {
            return known;
        }
        List<Factor> factors = factorMonic(key);
        RECENT.put(key, factors);
        return factors;
    }

    private static List<Factor> factorMonic(RationalPolynomial p) {
        List<Factor> factors = scaledBinomial(p).orElseGet(() -> factorsOf(p));
        factors = new ArrayList<>(factors);
        factors.sort(Comparator.comparingInt(Factor::degree).thenComparing(f -> f.polynomial().toString()));
        checkProduct(p, factors);
        return List.copyOf(factors);
    }

    private static List<Factor> factorsOf(RationalPolynomial p) {
        JasStartup.await();
        Deadline.checkCurrent();
        FactorAbstract<BigInteger> engine = FactorFactory.getImplementation(BigInteger.ONE);
        List<Factor> factors = new ArrayList<>();
        for (Map.Entry<GenPolynomial<BigInteger>, Long> e : interruptible(engine, p).entrySet()) {
            RationalPolynomial f = fromJas(e.getKey());
            if (f.degree() >= 1) {
                factors.add(new Factor(f.monic(), Math.toIntExact(e.getValue())));
            }
        }
        return factors;
    }

    /**
     * JAS's factorisation of p over Z, in a polynomial ring made for this call with preemption
     * allowed (another library in the same JVM may have switched it off globally); its preemption
     * exception becomes {@link Cancelled}. The ring is not a static constant: made in a class
     * initialiser, an interrupt would break the class for good.
     */
    private static Map<GenPolynomial<BigInteger>, Long> interruptible(FactorAbstract<BigInteger> engine,
            RationalPolynomial p) {
        lock();
        try {
            PreemptStatus.setAllow();
            return engine.factors(toJas(new GenPolynomialRing<>(BigInteger.ONE, 1, new String[] {"x"}), p));
        } catch (PreemptingException e) {
            throw new Cancelled("factoring was interrupted");
        } finally {
            JAS.unlock();
        }
    }

    /** Takes {@link #JAS}, checking the current deadline while another thread holds it. */
    static void lock() {
        JasStartup.waitFor(step -> JAS.tryLock(step, TimeUnit.MILLISECONDS), "waiting to factor");
    }

    /**
     * A binomial a·x^(m+d) + b·x^m with -b/a = ±s^d for a rational s: its factors are x (multiplicity
     * m) and s^e·g(x/s) for the factors g of degree e of y^d ∓ 1, which JAS splits into cyclotomic
     * polynomials at once. Without this rescaling, JAS's generic path takes minutes on x^96 - 2^96
     * (measured: over 60 s) while y^96 - 1 takes milliseconds.
     */
    private static java.util.Optional<List<Factor>> scaledBinomial(RationalPolynomial p) {
        int m = p.zeroRootMultiplicity();
        int d = p.degree() - m;
        long nonzero = p.coefficients().stream().filter(c -> !c.isZero()).count();
        if (nonzero != 2 || d < 2) {
            return java.util.Optional.empty();
        }
        Rational c = p.coefficient(m).negate().divide(p.leadingCoefficient());
        java.util.Optional<Rational> s = exactRoot(c.abs(), d);
        if (s.isEmpty() || s.get().isOne()) {
            return java.util.Optional.empty();
        }
        RationalPolynomial unit = RationalPolynomial.monomial(Rational.ONE, d)
                .add(RationalPolynomial.constant(c.signum() > 0 ? Rational.MINUS_ONE : Rational.ONE));
        List<Factor> factors = new ArrayList<>();
        if (m > 0) {
            factors.add(new Factor(RationalPolynomial.X, m));
        }
        for (Factor g : factorsOf(unit)) {
            Deadline.checkCurrent();
            int e = g.degree();
            Rational[] scaled = new Rational[e + 1];
            for (int j = 0; j <= e; j++) {
                scaled[j] = g.polynomial().coefficient(j).multiply(s.get().pow(e - j));
            }
            factors.add(new Factor(RationalPolynomial.of(scaled), g.multiplicity()));
        }
        return java.util.Optional.of(factors);
    }

    /** The rational r ≥ 0 with r^d = q, if there is one. */
    private static java.util.Optional<Rational> exactRoot(Rational q, int d) {
        java.math.BigInteger top = integerRoot(q.numerator(), d);
        java.math.BigInteger bottom = integerRoot(q.denominator(), d);
        if (top.pow(d).equals(q.numerator()) && bottom.pow(d).equals(q.denominator())) {
            return java.util.Optional.of(Rational.of(top, bottom));
        }
        return java.util.Optional.empty();
    }

    /** ⌊n^(1/d)⌋ for n ≥ 0 by Newton's method on integers. */
    private static java.math.BigInteger integerRoot(java.math.BigInteger n, int d) {
        if (n.signum() == 0) {
            return n;
        }
        java.math.BigInteger dd = java.math.BigInteger.valueOf(d);
        java.math.BigInteger x = java.math.BigInteger.ONE.shiftLeft(n.bitLength() / d + 1);
        while (true) {
            java.math.BigInteger y = x.multiply(dd.subtract(java.math.BigInteger.ONE)).add(n.divide(x.pow(d - 1))).divide(dd);
            if (y.compareTo(x) >= 0) {
                return x;
            }
            x = y;
        }
    }

    private static void checkProduct(RationalPolynomial p, List<Factor> factors) {
        RationalPolynomial product = RationalPolynomial.constant(p.leadingCoefficient());
        for (Factor f : factors) {
            Deadline.checkCurrent();
            product = product.multiply(f.polynomial().pow(f.multiplicity()));
        }
        if (!product.equals(p)) {
            throw new IllegalStateException("factorisation check failed for " + p);
        }
    }

    private static GenPolynomial<BigInteger> toJas(GenPolynomialRing<BigInteger> ring, RationalPolynomial p) {
        java.math.BigInteger lcm = java.math.BigInteger.ONE;
        for (Rational c : p.coefficients()) {
            lcm = lcm.divide(lcm.gcd(c.denominator())).multiply(c.denominator());
        }
        GenPolynomial<BigInteger> result = ring.getZERO();
        for (int i = 0; i <= p.degree(); i++) {
            Rational c = p.coefficient(i).multiply(Rational.of(lcm));
            if (!c.isZero()) {
                result = result.sum(new BigInteger(c.toBigInteger()), ExpVector.create(1, 0, i));
            }
        }
        return result;
    }

    private static RationalPolynomial fromJas(GenPolynomial<BigInteger> p) {
        Rational[] c = new Rational[(int) p.degree(0) + 1];
        java.util.Arrays.fill(c, Rational.ZERO);
        for (Monomial<BigInteger> m : p) {
            c[(int) m.exponent().getVal(0)] = Rational.of(m.coefficient().getVal());
        }
        return RationalPolynomial.of(c);
    }
}
