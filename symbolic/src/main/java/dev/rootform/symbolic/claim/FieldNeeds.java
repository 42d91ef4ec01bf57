package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.work.Deadline;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;

/**
 * The numbers a check has needed so far — square roots of primes and roots of unity — and the
 * smallest {@link ExactRing} field that holds them: Q(ζ_m) with m = lcm(4, orders) when any root of
 * unity or i is needed (else m = 1), with the square roots of the primes that Q(ζ_m) does not
 * already contain adjoined.
 */
final class FieldNeeds {
    /** Prime factors are sought up to this bound; a larger remaining factor makes the claim numeric. */
    private static final int TRIAL_LIMIT = 1_000_000;

    /** How many times a check may restart in a larger field. */
    private static final int MAX_GROWTH = 24;

    private int order = 1;
    private final TreeSet<Integer> primes = new TreeSet<>();

    /** Records what was missing. */
    void add(FieldTooSmall missing) {
        if (missing.prime() > 0) {
            primes.add(missing.prime());
        }
        if (missing.rootOrder() > 0) {
            int wanted = lcm(4, missing.rootOrder());
            order = order == 1 ? wanted : lcm(order, wanted);
        }
    }

    /**
     * Runs {@code job} in the field of everything recorded, growing the field and starting again
     * whenever the job meets a number outside it.
     *
     * @throws NotExact if the field would grow beyond the exact path's bounds
     */
    <T> T run(java.util.function.Function<ExactRing, T> job) {
        for (int attempt = 0; attempt < MAX_GROWTH; attempt++) {
            Deadline.checkCurrent();
            try {
                return job.apply(ring());
            } catch (FieldTooSmall missing) {
                add(missing);
            }
        }
        throw new NotExact("the claim needs too many square roots and roots of unity for an exact check");
    }

    /** The field of everything recorded. */
    ExactRing ring() {
        List<Integer> adjoined = new ArrayList<>();
        for (int p : primes) {
            boolean inside = order != 1 && (p == 2 ? order % 8 == 0 : order % p == 0);
            if (!inside) {
                adjoined.add(p);
            }
        }
        return ExactRing.field(order, adjoined);
    }

    /**
     * The prime factorisation {p, e} of n &gt; 0.
     *
     * @throws NotExact if a factor above the trial limit remains
     */
    static List<BigInteger[]> factor(BigInteger n) {
        List<BigInteger[]> factors = new ArrayList<>();
        BigInteger rest = n;
        for (long p = 2; p <= TRIAL_LIMIT && BigInteger.valueOf(p * p).compareTo(rest) <= 0; p++) {
            BigInteger bp = BigInteger.valueOf(p);
            int e = 0;
            while (rest.mod(bp).signum() == 0) {
                rest = rest.divide(bp);
                e++;
            }
            if (e > 0) {
                factors.add(new BigInteger[] {bp, BigInteger.valueOf(e)});
            }
        }
        if (rest.compareTo(BigInteger.ONE) > 0) {
            if (rest.bitLength() > 62 || rest.compareTo(BigInteger.valueOf((long) TRIAL_LIMIT * TRIAL_LIMIT)) > 0) {
                throw new NotExact("the number " + n + " is too large to factor for an exact square root");
            }
            factors.add(new BigInteger[] {rest, BigInteger.ONE});
        }
        return factors;
    }

    /** Every squarefree r ≥ 2 whose square root lies in the field: products of its primes. */
    static List<BigInteger> radicandsOf(ExactRing ring) {
        List<Integer> available = new ArrayList<>(ring.primes());
        int m = ring.order();
        if (m != 1) {
            for (BigInteger[] pe : factor(BigInteger.valueOf(m))) {
                int p = pe[0].intValueExact();
                if (p > 2 || m % 8 == 0) {
                    available.add(p);
                }
            }
        }
        List<BigInteger> radicands = new ArrayList<>();
        for (int mask = 1; mask < (1 << available.size()); mask++) {
            BigInteger r = BigInteger.ONE;
            for (int i = 0; i < available.size(); i++) {
                if ((mask & (1 << i)) != 0) {
                    r = r.multiply(BigInteger.valueOf(available.get(i)));
                }
            }
            radicands.add(r);
        }
        radicands.sort(null);
        return radicands;
    }

    static int moebius(int n) {
        int rest = n;
        int sign = 1;
        for (int p = 2; p * p <= rest; p++) {
            if (rest % p == 0) {
                rest /= p;
                if (rest % p == 0) {
                    return 0;
                }
                sign = -sign;
            }
        }
        return rest > 1 ? -sign : sign;
    }

    private static int lcm(int a, int b) {
        return a / BigInteger.valueOf(a).gcd(BigInteger.valueOf(b)).intValueExact() * b;
    }
}
