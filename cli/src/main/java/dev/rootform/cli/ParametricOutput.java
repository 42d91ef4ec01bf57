package dev.rootform.cli;

import dev.rootform.api.ParametricRequest;
import dev.rootform.api.ParametricResult;
import dev.rootform.api.Result;
import dev.rootform.api.Rootform;
import dev.rootform.export.CodeNames;
import dev.rootform.export.Rendering;
import dev.rootform.export.code.ParametricCode;
import dev.rootform.export.document.ParametricJsonRenderer;
import dev.rootform.export.document.ParametricLatexRenderer;
import dev.rootform.export.document.ParametricMathMlRenderer;
import dev.rootform.export.document.ParametricTextRenderer;
import dev.rootform.symbolic.model.InputException;
import java.util.Optional;

/** {@code solve --params}: the answer with parameters in text or JSON, and its exit code. */
final class ParametricOutput {
    private ParametricOutput() {
    }

    static int print(SolveCommand command) {
        if (command.params == null) {
            throw new InputException((command.where != null ? "--where" : "--at") + " needs --params", "", -1);
        }
        if (!command.given.isEmpty()) {
            throw new InputException("--given is not taken with --params: write the conditions after the equation", "", -1);
        }
        String format = command.out.format;
        if (!java.util.List.of("text", "json", "latex", "mathml", "java", "c").contains(format)) {
            throw new InputException("--format " + format + " is not available with --params (text, json, latex, mathml, java, c)",
                    "", -1);
        }
        CodeNames names = command.out.codeNames();
        ParametricRequest request = new ParametricRequest(command.input, command.params, command.where == null ? "" : command.where,
                Optional.ofNullable(command.at), command.out.options(command.variable));
        ParametricResult result = Rootform.solveWithParameters(request);
        if (result instanceof ParametricResult.NotSolved n) {
            return ErrorLine.print(command.spec.commandLine().getErr(), ErrorLine.describe(n.result()),
                    n.result() instanceof Result.OutOfTime ? ExitCode.INTERNAL : ExitCode.BAD_INPUT);
        }
        ParametricResult.Solved solved = (ParametricResult.Solved) result;
        if (format.equals("java") || format.equals("c")) {
            OutputOptions.refuse(ParametricCode.refusal(solved.report()));
        }
        String text = format.equals("java") ? ParametricCode.java(solved.report(), names.packageName(), names.className())
                : format.equals("c") ? ParametricCode.c(solved.report(), names.function())
                : format.equals("json") ? ParametricJsonRenderer.render(solved.report())
                : format.equals("latex") ? (command.out.documentOptions().standalone() ? ParametricLatexRenderer.document(solved.report())
                        : ParametricLatexRenderer.render(solved.report()))
                : format.equals("mathml") ? ParametricMathMlRenderer.render(solved.report())
                : ParametricTextRenderer.render(solved.report());
        return command.out.print(new Rendering(text, Optional.empty()), solved.report().verified() ? ExitCode.VERIFIED
                : ExitCode.CHECK_FAILED, command.spec);
    }
}
