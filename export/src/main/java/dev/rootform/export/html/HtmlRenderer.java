package dev.rootform.export.html;

import dev.rootform.export.CodeNames;
import dev.rootform.export.Rendering;
import dev.rootform.export.Report;
import dev.rootform.export.code.CRenderer;
import dev.rootform.export.code.CodeRequests;
import dev.rootform.export.code.JavaRenderer;
import dev.rootform.export.code.ResponseCode;
import dev.rootform.export.document.ParametricReport;
import dev.rootform.export.document.ResponseReport;
import dev.rootform.export.document.SystemReport;
import java.util.Optional;

/**
 * A solve answer ({@link ReportPage}), a response answer ({@link ResponsePage}), a state-space
 * answer ({@link SystemPage}) or an answer with parameters ({@link ParametricPage}) as one
 * self-contained HTML report page ({@link PageRenderer}), the first two optionally with the generated
 * Java or C code in a block.
 *
 * @since 0.3
 */
public final class HtmlRenderer {
    private HtmlRenderer() {
    }

    /**
     * @param code {@code "java"}, {@code "c"} or empty for no code
     * @throws IllegalArgumentException for another language, or code for a report that
     *     {@link CodeRequests#refusal} refuses
     */
    public static String render(Report r, Optional<String> code, CodeNames names) {
        return PageRenderer.render(ReportPage.of(r, code.map(language -> new Block.Code(language, code(r, language, names)))));
    }

    /**
     * The page of a response; its code is the evaluator of the solved problem, its opening comment
     * naming the transfer function ({@link ResponseCode}).
     *
     * @param code {@code "java"}, {@code "c"} or empty for no code
     * @throws IllegalArgumentException for another language, or code for a solved problem that
     *     {@link CodeRequests#refusal} refuses
     */
    public static String render(ResponseReport r, Optional<String> code, CodeNames names) {
        return PageRenderer.render(ResponsePage.of(r, code.map(language -> new Block.Code(language,
                ResponseCode.decorate(r, Rendering.of(code(r.response(), language, names))).text()))));
    }

    /** The page of an answer with parameters ({@link ParametricPage}; no code on it). */
    public static String render(ParametricReport r) {
        return PageRenderer.render(ParametricPage.of(r));
    }

    /** The page of a state-space answer (no code on it). */
    public static String render(SystemReport r) {
        return PageRenderer.render(SystemPage.of(r));
    }

    private static String code(Report r, String language, CodeNames names) {
        return switch (language) {
            case "java" -> JavaRenderer.render(r, names.packageName().orElse(null), names.className());
            case "c" -> CRenderer.render(r, names.function(), Optional.empty(), names.c()).source();
            default -> throw new IllegalArgumentException("no generated code in " + language);
        };
    }
}
