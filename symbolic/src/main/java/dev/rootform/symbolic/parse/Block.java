package dev.rootform.symbolic.parse;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.transfer.LowestTerms;
import dev.rootform.symbolic.algebra.RationalFunction;
import dev.rootform.symbolic.transfer.RationalFunctions;
import java.util.ArrayList;
import java.util.List;

/**
 * The value of a transfer-function expression as the interconnection it describes: scale ·
 * Π top / Π bottom, where each factor is a monic polynomial {@link Piece} tagged with the place
 * in the text it comes from. Factors are cancelled only against the same piece (same tag): a named
 * part used twice, as in G/(1 + G), cancels its own denominator, which is the algebra of the
 * loop; any other common factor of the final numerator and denominator is a pole–zero
 * cancellation between different blocks, which {@link #lowestTerms()} names.
 *
 * @param scale the constant factor; zero for the zero function (then both lists are empty)
 * @param top numerator pieces
 * @param bottom denominator pieces
 */
record Block(Rational scale, List<Piece> top, List<Piece> bottom) {
    /** A monic polynomial of degree &ge; 1 with the tag of the text it was read from. */
    record Piece(RationalPolynomial polynomial, int tag) {
    }

    Block {
        top = List.copyOf(top);
        bottom = List.copyOf(bottom);
    }

    static Block constant(Rational c) {
        return new Block(c, List.of(), List.of());
    }

    /** c·p with p written as one piece (a constant when p has degree 0). */
    static Block polynomial(RationalPolynomial p, int tag) {
        if (p.degree() < 1) {
            return constant(p.coefficient(0));
        }
        return new Block(p.leadingCoefficient(), List.of(new Piece(p.monic(), tag)), List.of());
    }

    boolean isZero() {
        return scale.isZero();
    }

    /** The constant value when this has no pieces. */
    java.util.Optional<Rational> constantValue() {
        return top.isEmpty() && bottom.isEmpty() ? java.util.Optional.of(scale) : java.util.Optional.empty();
    }

    Block multiply(Block other) {
        if (isZero() || other.isZero()) {
            return constant(Rational.ZERO);
        }
        List<Piece> t = new ArrayList<>(top);
        t.addAll(other.top);
        List<Piece> b = new ArrayList<>(bottom);
        b.addAll(other.bottom);
        List<Piece> common = common(t, b);
        t = without(t, common);
        b = without(b, common);
        return new Block(scale.multiply(other.scale), t, b);
    }

    /** 1/this. @throws ArithmeticException if this is zero */
    Block inverse() {
        return new Block(scale.inverse(), bottom, top);
    }

    Block pow(int k) {
        Block base = k < 0 ? inverse() : this;
        Block result = constant(Rational.ONE);
        for (int i = 0; i < Math.abs(k); i++) {
            result = result.multiply(base);
        }
        return result;
    }

    /**
     * The sum over a common denominator that keeps shared pieces once: pieces both terms have in
     * their numerators or in their denominators stay outside; the rest is expanded into one new
     * piece tagged {@code tag}.
     */
    Block add(Block other, int tag) {
        if (isZero()) {
            return other;
        }
        if (other.isZero()) {
            return this;
        }
        List<Piece> commonTop = common(top, other.top);
        List<Piece> commonBottom = common(bottom, other.bottom);
        List<Piece> restA = without(bottom, commonBottom);
        List<Piece> restB = without(other.bottom, commonBottom);
        RationalPolynomial sum = product(without(top, commonTop)).multiply(product(restB)).multiply(scale)
                .add(product(without(other.top, commonTop)).multiply(product(restA)).multiply(other.scale));
        if (sum.isZero()) {
            return constant(Rational.ZERO);
        }
        Block rest = new Block(Rational.ONE, commonTop, concat(concat(commonBottom, restA), restB));
        return polynomial(sum, tag).multiply(rest);
    }

    /** The value as a rational function in lowest terms, with the factors that reducing it cancelled. */
    LowestTerms lowestTerms() {
        return RationalFunctions.lowestTerms(product(top).multiply(scale), product(bottom));
    }

    private static RationalPolynomial product(List<Piece> pieces) {
        RationalPolynomial p = RationalPolynomial.ONE;
        for (Piece piece : pieces) {
            p = p.multiply(piece.polynomial());
        }
        return p;
    }

    /** The multiset intersection of a and b. */
    private static List<Piece> common(List<Piece> a, List<Piece> b) {
        List<Piece> remaining = new ArrayList<>(b);
        List<Piece> common = new ArrayList<>();
        for (Piece p : a) {
            if (remaining.remove(p)) {
                common.add(p);
            }
        }
        return common;
    }

    /** a with one occurrence of each piece of {@code removed} taken out. */
    private static List<Piece> without(List<Piece> a, List<Piece> removed) {
        List<Piece> rest = new ArrayList<>(a);
        removed.forEach(rest::remove);
        return rest;
    }

    private static List<Piece> concat(List<Piece> a, List<Piece> b) {
        List<Piece> all = new ArrayList<>(a);
        all.addAll(b);
        return all;
    }
}
