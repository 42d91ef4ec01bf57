package dev.rootform.export.notation;

import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.model.LinearEquation;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Breaks a long formula into lines at + and − signs, outermost first where it can: a break may
 * fall inside parentheses (the notation closes the open groups at the end of the line and reopens
 * them on the next, as {@code \right.} … {@code \left.}), but never inside a fraction, a power, a
 * root or a sum's subscript. Widths are measured on the plain-text form of the same walk (one unit
 * per character, a safe over-estimate of typeset width: a stacked fraction is narrower than
 * {@code a/b}), so every notation breaks at the same places.
 *
 * @since 0.3
 */
public final class LineBreaker {
    /** Marks a place where a line may break; never part of the output. */
    public static final String MARK = "\uE000";

    private final Notation n;
    private final int width;

    /**
     * @param notation the notation of the lines
     * @param width the widest line, in characters of plain text
     */
    public LineBreaker(Notation notation, int width) {
        this.n = notation;
        this.width = width;
    }

    /** The widest line, in characters of plain text. */
    public int width() {
        return width;
    }

    /** The right-hand side of a closed form in lines. */
    public List<String> formula(ClosedForm f) {
        return lines(new FormulaWriter(PlainNotation.INSTANCE, f, true).formula(), new FormulaWriter(n, f, true).formula());
    }

    /** The equation in lines. */
    public List<String> equation(LinearEquation eq) {
        return lines(new EquationFormula(PlainNotation.INSTANCE, true).equation(eq), new EquationFormula(n, true).equation(eq));
    }

    /** A polynomial in descending powers of λ, in lines. */
    public List<String> polynomial(RationalPolynomial p) {
        return lines(EquationFormula.polynomial(PlainNotation.INSTANCE, p), EquationFormula.polynomial(n, p));
    }

    /**
     * Pieces (e.g. conditions) joined by {@code separator}, packed into lines; a line of pieces
     * is measured by the pieces' plain forms.
     */
    public List<String> list(List<String> plain, List<String> written, String separator) {
        return lines(String.join(", " + MARK, plain), String.join(separator + MARK, written));
    }

    /**
     * A formula that the caller marked, in lines: the plain form measures each part, the written
     * form (in this breaker's notation) gives the lines.
     *
     * @param plain the plain form with {@link #MARK} where a line may break
     * @param written the same in the notation, with marks in the same places
     */
    public List<String> lines(String plain, String written) {
        String[] widths = plain.split(MARK, -1);
        String[] parts = written.split(MARK, -1);
        if (widths.length != parts.length) {
            throw new IllegalStateException("plain and written forms disagree: " + widths.length + " != " + parts.length);
        }
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder(parts[0]);
        StringBuilder sofar = new StringBuilder(parts[0]);
        int used = widths[0].length();
        boolean split = false;
        for (int i = 1; i < parts.length; i++) {
            Optional<Integer> open = n.openGroups(sofar.toString());
            if (used + widths[i].length() > width && open.isPresent() && used > 0) {
                lines.add(line + n.closeGroups(open.get()));
                line = new StringBuilder(n.reopenGroups(open.get()));
                split |= open.get() > 0;
                used = 0;
            }
            line.append(parts[i]);
            sofar.append(parts[i]);
            used += widths[i].length();
        }
        lines.add(line.toString());
        return split ? lines.stream().map(n::unpairedFences).toList() : lines;
    }
}
