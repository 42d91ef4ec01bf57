package dev.rootform.export.code;

import dev.rootform.export.CodeFacts;
import dev.rootform.export.NumericForm;
import dev.rootform.export.Wave;
import java.util.function.UnaryOperator;

/**
 * The evaluation loop of generated code, written once for Java and C: the same statements as
 * {@link NumericForm#sum}, over the constant arrays AMPLITUDE, POWER, GROWTH, FREQUENCY, PHASE.
 *
 * @since 0.2
 */
final class WaveLoop {
    private static final String TEMPLATE = """
            double total = 0.0;
            for (int i = 0; i < COUNT; i++) {
                double term = AMPLITUDE[i] * GROWTH_FACTOR;
                if (POWER[i] > 0) {
                    term *= MATHpow(v, POWER[i]);
                }
                if (FREQUENCY[i] != 0.0) {
                    term *= MATHcos(FREQUENCY[i] * v + PHASE[i]);
                }
                total += term;
            }
            return total;
            """;

    /** Names of the arrays, in the order of {@link #arrays}. */
    static final String[] NAMES = {"AMPLITUDE", "POWER", "GROWTH", "FREQUENCY", "PHASE"};

    private WaveLoop() {
    }

    /**
     * The loop body, each line indented by {@code indent}.
     *
     * @param math prefix of the math functions ({@code StrictMath.} or empty)
     * @param array the name under which an array such as AMPLITUDE is emitted
     */
    static String body(NumericForm form, String math, UnaryOperator<String> array, String indent) {
        String growth = form.differential() ? "MATHexp(GROWTH[i] * v)" : "MATHpow(GROWTH[i], v)";
        String code = TEMPLATE.replace("GROWTH_FACTOR", growth).replace("COUNT", Integer.toString(form.waves().size()))
                .replace("MATH", math);
        for (String name : NAMES) {
            code = code.replace(name + "[", array.apply(name) + "[");
        }
        return code.lines().map(l -> indent + l).reduce("", (a, b) -> a + b + "\n");
    }

    /** The five arrays' contents, in the order AMPLITUDE, POWER, GROWTH, FREQUENCY, PHASE. */
    static String[][] arrays(NumericForm form) {
        int k = form.waves().size();
        String[][] out = new String[5][k];
        for (int i = 0; i < k; i++) {
            Wave w = form.waves().get(i);
            out[0][i] = Double.toString(w.amplitude());
            out[1][i] = Integer.toString(w.power());
            out[2][i] = Double.toString(w.growth());
            out[3][i] = Double.toString(w.frequency());
            out[4][i] = Double.toString(w.phase());
        }
        return out;
    }

}
