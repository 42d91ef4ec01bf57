package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.Surd;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Exact numbers as short text in the tool's notation: {@code 3/2}, {@code 1/2 + 1/2·√5},
 * {@code 1 - 2·i}, {@code 3·e^(-2)}; a number with no such form is shown as a decimal
 * ({@code ≈ 0.80901699437494742410}).
 */
final class ValueText {
    /** Significant digits of a number shown as a decimal. */
    static final int DIGITS = 20;

    private ValueText() {
    }

    static String of(ExactValue v) {
        Optional<Algebraic> a = v.algebraic();
        if (a.isPresent()) {
            return of(a.get());
        }
        List<String> parts = new ArrayList<>();
        for (Map.Entry<Algebraic, Algebraic> e : v.terms().entrySet()) {
            String c = of(e.getValue());
            String factor = e.getKey().isZero() ? "" : "e^(" + of(e.getKey()) + ")";
            parts.add(factor.isEmpty() ? c : c.equals("1") ? factor : "(" + c + ")·" + factor);
        }
        return String.join(" + ", parts);
    }

    static String of(Algebraic a) {
        Optional<Surd> s = a.toSurd();
        if (s.isPresent()) {
            return s.get().toString();
        }
        if (a.inField()) {
            Optional<Surd> re = a.realPart().toSurd();
            Optional<Surd> im = a.imaginaryPart().toSurd();
            if (re.isPresent() && im.isPresent()) {
                return complex(re.get(), im.get());
            }
            BigDecimal[] z = a.approximate(new MathContext(DIGITS));
            return "≈ " + decimal(z[0]) + (z[1].signum() == 0 ? "" : (z[1].signum() < 0 ? " - " : " + ") + decimal(z[1].abs()) + "·i");
        }
        return a.toString();
    }

    private static String complex(Surd re, Surd im) {
        Surd size = im.signum() < 0 ? im.negate() : im;
        String imaginary = size.isRational() && size.rational().isOne() ? "i"
                : size.isRational() || size.rational().isZero() ? size + "·i" : "(" + size + ")·i";
        if (re.isZero()) {
            return (im.signum() < 0 ? "-" : "") + imaginary;
        }
        return re + (im.signum() < 0 ? " - " : " + ") + imaginary;
    }

    private static String decimal(BigDecimal x) {
        return x.stripTrailingZeros().toPlainString();
    }

    static String of(Rational q) {
        return q.toString();
    }
}
