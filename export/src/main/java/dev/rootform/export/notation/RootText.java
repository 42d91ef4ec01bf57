package dev.rootform.export.notation;

import dev.rootform.numeric.roots.RootApproximation;
import dev.rootform.symbolic.closedform.ExactRoot;
import dev.rootform.symbolic.closedform.Surd;
import java.math.BigInteger;

/**
 * Text for a root of the characteristic polynomial: exact ({@code 1/2 + 1/2·√5}, {@code -1 - 2i},
 * {@code cos(2π/5) + i·sin(2π/5)}, {@code root 2 of λ^3 - λ - 1}) and as a rounded decimal ({@code -0.6623589786 + 0.5622795121i}).
 *
 * @since 0.1
 */
public final class RootText {
    private RootText() {
    }

    /** The exact root; an implicit root is named by its index among the roots of its factor. */
    public static String exact(ExactRoot root) {
        if (root instanceof ExactRoot.Explicit e) {
            return complex(e.re(), e.im());
        }
        if (root instanceof ExactRoot.OfUnity u) {
            String angle = angle(u);
            return "cos(" + angle + ") + i·sin(" + angle + ")";
        }
        if (root instanceof ExactRoot.Implicit i) {
            return "root " + i.index() + " of " + i.factor().toString(EquationText.LAMBDA);
        }
        throw new AssertionError(root);
    }

    /** The angle 2πk/order in lowest terms: {@code π/4}, {@code 3π/4}, {@code 2π/5}, {@code π}. */
    private static String angle(ExactRoot.OfUnity u) {
        int g = BigInteger.valueOf(2L * u.k()).gcd(BigInteger.valueOf(u.order())).intValueExact();
        int numerator = 2 * u.k() / g;
        int denominator = u.order() / g;
        return (numerator == 1 ? "" : Integer.toString(numerator)) + "π" + (denominator == 1 ? "" : "/" + denominator);
    }

    /** re + im·i rounded to {@code digits} significant digits; just re when im is 0. */
    public static String decimal(RootApproximation a, int digits) {
        String re = Numbers.decimal(a.re(), digits);
        if (a.im().signum() == 0) {
            return re;
        }
        return join(a.re().signum() == 0 ? "" : re, a.im().signum() < 0, Numbers.decimal(a.im().abs(), digits) + "i");
    }

    private static String complex(Surd re, Surd im) {
        if (im.isZero()) {
            return re.toString();
        }
        Surd size = im.signum() < 0 ? im.negate() : im;
        String imaginary = size.isRational() && size.rational().isOne() ? "i"
                : size.isRational() && size.rational().isInteger() ? size + "i"
                : !size.rational().isZero() ? "(" + size + ")·i" : size + "·i";
        return join(re.isZero() ? "" : re.toString(), im.signum() < 0, imaginary);
    }

    /** re ± imaginary, or ±imaginary alone when re is empty. */
    private static String join(String re, boolean negative, String imaginary) {
        if (re.isEmpty()) {
            return (negative ? "-" : "") + imaginary;
        }
        return re + (negative ? " - " : " + ") + imaginary;
    }
}
