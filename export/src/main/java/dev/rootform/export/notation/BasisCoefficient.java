package dev.rootform.export.notation;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.closedform.Term;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * Each coefficient of a closed form with the basis function it multiplies, in term order: one
 * entry per exponential term, two (cos, sin) per oscillating term, one per power of λ in a root
 * sum. The basis is written by the formula walk from the same term with that coefficient set to 1
 * and the others to 0.
 *
 * @param coefficient the coefficient as exact plain text, e.g. {@code -1/5·√5} or {@code C2}
 * @param basis the basis function it multiplies, e.g. {@code e^(-t)·sin(2t)}
 * @param value the coefficient itself
 * @since 0.1
 */
public record BasisCoefficient(String coefficient, String basis, Coefficient value) {
    private static final Coefficient ONE = new Coefficient.Exact(Surd.of(Rational.ONE));
    private static final Coefficient ZERO = new Coefficient.Exact(Surd.of(Rational.ZERO));

    /** The coefficient rounded to {@code digits} significant digits, or its name when it is free. */
    public String decimal(int digits) {
        if (value instanceof Coefficient.Trig t) {
            return Numbers.decimal(t.toBigDecimal(new MathContext(digits + 2)), digits);
        }
        return value instanceof Coefficient.Exact e
                ? Numbers.decimal(e.value().toBigDecimal(new MathContext(digits + 2)), digits) : coefficient;
    }

    /** The entries of every term of {@code f}, in order. */
    public static List<BasisCoefficient> of(ClosedForm f) {
        FormulaWriter writer = new FormulaWriter(PlainNotation.INSTANCE, f);
        List<BasisCoefficient> out = new ArrayList<>();
        for (Term t : f.terms()) {
            List<Coefficient> coefficients = t.coefficients();
            for (int j = 0; j < coefficients.size(); j++) {
                List<Coefficient> unit = new ArrayList<>(Collections.nCopies(coefficients.size(), ZERO));
                unit.set(j, ONE);
                out.add(new BasisCoefficient(writer.coefficient(coefficients.get(j)), writer.term(t.withCoefficients(unit)),
                        coefficients.get(j)));
            }
        }
        return out;
    }
}
