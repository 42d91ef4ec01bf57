package dev.rootform.symbolic.testing;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.parse.ProblemParser;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Random;
import java.util.Set;

/**
 * A seeded source of random problems built from chosen roots: χ is a product of factors of every
 * {@link RootCase}, each possibly repeated (multiplicity up to 5), times a random rational scale;
 * the conditions are random exact values (k consecutive sequence values from a random first index,
 * or k derivatives at a random point). The same seed gives the same sequence of problems.
 */
public final class RandomProblems {
    /** The largest multiplicity a factor is given. */
    public static final int MAX_MULTIPLICITY = 5;
    private static final long[][] CYCLOTOMIC = {
        {1, 1}, {1, 1, 1}, {1, 0, 1}, {1, 1, 1, 1, 1}, {1, -1, 1}, {1, 1, 1, 1, 1, 1, 1}, {1, 0, 0, 0, 1},
        {1, 0, 0, 1, 0, 0, 1}, {1, 0, -1, 0, 1}};
    private static final long[][] CUBICS = {{-1, -1, 0, 1}, {1, -3, 0, 1}, {-2, 0, 0, 1}};
    private static final long[][] QUINTICS = {{-1, -1, 0, 0, 0, 1}, {2, -4, 0, 0, 0, 1}};

    private final long seed;
    private final Random random;
    private final Forcing forcing;
    private int count;

    /**
     * @param seed the seed, named in every label
     * @param forcing which right-hand sides to generate
     */
    public RandomProblems(long seed, Forcing forcing) {
        this.seed = seed;
        this.random = new Random(seed);
        this.forcing = forcing;
    }

    /** The seed this generator started from. */
    public long seed() {
        return seed;
    }

    /** A problem of a random domain and a random order from 1 to {@code maxOrder}. */
    public GeneratedProblem next(int maxOrder) {
        Domain domain = random.nextBoolean() ? Domain.DIFFERENCE : Domain.DIFFERENTIAL;
        return next(domain, 1 + random.nextInt(maxOrder));
    }

    /** A problem of the given domain and exactly the given order. */
    public GeneratedProblem next(Domain domain, int order) {
        Set<RootCase> cases = EnumSet.noneOf(RootCase.class);
        RationalPolynomial chi = characteristic(order, cases);
        List<Rational> a = chi.multiply(rational(true)).coefficients();
        boolean difference = domain == Domain.DIFFERENCE;
        LinearEquation eq = new LinearEquation(domain, difference ? "x" : "y", difference ? "n" : "t", a, 0, List.of());
        boolean forced = forcing == Forcing.MIXED && random.nextInt(3) == 0;
        Problem problem = new Problem(eq, conditions(domain, order, chi.coefficient(0).isZero(), forced));
        boolean decimals = cases.contains(RootCase.DECIMAL) || random.nextInt(4) == 0;
        String label = "case " + count++ + " (seed " + seed + ", " + (forced ? "forced" : "unforced") + "): "
                + domain + " χ = " + chi;
        if (!forced) {
            return new GeneratedProblem(problem, ProblemText.of(problem, decimals), chi, cases, label);
        }
        String text = ProblemText.of(problem, decimals, ForcingText.of(random, domain, chi));
        return new GeneratedProblem(ProblemParser.parse(text, List.of(), null), text, chi, cases, label);
    }

    /** A product of random factors of total degree exactly {@code order}. */
    private RationalPolynomial characteristic(int order, Set<RootCase> cases) {
        RationalPolynomial chi = RationalPolynomial.ONE;
        while (chi.degree() < order) {
            int room = order - chi.degree();
            RootCase kind = RootCase.values()[random.nextInt(RootCase.values().length)];
            RationalPolynomial f = factor(kind);
            if (f.degree() > room) {
                kind = RootCase.RATIONAL;
                f = factor(kind);
            }
            int m = Math.min(multiplicity(), room / f.degree());
            cases.add(kind);
            chi = chi.multiply(f.pow(m));
        }
        return chi;
    }

    private int multiplicity() {
        return 1 + random.nextInt(random.nextInt(4) == 0 ? MAX_MULTIPLICITY : 2);
    }

    private RationalPolynomial factor(RootCase kind) {
        switch (kind) {
            case RATIONAL:
                return RationalPolynomial.of(rational(false).negate(), Rational.ONE);
            case COMPLEX_PAIR: {
                Rational re = rational(false);
                Rational im = rational(true);
                return RationalPolynomial.of(re.multiply(re).add(im.multiply(im)), re.multiply(-2), Rational.ONE);
            }
            case QUADRATIC_SURD:
                return RationalPolynomial.ofIntegers(-(1 + random.nextInt(6)), random.nextInt(3) - 1, 1);
            case ROOT_OF_UNITY:
                return pick(CYCLOTOMIC);
            case IRREDUCIBLE_CUBIC:
                return pick(CUBICS);
            case IRREDUCIBLE_QUINTIC:
                return pick(QUINTICS);
            case ZERO:
                return RationalPolynomial.X;
            case DECIMAL:
                return random.nextBoolean()
                        ? RationalPolynomial.of(Rational.parse("-0.3"), Rational.ONE)
                        : RationalPolynomial.of(Rational.parse("0.56"), Rational.parse("-1.5"), Rational.ONE);
            default:
                throw new AssertionError(kind);
        }
    }

    private RationalPolynomial pick(long[][] table) {
        return RationalPolynomial.ofIntegers(table[random.nextInt(table.length)]);
    }

    /** A rational p/q with |p| ≤ 5 and 1 ≤ q ≤ 3. */
    private Rational rational(boolean nonzero) {
        Rational r;
        do {
            r = Rational.of(random.nextInt(11) - 5, 1 + random.nextInt(3));
        } while (nonzero && r.isZero());
        return r;
    }

    /** k conditions; a forced differential equation gets them at t = 0, where its forcing is exact. */
    private List<Condition> conditions(Domain domain, int order, boolean zeroRoot, boolean forced) {
        List<Condition> conditions = new ArrayList<>();
        Rational t0 = forced ? Rational.ZERO : Rational.of(random.nextInt(5) - 2, 1 + random.nextInt(2));
        // with λ = 0 a root the first values are free, so conditions must start at the first index
        int first = zeroRoot ? -random.nextInt(4) : random.nextInt(7) - 3;
        for (int j = 0; j < order; j++) {
            Rational value = rational(false);
            conditions.add(domain == Domain.DIFFERENCE
                    ? new Condition(0, Rational.of(first + j), value)
                    : new Condition(j, t0, value));
        }
        return conditions;
    }
}
