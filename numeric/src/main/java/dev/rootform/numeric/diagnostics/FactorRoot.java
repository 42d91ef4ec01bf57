package dev.rootform.numeric.diagnostics;

import dev.rootform.numeric.roots.RootApproximation;
import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.ExactRoot;
import dev.rootform.symbolic.closedform.Surd;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;

/**
 * A root of the characteristic polynomial with the irreducible factor it belongs to (and so its
 * multiplicity), and its value in double precision (approximate; the double parts overflow for roots
 * beyond 1e308, so sizes come from {@link #exactModulus} and {@link #log10Modulus}).
 */
record FactorRoot(Factor factor, RootApproximation approximation) {
    /** Precision of the decimal quantities derived from the root (that of a double). */
    static final MathContext PRECISION = MathContext.DECIMAL64;

    double re() {
        return approximation.re().doubleValue();
    }

    double im() {
        return approximation.im().doubleValue();
    }

    /** |λ|, exactly 1 for a root of unity or an explicit root with re² + im² = 1 (decided exactly). */
    double modulus() {
        return unitModulus() ? 1.0 : Math.hypot(re(), im());
    }

    private boolean unitModulus() {
        ExactRoot root = approximation.root();
        if (root instanceof ExactRoot.OfUnity) {
            return true;
        }
        if (root instanceof ExactRoot.Explicit e) {
            try {
                return e.re().multiply(e.re()).add(e.im().multiply(e.im())).equals(Surd.of(Rational.ONE));
            } catch (ArithmeticException twoRadicands) {
                return false;
            }
        }
        return false;
    }

    /**
     * |λ| to {@link #PRECISION}, of any size (the double {@link #modulus} overflows beyond 1e308);
     * exactly 1 for a root of unity or an explicit root with re² + im² = 1.
     */
    BigDecimal exactModulus() {
        if (unitModulus()) {
            return BigDecimal.ONE;
        }
        BigDecimal re = approximation.re();
        BigDecimal im = approximation.im();
        return re.multiply(re).add(im.multiply(im)).sqrt(PRECISION);
    }

    /** log10 |λ| for a nonzero root of any size. */
    double log10Modulus() {
        return log10(exactModulus());
    }

    /** log10 |x| of a nonzero decimal of any size. */
    static double log10(BigDecimal x) {
        BigDecimal a = x.abs();
        int exponent = a.precision() - a.scale();
        return exponent + Math.log10(a.movePointLeft(exponent).doubleValue());
    }

    int multiplicity() {
        return factor.multiplicity();
    }

    /** Pairs each root with its factor; the roots come factor by factor, deg f of them per factor. */
    static List<FactorRoot> of(List<Factor> factors, List<RootApproximation> roots) {
        List<FactorRoot> entries = new ArrayList<>();
        int next = 0;
        for (Factor f : factors) {
            for (int j = 0; j < f.degree(); j++) {
                entries.add(new FactorRoot(f, roots.get(next++)));
            }
        }
        return entries;
    }
}
