package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.Report;
import dev.rootform.numeric.check.ForcingFunction;
import dev.rootform.numeric.check.OdeReference;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.testing.Forcing;
import dev.rootform.symbolic.testing.GeneratedProblem;
import dev.rootform.symbolic.testing.RandomProblems;
import java.util.List;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

/**
 * The seeded random corpus (orders 1–12, every root case, a third of it forced) through the whole job, text in → report
 * out: every answer must be verified, and its values must equal exact rational iteration at
 * indices up to 40 past the conditions (sequences), or Commons Math's DOP853 integrator
 * ({@link OdeReference}, relative tolerance 1e-12) within {@value #ODE_TOLERANCE} relative to
 * max(1, |y|, |initial data|) at t0 ± 1/2 and t0 + 1 (functions). The seed is in every message;
 * -Dtests.multiplier scales the count.
 */
class PipelinePropertyTest {
    private static final long SEED = 6_2026_12_01L;
    private static final int CASES = 100 * Integer.getInteger("tests.multiplier", 1);
    private static final double ODE_TOLERANCE = 1e-8;
    private static final List<Integer> INDEX_OFFSETS = List.of(0, 1, 13, 40);
    private static final List<Rational> TIME_OFFSETS = List.of(Rational.of(-1, 2), Rational.of(1, 2), Rational.ONE);

    @Test
    void wholePipelineAgreesWithIndependentReferences() {
        RandomProblems corpus = new RandomProblems(SEED, Forcing.MIXED);
        for (int i = 0; i < CASES; i++) {
            GeneratedProblem g = corpus.next(12);
            if (g.problem().equation().domain() == Domain.DIFFERENCE) {
                checkSequence(g);
            } else {
                checkFunction(g);
            }
        }
    }

    private static void checkSequence(GeneratedProblem g) {
        LinearEquation eq = g.problem().equation();
        List<Condition> conditions = g.problem().conditions();
        int first = conditions.get(0).at().toBigInteger().intValueExact();
        List<Rational> points = INDEX_OFFSETS.stream().map(d -> Rational.of(first + eq.order() + d)).collect(Collectors.toList());
        Report report = run(g, points);
        List<Rational> start = conditions.stream().map(Condition::value).collect(Collectors.toList());
        List<Rational> iterated = ExactIteration.values(eq.coefficients(), eq.forcing(), first, start,
                eq.order() + INDEX_OFFSETS.get(INDEX_OFFSETS.size() - 1) + 1);
        for (int p = 0; p < points.size(); p++) {
            int index = points.get(p).toBigInteger().intValueExact() - first;
            assertEquals(iterated.get(index), report.values().get(p).exact().orElseThrow(), g.label() + " at n = " + points.get(p));
        }
    }

    private static void checkFunction(GeneratedProblem g) {
        LinearEquation eq = g.problem().equation();
        Rational t0 = g.problem().conditions().get(0).at();
        List<Rational> points = TIME_OFFSETS.stream().map(t0::add).collect(Collectors.toList());
        Report report = run(g, points);
        List<Rational> initial = g.problem().conditions().stream().map(Condition::value).collect(Collectors.toList());
        double scale = initial.stream().mapToDouble(r -> Math.abs(r.doubleValue())).max().orElse(0);
        double[] reference = OdeReference.values(eq.coefficients(), ForcingFunction.of(eq.forcing()), t0, initial,
                points.stream().mapToDouble(Rational::doubleValue).toArray());
        for (int p = 0; p < points.size(); p++) {
            double actual = report.values().get(p).value().doubleValue();
            double bound = ODE_TOLERANCE * Math.max(1, Math.max(Math.abs(reference[p]), scale));
            assertEquals(reference[p], actual, bound, g.label() + " at t = " + points.get(p));
        }
    }

    private static Report run(GeneratedProblem g, List<Rational> points) {
        Report report = Answers.report(g.text(), 20, points);
        assertTrue(report.verified(), g.label() + ": " + g.text() + ": " + report.solution().checks() + report.numericChecks());
        return report;
    }
}
