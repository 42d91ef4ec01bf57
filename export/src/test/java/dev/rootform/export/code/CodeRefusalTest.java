package dev.rootform.export.code;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.Corpus;
import dev.rootform.export.Report;
import dev.rootform.export.notation.CommentText;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/** What generated code refuses: names that could inject code, comment terminators, unfitted constants. */
class CodeRefusalTest {
    private static final Report FIBONACCI = Corpus.codeReport(Corpus.SEQUENCES.get(0));

    @Test
    void namesThatCouldInjectCodeAreRefused() {
        for (String bad : new String[] {"class", "A;B", "a b", "X*/", "1abc", "", "a\nb", "_"}) {
            assertTrue(Identifiers.javaClassRefusal(bad).isPresent(), bad);
            assertThrows(IllegalArgumentException.class, () -> JavaRenderer.render(FIBONACCI, "", bad), bad);
        }
        assertTrue(Identifiers.javaPackageRefusal("com.int.x").isPresent());
        for (String bad : new String[] {"int", "a-b", "f()", "__x", "_Hidden", "pow", "x;y"}) {
            assertTrue(Identifiers.cFunctionRefusal("--function", bad).isPresent(), bad);
        }
        assertTrue(Identifiers.cHeaderRefusal("../x.h").isPresent());
        assertEquals(Optional.empty(), Identifiers.javaPackageRefusal("com.example.fib"));
        assertEquals(Optional.empty(), Identifiers.cFunctionRefusal("--function", "fib_value"));
    }

    @Test
    void commentTextCannotCloseAComment() {
        String s = CommentText.sanitize("x */ y -- z\nw /* λ");
        assertFalse(s.contains("*/") || s.contains("--") || s.contains("\n") || s.contains("/*"), s);
        assertTrue(s.chars().allMatch(c -> c >= 0x20 && c < 0x7f), s);
    }

    @Test
    void codeNeedsFittedConstants() {
        Report general = Corpus.report("x[n+2] = x[n+1] + x[n]");
        assertEquals(Optional.of("code output needs fitted constants: give conditions for the free constants C1, C2"),
                CodeRequests.refusal(general));
        assertThrows(IllegalArgumentException.class, () -> JavaRenderer.render(general, "", "Fib"));
        assertEquals(Optional.empty(), CodeRequests.refusal(FIBONACCI));
    }
}
