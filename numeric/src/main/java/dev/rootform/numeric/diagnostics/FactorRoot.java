package dev.rootform.numeric.diagnostics;

import dev.rootform.numeric.roots.RootApproximation;
import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.ExactRoot;
import dev.rootform.symbolic.closedform.Surd;
import java.util.ArrayList;
import java.util.List;

/**
 * A root of the characteristic polynomial with the irreducible factor it belongs to (and so its
 * multiplicity), and its value in double precision (approximate).
 */
record FactorRoot(Factor factor, RootApproximation approximation) {
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
