package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.Report;
import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.symbolic.algebra.Rational;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;
import java.util.stream.IntStream;

/** The exact values x[0..count−1] of a recurrence given as text, through the whole job. */
final class SequenceValues {
    private SequenceValues() {
    }

    /** Solves {@code input}, asserts the answer is verified, and returns its exact values at 0 … count−1. */
    static List<Rational> of(String input, int count) {
        List<Rational> points = IntStream.range(0, count).mapToObj(Rational::of).collect(Collectors.toList());
        Report report = Answers.report(input, 20, points);
        assertTrue(report.verified(), input + ": " + report.solution().checks());
        return report.values().stream().map(PointValue::exact).map(Optional::orElseThrow).collect(Collectors.toList());
    }
}
