package dev.rootform.cli;

import dev.rootform.api.Rootform;
import dev.rootform.api.SolveRequest;
import dev.rootform.symbolic.model.InputException;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.function.UnaryOperator;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
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

    @Option(names = "--params", paramLabel = "NAMES",
            description = "Parameters in the equation, comma-separated (e.g. m,c,k): the answer is split into cases over them.")
    String params;

    @Option(names = "--where", paramLabel = "CONDS", description = "With --params: sign conditions such as \"m > 0, c >= 0, k > 0\".")
    String where;

    @Option(names = "--at", paramLabel = "VALUES", description = "With --params: values such as \"m=2, c=0.4, k=8\"; adds the answer there.")
    String at;

    @Mixin
    OutputOptions out;

    @Override
    public Integer call() {
        try {
            out.check();
            if (params != null || where != null || at != null) {
                return ParametricOutput.print(this);
            }
            return out.print(Rootform.solve(SolveRequest.of(input, given).with(out.options(variable))), UnaryOperator.identity(), spec);
        } catch (InputException e) {
            return ErrorLine.print(spec.commandLine().getErr(), ErrorLine.describe(e), ExitCode.BAD_INPUT);
        }
    }
}
