package dev.rootform.numeric.diagnostics;

import dev.rootform.numeric.diagnostics.BoundarySide.Side;
import dev.rootform.numeric.diagnostics.Stability.Verdict;
import dev.rootform.numeric.roots.Enclosure;
import dev.rootform.symbolic.model.Domain;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.function.Predicate;

/**
 * Decides the {@link Stability} of an equation from all roots of its characteristic polynomial:
 * unstable if a root lies outside the boundary or a repeated root on it; otherwise undecided if a
 * root's side is unknown; otherwise marginally stable if a (simple) root lies on it; otherwise
 * asymptotically stable, named by the slowest root.
 */
final class StabilityJudge {
    private final Domain domain;
    private final int digits;

    StabilityJudge(Domain domain, int digits) {
        this.domain = domain;
        this.digits = digits;
    }

    Stability judge(List<FactorRoot> roots) {
        BoundarySide boundary = new BoundarySide(domain);
        List<Judged> judged = roots.stream().map(r -> new Judged(r, boundary.of(r.approximation().root(),
                new Enclosure(r.approximation().re(), r.approximation().im(), r.approximation().radius()), digits))).toList();
        String axis = domain == Domain.DIFFERENTIAL ? "Re λ" : "|λ|";
        String limit = domain == Domain.DIFFERENTIAL ? "0" : "1";
        Optional<Judged> outside = slowest(judged, j -> j.side == Side.OUTSIDE);
        if (outside.isPresent()) {
            return verdict(Verdict.UNSTABLE, outside, axis + " > " + limit);
        }
        Optional<Judged> repeated = slowest(judged, j -> j.side == Side.ON && j.root.multiplicity() > 1);
        if (repeated.isPresent()) {
            return verdict(Verdict.UNSTABLE, repeated, axis + " = " + limit + " with multiplicity " + repeated.get().root.multiplicity());
        }
        Optional<Judged> unknown = slowest(judged, j -> j.side == Side.UNKNOWN);
        if (unknown.isPresent()) {
            return verdict(Verdict.UNDECIDED, unknown, "the enclosure of this root still touches " + axis + " = " + limit
                    + " at " + BoundarySide.MAX_DIGITS + " digits");
        }
        Optional<Judged> on = slowest(judged, j -> j.side == Side.ON);
        if (on.isPresent()) {
            return verdict(Verdict.MARGINALLY_STABLE, on, axis + " = " + limit + ", simple; no root has " + axis + " > " + limit);
        }
        Optional<Judged> slowest = slowest(judged, j -> true);
        return verdict(Verdict.ASYMPTOTICALLY_STABLE, slowest, slowest.isEmpty() ? "no roots"
                : "every root has " + axis + " < " + limit + "; this one is the slowest");
    }

    private record Judged(FactorRoot root, Side side) {
    }

    /** The matching root with the largest Re λ or |λ|, preferring Im λ &ge; 0 within a pair. */
    private Optional<Judged> slowest(List<Judged> judged, Predicate<Judged> filter) {
        Comparator<Judged> order = Comparator.comparingDouble(j -> domain == Domain.DIFFERENTIAL ? j.root.re() : j.root.modulus());
        return judged.stream().filter(filter).filter(j -> j.root.im() >= 0).max(order)
                .or(() -> judged.stream().filter(filter).max(order));
    }

    private static Stability verdict(Verdict v, Optional<Judged> root, String reason) {
        return new Stability(v, root.map(j -> j.root.approximation()), reason);
    }
}
