package dev.rootform.cli;

import dev.rootform.api.DocumentOptions;
import dev.rootform.api.Exporters;
import dev.rootform.api.Options;
import dev.rootform.api.Result;
import dev.rootform.export.CType;
import dev.rootform.export.CVariant;
import dev.rootform.export.CodeNames;
import dev.rootform.export.Exporter;
import dev.rootform.export.Rendering;
import dev.rootform.export.Report;
import dev.rootform.export.code.Identifiers;
import dev.rootform.export.document.NumericDocument;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.Limits;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.UnaryOperator;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;

/**
 * The options of every command that prints an answer (solve, recover, response): digits, values,
 * format, output file, names and C variant of generated code and the time limit; checked before
 * any work, so a bad option fails fast.
 */
final class OutputOptions {
    @Option(names = "--digits", paramLabel = "N", description = "Significant digits of numeric output (default ${DEFAULT-VALUE}).")
    int digits = Options.DEFAULT_DIGITS;

    @Option(names = "--values-at", paramLabel = "LIST", description = "Comma-separated points at which to print the solution's value, e.g. 0,10,1e3.")
    String valuesAt;

    @Option(names = "--all-digits", description = "Print a sequence's --values-at exactly with all their digits (integers and "
            + "fractions of any length, up to " + Limits.MAX_EXACT_DIGITS + " digits) instead of rounded to --digits.")
    boolean allDigits;

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

    @Option(names = "--standalone", description = "With --format latex: a complete document (article, 10 pt, A4) instead of a fragment.")
    boolean standalone;

    @Option(names = "--with-code", paramLabel = "LANG",
            description = "With --format html: show the generated code (java or c) on the page.")
    String withCode;

    @Option(names = "--c-type", paramLabel = "TYPE",
            description = "Floating type of generated C: double or float (single precision: powf, expf, cosf; default double).")
    String cType;

    @Option(names = "--c-no-libm", description = "Generated C without the math library: only + - * / (exact integer terms, "
            + "powers by repeated squaring); refused when the formula needs exp or cos.")
    boolean cNoLibm;

    @Option(names = "--time-limit", paramLabel = "SECONDS",
            description = "Give up after this many seconds (default ${DEFAULT-VALUE}); exit code 1.")
    int timeLimit = 300;

    /**
     * Checks the output files, the format and the code names before any work.
     *
     * @throws InputException for an output file that cannot be written, an unknown format or a bad name
     */
    void check() {
        OutputFiles.check(files());
        exporter();
        codeNames();
    }

    /** The files to write: --header, then -o. */
    private List<OutputFiles.Target> files() {
        List<OutputFiles.Target> files = new ArrayList<>();
        if (header != null) {
            files.add(new OutputFiles.Target("--header", header));
        }
        if (output != null) {
            files.add(new OutputFiles.Target("-o", output));
        }
        return files;
    }

    /**
     * Prints the answer of {@code result}, passed through {@code decorate}, to -o or standard output,
     * or the one-line error of a result without one to standard error; returns the exit code. A
     * numeric answer (the exact path did not finish) is written as text or JSON, exit code 0 when its
     * numerical checks held.
     */
    int print(Result result, UnaryOperator<Rendering> decorate, CommandSpec spec) {
        if (result instanceof Result.Numeric n) {
            refuse(NumericDocument.refusal(format));
            write(decorate.apply(Rendering.of(NumericDocument.render(format, n.solution()))), spec.commandLine().getOut());
            return n.solution().verified() ? ExitCode.VERIFIED : ExitCode.CHECK_FAILED;
        }
        Optional<Report> answer = result.answer();
        if (answer.isEmpty()) {
            return ErrorLine.print(spec.commandLine().getErr(), ErrorLine.describe(result),
                    result instanceof Result.OutOfTime ? ExitCode.INTERNAL : ExitCode.BAD_INPUT);
        }
        Exporter exporter = exporter();
        CodeNames names = codeNames();
        refuse(exporter.refusal(answer.get(), names));
        write(decorate.apply(exporter.render(answer.get(), names)), spec.commandLine().getOut());
        return result instanceof Result.CheckFailed ? ExitCode.CHECK_FAILED : ExitCode.VERIFIED;
    }

    /**
     * Writes a rendering that the command made itself (an answer other than a solve report) to -o
     * or standard output, and a C header to --header; returns {@code exitCode}.
     */
    int print(Rendering rendering, int exitCode, CommandSpec spec) {
        write(rendering, spec.commandLine().getOut());
        return exitCode;
    }

    /** @throws InputException for an unknown format, or a layout option the format does not take */
    private Exporter exporter() {
        if (standalone && !format.equals("latex")) {
            throw new InputException("--standalone is for --format latex (an html page is always complete)", "", -1);
        }
        if (withCode != null && !format.equals("html")) {
            throw new InputException("--with-code is for --format html", "", -1);
        }
        if (withCode != null && !DocumentOptions.CODE_LANGUAGES.contains(withCode)) {
            throw new InputException("--with-code " + withCode + " is not one of " + String.join(", ", DocumentOptions.CODE_LANGUAGES),
                    "", -1);
        }
        return Exporters.byName(format, documentOptions()).orElseThrow(
                () -> new InputException("--format " + format + " is not one of " + String.join(", ", Exporters.names()), "", -1));
    }

    /**
     * The solve options, with {@code variable} for a differential equation (null for the default).
     *
     * @throws InputException for digits or a time limit out of range
     */
    Options options(String variable) {
        return limits(digits, timeLimit).points(valuesAt == null ? List.of() : List.of(valuesAt.split(",", -1)))
                .numeric(numeric).allDigits(allDigits).variable(variable)
                .code(format.equals("java") || format.equals("c") || withCode != null).plots(format.equals("html")).build();
    }

    /**
     * Solve options with --digits and --time-limit, checked (also for commands without this mixin).
     *
     * @throws InputException for digits or a time limit out of range
     */
    static Options.Builder limits(int digits, int timeLimit) {
        if (digits < 1 || digits > Options.MAX_DIGITS) {
            throw new InputException("--digits " + digits + " is out of range 1.." + Options.MAX_DIGITS, "", -1);
        }
        if (timeLimit < 1) {
            throw new InputException("--time-limit " + timeLimit + " must be at least 1 second", "", -1);
        }
        return Options.builder().digits(digits).timeLimit(Duration.ofSeconds(timeLimit));
    }

    /** --standalone and --with-code as the API takes them. */
    DocumentOptions documentOptions() {
        return new DocumentOptions(standalone, Optional.ofNullable(withCode));
    }

    /** @throws InputException for a bad class, package, function or header name, or a C option without --format c */
    CodeNames codeNames() {
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
                Optional.ofNullable(header).map(h -> h.getFileName().toString()), cVariant());
    }

    /** @throws InputException for an unknown --c-type, or --c-type / --c-no-libm without --format c */
    private CVariant cVariant() {
        if ((cType != null || cNoLibm) && !format.equals("c")) {
            throw new InputException((cType != null ? "--c-type" : "--c-no-libm") + " is for --format c", "", -1);
        }
        CType type = cType == null ? CType.DOUBLE : CType.byKeyword(cType).orElseThrow(() -> new InputException(
                "--c-type " + cType + " is not one of double, float", "", -1));
        return new CVariant(type, !cNoLibm);
    }

    /** @throws InputException with the refusal's message, when there is one */
    static void refuse(Optional<String> refusal) {
        refusal.ifPresent(message -> {
            throw new InputException(message, "", -1);
        });
    }

    /**
     * Writes the rendering: a C header to --header and the text to -o as one transaction (both or
     * neither), or the text to {@code out} once the files are written.
     *
     * @throws InputException when a file cannot be written (then none has changed)
     */
    void write(Rendering rendering, PrintWriter out) {
        Map<OutputFiles.Target, String> texts = new LinkedHashMap<>();
        List<OutputFiles.Target> files = files();
        for (OutputFiles.Target file : files) {
            texts.put(file, lines(file.option().equals("--header") ? rendering.header().orElseThrow() : rendering.text()));
        }
        try {
            OutputFiles.write(texts);
        } catch (IOException e) {
            throw new InputException("the answer could not be written, no file was changed: " + e, "", -1);
        }
        if (output == null) {
            out.print(lines(rendering.text()));
            out.flush();
        }
    }

    /** The text ending with a line break. */
    private static String lines(String answer) {
        return answer.endsWith("\n") ? answer : answer + System.lineSeparator();
    }

    /** The format names, for the help text. */
    static final class FormatNames implements Iterable<String> {
        @Override
        public java.util.Iterator<String> iterator() {
            return Exporters.names().iterator();
        }
    }
}
