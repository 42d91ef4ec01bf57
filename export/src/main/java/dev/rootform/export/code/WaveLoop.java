package dev.rootform.export.code;

import dev.rootform.export.CType;
import dev.rootform.export.CVariant;
import dev.rootform.export.NumericForm;
import dev.rootform.export.Wave;
import java.util.ArrayList;
import java.util.List;
import java.util.function.ToDoubleFunction;
import java.util.function.UnaryOperator;

/**
 * The evaluation loop of generated code, written once for Java and every C variant: the same
 * statements as {@link NumericForm#sum(double, CVariant)}, over the constant arrays AMPLITUDE,
 * POWER, GROWTH, FREQUENCY, PHASE (the last two left out when no term oscillates and the code may
 * not call the math library).
 *
 * @since 0.2
 */
final class WaveLoop {
    private static final String TEMPLATE = """
            REAL total = ZERO;
            for (int i = 0; i < COUNT; i++) {
                REAL term = AMPLITUDE[i] * GROWTH_FACTOR;
                if (POWER[i] > 0) {
                    term *= POW(v, POWER[i]);
                }
            COSINE    total += term;
            }
            return total;
            """;
    private static final String COSINE = """
                if (FREQUENCY[i] != ZERO) {
                    term *= COS(FREQUENCY[i] * v + PHASE[i]);
                }
            """;
    private static final String[] NAMES = {"AMPLITUDE", "POWER", "GROWTH", "FREQUENCY", "PHASE"};

    /**
     * How one language writes the loop.
     *
     * @param type the floating type
     * @param math the prefix of pow/exp/cos ({@code StrictMath.} or empty), or null without libm
     * @param power the repeated-squaring function without libm (base, long exponent), else null
     */
    record Dialect(CType type, String math, String power) {
        /** Java with StrictMath. */
        static final Dialect JAVA = new Dialect(CType.DOUBLE, "StrictMath.", null);

        /** C of {@code variant}; {@code power} names the repeated-squaring function when it has no libm. */
        static Dialect c(CVariant variant, String power) {
            return variant.libm() ? new Dialect(variant.type(), "", null) : new Dialect(variant.type(), null, power);
        }

        boolean libm() {
            return math != null;
        }

        /** A literal of this type: {@code 0.5} or {@code 0.5f}. */
        String literal(double x) {
            return type == CType.FLOAT ? Float.toString((float) x) + "f" : Double.toString(x);
        }

        private String call(String function) {
            return math + function + (type == CType.FLOAT ? "f" : "");
        }
    }

    /**
     * One constant array of the loop.
     *
     * @param name AMPLITUDE, POWER, ...
     * @param integer whether it holds ints (POWER) rather than floating values
     * @param values the initialisers as literals
     */
    record Array(String name, boolean integer, List<String> values) {
    }

    private WaveLoop() {
    }

    /**
     * The loop body, each line indented by {@code indent}; it reads {@code v} (and {@code n} for a
     * sequence without libm).
     *
     * @param array the name under which an array such as AMPLITUDE is emitted
     */
    static String body(NumericForm form, Dialect dialect, UnaryOperator<String> array, String indent) {
        String growth = form.differential() ? "EXP(GROWTH[i] * v)" : dialect.libm() ? "POW(GROWTH[i], v)" : "POW(GROWTH[i], n)";
        String code = TEMPLATE.replace("GROWTH_FACTOR", growth).replace("COSINE", dialect.libm() ? COSINE : "")
                .replace("COUNT", Integer.toString(form.waves().size()))
                .replace("REAL", dialect.type().keyword()).replace("ZERO", dialect.literal(0.0));
        code = dialect.libm() ? code.replace("POW(", dialect.call("pow") + "(").replace("EXP(", dialect.call("exp") + "(")
                .replace("COS(", dialect.call("cos") + "(") : code.replace("POW(", dialect.power() + "(");
        for (String name : NAMES) {
            code = code.replace(name + "[", array.apply(name) + "[");
        }
        return code.lines().map(l -> indent + l).reduce("", (a, b) -> a + b + "\n");
    }

    /** The arrays the loop of {@code dialect} reads, in the order AMPLITUDE, POWER, GROWTH[, FREQUENCY, PHASE]. */
    static List<Array> arrays(NumericForm form, Dialect dialect) {
        List<Array> out = new ArrayList<>();
        out.add(array(form, dialect, "AMPLITUDE", Wave::amplitude));
        out.add(new Array("POWER", true, form.waves().stream().map(w -> Integer.toString(w.power())).toList()));
        out.add(array(form, dialect, "GROWTH", Wave::growth));
        if (dialect.libm()) {
            out.add(array(form, dialect, "FREQUENCY", Wave::frequency));
            out.add(array(form, dialect, "PHASE", Wave::phase));
        }
        return out;
    }

    private static Array array(NumericForm form, Dialect dialect, String name, ToDoubleFunction<Wave> value) {
        return new Array(name, false, form.waves().stream().map(w -> dialect.literal(value.applyAsDouble(w))).toList());
    }
}
