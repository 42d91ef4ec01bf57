package dev.rootform.numeric.roots;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.work.Deadline;
import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import org.apfloat.Apcomplex;

/**
 * Certified complex roots of a squarefree polynomial with rational coefficients.
 *
 * <p>{@link #roots} returns, for p of degree d, d pairwise disjoint closed disks each of which
 * provably contains exactly one root of p, with radius ≤ 10^(−digits)·max(1, |root|). The result is
 * exact in the sense that the containment claims are proven; the centres are approximations.
 * Roots proven real have {@code im} exactly 0; non-real roots come in exact conjugate pairs.
 * Order: by real part descending, then imaginary part descending.
 *
 * <p>Method: starting points from {@link Seeds}, first polished root by root with Newton's iteration
 * at doubling precision ({@link NewtonPolisher}) and certified once; when that certificate fails
 * for lack of separation (not of digits), the multiprecision Aberth–Ehrlich iteration
 * ({@link AberthRefiner}; O. Aberth, Math. Comp. 27 (1973) 339–344; L. W. Ehrlich, Comm. ACM 10
 * (1967) 107–108), then an independent certificate by the Braess–Hadeler inclusion theorem
 * ({@link InclusionCertificate}; D. Braess and K. P. Hadeler, Numer. Math. 21 (1973) 161–165).
 * When certification fails the working precision is raised and the iteration resumed, at most
 * {@link #MAX_ESCALATIONS} times: by the measured shortfall plus {@link #GUARD_DIGITS} when disks
 * are merely too wide, otherwise (unresolved cluster) doubled.
 *
 * <p>Immutable and thread-safe.
 */
public final class RootFinder {
    /** Digits carried beyond the requested ones, on top of log10(degree + 1). */
    public static final int GUARD_DIGITS = 10;
    /** How many times the working precision may be doubled before giving up. */
    public static final int MAX_ESCALATIONS = 5;
    /** Aberth sweeps allowed per precision level. */
    public static final int MAX_SWEEPS = 200;
    /** Precision raises of the Newton fast path before the Aberth iteration takes over. */
    static final int NEWTON_ESCALATIONS = 2;
    /** Significant digits of published radii for the exact linear case (rounded up). */
    private static final int RADIUS_DIGITS = 5;

    private final int digits;

    /**
     * A finder producing enclosures with {@code digits} correct significant digits.
     *
     * @throws IllegalArgumentException if {@code digits} &lt; 1
     */
    public RootFinder(int digits) {
        if (digits < 1) {
            throw new IllegalArgumentException("digits must be positive: " + digits);
        }
        this.digits = digits;
    }

    public int digits() {
        return digits;
    }

    /**
     * One certified enclosure per root of p, in the order described in the class comment.
     *
     * @throws IllegalArgumentException if p has degree &lt; 1 or is not squarefree (gcd(p, p') ≠ 1)
     * @throws IllegalStateException if certification does not succeed within the precision budget
     */
    public List<Enclosure> roots(RationalPolynomial p) {
        if (p.degree() < 1) {
            throw new IllegalArgumentException("degree must be at least 1: " + p);
        }
        if (!SquarefreeTest.isSquarefree(p)) {
            throw new IllegalArgumentException("not squarefree: gcd(p, p') ≠ 1 for " + p);
        }
        List<Enclosure> result = new ArrayList<>();
        RationalPolynomial rest = p;
        if (p.coefficient(0).isZero()) {
            result.add(new Enclosure(BigDecimal.ZERO, BigDecimal.ZERO, BigDecimal.ZERO));
            rest = p.divide(RationalPolynomial.X);
        }
        if (rest.degree() == 1) {
            result.add(linear(rest));
        } else if (rest.degree() >= 2) {
            result.addAll(nonlinear(rest));
        }
        result.sort(Comparator.comparing(Enclosure::re).thenComparing(Enclosure::im).reversed());
        return List.copyOf(result);
    }

    private long workingPrecision(int degree) {
        return digits + GUARD_DIGITS + (long) Math.ceil(Math.log10(degree + 1.0));
    }

    /** The root −a₀/a₁ rounded to the working precision, radius = exact rounding error rounded up. */
    private Enclosure linear(RationalPolynomial p) {
        Rational root = p.coefficient(0).negate().divide(p.coefficient(1));
        BigDecimal centre = root.toBigDecimal(new MathContext((int) workingPrecision(1), RoundingMode.HALF_EVEN));
        BigDecimal radius = Rational.of(centre).subtract(root).abs()
                .toBigDecimal(new MathContext(RADIUS_DIGITS, RoundingMode.CEILING));
        return new Enclosure(centre, BigDecimal.ZERO, radius);
    }

    private List<Enclosure> nonlinear(RationalPolynomial p) {
        long precision = workingPrecision(p.degree());
        Apcomplex[] z = Seeds.of(p, precision);
        Optional<List<Enclosure>> polished = polished(p, z, precision);
        if (polished.isPresent()) {
            return polished.get();
        }
        for (int attempt = 0; attempt <= MAX_ESCALATIONS; attempt++) {
            Deadline.checkCurrent();
            new AberthRefiner(p, precision).refine(z, MAX_SWEEPS);
            Optional<CentreSet> centres = ConjugateSymmetry.centres(z, precision);
            int missing = InclusionCertificate.UNKNOWN;
            if (centres.isPresent()) {
                InclusionCertificate.Outcome outcome = InclusionCertificate.certify(p, centres.get(), digits);
                if (outcome.enclosures().isPresent()) {
                    return outcome.enclosures().get();
                }
                missing = outcome.missingDigits();
            }
            precision = missing == InclusionCertificate.UNKNOWN
                    ? 2 * precision
                    : Math.min(2 * precision, precision + missing + GUARD_DIGITS);
        }
        throw new IllegalStateException("could not certify the roots of a degree-" + p.degree()
                + " polynomial to " + digits + " digits within " + MAX_ESCALATIONS
                + " precision increases");
    }

    /**
     * The fast path: each seed polished by Newton's iteration at doubling precision
     * ({@link NewtonPolisher}), certified once; when the disks are merely too wide, the precision is
     * raised by the shortfall and the roots polished again, at most {@link #NEWTON_ESCALATIONS}
     * times. Empty when the certificate cannot be had this way (overlapping disks: two seeds went
     * to one root), and the Aberth iteration takes over from the original seeds.
     */
    private Optional<List<Enclosure>> polished(RationalPolynomial p, Apcomplex[] seeds, long precision) {
        long working = precision;
        Apcomplex[] z = NewtonPolisher.polish(p, seeds, DoubleSeeds.DIGITS, working);
        for (int attempt = 0; attempt <= NEWTON_ESCALATIONS; attempt++) {
            Deadline.checkCurrent();
            Optional<CentreSet> centres = ConjugateSymmetry.centres(z, working);
            if (centres.isEmpty()) {
                return Optional.empty();
            }
            InclusionCertificate.Outcome outcome = InclusionCertificate.certify(p, centres.get(), digits);
            if (outcome.enclosures().isPresent() || outcome.missingDigits() == InclusionCertificate.UNKNOWN) {
                return outcome.enclosures();
            }
            long accurate = working - outcome.missingDigits();
            working += outcome.missingDigits() + GUARD_DIGITS;
            z = NewtonPolisher.polish(p, z, accurate, working);
        }
        return Optional.empty();
    }
}
