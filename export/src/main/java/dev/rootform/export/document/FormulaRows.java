package dev.rootform.export.document;

import dev.rootform.export.Report;
import dev.rootform.export.notation.EquationFormula;
import dev.rootform.export.notation.EquationText;
import dev.rootform.export.notation.LineBreaker;
import dev.rootform.export.notation.Notation;
import dev.rootform.export.notation.Numbers;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.solve.Solution;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * The mathematical rows of an answer in one notation, each a label and its lines (long rows
 * broken at + and − by a {@link LineBreaker}): the equation, the conditions, the characteristic
 * polynomial and its factors, the solution, the numerically fixed constants with their accuracy
 * (significant digits, all correct),
 * and where the solution holds. LaTeX, MathML and the report page lay these rows out.
 *
 * @since 0.3
 */
public final class FormulaRows {
    /** One labelled row. */
    public record Row(String label, List<String> lines) {
        public Row {
            Objects.requireNonNull(label, "label");
            lines = List.copyOf(lines);
        }
    }

    private FormulaRows() {
    }

    /**
     * @param n the notation
     * @param width the widest line, in characters of the plain form
     * @param separator what separates listed items, e.g. conditions
     */
    public static List<Row> of(Report r, Notation n, int width, String separator) {
        Solution s = r.solution();
        LinearEquation eq = s.problem().equation();
        ClosedForm f = s.closedForm();
        LineBreaker breaker = new LineBreaker(n, width);
        EquationFormula written = new EquationFormula(n);
        List<Row> rows = new ArrayList<>();
        rows.add(new Row("equation", breaker.equation(eq)));
        List<Condition> conditions = s.problem().conditions();
        if (!conditions.isEmpty()) {
            rows.add(new Row("conditions", breaker.list(conditions.stream().map(c -> EquationText.condition(eq, c)).toList(),
                    conditions.stream().map(c -> written.condition(eq, c)).toList(), separator)));
        }
        List<String> chi = new ArrayList<>(breaker.polynomial(s.characteristic()));
        chi.set(chi.size() - 1, n.relation(chi.get(chi.size() - 1), "=", n.number("0")));
        rows.add(new Row("characteristic", chi));
        boolean factored = s.factors().size() > 1 || s.factors().stream().anyMatch(x -> x.multiplicity() > 1)
                || !s.characteristic().leadingCoefficient().isOne();
        if (factored) {
            rows.add(new Row("factored", List.of(written.factorisation(s.characteristic(), s.factors()))));
        }
        List<String> solution = new ArrayList<>(breaker.formula(f));
        solution.set(0, n.relation(written.unknownAt(f, n.name(f.variable())), "=", solution.get(0)));
        rows.add(new Row("solution", solution));
        if (!r.analysis().constantValues().isEmpty()) {
            List<String> constants = new ArrayList<>();
            r.analysis().constantValues().forEach((name, value) -> constants.add(n.relation(n.constant(name), "≈",
                    decimal(n, Numbers.decimal(value, r.digits()))) + n.text(" (" + r.digits() + " digits)")));
            rows.add(new Row("constants", constants));
        }
        rows.add(new Row("valid for", List.of(validity(f, n, written, separator))));
        return rows;
    }

    /** A signed decimal as a number in the notation. */
    static String decimal(Notation n, String decimal) {
        return decimal.startsWith("-") ? n.negate(n.number(decimal.substring(1))) : n.number(decimal);
    }

    private static String validity(ClosedForm f, Notation n, EquationFormula written, String separator) {
        String variable = n.name(f.variable());
        if (f.domain() == Domain.DIFFERENTIAL) {
            return n.relation(variable, "∈", n.name("ℝ"));
        }
        StringBuilder sb = new StringBuilder(n.relation(variable, "≥", n.number(Long.toString(f.validFrom()))));
        long first = f.origin().toBigInteger().longValueExact();
        for (int i = 0; i < f.leadingValues().size(); i++) {
            sb.append(separator).append(n.relation(written.unknownAt(f, n.number(Long.toString(first + i))), "=",
                    decimal(n, f.leadingValues().get(i).toString())));
        }
        return sb.toString();
    }
}
