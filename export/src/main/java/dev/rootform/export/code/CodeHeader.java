package dev.rootform.export.code;

import dev.rootform.export.CType;
import dev.rootform.export.CVariant;
import dev.rootform.export.CodeFacts;
import dev.rootform.export.NumericForm;
import dev.rootform.export.Report;
import dev.rootform.export.notation.CommentText;
import dev.rootform.export.notation.Numbers;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.solve.Solution;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * The opening comment of generated code, as plain ASCII lines that cannot end a comment: the
 * {@link CommentText#summary} (equation, conditions, closed form, validity range), the constants
 * fixed numerically, the input range for floating-point evaluation in the code's variant, the
 * measured accuracy, lines on further functions (exact terms) and the caution.
 *
 * @since 0.2
 */
final class CodeHeader {
    /** 2^-53, the resolution of a double: half the spacing of doubles relative to their size. */
    static final double DOUBLE_RESOLUTION = 0x1p-53;

    private CodeHeader() {
    }

    /** The header lines for the Java code, which evaluates {@code form} in double with StrictMath ({@code facts}), plus {@code more}. */
    static List<String> lines(Report r, NumericForm form, CodeFacts facts, List<String> more) {
        return lines(r, form, Optional.of(facts), CVariant.DEFAULT, more);
    }

    /**
     * The header lines for code of {@code variant} that evaluates {@code form}: with the numeric lines
     * of {@code facts} when the code has a floating-point value function, then {@code more} (lines on
     * further functions), then the caution.
     */
    static List<String> lines(Report r, NumericForm form, Optional<CodeFacts> facts, CVariant variant, List<String> more) {
        Solution s = r.solution();
        List<String> out = new ArrayList<>(CommentText.summary(s));
        out.addAll(constants(r));
        facts.ifPresent(f -> out.addAll(numeric(r, form, f, variant)));
        out.addAll(more);
        out.add(CommentText.CAUTION);
        return CommentText.wrap(out);
    }

    /** The range and accuracy lines of floating-point evaluation in {@code variant}. */
    private static List<String> numeric(Report r, NumericForm form, CodeFacts facts, CVariant variant) {
        CType type = variant.type();
        String v = r.solution().closedForm().variable();
        String cap = type == CType.DOUBLE ? "1e15" : "2^24 = 16777216";
        String opening = (type == CType.DOUBLE ? "Double" : "Float") + " evaluation: every term stays finite and the largest a normal "
                + type.keyword() + " for ";
        String range = form.differential()
                ? opening + String.format("%.6g <= %s <= %.6g", facts.low() + form.origin(), v, facts.high() + form.origin())
                        + (facts.high() >= type.cap() ? " (searched to |" + v + " - t0| = " + cap + ")" : "") + "."
                : opening + form.first() + " <= " + v + " <= " + String.format("%.0f", facts.high())
                        + (facts.high() >= type.cap() ? " (searched to " + cap + ")" : "") + ".";
        String arithmetic = variant.equals(CVariant.DEFAULT)
                ? "with StrictMath (a C math library may differ in the last bits; "
                : (type == CType.FLOAT ? "in float arithmetic as this code computes it, " : "in double arithmetic as this code computes it, ")
                        + (variant.libm() ? "with powf, expf and cosf taken as correctly rounded to float (a C math library may "
                                + "differ in the last bits; " : "with the powers formed by repeated squaring as this code forms them "
                                + "(no math library; ");
        return List.of(range, String.format("Accuracy measured by rootform when it generated this code: %s against "
                + (r.analysis().constantValues().isEmpty() ? "the exact values" : "values from the closed form at 40 digits")
                + " at %d points (%s), %spoints where the exact value is 0 are left out).", accuracy(facts, type), facts.points().size(),
                facts.points().stream().map(Numbers::point).collect(Collectors.joining(", ")), arithmetic));
    }

    /**
     * The measured accuracy as the header states it: "exact at every sampled point" when the error
     * is below the resolution of the format, half its spacing relative to its size (2^-53 for
     * double, 2^-24 for float: a reference value rounded to 30 or 40 digits differs from the
     * nearest double by some 1e-17 or less even when the code is as exact as the format can be),
     * else "max relative error" and {@link #statedError}.
     */
    static String accuracy(CodeFacts facts, CType type) {
        if (facts.maxRelativeError() <= resolution(type)) {
            return "exact at every sampled point to the resolution of a " + type.keyword() + " (relative error at most 2^-"
                    + (type == CType.FLOAT ? 24 : 53) + ")";
        }
        return "max relative error " + statedError(facts);
    }

    /** The measured error rounded up to 3 significant digits. */
    static String statedError(CodeFacts facts) {
        return new java.math.BigDecimal(facts.maxRelativeError()).round(new java.math.MathContext(3, java.math.RoundingMode.UP))
                .stripTrailingZeros().toString();
    }

    /** Half the spacing of the format's numbers relative to their size: 2^-53 (double) or 2^-24 (float). */
    static double resolution(CType type) {
        return type == CType.FLOAT ? 0x1p-24 : DOUBLE_RESOLUTION;
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
