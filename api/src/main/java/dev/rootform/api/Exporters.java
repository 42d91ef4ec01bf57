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
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.BiFunction;

/**
 * The exporters by format name: {@code text}, {@code json}, {@code latex}, {@code mathml},
 * {@code java}, {@code c}. Each exporter only formats a finished {@link Report}; all of them are
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
    private static final Map<String, Exporter> BY_NAME = index(List.of(
            new Named("text", ANY, (r, n) -> Rendering.of(TextRenderer.render(r))),
            new Named("json", ANY, (r, n) -> Rendering.of(JsonRenderer.render(r))),
            new Named("latex", ANY, (r, n) -> Rendering.of(LatexRenderer.render(r))),
            new Named("mathml", ANY, (r, n) -> Rendering.of(MathMlRenderer.render(r))),
            new Named("java", (r, n) -> CodeRequests.refusal(r),
                    (r, n) -> Rendering.of(JavaRenderer.render(r, n.packageName().orElse(null), n.className()))),
            new Named("c", (r, n) -> CRenderer.refusal(r, n.c()), Exporters::c)));

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

    private static Map<String, Exporter> index(List<Exporter> exporters) {
        Map<String, Exporter> map = new LinkedHashMap<>();
        exporters.forEach(e -> map.put(e.format(), e));
        return java.util.Collections.unmodifiableMap(map);
    }

    /** An exporter that delegates to a renderer; code formats need a fitted solution with its code model. */
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
