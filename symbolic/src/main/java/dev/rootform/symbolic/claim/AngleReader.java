package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import java.util.List;

/**
 * cos and sin of a claim, through e^{±iθ}: the angle θ is read as slope·v + constant, each part made
 * of an algebraic number, a rational multiple of π and integer multiples of arccos, arcsin or
 * arctan of algebraic numbers, so that e^{iθ} is exact: a root of unity e^{iπq}, and
 * e^{i·arccos x} = x + i√(1−x²), e^{i·arcsin x} = √(1−x²) + ix, e^{i·arctan x} = (1 + ix)/√(1+x²)
 * (common practice) when the square root is of a rational. A sequence needs an exact e^{iθ} per
 * step; a function an algebraic frequency (e^{iωt} with ω algebraic).
 *
 * @throws NotExact (from every method) for other angles, such as cos(2n) or cos(πt)
 */
final class AngleReader {
    private final ClaimEvaluator evaluator;
    private final ExactRing ring;
    private final Domain domain;

    AngleReader(ClaimEvaluator evaluator, ExactRing ring, Domain domain) {
        this.evaluator = evaluator;
        this.ring = ring;
        this.domain = domain;
    }

    /** cos(argument) = (e^{iθ} + e^{−iθ})/2 or sin(argument) = (e^{iθ} − e^{−iθ})/(2i). */
    ExpSum wave(Expr.Call.Function kind, Expr argument) {
        Angle a = angle(argument);
        ExpSum plus = expI(a);
        ExpSum minus = expI(a.negate());
        return kind == Expr.Call.Function.COS
                ? plus.add(minus).scale(ring.rational(Rational.of(1, 2)))
                : plus.subtract(minus).scale(ring.imaginaryUnit().multiply(Rational.of(-1, 2)));
    }


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
            u = u.multiply(inverseUnit(inverse.kind(), inverse.argument()).pow(ClaimEvaluator.small(inverse.multiple())));
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
            Algebraic x = evaluator.evaluate(c.argument()).constantValue()
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
                    Algebraic d = evaluator.evaluate(b.right()).constantValue()
                            .orElseThrow(() -> new NotExact("an angle divided by a non-constant"));
                    return left.scale(d.inverse());
                }
            }
        }
        List<Algebraic> p = evaluator.evaluate(e).polynomial().filter(q -> q.size() <= 2)
                .orElseThrow(() -> new NotExact("the argument of cos or sin must be linear in the variable"));
        return new Angle(new AnglePart(p.size() < 2 ? ring.zero() : p.get(1), Rational.ZERO, List.of()),
                new AnglePart(p.isEmpty() ? ring.zero() : p.get(0), Rational.ZERO, List.of()));
    }
}
