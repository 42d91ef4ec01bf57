package dev.rootform.numeric.diagnostics;

import dev.rootform.numeric.roots.RootApproximation;
import java.util.Objects;
import java.util.Optional;

/**
 * A stability verdict with the root that decides it. Continuous time: asymptotically stable when
 * every Re λ &lt; 0, marginally stable when the largest Re λ is 0 and the roots with Re λ = 0 are
 * simple, else unstable; discrete time the same with |λ| against 1 (common practice). The verdict
 * is decided exactly or from certified enclosures, never from rounded decimals;
 * {@link Verdict#UNDECIDED} when an enclosure still touches the boundary after refinement.
 *
 * @param verdict the verdict
 * @param root the deciding root (the slowest one when stable); empty only for order 0
 * @param reason one plain-language line, e.g. {@code "Re λ = 0, simple"}
 * @since 0.2
 */
public record Stability(Verdict verdict, Optional<RootApproximation> root, String reason) {
    /** The possible verdicts. */
    public enum Verdict {
        ASYMPTOTICALLY_STABLE("asymptotically stable"),
        MARGINALLY_STABLE("marginally stable"),
        UNSTABLE("unstable"),
        UNDECIDED("undecided");

        private final String text;

        Verdict(String text) {
            this.text = text;
        }

        /** The verdict in words, e.g. {@code "marginally stable"}. */
        public String text() {
            return text;
        }
    }

    public Stability {
        Objects.requireNonNull(verdict, "verdict");
        Objects.requireNonNull(root, "root");
        Objects.requireNonNull(reason, "reason");
    }
}
