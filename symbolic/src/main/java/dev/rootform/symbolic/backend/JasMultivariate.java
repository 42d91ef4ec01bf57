package dev.rootform.symbolic.backend;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.ParamFactor;
import dev.rootform.symbolic.algebra.ParamPolynomial;
import dev.rootform.symbolic.work.Cancelled;
import dev.rootform.symbolic.work.Deadline;
import edu.jas.arith.BigRational;
import edu.jas.kern.PreemptStatus;
import edu.jas.kern.PreemptingException;
import edu.jas.poly.ExpVector;
import edu.jas.poly.GenPolynomial;
import edu.jas.poly.GenPolynomialRing;
import edu.jas.poly.Monomial;
import edu.jas.ufd.FactorAbstract;
import edu.jas.ufd.FactorFactory;
import edu.jas.ufd.GCDFactory;
import edu.jas.ufd.GreatestCommonDivisor;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

/**
 * Greatest common divisors, exact quotients and factorisation of polynomials in several variables
 * over Q, by JAS ({@code GenPolynomialRing} over {@code BigRational}, its GCD and factor engines).
 * Conversions go through {@link ParamPolynomial#exponentVectors()} and
 * {@link ParamPolynomial#fromExponents}; no JAS type leaves this class. Like
 * {@link JasFactorizer}, one JAS computation runs at a time and an interrupt becomes
 * {@link Cancelled}.
 *
 * @since 0.3
 */
public final class JasMultivariate {
    private JasMultivariate() {
    }

    /** The monic (leading coefficient 1 in {@link ParamPolynomial}'s order) gcd of a and b; gcd(0, 0) = 0. */
    public static ParamPolynomial gcd(ParamPolynomial a, ParamPolynomial b) {
        if (a.isZero()) {
            return monic(b);
        }
        if (b.isZero()) {
            return monic(a);
        }
        if (a.isConstant() || b.isConstant()) {
            return ParamPolynomial.constant(a.names(), Rational.ONE);
        }
        return monic(run(a.names(), ring -> {
            GreatestCommonDivisor<BigRational> engine = GCDFactory.getImplementation(BigRational.ONE);
            return List.of(engine.gcd(toJas(ring, a), toJas(ring, b)));
        }).get(0));
    }

    /** a / b when b divides a exactly. @throws ArithmeticException otherwise */
    public static ParamPolynomial divide(ParamPolynomial a, ParamPolynomial b) {
        if (b.isZero()) {
            throw new ArithmeticException("division by zero");
        }
        if (b.isConstant()) {
            return a.scale(b.constantValue().inverse());
        }
        List<ParamPolynomial> qr = run(a.names(), ring -> {
            GenPolynomial<BigRational>[] parts = toJas(ring, a).quotientRemainder(toJas(ring, b));
            return List.of(parts[0], parts[1]);
        });
        if (!qr.get(1).isZero()) {
            throw new ArithmeticException(b + " does not divide " + a);
        }
        return qr.get(0);
    }

    /**
     * The irreducible factors over Q of a nonconstant polynomial, each monic in {@link ParamPolynomial}'s
     * order, with multiplicities; the rational constant left over is returned as a factor of degree 0
     * with multiplicity 1 first. Checked: the product equals p.
     */
    public static List<ParamFactor> factor(ParamPolynomial p) {
        if (p.isZero()) {
            throw new IllegalArgumentException("the zero polynomial has no factorisation");
        }
        List<ParamFactor> factors = new ArrayList<>();
        ParamPolynomial product = ParamPolynomial.constant(p.names(), Rational.ONE);
        if (!p.isConstant()) {
            List<ParamPolynomial> parts = new ArrayList<>();
            List<Long> powers = new ArrayList<>();
            run(p.names(), ring -> {
                FactorAbstract<BigRational> engine = FactorFactory.getImplementation(BigRational.ONE);
                for (Map.Entry<GenPolynomial<BigRational>, Long> e : engine.factors(toJas(ring, p)).entrySet()) {
                    parts.add(fromJas(p.names(), e.getKey()));
                    powers.add(e.getValue());
                }
                return List.of();
            });
            for (int i = 0; i < parts.size(); i++) {
                if (!parts.get(i).isConstant()) {
                    ParamPolynomial f = monic(parts.get(i));
                    factors.add(new ParamFactor(f, Math.toIntExact(powers.get(i))));
                    product = product.multiply(f.pow(Math.toIntExact(powers.get(i))));
                }
            }
        }
        Rational unit = p.leadingCoefficient().divide(product.leadingCoefficient());
        factors.add(0, new ParamFactor(ParamPolynomial.constant(p.names(), unit), 1));
        if (!product.scale(unit).equals(p)) {
            throw new IllegalStateException("factorisation check failed for " + p);
        }
        return List.copyOf(factors);
    }

    private static ParamPolynomial monic(ParamPolynomial p) {
        return p.isZero() ? p : p.scale(p.leadingCoefficient().inverse());
    }

    private static List<ParamPolynomial> run(List<String> names,
            Function<GenPolynomialRing<BigRational>, List<GenPolynomial<BigRational>>> work) {
        JasStartup.await();
        Deadline.checkCurrent();
        JasFactorizer.lock();
        try {
            PreemptStatus.setAllow();
            GenPolynomialRing<BigRational> ring = new GenPolynomialRing<>(BigRational.ONE, names.size(),
                    names.toArray(new String[0]));
            List<ParamPolynomial> out = new ArrayList<>();
            for (GenPolynomial<BigRational> g : work.apply(ring)) {
                out.add(fromJas(names, g));
            }
            return out;
        } catch (PreemptingException e) {
            throw new Cancelled("polynomial arithmetic was interrupted");
        } finally {
            JasFactorizer.JAS.unlock();
        }
    }

    private static GenPolynomial<BigRational> toJas(GenPolynomialRing<BigRational> ring, ParamPolynomial p) {
        GenPolynomial<BigRational> result = ring.getZERO();
        for (Map.Entry<int[], Rational> e : p.exponentVectors()) {
            long[] ev = new long[e.getKey().length];
            for (int i = 0; i < ev.length; i++) {
                ev[i] = e.getKey()[i];
            }
            Rational c = e.getValue();
            result = result.sum(new BigRational(new edu.jas.arith.BigInteger(c.numerator()), new edu.jas.arith.BigInteger(c.denominator())), ExpVector.create(ev));
        }
        return result;
    }

    private static ParamPolynomial fromJas(List<String> names, GenPolynomial<BigRational> p) {
        List<Map.Entry<int[], Rational>> terms = new ArrayList<>();
        for (Monomial<BigRational> m : p) {
            int[] e = new int[names.size()];
            for (int i = 0; i < e.length; i++) {
                e[i] = (int) m.exponent().getVal(i);
            }
            BigRational c = m.coefficient();
            terms.add(Map.entry(e, Rational.of(c.numerator(), c.denominator())));
        }
        return ParamPolynomial.fromExponents(names, terms);
    }
}
