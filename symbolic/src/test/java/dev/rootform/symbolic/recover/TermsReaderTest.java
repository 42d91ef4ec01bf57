package dev.rootform.symbolic.recover;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.InputException;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Terms as text: separators, exact numbers, and the place of each mistake. */
class TermsReaderTest {
    @Test
    void commasWhitespaceAndLineBreaksSeparate() {
        assertEquals(List.of(Rational.ZERO, Rational.ONE, Rational.of(2), Rational.of(-3), Rational.of(5)),
                TermsReader.read(" 0, 1 2\n-3,\n\t5,"));
    }

    @Test
    void fractionsAndDecimalsAreExact() {
        assertEquals(List.of(Rational.of(3, 4), Rational.of(1, 10), Rational.of(1000), Rational.of(-5, 2)),
                TermsReader.read("3/4, 0.1, 1e3, -2.5"));
    }

    @Test
    void aBadTermIsPlacedAtItsFirstCharacter() {
        InputException e = assertThrows(InputException.class, () -> TermsReader.read("1, 2, x3, 4"));
        assertEquals(6, e.position());
        assertEquals("'x3' is not an exact number (integer, fraction or decimal)", e.getMessage());
    }

    @Test
    void aMissingTermIsPlacedAtTheSecondComma() {
        InputException e = assertThrows(InputException.class, () -> TermsReader.read("1, 2,, 4"));
        assertEquals(5, e.position());
        assertEquals(0, assertThrows(InputException.class, () -> TermsReader.read(", 1")).position());
    }

    @Test
    void aZeroDenominatorIsPlacedAtTheDenominator() {
        InputException e = assertThrows(InputException.class, () -> TermsReader.read("1, 2/0"));
        assertEquals(5, e.position());
    }

    @Test
    void noTermsIsRefused() {
        assertEquals("no terms given", assertThrows(InputException.class, () -> TermsReader.read("  ")).getMessage());
    }
}
