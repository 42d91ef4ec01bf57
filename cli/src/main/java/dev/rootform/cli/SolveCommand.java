package dev.rootform.cli;

import dev.rootform.export.JsonRenderer;
import dev.rootform.export.Report;
import dev.rootform.export.TextRenderer;
import dev.rootform.numeric.analysis.Analyzer;
import dev.rootform.symbolic.parse.InputException;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
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

    @Override
    public Integer call() throws IOException {
        PrintWriter err = spec.commandLine().getErr();
        try {
            if (digits < 1 || digits > 10_000) {
                throw new InputException("--digits " + digits + " is out of range 1..10000", "", -1);
            }
            if (format != Format.text && format != Format.json) {
                throw new InputException("--format " + format + " is not available yet (text and json are)", "", -1);
            }
            Report report = Pipeline.run(input, given, variable, digits, Points.parse(valuesAt), numeric);
            String answer = format == Format.json ? JsonRenderer.render(report) : TextRenderer.render(report);
            write(answer);
            return report.verified() ? ExitCode.VERIFIED : ExitCode.CHECK_FAILED;
        } catch (InputException e) {
            err.println(Diagnostics.describe(e));
            err.flush();
            return ExitCode.BAD_INPUT;
        }
    }

    private void write(String answer) throws IOException {
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
