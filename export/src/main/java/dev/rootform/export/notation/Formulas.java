package dev.rootform.export.notation;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.model.Domain;
import java.util.List;

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

    /** The closed form as a MathML expression (the contents of a {@code <math>} element). */
    public static String mathMl(ClosedForm f) {
        return new FormulaWriter(MathMlNotation.INSTANCE, f).formula();
    }

    /** A polynomial in descending powers of {@code variable}, in LaTeX, e.g. {@code s^{2}+2 s+5}. */
    public static String latex(RationalPolynomial p, String variable) {
        return writer(LatexNotation.INSTANCE).polynomial(p, LatexNotation.INSTANCE.name(variable));
    }

    /** A polynomial in descending powers of {@code variable}, in MathML. */
    public static String mathMl(RationalPolynomial p, String variable) {
        return writer(MathMlNotation.INSTANCE).polynomial(p, MathMlNotation.INSTANCE.name(variable));
    }

    /** A writer for polynomials only (its closed form is empty). */
    private static FormulaWriter writer(Notation n) {
        return new FormulaWriter(n, new ClosedForm(Domain.DIFFERENTIAL, "y", "t", Rational.ZERO, 0, List.of(), List.of(), List.of()));
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
