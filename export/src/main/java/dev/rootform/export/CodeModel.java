package dev.rootform.export;

import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * The floating-point model of a fitted answer that generated code evaluates, with what was measured
 * about it in each C variant that can evaluate it, and the exact 64-bit integer term of an
 * integer-valued recurrence: computed once with the answer (see
 * {@code dev.rootform.export.code.CodeModels}), so that the code renderers only write it out.
 *
 * @param form the emitted formula: constants rounded once from their exact or high-precision values
 * @param measured per C variant that can evaluate {@code form}: its valid input range and its
 *     accuracy measured against exact values; always has {@link CVariant#DEFAULT} (also what the
 *     Java code computes) and {@code float} with libm; the variants without libm only for a sequence
 *     whose terms need no cosine
 * @param exact the exact term on 64-bit integers, for an integer-valued recurrence whose steps and
 *     first values fit
 * @since 0.2
 */
public record CodeModel(NumericForm form, Map<CVariant, CodeFacts> measured, Optional<ExactTerm> exact) {
    public CodeModel {
        Objects.requireNonNull(form, "form");
        measured = Map.copyOf(measured);
        Objects.requireNonNull(exact, "exact");
        if (!measured.containsKey(CVariant.DEFAULT)) {
            throw new IllegalArgumentException("no facts for " + CVariant.DEFAULT);
        }
    }

    /** The facts of double evaluation with the math library, as the Java code and the default C compute it. */
    public CodeFacts facts() {
        return measured.get(CVariant.DEFAULT);
    }

    /** The facts of one C variant, or empty when that variant cannot evaluate the formula. */
    public Optional<CodeFacts> facts(CVariant variant) {
        return Optional.ofNullable(measured.get(variant));
    }
}
