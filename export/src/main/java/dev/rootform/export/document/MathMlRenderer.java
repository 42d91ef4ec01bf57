package dev.rootform.export.document;

import dev.rootform.export.Report;
import dev.rootform.export.notation.CommentText;
import dev.rootform.export.notation.MathMlNotation;
import dev.rootform.export.notation.Xml;
import java.util.List;

/**
 * The answer as one presentation-MathML element ({@code <math xmlns=… display="block">}) preceded
 * by an XML comment (equation, conditions, validity, caution): a two-column table of labelled
 * {@link FormulaRows} — equation, conditions, characteristic polynomial and its factors, the
 * closed form (over the same formula walk as the other notations), the numerically fixed constants
 * with their accuracy, and where it holds. Cells are in display style; long rows are broken at +
 * and − into several table rows of at most {@value #WIDTH} plain characters. Well-formed XML; no
 * XML declaration, so it can be pasted into HTML.
 *
 * @since 0.2
 */
public final class MathMlRenderer {
    /** The MathML namespace. */
    public static final String NAMESPACE = "http://www.w3.org/1998/Math/MathML";
    /** The widest line of a row, in characters of the plain form (about 700 px at 16 px type). */
    public static final int WIDTH = 70;
    /** What separates listed items (conditions, leading values). */
    static final String SEPARATOR = "<mo separator=\"true\">,</mo><mspace width=\"0.5em\"></mspace>";
    private static final String LEFT = " style=\"text-align:left\" columnalign=\"left\"";

    private MathMlRenderer() {
    }

    /** The comment and the math element, ending in a newline. */
    public static String render(Report r) {
        StringBuilder out = new StringBuilder("<!--\n");
        CommentText.lines(r.solution()).forEach(l -> out.append("  ").append(l).append('\n'));
        return out.append("-->\n").append(math(rows(r, WIDTH))).toString();
    }

    /** The rows of {@code r} in MathML, lines at most {@code width} plain characters. */
    public static List<FormulaRows.Row> rows(Report r, int width) {
        return FormulaRows.of(r, MathMlNotation.INSTANCE, width, SEPARATOR);
    }

    /** A block {@code <math>} element laying out labelled rows as a two-column table. */
    public static String math(List<FormulaRows.Row> rows) {
        StringBuilder out = new StringBuilder("<math xmlns=\"").append(NAMESPACE).append("\" display=\"block\">\n<mtable")
                .append(LEFT).append(">\n");
        for (FormulaRows.Row row : rows) {
            for (int i = 0; i < row.lines().size(); i++) {
                String label = i == 0 ? "<mtext>" + Xml.escape(row.label()) + ":</mtext>" : "";
                String indent = i == 0 ? "" : "<mspace width=\"2em\"></mspace>";
                out.append("<mtr><mtd").append(LEFT).append(">").append(label).append("</mtd><mtd").append(LEFT)
                        .append("><mrow displaystyle=\"true\">").append(indent).append(row.lines().get(i))
                        .append("</mrow></mtd></mtr>\n");
            }
        }
        return out.append("</mtable>\n</math>\n").toString();
    }
}
