package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.Report;
import dev.rootform.numeric.check.OdeReference;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.ExactRoot;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.parse.ProblemParser;
import java.util.List;
import java.util.stream.Collectors;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

/** Higher-order ODEs with irreducible cubic/quartic factors against the DOP853 integrator (CSV header). */
class Dop853ReferenceTest {
    private static final List<Rational> OFFSETS = List.of(Rational.of(1, 2), Rational.ONE, Rational.of(3, 2));
    private static final double TOLERANCE = 1e-9;

    @ParameterizedTest(name = "{0}")
    @CsvFileSource(resources = "/reference/ode-dop853.csv", delimiter = '|')
    void valuesMatchTheIntegrator(String description, String input) {
        Problem problem = ProblemParser.parse(input, List.of(), null);
        Rational t0 = problem.conditions().get(0).at();
        List<Rational> points = OFFSETS.stream().map(t0::add).collect(Collectors.toList());
        Report report = Answers.report(input, 25, points);
        assertTrue(report.verified(), input);
        assertTrue(report.solution().roots().stream().anyMatch(r -> r instanceof ExactRoot.Implicit),
                description + ": an irreducible factor of degree ≥ 3 is expected");
        List<Rational> initial = problem.conditions().stream().map(Condition::value).collect(Collectors.toList());
        double[] reference = OdeReference.values(problem.equation().coefficients(), t0, initial,
                points.stream().mapToDouble(Rational::doubleValue).toArray());
        for (int i = 0; i < points.size(); i++) {
            double actual = report.values().get(i).value().doubleValue();
            assertEquals(reference[i], actual, TOLERANCE * Math.max(1, Math.abs(reference[i])), description + " at t = " + points.get(i));
        }
    }
}
