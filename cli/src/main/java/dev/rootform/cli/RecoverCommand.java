package dev.rootform.cli;

import dev.rootform.api.RecoverRequest;
import dev.rootform.api.Recovery;
import dev.rootform.api.Rootform;
import dev.rootform.export.document.RecoveryDocument;
import dev.rootform.symbolic.model.InputException;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import java.util.function.UnaryOperator;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code rootform recover}: exact terms in, the shortest recurrence that generates them and its
 * solve answer out. Exit 0 recovered and verified, 2 bad terms or too few, 3 a check failed, 1
 * out of time or internal.
 */
@Command(name = "recover", description = "Recover the shortest linear recurrence with constant rational coefficients "
        + "from exact terms of a sequence, then solve it.", mixinStandardHelpOptions = true, sortOptions = false)
final class RecoverCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", arity = "0..1", paramLabel = "TERMS",
            description = "Exact terms (integers, fractions, decimals) separated by commas or spaces, e.g. \"0, 1, 1, 2, 3, 5, 8, 13\".")
    String terms;

    @Option(names = "--start", paramLabel = "N0", description = "Index of the first term (default ${DEFAULT-VALUE}).")
    int start;

    @Option(names = "--file", paramLabel = "FILE", description = "Read the terms from FILE (commas, whitespace or line breaks between them).")
    Path file;

    @Mixin
    OutputOptions out;

    @Override
    public Integer call() throws IOException {
        PrintWriter err = spec.commandLine().getErr();
        try {
            out.check();
            Recovery recovery = Rootform.recover(new RecoverRequest(terms(), start, out.options(null)));
            if (recovery instanceof Recovery.TooFewTerms few) {
                return ErrorLine.print(err, "rootform: " + few.message(), ExitCode.BAD_INPUT);
            }
            if (recovery instanceof Recovery.NotRecovered not) {
                return out.print(not.result(), UnaryOperator.identity(), spec);
            }
            Recovery.Recovered recovered = (Recovery.Recovered) recovery;
            return out.print(recovered.result(), answer -> RecoveryDocument.render(out.format, recovered.recurrence(), answer), spec);
        } catch (InputException e) {
            return ErrorLine.print(err, ErrorLine.describe(e), ExitCode.BAD_INPUT);
        }
    }

    /** The terms from the argument or --file, exactly one of them. */
    private String terms() throws IOException {
        if (terms == null && file == null) {
            throw new InputException("no terms: give them as an argument or with --file", "", -1);
        }
        if (terms != null && file != null) {
            throw new InputException("give the terms as an argument or with --file, not both", "", -1);
        }
        if (terms != null) {
            return terms;
        }
        if (!Files.isReadable(file)) {
            throw new InputException("--file " + file + " cannot be read", "", -1);
        }
        return Files.readString(file, StandardCharsets.UTF_8);
    }
}
