package dev.rootform.export.notation;

import static dev.rootform.export.Fixtures.at;
import static dev.rootform.export.Fixtures.derivativeAt;
import static dev.rootform.export.Fixtures.difference;
import static dev.rootform.export.Fixtures.differential;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.Fixtures;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.Angle;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.model.Domain;
import java.util.List;
import org.junit.jupiter.api.Test;

class FormulasTest {
    private static Coefficient exact(long p, long q) {
        return new Coefficient.Exact(Surd.of(Rational.of(p, q)));
    }

    private static Surd surd(long a, long b, long r) {
        return Surd.of(Rational.of(a), Rational.of(b), Rational.of(r));
    }

    private static ClosedForm form(Domain d, Term... terms) {
        String v = d == Domain.DIFFERENCE ? "n" : "t";
        return new ClosedForm(d, "y", v, Rational.ZERO, 0, List.of(), List.of(terms), List.of());
    }

    /** Asserts the exact plain text, and that the LaTeX has balanced braces; returns the LaTeX. */
    private static String check(String plain, ClosedForm f) {
        assertEquals(plain, Formulas.plain(f));
        String latex = Formulas.latex(f);
        int depth = 0;
        for (char c : latex.toCharArray()) {
            depth += c == '{' ? 1 : c == '}' ? -1 : 0;
            assertTrue(depth >= 0, latex);
        }
        assertEquals(0, depth, latex);
        assertEquals(count(latex, "\\left("), count(latex, "\\right)"), latex);
        return latex;
    }

    private static int count(String text, String part) {
        return (text.length() - text.replace(part, "").length()) / part.length();
    }

    @Test
    void fibonacci() {
        String latex = check("(1/5·√5)·(1/2 + 1/2·√5)^n - (1/5·√5)·(1/2 - 1/2·√5)^n", Fixtures.fibonacci().closedForm());
        assertEquals("\\frac{1}{5} \\sqrt{5} \\left(\\frac{1}{2}+\\frac{1}{2} \\sqrt{5}\\right)^{n}"
                + "-\\frac{1}{5} \\sqrt{5} \\left(\\frac{1}{2}-\\frac{1}{2} \\sqrt{5}\\right)^{n}", latex);
    }

    @Test
    void criticallyDamped() {
        ClosedForm f = differential(List.of(at(0, 1), derivativeAt(1, Rational.ZERO, 0)), 1, 2, 1).closedForm();
        assertEquals("e^{-t}+t e^{-t}", check("e^(-t) + t·e^(-t)", f));
    }

    @Test
    void dampedOscillator() {
        String latex = check("e^(-t)·(cos(2t) + 1/2·sin(2t))", Fixtures.dampedOscillator().closedForm());
        assertEquals("e^{-t} \\left(\\cos\\left(2 t\\right)+\\frac{1}{2} \\sin\\left(2 t\\right)\\right)", latex);
    }

    @Test
    void complexRootsAtQuarterTurn() {
        ClosedForm f = difference(List.of(at(0, 1), at(1, 2)), 2, -2, 1).closedForm();
        String latex = check("2^(n/2)·(cos(πn/4) + sin(πn/4))", f);
        assertTrue(latex.contains("\\cos\\left(\\frac{\\pi n}{4}\\right)"), latex);
    }

    @Test
    void conjugateSumOverAnIrreducibleCubic() {
        ClosedForm f = differential(List.of(at(0, 1), derivativeAt(1, Rational.ZERO, 0), derivativeAt(2, Rational.ZERO, 0)),
                -1, -1, 0, 1).closedForm();
        String latex = check("Σ_{λ^3 - λ - 1 = 0} (5/23 - 6/23·λ + 4/23·λ^2)·e^(λt)", f);
        assertTrue(latex.startsWith("\\sum_{\\lambda^{3}-\\lambda-1=0} \\left(\\frac{5}{23}"), latex);
        assertTrue(latex.endsWith("e^{\\lambda t}"), latex);
    }

    @Test
    void generalSolutionNamesItsConstants() {
        ClosedForm f = differential(List.of(), 1, 2, 1).closedForm();
        assertEquals("C_{1} e^{-t}+C_{2} t e^{-t}", check("C1·e^(-t) + C2·t·e^(-t)", f));
        check("e^(-t)·(C1·cos(2t) + C2·sin(2t))", differential(List.of(), 5, 2, 1).closedForm());
        check("Σ_{λ^3 - λ - 1 = 0} (C1 + C2·λ + C3·λ^2)·λ^n", difference(List.of(), -1, -1, 0, 1).closedForm());
    }

    @Test
    void shiftedOriginIsWrittenInTheVariable() {
        Rational t0 = Rational.of(3, 2);
        ClosedForm f = differential(List.of(derivativeAt(0, t0, 1), derivativeAt(1, t0, 0)), 1, 2, 1).closedForm();
        String latex = check("e^(-(t - 3/2)) + (t - 3/2)·e^(-(t - 3/2))", f);
        assertTrue(latex.startsWith("e^{-\\left(t-\\frac{3}{2}\\right)}"), latex);
    }

    @Test
    void zeroRootLeavesOneTerm() {
        ClosedForm f = difference(List.of(at(0, 5), at(1, 1)), 0, -2, 1).closedForm();
        assertEquals("\\frac{1}{2} \\cdot 2^{n}", check("1/2·2^n", f));
        assertEquals(List.of(Rational.of(5)), f.leadingValues());
    }

    @Test
    void emptyTermListIsZero() {
        assertEquals("0", check("0", form(Domain.DIFFERENTIAL)));
    }

    @Test
    void signsBasesAndPowers() {
        Surd one = Surd.of(Rational.ONE);
        check("-1/3·(-2)^n + n^3", form(Domain.DIFFERENCE,
                new Term.Exponential(exact(-1, 3), 0, Surd.of(Rational.of(-2))), new Term.Exponential(exact(1, 1), 3, one)));
        check("3·t^2 - (1 - √2)·e^(√3·t)", form(Domain.DIFFERENTIAL,
                new Term.Exponential(exact(3, 1), 2, Surd.of(Rational.ZERO)),
                new Term.Exponential(new Coefficient.Exact(surd(-1, 1, 2)), 0, surd(0, 1, 3))));
        check("(1/2)^n + (√2)^n + (-1 - √2)^n", form(Domain.DIFFERENCE,
                new Term.Exponential(exact(1, 1), 0, Surd.of(Rational.of(1, 2))),
                new Term.Exponential(exact(1, 1), 0, surd(0, 1, 2)),
                new Term.Exponential(exact(1, 1), 0, surd(-1, -1, 2))));
    }

    @Test
    void oscillationSignsAndAngles() {
        Surd minusOne = Surd.of(Rational.MINUS_ONE);
        Angle two = new Angle.Value(Surd.of(Rational.of(2)));
        check("-e^(-t)·sin(2t) - t·e^(-t)·(cos(2t) + 3/2·sin(2t))", form(Domain.DIFFERENTIAL,
                new Term.Oscillating(exact(0, 1), exact(-1, 1), 0, minusOne, two),
                new Term.Oscillating(exact(-1, 1), exact(-3, 2), 1, minusOne, two)));
        check("cos(1/2·√3·t)", form(Domain.DIFFERENTIAL, new Term.Oscillating(exact(1, 1), exact(0, 1), 0,
                Surd.of(Rational.ZERO), new Angle.Value(Surd.sqrt(Rational.of(3, 4))))));
        check("2^n·cos(n·arccos(1/3))", form(Domain.DIFFERENCE, new Term.Oscillating(exact(1, 1), exact(0, 1), 0,
                Surd.of(Rational.of(2)), new Angle.ArcCos(Surd.of(Rational.of(1, 3))))));
    }
}
