package dev.rootform.api;

import dev.rootform.export.CSource;
import dev.rootform.export.CodeNames;
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

/**
 * The renderers of a {@link ResponseReport} by format name, the same names as {@link Exporters}:
 * {@code text}, {@code json}, {@code latex}, {@code mathml}, {@code java}, {@code c} (the code
 * evaluates the response).
 *
 * @since 0.3
 */
public final class ResponseExporters {
    /** Renders one report with the given code names. */
    @FunctionalInterface
    public interface Renderer {
        /**
         * @throws dev.rootform.symbolic.parse.InputException for a bad code name
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
        map.put("text", (r, n) -> Rendering.of(ResponseText.render(r)));
        map.put("json", (r, n) -> Rendering.of(ResponseJson.render(r)));
        map.put("latex", (r, n) -> Rendering.of(ResponseLatex.render(r)));
        map.put("mathml", (r, n) -> Rendering.of(ResponseMathMl.render(r)));
        map.put("java", (r, n) -> Rendering.of(ResponseCode.java(r, n.packageName().orElse(null), n.className())));
        map.put("c", (r, n) -> {
            CSource c = ResponseCode.c(r, n.function(), n.headerFile());
            return new Rendering(c.source(), c.header());
        });
        return java.util.Collections.unmodifiableMap(map);
    }
}
