package dev.rootform.export.html;

import gg.jte.ContentType;
import gg.jte.TemplateEngine;
import gg.jte.output.StringOutput;

/**
 * Writes a {@link Page} as one self-contained HTML file from the precompiled jte template
 * {@code page.jte} (src/main/jte, compiled by jte's Maven plugin into
 * {@code gg.jte.generated.precompiled}): inline CSS for screen and print (A4 and Letter), MathML and SVG
 * inline, no scripts and no network access.
 *
 * @since 0.3
 */
public final class PageRenderer {
    private static final TemplateEngine ENGINE = TemplateEngine.createPrecompiled(ContentType.Html);

    private PageRenderer() {
    }

    /** The page as HTML. */
    public static String render(Page page) {
        StringOutput out = new StringOutput();
        ENGINE.render("page.jte", page, out);
        return out.toString();
    }
}
