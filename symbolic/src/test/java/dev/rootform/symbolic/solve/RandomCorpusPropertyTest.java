package dev.rootform.symbolic.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.model.Problem;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Seeded random problems of order 1 to 10 built from chosen roots (distinct real roots, repeated
 * roots up to multiplicity 5, complex pairs and repeated pairs, roots of unity, quadratic surds,
 * an irreducible cubic, roots at 0) with random exact conditions (k consecutive values from a random first index,
 * or k derivatives at a random point); every answer must verify
 * exactly. The seed is printed on failure; -Dtests.multiplier scales the count.
 */
class RandomCorpusPropertyTest {
    private static final long SEED = 20261201L;
    private static final int CASES = 120 * Integer.getInteger("tests.multiplier", 1);

    @Test
    void everyRandomProblemIsVerifiedExactly() {
        Random random = new Random(SEED);
        for (int i = 0; i < CASES; i++) {
            Domain domain = random.nextBoolean() ? Domain.DIFFERENCE : Domain.DIFFERENTIAL;
            RationalPolynomial chi = randomCharacteristic(random, domain, 1 + random.nextInt(10));
            List<Rational> a = chi.multiply(randomRational(random, true)).coefficients();
            LinearEquation eq = new LinearEquation(domain, domain == Domain.DIFFERENCE ? "x" : "y",
                    domain == Domain.DIFFERENCE ? "n" : "t", a, 0, List.of());
            List<Condition> conditions = randomConditions(random, domain, eq.order(), chi.coefficient(0).isZero());
            String label = "case " + i + " (seed " + SEED + "): " + domain + " χ = " + chi;
            Solution s = Solver.solve(new Problem(eq, conditions));
            for (Check c : s.checks()) {
                assertTrue(c.passed(), label + ": " + c.name() + ": " + c.detail());
            }
            assertEquals(3, s.checks().size(), label);
        }
    }

    /** A product of random factors whose degrees add up to at least {@code order} (at most 10). */
    static RationalPolynomial randomCharacteristic(Random random, Domain domain, int order) {
        RationalPolynomial chi = RationalPolynomial.ONE;
        while (chi.degree() < order) {
            RationalPolynomial f = randomFactor(random, domain);
            int m = 1 + random.nextInt(random.nextInt(4) == 0 ? 5 : 2);
            while (m > 1 && chi.degree() + m * f.degree() > 10) {
                m--;
            }
            if (chi.degree() + f.degree() > 10) {
                break;
            }
            chi = chi.multiply(f.pow(m));
        }
        return chi.degree() < 1 ? RationalPolynomial.ofIntegers(-1, 1) : chi;
    }

    private static RationalPolynomial randomFactor(Random random, Domain domain) {
        switch (random.nextInt(7)) {
            case 0:
            case 1:
                return RationalPolynomial.of(randomRational(random, false).negate(), Rational.ONE);
            case 2: {
                // complex pair a ± ib: x² - 2a x + a² + b²
                Rational re = randomRational(random, false);
                Rational im = randomRational(random, true);
                return RationalPolynomial.of(re.multiply(re).add(im.multiply(im)), re.multiply(-2), Rational.ONE);
            }
            case 3: {
                // real quadratic surd roots: x² + bx + c with b² - 4c > 0 a non-square
                int c = -(1 + random.nextInt(6));
                return RationalPolynomial.ofIntegers(c, random.nextInt(3) - 1, 1);
            }
            case 4: {
                // a cyclotomic polynomial: roots of unity
                long[][] cyclotomic = {{1, 1, 1}, {1, 0, 1}, {1, 1, 1, 1, 1}, {1, -1, 1}, {1, 0, 0, 0, 1}, {1, 0, -1, 0, 1}};
                return RationalPolynomial.ofIntegers(cyclotomic[random.nextInt(cyclotomic.length)]);
            }
            case 5:
                return random.nextBoolean() ? RationalPolynomial.ofIntegers(-1, -1, 0, 1) : RationalPolynomial.ofIntegers(0, 1);
            default:
                // decimal coefficients are exact rationals: x - 0.3 and x² - 1.5x + 0.56 = (x - 0.7)(x - 0.8)
                return random.nextBoolean()
                        ? RationalPolynomial.of(Rational.parse("-0.3"), Rational.ONE)
                        : RationalPolynomial.of(Rational.parse("0.56"), Rational.parse("-1.5"), Rational.ONE);
        }
    }

    static Rational randomRational(Random random, boolean nonzero) {
        Rational r;
        do {
            r = Rational.of(random.nextInt(11) - 5, 1 + random.nextInt(3));
        } while (nonzero && r.isZero());
        return r;
    }

    static List<Condition> randomConditions(Random random, Domain domain, int order, boolean zeroRoot) {
        List<Condition> conditions = new ArrayList<>();
        Rational t0 = Rational.of(random.nextInt(5) - 2, 1 + random.nextInt(2));
        // with λ = 0 a root the first values are free, so conditions must start at the first index
        int first = zeroRoot ? -random.nextInt(4) : random.nextInt(7) - 3;
        for (int j = 0; j < order; j++) {
            Rational value = randomRational(random, false);
            conditions.add(domain == Domain.DIFFERENCE
                    ? new Condition(0, Rational.of(first + j), value)
                    : new Condition(j, t0, value));
        }
        return conditions;
    }
}
