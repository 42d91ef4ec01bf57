package dev.rootform.export.document;

import dev.rootform.export.notation.Numbers;
import dev.rootform.numeric.analysis.DecimalMode;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.model.Domain;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;

/**
 * Plain text of the decimal modes of a conjugate sum ({@link DecimalMode}) for the numeric
 * presentation: {@code 0.177·e^(1.3247t)}, {@code e^(-0.66236t)·(0.99122·cos(0.56228t) + 0.4·sin(0.56228t))},
 * {@code 1.118^n·cos(0.46365n)}; each summand with its sign separate, so that the caller joins them
 * with {@code +} and {@code -}.
 */
final class ModalText {
    /** A summand: its sign and its text without the sign. */
    record Summand(boolean negative, String text) {
    }

    private ModalText() {
    }

    static List<Summand> summands(ClosedForm f, List<DecimalMode> modes, int digits) {
        String v = variable(f);
        boolean differential = f.domain() == Domain.DIFFERENTIAL;
        List<Summand> out = new ArrayList<>();
        for (DecimalMode m : modes) {
            List<String> factors = new ArrayList<>();
            if (m.power() > 0) {
                factors.add(m.power() == 1 ? v : v + "^" + m.power());
            }
            String growth = differential ? exponential(m.growth(), v, digits) : power(m.growth(), v, digits);
            if (!growth.isEmpty()) {
                factors.add(growth);
            }
            if (m.real()) {
                boolean negative = m.cosine().signum() < 0;
                out.add(new Summand(negative, product(Numbers.decimal(m.cosine().abs(), digits), factors)));
                continue;
            }
            String angle = scaled(m.frequency(), v, digits);
            String cos = signedProduct(m.cosine(), "cos(" + angle + ")", digits);
            String sin = signedProduct(m.sine(), "sin(" + angle + ")", digits);
            String group = cos.isEmpty() ? sin : sin.isEmpty() ? cos : cos + (sin.startsWith("-") ? " - " + sin.substring(1) : " + " + sin);
            boolean negative = group.startsWith("-") && (cos.isEmpty() || sin.isEmpty());
            String body = negative ? group.substring(1) : group;
            factors.add(cos.isEmpty() || sin.isEmpty() ? body : "(" + body + ")");
            out.add(new Summand(negative, String.join("·", factors)));
        }
        return out;
    }

    /** c·f1·f2, leaving out a coefficient 1 when there are factors. */
    private static String product(String coefficient, List<String> factors) {
        if (factors.isEmpty()) {
            return coefficient;
        }
        return coefficient.equals("1") ? String.join("·", factors) : coefficient + "·" + String.join("·", factors);
    }

    /** {@code 0.4·sin(ωt)} with its sign, or empty for a zero coefficient. */
    private static String signedProduct(BigDecimal c, String basis, int digits) {
        if (c.signum() == 0) {
            return "";
        }
        String size = Numbers.decimal(c.abs(), digits);
        return (c.signum() < 0 ? "-" : "") + (size.equals("1") ? basis : size + "·" + basis);
    }

    private static String exponential(BigDecimal rate, String v, int digits) {
        return rate.signum() == 0 ? "" : "e^(" + scaled(rate, v, digits) + ")";
    }

    private static String power(BigDecimal base, String v, int digits) {
        String b = Numbers.decimal(base, digits);
        return b.equals("1") ? "" : (base.signum() < 0 ? "(" + b + ")" : b) + "^" + v;
    }

    /** {@code 0.5t}, {@code -t}, {@code 1.2(t - 3/2)}. */
    private static String scaled(BigDecimal x, String v, int digits) {
        String size = Numbers.decimal(x.abs(), digits);
        return (x.signum() < 0 ? "-" : "") + (size.equals("1") ? v : size + v);
    }

    /** {@code t}, {@code n}, or {@code (t - 3/2)} for an origin t0 ≠ 0. */
    private static String variable(ClosedForm f) {
        if (f.domain() == Domain.DIFFERENCE || f.origin().isZero()) {
            return f.variable();
        }
        return "(" + f.variable() + (f.origin().signum() > 0 ? " - " : " + ") + f.origin().abs() + ")";
    }
}
