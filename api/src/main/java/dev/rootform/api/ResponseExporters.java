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
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;

/**
 * The renderers of a {@link ResponseReport} by format name: {@code text}, {@code json},
 * {@code latex}, {@code mathml}, and {@code java}, {@code c}, which write the code of the solved
 * problem (the response's evaluator) with the transfer function named in its header; they need the
 * answer's code model ({@link Options#code()}). The report page ({@code html}) is not available for
 * responses.
 *
 * <pre>{@code
 * ResponseReport report = Rootform.response(ResponseRequest.of("H(s) = 1/(s + 1)").to("step")).answer().orElseThrow();
 * System.out.println(ResponseExporters.byName("json").orElseThrow().render(report, CodeNames.defaults()).text());
 * }</pre>
 *
 * @since 0.3
 */
public final class ResponseExporters {
    /** Renders one response report; stateless and thread-safe. */
    public interface Renderer {
        /** Why {@code report} cannot be written in this format, or empty when it can. */
        default Optional<String> refusal(ResponseReport report) {
            return Optional.empty();
        }

        /**
         * The answer in this format.
         *
         * @param names names for generated code; ignored by the document formats
         * @throws IllegalArgumentException if {@link #refusal} is not empty
         */
        Rendering render(ResponseReport report, CodeNames names);
    }

    private static final Map<String, Renderer> BY_NAME = index();

    private ResponseExporters() {
    }

    /** The renderer of {@code format}, or empty for an unknown name. */
    public static Optional<Renderer> byName(String format) {
        return Optional.ofNullable(BY_NAME.get(format));
    }

    /** Every format name, in a fixed order. */
    public static List<String> names() {
        return List.copyOf(BY_NAME.keySet());
    }

    private static Map<String, Renderer> index() {
        Map<String, Renderer> map = new LinkedHashMap<>();
        map.put("text", document(ResponseText::render));
        map.put("json", document(ResponseJson::render));
        map.put("latex", document(ResponseLatex::render));
        map.put("mathml", document(ResponseMathMl::render));
        map.put("java", code(Exporters.byName("java").orElseThrow()));
        map.put("c", code(Exporters.byName("c").orElseThrow()));
        return java.util.Collections.unmodifiableMap(map);
    }

    private static Renderer document(Function<ResponseReport, String> writer) {
        return (r, n) -> Rendering.of(writer.apply(r));
    }

    /** The solve exporter on the solved problem, its header naming the transfer function. */
    private static Renderer code(Exporter exporter) {
        return new Renderer() {
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
