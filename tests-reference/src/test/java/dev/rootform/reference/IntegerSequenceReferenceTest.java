package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.cli.Pipeline;
import dev.rootform.export.Report;
import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.symbolic.algebra.Rational;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

/**
 * The whole job (text in, verified closed form out) against integer-sequence tables: every listed
 * term must equal the closed form's exact value at that index. Source per row in the CSV header.
 */
class IntegerSequenceReferenceTest {
    @ParameterizedTest(name = "{0} ({1})")
    @CsvFileSource(resources = "/reference/integer-sequences.csv", delimiter = '|')
    void closedFormReproducesTheTable(String name, String entry, String input, String terms) {
        String[] expected = terms.trim().split("\\s+");
        List<Rational> points = new ArrayList<>();
        for (int n = 0; n < expected.length; n++) {
            points.add(Rational.of(n));
        }
        Report report = Pipeline.run(input, List.of(), null, 30, points);
        assertTrue(report.verified(), name + " not verified: " + report.solution().checks());
        for (int n = 0; n < expected.length; n++) {
            PointValue v = report.values().get(n);
            assertEquals(Rational.parse(expected[n]), v.exact().orElseThrow(), name + " at n = " + n);
        }
    }
}
