package dev.rootform.export.document;

import dev.rootform.export.Report;
import dev.rootform.export.notation.BasisCoefficient;
import dev.rootform.export.notation.EquationText;
import dev.rootform.export.notation.Formulas;
import dev.rootform.export.notation.Numbers;
import dev.rootform.export.notation.NumericConstants;
import dev.rootform.export.notation.RootText;
import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.numeric.diagnostics.Diagnostics;
import dev.rootform.numeric.analysis.SteadyState;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.ExactRoot;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.solve.Solution;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import java.util.stream.Stream;

/**
 * The answer for a person on a terminal: equation, conditions, characteristic polynomial, roots,
 * solution with its range of validity, verification, values and warnings, each under an aligned
 * label.
 *
 * @since 0.1
 */
public final class TextRenderer {
    private TextRenderer() {
    }

    /** The whole answer, one line per fact, ending in a newline. */
    public static String render(Report r) {
        Solution s = r.solution();
        LinearEquation eq = s.problem().equation();
        Layout out = new Layout()
                .section("equation", List.of(EquationText.equation(eq), EquationText.kind(eq)))
                .line("conditions", conditions(eq, s.problem().conditions()))
                .line("characteristic", s.characteristic().toString(EquationText.LAMBDA))
                .line("factored", EquationText.factorisation(s.characteristic(), s.factors()))
                .section("roots", roots(s.roots(), r))
                .line("basis", BasisCoefficient.of(s.general()).stream().map(BasisCoefficient::basis)
                        .collect(Collectors.joining(", ")))
                .section("solution", r.numeric() ? numericSolution(s.closedForm(), r) : solution(s.closedForm(), r))
                .section("verification", verification(Stream.concat(r.solution().checks().stream(),
                        r.numericChecks().stream()).toList(), r.verified()));
        r.diagnostics().ifPresent(d -> out.section("diagnostics", DiagnosticsText.lines(d, r)));
        if (!r.values().isEmpty()) {
            out.section("values", r.values().stream().map(v -> value(s.closedForm(), v, r.digits())).toList());
        }
        if (!r.steadyStates().isEmpty()) {
            out.section("steady state", r.steadyStates().stream().map(st -> steadyState(s, st, r.digits())).toList());
        }
        if (!r.warnings().isEmpty()) {
            out.section("warnings", r.warnings());
        }
        return out.toString();
    }

    /** e.g. {@code input 2·sin(3t): amplitude 0.25, gain 0.125, phase -180°}. */
    private static String steadyState(Solution s, SteadyState st, int digits) {
        return "input " + EquationText.forcingTerm(s.problem().equation(), st.input())
                + ": amplitude " + Numbers.decimal(st.amplitude(), digits)
                + ", gain " + Numbers.decimal(st.gain(), digits)
                + ", phase " + Numbers.decimal(st.phaseDegrees(), digits) + "°";
    }

    static String conditions(LinearEquation eq, List<Condition> conditions) {
        return conditions.isEmpty() ? "none (general solution)"
                : conditions.stream().map(c -> EquationText.condition(eq, c)).collect(Collectors.joining(", "));
    }

    private static List<String> roots(List<ExactRoot> roots, Report r) {
        List<String> exact = roots.stream().map(x -> r.numeric() ? "" : RootText.exact(x)).toList();
        int width = exact.stream().mapToInt(String::length).max().orElse(0);
        List<String> decimals = new ArrayList<>();
        for (int i = 0; i < roots.size(); i++) {
            String approx = i < r.roots().size() ? "≈ " + RootText.decimal(r.roots().get(i), r.digits()) : "";
            decimals.add(approx);
        }
        int decimalWidth = decimals.stream().mapToInt(String::length).max().orElse(0);
        List<String> lines = new ArrayList<>();
        for (int i = 0; i < roots.size(); i++) {
            lines.add(pad(exact.get(i), width) + "  " + pad(decimals.get(i), decimalWidth)
                    + "  multiplicity " + roots.get(i).multiplicity());
        }
        return lines;
    }

    /** The formula, where it holds, and what is free or fixed before that. */
    private static List<String> solution(ClosedForm f, Report r) {
        List<String> lines = new ArrayList<>();
        lines.add(EquationText.unknownAt(f, f.variable()) + " = " + Formulas.plain(f));
        if (!f.particularTerms().isEmpty()) {
            boolean settles = r.diagnostics().map(Diagnostics::settles).orElse(false);
            lines.add((settles ? "transient (homogeneous)" : "homogeneous") + " part: " + Formulas.plain(f.withTerms(f.transientTerms())));
            lines.add((settles ? "steady (particular)" : "particular") + " part: " + Formulas.plain(f.withTerms(f.particularTerms())));
        }
        if (f.domain() == Domain.DIFFERENCE) {
            lines.add("for " + f.variable() + " ≥ " + f.validFrom());
            long first = f.origin().toBigInteger().longValueExact();
            for (int i = 0; i < f.leadingValues().size(); i++) {
                lines.add(EquationText.unknownAt(f, Long.toString(first + i)) + " = " + f.leadingValues().get(i));
            }
            if (f.leadingValues().isEmpty() && f.validFrom() > first) {
                String range = f.validFrom() - 1 == first ? Long.toString(first) : first + ".." + (f.validFrom() - 1);
                lines.add(EquationText.unknownAt(f, range) + " free (any values)");
            }
        } else {
            lines.add("for all " + f.variable());
        }
        Map<String, BigDecimal> values = r.analysis().constantValues();
        if (!values.isEmpty()) {
            lines.add("constants fixed numerically (" + NumericConstants.REASON + "; solved to " + r.digits() + " digits):");
            values.forEach((name, value) -> lines.add("  " + name + " ≈ " + Numbers.decimal(value, r.digits())));
        }
        List<String> free = f.freeConstants().stream().filter(n -> !values.containsKey(n)).toList();
        if (!free.isEmpty()) {
            lines.add("general solution: " + String.join(", ", free) + (free.size() == 1 ? " is a free constant" : " are free constants"));
        }
        return lines;
    }

    /**
     * With --numeric: the solution as Σ ± decimal·basis, conjugate sums written mode by mode (real
     * modes and cos/sin pairs in decimals), then the same range lines as the exact form.
     */
    private static List<String> numericSolution(ClosedForm f, Report r) {
        int digits = r.digits();
        List<String> lines = new ArrayList<>(solution(f, r));
        List<ModalText.Summand> summands = new ArrayList<>();
        int sums = 0;
        for (Term t : f.terms()) {
            if (t instanceof Term.ConjugateSum && sums < r.analysis().conjugateSumModes().size()
                    && t.coefficients().stream().allMatch(Coefficient.Exact.class::isInstance)) {
                summands.addAll(ModalText.summands(f, r.analysis().conjugateSumModes().get(sums++), digits));
                continue;
            }
            for (BasisCoefficient c : BasisCoefficient.of(f.withTerms(List.of(t)))) {
                if (!c.value().isZero()) {
                    String decimal = c.decimal(digits);
                    boolean negative = decimal.startsWith("-");
                    String size = negative ? decimal.substring(1) : decimal;
                    summands.add(new ModalText.Summand(negative,
                            c.basis().equals("1") ? size : size.equals("1") ? c.basis() : size + "·" + c.basis()));
                }
            }
        }
        StringBuilder sum = new StringBuilder();
        for (ModalText.Summand s : summands) {
            sum.append(sum.length() == 0 ? (s.negative() ? "-" : "") : s.negative() ? " - " : " + ").append(s.text());
        }
        lines.set(0, EquationText.unknownAt(f, f.variable()) + " ≈ " + (sum.length() == 0 ? "0" : sum));
        return lines;
    }

    /** One line per check, then the verdict ({@code verified} as the caller's answer states it). */
    static List<String> verification(List<Check> checks, boolean verified) {
        List<String> lines = new ArrayList<>();
        for (Check c : checks) {
            String label = c.passed() ? "[ok]" : c.ran() ? "[FAILED]" : "[not run]";
            lines.add(pad(label, 9) + (label.length() >= 9 ? " " : "") + c.name() + ": " + c.detail());
        }
        List<String> failed = checks.stream().filter(c -> !c.passed()).map(Check::name).toList();
        lines.add(failed.isEmpty() ? "verified" : verified ? "verified by the checks that ran; not run: " + String.join(", ", failed)
                : "NOT verified: " + String.join(", ", checks.stream().filter(Check::failed).map(Check::name).toList()));
        return lines;
    }

    private static String value(ClosedForm f, PointValue v, int digits) {
        String at = EquationText.unknownAt(f, Numbers.point(v.at()));
        return at + ValueText.of(v, digits);
    }

    private static String pad(String s, int width) {
        return s + " ".repeat(Math.max(0, width - s.length()));
    }
}
