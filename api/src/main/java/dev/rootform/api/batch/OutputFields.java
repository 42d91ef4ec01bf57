package dev.rootform.api.batch;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.rootform.api.Exporters;
import dev.rootform.api.Options;
import dev.rootform.api.Result;
import dev.rootform.api.ResultText;
import dev.rootform.export.CodeNames;
import dev.rootform.export.Exporter;
import dev.rootform.export.Rendering;
import dev.rootform.export.Report;
import dev.rootform.export.code.Identifiers;
import dev.rootform.export.document.NumericDocument;
import dev.rootform.symbolic.model.InputException;
import java.io.UncheckedIOException;
import java.time.Duration;
import java.util.Optional;
import java.util.function.UnaryOperator;

/**
 * The fields of every command that gives a solve answer, named like the command-line options in
 * camelCase: {@code digits}, {@code valuesAt}, {@code allDigits}, {@code numeric}, {@code timeLimit} (seconds),
 * {@code format} (default {@code json}) and the names of generated code {@code class},
 * {@code package}, {@code function}, {@code header}; and the answer they shape.
 */
final class OutputFields {
    private static final String JSON = "json";

    private OutputFields() {
    }

    /**
     * The solve options of the fields, to be completed by the command (a variable, say).
     *
     * @param code whether the answer is to be generated code (builds the code model)
     */
    static Options.Builder options(Fields f, Duration defaultTimeLimit, boolean code) {
        return Options.builder()
                .digits(f.integer("digits", Options.DEFAULT_DIGITS, 1, Options.MAX_DIGITS))
                .points(f.texts("valuesAt", true))
                .numeric(f.flag("numeric"))
                .allDigits(f.flag("allDigits"))
                .timeLimit(f.seconds("timeLimit").orElse(defaultTimeLimit))
                .code(code);
    }

    /** The exporter of {@code format} and the checked code names. */
    static Output output(Fields f) {
        String format = f.text("format").orElse(JSON);
        Exporter exporter = Exporters.byName(format).orElseThrow(() -> new InputException(
                "\"format\" " + format + " is not one of " + String.join(", ", Exporters.names()), "", -1));
        String function = f.text("function").orElse(CodeNames.DEFAULT_FUNCTION);
        refuse(Identifiers.cFunctionRefusal("function", function));
        Optional<String> header = f.text("header");
        if (header.isPresent()) {
            if (!format.equals("c")) {
                throw new InputException("\"header\" is for format c", "", -1);
            }
            refuse(Identifiers.cHeaderRefusal(header.get()));
        }
        return new Output(exporter, names(f, function, header));
    }

    /** The checked names of a Java class: {@code class}, {@code package}. */
    static CodeNames javaNames(Fields f) {
        return names(f, CodeNames.DEFAULT_FUNCTION, Optional.empty());
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

    /**
     * Where a solve answer goes: a format and the names of generated code.
     */
    record Output(Exporter exporter, CodeNames names) {
        /** Whether the format is generated code (which needs {@link Options#code()}). */
        boolean code() {
            return exporter.format().equals("java") || exporter.format().equals("c");
        }

        /**
         * The reply of a solve result with exit codes as on the command line (0 solved, 3 a check
         * failed, 2 refused, 1 out of time): for {@code json} the answer's JSON document, else
         * {@code {"format", "text"}} and {@code "header"} for C with a header file.
         *
         * @param decorate what the command puts around the rendered answer
         */
        Reply reply(Result result, UnaryOperator<Rendering> decorate) {
            if (result instanceof Result.Numeric n) {
                return numeric(n, decorate);
            }
            Optional<Report> answer = result.answer();
            if (answer.isEmpty()) {
                return new Reply.Failed(ResultText.explain(result), result instanceof Result.OutOfTime ? 1 : 2);
            }
            Optional<String> refusal = exporter.refusal(answer.get());
            if (refusal.isPresent()) {
                return new Reply.Failed(refusal.get(), 2);
            }
            int exit = result instanceof Result.CheckFailed ? 3 : 0;
            return rendered(decorate.apply(exporter.render(answer.get(), names)), exit);
        }

        /**
         * A rendered answer of this output's format: for {@code json} the document itself, else
         * {@code {"format", "text"}} and {@code "header"} for C with a header file.
         */
        Reply rendered(Rendering rendering, int exit) {
            if (exporter.format().equals(JSON)) {
                return new Reply.Answered(parse(rendering.text()), exit);
            }
            ObjectNode body = Json.object().put("format", exporter.format()).put("text", rendering.text());
            rendering.header().ifPresent(h -> body.put("header", h));
            return new Reply.Answered(body, exit);
        }

        /** A numeric answer (the exact path did not finish), as JSON or text; other formats need an exact answer. */
        private Reply numeric(Result.Numeric n, UnaryOperator<Rendering> decorate) {
            Optional<String> refusal = NumericDocument.refusal(exporter.format());
            if (refusal.isPresent()) {
                return new Reply.Failed(refusal.get(), 2);
            }
            int exit = n.solution().verified() ? 0 : 3;
            Rendering rendering = decorate.apply(Rendering.of(NumericDocument.render(exporter.format(), n.solution())));
            if (exporter.format().equals(JSON)) {
                return new Reply.Answered(parse(rendering.text()), exit);
            }
            return new Reply.Answered(Json.object().put("format", exporter.format()).put("text", rendering.text()), exit);
        }

        private static ObjectNode parse(String json) {
            try {
                return (ObjectNode) Json.read(json);
            } catch (JsonProcessingException e) {
                throw new UncheckedIOException(e);
            }
        }
    }
}
