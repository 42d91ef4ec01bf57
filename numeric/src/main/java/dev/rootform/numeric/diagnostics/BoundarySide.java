package dev.rootform.numeric.diagnostics;

import dev.rootform.numeric.roots.Enclosure;
import dev.rootform.numeric.roots.RootFinder;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.ExactRoot;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.work.Deadline;
import java.math.BigDecimal;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;

/**
 * On which side of the stability boundary (Re λ = 0, or |λ| = 1) a root lies, decided exactly for
 * rational, surd and root-of-unity roots and from certified enclosures for implicit roots: an
 * enclosure that touches the boundary is certified again at more digits, up to
 * {@link #MAX_DIGITS}; if it still touches, the side is {@link Side#UNKNOWN}.
 */
final class BoundarySide {
    /** Where a root lies relative to the boundary. */
    enum Side { INSIDE, ON, OUTSIDE, UNKNOWN }

    /** Highest precision tried when an enclosure touches the boundary. */
    static final int MAX_DIGITS = 400;

    private final Domain domain;

    BoundarySide(Domain domain) {
        this.domain = domain;
    }

    Side of(ExactRoot root, Enclosure approximate, int digits) {
        if (root instanceof ExactRoot.Explicit e) {
            return domain == Domain.DIFFERENTIAL ? side(e.re().signum()) : explicitModulus(e);
        }
        if (root instanceof ExactRoot.OfUnity u) {
            return domain == Domain.DIFFERENCE ? Side.ON : side(cosineSign(u.k(), u.order()));
        }
        ExactRoot.Implicit i = (ExactRoot.Implicit) root;
        Enclosure z = approximate;
        for (int d = digits; ; d *= 2) {
            Deadline.checkCurrent();
            Side s = enclosed(z);
            if (s != Side.UNKNOWN || d * 2 > MAX_DIGITS) {
                return s;
            }
            z = nearest(new RootFinder(d * 2).roots(i.factor()), z);
        }
    }

    private static Side side(int signum) {
        return signum < 0 ? Side.INSIDE : signum == 0 ? Side.ON : Side.OUTSIDE;
    }

    /** The sign of cos(2πk/n) for 0 &lt; k &lt; n, exactly. */
    private static int cosineSign(int k, int n) {
        long fourK = 4L * k;
        if (fourK == n || fourK == 3L * n) {
            return 0;
        }
        return fourK < n || fourK > 3L * n ? 1 : -1;
    }

    /** |λ| against 1 for a real surd root or a complex root with rational real part; else UNKNOWN. */
    private static Side explicitModulus(ExactRoot.Explicit e) {
        if (e.im().isZero()) {
            Surd re = e.re();
            int above = shifted(re, Rational.MINUS_ONE).signum();
            int below = shifted(re, Rational.ONE).signum();
            return above > 0 || below < 0 ? Side.OUTSIDE : above == 0 || below == 0 ? Side.ON : Side.INSIDE;
        }
        Optional<Rational> re2 = square(e.re());
        Optional<Rational> im2 = square(e.im());
        if (re2.isPresent() && im2.isPresent()) {
            return side(re2.get().add(im2.get()).compareTo(Rational.ONE));
        }
        return Side.UNKNOWN;
    }

    private static Surd shifted(Surd s, Rational by) {
        return Surd.of(s.rational().add(by), s.coefficient(), Rational.of(s.radicand()));
    }

    /** s² when it is rational (s rational or a pure multiple of a square root). */
    private static Optional<Rational> square(Surd s) {
        if (s.isRational()) {
            return Optional.of(s.rational().multiply(s.rational()));
        }
        if (s.rational().isZero()) {
            return Optional.of(s.coefficient().multiply(s.coefficient()).multiply(Rational.of(s.radicand())));
        }
        return Optional.empty();
    }

    /** The side of the whole disk, or UNKNOWN when it touches the boundary. */
    private Side enclosed(Enclosure z) {
        BigDecimal r = z.radius();
        if (domain == Domain.DIFFERENTIAL) {
            return z.re().compareTo(r) > 0 ? Side.OUTSIDE : z.re().negate().compareTo(r) > 0 ? Side.INSIDE : Side.UNKNOWN;
        }
        BigDecimal centre2 = z.re().multiply(z.re()).add(z.im().multiply(z.im()));
        BigDecimal outer = BigDecimal.ONE.add(r);
        BigDecimal inner = BigDecimal.ONE.subtract(r);
        if (centre2.compareTo(outer.multiply(outer)) > 0) {
            return Side.OUTSIDE;
        }
        return inner.signum() > 0 && centre2.compareTo(inner.multiply(inner)) < 0 ? Side.INSIDE : Side.UNKNOWN;
    }

    /** The refined enclosure of the same root: the one whose centre is nearest the old centre. */
    private static Enclosure nearest(List<Enclosure> refined, Enclosure old) {
        return refined.stream().min(Comparator.comparing((Enclosure e) -> {
            BigDecimal dx = e.re().subtract(old.re());
            BigDecimal dy = e.im().subtract(old.im());
            return dx.multiply(dx).add(dy.multiply(dy));
        })).orElseThrow();
    }
}
