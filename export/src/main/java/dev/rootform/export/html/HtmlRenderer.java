package dev.rootform.export.html;

import dev.rootform.export.CodeNames;
import dev.rootform.export.Report;
import dev.rootform.export.code.CRenderer;
import dev.rootform.export.code.CodeRequests;
import dev.rootform.export.code.JavaRenderer;
import java.util.Optional;

/**
 * A solve answer as one self-contained HTML report page ({@link ReportPage}, {@link PageRenderer}),
 * optionally with the generated Java or C code in a block.
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
        Optional<Block.Code> block = code.map(language -> new Block.Code(language, switch (language) {
            case "java" -> JavaRenderer.render(r, names.packageName().orElse(null), names.className());
            case "c" -> CRenderer.render(r, names.function(), Optional.empty(), names.c()).source();
            default -> throw new IllegalArgumentException("no generated code in " + language);
        }));
        return PageRenderer.render(ReportPage.of(r, block));
    }
}
