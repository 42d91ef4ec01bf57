package dev.rootform.api;

import dev.rootform.export.CodeNames;
import dev.rootform.export.Exporter;
import dev.rootform.export.Rendering;
import dev.rootform.export.code.ResponseCode;
import dev.rootform.export.document.ResponseJson;
import dev.rootform.export.document.ResponseLatex;
import dev.rootform.export.document.ResponseMathMl;
import dev.rootform.export.document.ResponseReport;
import dev.rootform.export.document.ResponseText;
import dev.rootform.export.html.HtmlRenderer;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The renderers of a {@link ResponseReport} by format name: {@code text}, {@code json},
 * {@code latex}, {@code mathml}, {@code html} (the report page: facts, poles and zeros, the
 * response and the frequency response drawn from {@link ResponseReport#frequencyPlot()} and the
 * solved report's plots, present when the response ran with {@link Options#plots()}), and
 * {@code java}, {@code c}, which write the code of the solved problem (the response's evaluator)
 * with the transfer function named in its header; they need the answer's code model
 * ({@link Options#code()}), and so does a page with code ({@link DocumentOptions#withCode()}).
 *
 * <pre>{@code
 * ResponseReport report = Rootform.response(ResponseRequest.of("H(s) = 1/(s + 1)").to("step")).answer().orElseThrow();
 * System.out.println(ResponseExporters.byName("json").orElseThrow().render(report, CodeNames.defaults()).text());
 * }</pre>
 *
 * @since 0.3
 */
public final class ResponseExporters {
    private static final FormatTable<ResponseReport> FORMATS = new FormatTable<>(ResponseExporters::index);

    private ResponseExporters() {
    }

    /** The renderer of {@code format}, or empty for an unknown name. */
    public static Optional<ReportRenderer<ResponseReport>> byName(String format) {
        return FORMATS.byName(format);
    }

    /**
     * The renderer of {@code format}, laid out as {@code options} say (the code on the report page);
     * empty for an unknown name.
     */
    public static Optional<ReportRenderer<ResponseReport>> byName(String format, DocumentOptions options) {
        return FORMATS.byName(format, options);
    }

    /** Every format name, in a fixed order. */
    public static List<String> names() {
        return FORMATS.names();
    }

    private static Map<String, ReportRenderer<ResponseReport>> index(DocumentOptions o) {
        Map<String, ReportRenderer<ResponseReport>> map = new LinkedHashMap<>();
        map.put("text", ReportRenderer.document(ResponseText::render));
        map.put("json", ReportRenderer.document(ResponseJson::render));
        map.put("latex", ReportRenderer.document(ResponseLatex::render));
        map.put("mathml", ReportRenderer.document(ResponseMathMl::render));
        map.put("html", page(o.withCode()));
        map.put("java", code(Exporters.byName("java").orElseThrow()));
        map.put("c", code(Exporters.byName("c").orElseThrow()));
        return map;
    }

    /** The report page, with the code of {@code language} when given (refused as that code format refuses it). */
    private static ReportRenderer<ResponseReport> page(Optional<String> language) {
        return new ReportRenderer<>() {
            @Override
            public Optional<String> refusal(ResponseReport report) {
                return language.flatMap(l -> Exporters.byName(l).orElseThrow().refusal(report.response()));
            }

            @Override
            public Rendering render(ResponseReport report, CodeNames names) {
                return Rendering.of(HtmlRenderer.render(report, language, names));
            }
        };
    }

    /** The solve exporter on the solved problem, its header naming the transfer function. */
    private static ReportRenderer<ResponseReport> code(Exporter exporter) {
        return new ReportRenderer<>() {
            @Override
            public Optional<String> refusal(ResponseReport report) {
                return exporter.refusal(report.response());
            }

            @Override
            public Rendering render(ResponseReport report, CodeNames names) {
                return ResponseCode.decorate(report, exporter.render(report.response(), names));
            }
        };
    }
}
