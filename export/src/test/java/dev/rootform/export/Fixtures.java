package dev.rootform.export;

import dev.rootform.numeric.analysis.Analysis;
import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.numeric.roots.RootApproximation;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.ExactRoot;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.solve.Solution;
import dev.rootform.symbolic.solve.Solver;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** Problems solved by the exact solver, and reports around them, for the tests of every export package. */
public final class Fixtures {
    /** The roots of λ^3 - λ - 1, real one first (values to 16 digits). */
    private static final String[][] CUBIC = {
        {"1.324717957244746", "0"}, {"-0.6623589786223730", "0.5622795120623012"}, {"-0.6623589786223730", "-0.5622795120623012"},
    };

    private Fixtures() {
    }

    public static Solution difference(List<Condition> conditions, long... a) {
        return solve(Domain.DIFFERENCE, "x", "n", conditions, a);
    }

    public static Solution differential(List<Condition> conditions, long... a) {
        return solve(Domain.DIFFERENTIAL, "y", "t", conditions, a);
    }

    /** x[at] = value, or y(at) = value. */
    public static Condition at(long at, long value) {
        return derivativeAt(0, Rational.of(at), value);
    }

    public static Condition derivativeAt(int derivative, Rational at, long value) {
        return new Condition(derivative, at, Rational.of(value));
    }

    public static Solution fibonacci() {
        return difference(List.of(at(0, 0), at(1, 1)), -1, -1, 1);
    }

    /** y'' + 2y' + 5y = 0, y(0) = 1, y'(0) = 0. */
    public static Solution dampedOscillator() {
        return differential(List.of(at(0, 1), derivativeAt(1, Rational.ZERO, 0)), 5, 2, 1);
    }

    /** A report with 10 digits, no numeric checks and no warnings. */
    public static Report report(Solution s, List<PointValue> values) {
        return report(s, values, List.of(), List.of());
    }

    public static Report report(Solution s, List<PointValue> values, List<Check> numericChecks, List<String> warnings) {
        List<RootApproximation> roots = new ArrayList<>();
        for (ExactRoot r : s.roots()) {
            roots.add(approximate(r));
        }
        return new Report(s, new Analysis(roots, values, numericChecks, java.util.Map.of(), List.of(), Optional.empty(), warnings), 10);
    }

    public static PointValue value(long at, long exact) {
        return new PointValue(Rational.of(at), BigDecimal.valueOf(exact), Optional.of(Rational.of(exact)));
    }

    private static RootApproximation approximate(ExactRoot r) {
        MathContext mc = new MathContext(20);
        if (r instanceof ExactRoot.Explicit e) {
            return new RootApproximation(r, e.re().toBigDecimal(mc), e.im().toBigDecimal(mc), BigDecimal.ZERO);
        }
        String[] v = CUBIC[((ExactRoot.Implicit) r).index() - 1];
        return new RootApproximation(r, new BigDecimal(v[0]), new BigDecimal(v[1]), new BigDecimal("1E-15"));
    }

    private static Solution solve(Domain d, String f, String v, List<Condition> conditions, long... a) {
        List<Rational> coefficients = new ArrayList<>();
        for (long x : a) {
            coefficients.add(Rational.of(x));
        }
        return Solver.solve(new Problem(new LinearEquation(d, f, v, coefficients, 0, List.of()), conditions));
    }
}
