package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Domain;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.UnaryOperator;

/**
 * An exponential polynomial with exact data, the canonical form of a claim: Σ P(v)·β^v·e^κ
 * (sequences) or Σ P(v)·e^{λv + κ} (functions), one polynomial P per mode (β or λ, κ), plus root
 * sums Σ_{f(α)=0} Q_α(u)·(α^u or e^{αu}) in u = v − origin whose coefficients lie in F[λ]/(f).
 * Exponential polynomials are closed under sums, products, shifts v → v + k and d/dv, which is what
 * makes a claim's residual L(claim) − g exact. Immutable.
 */
final class ExpSum {
    /** The exponential factor of a mode: β^v or e^{λv}, times e^κ. */
    record Mode(Algebraic rate, Algebraic phase) {
    }

    /** A root sum's factor f and the origin of its variable u = v − origin. */
    record Block(RationalPolynomial factor, Rational origin) {
    }

    private final ExactRing ring;
    private final Domain domain;
    private final Map<Mode, List<Algebraic>> modes;
    private final Map<Block, List<Algebraic>> blocks;

    private ExpSum(ExactRing ring, Domain domain, Map<Mode, List<Algebraic>> modes, Map<Block, List<Algebraic>> blocks) {
        this.ring = ring;
        this.domain = domain;
        this.modes = modes;
        this.blocks = blocks;
    }

    static ExpSum zero(ExactRing ring, Domain domain) {
        return new ExpSum(ring, domain, Map.of(), Map.of());
    }

    static ExpSum constant(ExactRing ring, Domain domain, Algebraic c) {
        return zero(ring, domain).plusMode(neutral(ring, domain), List.of(c));
    }

    static ExpSum variable(ExactRing ring, Domain domain) {
        return zero(ring, domain).plusMode(neutral(ring, domain), List.of(ring.zero(), ring.one()));
    }

    /** β^v·e^κ (sequences) or e^{λv + κ} (functions). */
    static ExpSum exponential(ExactRing ring, Domain domain, Algebraic rate, Algebraic phase) {
        return zero(ring, domain).plusMode(new Mode(rate, phase), List.of(ring.one()));
    }

    /** P(v) times the mode's exponential, P given by its coefficients. */
    static ExpSum of(ExactRing ring, Domain domain, Mode mode, List<Algebraic> coefficients) {
        return zero(ring, domain).plusMode(mode, coefficients);
    }

    /** Σ_{f(α)=0} Σ_i c_i(α)·u^i·(α^u or e^{αu}), with c_i in F[λ]/(f). */
    static ExpSum rootSum(ExactRing ring, Domain domain, Block block, List<Algebraic> coefficients) {
        ExpSum zero = zero(ring, domain);
        Map<Block, List<Algebraic>> b = new LinkedHashMap<>();
        List<Algebraic> trimmed = Polynomials.trim(coefficients);
        if (!trimmed.isEmpty()) {
            b.put(block, trimmed);
        }
        return new ExpSum(ring, domain, zero.modes, b);
    }

    /** The mode of the plain polynomials: rate 1 (sequences) or 0 (functions), no e^κ. */
    static Mode neutral(ExactRing ring, Domain domain) {
        return new Mode(domain == Domain.DIFFERENCE ? ring.one() : ring.zero(), ring.zero());
    }

    ExactRing ring() {
        return ring;
    }

    Domain domain() {
        return domain;
    }

    Map<Mode, List<Algebraic>> modes() {
        return Collections.unmodifiableMap(modes);
    }

    Map<Block, List<Algebraic>> blocks() {
        return Collections.unmodifiableMap(blocks);
    }

    boolean isZero() {
        return modes.isEmpty() && blocks.isEmpty();
    }

    // ---- ring operations ----

    ExpSum add(ExpSum other) {
        ExpSum sum = this;
        for (Map.Entry<Mode, List<Algebraic>> e : other.modes.entrySet()) {
            sum = sum.plusMode(e.getKey(), e.getValue());
        }
        for (Map.Entry<Block, List<Algebraic>> e : other.blocks.entrySet()) {
            sum = sum.plusBlock(e.getKey(), e.getValue());
        }
        return sum;
    }

    ExpSum negate() {
        return scale(ring.one().negate());
    }

    ExpSum subtract(ExpSum other) {
        return add(other.negate());
    }

    /** Every coefficient times the field element c. */
    ExpSum scale(Algebraic c) {
        ExpSum r = zero(ring, domain);
        for (Map.Entry<Mode, List<Algebraic>> e : modes.entrySet()) {
            r = r.plusMode(e.getKey(), Polynomials.times(e.getValue(), c));
        }
        for (Map.Entry<Block, List<Algebraic>> e : blocks.entrySet()) {
            r = r.plusBlock(e.getKey(), Polynomials.times(e.getValue(), blockRing(e.getKey()).lift(c)));
        }
        return r;
    }

    /**
     * The product. A root sum may be multiplied by a polynomial in v, not by an exponential or
     * another root sum (the roots would change).
     *
     * @throws NotExact for such a product
     */
    ExpSum multiply(ExpSum other) {
        ExpSum r = zero(ring, domain);
        for (Map.Entry<Mode, List<Algebraic>> a : modes.entrySet()) {
            for (Map.Entry<Mode, List<Algebraic>> b : other.modes.entrySet()) {
                Mode m = new Mode(domain == Domain.DIFFERENCE ? a.getKey().rate().multiply(b.getKey().rate())
                        : a.getKey().rate().add(b.getKey().rate()), a.getKey().phase().add(b.getKey().phase()));
                r = r.plusMode(m, Polynomials.times(a.getValue(), b.getValue()));
            }
        }
        if (!blocks.isEmpty() || !other.blocks.isEmpty()) {
            r = r.add(blockProduct(this, other)).add(blockProduct(other, this));
        }
        return r;
    }

    /** The blocks of {@code a} times {@code b}, which must be a plain polynomial where a has blocks. */
    private static ExpSum blockProduct(ExpSum a, ExpSum b) {
        if (a.blocks.isEmpty() || b.isZero()) {
            return zero(a.ring, a.domain);
        }
        List<Algebraic> p = b.polynomial().orElseThrow(() -> new NotExact(
                "a root sum may be multiplied only by a polynomial in the variable"));
        ExpSum r = zero(a.ring, a.domain);
        for (Map.Entry<Block, List<Algebraic>> e : a.blocks.entrySet()) {
            ExactRing k = a.blockRing(e.getKey());
            List<Algebraic> lifted = p.stream().map(k::lift).toList();
            r = r.plusBlock(e.getKey(), Polynomials.times(e.getValue(), Polynomials.taylorShift(lifted, k.rational(e.getKey().origin()), k)));
        }
        return r;
    }

    /** this^k, k ≥ 0. */
    ExpSum pow(int k) {
        ExpSum r = constant(ring, domain, ring.one());
        for (int i = 0; i < k; i++) {
            r = r.multiply(this);
        }
        return r;
    }

    /** The same sum without its root sums. */
    ExpSum withoutBlocks() {
        return new ExpSum(ring, domain, modes, Map.of());
    }

    /** The constant value, if this is a number (no variable, no e^κ). */
    Optional<Algebraic> constantValue() {
        Optional<List<Algebraic>> p = polynomial();
        if (p.isEmpty() || p.get().size() > 1) {
            return Optional.empty();
        }
        return Optional.of(p.get().isEmpty() ? ring.zero() : p.get().get(0));
    }

    /** The coefficients, if this is a plain polynomial in v. */
    Optional<List<Algebraic>> polynomial() {
        if (!blocks.isEmpty() || modes.size() > 1) {
            return Optional.empty();
        }
        if (modes.isEmpty()) {
            return Optional.of(List.of());
        }
        List<Algebraic> p = modes.get(neutral(ring, domain));
        return Optional.ofNullable(p);
    }

    /**
     * 1/this for a single mode with a constant coefficient: (c·β^v·e^κ)⁻¹ = c⁻¹·(β⁻¹)^v·e^{−κ}.
     *
     * @throws NotExact for anything else
     */
    ExpSum inverse() {
        if (!blocks.isEmpty() || modes.size() != 1) {
            throw new NotExact("division by a sum or a root sum");
        }
        Map.Entry<Mode, List<Algebraic>> e = modes.entrySet().iterator().next();
        if (e.getValue().size() != 1) {
            throw new NotExact("division by a polynomial in the variable");
        }
        Mode m = e.getKey();
        Algebraic rate = domain == Domain.DIFFERENCE ? m.rate().inverse() : m.rate().negate();
        return zero(ring, domain).plusMode(new Mode(rate, m.phase().negate()), List.of(e.getValue().get(0).inverse()));
    }

    // ---- the operators of the equation ----

    /** v → v + k (sequences): P(v + k)·β^k·β^v, and λ^k·Q(u + k) for root sums. */
    ExpSum shift(long k) {
        ExpSum r = zero(ring, domain);
        for (Map.Entry<Mode, List<Algebraic>> e : modes.entrySet()) {
            Algebraic factor = e.getKey().rate().pow(k);
            r = r.plusMode(e.getKey(), Polynomials.times(Polynomials.taylorShift(e.getValue(), ring.rational(Rational.of(k)), ring), factor));
        }
        for (Map.Entry<Block, List<Algebraic>> e : blocks.entrySet()) {
            ExactRing b = blockRing(e.getKey());
            Algebraic factor = b.lambda().pow(k);
            r = r.plusBlock(e.getKey(), Polynomials.times(Polynomials.taylorShift(e.getValue(), b.rational(Rational.of(k)), b), factor));
        }
        return r;
    }

    /** d/dv (functions): (P' + λP)·e^{λv + κ}. */
    ExpSum derivative() {
        ExpSum r = zero(ring, domain);
        for (Map.Entry<Mode, List<Algebraic>> e : modes.entrySet()) {
            r = r.plusMode(e.getKey(), Polynomials.derive(e.getValue(), e.getKey().rate()));
        }
        for (Map.Entry<Block, List<Algebraic>> e : blocks.entrySet()) {
            r = r.plusBlock(e.getKey(), Polynomials.derive(e.getValue(), blockRing(e.getKey()).lambda()));
        }
        return r;
    }

    /**
     * An upper bound on the order of a recurrence or differential equation that this sum obeys:
     * (degree + 1) per mode and deg f·(degree + 1) per root sum (common practice: v^i·β^v for
     * i ≤ d is annihilated by (E − β)^{d+1}).
     */
    int order() {
        int order = 0;
        for (List<Algebraic> p : modes.values()) {
            order += p.size();
        }
        for (Map.Entry<Block, List<Algebraic>> e : blocks.entrySet()) {
            order += e.getKey().factor().degree() * e.getValue().size();
        }
        return order;
    }

    // ---- values ----

    /** The exact value at index n (sequences). */
    ExactValue valueAt(long n) {
        ExactValue v = ExactValue.zero(ring);
        Algebraic nn = ring.rational(Rational.of(n));
        for (Map.Entry<Mode, List<Algebraic>> e : modes.entrySet()) {
            v = v.plus(e.getKey().phase(), Polynomials.evaluate(e.getValue(), nn, ring).multiply(e.getKey().rate().pow(n)));
        }
        for (Map.Entry<Block, List<Algebraic>> e : blocks.entrySet()) {
            ExactRing b = blockRing(e.getKey());
            Algebraic inBlock = Polynomials.evaluate(e.getValue(), b.lift(nn), b).multiply(b.lambda().pow(n));
            v = v.plus(ring.zero(), inBlock.trace());
        }
        return v;
    }

    /**
     * The exact r-th derivative at t (functions): Σ_{i≤r} C(r,i)·P^{(i)}(t)·λ^{r−i}·e^{λt + κ} per
     * mode. A root sum is exact only at its own origin.
     *
     * @throws NotExact at a point that is not a root sum's origin
     */
    ExactValue derivativeAt(int r, Rational t) {
        ExactValue v = ExactValue.zero(ring);
        Algebraic tt = ring.rational(t);
        for (Map.Entry<Mode, List<Algebraic>> e : modes.entrySet()) {
            Algebraic rate = e.getKey().rate();
            Algebraic sum = ring.zero();
            List<Algebraic> p = e.getValue();
            Rational binomial = Rational.ONE;
            for (int i = 0; i <= r && !p.isEmpty(); i++) {
                sum = sum.add(Polynomials.evaluate(p, tt, ring).multiply(binomial).multiply(rate.pow(r - i)));
                p = Polynomials.derive(p, ring.zero());
                binomial = binomial.multiply(Rational.of(r - i, i + 1));
            }
            v = v.plus(rate.multiply(tt).add(e.getKey().phase()), sum);
        }
        for (Map.Entry<Block, List<Algebraic>> e : blocks.entrySet()) {
            if (!e.getKey().origin().equals(t)) {
                throw new NotExact("a root sum in t - " + e.getKey().origin() + " at t = " + t);
            }
            ExactRing b = blockRing(e.getKey());
            Algebraic sum = b.zero();
            Rational falling = Rational.ONE;
            for (int i = 0; i <= r && i < e.getValue().size(); i++) {
                sum = sum.add(e.getValue().get(i).multiply(falling).multiply(b.lambda().pow(r - i)));
                falling = falling.multiply(r - i);
            }
            v = v.plus(ring.zero(), sum.trace());
        }
        return v;
    }

    /**
     * The exact r-th derivative at t = qπ, when every mode is c·e^{iωt + κ} with c constant and ω
     * rational (then e^{iωqπ} is a root of unity); π itself never enters the value.
     *
     * @throws NotExact for any other sum
     */
    ExactValue derivativeAtPiMultiple(int r, Rational q) {
        if (!blocks.isEmpty()) {
            throw new NotExact("a root sum at a multiple of π");
        }
        ExactValue v = ExactValue.zero(ring);
        for (Map.Entry<Mode, List<Algebraic>> e : modes.entrySet()) {
            Algebraic rate = e.getKey().rate();
            Optional<Rational> omega = rate.realPart().isZero() ? rate.imaginaryPart().toRational() : Optional.empty();
            if (omega.isEmpty() || e.getValue().size() > 1) {
                throw new NotExact("a value at a multiple of π of a term other than c·cos(ωt) or c·sin(ωt) with rational ω");
            }
            Algebraic unit = ring.expIPi(omega.get().multiply(q));
            v = v.plus(e.getKey().phase(), e.getValue().get(0).multiply(rate.pow(r)).multiply(unit));
        }
        return v;
    }

    // ---- rewriting (slips) ----

    /** The same sum with every mode's rate replaced. */
    ExpSum mapRates(UnaryOperator<Algebraic> rate) {
        ExpSum r = new ExpSum(ring, domain, Map.of(), blocks);
        for (Map.Entry<Mode, List<Algebraic>> e : modes.entrySet()) {
            r = r.plusMode(new Mode(rate.apply(e.getKey().rate()), e.getKey().phase()), e.getValue());
        }
        return r;
    }

    /** The field of a root sum's coefficients. */
    ExactRing blockRing(Block block) {
        return ring.withRoot(block.factor());
    }

    // ---- internals ----

    private ExpSum plusMode(Mode mode, List<Algebraic> p) {
        return new ExpSum(ring, domain, merged(modes, mode, p), blocks);
    }

    private ExpSum plusBlock(Block block, List<Algebraic> p) {
        return new ExpSum(ring, domain, modes, merged(blocks, block, p));
    }

    /** The map with p added to the polynomial at key; a sum that is zero leaves the map. */
    private static <K> Map<K, List<Algebraic>> merged(Map<K, List<Algebraic>> map, K key, List<Algebraic> p) {
        Map<K, List<Algebraic>> m = new LinkedHashMap<>(map);
        List<Algebraic> sum = Polynomials.trim(m.containsKey(key) ? Polynomials.plus(m.get(key), p) : p);
        if (sum.isEmpty()) {
            m.remove(key);
        } else {
            m.put(key, sum);
        }
        return m;
    }
}
