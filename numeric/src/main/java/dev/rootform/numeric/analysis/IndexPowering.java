package dev.rootform.numeric.analysis;

import dev.rootform.symbolic.algebra.NumberField;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.solve.Component;
import dev.rootform.symbolic.solve.ExactSolution;
import dev.rootform.symbolic.work.Deadline;
import java.math.BigInteger;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Deque;
import java.util.List;
import org.apfloat.Apint;
import org.apfloat.ApintMath;

/**
 * The exact value x[n] = Σ_components Tr(w(n)·α^n) of a rational difference-equation solution at a
 * large index, with integers only: the same sum as {@link ExactSolution#valueAt}, whose fractions
 * with millions of digits would spend their time in gcds.
 *
 * <p>Per component, f is its monic factor of degree d and D the least common denominator of f's
 * coefficients, so β = D·α is a root of the monic integer polynomial g(y) = D^d·f(y/D). β^n mod g
 * comes from binary powering with apfloat's radix-10 integers (number-theoretic-transform
 * multiplication beyond a few hundred digits, where {@link BigInteger} has only Toom–Cook); with
 * β^n = Σ_j b_j·β^j, x[n]'s share is Σ_j b_j·D^j·Tr(w·α^j) / D^n, where the traces are small
 * rationals. For Fibonacci this is the doubling formula's work: two squarings and one product per bit
 * of n. The sum is put in lowest terms by dividing out only the numerator's common factors with the
 * few bases of the denominator (the traces' common denominator and the D's), never by a gcd of two
 * huge numbers (apfloat's takes minutes at two million digits).
 */
final class IndexPowering {
    /** A component's share: numerator / (denominator·scale^n). */
    private record Share(Apint numerator, BigInteger denominator, BigInteger scale) {
    }

    /** base^exponent, one factor of a denominator. */
    private record Power(BigInteger base, long exponent) {
    }

    /** n / base^k with the k that was divided out. */
    private record Divided(Apint rest, long k) {
    }

    private static final Apint MINUS_ONE = new Apint(-1);

    private IndexPowering() {
    }

    /**
     * x[n] exactly.
     *
     * @throws IllegalArgumentException if n is below the solution's first index with a closed form
     */
    static ExactDigits value(ExactSolution s, long n) {
        if (n < s.validFrom()) {
            throw new IllegalArgumentException("index " + n + " is below " + s.validFrom() + ", where the closed form starts");
        }
        List<Share> shares = new ArrayList<>();
        for (Component c : s.components()) {
            shares.add(share(c, n));
        }
        BigInteger commonDenominator = BigInteger.ONE;
        BigInteger commonScale = BigInteger.ONE;
        for (Share share : shares) {
            commonDenominator = lcm(commonDenominator, share.denominator());
            commonScale = lcm(commonScale, share.scale());
        }
        Apint sum = Apint.ZERO;
        for (Share share : shares) {
            Deadline.checkCurrent();
            Apint term = share.numerator().multiply(new Apint(commonDenominator.divide(share.denominator())));
            BigInteger rescale = commonScale.divide(share.scale());
            sum = sum.add(rescale.equals(BigInteger.ONE) ? term : term.multiply(ApintMath.pow(new Apint(rescale), n)));
        }
        return lowestTerms(sum, List.of(new Power(commonDenominator, 1), new Power(commonScale, n)));
    }

    private static Share share(Component c, long n) {
        RationalPolynomial f = c.factor().polynomial().monic();
        NumberField k = new NumberField(f);
        int d = f.degree();
        BigInteger scale = BigInteger.ONE;
        for (Rational q : f.coefficients()) {
            scale = lcm(scale, q.denominator());
        }
        Rational nn = Rational.of(n);
        RationalPolynomial weight = RationalPolynomial.ZERO;
        for (int j = c.coefficients().size() - 1; j >= 0; j--) {
            weight = weight.multiply(nn).add(c.coefficients().get(j));
        }
        weight = k.reduce(weight);
        // s_j = Tr(w·α^j)·D^j, brought to integers over one denominator
        List<Rational> traces = new ArrayList<>(d);
        RationalPolynomial alphaPower = RationalPolynomial.ONE;
        Rational scalePower = Rational.ONE;
        BigInteger denominator = BigInteger.ONE;
        for (int j = 0; j < d; j++) {
            Rational t = k.trace(k.multiply(weight, alphaPower)).multiply(scalePower);
            traces.add(t);
            denominator = lcm(denominator, t.denominator());
            alphaPower = k.multiply(alphaPower, k.generator());
            scalePower = scalePower.multiply(Rational.of(scale));
        }
        Apint[] modulus = new Apint[d];
        BigInteger scaleToPower = BigInteger.ONE;
        for (int i = d - 1; i >= 0; i--) {
            scaleToPower = scaleToPower.multiply(scale);
            modulus[i] = new Apint(f.coefficient(i).multiply(Rational.of(scaleToPower)).toBigInteger());
        }
        Apint[] power = power(modulus, n);
        Apint numerator = Apint.ZERO;
        for (int j = 0; j < d; j++) {
            Rational t = traces.get(j);
            if (!t.isZero()) {
                numerator = numerator.add(power[j].multiply(new Apint(t.multiply(Rational.of(denominator)).toBigInteger())));
            }
        }
        return new Share(numerator, denominator, scale);
    }

    /** β^n mod g, g = y^d + Σ_{i<d} g[i]·y^i monic with integer coefficients, by binary powering. */
    private static Apint[] power(Apint[] g, long n) {
        int d = g.length;
        Apint[] result = new Apint[d];
        Arrays.fill(result, Apint.ZERO);
        result[0] = Apint.ONE;
        for (int bit = 63 - Long.numberOfLeadingZeros(n); bit >= 0; bit--) {
            Deadline.checkCurrent();
            result = reduce(square(result), g);
            if ((n >>> bit & 1) == 1) {
                Apint[] shifted = new Apint[d + 1];
                shifted[0] = Apint.ZERO;
                System.arraycopy(result, 0, shifted, 1, d);
                result = reduce(shifted, g);
            }
        }
        return result;
    }

    /** a², coefficient by coefficient, each cross product once. */
    private static Apint[] square(Apint[] a) {
        int d = a.length;
        Apint[] c = new Apint[2 * d - 1];
        Arrays.fill(c, Apint.ZERO);
        for (int i = 0; i < d; i++) {
            if (a[i].signum() == 0) {
                continue;
            }
            c[2 * i] = c[2 * i].add(a[i].multiply(a[i]));
            for (int j = i + 1; j < d; j++) {
                if (a[j].signum() != 0) {
                    Apint product = a[i].multiply(a[j]);
                    c[i + j] = c[i + j].add(product).add(product);
                }
            }
        }
        return c;
    }

    /** c mod g (y^d = −Σ g[i]·y^i), the d low coefficients. */
    private static Apint[] reduce(Apint[] c, Apint[] g) {
        int d = g.length;
        Apint[] r = c.clone();
        for (int top = r.length - 1; top >= d; top--) {
            Apint t = r[top];
            if (t.signum() == 0) {
                continue;
            }
            for (int i = 0; i < d; i++) {
                Apint lower = r[top - d + i];
                if (g[i].equals(Apint.ONE)) {
                    r[top - d + i] = lower.subtract(t);
                } else if (g[i].equals(MINUS_ONE)) {
                    r[top - d + i] = lower.add(t);
                } else if (g[i].signum() != 0) {
                    r[top - d + i] = lower.subtract(t.multiply(g[i]));
                }
            }
        }
        return Arrays.copyOf(r, d);
    }

    /**
     * numerator / Π base^exponent in lowest terms. Each base is worked off against the numerator:
     * when it shares a factor g with it, either the base divides the numerator (its largest power
     * that does is divided out) or the base is split into g and base/g. What remains has no factor in
     * common with the numerator, so neither has the product.
     */
    private static ExactDigits lowestTerms(Apint numerator, List<Power> denominator) {
        if (numerator.signum() == 0) {
            return new ExactDigits(Apint.ZERO, Apint.ONE);
        }
        Deque<Power> work = new ArrayDeque<>(denominator);
        List<Power> kept = new ArrayList<>();
        Apint n = numerator;
        while (!work.isEmpty()) {
            Deadline.checkCurrent();
            Power p = work.pop();
            if (p.exponent() == 0 || p.base().equals(BigInteger.ONE)) {
                continue;
            }
            BigInteger common = n.mod(new Apint(p.base())).toBigInteger().gcd(p.base());
            if (common.equals(BigInteger.ONE)) {
                kept.add(p);
            } else if (common.equals(p.base())) {
                Divided divided = divideOut(n, p);
                n = divided.rest();
                work.push(new Power(p.base(), p.exponent() - divided.k()));
            } else {
                work.push(new Power(common, p.exponent()));
                work.push(new Power(p.base().divide(common), p.exponent()));
            }
        }
        Apint den = Apint.ONE;
        for (Power p : kept) {
            den = den.multiply(ApintMath.pow(new Apint(p.base()), p.exponent()));
        }
        return new ExactDigits(n, den);
    }

    /**
     * n / base^k for the largest k ≤ the power's exponent with base^k dividing n: divides by base,
     * base², base⁴, … while they divide (so a small k, the usual case, costs only divisions by small
     * numbers), then by the same squares from the largest down while they fit.
     */
    private static Divided divideOut(Apint n, Power p) {
        List<Apint> squares = new ArrayList<>();
        Apint square = new Apint(p.base());
        long k = 0;
        Apint rest = n;
        for (long step = 1; k + step <= p.exponent() && rest.mod(square).signum() == 0; step <<= 1) {
            Deadline.checkCurrent();
            rest = rest.divide(square);
            k += step;
            squares.add(square);
            square = square.multiply(square);
        }
        for (int i = squares.size() - 1; i >= 0; i--) {
            Deadline.checkCurrent();
            long step = 1L << i;
            if (k + step <= p.exponent() && rest.mod(squares.get(i)).signum() == 0) {
                rest = rest.divide(squares.get(i));
                k += step;
            }
        }
        return new Divided(rest, k);
    }

    private static BigInteger lcm(BigInteger a, BigInteger b) {
        return a.divide(a.gcd(b)).multiply(b);
    }
}
