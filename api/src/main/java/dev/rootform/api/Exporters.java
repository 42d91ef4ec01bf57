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
 * {@link Exporter#render} throws {@code IllegalArgumentException} for such a report. The C exporter
 * writes the variant that {@link CodeNames#c()} names ({@code double} or {@code float}, with or
 * without the math library); {@link Exporter#refusal(Report, CodeNames)} also says when that variant
 * cannot evaluate the answer (C without libm for a closed form that needs cos or exp).
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
    private static final BiFunction<Report, CodeNames, Optional<String>> ANY = (r, n) -> Optional.empty();
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
        CSource c = CRenderer.render(report, names.function(), names.headerFile(), names.c());
        return new Rendering(c.source(), c.header());
    }

    private static Map<String, Exporter> table(DocumentOptions o) {
        BiFunction<Report, CodeNames, Optional<String>> code = (r, n) -> CodeRequests.refusal(r);
        BiFunction<Report, CodeNames, Optional<String>> c = (r, n) -> CRenderer.refusal(r, n.c());
        return index(List.of(
                new Named("text", ANY, (r, n) -> Rendering.of(TextRenderer.render(r))),
                new Named("json", ANY, (r, n) -> Rendering.of(JsonRenderer.render(r))),
                new Named("latex", ANY, (r, n) -> Rendering.of(o.standalone() ? LatexRenderer.document(r) : LatexRenderer.render(r))),
                new Named("mathml", ANY, (r, n) -> Rendering.of(MathMlRenderer.render(r))),
                new Named("html", o.withCode().map(language -> language.equals("c") ? c : code).orElse(ANY),
                        (r, n) -> Rendering.of(HtmlRenderer.render(r, o.withCode(), n))),
                new Named("java", code, (r, n) -> Rendering.of(JavaRenderer.render(r, n.packageName().orElse(null), n.className()))),
                new Named("c", c, Exporters::c)));
    }

    private static Map<String, Exporter> index(List<Exporter> exporters) {
        Map<String, Exporter> map = new LinkedHashMap<>();
        exporters.forEach(e -> map.put(e.format(), e));
        return java.util.Collections.unmodifiableMap(map);
    }

    /** An exporter that delegates to a renderer; code formats (and a page with code) need a fitted solution with its code model. */
    private record Named(String format, BiFunction<Report, CodeNames, Optional<String>> refusals,
            BiFunction<Report, CodeNames, Rendering> renderer) implements Exporter {
        @Override
        public Optional<String> refusal(Report report) {
            return refusal(report, CodeNames.defaults());
        }

        @Override
        public Optional<String> refusal(Report report, CodeNames names) {
            return refusals.apply(report, names);
        }

        @Override
        public Rendering render(Report report, CodeNames names) {
            return renderer.apply(report, names);
        }
    }
}
