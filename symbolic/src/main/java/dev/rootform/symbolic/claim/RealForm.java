package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.Angle;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.work.Deadline;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * Writes an exact exponential polynomial as the tool's real closed form, the tree every renderer
 * walks: real modes become exponentials or powers, conjugate pairs become cos/sin terms
 * (c·β^n + c̄·β̄^n = r^n·(2 Re c·cos nθ − 2 Im c·sin nθ) with β = r·e^{iθ}; likewise
 * e^{at}(… cos ωt … sin ωt) for λ = a + iω), and root sums of degree 3 or more stay root sums.
 * Empty when a number has no surd form a + b·√r, the form is not real, or a function's terms have
 * no common origin t0 (all exponentials e^{λ(t − t0)}).
 */
final class RealForm {
    private RealForm() {
    }

    static Optional<ClosedForm> of(ExpSum sum, String function, String variable) {
        ExpSum s = materialized(sum);
        ExactRing ring = s.ring();
        boolean sequence = s.domain() == Domain.DIFFERENCE;
        Optional<Rational> origin = sequence ? Optional.of(Rational.ZERO) : origin(s);
        if (origin.isEmpty()) {
            return Optional.empty();
        }
        Rational s0 = origin.get();
        List<Term> terms = new ArrayList<>();
        Set<ExpSum.Mode> done = new HashSet<>();
        for (Map.Entry<ExpSum.Mode, List<Algebraic>> e : s.modes().entrySet()) {
            ExpSum.Mode mode = e.getKey();
            if (sequence && !mode.phase().isZero()) {
                return Optional.empty();
            }
            if (!done.add(mode)) {
                continue;
            }
            List<Algebraic> q = Polynomials.taylorShift(e.getValue(), ring.rational(s0), ring);
            Algebraic rate = mode.rate();
            if (rate.isReal()) {
                Optional<Surd> r = rate.toSurd();
                if (r.isEmpty() || !exponentials(q, r.get(), terms)) {
                    return Optional.empty();
                }
                continue;
            }
            ExpSum.Mode partner = new ExpSum.Mode(rate.conjugate(), mode.phase().conjugate());
            List<Algebraic> other = s.modes().get(partner);
            if (other == null || !other.equals(e.getValue().stream().map(Algebraic::conjugate).toList())) {
                return Optional.empty();
            }
            done.add(partner);
            Optional<Surd> imaginary = rate.imaginaryPart().toSurd();
            if (imaginary.isEmpty()) {
                return Optional.empty();
            }
            boolean upper = imaginary.get().signum() > 0;
            List<Algebraic> upperPoly = upper ? q : Polynomials.taylorShift(other, ring.rational(s0), ring);
            Optional<Wave> wave = sequence ? sequenceWave(upper ? rate : rate.conjugate())
                    : functionWave(upper ? rate : rate.conjugate());
            if (wave.isEmpty() || !oscillations(upperPoly, wave.get(), terms)) {
                return Optional.empty();
            }
        }
        for (Map.Entry<ExpSum.Block, List<Algebraic>> e : s.blocks().entrySet()) {
            if (!rootSums(e.getKey().factor(), e.getValue(), terms)) {
                return Optional.empty();
            }
        }
        return Optional.of(new ClosedForm(s.domain(), function, variable, s0, 0, List.of(), terms, List.of()));
    }

    /** Growth and angle of a pair of modes. */
    private record Wave(Surd growth, Angle angle) {
    }

    /** λ = a + iω: e^{at} with frequency ω. */
    private static Optional<Wave> functionWave(Algebraic rate) {
        Optional<Surd> a = rate.realPart().toSurd();
        Optional<Surd> w = rate.imaginaryPart().toSurd();
        return a.isPresent() && w.isPresent() ? Optional.of(new Wave(a.get(), new Angle.Value(w.get()))) : Optional.empty();
    }

    /** β = r·e^{iθ} with r² rational: θ a rational multiple of π when e^{iθ} is a root of unity, else arccos(cos θ). */
    private static Optional<Wave> sequenceWave(Algebraic beta) {
        ExactRing ring = beta.ring();
        Optional<Rational> r2 = beta.multiply(beta.conjugate()).toRational();
        if (r2.isEmpty()) {
            return Optional.empty();
        }
        Surd r = Surd.sqrt(r2.get());
        Algebraic unit = beta.divide(ring.sqrt(r2.get()));
        int order = rootOfUnityOrder(unit);
        if (order > 0) {
            for (int k = 1; 2 * k < order; k++) {
                Rational q = Rational.of(2L * k, order);
                if (ring.expIPi(q).equals(unit)) {
                    return Optional.of(new Wave(r, new Angle.PiMultiple(q)));
                }
            }
        }
        return unit.realPart().toSurd().map(c -> new Wave(r, new Angle.ArcCos(c)));
    }

    /** The least N with u^N = 1, or 0; φ(N) ≤ [F:Q] bounds N by 2·[F:Q]² (φ(N) ≥ √(N/2); common practice). */
    private static int rootOfUnityOrder(Algebraic u) {
        ExactRing ring = u.ring();
        int dimension = ring.cyclotomicDegree() * ring.masks();
        int bound = 2 * dimension * dimension + 2;
        Algebraic power = u;
        for (int n = 1; n <= bound; n++) {
            Deadline.checkCurrent();
            if (power.equals(ring.one())) {
                return n;
            }
            power = power.multiply(u);
        }
        return 0;
    }

    private static boolean exponentials(List<Algebraic> q, Surd rate, List<Term> terms) {
        for (int i = 0; i < q.size(); i++) {
            if (q.get(i).isZero()) {
                continue;
            }
            Optional<Surd> c = q.get(i).toSurd();
            if (c.isEmpty()) {
                return false;
            }
            terms.add(new Term.Exponential(new Coefficient.Exact(c.get()), i, rate));
        }
        return true;
    }

    /** c·e^{…} + c̄·e^{…} = 2 Re c·cos − 2 Im c·sin, per power. */
    private static boolean oscillations(List<Algebraic> q, Wave wave, List<Term> terms) {
        for (int i = 0; i < q.size(); i++) {
            Algebraic c = q.get(i);
            if (c.isZero()) {
                continue;
            }
            Optional<Surd> cosine = c.realPart().multiply(Rational.of(2)).toSurd();
            Optional<Surd> sine = c.imaginaryPart().multiply(Rational.of(-2)).toSurd();
            if (cosine.isEmpty() || sine.isEmpty()) {
                return false;
            }
            terms.add(new Term.Oscillating(new Coefficient.Exact(cosine.get()), new Coefficient.Exact(sine.get()), i,
                    wave.growth(), wave.angle()));
        }
        return true;
    }

    private static boolean rootSums(RationalPolynomial f, List<Algebraic> q, List<Term> terms) {
        for (int i = 0; i < q.size(); i++) {
            List<Coefficient> cs = new ArrayList<>();
            for (int j = 0; j < f.degree(); j++) {
                Optional<Surd> c = q.get(i).coordinate(j).toSurd();
                if (c.isEmpty()) {
                    return false;
                }
                cs.add(new Coefficient.Exact(c.get()));
            }
            Term.ConjugateSum t = new Term.ConjugateSum(f, cs, i);
            if (!t.vanishes()) {
                terms.add(t);
            }
        }
        return true;
    }

    /** The common t0 of e^{λ(t − t0)}: κ = −λ·t0 for every mode, and every root sum's origin. */
    private static Optional<Rational> origin(ExpSum s) {
        Set<Rational> candidates = new HashSet<>(s.blocks().keySet().stream().map(ExpSum.Block::origin).toList());
        for (ExpSum.Mode m : s.modes().keySet()) {
            if (m.rate().isZero()) {
                if (!m.phase().isZero()) {
                    return Optional.empty();
                }
                continue;
            }
            Optional<Rational> t0 = m.phase().divide(m.rate()).negate().toRational();
            if (t0.isEmpty()) {
                return Optional.empty();
            }
            candidates.add(t0.get());
        }
        return candidates.size() > 1 ? Optional.empty()
                : Optional.of(candidates.isEmpty() ? Rational.ZERO : candidates.iterator().next());
    }

    /**
     * The root sums of degree 1 and 2 written out over their roots (α = −f(0), or
     * (−b ± √(b² − 4c))/2), as the tool writes them.
     */
    private static ExpSum materialized(ExpSum s) {
        ExactRing ring = s.ring();
        ExpSum result = s.withoutBlocks();
        for (Map.Entry<ExpSum.Block, List<Algebraic>> e : s.blocks().entrySet()) {
            RationalPolynomial f = e.getKey().factor();
            if (f.degree() > 2) {
                result = result.add(ExpSum.rootSum(ring, s.domain(), e.getKey(), e.getValue()));
                continue;
            }
            for (Algebraic alpha : roots(f, ring)) {
                Algebraic phase = s.domain() == Domain.DIFFERENCE ? ring.zero()
                        : alpha.multiply(ring.rational(e.getKey().origin())).negate();
                List<Algebraic> inU = e.getValue().stream().map(c -> c.at(alpha)).toList();
                List<Algebraic> inV = Polynomials.taylorShift(inU, ring.rational(e.getKey().origin().negate()), ring);
                result = result.add(ExpSum.of(ring, s.domain(), new ExpSum.Mode(alpha, phase), inV));
            }
        }
        return result;
    }

    private static List<Algebraic> roots(RationalPolynomial f, ExactRing ring) {
        if (f.degree() == 1) {
            return List.of(ring.rational(f.coefficient(0).negate()));
        }
        Rational b = f.coefficient(1);
        Rational disc = b.multiply(b).subtract(f.coefficient(0).multiply(Rational.of(4)));
        Algebraic root = ring.sqrt(disc);
        Algebraic half = ring.rational(b.negate()).multiply(Rational.of(1, 2));
        return List.of(half.add(root.multiply(Rational.of(1, 2))), half.subtract(root.multiply(Rational.of(1, 2))));
    }

}
