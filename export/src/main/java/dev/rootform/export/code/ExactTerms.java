package dev.rootform.export.code;

import dev.rootform.export.ExactTerm;
import dev.rootform.export.ExactTerm.Reach;
import dev.rootform.symbolic.work.Deadline;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Finds how far the exact 64-bit term of an integer recurrence fits ({@link ExactTerm}): by running
 * the steps of the generated C on exact integers, each product step_j·x[m + j] and each partial sum
 * checked against the type's range, for up to {@link #STEPS} steps (a periodic sequence is recognised
 * after the first {@code FIRST_STEPS}). When nothing leaves the range, the sequence is tested for
 * being a quasi-polynomial: (E^P − 1)^D x = 0 from offset k on
 * (tested on k consecutive values; the difference sequence satisfies the same order-k recurrence,
 * so k zeros in a row make it zero). With D = 1 the sequence is periodic and never overflows; with
 * D &ge; 2 every intermediate g is, on each residue class r mod P, a polynomial of degree &lt; D in
 * q, so |g(r + Pq)| &le; Σ_i |Δ^i g(r)|·C(q, i) (Newton's forward-difference form; the binomials do
 * not decrease in q), which bounds the safe range analytically. Every loop checks the current
 * {@link Deadline}.
 */
final class ExactTerms {
    /** Steps run on exact integers before looking for a period. */
    private static final int FIRST_STEPS = 1_000;
    /** Steps run on exact integers before the analysis of polynomial growth. */
    static final int STEPS = 20_000;

    /** (E^period − 1)^degree x = 0 from offset k on. */
    private record Quasi(int period, int degree) {
    }

    private ExactTerms() {
    }

    /** The exact term of {@code r}, or empty when a step or a first value does not fit in 64 bits. */
    static Optional<ExactTerm> of(IntegerRecurrence r) {
        boolean unsigned = r.step().stream().allMatch(c -> c.signum() >= 0) && r.start().stream().allMatch(c -> c.signum() >= 0);
        BigInteger min = ExactTerm.minimum(unsigned);
        BigInteger max = ExactTerm.maximum(unsigned);
        if (!r.step().stream().allMatch(c -> fits(c, min, max)) || !r.start().stream().allMatch(c -> fits(c, min, max))) {
            return Optional.empty();
        }
        List<BigInteger> low = new ArrayList<>();
        List<BigInteger> high = new ArrayList<>();
        for (BigInteger c : r.step()) {
            low.add(c.signum() == 0 ? min : min.max(ceilDivide(c.signum() > 0 ? min : max, c)));
            high.add(c.signum() == 0 ? max : max.min(floorDivide(c.signum() > 0 ? max : min, c)));
        }
        return Optional.of(new ExactTerm(r.step(), r.start(), r.first(), unsigned, low, high, reach(r, min, max)));
    }

    private static Reach reach(IntegerRecurrence r, BigInteger min, BigInteger max) {
        int k = r.step().size();
        List<BigInteger> x = new ArrayList<>(r.start());
        Optional<Reach> overflow = run(r, x, FIRST_STEPS, min, max);
        if (overflow.isPresent()) {
            return overflow.get();
        }
        Optional<Quasi> quasi = quasiPolynomial(x, k);
        if (quasi.isPresent() && quasi.get().degree() == 1) {
            return new Reach.Periodic(k, quasi.get().period());
        }
        overflow = run(r, x, STEPS, min, max);
        if (overflow.isPresent()) {
            return overflow.get();
        }
        quasi = quasi.or(() -> quasiPolynomial(x, k));
        if (quasi.isEmpty()) {
            return new Reach.Checked(r.first() + k - 1 + STEPS);
        }
        int period = quasi.get().period();
        int degree = quasi.get().degree();
        if (degree == 1) {
            return new Reach.Periodic(k, period);
        }
        BigInteger safeSteps = bound(r, x, period, degree, max.min(min.negate())).max(BigInteger.valueOf(STEPS));
        return new Reach.Bounded(safeSteps.add(BigInteger.valueOf(r.first() + k - 1)).min(BigInteger.valueOf(Long.MAX_VALUE))
                .longValueExact(), degree - 1, period);
    }

    /**
     * Runs the steps on exact integers until {@code steps} of them are done (x holds k + steps values),
     * or an intermediate leaves [min, max]: then the exact reach.
     */
    private static Optional<Reach> run(IntegerRecurrence r, List<BigInteger> x, int steps, BigInteger min, BigInteger max) {
        int k = r.step().size();
        for (int m = x.size() - k; m < steps; m++) {
            Deadline.checkCurrent();
            List<BigInteger> g = intermediates(r.step(), x, m);
            if (!g.stream().allMatch(v -> fits(v, min, max))) {
                return Optional.of(new Reach.Exact(r.first() + k - 1 + m, !fits(g.get(g.size() - 1), min, max)));
            }
            x.add(g.get(g.size() - 1));
        }
        return Optional.empty();
    }

    /**
     * The smallest period P (as far as the values in x allow) with (E^P − 1)^D x = 0 from offset k on,
     * and the smallest such D; empty when there is none.
     */
    private static Optional<Quasi> quasiPolynomial(List<BigInteger> x, int k) {
        for (int period = 1; k + k - 1 + (long) k * period < x.size(); period++) {
            Deadline.checkCurrent();
            if (vanishes(x, k, period, k)) {
                int degree = 1;
                while (!vanishes(x, k, period, degree)) {
                    degree++;
                }
                return Optional.of(new Quasi(period, degree));
            }
        }
        return Optional.empty();
    }

    /**
     * The intermediates of step m (x[m + k] from x[m .. m + k − 1], offsets from the first index),
     * in the order the generated C forms them: step_0·x[m], the sum so far, step_1·x[m + 1], the sum
     * so far, … ; the last is x[m + k].
     */
    private static List<BigInteger> intermediates(List<BigInteger> step, List<BigInteger> x, long m) {
        List<BigInteger> out = new ArrayList<>();
        BigInteger sum = BigInteger.ZERO;
        for (int j = 0; j < step.size(); j++) {
            BigInteger product = step.get(j).multiply(x.get((int) m + j));
            sum = sum.add(product);
            out.add(product);
            out.add(sum);
        }
        return out;
    }

    /** Whether (E^P − 1)^D x vanishes at the k offsets from k on (x holds enough values). */
    private static boolean vanishes(List<BigInteger> x, int k, int period, int degree) {
        for (int m = k; m < 2 * k; m++) {
            BigInteger sum = BigInteger.ZERO;
            for (int i = 0; i <= degree; i++) {
                BigInteger term = binomial(degree, i).multiply(x.get(m + i * period));
                sum = (degree - i) % 2 == 0 ? sum.add(term) : sum.subtract(term);
            }
            if (sum.signum() != 0) {
                return false;
            }
        }
        return true;
    }

    /**
     * The first step at which the Newton bound of some intermediate exceeds {@code limit}: every step
     * m with k &le; m below it keeps every intermediate within ±limit.
     */
    private static BigInteger bound(IntegerRecurrence r, List<BigInteger> x, int period, int degree, BigInteger limit) {
        int k = r.step().size();
        int count = 2 * k;
        BigInteger first = null;
        for (int residue = 0; residue < period; residue++) {
            Deadline.checkCurrent();
            List<List<BigInteger>> samples = new ArrayList<>();
            for (int q = 0; q < degree; q++) {
                samples.add(intermediates(r.step(), x, k + residue + (long) period * q));
            }
            for (int i = 0; i < count; i++) {
                List<BigInteger> newton = new ArrayList<>();
                for (int d = 0; d < degree; d++) {
                    BigInteger delta = BigInteger.ZERO;
                    for (int l = 0; l <= d; l++) {
                        BigInteger term = binomial(d, l).multiply(samples.get(l).get(i));
                        delta = (d - l) % 2 == 0 ? delta.add(term) : delta.subtract(term);
                    }
                    newton.add(delta.abs());
                }
                BigInteger lastSafe = lastWithin(newton, limit);
                if (lastSafe != null) {
                    BigInteger unsafe = BigInteger.valueOf(k + residue).add(BigInteger.valueOf(period).multiply(lastSafe.add(BigInteger.ONE)));
                    first = first == null ? unsafe : first.min(unsafe);
                }
            }
        }
        return first == null ? BigInteger.ONE.shiftLeft(64) : first;
    }

    /** The largest q &ge; −1 with Σ_d newton_d·C(q, d) &le; limit, or null when there is none (the sum stays bounded). */
    private static BigInteger lastWithin(List<BigInteger> newton, BigInteger limit) {
        if (newton.subList(1, newton.size()).stream().allMatch(c -> c.signum() == 0)) {
            return newton.get(0).compareTo(limit) <= 0 ? null : BigInteger.ONE.negate();
        }
        if (newtonSum(newton, BigInteger.ZERO).compareTo(limit) > 0) {
            return BigInteger.ONE.negate();
        }
        BigInteger good = BigInteger.ZERO;
        BigInteger bad = BigInteger.ONE;
        while (newtonSum(newton, bad).compareTo(limit) <= 0) {
            good = bad;
            bad = bad.shiftLeft(1);
        }
        while (bad.subtract(good).compareTo(BigInteger.ONE) > 0) {
            BigInteger mid = good.add(bad).shiftRight(1);
            if (newtonSum(newton, mid).compareTo(limit) <= 0) {
                good = mid;
            } else {
                bad = mid;
            }
        }
        return good;
    }

    private static BigInteger newtonSum(List<BigInteger> newton, BigInteger q) {
        BigInteger sum = BigInteger.ZERO;
        BigInteger binomial = BigInteger.ONE;
        for (int d = 0; d < newton.size(); d++) {
            if (d > 0) {
                binomial = binomial.multiply(q.subtract(BigInteger.valueOf(d - 1))).divide(BigInteger.valueOf(d));
            }
            if (binomial.signum() <= 0) {
                break;
            }
            sum = sum.add(newton.get(d).multiply(binomial));
        }
        return sum;
    }

    private static BigInteger binomial(int n, int k) {
        BigInteger b = BigInteger.ONE;
        for (int i = 0; i < k; i++) {
            b = b.multiply(BigInteger.valueOf(n - i)).divide(BigInteger.valueOf(i + 1));
        }
        return b;
    }

    private static boolean fits(BigInteger v, BigInteger min, BigInteger max) {
        return v.compareTo(min) >= 0 && v.compareTo(max) <= 0;
    }

    private static BigInteger floorDivide(BigInteger a, BigInteger b) {
        BigInteger[] qr = a.divideAndRemainder(b);
        return qr[1].signum() != 0 && qr[1].signum() != b.signum() ? qr[0].subtract(BigInteger.ONE) : qr[0];
    }

    private static BigInteger ceilDivide(BigInteger a, BigInteger b) {
        return floorDivide(a.negate(), b).negate();
    }
}
