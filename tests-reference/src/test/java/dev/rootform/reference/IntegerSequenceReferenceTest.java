package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.parse.ProblemParser;
import java.util.List;
import java.util.stream.Collectors;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

/**
 * The whole job (text in, verified closed form out) against integer-sequence tables: every listed
 * term must equal the closed form's exact value at that index, and the table itself (written from
 * memory) must equal exact rational iteration from the row's starting values, which start at
 * index 0 and are consecutive. Source per row in the CSV header.
 */
class IntegerSequenceReferenceTest {
    @ParameterizedTest(name = "{0} ({1})")
    @CsvFileSource(resources = "/reference/integer-sequences.csv", delimiter = '|')
    void closedFormReproducesTheTable(String name, String entry, String input, String terms) {
        String[] expected = terms.trim().split("\\s+");
        Problem problem = ProblemParser.parse(input, List.of(), null);
        List<Rational> start = problem.conditions().stream().map(Condition::value).collect(Collectors.toList());
        List<Rational> iterated = ExactIteration.values(problem.equation().coefficients(), start, expected.length);
        List<Rational> values = SequenceValues.of(input, expected.length);
        for (int n = 0; n < expected.length; n++) {
            assertEquals(Rational.parse(expected[n]), iterated.get(n), name + ": table against iteration at n = " + n);
            assertEquals(Rational.parse(expected[n]), values.get(n), name + " at n = " + n);
        }
    }
}
