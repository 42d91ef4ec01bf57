package dev.rootform.cli;

import dev.rootform.api.Exporters;
import dev.rootform.api.Options;
import dev.rootform.symbolic.parse.InputException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import picocli.CommandLine.Option;

/** The options of every command that prints an answer: digits, points, presentation, format, file, time limit. */
final class AnswerOptions {
    @Option(names = "--digits", paramLabel = "N", description = "Significant digits of numeric output (default ${DEFAULT-VALUE}).")
    int digits = Options.DEFAULT_DIGITS;

    @Option(names = "--values-at", paramLabel = "LIST", description = "Comma-separated points at which to print the value, e.g. 0,10,1e3.")
    String valuesAt;

    @Option(names = "--numeric", description = "Show the constants and roots as decimals to --digits instead of exact forms.")
    boolean numeric;

    @Option(names = "--format", paramLabel = "FORMAT", completionCandidates = FormatNames.class,
            description = "Output format: ${COMPLETION-CANDIDATES} (default ${DEFAULT-VALUE}).")
    String format = "text";

    @Option(names = {"-o", "--output"}, paramLabel = "FILE", description = "Write the answer to FILE instead of standard output.")
    Path output;

    @Option(names = "--time-limit", paramLabel = "SECONDS",
            description = "Give up after this many seconds (default ${DEFAULT-VALUE}); exit code 1.")
    int timeLimit = 300;

    /**
     * Options with digits, points, time limit and presentation set.
     *
     * @throws InputException if digits or the time limit are out of range
     */
    Options.Builder options() {
        if (digits < 1 || digits > Options.MAX_DIGITS) {
            throw new InputException("--digits " + digits + " is out of range 1.." + Options.MAX_DIGITS, "", -1);
        }
        if (timeLimit < 1) {
            throw new InputException("--time-limit " + timeLimit + " must be at least 1 second", "", -1);
        }
        return Options.builder().digits(digits).points(valuesAt == null ? List.of() : List.of(valuesAt.split(",", -1)))
                .timeLimit(Duration.ofSeconds(timeLimit)).numeric(numeric);
    }

    /** {@code --format NAME} is not one of {@code names}. */
    InputException unknownFormat(List<String> names) {
        return new InputException("--format " + format + " is not one of " + String.join(", ", names), "", -1);
    }

    /** The format names, for the help text. */
    static final class FormatNames implements Iterable<String> {
        @Override
        public java.util.Iterator<String> iterator() {
            return Exporters.names().iterator();
        }
    }
}
