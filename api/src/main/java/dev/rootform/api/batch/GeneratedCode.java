package dev.rootform.api.batch;

import java.util.Objects;
import java.util.Optional;

/**
 * What an {@link EvaluatorSpec} produced: a Java source file, or why there is none.
 *
 * @since 0.2
 */
public sealed interface GeneratedCode permits GeneratedCode.Source, GeneratedCode.Failure {
    /**
     * A Java evaluator.
     *
     * @param packageName the class's package, empty for none
     * @param className the class's simple name
     * @param text the source file
     */
    record Source(Optional<String> packageName, String className, String text) implements GeneratedCode {
        public Source {
            Objects.requireNonNull(packageName, "packageName");
            Objects.requireNonNull(className, "className");
            Objects.requireNonNull(text, "text");
        }

        /** The source file's path under a source root, e.g. {@code com/example/Fibonacci.java}. */
        public String relativePath() {
            return packageName.map(p -> p.replace('.', '/') + "/").orElse("") + className + ".java";
        }
    }

    /** @param message one line naming the problem: bad input, a failed check, no fitted solution, the time limit */
    record Failure(String message) implements GeneratedCode {
        public Failure {
            Objects.requireNonNull(message, "message");
        }
    }
}
