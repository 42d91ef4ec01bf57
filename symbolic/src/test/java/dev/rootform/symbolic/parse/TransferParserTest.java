package dev.rootform.symbolic.parse;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.algebra.RationalFunction;
import dev.rootform.symbolic.transfer.TransferFunction;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

class TransferParserTest {
    private static RationalPolynomial p(String... c) {
        return RationalPolynomial.of(java.util.Arrays.stream(c).map(Rational::parse).toList());
    }

    private static RationalFunction f(String num, String den) {
        return new RationalFunction(p(num.split(" ")), p(den.split(" ")));
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "H(s) = (s + 3)/(s^2 + 2s + 5)                       | 3 1      | 5 2 1",
        "(s + 3)/(s^2 + 2s + 5)                              | 3 1      | 5 2 1",
        "H(s) = 2(s + 3)/((s + 1)^2 + 4)                     | 6 2      | 5 2 1",
        "H(s) = 1/(s + 1) + 1/(s + 2)                        | 3 2      | 2 3 1",
        "H(s) = 1/(s(s + 1))                                 | 1        | 0 1 1",
        "H(s) = 0.5/(0.25s + 1)                              | 2        | 4 1",
        "H(s) = (s + 1)^-1                                   | 1        | 1 1",
        "H(s) = (3/4)/(s - 1/2)                              | 3/4      | -1/2 1",
        "G(s) = 10/(s(s + 2)); H(s) = G/(1 + G)              | 10       | 10 2 1",
        "G(s) = 10/(s(s + 2)); H(s) = G(s)/(1 + G(s))        | 10       | 10 2 1",
        "G = 1/(s + 1); K = 4; H = K G/(1 + K G)             | 4        | 5 1",
        "A(s) = 1/(s + 1); B(s) = 2/(s + 3); H(s) = A + B    | 5 3      | 3 4 1",
        "A(s) = 1/(s + 1); B(s) = 2/(s + 3); H(s) = A B      | 2        | 3 4 1",
        "H(s) = s + 1                                        | 1 1      | 1",
        "H(z) = (1 + z^-1)/(1 - 1.5z^-1 + 0.56z^-2)          | 0 1 1    | 0.56 -1.5 1",
        "H(z) = z/(z - 0.5)                                  | 0 1      | -0.5 1",
        "H(z) = 1 + z^-1                                     | 1 1      | 0 1",
        "H(z) = 0.25(1 + 2z^-1 + z^-2)                       | 0.25 0.5 0.25 | 0 0 1",
    })
    void readsTheFunctionInLowestTerms(String text, String num, String den) {
        TransferFunction h = TransferParser.parse(text);
        assertEquals(f(num, den), h.value(), text);
        assertEquals(List.of(), h.cancelled(), text);
    }

    @Test
    void domainAndNameComeFromTheText() {
        TransferFunction h = TransferParser.parse("G(s) = 1/s; Loop(s) = G/(1 + G)");
        assertEquals(Domain.DIFFERENTIAL, h.domain());
        assertEquals("Loop(s)", h.signature());
        TransferFunction d = TransferParser.parse("H(z) = 1/(1 - 0.5z^-1)");
        assertEquals(Domain.DIFFERENCE, d.domain());
        assertEquals("z", d.variable());
    }

    @Test
    void namesACancelledPoleZeroPair() {
        TransferFunction h = TransferParser.parse("H(s) = (s + 1)/((s + 1)(s + 2))");
        assertEquals(f("1", "2 1"), h.value());
        assertEquals(List.of(new Factor(p("1", "1"), 1)), h.cancelled());
    }

    @Test
    void seriesConnectionThatHidesAnUnstablePoleIsNamed() {
        // controller zero at s = 1 meets plant pole at s = 1; the loop keeps the hidden mode too
        TransferFunction series = TransferParser.parse("C(s) = (s - 1)/(s + 4); P(s) = 1/((s - 1)(s + 2)); H(s) = C P");
        assertEquals(List.of(new Factor(p("-1", "1"), 1)), series.cancelled());
        TransferFunction loop = TransferParser.parse("C(s) = (s - 1)/(s + 4); P(s) = 1/((s - 1)(s + 2)); H(s) = C P/(1 + C P)");
        assertEquals(List.of(new Factor(p("-1", "1"), 1)), loop.cancelled());
        // C P/(1 + C P) = 1/((s + 4)(s + 2) + 1) after the cancellation (hand algebra)
        assertEquals(f("1", "9 6 1"), loop.value());
    }

    @Test
    void delayNotationInZCancelsNothingVisible() {
        TransferFunction h = TransferParser.parse("H(z) = (1 - z^-1)/(1 - z^-1)^2");
        assertEquals(f("0 1", "-1 1"), h.value());
        assertEquals(List.of(new Factor(p("-1", "1"), 1)), h.cancelled());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "H(s) = e^(-s)/(s + 1)               | 7  | time delay",
        "H(s) = exp(-2s)/(s + 1)             | 7  | time delay",
        "H(s) = (s + 1)/(z + 2)              | 16 | mixes s and z",
        "H(s) = K/(s + 1)                    | 7  | unknown name 'K'",
        "H(s) = sqrt(s)                      | 7  | not a rational function",
        "H(s) = s^(1/2)                      | 10 | non-integer power",
        "H(s) = 1/(s - s)                    | 10 | division by zero",
        "H(s) = pi/(s + 1)                   | 7  | must be rational",
        "G(s) = 1/s; G(s) = 2/s              | 12 | defined twice",
        "H(s) = (s + 1/(s + 2)               | 7  | unbalanced",
        "H(s) = s - s                        | 0  | is zero",
        "s(s) = 1/s                          | 0  | reserved",
        "H(z) = G(z)/(1 + G(z)); G(z) = 1/z  | 7  | unknown name 'G'",
        "H(s) = y'/(s + 1)                   | 7  | does not belong",
    })
    void refusesWithPosition(String text, int position, String message) {
        InputException e = assertThrows(InputException.class, () -> TransferParser.parse(text));
        assertTrue(e.getMessage().contains(message), e.getMessage());
        assertEquals(position, e.position(), e.getMessage());
    }

    @Test
    void readsAForcingAlone() {
        List<ForcingTerm> terms = ProblemParser.forcing("2sin(3t) + e^(-t)", Domain.DIFFERENTIAL);
        assertEquals(2, terms.size());
        List<ForcingTerm> sequence = ProblemParser.forcing("(1/2)^n", Domain.DIFFERENCE);
        assertEquals(List.of(new ForcingTerm(Rational.ONE, 0, Rational.of(1, 2), ForcingTerm.Oscillation.NONE, Rational.ZERO, false)),
                sequence);
        InputException e = assertThrows(InputException.class, () -> ProblemParser.forcing("sin(2t) + q", Domain.DIFFERENTIAL));
        assertEquals(10, e.position());
    }
}
