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
 * e^(λt + κ) with algebraic λ, κ, cos and sin through e^{±iθ} ({@link AngleReader}), square roots
 * of rationals, and root sums (their summand read in F[λ]/(f)).
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
            case SIN:
                return new AngleReader(this, ring, domain).wave(c.function(), c.argument());
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

    static int small(Rational q) {
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
                List<Algebraic> shifted = Polynomials.taylorShift(p, k.rational(origin), k);
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
}
