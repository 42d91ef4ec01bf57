package dev.rootform.export.code;

import dev.rootform.export.CodeFacts;
import dev.rootform.export.NumericForm;
import dev.rootform.export.Report;
import dev.rootform.symbolic.solve.Solution;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * C99 that evaluates the closed form of a fitted solution in double precision:
 * {@code double NAME(double t)} or {@code double NAME(long n)}; only {@code <math.h>}, no
 * allocation. Below the first index a sequence function returns NAN.
 *
 * @since 0.2
 */
public final class CRenderer {
    private CRenderer() {
    }

    /**
     * @param function the function name (validated by {@link Identifiers#cFunctionRefusal})
     * @param headerFile the header's file name (validated by {@link Identifiers#cHeaderRefusal}), or empty for one file
     * @throws IllegalArgumentException for a bad name, or a report {@link CodeRequests#refusal} refuses
     *     (callers check first)
     */
    public static CSource render(Report r, String function, Optional<String> headerFile) {
        CodeRequests.require(Identifiers.cFunctionRefusal("--function", function)
                .or(() -> headerFile.flatMap(Identifiers::cHeaderRefusal))
                .or(() -> CodeRequests.refusal(r)));
        Solution s = r.solution();
        NumericForm form = r.code().orElseThrow().form();
        CodeFacts facts = r.code().orElseThrow().facts();
        StringBuilder comment = new StringBuilder("/*\n");
        CodeHeader.lines(r, form, facts).forEach(l -> comment.append(" * ").append(l).append('\n'));
        comment.append(" */\n");
        String signature = "double " + function + (form.differential() ? "(double t)" : "(long n)");
        String guard = function.toUpperCase(java.util.Locale.ROOT) + "_H";
        String declaration = "/* The closed form in double precision" + (form.differential() ? "" : "; NAN below the first index")
                + ". */\n" + signature + ";\n";
        StringBuilder c = new StringBuilder(comment);
        headerFile.ifPresentOrElse(h -> c.append("#include \"").append(h).append("\"\n"), () -> c.append(declaration));
        c.append("#include <math.h>\n\n");
        String[][] arrays = WaveLoop.arrays(form);
        for (int i = 0; i < arrays.length; i++) {
            c.append("static const ").append(i == 1 ? "int " : "double ").append(array(function, WaveLoop.NAMES[i]))
                    .append("[] = {").append(String.join(", ", arrays[i])).append("};\n");
        }
        if (!form.leading().isEmpty()) {
            c.append("static const double ").append(array(function, "LEADING")).append("[] = {")
                    .append(form.leading().stream().map(String::valueOf).collect(Collectors.joining(", "))).append("};\n");
        }
        c.append('\n').append(signature).append(" {\n");
        if (form.differential()) {
            c.append("    double v = t - ").append(form.origin()).append(";\n");
        } else {
            c.append("    double v;\n    if (n < ").append(form.first()).append("L) {\n        return NAN;\n    }\n");
            if (!form.leading().isEmpty()) {
                c.append("    if (n < ").append(form.validFrom()).append("L) {\n        return ").append(array(function, "LEADING"))
                        .append("[n - ").append(form.first()).append("L];\n    }\n");
            }
            c.append("    v = (double) n;\n");
        }
        c.append(WaveLoop.body(form, "", name -> array(function, name), "    ")).append("}\n");
        Optional<String> header = headerFile.map(h -> comment + "#ifndef " + guard + "\n#define " + guard + "\n\n"
                + declaration + "\n#endif\n");
        return new CSource(c.toString(), header);
    }

    private static String array(String function, String name) {
        return function + "_" + name.toLowerCase(java.util.Locale.ROOT);
    }
}
