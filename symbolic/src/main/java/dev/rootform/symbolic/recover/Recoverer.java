package dev.rootform.symbolic.recover;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.InputException;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;

/**
 * Recovers the shortest linear recurrence with constant rational coefficients from exact terms:
 * the terms are scaled to integers by the least common multiple of their denominators (which
 * changes no recurrence), {@link BerlekampMassey} finds the shortest one, and exact rational
 * iteration from the first L terms must give back every term. Polynomial and exponential parts of
 * the sequence appear as factors of χ (n² + 2^n: (λ − 1)³(λ − 2)).
 *
 * @since 0.2
 */
public final class Recoverer {
    /** The largest |index| of a term: indices stay far from int overflow. */
    public static final int MAX_INDEX = 1_000_000_000;

    private Recoverer() {
    }

    /**
     * The shortest recurrence that generates {@code terms}, confirmed or not (see
     * {@link RecoveredRecurrence#confirmed()}).
     *
     * @param terms x[start], x[start+1], …; at least one
     * @param start the index of the first term
     * @throws InputException if every term is 0 (order 0: there is no recurrence to solve), or an
     *     index is beyond ±{@link #MAX_INDEX}
     * @throws dev.rootform.symbolic.work.Cancelled if the current deadline passes or the thread is
     *     interrupted
     */
    public static RecoveredRecurrence recover(List<Rational> terms, int start) {
        if (Math.abs((long) start) + terms.size() > MAX_INDEX) {
            throw new InputException("the terms' indices from " + start + " on go beyond ±" + MAX_INDEX, "", -1);
        }
        if (terms.stream().allMatch(Rational::isZero)) {
            throw new InputException("all " + terms.size() + " terms are 0: x[n] = 0 has no recurrence to recover", "", -1);
        }
        BerlekampMassey.Register register = BerlekampMassey.shortest(integers(terms));
        List<BigInteger> c = register.connection();
        int order = register.length();
        Rational[] chi = new Rational[order + 1];
        Rational lead = Rational.of(c.get(0));
        for (int k = 0; k <= order; k++) {
            chi[k] = Rational.of(c.get(order - k)).divide(lead);
        }
        RecoveredRecurrence recovered = new RecoveredRecurrence(terms, start, RationalPolynomial.of(chi));
        if (!recovered.iterate(terms.size()).equals(terms)) {
            throw new IllegalStateException("the recovered recurrence " + recovered.equation() + " does not reproduce the terms");
        }
        return recovered;
    }

    /** The terms times the least common multiple of their denominators. */
    private static List<BigInteger> integers(List<Rational> terms) {
        BigInteger lcm = BigInteger.ONE;
        for (Rational t : terms) {
            BigInteger q = t.denominator();
            lcm = lcm.divide(lcm.gcd(q)).multiply(q);
        }
        List<BigInteger> scaled = new ArrayList<>(terms.size());
        for (Rational t : terms) {
            scaled.add(t.numerator().multiply(lcm.divide(t.denominator())));
        }
        return scaled;
    }
}
