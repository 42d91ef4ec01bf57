package dev.rootform.symbolic.response;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.algebra.RationalFunction;
import dev.rootform.symbolic.transfer.TransferFunction;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Optional;

/**
 * Turns a transfer function and an input into a {@link ResponsePlan}, exactly. With Y = H·U:
 *
 * <ul>
 *   <li>s: Y = P(s) + M(s) with P a polynomial (the impulses Σ p_m δ^(m)(t)) and M strictly
 *   proper; m(t) = L⁻¹[M] for t &gt; 0 has m^(i)(0+) = c_(i+1), the coefficients of M = Σ c_k s^(−k)
 *   at infinity (initial-value theorem applied to s^i M, common practice);</li>
 *   <li>z: in w = z^-1, Y = Q(w) + R(w)/A(w) with Q a polynomial (the impulses Σ q_k δ[n − k]) and
 *   m[n] = [w^n] R/A a pure sum of modes for n &ge; 0, its values by long division.</li>
 * </ul>
 *
 * The modes part m obeys χ_H(L) m = g, with χ_H the denominator of H (in z without its roots at 0)
 * and g annihilated by A_g = χ_M / gcd(χ_M, χ_H): g carries the input's modes only. When g can be
 * written as forcing terms with rational coefficients (fitted exactly from its first values), the
 * problem is that forced equation with the initial values of y, so the solver splits transient and
 * steady parts; otherwise it is χ_M(L) y = 0 with the same values.
 *
 * @since 0.3
 */
public final class ResponseBuilder {
    private static final String OUTPUT = "y";

    private ResponseBuilder() {
    }

    /**
     * @throws InputException if the input's transform is not rational over Q, or H(z) is not causal
     */
    public static ResponsePlan plan(TransferFunction h, Input input) {
        Domain domain = h.domain();
        RationalFunction u = input instanceof Input.Impulse ? RationalFunction.ONE
                : Transforms.of(input.terms(domain), domain).orElseThrow(() -> new InputException("input " + input.text()
                        + ": its " + (domain == Domain.DIFFERENTIAL ? "Laplace transform" : "z-transform")
                        + " is not rational over Q (a frequency that is a multiple of π in t, or cos θ"
                        + " irrational in n): out of scope for the response", input.text(), 0));
        RationalFunction y = h.value().multiply(u);
        return domain == Domain.DIFFERENTIAL ? continuous(h, input, y) : discrete(h, input, y);
    }

    private static ResponsePlan continuous(TransferFunction h, Input input, RationalFunction y) {
        RationalPolynomial p = y.polynomialPart();
        List<Impulse> impulses = new ArrayList<>();
        for (int m = 0; m <= p.degree(); m++) {
            if (!p.coefficient(m).isZero()) {
                impulses.add(new Impulse(m, p.coefficient(m)));
            }
        }
        RationalFunction modes = y.strictlyProperPart();
        RationalPolynomial chiM = modes.isZero() ? RationalPolynomial.ONE : modes.denominator();
        RationalPolynomial chiH = h.value().denominator();
        List<Rational> values = modes.seriesAtInfinity(chiM.degree() + chiH.degree() + 1);
        Optional<List<ForcingTerm>> forced = chiH.degree() < 1 ? Optional.empty()
                : forcedPart(chiH, chiM, values, 0, Domain.DIFFERENTIAL);
        if (forced.isPresent()) {
            Problem problem = new Problem(equation(Domain.DIFFERENTIAL, chiH, 0, forced.get()),
                    derivatives(values, chiH.degree()));
            return new ResponsePlan(h, input, y, problem, impulses, ResponsePlan.Split.FORCED);
        }
        RationalPolynomial chi = chiM.degree() < 1 ? RationalPolynomial.X : chiM;
        Problem problem = new Problem(equation(Domain.DIFFERENTIAL, chi, 0, List.of()), derivatives(values, chi.degree()));
        return new ResponsePlan(h, input, y, problem, impulses, fallbackSplit(chiH));
    }

    private static ResponsePlan discrete(TransferFunction h, Input input, RationalFunction y) {
        RationalFunction hz = h.value();
        if (!hz.isProper()) {
            throw new InputException(h.signature() + " is not causal: the numerator's degree " + hz.numerator().degree()
                    + " exceeds the denominator's " + hz.denominator().degree()
                    + " (an output ahead of its input); out of scope for the response", "", -1);
        }
        RationalFunction w = y.reciprocalArgument();
        RationalPolynomial q = w.polynomialPart();
        List<Impulse> impulses = new ArrayList<>();
        for (int k = 0; k <= q.degree(); k++) {
            if (!q.coefficient(k).isZero()) {
                impulses.add(new Impulse(k, q.coefficient(k)));
            }
        }
        RationalFunction modes = w.strictlyProperPart();
        RationalPolynomial chiM = modes.isZero() ? RationalPolynomial.ONE : modes.denominator().reversed().monic();
        RationalPolynomial den = hz.denominator();
        RationalPolynomial chiH = den.divide(RationalPolynomial.monomial(Rational.ONE, den.zeroRootMultiplicity()));
        int delays = q.degree() + 1;
        List<Rational> m = modes.isZero() ? Collections.nCopies(delays + chiM.degree() + chiH.degree() + 1, Rational.ZERO)
                : modes.seriesAtZero(delays + chiM.degree() + chiH.degree() + 1);
        List<Rational> values = new ArrayList<>(m);
        for (int k = 0; k <= q.degree(); k++) {
            values.set(k, values.get(k).add(q.coefficient(k)));
        }
        Optional<List<ForcingTerm>> forced = chiH.degree() < 1 ? Optional.empty()
                : forcedPart(chiH, chiM, m, delays, Domain.DIFFERENCE);
        if (forced.isPresent()) {
            Problem problem = new Problem(equation(Domain.DIFFERENCE, chiH, delays, forced.get()),
                    samples(values, delays + chiH.degree()));
            return new ResponsePlan(h, input, y, problem, impulses, ResponsePlan.Split.FORCED);
        }
        int zeros = delays + chiM.degree() == 0 ? 1 : delays;
        Problem problem = new Problem(equation(Domain.DIFFERENCE, chiM, zeros, List.of()), samples(values, zeros + chiM.degree()));
        return new ResponsePlan(h, input, y, problem, impulses, fallbackSplit(chiH));
    }

    private static ResponsePlan.Split fallbackSplit(RationalPolynomial chiH) {
        return chiH.degree() < 1 ? ResponsePlan.Split.STEADY_ONLY : ResponsePlan.Split.NONE;
    }

    /**
     * g(v) = (χ_H(L) m)(v + offset) as forcing terms with rational coefficients, fitted to its
     * first deg A_g values; empty when g's modes cannot be written as such terms.
     *
     * @param m the values m_0, m_1, … (derivatives at 0+ or samples), at least offset + deg χ_H + deg A_g of them
     */
    private static Optional<List<ForcingTerm>> forcedPart(RationalPolynomial chiH, RationalPolynomial chiM, List<Rational> m,
            int offset, Domain domain) {
        RationalPolynomial annihilator = chiM.divide(chiM.gcd(chiH));
        List<Rational> g = new ArrayList<>();
        for (int i = 0; i < annihilator.degree(); i++) {
            Rational s = Rational.ZERO;
            for (int j = 0; j <= chiH.degree(); j++) {
                s = s.add(chiH.coefficient(j).multiply(m.get(offset + i + j)));
            }
            g.add(s);
        }
        return ForcedPart.fit(annihilator, g, domain);
    }

    /** Σ_j a_j L^j y with a = (0,…,0 [zeros times], coefficients of χ) = forcing. */
    private static LinearEquation equation(Domain domain, RationalPolynomial chi, int zeros, List<ForcingTerm> forcing) {
        List<Rational> a = new ArrayList<>(Collections.nCopies(zeros, Rational.ZERO));
        a.addAll(chi.coefficients());
        return new LinearEquation(domain, OUTPUT, domain == Domain.DIFFERENTIAL ? "t" : "n", a, 0, forcing);
    }

    /** y^(i)(0) = values[i] for i &lt; count. */
    private static List<Condition> derivatives(List<Rational> values, int count) {
        List<Condition> c = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            c.add(new Condition(i, Rational.ZERO, values.get(i)));
        }
        return c;
    }

    /** y[i] = values[i] for i &lt; count. */
    private static List<Condition> samples(List<Rational> values, int count) {
        List<Condition> c = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            c.add(new Condition(0, Rational.of(i), values.get(i)));
        }
        return c;
    }
}
