package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.closedform.ClosedForm;
import java.util.Objects;

/**
 * A named mistake in a failing claim, reported only when the claim with that mistake undone
 * checks exactly.
 *
 * @param kind which mistake
 * @param explanation one sentence for the person who wrote the claim
 * @param corrected the claim with the mistake undone (it holds)
 * @since 0.3
 */
public record Slip(Kind kind, String explanation, ClosedForm corrected) {
    /** The kinds of slip that are looked for. */
    public enum Kind {
        /** The formula is off by one index: it gives x[n − 1] or x[n + 1] where x[n] is due. */
        INDEX_ORIGIN("index origin shifted"),
        /** A term lacks the factor n or t that a repeated root or a resonance needs. */
        MISSING_FACTOR("missing factor n or t"),
        /** A root is used with the wrong sign. */
        ROOT_SIGN("root with the wrong sign"),
        /** cos and sin are exchanged in a term. */
        COS_SIN("cos and sin exchanged"),
        /** A term has the wrong sign. */
        CONSTANT_SIGN("constant with the wrong sign"),
        /** The particular (steady) part of a forced equation is missing. */
        STEADY_PART("steady part missing"),
        /** The formula is claimed for indices where λ = 0 roots make it wrong. */
        VALIDITY_RANGE("validity range ignores λ = 0 roots");

        private final String label;

        Kind(String label) {
            this.label = label;
        }

        /** A short label, e.g. "cos and sin exchanged". */
        public String label() {
            return label;
        }
    }

    public Slip {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(explanation, "explanation");
        Objects.requireNonNull(corrected, "corrected");
    }
}
