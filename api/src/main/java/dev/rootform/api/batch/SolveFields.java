package dev.rootform.api.batch;

import dev.rootform.api.Options;
import dev.rootform.api.SolveRequest;
import dev.rootform.export.CodeNames;
import dev.rootform.export.code.Identifiers;
import dev.rootform.symbolic.model.InputException;
import java.time.Duration;
import java.util.Optional;

/**
 * Reads a solve from request fields named like the options of {@code rootform solve}, in
 * camelCase: {@code problem}, {@code given}, {@code digits}, {@code valuesAt}, {@code numeric},
 * {@code var}, {@code timeLimit} (seconds); and the names of generated code, {@code package},
 * {@code class}, {@code function}, {@code header}.
 */
final class SolveFields {
    private SolveFields() {
    }

    /** The problem and its options. */
    static SolveRequest request(Fields f, Duration defaultTimeLimit) {
        String problem = f.requiredText("problem");
        Options options = Options.builder()
                .digits(f.integer("digits", Options.DEFAULT_DIGITS, 1, Options.MAX_DIGITS))
                .points(f.texts("valuesAt", true))
                .numeric(f.flag("numeric"))
                .variable(f.text("var").orElse(null))
                .timeLimit(f.seconds("timeLimit").orElse(defaultTimeLimit))
                .build();
        return SolveRequest.of(problem, f.texts("given", false)).with(options);
    }

    /** The names of a Java class ({@code package}, {@code class}), checked. */
    static CodeNames javaNames(Fields f) {
        return names(f, CodeNames.DEFAULT_FUNCTION, Optional.empty());
    }

    /** The names of generated Java or C code, checked; {@code header} only with {@code format} c. */
    static CodeNames codeNames(Fields f, String format) {
        String function = f.text("function").orElse(CodeNames.DEFAULT_FUNCTION);
        refuse(Identifiers.cFunctionRefusal("function", function));
        Optional<String> header = f.text("header");
        if (header.isPresent()) {
            if (!format.equals("c")) {
                throw new InputException("\"header\" is for format c", "", -1);
            }
            refuse(Identifiers.cHeaderRefusal(header.get()));
        }
        return names(f, function, header);
    }

    private static CodeNames names(Fields f, String function, Optional<String> header) {
        String className = f.text("class").orElse(CodeNames.DEFAULT_CLASS);
        refuse(Identifiers.javaClassRefusal(className));
        Optional<String> packageName = f.text("package");
        packageName.ifPresent(p -> refuse(Identifiers.javaPackageRefusal(p)));
        return new CodeNames(packageName, className, function, header);
    }

    /** @throws InputException with the refusal's message, when there is one */
    static void refuse(Optional<String> refusal) {
        refusal.ifPresent(message -> {
            throw new InputException(message, "", -1);
        });
    }
}
