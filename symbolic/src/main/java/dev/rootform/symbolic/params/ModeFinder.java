package dev.rootform.symbolic.params;

import dev.rootform.symbolic.algebra.ParamFactor;
import dev.rootform.symbolic.algebra.ParamPolynomial;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.backend.JasMultivariate;
import dev.rootform.symbolic.model.Domain;
import java.util.ArrayList;
import java.util.List;

/**
 * The modes of μ = χ·A over Q(params): χ factored over Q[params][λ] (irreducible there means
 * irreducible over Q(params), by Gauss's lemma), A from the forcing terms ((λ − r)^(p+1),
 * ((λ − r)² + w²)^(p+1), (λ − a)^(p+1)), equal factors merged. Also the polynomials that must not
 * vanish: contents and leading coefficients (else the order drops), the denominators of every
 * coefficient, amplitude, rate, frequency and condition value, a recurrence's forcing bases.
 */
final class ModeFinder {
    /** The modes and the polynomials that must not vanish. */
    record Modes(List<ParamMode> modes, List<ParamPolynomial> nonzero) { }

    /** An irreducible factor of degree 3 or more in λ, which this path does not solve. */
    static final class HighDegree extends RuntimeException {
        private static final long serialVersionUID = 1L;

        HighDegree(String message) {
            super(message, null, false, false);
        }
    }

    private ModeFinder() {
    }

    /** @throws HighDegree for an irreducible factor of χ of degree ≥ 3 over Q(params), or a zero root of a recurrence */
    static Modes of(ParametricProblem problem, List<String> names) {
        List<String> ring = new ArrayList<>(problem.parameters());
        ring.add("λ");
        int lambda = ring.size() - 1;
        List<ParamPolynomial> a = Stability.integral(problem.coefficients());
        ParamPolynomial chi = ParamPolynomial.constant(ring, Rational.ZERO);
        ParamPolynomial x = ParamPolynomial.variable(ring, lambda);
        for (int j = 0; j < a.size(); j++) {
            chi = chi.add(a.get(j).over(ring).multiply(x.pow(j)));
        }
        List<ParamMode> modes = new ArrayList<>();
        List<ParamPolynomial> nonzero = new ArrayList<>();
        List<ParamFactor> factors = JasMultivariate.factor(chi);
        for (ParamFactor f : factors.subList(1, factors.size())) {
            ParamPolynomial p = f.polynomial();
            int degree = p.degreeIn(lambda);
            List<ParamFunction> c = new ArrayList<>();
            for (int i = 0; i <= degree; i++) {
                c.add(ParamFunction.of(p.coefficientOf(lambda, i).over(names)));
            }
            if (degree == 0) {
                nonzero.add(p.over(names));
                continue;
            }
            nonzero.add(p.coefficientOf(lambda, degree).over(names));
            if (degree == 1) {
                ParamFunction root = c.get(0).negate().divide(c.get(1));
                if (problem.domain() == Domain.DIFFERENCE && root.isZero()) {
                    throw new HighDegree("λ = 0 is a root of the characteristic polynomial: with parameters, write the recurrence"
                            + " without the missing lowest shift");
                }
                modes.add(new ParamMode(false, root, ParamFunction.zero(names), null, f.multiplicity(), f.multiplicity()));
            } else if (degree == 2) {
                ParamFunction two = ParamFunction.constant(names, Rational.of(2));
                ParamFunction centre = c.get(1).negate().divide(two.multiply(c.get(2)));
                ParamPolynomial b = p.coefficientOf(lambda, 1).over(problem.parameters());
                ParamPolynomial lead = p.coefficientOf(lambda, 2).over(problem.parameters());
                ParamPolynomial constant = p.coefficientOf(lambda, 0).over(problem.parameters());
                ParamPolynomial discriminant = b.multiply(b).subtract(lead.multiply(constant).scale(Rational.of(4)));
                ParamFunction square = ParamFunction.of(discriminant.over(names))
                        .divide(ParamFunction.of(lead.over(names)).pow(2).scale(Rational.of(4)));
                modes.add(new ParamMode(true, centre, square, discriminant, f.multiplicity(), f.multiplicity()));
            } else {
                throw new HighDegree("the characteristic polynomial has the irreducible factor " + p
                        + " of degree " + degree + " in λ over Q(" + String.join(", ", problem.parameters())
                        + "): its roots have no closed form here; give the parameters values with --at");
            }
        }
        for (ParamFunction c : problem.coefficients()) {
            nonzero.add(c.denominator().over(names));
        }
        for (ParamCondition c : problem.conditions()) {
            nonzero.add(c.value().denominator().over(names));
        }
        for (ParamTerm t : problem.forcing()) {
            for (ParamFunction f : List.of(t.amplitude(), t.rate(), t.frequency())) {
                nonzero.add(f.denominator().over(names));
            }
            if (problem.domain() == Domain.DIFFERENCE) {
                nonzero.add(t.rate().numerator().over(names));
            }
            ParamMode forced = t.wave() == ParamTerm.Wave.NONE
                    ? new ParamMode(false, over(t.rate(), names), ParamFunction.zero(names), null, 0, t.power() + 1)
                    : new ParamMode(true, over(t.rate(), names), over(t.frequency(), names).pow(2).negate(), null, 0, t.power() + 1);
            if (t.wave() != ParamTerm.Wave.NONE) {
                nonzero.add(t.frequency().numerator().over(names));
            }
            merge(modes, forced);
        }
        return new Modes(List.copyOf(modes), List.copyOf(nonzero));
    }

    private static void merge(List<ParamMode> modes, ParamMode forced) {
        for (int i = 0; i < modes.size(); i++) {
            ParamMode m = modes.get(i);
            if (m.sameRoots(forced)) {
                int extra = m.inEquation() + forced.multiplicity();
                modes.set(i, m.withMultiplicities(m.inEquation(), Math.max(m.multiplicity(), extra)));
                return;
            }
        }
        modes.add(forced);
    }

    /** A function of the parameters over the working names (which may add free constants). */
    static ParamFunction over(ParamFunction f, List<String> names) {
        return f.names().equals(names) ? f : ParamFunction.of(f.numerator().over(names), f.denominator().over(names));
    }
}
