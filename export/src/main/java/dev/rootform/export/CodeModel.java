package dev.rootform.export;

import java.util.Objects;

/**
 * The double-precision model of a fitted answer that generated code evaluates, with what was
 * measured about it: computed once with the answer (see {@code dev.rootform.export.code.CodeModels}),
 * so that the code renderers only write it out.
 *
 * @param form the emitted formula: constants rounded once from their exact or high-precision values
 * @param facts its valid input range and its accuracy measured against exact values
 * @since 0.2
 */
public record CodeModel(NumericForm form, CodeFacts facts) {
    public CodeModel {
        Objects.requireNonNull(form, "form");
        Objects.requireNonNull(facts, "facts");
    }
}
