package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Domain;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Evaluates a claim's expression tree to its exact canonical form, an {@link ExpSum} over an
 * {@link ExactRing}: powers β^(a·n + b) with a, b rational (a half-integer needs a rational β),
 * e^(λt + κ) with algebraic λ, κ, cos and sin through e^{±iθ} (θ linear in the variable, with
 * parts that are algebraic, rational multiples of π, or integer multiples of arccos, arcsin or
 * arctan of algebraic numbers whose e^{iθ} is algebraic), square roots of rationals, and root sums.
 *
 * @throws NotExact (from every method) for what has no exact form here, such as π as a
 *     coefficient, cos(2n) or 2^t; the claim is then checked numerically
 * @throws FieldTooSmall when a number needs a larger field
 */
final class ClaimEvaluator {
    /** Largest integer exponent expanded exactly. */
    private static final int MAX_EXPONENT = 1000;

    private final ExactRing ring;
    private final Domain domain;

    ClaimEvaluator(ExactRing ring, Domain domain) {
        this.ring = ring;
        this.domain = domain;
    }

    ExpSum evaluate(Expr e) {
        if (e instanceof Expr.Number n) {
            return constant(ring.rational(n.value()));
        }
        if (e instanceof Expr.Variable) {
            return ExpSum.variable(ring, domain);
        }
        if (e instanceof Expr.Constant c) {
            switch (c.kind()) {
                case PI:
                    throw new NotExact("π appears outside the argument of cos or sin");
                case E:
                    return ExpSum.exponential(ring, domain, ExpSum.neutral(ring, domain).rate(), ring.one());
                default:
                    return constant(ring.lambda());
            }
        }
        if (e instanceof Expr.Negation n) {
            return evaluate(n.operand()).negate();
        }
        if (e instanceof Expr.Binary b) {
            switch (b.op()) {
                case ADD:
                    return evaluate(b.left()).add(evaluate(b.right()));
                case SUBTRACT:
                    return evaluate(b.left()).subtract(evaluate(b.right()));
                case MULTIPLY:
                    return evaluate(b.left()).multiply(evaluate(b.right()));
                case DIVIDE:
                    return evaluate(b.left()).multiply(evaluate(b.right()).inverse());
                default:
                    return power(b.left(), b.right());
            }
        }
        if (e instanceof Expr.Call c) {
            return call(c);
        }
        if (e instanceof Expr.RootSum r) {
            return rootSum(r);
        }
        throw new AssertionError(e);
    }

    private ExpSum constant(Algebraic c) {
        return ExpSum.constant(ring, domain, c);
    }

    private ExpSum call(Expr.Call c) {
        switch (c.function()) {
            case COS:
            case SIN: {
                Angle a = angle(c.argument());
                ExpSum plus = expI(a);
                ExpSum minus = expI(a.negate());
                return c.function() == Expr.Call.Function.COS
                        ? plus.add(minus).scale(ring.rational(Rational.of(1, 2)))
                        : plus.subtract(minus).scale(ring.imaginaryUnit().multiply(Rational.of(-1, 2)));
            }
            case EXP:
                return exp(c.argument());
            case SQRT: {
                Rational q = rational(evaluate(c.argument()), "a square root of an irrational number");
                return constant(ring.sqrt(q));
            }
            default:
                throw new NotExact(c.function().written() + " appears outside the argument of cos or sin");
        }
    }

    /** e^x with x = λ·v + κ. */
    private ExpSum exp(Expr argument) {
        List<Algebraic> p = evaluate(argument).polynomial().filter(q -> q.size() <= 2)
                .orElseThrow(() -> new NotExact("e^(...) needs an exponent linear in the variable"));
        Algebraic kappa = p.isEmpty() ? ring.zero() : p.get(0);
        Algebraic lambda = p.size() < 2 ? ring.zero() : p.get(1);
        if (domain == Domain.DIFFERENCE) {
            if (!lambda.isZero()) {
                throw new NotExact("e^(c·n) has a transcendental base");
            }
            return ExpSum.exponential(ring, domain, ring.one(), kappa);
        }
        return ExpSum.exponential(ring, domain, lambda, kappa);
    }

    private ExpSum power(Expr base, Expr exponent) {
        if (base instanceof Expr.Constant c && c.kind() == Expr.Constant.Kind.E) {
            return exp(exponent);
        }
        ExpSum x = evaluate(exponent);
        Optional<Algebraic> k = x.constantValue();
        if (k.isPresent()) {
            Rational q = k.get().toRational().orElseThrow(() -> new NotExact("an irrational exponent"));
            ExpSum b = evaluate(base);
            if (q.isInteger()) {
                int n = small(q);
                return n >= 0 ? b.pow(n) : b.inverse().pow(-n);
            }
            Algebraic value = b.constantValue().orElseThrow(() -> new NotExact("a fractional power of a non-constant"));
            return constant(rationalPower(value, q));
        }
        List<Algebraic> p = x.polynomial().filter(q -> q.size() == 2)
                .orElseThrow(() -> new NotExact("an exponent that is not linear in the variable"));
        Algebraic b = evaluate(base).constantValue()
                .orElseThrow(() -> new NotExact("a power whose base depends on the variable"));
        if (b.isZero()) {
            throw new NotExact("0 raised to a power of the variable");
        }
        if (domain == Domain.DIFFERENTIAL) {
            if (b.equals(ring.one())) {
                return constant(ring.one());
            }
            throw new NotExact("a^t with a ≠ e has a transcendental rate (write e^(ct))");
        }
        Rational slope = p.get(1).toRational().orElseThrow(() -> new NotExact("an irrational multiple of n in an exponent"));
        Rational intercept = p.get(0).toRational().orElseThrow(() -> new NotExact("an irrational exponent"));
        return ExpSum.exponential(ring, domain, rationalPower(b, slope), ring.zero())
                .scale(rationalPower(b, intercept));
    }

    /** b^q for integer q, or for q with denominator 2 and b rational. */
    private Algebraic rationalPower(Algebraic b, Rational q) {
        if (q.isInteger()) {
            return b.pow(small(q));
        }
        Optional<Rational> r = b.toRational();
        if (r.isEmpty() || !q.denominator().equals(java.math.BigInteger.TWO)) {
            throw new NotExact("a fractional power other than a square root of a rational");
        }
        return ring.sqrt(r.get()).pow(small(q.multiply(Rational.of(2))));
    }

    private static int small(Rational q) {
        if (q.abs().compareTo(Rational.of(MAX_EXPONENT)) > 0) {
            throw new NotExact("an exponent beyond " + MAX_EXPONENT);
        }
        return q.toBigInteger().intValueExact();
    }

    private Rational rational(ExpSum x, String what) {
        return x.constantValue().flatMap(Algebraic::toRational).orElseThrow(() -> new NotExact(what));
    }

    // ---- root sums ----

    /** Σ_{f(λ)=0} summand: the summand is read in F[λ]/(f), then its terms become root sums. */
    private ExpSum rootSum(Expr.RootSum r) {
        RationalPolynomial f = r.factor();
        if (f.coefficient(0).isZero()) {
            throw new NotExact("a root sum over a polynomial with the root 0");
        }
        ExactRing k = ring.withRoot(f);
        ExpSum summand = new ClaimEvaluator(k, domain).evaluate(r.summand());
        ExpSum result = ExpSum.zero(ring, domain);
        for (Map.Entry<ExpSum.Mode, List<Algebraic>> e : summand.modes().entrySet()) {
            ExpSum.Mode mode = e.getKey();
            List<Algebraic> p = e.getValue();
            if (mode.equals(ExpSum.neutral(k, domain))) {
                result = result.add(ExpSum.of(ring, domain, ExpSum.neutral(ring, domain), p.stream().map(Algebraic::trace).toList()));
            } else if (mode.rate().equals(k.lambda())) {
                Rational origin = originOf(mode.phase(), k);
                List<Algebraic> shifted = ExpSum.taylorShift(p, k.rational(origin), k);
                result = result.add(ExpSum.rootSum(ring, domain, new ExpSum.Block(f, origin), shifted));
            } else {
                throw new NotExact("a root sum's summand must be a coefficient times a power of the variable times "
                        + (domain == Domain.DIFFERENCE ? "λ^n" : "e^(λt)"));
            }
        }
        return result;
    }

    /** s with κ = −λ·s (e^{λ(t − s)}); 0 for sequences, which must have no e^κ. */
    private Rational originOf(Algebraic phase, ExactRing k) {
        if (phase.isZero()) {
            return Rational.ZERO;
        }
        if (domain == Domain.DIFFERENCE) {
            throw new NotExact("a constant factor e^c in a root sum");
        }
        return phase.multiply(k.lambda().inverse()).negate().toRational()
                .orElseThrow(() -> new NotExact("a root sum's exponential must be e^(λ(t - s)) with rational s"));
    }

    // ---- angles ----

    /** e^{iθ} for an angle θ = slope·v + constant. */
    private ExpSum expI(Angle a) {
        Algebraic factor = unit(a.constant());
        Algebraic phase = ring.imaginaryUnit().multiply(a.constant().plain());
        if (domain == Domain.DIFFERENCE) {
            if (!a.slope().plain().isZero()) {
                throw new NotExact("cos or sin of ω·n with ω not a rational multiple of π (nor an arccos of an algebraic number)");
            }
            return ExpSum.exponential(ring, domain, unit(a.slope()), phase).scale(factor);
        }
        if (!a.slope().pi().isZero() || !a.slope().inverses().isEmpty()) {
            throw new NotExact("cos or sin of a multiple of π·t or of arccos(...)·t has a transcendental frequency");
        }
        return ExpSum.exponential(ring, domain, ring.imaginaryUnit().multiply(a.slope().plain()), phase).scale(factor);
    }

    /** e^{i·(π·q + Σ k·arc(x))}: algebraic. */
    private Algebraic unit(AnglePart p) {
        Algebraic u = p.pi().isZero() ? ring.one() : ring.expIPi(p.pi());
        for (Inverse inverse : p.inverses()) {
            if (!inverse.multiple().isInteger()) {
                throw new NotExact("a fractional multiple of " + inverse.kind().written() + "(...)");
            }
            u = u.multiply(inverseUnit(inverse.kind(), inverse.argument()).pow(small(inverse.multiple())));
        }
        return u;
    }

    /** e^{i·arccos x} = x + i√(1−x²), e^{i·arcsin x} = √(1−x²) + ix, e^{i·arctan x} = (1 + ix)/√(1+x²). */
    private Algebraic inverseUnit(Expr.Call.Function kind, Algebraic x) {
        Algebraic i = ring.imaginaryUnit();
        Algebraic square = x.multiply(x);
        if (kind == Expr.Call.Function.ARCTAN) {
            Rational norm = square.add(ring.one()).toRational()
                    .orElseThrow(() -> new NotExact("arctan of a number whose 1 + x² is irrational"));
            return ring.one().add(i.multiply(x)).multiply(ring.sqrt(norm).inverse());
        }
        Rational rest = ring.one().subtract(square).toRational()
                .orElseThrow(() -> new NotExact(kind.written() + " of a number whose 1 − x² is irrational"));
        Algebraic root = ring.sqrt(rest);
        return kind == Expr.Call.Function.ARCCOS ? x.add(i.multiply(root)) : root.add(i.multiply(x));
    }

    /** One part of an angle: plain + π·pi + Σ multiple·arc(argument). */
    private record AnglePart(Algebraic plain, Rational pi, List<Inverse> inverses) {
        boolean isPlain() {
            return pi.isZero() && inverses.isEmpty();
        }

        boolean isZero() {
            return isPlain() && plain.isZero();
        }

        AnglePart add(AnglePart o) {
            List<Inverse> all = new java.util.ArrayList<>(inverses);
            for (Inverse x : o.inverses) {
                int at = -1;
                for (int j = 0; j < all.size(); j++) {
                    if (all.get(j).kind() == x.kind() && all.get(j).argument().equals(x.argument())) {
                        at = j;
                    }
                }
                if (at < 0) {
                    all.add(x);
                } else {
                    Rational m = all.get(at).multiple().add(x.multiple());
                    all.set(at, new Inverse(x.kind(), x.argument(), m));
                }
            }
            all.removeIf(x -> x.multiple().isZero());
            return new AnglePart(plain.add(o.plain), pi.add(o.pi), List.copyOf(all));
        }

        AnglePart scale(Algebraic c) {
            if (isPlain()) {
                return new AnglePart(plain.multiply(c), pi, inverses);
            }
            Rational q = c.toRational().orElseThrow(() -> new NotExact("an irrational multiple of π or of arccos(...)"));
            return new AnglePart(plain.multiply(c), pi.multiply(q),
                    inverses.stream().map(x -> new Inverse(x.kind(), x.argument(), x.multiple().multiply(q))).toList());
        }
    }

    /** k·arc(x) for arc one of arccos, arcsin, arctan. */
    private record Inverse(Expr.Call.Function kind, Algebraic argument, Rational multiple) {
    }

    /** slope·v + constant. */
    private record Angle(AnglePart slope, AnglePart constant) {
        Angle add(Angle o) {
            return new Angle(slope.add(o.slope), constant.add(o.constant));
        }

        Angle scale(Algebraic c) {
            return new Angle(slope.scale(c), constant.scale(c));
        }

        Angle negate() {
            return scale(constant.plain().ring().one().negate());
        }

        /** c0 + c1·v with algebraic c0, c1. */
        boolean isAlgebraic() {
            return slope.isPlain() && constant.isPlain();
        }

        /** The product, linear in v: one factor must be algebraic, and they must not both hold v. */
        Angle multiply(Angle o) {
            if (!isAlgebraic() && !o.isAlgebraic()) {
                throw new NotExact("a product of two angles with π or arccos(...)");
            }
            Angle algebraic = isAlgebraic() ? this : o;
            Angle other = isAlgebraic() ? o : this;
            if (!algebraic.slope.isZero() && !other.slope.isZero()) {
                throw new NotExact("an angle that is not linear in the variable");
            }
            AnglePart zero = new AnglePart(constant.plain().ring().zero(), Rational.ZERO, List.of());
            AnglePart s = other.slope.scale(algebraic.constant.plain())
                    .add(algebraic.slope.isZero() ? zero : other.constant.scale(algebraic.slope.plain()));
            return new Angle(s, other.constant.scale(algebraic.constant.plain()));
        }
    }

    private Angle angle(Expr e) {
        AnglePart zero = new AnglePart(ring.zero(), Rational.ZERO, List.of());
        if (e instanceof Expr.Constant c && c.kind() == Expr.Constant.Kind.PI) {
            return new Angle(zero, new AnglePart(ring.zero(), Rational.ONE, List.of()));
        }
        if (e instanceof Expr.Call c && (c.function() == Expr.Call.Function.ARCCOS || c.function() == Expr.Call.Function.ARCSIN
                || c.function() == Expr.Call.Function.ARCTAN)) {
            Algebraic x = evaluate(c.argument()).constantValue()
                    .orElseThrow(() -> new NotExact(c.function().written() + " of a non-constant"));
            return new Angle(zero, new AnglePart(ring.zero(), Rational.ZERO, List.of(new Inverse(c.function(), x, Rational.ONE))));
        }
        if (e instanceof Expr.Negation n) {
            return angle(n.operand()).negate();
        }
        if (e instanceof Expr.Binary b && b.op() != Expr.Binary.Op.POWER) {
            Angle left = angle(b.left());
            switch (b.op()) {
                case ADD:
                    return left.add(angle(b.right()));
                case SUBTRACT:
                    return left.add(angle(b.right()).negate());
                case MULTIPLY:
                    return left.multiply(angle(b.right()));
                default: {
                    Algebraic d = evaluate(b.right()).constantValue()
                            .orElseThrow(() -> new NotExact("an angle divided by a non-constant"));
                    return left.scale(d.inverse());
                }
            }
        }
        List<Algebraic> p = evaluate(e).polynomial().filter(q -> q.size() <= 2)
                .orElseThrow(() -> new NotExact("the argument of cos or sin must be linear in the variable"));
        return new Angle(new AnglePart(p.size() < 2 ? ring.zero() : p.get(1), Rational.ZERO, List.of()),
                new AnglePart(p.isEmpty() ? ring.zero() : p.get(0), Rational.ZERO, List.of()));
    }
}
