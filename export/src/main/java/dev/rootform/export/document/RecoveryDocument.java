package dev.rootform.export.document;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.rootform.export.Rendering;
import dev.rootform.symbolic.recover.RecoveredRecurrence;
import java.util.ArrayList;
import java.util.List;

/**
 * The answer of a recovery: the recovered recurrence (in solve's input syntax, with its order and
 * the terms that confirm it) put in front of the solve answer for it, in the answer's format. Text
 * gets a {@code recovered} section, JSON a {@code recovered} object
 * ({@code equation, order, termsUsed, confirmingTerms, firstIndex, equationFirstIndex,
 * zeroRootMultiplicity, notes}) ahead of solve's keys, and LaTeX, MathML, Java and C a comment
 * before the generated file. Formats what the recurrence holds; computes nothing.
 *
 * @since 0.2
 */
public final class RecoveryDocument {
    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final int LABEL_WIDTH = 16;

    private RecoveryDocument() {
    }

    /**
     * The recovered recurrence and {@code answer} (the solve answer for {@code r.text()}, rendered
     * in {@code format}) as one rendering; a C header file is passed on unchanged.
     *
     * @throws IllegalArgumentException if {@code format} is not text, json, latex, mathml, java or c
     */
    public static Rendering render(String format, RecoveredRecurrence r, Rendering answer) {
        return new Rendering(switch (format) {
            case "text" -> text(r) + answer.text();
            case "json" -> json(r, answer.text());
            case "latex" -> comment(r, "% ") + answer.text();
            case "mathml" -> "<!--\n" + comment(r, "  ") + "-->\n" + answer.text();
            case "java", "c" -> comment(r, "// ") + answer.text();
            default -> throw new IllegalArgumentException("format (" + format + ") has no recovery document");
        }, answer.header());
    }

    /**
     * What the recovery found, one sentence per line, in ASCII: where the terms are, how many fix and
     * confirm the order, and (when λ = 0 is a root) which terms are exceptional and how the equation
     * counts n.
     */
    static List<String> notes(RecoveredRecurrence r) {
        List<String> notes = new ArrayList<>();
        int last = r.start() + r.termsUsed() - 1;
        notes.add("order " + r.order() + ", fitted to " + r.termsUsed() + " terms x[" + r.start() + "].." + "x[" + last + "]: "
                + 2 * r.order() + " of them fix it and the " + r.confirmingTerms() + " beyond confirm it");
        notes.add("exact iteration from the first " + r.order() + " gives back all " + r.termsUsed() + " terms");
        int m = r.zeroRootMultiplicity();
        int first = r.equationStart();
        if (first != r.start()) {
            notes.add("the terms start at index " + r.start() + ", but with the root 0 nothing is known before the first term, "
                    + "so the equation counts n from it: n = index - " + r.start() + " (values are asked for at this n)");
        }
        if (m > 0) {
            notes.add("the root 0 (multiplicity " + m + ") makes the first " + (m == 1 ? "term" : m + " terms") + " exceptional: "
                    + "the recurrence holds from n = " + first + " on, the closed form from n = " + (first + m) + " on");
        }
        return List.copyOf(notes);
    }

    private static String text(RecoveredRecurrence r) {
        StringBuilder out = new StringBuilder();
        List<String> lines = new ArrayList<>();
        lines.add(r.text());
        lines.addAll(notes(r));
        for (int i = 0; i < lines.size(); i++) {
            String label = i == 0 ? "recovered" : "";
            out.append(label).append(" ".repeat(LABEL_WIDTH - label.length())).append(lines.get(i)).append('\n');
        }
        return out.toString();
    }

    private static String json(RecoveredRecurrence r, String answer) {
        ObjectNode root = MAPPER.createObjectNode();
        ObjectNode recovered = root.putObject("recovered").put("equation", r.text()).put("order", r.order())
                .put("termsUsed", r.termsUsed()).put("confirmingTerms", r.confirmingTerms()).put("firstIndex", r.start())
                .put("equationFirstIndex", r.equationStart()).put("zeroRootMultiplicity", r.zeroRootMultiplicity());
        notes(r).forEach(recovered.putArray("notes")::add);
        try {
            root.setAll((ObjectNode) MAPPER.readTree(answer));
            return MAPPER.writerWithDefaultPrettyPrinter().writeValueAsString(root);
        } catch (JsonProcessingException e) {
            throw new IllegalArgumentException("answer is not a JSON object", e);
        }
    }

    /** The recurrence and its notes, one comment line each. */
    private static String comment(RecoveredRecurrence r, String prefix) {
        StringBuilder out = new StringBuilder();
        out.append(prefix).append("Recovered by rootform from terms: ").append(r.text()).append('\n');
        notes(r).forEach(n -> out.append(prefix).append(n).append('\n'));
        return out.toString();
    }
}
