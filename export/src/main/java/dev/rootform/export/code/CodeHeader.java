package dev.rootform.export.code;

import dev.rootform.export.CType;
import dev.rootform.export.CVariant;
import dev.rootform.export.CodeFacts;
import dev.rootform.export.NumericForm;
import dev.rootform.export.Report;
import dev.rootform.export.notation.CommentText;
import dev.rootform.export.notation.Numbers;
import dev.rootform.export.notation.NumericConstants;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.solve.Solution;
import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * The opening comment of generated code, as plain ASCII lines that cannot end a comment: the
 * {@link CommentText#summary} (equation, conditions, closed form, validity range), the constants
 * fixed numerically, the valid input range for floating-point evaluation in the code's variant and
 * what ends it, how the code evaluates near t0 and at large n, the accuracy measured on the
 * problem's time scales with the stated bound, lines on further functions (exact terms) and the
 * caution.
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

    /** The range, evaluation and accuracy lines of floating-point evaluation in {@code variant}. */
    private static List<String> numeric(Report r, NumericForm form, CodeFacts facts, CVariant variant) {
        Solution s = r.solution();
        CType type = variant.type();
        String v = s.closedForm().variable();
        List<String> out = new ArrayList<>();
        out.add("Valid input range of this code in " + type.keyword() + ": " + input(form, facts.low()) + " <= " + v + " <= "
                + input(form, facts.high()) + " (" + (form.differential() ? "below: " + limit(facts.lowLimit(), type) + "; " : "")
                + "above: " + limit(facts.highLimit(), type) + ").");
        if (!form.series().isEmpty()) {
            out.add("Near t0, for |" + v + " - t0| <= " + form.seriesRadius() + ", the code sums the Taylor series of "
                    + s.closedForm().function() + " at t0 (" + form.series().size() + " terms, coefficients "
                    + (s.exact().isPresent() ? "exact, rounded once" : "from the closed form at 40 digits")
                    + "): there the terms of the closed form cancel.");
        }
        if (form.reduces() && variant.libm()) {
            out.add("Angles that are rational multiples of pi per step are reduced exactly in integers ((n*k) mod M), "
                    + "so their phase does not drift however large n is.");
        }
        String arithmetic = variant.equals(CVariant.DEFAULT) ? "with StrictMath (a C math library may differ in the last bits)"
                : (type == CType.FLOAT ? "in float arithmetic as this code computes it, " : "in double arithmetic as this code computes it, ")
                        + (variant.libm() ? "with powf, expf and cosf taken as correctly rounded to float (a C math library may "
                                + "differ in the last bits)" : "with the powers formed by repeated squaring as this code forms them "
                                + "(no math library)");
        out.add("Accuracy measured by rootform when it generated this code, against values to " + CodeMeasurement.EXACT_DIGITS
                + " digits (" + (r.analysis().constantValues().isEmpty() ? "from the exact solution" : "from the closed form "
                + "with the constants above") + ") at " + facts.points().size() + " points chosen from the problem's time scales ("
                + facts.timeScales().stream().map(CodeHeader::shortNumber).collect(Collectors.joining(", "))
                + "): dense near " + (form.differential() ? "t0" : "the first index") + ", then log-spaced to the ends of the "
                + "valid range; " + arithmetic + ". L below is the largest term the code adds up at an input ("
                + (form.series().isEmpty() ? "" : "|SERIES[d]*s^d| near t0, else ") + "|AMPLITUDE[i]*v^POWER[i]*"
                + (form.differential() ? "exp(GROWTH[i]*v)" : "GROWTH[i]^v") + "|); the stated bound is "
                + (int) CodeFacts.MARGIN + " x the worst measured, for inputs between the sample points, and in units of L at least "
                + (int) CodeFacts.MARGIN + " x the drift that rounded rates and angles can cause there.");
        out.add(accuracy(form.differential() ? "For " + v + " >= t0" : "For every n", v, facts.forward(), type));
        facts.backward().ifPresent(a -> out.add(accuracy("For " + v + " < t0", v, a, type)));
        return out;
    }

    /**
     * One side's measured errors and stated bound, ending in the bound |value - exact| <=
     * max(R*|exact|, E*L); errors below the resolution of the format (half its spacing relative to
     * its size) are stated as "exact at every sampled point".
     */
    private static String accuracy(String side, String v, CodeFacts.Accuracy a, CType type) {
        boolean exact = a.maxRelativeError() <= resolution(type) && a.maxTermError() <= resolution(type);
        String errors = exact
                ? "exact at every sampled point to the resolution of a " + type.keyword() + " (relative error at most 2^-"
                        + (type == CType.FLOAT ? 24 : 53) + "; worst absolute error " + shortNumber(a.maxAbsoluteError()) + " at "
                        + v + " = " + at(a.worstAbsoluteAt()) + ")"
                : a.worstRelativeAt().map(w -> "worst relative error " + shortNumber(a.maxRelativeError()) + " (at " + v + " = "
                        + at(w) + "; where the value is at least 1/" + (int) CodeFacts.CANCELLATION + " of L)")
                        .orElse("relative error not stated (no sampled value reaches 1/" + (int) CodeFacts.CANCELLATION
                                + " of L: the terms cancel, so the error is stated in units of L)")
                        + ", worst absolute error "
                        + shortNumber(a.maxAbsoluteError()) + " (at " + v + " = " + at(a.worstAbsoluteAt()) + "), worst error in "
                        + "units of L " + shortNumber(a.maxTermError()) + " (at " + v + " = " + at(a.worstTermAt()) + ")";
        return side + " (" + a.points() + " points): " + errors + ". Stated bound: |value - exact| <= max("
                + statedBound(a.relativeBound()) + "*|exact|, " + statedBound(a.termBound()) + "*L).";
    }

    /** Half the spacing of the format's numbers relative to their size: 2^-53 (double) or 2^-24 (float). */
    static double resolution(CType type) {
        return type == CType.FLOAT ? 0x1p-24 : DOUBLE_RESOLUTION;
    }

    /** A bound rounded up to 2 significant digits, as stated in the header ({@code 4.5E-16}, or {@code 0}). */
    static String statedBound(double bound) {
        return bound == 0 ? "0" : new BigDecimal(bound).round(new MathContext(2, RoundingMode.UP)).stripTrailingZeros().toString();
    }

    /** An input of the valid range as written: t0 + v (functions) or the index. */
    private static String input(NumericForm form, double value) {
        return form.differential() ? shortNumber(form.origin() + value) : String.format("%.0f", value);
    }

    private static String limit(CodeFacts.Limit limit, CType type) {
        return switch (limit) {
            case FIRST_INDEX -> "the first index";
            case OVERFLOW -> "a term would overflow a " + type.keyword();
            case UNDERFLOW -> "every term would fall below the smallest normal " + type.keyword();
            case DRIFT -> "the rounding of a rate or angle would make the phase or growth drift by more than "
                    + shortNumber(CodeFacts.driftLimit(type));
            case CAP -> "searched no farther than " + shortNumber(type.cap()) + " from the start";
        };
    }

    private static String at(Rational point) {
        return point.isInteger() ? point.toString() : shortNumber(point.doubleValue());
    }

    /** x to 6 significant digits, without trailing zeros; with an exponent below 1e-3 and from 1e7 on. */
    private static String shortNumber(double x) {
        if (x == 0) {
            return "0";
        }
        BigDecimal d = new BigDecimal(x).round(new MathContext(6)).stripTrailingZeros();
        int exponent = d.precision() - d.scale() - 1;
        if (exponent >= -3 && exponent < 7) {
            return d.toPlainString();
        }
        BigDecimal mantissa = d.movePointLeft(exponent).stripTrailingZeros();
        return mantissa.toPlainString() + "E" + (exponent > 0 ? "+" : "") + exponent;
    }

    /**
     * The closed form that generated code evaluates: the solution's, with any constants fixed
     * numerically (boundary values, trial forms) put in as their decimals; constants still free
     * make code impossible ({@link CodeRequests} refuses them).
     */
    static ClosedForm codeForm(Report r) {
        java.util.Map<String, Rational> values = new java.util.LinkedHashMap<>();
        r.analysis().constantValues().forEach((name, value) -> values.put(name, Rational.of(value)));
        return r.solution().closedForm().withConstantValues(values);
    }

    /** The numeric constants line, when there are any: {@code C1 = 0.5, P1 = -0.11}. */
    private static List<String> constants(Report r) {
        if (r.analysis().constantValues().isEmpty()) {
            return List.of();
        }
        return List.of("Constants fixed numerically (" + NumericConstants.REASON + "), to " + r.digits() + " digits: "
                + r.analysis().constantValues().entrySet().stream()
                        .map(e -> e.getKey() + " = " + Numbers.decimal(e.getValue(), r.digits())).collect(Collectors.joining(", ")));
    }
}
