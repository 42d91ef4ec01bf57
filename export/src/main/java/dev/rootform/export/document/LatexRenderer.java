package dev.rootform.export.document;

import dev.rootform.export.Report;
import dev.rootform.export.notation.CommentText;
import dev.rootform.export.notation.LatexNotation;
import java.util.ArrayList;
import java.util.List;

/**
 * The answer in LaTeX: {@code %} comment lines (equation, conditions, validity, caution), then one
 * {@code aligned} environment of labelled {@link FormulaRows} — the equation and conditions as
 * mathematics, the characteristic polynomial and its factors, the real closed form with exact
 * constants, the numerically fixed constants with their accuracy, and where it holds. Long rows
 * are broken at + and − so that every line fits the text width of an A4 page at 10 pt. The
 * fragment is meant for a display environment ({@code \[ … \]} or {@code equation*}) and needs
 * {@code amsmath} and {@code amssymb}; {@link #document} wraps it in a complete article.
 *
 * @since 0.2
 */
public final class LatexRenderer {
    private static final String PREAMBLE =
            "\\documentclass[10pt,a4paper]{article}\n\\usepackage{amsmath}\n\\usepackage{amssymb}\n\\begin{document}\n";

    /** The widest line of a row, in characters of the plain form (A4 at 10 pt, after the label column). */
    static final int WIDTH = 50;

    private LatexRenderer() {
    }

    /** The fragment, ending in a newline. */
    public static String render(Report r) {
        StringBuilder out = new StringBuilder();
        CommentText.lines(r.solution()).forEach(l -> out.append("% ").append(l).append('\n'));
        List<String> lines = new ArrayList<>();
        for (FormulaRows.Row row : FormulaRows.of(r, LatexNotation.INSTANCE, WIDTH, ",\\; ")) {
            for (int i = 0; i < row.lines().size(); i++) {
                lines.add("&" + (i == 0 ? "\\text{" + row.label() + ":}" : "") + " && " + (i == 0 ? "" : "\\quad ")
                        + row.lines().get(i));
            }
        }
        return out.append("\\begin{aligned}\n").append(String.join(" \\\\\n", lines)).append("\n\\end{aligned}\n").toString();
    }

    /**
     * A complete document around {@link #render}: the article class at 10 pt on A4 with amsmath
     * and amssymb only, the fragment in a display.
     */
    public static String document(Report r) {
        String fragment = render(r);
        int body = fragment.indexOf("\\begin{aligned}");
        return fragment.substring(0, body) + PREAMBLE + "\\[\n" + fragment.substring(body) + "\\]\n\\end{document}\n";
    }

    /**
     * A fragment of display formulas and comment lines as a complete document: the comment lines
     * before the first formula stay before the preamble, the rest is the body.
     */
    static String document(List<String> fragment) {
        int body = 0;
        while (body < fragment.size() && fragment.get(body).startsWith("%")) {
            body++;
        }
        StringBuilder s = new StringBuilder();
        fragment.subList(0, body).forEach(line -> s.append(line).append('\n'));
        s.append(PREAMBLE);
        fragment.subList(body, fragment.size()).forEach(line -> s.append(line).append('\n'));
        return s.append("\\end{document}\n").toString();
    }

    /**
     * Plain text in LaTeX math, for the state-space renderer's polynomials and numbers: {@code ·} as
     * \cdot, {@code y^(4)} as y^{(4)}, other powers braced.
     */
    static String math(String plain) {
        return plain.replace("·", " \\cdot ").replace("π", "\\pi ").replace("λ", "\\lambda ").replace("√", "\\sqrt ")
                .replaceAll("\\^\\((\\d+)\\)", "^{($1)}").replaceAll("\\^\\(([^()]*)\\)", "^{$1}");
    }
}
