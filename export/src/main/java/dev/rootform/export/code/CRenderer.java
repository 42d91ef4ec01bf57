package dev.rootform.export.code;

import dev.rootform.export.CType;
import dev.rootform.export.CVariant;
import dev.rootform.export.CodeFacts;
import dev.rootform.export.CodeModel;
import dev.rootform.export.NumericForm;
import dev.rootform.export.Report;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * C99 that evaluates the closed form of a fitted solution in one {@link CVariant}: a value function
 * {@code REAL NAME(long n)} or {@code REAL NAME(REAL t)} in double or float (below the first index a
 * sequence function returns NaN), calling pow/exp/cos (powf/expf/cosf) or, without libm, only
 * + − × ÷ with powers by repeated squaring; and for an integer-valued recurrence the exact term
 * {@code int NAME_term(long n, int64_t *out)} ({@link CExactTerm}). No allocation, no stdio, no
 * recursion.
 *
 * @since 0.2
 */
public final class CRenderer {
    private CRenderer() {
    }

    /** {@link #render(Report, String, Optional, CVariant)} in double precision with the math library. */
    public static CSource render(Report r, String function, Optional<String> headerFile) {
        return render(r, function, headerFile, CVariant.DEFAULT);
    }

    /**
     * Why {@code r} has no C code in {@code variant}, as one line; empty when it has (it carries a code
     * model, see {@link CodeRequests#refusal}, and without libm the closed form needs no e^x or cos x, or
     * the sequence has an exact integer term).
     */
    public static Optional<String> refusal(Report r, CVariant variant) {
        return CodeRequests.refusal(r).or(() -> {
            CodeModel model = r.code().orElseThrow();
            if (model.facts(variant).isPresent() || !variant.libm() && model.exact().isPresent()) {
                return Optional.empty();
            }
            if (variant.libm()) {
                return Optional.of("--c-type " + variant.type().keyword() + " cannot hold the constants of this closed form");
            }
            return Optional.of(model.form().differential()
                    ? "--c-no-libm: a differential equation's closed form needs exp from the C math library; drop --c-no-libm"
                    : "--c-no-libm: the closed form needs cos from the C math library and the sequence has no exact integer term; "
                            + "drop --c-no-libm");
        });
    }

    /**
     * @param function the function name (validated by {@link Identifiers#cFunctionRefusal})
     * @param headerFile the header's file name (validated by {@link Identifiers#cHeaderRefusal}), or empty for one file
     * @param variant the floating type and whether the code may call the math library
     * @throws IllegalArgumentException for a bad name, or a report {@link #refusal} refuses (callers check first)
     */
    public static CSource render(Report r, String function, Optional<String> headerFile, CVariant variant) {
        CodeRequests.require(Identifiers.cFunctionRefusal("--function", function)
                .or(() -> headerFile.flatMap(Identifiers::cHeaderRefusal))
                .or(() -> refusal(r, variant)));
        CodeModel model = r.code().orElseThrow();
        NumericForm form = model.form();
        Optional<CodeFacts> facts = model.facts(variant);
        Optional<CExactTerm> term = model.exact().map(e -> new CExactTerm(e, function));
        List<String> lines = CodeHeader.lines(r, form, facts, variant, term.map(CExactTerm::headerLines).orElse(List.of()));
        StringBuilder comment = new StringBuilder("/*\n");
        lines.forEach(l -> comment.append(" * ").append(l).append('\n'));
        comment.append(" */\n");
        String real = variant.type().keyword();
        String signature = real + " " + function + (form.differential() ? "(" + real + " t)" : "(long n)");
        StringBuilder declarations = new StringBuilder();
        facts.ifPresent(f -> declarations.append("/* The closed form in ")
                .append(variant.type() == CType.DOUBLE ? "double precision" : "single precision")
                .append(form.differential() ? "" : "; NAN below the first index").append(". */\n").append(signature).append(";\n"));
        term.ifPresent(t -> declarations.append(t.declaration()));
        List<String> includes = new ArrayList<>();
        if (variant.libm() && facts.isPresent()) {
            includes.add("#include <math.h>\n");
        }
        if (term.isPresent()) {
            includes.add("#include <stdint.h>\n");
        }
        StringBuilder c = new StringBuilder(comment);
        headerFile.ifPresentOrElse(h -> c.append("#include \"").append(h).append("\"\n").append(String.join("", includes)),
                () -> c.append(String.join("", includes)).append(declarations));
        facts.ifPresent(f -> c.append('\n').append(valueFunction(form, function, signature, variant)));
        term.ifPresent(t -> c.append('\n').append(t.definition()));
        String guard = function.toUpperCase(Locale.ROOT) + "_H";
        Optional<String> header = headerFile.map(h -> comment + "#ifndef " + guard + "\n#define " + guard + "\n\n"
                + (term.isPresent() ? "#include <stdint.h>\n\n" : "") + declarations + "\n#endif\n");
        return new CSource(c.toString(), header);
    }

    /** The constant arrays, the repeated-squaring helper without libm, and the value function. */
    private static String valueFunction(NumericForm form, String function, String signature, CVariant variant) {
        String real = variant.type().keyword();
        WaveLoop.Dialect dialect = WaveLoop.Dialect.c(variant, function + "_ipow");
        StringBuilder c = new StringBuilder();
        for (WaveLoop.Array a : WaveLoop.arrays(form, dialect)) {
            c.append("static const ").append(a.kind() == WaveLoop.Kind.REAL ? real : a.kind().name().toLowerCase(Locale.ROOT))
                    .append(' ').append(array(function, a.name())).append("[] = {").append(String.join(", ", a.values())).append("};\n");
        }
        if (!form.series().isEmpty()) {
            c.append("static const ").append(real).append(' ').append(array(function, "SERIES_RADIUS")).append(" = ")
                    .append(WaveLoop.seriesRadius(form, dialect)).append(";\n");
        }
        if (!form.leading().isEmpty()) {
            c.append("static const ").append(real).append(' ').append(array(function, "LEADING")).append("[] = {")
                    .append(String.join(", ", form.leading().stream().map(dialect::literal).toList())).append("};\n");
        }
        String nan = variant.libm() ? "NAN" : array(function, "NAN");
        if (!variant.libm() && !form.differential()) {
            c.append("static const ").append(real).append(' ').append(nan).append(" = ").append(dialect.literal(0.0)).append(" / ")
                    .append(dialect.literal(0.0)).append(";\n\n")
                    .append(ipow(function + "_ipow", real, dialect.literal(1.0)));
        }
        c.append('\n').append(signature).append(" {\n");
        if (form.differential()) {
            c.append("    ").append(real).append(" v = t - ").append(dialect.literal(form.origin())).append(";\n");
        } else {
            c.append("    ").append(real).append(" v;\n    if (n < ").append(form.first()).append("L) {\n        return ").append(nan)
                    .append(";\n    }\n");
            if (!form.leading().isEmpty()) {
                c.append("    if (n < ").append(form.validFrom()).append("L) {\n        return ").append(array(function, "LEADING"))
                        .append("[n - ").append(form.first()).append("L];\n    }\n");
            }
            c.append("    v = (").append(real).append(") n;\n");
        }
        return c.append(WaveLoop.body(form, dialect, name -> array(function, name), "    ")).append("}\n").toString();
    }

    /** base^e by repeated squaring (e &lt; 0: 1/base^-e), as {@link NumericForm#power} models it. */
    private static String ipow(String name, String real, String one) {
        return """
                /* base^e by repeated squaring; 1/base^-e for e < 0. */
                static REAL NAME(REAL base, long e) {
                    unsigned long k = e < 0L ? 0UL - (unsigned long) e : (unsigned long) e;
                    REAL result = ONE;
                    while (k != 0UL) {
                        if ((k & 1UL) != 0UL) {
                            result *= base;
                        }
                        base *= base;
                        k >>= 1;
                    }
                    return e < 0L ? ONE / result : result;
                }
                """.replace("REAL", real).replace("ONE", one).replace("NAME", name);
    }

    private static String array(String function, String name) {
        return function + "_" + name.toLowerCase(Locale.ROOT);
    }
}
