package dev.rootform.export.html;

import java.util.List;
import java.util.Objects;

/**
 * One piece of a report page section. HTML-carrying fields hold markup that the builder already
 * escaped ({@link Html#text}) or generated (MathML, SVG); plain fields are escaped by the template.
 *
 * @since 0.3
 */
public sealed interface Block permits Block.Formula, Block.Paragraph, Block.Table, Block.Figure, Block.Code {
    /** Display mathematics: one or more {@code <math>} elements. */
    record Formula(String mathml) implements Block {
        public Formula {
            Objects.requireNonNull(mathml, "mathml");
        }
    }

    /** A paragraph of markup. */
    record Paragraph(String html) implements Block {
        public Paragraph {
            Objects.requireNonNull(html, "html");
        }
    }

    /** A table: plain-text headings, cells of markup. */
    record Table(List<String> headings, List<List<String>> rows) implements Block {
        public Table {
            headings = List.copyOf(headings);
            rows = rows.stream().map(List::copyOf).toList();
        }
    }

    /** An inline SVG plot with a plain-text caption. */
    record Figure(String svg, String caption) implements Block {
        public Figure {
            Objects.requireNonNull(svg, "svg");
            Objects.requireNonNull(caption, "caption");
        }
    }

    /** A block of source code, shown as is. */
    record Code(String language, String text) implements Block {
        public Code {
            Objects.requireNonNull(language, "language");
            Objects.requireNonNull(text, "text");
        }
    }
}
