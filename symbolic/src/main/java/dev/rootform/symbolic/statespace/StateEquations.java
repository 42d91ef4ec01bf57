package dev.rootform.symbolic.statespace;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.matrix.RationalMatrix;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.model.InputException;
import java.util.ArrayList;
import java.util.List;

/**
 * The scalar problems that describe a state-space model, for the exact solver. With μ(λ) = Σ μ_k λ^k
 * the minimal polynomial of A (degree d) and L = D or E:
 * <ul>
 *   <li>the fundamental solutions φ_k (μ(L)φ = 0, L^jφ(0) = δ_jk), so that e^(At) = Σ_k φ_k(t)·A^k
 *       and A^n = Σ_k φ_k[n]·A^k;</li>
 *   <li>each state and output of a response: from x' = Ax + bu, L^k x = A^k x + Σ_{l&lt;k} A^{k-1-l}
 *       b·L^l u, so μ(L)x = Σ_l N_l b·L^l u with N_{d-1} = I, N_{l-1} = A·N_l + μ_l·I (μ(A) = 0),
 *       and y = Cx + D·1·u likewise; the initial values follow from the same recursion.</li>
 * </ul>
 * The input u acts on every input channel (b = B·1, the row sums of B).
 *
 * @since 0.3
 */
public final class StateEquations {
    private final StateModel model;
    private final RationalPolynomial minimal;
    private final int order;

    /** @param minimal the minimal polynomial of A (any monic polynomial with μ(A) = 0 works) */
    public StateEquations(StateModel model, RationalPolynomial minimal) {
        this.model = model;
        this.minimal = minimal;
        this.order = minimal.degree();
    }

    private boolean continuous() {
        return model.continuous();
    }

    /** φ_0 .. φ_{d-1}, named {@code φ}. */
    public List<Problem> fundamentals() {
        List<Problem> problems = new ArrayList<>();
        for (int k = 0; k < order; k++) {
            List<Rational> values = new ArrayList<>();
            for (int j = 0; j < order; j++) {
                values.add(j == k ? Rational.ONE : Rational.ZERO);
            }
            problems.add(new Problem(equation("φ", List.of()), conditions(values, 0)));
        }
        return problems;
    }

    /**
     * The states x1..xn and outputs y1..yp of the response to the initial state and the input.
     *
     * @throws InputException when the input has no exact treatment here (see {@link InputCalculus}),
     *     or for the pulse response of a discrete model with singular A
     */
    public List<Signal> response(List<Rational> x0, Input input) {
        RationalMatrix ones = RationalMatrix.column(java.util.Collections.nCopies(model.inputs(), Rational.ONE));
        List<Rational> b = model.b().multiply(ones).column(0);
        List<Rational> dd = model.d().multiply(ones).column(0);
        if (input instanceof Input.Impulse) {
            return pulse(x0, b, dd);
        }
        List<List<ForcingTerm>> u = new ArrayList<>();
        u.add(input.terms(model.domain()));
        for (int l = 0; l < order; l++) {
            u.add(InputCalculus.next(model.domain(), u.get(l)));
        }
        List<Rational> u0 = new ArrayList<>();
        for (int m = 0; m <= order; m++) {
            u0.add(continuous() ? InputCalculus.valueAt(Domain.DIFFERENTIAL, u.get(m), 0)
                    : InputCalculus.valueAt(Domain.DIFFERENCE, u.get(0), m));
        }
        List<List<Rational>> states = new ArrayList<>();
        states.add(x0);
        for (int m = 0; m < order; m++) {
            states.add(add(model.a().multiply(states.get(m)), scale(b, u0.get(m))));
        }
        List<RationalMatrix> n = feedMatrices();
        List<Signal> signals = new ArrayList<>();
        for (int i = 0; i < model.states(); i++) {
            List<Rational> w = new ArrayList<>();
            for (int l = 0; l < order; l++) {
                w.add(n.get(l).multiply(b).get(i));
            }
            signals.add(signal("x" + (i + 1), InputCalculus.combination(w, u), component(states, i), 0));
        }
        for (int r = 0; r < model.outputs(); r++) {
            List<Rational> w = new ArrayList<>();
            for (int l = 0; l <= order; l++) {
                Rational through = dd.get(r).multiply(minimal.coefficient(l));
                w.add(l == order ? through : model.c().multiply(n.get(l).multiply(b)).get(r).add(through));
            }
            List<Rational> values = new ArrayList<>();
            for (int m = 0; m < order; m++) {
                values.add(model.c().multiply(states.get(m)).get(r).add(dd.get(r).multiply(u0.get(m))));
            }
            signals.add(signal("y" + (r + 1), InputCalculus.combination(w, u), values, 0));
        }
        return signals;
    }

    /**
     * The impulse response: continuous, x(0+) = x0 + b and y = Cx + D·1·δ(t); discrete, x[1] =
     * A·x0 + b, then the free response from n = 1 (x[0] = x0, y[0] = C·x0 + D·1).
     */
    private List<Signal> pulse(List<Rational> x0, List<Rational> b, List<Rational> dd) {
        List<List<Rational>> states = new ArrayList<>();
        int start = continuous() ? 0 : 1;
        if (!continuous() && minimal.coefficient(0).isZero()) {
            throw new InputException("impulse: the pulse response of a discrete model with singular A (λ = 0 an"
                    + " eigenvalue) is out of scope; use --x0 with A·x0 + B·1 for the response from n = 1", "", -1);
        }
        states.add(continuous() ? add(x0, b) : add(model.a().multiply(x0), b));
        for (int m = 1; m < order; m++) {
            states.add(model.a().multiply(states.get(m - 1)));
        }
        List<Signal> signals = new ArrayList<>();
        for (int i = 0; i < model.states(); i++) {
            Problem p = new Problem(equation("x" + (i + 1), List.of()), conditions(component(states, i), start));
            signals.add(new Signal("x" + (i + 1), p, start, start == 1 ? x0.get(i) : Rational.ZERO, Rational.ZERO));
        }
        for (int r = 0; r < model.outputs(); r++) {
            List<Rational> values = new ArrayList<>();
            for (List<Rational> x : states) {
                values.add(model.c().multiply(x).get(r));
            }
            Problem p = new Problem(equation("y" + (r + 1), List.of()), conditions(values, start));
            Rational before = model.c().multiply(x0).get(r).add(dd.get(r));
            signals.add(new Signal("y" + (r + 1), p, start, start == 1 ? before : Rational.ZERO,
                    continuous() ? dd.get(r) : Rational.ZERO));
        }
        return signals;
    }

    /** N_0 .. N_{d-1}: N_{d-1} = I, N_{l-1} = A·N_l + μ_l·I. */
    List<RationalMatrix> feedMatrices() {
        RationalMatrix[] n = new RationalMatrix[order];
        RationalMatrix identity = RationalMatrix.identity(model.states());
        n[order - 1] = identity;
        for (int l = order - 1; l > 0; l--) {
            n[l - 1] = model.a().multiply(n[l]).add(identity.scale(minimal.coefficient(l)));
        }
        return List.of(n);
    }

    private Signal signal(String name, List<ForcingTerm> forcing, List<Rational> values, int start) {
        return new Signal(name, new Problem(equation(name, forcing), conditions(values, start)), start, Rational.ZERO,
                Rational.ZERO);
    }

    private LinearEquation equation(String name, List<ForcingTerm> forcing) {
        return new LinearEquation(model.domain(), name, continuous() ? "t" : "n", minimal.coefficients(), 0, forcing);
    }

    /** L^m s(0) = values[m] (continuous) or s[start + m] = values[m] (discrete), m &lt; d. */
    private List<Condition> conditions(List<Rational> values, int start) {
        List<Condition> conditions = new ArrayList<>();
        for (int m = 0; m < order; m++) {
            conditions.add(continuous() ? new Condition(m, Rational.ZERO, values.get(m))
                    : new Condition(0, Rational.of(start + m), values.get(m)));
        }
        return conditions;
    }

    private List<Rational> component(List<List<Rational>> vectors, int i) {
        List<Rational> c = new ArrayList<>();
        for (int m = 0; m < order; m++) {
            c.add(vectors.get(m).get(i));
        }
        return c;
    }

    private static List<Rational> add(List<Rational> a, List<Rational> b) {
        List<Rational> s = new ArrayList<>();
        for (int i = 0; i < a.size(); i++) {
            s.add(a.get(i).add(b.get(i)));
        }
        return s;
    }

    private static List<Rational> scale(List<Rational> v, Rational f) {
        return v.stream().map(x -> x.multiply(f)).toList();
    }
}
