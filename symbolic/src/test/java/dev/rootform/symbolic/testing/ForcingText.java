package dev.rootform.symbolic.testing;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Domain;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/**
 * Random right-hand sides in ordinary notation, e.g. {@code (3/2)*n^2*(-2)^n*cos(2*pi*n/3)} or
 * {@code (-1/3)*t*e^((-1/2)*t)*sin(2*t)}. An exponent is a characteristic root a third of the
 * time when χ has a small rational root, so resonance is exercised.
 */
final class ForcingText {
    /** Angles qπ whose cos is rational at every integer n (Niven: cos values 0, ±1/2, ±1). */
    private static final int[][] COS_PI_FRACTIONS = {{1, 2}, {1, 3}, {2, 3}, {1, 1}};
    /** Angles qπ whose sin is rational at every integer n. */
    private static final int[][] SIN_PI_FRACTIONS = {{1, 2}, {1, 1}, {3, 2}};
    private static final int[][] FREQUENCIES = {{1, 1}, {2, 1}, {1, 2}, {3, 1}};

    private ForcingText() {
    }

    static String of(Random random, Domain domain, RationalPolynomial chi) {
        List<String> terms = new ArrayList<>();
        int count = 1 + random.nextInt(3);
        for (int i = 0; i < count; i++) {
            terms.add(term(random, domain, chi));
        }
        return String.join(" + ", terms);
    }

    private static String term(Random random, Domain domain, RationalPolynomial chi) {
        boolean difference = domain == Domain.DIFFERENCE;
        String v = difference ? "n" : "t";
        List<String> factors = new ArrayList<>();
        factors.add("(" + small(random, true) + ")");
        int power = random.nextInt(3);
        if (power > 0) {
            factors.add(power == 1 ? v : v + "^" + power);
        }
        Rational exponent = exponent(random, difference, chi);
        if (difference && !exponent.isOne()) {
            factors.add("(" + exponent + ")^n");
        } else if (!difference && !exponent.isZero()) {
            factors.add("e^((" + exponent + ")*t)");
        }
        if (random.nextBoolean()) {
            boolean cos = random.nextBoolean();
            int[][] table = !difference ? FREQUENCIES : cos ? COS_PI_FRACTIONS : SIN_PI_FRACTIONS;
            int[] f = table[random.nextInt(table.length)];
            String function = cos ? "cos" : "sin";
            String angle = difference ? f[0] + "*pi*n/" + f[1] : f[0] + "*t/" + f[1];
            factors.add(function + "(" + angle + ")");
        }
        return String.join("*", factors);
    }

    /** A base (difference) or rate (differential): a rational root of χ a third of the time if there is one. */
    private static Rational exponent(Random random, boolean difference, RationalPolynomial chi) {
        if (random.nextInt(3) == 0) {
            for (int tries = 0; tries < 30; tries++) {
                Rational r = small(random, difference);
                if (chi.evaluate(r).isZero()) {
                    return r;
                }
            }
        }
        if (random.nextBoolean()) {
            return difference ? Rational.ONE : Rational.ZERO;
        }
        return small(random, difference);
    }

    /** p/q with |p| ≤ 3 and 1 ≤ q ≤ 2. */
    private static Rational small(Random random, boolean nonzero) {
        Rational r;
        do {
            r = Rational.of(random.nextInt(7) - 3, 1 + random.nextInt(2));
        } while (nonzero && r.isZero());
        return r;
    }
}
