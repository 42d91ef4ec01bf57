package dev.rootform.export.code;

import dev.rootform.export.CodeFacts;
import dev.rootform.export.NumericForm;
import dev.rootform.export.Wave;
import dev.rootform.export.Report;
import dev.rootform.export.notation.CommentText;
import dev.rootform.export.notation.Numbers;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.solve.Solution;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

/**
 * The opening comment of generated code, as plain ASCII lines that cannot end a comment: the
 * {@link CommentText#summary} (equation, conditions, closed form, validity range), the constants
 * fixed numerically, the input range for double evaluation, the measured accuracy and the caution.
 *
 * @since 0.2
 */
final class CodeHeader {
    private CodeHeader() {
    }

    /** The header lines for code that evaluates {@code form} (facts measured on it); without numeric lines when facts are absent. */
    static List<String> lines(Report r, NumericForm form, CodeFacts facts) {
        Solution s = r.solution();
        List<String> out = new ArrayList<>(CommentText.summary(s));
        out.addAll(constants(r));
        ClosedForm f = s.closedForm();
        String v = f.variable();
        if (form.differential()) {
            out.add("Double evaluation: every term stays finite and the largest a normal double for "
                    + String.format("%.6g <= %s <= %.6g", facts.low() + form.origin(), v, facts.high() + form.origin())
                    + (facts.high() >= CodeFacts.CAP ? " (searched to |" + v + " - t0| = 1e15)" : "") + ".");
        } else {
            out.add("Double evaluation: every term stays finite and the largest a normal double for "
                    + form.first() + " <= " + v + " <= " + String.format("%.0f", facts.high())
                    + (facts.high() >= CodeFacts.CAP ? " (searched to 1e15)" : "") + ".");
        }
        out.add(String.format("Accuracy measured by rootform when it generated this code: %s against "
                + (r.analysis().constantValues().isEmpty() ? "the exact values" : "values from the closed form at 40 digits")
                + " at %d points (%s), with StrictMath (a C math library may differ in the last bits; "
                + "points where the exact value is 0 are left out).", statedError(facts), facts.points().size(),
                facts.points().stream().map(Numbers::point).collect(Collectors.joining(", "))));
        out.add(CommentText.CAUTION);
        return CommentText.wrap(out);
    }

    /**
     * Half the spacing of doubles relative to their size, 2^-53: a relative error at most this is
     * below what a double can resolve, and the value is stated as exact to a double's resolution.
     */
    static final double DOUBLE_RESOLUTION = 0x1p-53;

    /**
     * The measured error as stated in the header: "exact at every sampled point" when it is below a
     * double's resolution (a reference value rounded to 30 or 40 digits differs from the nearest
     * double by some 1e-17 or less even when the code is as exact as a double can be), else "max
     * relative error" rounded up to 3 significant digits.
     */
    static String statedError(CodeFacts facts) {
        if (facts.maxRelativeError() <= DOUBLE_RESOLUTION) {
            return "exact at every sampled point to the resolution of a double (relative error at most 2^-53)";
        }
        return "max relative error " + new java.math.BigDecimal(facts.maxRelativeError())
                .round(new java.math.MathContext(3, java.math.RoundingMode.UP)).stripTrailingZeros().toString();
    }

    /**
     * The closed form that generated code evaluates: the solution's, with any constants fixed
     * numerically (boundary values, trial forms) put in as their decimals; constants still free
     * make code impossible ({@link CodeRequests} refuses them).
     */
    static ClosedForm codeForm(Report r) {
        java.util.Map<String, dev.rootform.symbolic.algebra.Rational> values = new java.util.LinkedHashMap<>();
        r.analysis().constantValues().forEach((name, value) -> values.put(name, dev.rootform.symbolic.algebra.Rational.of(value)));
        return r.solution().closedForm().withConstantValues(values);
    }

    /** The numeric constants line, when there are any: {@code C1 = 0.5, P1 = -0.11}. */
    private static List<String> constants(Report r) {
        if (r.analysis().constantValues().isEmpty()) {
            return List.of();
        }
        return List.of("Constants fixed numerically (not exact rationals), to " + r.digits() + " digits: "
                + r.analysis().constantValues().entrySet().stream()
                        .map(e -> e.getKey() + " = " + Numbers.decimal(e.getValue(), r.digits())).collect(Collectors.joining(", ")));
    }
}
