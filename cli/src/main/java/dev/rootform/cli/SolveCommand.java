package dev.rootform.cli;

import dev.rootform.export.Report;
import dev.rootform.export.code.CRenderer;
import dev.rootform.export.code.CSource;
import dev.rootform.export.code.CodeRequests;
import dev.rootform.export.code.Identifiers;
import dev.rootform.export.code.JavaRenderer;
import dev.rootform.export.document.JsonRenderer;
import dev.rootform.export.document.LatexRenderer;
import dev.rootform.export.document.MathMlRenderer;
import dev.rootform.export.document.TextRenderer;
import dev.rootform.numeric.analysis.Analyzer;
import dev.rootform.symbolic.model.InputException;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
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
    /** Formats the command accepts. */
    enum Format { text, json, latex, mathml, java, c }

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
    int digits = Analyzer.DEFAULT_DIGITS;

    @Option(names = "--values-at", paramLabel = "LIST", description = "Comma-separated points at which to print the solution's value, e.g. 0,10,1e3.")
    String valuesAt;

    @Option(names = "--numeric", description = "Show the constants and roots as decimals to --digits instead of exact forms.")
    boolean numeric;

    @Option(names = "--format", paramLabel = "FORMAT", description = "Output format: ${COMPLETION-CANDIDATES} (default ${DEFAULT-VALUE}).")
    Format format = Format.text;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE", description = "Write the answer to FILE instead of standard output.")
    Path output;

    @Option(names = "--package", paramLabel = "NAME", description = "Java package of the generated class (default: none).")
    String packageName;

    @Option(names = "--class", paramLabel = "NAME", description = "Name of the generated Java class (default ${DEFAULT-VALUE}).")
    String className = "Solution";

    @Option(names = "--function", paramLabel = "NAME", description = "Name of the generated C function (default ${DEFAULT-VALUE}).")
    String function = "rootform_value";

    @Option(names = "--header", paramLabel = "FILE", description = "Write the C header to FILE (the source, on stdout or -o, includes it).")
    Path header;

    @Option(names = "--time-limit", paramLabel = "SECONDS",
            description = "Give up after this many seconds (default ${DEFAULT-VALUE}); exit code 1.")
    int timeLimit = 300;

    @Override
    public Integer call() throws IOException {
        PrintWriter err = spec.commandLine().getErr();
        try {
            if (digits < 1 || digits > 10_000) {
                throw new InputException("--digits " + digits + " is out of range 1..10000", "", -1);
            }
            validateNames();
            if (timeLimit < 1) {
                throw new InputException("--time-limit " + timeLimit + " must be at least 1 second", "", -1);
            }
            Report report = Budget.within(timeLimit,
                    () -> Pipeline.run(input, given, variable, digits, Points.parse(valuesAt), numeric));
            write(output, render(report));
            return report.verified() ? ExitCode.VERIFIED : ExitCode.CHECK_FAILED;
        } catch (InputException e) {
            err.println(ErrorLine.describe(e));
            err.flush();
            return ExitCode.BAD_INPUT;
        } catch (Budget.Exhausted e) {
            err.println("rootform: " + e.getMessage());
            err.flush();
            return ExitCode.INTERNAL;
        }
    }

    /** Checks the code-naming options before any work, so a bad name fails fast. */
    private void validateNames() {
        refuse(Identifiers.javaClassRefusal(className));
        if (packageName != null) {
            refuse(Identifiers.javaPackageRefusal(packageName));
        }
        refuse(Identifiers.cFunctionRefusal("--function", function));
        if (header != null) {
            if (format != Format.c) {
                throw new InputException("--header is for --format c", "", -1);
            }
            refuse(Identifiers.cHeaderRefusal(header.getFileName().toString()));
        }
    }

    /** @throws InputException with the refusal's message, when there is one */
    private static void refuse(Optional<String> refusal) {
        refusal.ifPresent(message -> {
            throw new InputException(message, "", -1);
        });
    }

    /** The answer in the chosen format; for C with --header, the header is written here. */
    private String render(Report report) throws IOException {
        if (format == Format.java || format == Format.c) {
            refuse(CodeRequests.refusal(report));
        }
        switch (format) {
            case json:
                return JsonRenderer.render(report);
            case latex:
                return LatexRenderer.render(report);
            case mathml:
                return MathMlRenderer.render(report);
            case java:
                return JavaRenderer.render(report, packageName, className);
            case c:
                CSource c = CRenderer.render(report, function, Optional.ofNullable(header).map(h -> h.getFileName().toString()));
                if (header != null) {
                    write(header, c.header().orElseThrow());
                }
                return c.source();
            default:
                return TextRenderer.render(report);
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
