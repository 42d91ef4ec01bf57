package dev.rootform.export.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.Rendering;
import dev.rootform.symbolic.recover.RecoveredRecurrence;
import dev.rootform.symbolic.recover.Recoverer;
import dev.rootform.symbolic.recover.TermsReader;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/** The recovered recurrence in front of a solve answer: notes, sections and comments. */
class RecoveryDocumentTest {
    // 5, then powers of 2, from index 3: χ = λ(λ − 2), an exceptional first term
    private static final RecoveredRecurrence EXCEPTIONAL = Recoverer.recover(TermsReader.read("5 1 2 4 8 16"), 3);

    @Test
    void notesSayWhichTermsAreExceptionalAndHowNIsCounted() {
        List<String> notes = RecoveryDocument.notes(EXCEPTIONAL);
        assertEquals("order 2, fitted to 6 terms x[3]..x[8]: 4 of them fix it and the 2 beyond confirm it", notes.get(0));
        assertTrue(notes.get(2).contains("counts n from it: n = index - 3"), notes.get(2));
        assertEquals("the root 0 (multiplicity 1) makes the first term exceptional: the recurrence holds from n = 0 on, "
                + "the closed form from n = 1 on", notes.get(3));
    }

    @Test
    void textIsALabelledSectionBeforeTheAnswer() {
        String text = RecoveryDocument.render("text", EXCEPTIONAL, Rendering.of("equation ...\n")).text();
        assertTrue(text.startsWith("recovered       x[n+2] = 2x[n+1]; x[0] = 5; x[1] = 1\n                order 2"), text);
        assertTrue(text.endsWith("\nequation ...\n"), text);
    }

    @Test
    void jsonPutsRecoveredFirstAndKeepsTheAnswersKeys() {
        String json = RecoveryDocument.render("json", EXCEPTIONAL, Rendering.of("{\"domain\" : \"difference\"}")).text();
        assertTrue(json.indexOf("\"recovered\"") < json.indexOf("\"domain\""), json);
        assertTrue(json.contains("\"zeroRootMultiplicity\" : 1"), json);
    }

    @Test
    void aCHeaderIsPassedOnAndCodeGetsLineComments() {
        Rendering c = RecoveryDocument.render("c", EXCEPTIONAL, new Rendering("/* code */\n", Optional.of("/* header */\n")));
        assertEquals(Optional.of("/* header */\n"), c.header());
        assertTrue(c.text().startsWith("// Recovered by rootform from terms: x[n+2] = 2x[n+1]; x[0] = 5; x[1] = 1\n"), c.text());
        assertThrows(IllegalArgumentException.class, () -> RecoveryDocument.render("html", EXCEPTIONAL, c));
    }
}
