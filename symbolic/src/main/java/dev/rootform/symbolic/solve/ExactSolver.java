package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.NumberField;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.work.Deadline;
import java.util.ArrayList;
import java.util.List;

/**
 * The exact solution of a homogeneous equation from its initial state, by transform and partial
 * fractions. With v the initial state and χ(λ) = Σ a_j λ^j, both transforms give the same rational
 * function P/χ with P(z) = Σ_j a_j Σ_{i&lt;j} v_i z^{j-1-i}:
 * <ul>
 *   <li>differential: the Laplace transform Y(s) = P(s)/χ(s); 1/(s-α)^i ↔ u^{i-1}/(i-1)!·e^{αu};</li>
 *   <li>difference: the z-transform X(z) = z·P(z)/χ(z); z/(z-α)^i ↔ C(ν, i-1)·α^{ν-i+1}.</li>
 * </ul>
 * The Laurent coefficients at each root come from {@link Residues}, in the number field of the
 * root, so the result is exact for every degree. A root λ = 0 of multiplicity m of a difference
 * equation only changes the first m values, which are listed instead (the formula then holds
 * from origin + m on).
 *
 * @since 0.1
 */
final class ExactSolver {
    private ExactSolver() {
    }

    /**
     * The solution in the kernel of the operator μ with the given initial state (deg μ values);
     * {@code factors} is the factorisation of μ.
     */
    static ExactSolution solve(LinearEquation equation, ForcingPart part, RationalPolynomial operator,
            List<Factor> factors, InitialState state) {
        RationalPolynomial p = transformNumerator(operator.coefficients(), state.values());
        boolean difference = equation.domain() == Domain.DIFFERENCE;
        int zeroMultiplicity = difference ? operator.zeroRootMultiplicity() : 0;
        List<Component> components = new ArrayList<>();
        for (Factor f : factors) {
            if (difference && f.polynomial().equals(RationalPolynomial.X)) {
                continue;
            }
            Deadline.checkCurrent();
            List<RationalPolynomial> b = Residues.at(f, p, operator);
            NumberField k = new NumberField(f.polynomial());
            List<RationalPolynomial> c = difference ? sequenceBasis(k, b, state.origin()) : functionBasis(b);
            components.add(new Component(f, c));
        }
        long origin = difference ? state.origin().toBigInteger().longValueExact() : 0;
        return new ExactSolution(equation, part, operator, state.origin(), origin + zeroMultiplicity,
                state.values().subList(0, zeroMultiplicity), components);
    }

    /** P(z) = Σ_j a_j Σ_{i<j} v_i z^{j-1-i}. */
    static RationalPolynomial transformNumerator(List<Rational> a, List<Rational> v) {
        Rational[] p = new Rational[Math.max(1, a.size() - 1)];
        java.util.Arrays.fill(p, Rational.ZERO);
        for (int j = 1; j < a.size(); j++) {
            for (int i = 0; i < j; i++) {
                p[j - 1 - i] = p[j - 1 - i].add(a.get(j).multiply(v.get(i)));
            }
        }
        return RationalPolynomial.of(p);
    }

    /** c_{i-1} = B_i/(i-1)!: the coefficient of u^{i-1} e^{αu}. */
    private static List<RationalPolynomial> functionBasis(List<RationalPolynomial> b) {
        List<RationalPolynomial> c = new ArrayList<>(b.size());
        Rational factorial = Rational.ONE;
        for (int i = 0; i < b.size(); i++) {
            c.add(b.get(i).multiply(factorial.inverse()));
            factorial = factorial.multiply(i + 1);
        }
        return c;
    }

    /**
     * Coefficients of n^j·α^n: first in ν = n - origin, c_j = Σ_i B_i·α^{1-i}·[ν^j]C(ν, i-1); then
     * re-expanded in n with (n - origin)^j = Σ_l C(j,l)·n^l·(-origin)^{j-l} and α^{-origin}.
     */
    private static List<RationalPolynomial> sequenceBasis(NumberField k, List<RationalPolynomial> b, Rational origin) {
        int m = b.size();
        RationalPolynomial alpha = k.generator();
        List<RationalPolynomial> c = zeros(m);
        for (int i = 1; i <= m; i++) {
            Deadline.checkCurrent();
            RationalPolynomial weight = k.multiply(b.get(i - 1), k.pow(alpha, 1 - i));
            RationalPolynomial binomial = binomialPolynomial(i - 1);
            for (int j = 0; j < m; j++) {
                c.set(j, c.get(j).add(weight.multiply(binomial.coefficient(j))));
            }
        }
        if (origin.isZero()) {
            return c;
        }
        RationalPolynomial scale = k.pow(alpha, -origin.toBigInteger().longValueExact());
        List<RationalPolynomial> shifted = zeros(m);
        for (int j = 0; j < m; j++) {
            RationalPolynomial expanded = RationalPolynomial.X.subtract(RationalPolynomial.constant(origin)).pow(j);
            for (int l = 0; l <= j; l++) {
                shifted.set(l, shifted.get(l).add(c.get(j).multiply(expanded.coefficient(l))));
            }
        }
        List<RationalPolynomial> result = new ArrayList<>(m);
        for (RationalPolynomial s : shifted) {
            result.add(k.multiply(s, scale));
        }
        return result;
    }

    /** C(ν, q) = ν(ν-1)...(ν-q+1)/q! as a polynomial in ν. */
    static RationalPolynomial binomialPolynomial(int q) {
        RationalPolynomial p = RationalPolynomial.ONE;
        for (int r = 0; r < q; r++) {
            p = p.multiply(RationalPolynomial.of(Rational.of(-r, r + 1), Rational.of(1, r + 1)));
        }
        return p;
    }

    private static List<RationalPolynomial> zeros(int m) {
        List<RationalPolynomial> z = new ArrayList<>(m);
        for (int i = 0; i < m; i++) {
            z.add(RationalPolynomial.ZERO);
        }
        return z;
    }
}
