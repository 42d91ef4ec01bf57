package dev.rootform.export.notation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.Corpus;
import dev.rootform.symbolic.closedform.ClosedForm;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/** Broken lines say exactly what the unbroken formula says, and break where a line is too long. */
class LineBreakerTest {
    private static Stream<ClosedForm> forms() {
        return Stream.concat(Corpus.SEQUENCES.stream(), Corpus.FUNCTIONS.stream()).map(p -> Corpus.report(p).solution().closedForm());
    }

    @Test
    void latexLinesJoinToTheFormula() {
        forms().forEach(f -> {
            for (int width : new int[] {8, 20, 1000}) {
                List<String> lines = new LineBreaker(LatexNotation.INSTANCE, width).formula(f);
                String joined = String.join("", lines).replace("\\right.", "").replace("\\left.", "");
                assertEquals(Formulas.latex(f), joined, "width " + width);
                assertTrue(width < 1000 || lines.size() == 1, "a wide line needs no break: " + lines);
            }
        });
    }

    @Test
    void mathMlLinesAreWellFormedAndJoinToTheFormula() {
        forms().forEach(f -> {
            List<String> lines = new LineBreaker(MathMlNotation.INSTANCE, 10).formula(f);
            for (String line : lines) {
                assertEquals(0, MathMlNotation.INSTANCE.openGroups(line).orElseThrow(), "unbalanced line " + line);
            }
            String whole = new FormulaWriter(MathMlNotation.INSTANCE, f).formula();
            assertEquals(bare(whole), bare(String.join("", lines)));
        });
    }

    /** Without grouping rows and fence sizes, which a break changes. */
    private static String bare(String mathml) {
        return mathml.replace("<mrow>", "").replace("</mrow>", "").replace("stretchy=\"true\"", "stretchy=\"false\"");
    }

    /** A long sum over a cubic's roots breaks inside its group, the opening parenthesis kept on the first line. */
    @Test
    void longGroupBreaksInside() {
        ClosedForm f = Corpus.report("x[n+5] = x[n+1] + x[n]; x[0] = 1; x[1] = 2; x[2] = 3; x[3] = 4; x[4] = 5").solution().closedForm();
        List<String> lines = new LineBreaker(LatexNotation.INSTANCE, 30).formula(f);
        assertTrue(lines.size() > 2, lines.toString());
        assertTrue(lines.get(0).endsWith("\\right."), lines.get(0));
        assertTrue(lines.get(1).startsWith("\\left."), lines.get(1));
    }
}
