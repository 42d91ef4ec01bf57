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
 * The evaluation code of generated files, written once for Java and every C variant: the same
 * statements as {@link NumericForm#valueAt(double, CVariant)} and {@link NumericForm#sum(double, CVariant)}
 * — near t0 the Taylor series (SERIES, SERIES_RADIUS), else the loop over the constant arrays
 * AMPLITUDE, POWER, GROWTH, FREQUENCY, PHASE (the last two left out when no term oscillates and the
 * code may not call the math library) and, when some angle is reduced exactly, MODULUS and
 * MULTIPLIER. The growth factor (pow or exp, the costly call) is taken once per run of equal rates
 * (the waves n^p·λ^n of one repeated root follow each other) and reused, which gives the same value as
 * calling it again.
 *
 * @since 0.2
 */
final class WaveLoop {
    private static final String SERIES = """
            if (ABS(v) <= SERIES_RADIUS) {
                REAL s = v / SERIES_RADIUS;
                REAL sum = ZERO;
                for (int d = SERIES_COUNT - 1; d >= 0; d--) {
                    sum = sum * s + SERIES[d];
                }
                return sum;
            }
            """;
    private static final String TEMPLATE = """
            REAL total = ZERO;
            REAL growth = ZERO;
            for (int i = 0; i < COUNT; i++) {
                if (i == 0 || GROWTH[i] != GROWTH[i - 1]) {
                    growth = GROWTH_FACTOR;
                }
                REAL term = AMPLITUDE[i] * growth;
                if (POWER[i] > 0) {
                    term *= POW(v, POWER[i]);
                }
            COSINE    total += term;
            }
            return total;
            """;
    private static final String COSINE = """
                if (FREQUENCY[i] != ZERO) {
                    term *= COS(ANGLE + PHASE[i]);
                }
            """;
    private static final String[] NAMES = {"AMPLITUDE", "POWER", "GROWTH", "FREQUENCY", "PHASE", "MODULUS", "MULTIPLIER"};
    private static final String JAVA_REDUCED = "Math.floorMod(Math.floorMod(n, MODULUS[i]) * MULTIPLIER[i], MODULUS[i])";
    private static final String C_REDUCED = "((n % MODULUS[i] + MODULUS[i]) % MODULUS[i] * MULTIPLIER[i] % MODULUS[i])";

    /**
     * How one language writes the loop.
     *
     * @param type the floating type
     * @param math the prefix of pow/exp/cos ({@code StrictMath.} or empty), or null without libm
     * @param power the repeated-squaring function without libm (base, long exponent), else null
     * @param abs the absolute value of the floating type
     * @param reduced (n·MULTIPLIER[i]) mod MODULUS[i] for any index n, as an expression
     */
    record Dialect(CType type, String math, String power, String abs, String reduced) {
        /** Java with StrictMath. */
        static final Dialect JAVA = new Dialect(CType.DOUBLE, "StrictMath.", null, "StrictMath.abs", JAVA_REDUCED);

        /** C of {@code variant}; {@code power} names the repeated-squaring function when it has no libm. */
        static Dialect c(CVariant variant, String power) {
            String abs = variant.type() == CType.FLOAT ? "fabsf" : "fabs";
            return variant.libm() ? new Dialect(variant.type(), "", null, abs, C_REDUCED)
                    : new Dialect(variant.type(), null, power, abs, C_REDUCED);
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

    /** The element type of a constant array: int, long, or the floating type of the code. */
    enum Kind {
        INT, LONG, REAL
    }

    /**
     * One constant array of the loop.
     *
     * @param name AMPLITUDE, POWER, ...
     * @param kind what its elements are
     * @param values the initialisers as literals
     */
    record Array(String name, Kind kind, List<String> values) {
    }

    private WaveLoop() {
    }

    /**
     * The body of the value function after {@code v} is set, each line indented by {@code indent};
     * it reads {@code v}, and {@code n} for a sequence without libm or with angles reduced exactly.
     *
     * @param array the name under which an array or constant such as AMPLITUDE is emitted
     */
    static String body(NumericForm form, Dialect dialect, UnaryOperator<String> array, String indent) {
        String growth = form.differential() ? "EXP(GROWTH[i] * v)" : dialect.libm() ? "POW(GROWTH[i], v)" : "POW(GROWTH[i], n)";
        String angle = form.reduces() ? "(MODULUS[i] > 0 ? FREQUENCY[i] * (REAL) REDUCED : FREQUENCY[i] * v)" : "FREQUENCY[i] * v";
        String code = (form.series().isEmpty() ? "" : SERIES) + TEMPLATE;
        code = code.replace("GROWTH_FACTOR", growth).replace("COSINE", dialect.libm() ? COSINE : "")
                .replace("ANGLE", angle).replace("REDUCED", dialect.reduced())
                .replace("SERIES_COUNT", Integer.toString(form.series().size())).replace("COUNT", Integer.toString(form.waves().size()))
                .replace("ABS(", dialect.abs() + "(")
                .replace("REAL", dialect.type().keyword()).replace("ZERO", dialect.literal(0.0));
        code = dialect.libm() ? code.replace("POW(", dialect.call("pow") + "(").replace("EXP(", dialect.call("exp") + "(")
                .replace("COS(", dialect.call("cos") + "(") : code.replace("POW(", dialect.power() + "(");
        code = code.replace("SERIES_RADIUS", array.apply("SERIES_RADIUS")).replace("SERIES[", array.apply("SERIES") + "[");
        for (String name : NAMES) {
            code = code.replace(name + "[", array.apply(name) + "[");
        }
        return code.lines().map(l -> indent + l).reduce("", (a, b) -> a + b + "\n");
    }

    /**
     * The arrays the body of {@code dialect} reads, in the order AMPLITUDE, POWER, GROWTH[, FREQUENCY,
     * PHASE[, MODULUS, MULTIPLIER]][, SERIES]; the series radius is {@link #seriesRadius}.
     */
    static List<Array> arrays(NumericForm form, Dialect dialect) {
        List<Array> out = new ArrayList<>();
        out.add(array(form, dialect, "AMPLITUDE", Wave::amplitude));
        out.add(new Array("POWER", Kind.INT, form.waves().stream().map(w -> Integer.toString(w.power())).toList()));
        out.add(array(form, dialect, "GROWTH", Wave::growth));
        if (dialect.libm()) {
            out.add(array(form, dialect, "FREQUENCY", Wave::frequency));
            out.add(array(form, dialect, "PHASE", Wave::phase));
            if (form.reduces()) {
                out.add(new Array("MODULUS", Kind.LONG, form.waves().stream().map(w -> Long.toString(w.modulus())).toList()));
                out.add(new Array("MULTIPLIER", Kind.LONG, form.waves().stream().map(w -> Long.toString(w.multiplier())).toList()));
            }
        }
        if (!form.series().isEmpty()) {
            out.add(new Array("SERIES", Kind.REAL, form.series().stream().map(dialect::literal).toList()));
        }
        return out;
    }

    /** The literal of the series radius (a power of two) in the dialect's type; only when the form has a series. */
    static String seriesRadius(NumericForm form, Dialect dialect) {
        return dialect.literal(form.seriesRadius());
    }

    private static Array array(NumericForm form, Dialect dialect, String name, ToDoubleFunction<Wave> value) {
        return new Array(name, Kind.REAL, form.waves().stream().map(w -> dialect.literal(value.applyAsDouble(w))).toList());
    }
}
