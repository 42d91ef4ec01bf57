package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.algebra.Rational;
import java.util.ArrayList;
import java.util.List;

/**
 * Polynomials in one variable with coefficients in an {@link ExactRing}, as lists in ascending
 * order (index = power) without trailing zeros: the coefficient polynomials of an {@link ExpSum}.
 */
final class Polynomials {
    private Polynomials() {
    }

    static List<Algebraic> trim(List<Algebraic> p) {
        int n = p.size();
        while (n > 0 && p.get(n - 1).isZero()) {
            n--;
        }
        return List.copyOf(p.subList(0, n));
    }

    static List<Algebraic> plus(List<Algebraic> a, List<Algebraic> b) {
        List<Algebraic> r = new ArrayList<>();
        for (int i = 0; i < Math.max(a.size(), b.size()); i++) {
            r.add(i >= a.size() ? b.get(i) : i >= b.size() ? a.get(i) : a.get(i).add(b.get(i)));
        }
        return r;
    }

    static List<Algebraic> times(List<Algebraic> p, Algebraic c) {
        return p.stream().map(x -> x.multiply(c)).toList();
    }

    static List<Algebraic> times(List<Algebraic> a, List<Algebraic> b) {
        if (a.isEmpty() || b.isEmpty()) {
            return List.of();
        }
        List<Algebraic> r = new ArrayList<>();
        for (int k = 0; k < a.size() + b.size() - 1; k++) {
            r.add(null);
        }
        for (int i = 0; i < a.size(); i++) {
            for (int j = 0; j < b.size(); j++) {
                Algebraic t = a.get(i).multiply(b.get(j));
                r.set(i + j, r.get(i + j) == null ? t : r.get(i + j).add(t));
            }
        }
        return r;
    }

    /** P' + rate·P. */
    static List<Algebraic> derive(List<Algebraic> p, Algebraic rate) {
        List<Algebraic> r = new ArrayList<>();
        for (int i = 0; i < p.size(); i++) {
            Algebraic d = i + 1 < p.size() ? p.get(i + 1).multiply(Rational.of(i + 1)) : rate.ring().zero();
            r.add(d.add(rate.multiply(p.get(i))));
        }
        return trim(r);
    }

    /** P(v + s) by Horner's rule. */
    static List<Algebraic> taylorShift(List<Algebraic> p, Algebraic s, ExactRing ring) {
        List<Algebraic> r = List.of();
        for (int i = p.size() - 1; i >= 0; i--) {
            r = plus(times(r, List.of(s, ring.one())), List.of(p.get(i)));
        }
        return trim(r);
    }

    static Algebraic evaluate(List<Algebraic> p, Algebraic x, ExactRing ring) {
        Algebraic v = ring.zero();
        for (int i = p.size() - 1; i >= 0; i--) {
            v = v.multiply(x).add(p.get(i));
        }
        return v;
    }
}
