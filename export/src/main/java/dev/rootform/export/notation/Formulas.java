package dev.rootform.export.notation;

import dev.rootform.symbolic.closedform.ClosedForm;

/**
 * The right-hand side of a closed form as a formula, in plain text or LaTeX. Both come from the
 * same walk of the tree, so they say the same thing term by term.
 *
 * @since 0.1
 */
public final class Formulas {
    private Formulas() {
    }

    /** e.g. {@code (1/5·√5)·(1/2 + 1/2·√5)^n - (1/5·√5)·(1/2 - 1/2·√5)^n}; {@code 0} for no terms. */
    public static String plain(ClosedForm f) {
        return new FormulaWriter(PlainNotation.INSTANCE, f).formula();
    }

    /** e.g. {@code e^{-t} \left(\cos\left(2 t\right)+\frac{1}{2} \sin\left(2 t\right)\right)}; math mode, no delimiters. */
    public static String latex(ClosedForm f) {
        return new FormulaWriter(LatexNotation.INSTANCE, f).formula();
    }

    /** The same formula as presentation-MathML content (no {@code <math>} element around it). */
    public static String mathml(ClosedForm f) {
        return new FormulaWriter(MathMlNotation.INSTANCE, f).formula();
    }
}
