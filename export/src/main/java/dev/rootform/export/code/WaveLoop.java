package dev.rootform.export.code;

import dev.rootform.export.NumericForm;
import dev.rootform.export.Wave;
import java.util.ArrayList;
import java.util.List;
import java.util.function.UnaryOperator;

/**
 * The evaluation code of generated files, written once for Java and C: the same statements as
 * {@link NumericForm#valueAt(double)} and {@link NumericForm#valueAt(long)} — near t0 the Taylor
 * series (SERIES, SERIES_RADIUS), else the loop over the arrays AMPLITUDE, POWER, GROWTH, FREQUENCY,
 * PHASE and, when some angle is reduced exactly, MODULUS and MULTIPLIER.
 *
 * @since 0.2
 */
final class WaveLoop {
    private static final String SERIES = """
            if (ABS(v) <= SERIES_RADIUS) {
                double s = v / SERIES_RADIUS;
                double sum = 0.0;
                for (int d = SERIES_COUNT - 1; d >= 0; d--) {
                    sum = sum * s + SERIES[d];
                }
                return sum;
            }
            """;
    private static final String LOOP = """
            double total = 0.0;
            for (int i = 0; i < COUNT; i++) {
                double term = AMPLITUDE[i] * GROWTH_FACTOR;
                if (POWER[i] > 0) {
                    term *= MATHpow(v, POWER[i]);
                }
                if (FREQUENCY[i] != 0.0) {
                    term *= MATHcos(ANGLE + PHASE[i]);
                }
                total += term;
            }
            return total;
            """;

    /** Names of the wave arrays, in the order of {@link #arrays}; MODULUS and MULTIPLIER only when {@link NumericForm#reduces}. */
    private static final List<String> NAMES = List.of("AMPLITUDE", "POWER", "GROWTH", "FREQUENCY", "PHASE", "MODULUS", "MULTIPLIER");

    /**
     * How one target language spells the loop.
     *
     * @param math prefix of the math functions ({@code StrictMath.} or empty)
     * @param abs the absolute value of a double ({@code StrictMath.abs} or {@code fabs})
     * @param reduced (n·MULTIPLIER[i]) mod MODULUS[i] for any index n, as an expression
     * @param array the name under which an array or constant such as AMPLITUDE is emitted
     */
    record Dialect(String math, String abs, String reduced, UnaryOperator<String> array) {
    }

    /** One emitted array: its name, element type and elements. */
    record Array(String name, String type, List<String> elements) {
    }

    private WaveLoop() {
    }

    /** The body of the value function after {@code v} is set, each line indented by {@code indent}. */
    static String body(NumericForm form, Dialect dialect, String indent) {
        String growth = form.differential() ? "MATHexp(GROWTH[i] * v)" : "MATHpow(GROWTH[i], v)";
        String angle = form.reduces() ? "(MODULUS[i] > 0 ? FREQUENCY[i] * (double) REDUCED : FREQUENCY[i] * v)" : "FREQUENCY[i] * v";
        String code = (form.series().isEmpty() ? "" : SERIES) + LOOP;
        code = code.replace("GROWTH_FACTOR", growth).replace("ANGLE", angle).replace("REDUCED", dialect.reduced())
                .replace("SERIES_COUNT", Integer.toString(form.series().size())).replace("COUNT", Integer.toString(form.waves().size()))
                .replace("ABS(", dialect.abs() + "(").replace("MATH", dialect.math());
        for (String name : List.of("SERIES_RADIUS", "SERIES")) {
            code = code.replace(name, dialect.array().apply(name));
        }
        for (String name : NAMES) {
            code = code.replace(name + "[", dialect.array().apply(name) + "[");
        }
        return code.lines().map(l -> indent + l).reduce("", (a, b) -> a + b + "\n");
    }

    /** The arrays the body reads: the waves' constants, then SERIES when there is a series. */
    static List<Array> arrays(NumericForm form) {
        List<Array> out = new ArrayList<>();
        List<Wave> waves = form.waves();
        out.add(new Array("AMPLITUDE", "double", waves.stream().map(w -> Double.toString(w.amplitude())).toList()));
        out.add(new Array("POWER", "int", waves.stream().map(w -> Integer.toString(w.power())).toList()));
        out.add(new Array("GROWTH", "double", waves.stream().map(w -> Double.toString(w.growth())).toList()));
        out.add(new Array("FREQUENCY", "double", waves.stream().map(w -> Double.toString(w.frequency())).toList()));
        out.add(new Array("PHASE", "double", waves.stream().map(w -> Double.toString(w.phase())).toList()));
        if (form.reduces()) {
            out.add(new Array("MODULUS", "long", waves.stream().map(w -> Long.toString(w.modulus())).toList()));
            out.add(new Array("MULTIPLIER", "long", waves.stream().map(w -> Long.toString(w.multiplier())).toList()));
        }
        if (!form.series().isEmpty()) {
            out.add(new Array("SERIES", "double", form.series().stream().map(d -> Double.toString(d)).toList()));
        }
        return out;
    }
}
