package dev.rootform.export.document;

import dev.rootform.export.notation.Formulas;
import dev.rootform.export.notation.RootText;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.ExactRoot;
import dev.rootform.symbolic.response.Impulse;
import dev.rootform.symbolic.transfer.TransferFunction;
import java.util.ArrayList;
import java.util.List;

/**
 * The pieces of a response answer in plain text and LaTeX: the transfer function as a fraction,
 * the impulses ({@code 2·δ(t)}, {@code -δ'(t)}, {@code 0.5·δ[n-1]}) and the response y = impulses +
 * closed form.
 *
 * @since 0.3
 */
public final class ResponseNotation {
    private ResponseNotation() {
    }

    /** {@code H(s) = (s + 3)/(s^2 + 2s + 5)}, {@code H(s) = 50/(s^2 + 14s + 65)}. */
    public static String transfer(TransferFunction h) {
        return h.signature() + " = " + h.value().toString(h.variable());
    }

    /**
     * H(z) in powers of z^-1 with the denominator's constant term 1, e.g.
     * {@code H(z) = (1 + z^-1)/(1 - 3/2·z^-1 + 14/25·z^-2)}; the numerator's powers are negative when
     * H is proper.
     */
    static String delayForm(TransferFunction h) {
        int top = h.value().denominator().degree();
        String num = delays(h.value().numerator(), top);
        String den = delays(h.value().denominator(), top);
        return h.signature() + " = " + (den.equals("1") ? num : "(" + num + ")/(" + den + ")");
    }

    /** Σ c_j z^(j − top), highest power first. */
    private static String delays(RationalPolynomial p, int top) {
        StringBuilder sb = new StringBuilder();
        for (int j = p.degree(); j >= 0; j--) {
            Rational c = p.coefficient(j);
            if (c.isZero()) {
                continue;
            }
            int k = j - top;
            String power = k == 0 ? "" : k == 1 ? "z" : "z^" + k;
            String size = c.abs().isOne() && !power.isEmpty() ? "" : c.abs() + (power.isEmpty() ? "" : "·");
            sb.append(sb.length() == 0 ? (c.signum() < 0 ? "-" : "") : c.signum() < 0 ? " - " : " + ").append(size).append(power);
        }
        return sb.toString();
    }

    /** {@code H(s) = \frac{s+3}{s^{2}+2 s+5}}. */
    static String transferLatex(TransferFunction h) {
        String num = Formulas.latex(h.value().numerator(), h.variable());
        return h.name() + "(" + h.variable() + ") = " + (h.value().isPolynomial() ? num
                : "\\frac{" + num + "}{" + Formulas.latex(h.value().denominator(), h.variable()) + "}");
    }

    /** y(t) = impulses + formula, in plain text. */
    static String response(TransferFunction h, List<Impulse> impulses, ClosedForm f) {
        return unknown(h) + " = " + join(impulses.stream().map(i -> impulse(h, i, false)).toList(),
                f.terms().isEmpty() && !impulses.isEmpty() ? "" : Formulas.plain(f));
    }

    /** y(t) = impulses + formula, in LaTeX. */
    static String responseLatex(TransferFunction h, List<Impulse> impulses, ClosedForm f) {
        return unknown(h) + " = " + join(impulses.stream().map(i -> impulse(h, i, true)).toList(),
                f.terms().isEmpty() && !impulses.isEmpty() ? "" : Formulas.latex(f));
    }

    /** An exact pole or zero as solve writes roots, with an implicit root's factor in the transfer variable. */
    static String root(TransferFunction h, ExactRoot root) {
        return RootText.exact(root).replace("λ", h.variable());
    }

    /** {@code y(t)} or {@code y[n]}. */
    static String unknown(TransferFunction h) {
        return h.continuous() ? "y(t)" : "y[n]";
    }

    /** One impulse with its sign, e.g. {@code -2·δ'(t)}, {@code 0.5·δ[n-1]}. */
    static String impulse(TransferFunction h, Impulse i, boolean latex) {
        String delta = latex ? "\\delta" : "δ";
        String body = h.continuous()
                ? delta + (i.order() <= 3 ? "'".repeat(i.order()) : "^{(" + i.order() + ")}") + "(t)"
                : delta + "[n" + (i.order() == 0 ? "" : "-" + i.order()) + "]";
        Rational c = i.coefficient();
        String size = c.abs().isOne() ? "" : latex ? LatexRenderer.math(c.abs() + "·") : c.abs() + "·";
        return (c.signum() < 0 ? "-" : "") + size + body;
    }

    /** The summands joined with their signs; {@code 0} when there are none. */
    private static String join(List<String> impulses, String formula) {
        List<String> parts = new ArrayList<>(impulses);
        if (!formula.isEmpty() && !(formula.equals("0") && !impulses.isEmpty())) {
            parts.add(formula);
        }
        StringBuilder sb = new StringBuilder();
        for (String p : parts) {
            if (sb.length() == 0) {
                sb.append(p);
            } else {
                sb.append(p.startsWith("-") ? " - " + p.substring(1) : " + " + p);
            }
        }
        return sb.length() == 0 ? "0" : sb.toString();
    }
}
