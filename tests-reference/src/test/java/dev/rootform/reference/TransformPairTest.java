package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.rootform.numeric.analysis.PointValue;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

/**
 * Responses of transfer functions whose inverse transform is a textbook pair (table and sources in
 * {@code transform-pairs.csv}, written from memory): the response's values at several points equal
 * the pair's time function, evaluated here in double precision.
 */
class TransformPairTest {
    private static final List<String> TIMES = List.of("0.5", "1", "2.5", "4");
    private static final List<String> INDICES = List.of("0", "1", "2", "3", "7", "12");

    @ParameterizedTest(name = "{0} to {1}")
    @CsvFileSource(resources = "/reference/transform-pairs.csv", delimiter = '|')
    void responseIsTheTextbookPair(String transfer, String input, String kind, String a, String w) {
        boolean continuous = transfer.contains("(s)");
        List<String> points = continuous ? TIMES : INDICES;
        List<PointValue> values = Responses.values(transfer, input, points);
        double p = dev.rootform.symbolic.algebra.Rational.parse(a).doubleValue();
        double q = Double.parseDouble(w);
        for (int i = 0; i < points.size(); i++) {
            double v = Double.parseDouble(points.get(i));
            double expected = expected(kind, p, q, v);
            assertEquals(expected, values.get(i).value().doubleValue(), 1e-12 * Math.max(1, Math.abs(expected)),
                    transfer + " at " + v);
        }
    }

    private static double expected(String kind, double a, double w, double v) {
        switch (kind) {
            case "exp": return Math.exp(a * v);
            case "sin": return Math.sin(w * v);
            case "cos": return Math.cos(w * v);
            case "texp": return v * Math.exp(a * v);
            case "dampedsin": return Math.exp(a * v) * Math.sin(w * v);
            case "rise": return (1 - Math.exp(-a * v)) / a;
            case "t": return v;
            case "pow": return Math.pow(a, v);
            case "n": return v;
            case "npow": return v * Math.pow(a, v);
            case "cospi2": return Math.round(Math.cos(Math.PI * v / 2));
            case "delayedpow": return v == 0 ? 0 : Math.pow(a, v - 1);
            case "one": return 1;
            default: throw new IllegalArgumentException(kind);
        }
    }
}
