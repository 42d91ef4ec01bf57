package dev.rootform.symbolic.response;

import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.ExactRoot;
import dev.rootform.symbolic.solve.ExactRoots;
import dev.rootform.symbolic.transfer.RationalFunctions;
import dev.rootform.symbolic.transfer.StabilityTest;
import dev.rootform.symbolic.transfer.TransferFunction;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The exact facts of a transfer function in lowest terms: poles and zeros with multiplicities,
 * DC gain, relative degree, BIBO stability, and the modes that a cancellation hid.
 *
 * @param poles monic irreducible factors of the denominator
 * @param poleRoots their exact roots, factor by factor
 * @param zeros monic irreducible factors of the numerator
 * @param zeroRoots their exact roots
 * @param dcGain H(0) for s, H(1) for z; empty when that point is a pole (infinite DC gain)
 * @param relativeDegree deg den − deg num: &gt; 0 strictly proper, 0 biproper, &lt; 0 improper
 * @param stable BIBO stable: proper (an improper H(s) differentiates, an improper H(z) is not
 *     causal) and every pole strictly in the left half-plane (s) or inside the unit circle (z),
 *     decided exactly ({@link StabilityTest})
 * @param hiddenModes the cancelled pole–zero pairs
 * @since 0.3
 */
public record TransferFacts(List<Factor> poles, List<ExactRoot> poleRoots, List<Factor> zeros, List<ExactRoot> zeroRoots,
        Optional<Rational> dcGain, int relativeDegree, boolean stable, List<HiddenMode> hiddenModes) {
    /**
     * A factor cancelled between numerator and denominator: its modes are hidden from the
     * input–output behaviour, not gone from the system.
     *
     * @param factor the cancelled factor with its multiplicity
     * @param roots its exact roots
     * @param stable whether its roots lie strictly inside the stability region
     */
    public record HiddenMode(Factor factor, List<ExactRoot> roots, boolean stable) {
        public HiddenMode {
            Objects.requireNonNull(factor, "factor");
            roots = List.copyOf(roots);
        }
    }

    public TransferFacts {
        poles = List.copyOf(poles);
        poleRoots = List.copyOf(poleRoots);
        zeros = List.copyOf(zeros);
        zeroRoots = List.copyOf(zeroRoots);
        Objects.requireNonNull(dcGain, "dcGain");
        hiddenModes = List.copyOf(hiddenModes);
    }

    /** The facts of h. */
    public static TransferFacts of(TransferFunction h) {
        List<Factor> poles = RationalFunctions.poles(h.value());
        List<Factor> zeros = RationalFunctions.zeros(h.value());
        Rational dcPoint = h.continuous() ? Rational.ZERO : Rational.ONE;
        Optional<Rational> dc = h.value().denominator().evaluate(dcPoint).isZero() ? Optional.empty()
                : Optional.of(h.value().evaluate(dcPoint));
        List<HiddenMode> hidden = h.cancelled().stream()
                .map(f -> new HiddenMode(f, ExactRoots.of(List.of(f)), stable(h, f.polynomial()))).toList();
        return new TransferFacts(poles, ExactRoots.of(poles), zeros, ExactRoots.of(zeros), dc, h.value().relativeDegree(),
                h.value().isProper() && stable(h, h.value().denominator()), hidden);
    }

    private static boolean stable(TransferFunction h, RationalPolynomial p) {
        return h.continuous() ? StabilityTest.leftHalfPlane(p) : StabilityTest.unitDisk(p);
    }
}
