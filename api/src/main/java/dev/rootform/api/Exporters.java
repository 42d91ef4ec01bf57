package dev.rootform.api;

import dev.rootform.export.CodeNames;
import dev.rootform.export.Exporter;
import dev.rootform.export.Rendering;
import dev.rootform.export.Report;
import dev.rootform.export.code.CRenderer;
import dev.rootform.export.code.CSource;
import dev.rootform.export.code.CodeRequests;
import dev.rootform.export.code.JavaRenderer;
import dev.rootform.export.document.JsonRenderer;
import dev.rootform.export.document.LatexRenderer;
import dev.rootform.export.document.MathMlRenderer;
import dev.rootform.export.document.TextRenderer;
import dev.rootform.export.html.HtmlRenderer;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.BiFunction;

/**
 * The exporters by format name: {@code text}, {@code json}, {@code latex}, {@code mathml},
 * {@code html}, {@code java}, {@code c}. The report page ({@code html}) draws plots from
 * {@code Report.plots()}, present when the solve ran with {@code Options.plots}; how LaTeX and the
 * page are laid out ({@code --standalone}, {@code --with-code}) is a {@link DocumentOptions}. Each exporter only formats a finished {@link Report}; all of them are
 * stateless and thread-safe. The code formats ({@code java}, {@code c}) cannot write every answer
 * (a general solution has free constants): {@link Exporter#refusal(Report)} says why, and
 * {@link Exporter#render} throws {@code IllegalArgumentException} for such a report.
 *
 * <p>The sum of the first n odd numbers, solved and written as LaTeX:
 *
 * <pre>{@code
 * Report report = Rootform.solve(SolveRequest.of("x[n+1] = x[n] + 2n + 1; x[0] = 0")).answer().orElseThrow();
 * Exporter latex = Exporters.byName("latex").orElseThrow();
 * System.out.println(latex.render(report, CodeNames.defaults()).text());
 * }</pre>
 *
 * @since 0.2
 */
public final class Exporters {
    private static final Map<String, Exporter> BY_NAME = table(DocumentOptions.defaults());

    private Exporters() {
    }

    /**
     * The exporter of one format.
     *
     * @param format a name from {@link #names()}, e.g. {@code "json"}
     * @return the exporter, or empty for an unknown name
     */
    public static Optional<Exporter> byName(String format) {
        return Optional.ofNullable(BY_NAME.get(format));
    }

    /**
     * The exporter of one format, laid out as {@code options} say.
     *
     * @param format a name from {@link #names()}, e.g. {@code "latex"}
     * @param options a standalone LaTeX document, the code on the report page
     * @return the exporter, or empty for an unknown name
     */
    public static Optional<Exporter> byName(String format, DocumentOptions options) {
        return Optional.ofNullable(table(options).get(format));
    }

    /**
     * Every format name.
     *
     * @return the names in a fixed order, {@code text} first
     */
    public static List<String> names() {
        return List.copyOf(BY_NAME.keySet());
    }

    private static Rendering c(Report report, CodeNames names) {
        CSource c = CRenderer.render(report, names.function(), names.headerFile());
        return new Rendering(c.source(), c.header());
    }

    private static Map<String, Exporter> table(DocumentOptions o) {
        return index(List.of(
                new Named("text", false, (r, n) -> Rendering.of(TextRenderer.render(r))),
                new Named("json", false, (r, n) -> Rendering.of(JsonRenderer.render(r))),
                new Named("latex", false, (r, n) -> Rendering.of(o.standalone() ? LatexRenderer.document(r) : LatexRenderer.render(r))),
                new Named("mathml", false, (r, n) -> Rendering.of(MathMlRenderer.render(r))),
                new Named("html", o.withCode().isPresent(), (r, n) -> Rendering.of(HtmlRenderer.render(r, o.withCode(), n))),
                new Named("java", true, (r, n) -> Rendering.of(JavaRenderer.render(r, n.packageName().orElse(null), n.className()))),
                new Named("c", true, Exporters::c)));
    }

    private static Map<String, Exporter> index(List<Exporter> exporters) {
        Map<String, Exporter> map = new LinkedHashMap<>();
        exporters.forEach(e -> map.put(e.format(), e));
        return java.util.Collections.unmodifiableMap(map);
    }

    /** An exporter that delegates to a renderer; code formats (and a page with code) need a fitted solution. */
    private record Named(String format, boolean code, BiFunction<Report, CodeNames, Rendering> renderer) implements Exporter {
        @Override
        public Optional<String> refusal(Report report) {
            return code ? CodeRequests.refusal(report) : Optional.empty();
        }

        @Override
        public Rendering render(Report report, CodeNames names) {
            return renderer.apply(report, names);
        }
    }
}
