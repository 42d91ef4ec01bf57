package dev.rootform.export.code;

import dev.rootform.export.Report;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.model.Domain;
import java.util.Optional;

/**
 * The precondition of {@link JavaRenderer} and {@link CRenderer}: generated code evaluates a fitted
 * closed form, so every constant must be fixed (exactly, or numerically as boundary values and
 * trial forms are). Callers run this check first and report a refusal as bad input; the renderers
 * reject a report that fails it.
 *
 * @since 0.2
 */
public final class CodeRequests {
    private CodeRequests() {
    }

    /**
     * Why no code can be generated for {@code r}, as one line (e.g. {@code "code output needs fitted
     * constants: give conditions for the free constants C1, C2"}); empty when it can: the answer is
     * {@link #fitted} and carries its {@link dev.rootform.export.CodeModel}.
     */
    public static Optional<String> refusal(Report r) {
        return fitted(r).or(() -> r.code().isPresent() ? Optional.empty()
                : Optional.of("the answer was solved without its generated-code model (ask for it with the code option)"));
    }

    /** Why {@code r} has no closed form that code could evaluate (free constants, no fitted solution); empty when it has one. */
    public static Optional<String> fitted(Report r) {
        ClosedForm form = CodeHeader.codeForm(r);
        if (!form.freeConstants().isEmpty()) {
            return Optional.of("code output needs fitted constants: give conditions for the free constants "
                    + String.join(", ", form.freeConstants()));
        }
        boolean sequence = form.domain() == Domain.DIFFERENCE;
        if (sequence && r.solution().exact().isEmpty() && r.solution().radical().isEmpty() && r.solution().sinusoid().isEmpty()) {
            return Optional.of("code output needs a fitted solution");
        }
        return Optional.empty();
    }

    /** @throws IllegalArgumentException with the refusal's message, when there is one */
    static void require(Optional<String> refusal) {
        refusal.ifPresent(message -> {
            throw new IllegalArgumentException(message);
        });
    }
}
