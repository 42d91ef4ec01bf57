package dev.rootform.cli;

import dev.rootform.api.Exporters;
import dev.rootform.api.Options;
import dev.rootform.api.Result;
import dev.rootform.api.Rootform;
import dev.rootform.api.SolveRequest;
import dev.rootform.export.CodeNames;
import dev.rootform.export.Exporter;
import dev.rootform.export.code.Identifiers;
import dev.rootform.export.Rendering;
import dev.rootform.export.Report;
import dev.rootform.symbolic.model.InputException;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code rootform solve}: one equation in, one verified answer out. */
@Command(name = "solve", description = "Solve a linear constant-coefficient difference or differential equation exactly.",
        mixinStandardHelpOptions = true, sortOptions = false)
final class SolveCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "EQUATION",
            description = "The equation, optionally followed by conditions, separated by ';', e.g. \"y'' + 2y' + 5y = 0; y(0)=1; y'(0)=0\".")
    String input;

    @Option(names = "--given", paramLabel = "COND", description = "A condition such as y(0)=1 or x[5]=8 (repeatable).")
    List<String> given = new ArrayList<>();

    @Option(names = "--var", paramLabel = "NAME", description = "Independent variable of a differential equation (default t).")
    String variable;

    @Option(names = "--digits", paramLabel = "N", description = "Significant digits of numeric output (default ${DEFAULT-VALUE}).")
    int digits = Options.DEFAULT_DIGITS;

    @Option(names = "--values-at", paramLabel = "LIST", description = "Comma-separated points at which to print the solution's value, e.g. 0,10,1e3.")
    String valuesAt;

    @Option(names = "--numeric", description = "Show the constants and roots as decimals to --digits instead of exact forms.")
    boolean numeric;

    @Option(names = "--format", paramLabel = "FORMAT", completionCandidates = FormatNames.class,
            description = "Output format: ${COMPLETION-CANDIDATES} (default ${DEFAULT-VALUE}).")
    String format = "text";

    @Option(names = {"-o", "--output"}, paramLabel = "FILE", description = "Write the answer to FILE instead of standard output.")
    Path output;

    @Option(names = "--package", paramLabel = "NAME", description = "Java package of the generated class (default: none).")
    String packageName;

    @Option(names = "--class", paramLabel = "NAME", description = "Name of the generated Java class (default ${DEFAULT-VALUE}).")
    String className = CodeNames.DEFAULT_CLASS;

    @Option(names = "--function", paramLabel = "NAME", description = "Name of the generated C function (default ${DEFAULT-VALUE}).")
    String function = CodeNames.DEFAULT_FUNCTION;

    @Option(names = "--header", paramLabel = "FILE", description = "Write the C header to FILE (the source, on stdout or -o, includes it).")
    Path header;

    @Option(names = "--time-limit", paramLabel = "SECONDS",
            description = "Give up after this many seconds (default ${DEFAULT-VALUE}); exit code 1.")
    int timeLimit = 300;

    @Override
    public Integer call() throws IOException {
        PrintWriter err = spec.commandLine().getErr();
        try {
            if (digits < 1 || digits > Options.MAX_DIGITS) {
                throw new InputException("--digits " + digits + " is out of range 1.." + Options.MAX_DIGITS, "", -1);
            }
            Exporter exporter = Exporters.byName(format).orElseThrow(() -> new InputException(
                    "--format " + format + " is not one of " + String.join(", ", Exporters.names()), "", -1));
            CodeNames names = codeNames();
            if (timeLimit < 1) {
                throw new InputException("--time-limit " + timeLimit + " must be at least 1 second", "", -1);
            }
            Options options = Options.builder().digits(digits).points(valuesAt == null ? List.of() : List.of(valuesAt.split(",", -1)))
                    .timeLimit(Duration.ofSeconds(timeLimit)).numeric(numeric).variable(variable).build();
            Result result = Rootform.solve(SolveRequest.of(input, given).with(options));
            Optional<Report> answer = result.answer();
            if (answer.isEmpty()) {
                err.println(ErrorLine.describe(result));
                err.flush();
                return result instanceof Result.OutOfTime ? ExitCode.INTERNAL : ExitCode.BAD_INPUT;
            }
            refuse(exporter.refusal(answer.get()));
            Rendering rendering = exporter.render(answer.get(), names);
            if (header != null) {
                write(header, rendering.header().orElseThrow());
            }
            write(output, rendering.text());
            return result instanceof Result.CheckFailed ? ExitCode.CHECK_FAILED : ExitCode.VERIFIED;
        } catch (InputException e) {
            err.println(ErrorLine.describe(e));
            err.flush();
            return ExitCode.BAD_INPUT;
        }
    }

    /** Checks the code-naming options before any work, so a bad name fails fast. */
    private CodeNames codeNames() {
        refuse(Identifiers.javaClassRefusal(className));
        if (packageName != null) {
            refuse(Identifiers.javaPackageRefusal(packageName));
        }
        refuse(Identifiers.cFunctionRefusal("--function", function));
        if (header != null) {
            if (!format.equals("c")) {
                throw new InputException("--header is for --format c", "", -1);
            }
            refuse(Identifiers.cHeaderRefusal(header.getFileName().toString()));
        }
        return new CodeNames(Optional.ofNullable(packageName), className, function,
                Optional.ofNullable(header).map(h -> h.getFileName().toString()));
    }

    /** @throws InputException with the refusal's message, when there is one */
    private static void refuse(Optional<String> refusal) {
        refusal.ifPresent(message -> {
            throw new InputException(message, "", -1);
        });
    }

    /** The format names, for the help text. */
    static final class FormatNames implements Iterable<String> {
        @Override
        public java.util.Iterator<String> iterator() {
            return Exporters.names().iterator();
        }
    }

    private void write(Path output, String answer) throws IOException {
        String text = answer.endsWith("\n") ? answer : answer + System.lineSeparator();
        if (output == null) {
            PrintWriter out = spec.commandLine().getOut();
            out.print(text);
            out.flush();
            return;
        }
        Path target = output.toAbsolutePath();
        Path temp = Files.createTempFile(target.getParent(), ".rootform-", ".tmp");
        try {
            Files.writeString(temp, text, StandardCharsets.UTF_8);
            Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(temp);
        }
    }
}
