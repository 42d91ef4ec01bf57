package dev.rootform.api;

import dev.rootform.export.CodeNames;
import dev.rootform.export.Rendering;
import dev.rootform.export.code.ParametricCode;
import dev.rootform.export.document.ParametricJsonRenderer;
import dev.rootform.export.document.ParametricLatexRenderer;
import dev.rootform.export.document.ParametricMathMlRenderer;
import dev.rootform.export.document.ParametricReport;
import dev.rootform.export.document.ParametricTextRenderer;
import dev.rootform.export.html.HtmlRenderer;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.BiFunction;

/**
 * The renderers of an answer with parameters ({@link ParametricReport}) by format name: {@code text},
 * {@code json}, {@code latex} (a fragment, or a complete document with
 * {@link DocumentOptions#standalone()}), {@code mathml}, {@code html} (the report page: the case
 * table, the case formulas, the stability conditions and the checks), and {@code java}, {@code c}:
 * one function of the parameters and the variable, refused for a general solution or an answer
 * without cases.
 *
 * <pre>{@code
 * ParametricResult r = Rootform.solveWithParameters(ParametricRequest.of("x[n+1] = a x[n] + 1; x[0] = 0", "a"));
 * ParametricReport report = ((ParametricResult.Solved) r).report();
 * System.out.println(ParametricExporters.byName("text").orElseThrow().render(report, CodeNames.defaults()).text());
 * }</pre>
 *
 * @since 0.3
 */
public final class ParametricExporters {
    private static final FormatTable<ParametricReport> FORMATS = new FormatTable<>(ParametricExporters::index);

    private ParametricExporters() {
    }

    /** The renderer of {@code format}, or empty for a name not available with parameters. */
    public static Optional<ReportRenderer<ParametricReport>> byName(String format) {
        return FORMATS.byName(format);
    }

    /** The renderer of {@code format}, laid out as {@code options} say (a standalone LaTeX document); empty for a name not available. */
    public static Optional<ReportRenderer<ParametricReport>> byName(String format, DocumentOptions options) {
        return FORMATS.byName(format, options);
    }

    /** Every format name available with parameters, in a fixed order, {@code text} first. */
    public static List<String> names() {
        return FORMATS.names();
    }

    private static Map<String, ReportRenderer<ParametricReport>> index(DocumentOptions o) {
        Map<String, ReportRenderer<ParametricReport>> map = new LinkedHashMap<>();
        map.put("text", ReportRenderer.document(ParametricTextRenderer::render));
        map.put("json", ReportRenderer.document(ParametricJsonRenderer::render));
        map.put("latex", ReportRenderer.document(o.standalone() ? ParametricLatexRenderer::document : ParametricLatexRenderer::render));
        map.put("mathml", ReportRenderer.document(ParametricMathMlRenderer::render));
        map.put("html", page(o.withCode()));
        map.put("java", code((r, n) -> ParametricCode.java(r, n.packageName(), n.className())));
        map.put("c", code((r, n) -> ParametricCode.c(r, n.function())));
        return map;
    }

    /** The report page; it carries no code, so a page with code ({@link DocumentOptions#withCode()}) is refused. */
    private static ReportRenderer<ParametricReport> page(Optional<String> code) {
        return new ReportRenderer<>() {
            @Override
            public Optional<String> refusal(ParametricReport report) {
                return code.map(language -> "the page of an answer with parameters carries no code: write the " + language
                        + " code with its own format");
            }

            @Override
            public Rendering render(ParametricReport report, CodeNames names) {
                return Rendering.of(HtmlRenderer.render(report));
            }
        };
    }

    private static ReportRenderer<ParametricReport> code(BiFunction<ParametricReport, CodeNames, String> writer) {
        return new ReportRenderer<>() {
            @Override
            public Optional<String> refusal(ParametricReport report) {
                return ParametricCode.refusal(report);
            }

            @Override
            public Rendering render(ParametricReport report, CodeNames names) {
                return Rendering.of(writer.apply(report, names));
            }
        };
    }
}
