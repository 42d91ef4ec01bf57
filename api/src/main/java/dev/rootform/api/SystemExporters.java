package dev.rootform.api;

import dev.rootform.export.html.HtmlRenderer;
import dev.rootform.export.CodeNames;
import dev.rootform.export.Exporter;
import dev.rootform.export.Report;
import dev.rootform.export.Rendering;
import dev.rootform.export.document.SystemJsonRenderer;
import dev.rootform.export.document.SystemLatexRenderer;
import dev.rootform.export.document.SystemMathMlRenderer;
import dev.rootform.export.document.SystemReport;
import dev.rootform.export.document.SystemReport.SignalReport;
import dev.rootform.export.document.SystemTextRenderer;
import dev.rootform.symbolic.model.InputException;
import java.util.List;

/**
 * The formats of a state-space answer: {@code text}, {@code json}, {@code latex}, {@code mathml},
 * {@code html} (the report page; the response's plots need {@link Options#plots()}), and
 * {@code java} / {@code c} for the evaluator of the single output's response (the solve
 * exporters on that output's scalar report).
 *
 * @since 0.3
 */
public final class SystemExporters {
    private SystemExporters() {
    }

    /** Every format name, in a fixed order. */
    public static List<String> names() {
        return List.of("text", "json", "latex", "mathml", "html", "java", "c");
    }

    /**
     * The answer in {@code format}.
     *
     * @throws InputException for an unknown format, or code for a model without exactly one output
     *     response that a closed form describes from its start
     */
    public static Rendering render(SystemReport report, String format, CodeNames names) {
        return switch (format) {
            case "text" -> Rendering.of(SystemTextRenderer.render(report));
            case "json" -> Rendering.of(SystemJsonRenderer.render(report));
            case "latex" -> Rendering.of(SystemLatexRenderer.render(report));
            case "mathml" -> Rendering.of(SystemMathMlRenderer.render(report));
            case "html" -> Rendering.of(HtmlRenderer.render(report));
            case "java", "c" -> code(report, format, names);
            default -> throw new InputException("--format " + format + " is not one of " + String.join(", ", names()), "", -1);
        };
    }

    private static Rendering code(SystemReport report, String format, CodeNames names) {
        Exporter exporter = Exporters.byName(format).orElseThrow();
        Report y = output(report, format).report();
        exporter.refusal(y).ifPresent(message -> {
            throw new InputException(message, "", -1);
        });
        return exporter.render(y, names);
    }

    private static SignalReport output(SystemReport report, String format) {
        if (report.outputs().size() != 1) {
            throw new InputException("--format " + format + " writes the evaluator of one output's response: "
                    + (report.model().outputs() == 1 ? "give --x0 or --to so that there is a response"
                    : "the model has " + report.model().outputs() + " outputs (give C with one row)"), "", -1);
        }
        SignalReport y = report.outputs().get(0);
        if (y.signal().start() != 0 || !y.signal().delta().isZero()) {
            throw new InputException("--format " + format + ": the impulse response of y1 has a part at the origin ("
                    + (y.signal().start() != 0 ? "y1[0]" : "δ(t)") + ") that the evaluator's closed form does not hold;"
                    + " use --format text or json", "", -1);
        }
        return y;
    }
}
