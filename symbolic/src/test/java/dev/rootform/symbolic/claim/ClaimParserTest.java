package dev.rootform.symbolic.claim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.InputException;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Reading claims: ordinary notation, the tool's own output, ranges, values, and refusals with their place. */
class ClaimParserTest {
    private static Claim sequence(String text) {
        return ClaimParser.parse(text, Domain.DIFFERENCE, "x", "n");
    }

    private static Claim function(String text) {
        return ClaimParser.parse(text, Domain.DIFFERENTIAL, "y", "t");
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        2^(n+1) - 1                                   | 2^(n + 1) - 1
        x[n] = ((1+sqrt(5))/2)^n/sqrt(5)              | ((1 + sqrt(5))/2)^n/sqrt(5)
        (1/5·√5)·(1/2 + 1/2·√5)^n                     | 1/5·sqrt(5)·(1/2 + 1/2·sqrt(5))^n
        cos(pi n/3)                                   | cos(π·n/3)
        (2/3·√3)·sin(2πn/3)                           | 2/3·sqrt(3)·sin(2·π·n/3)
        5^(n/2)·cos(n·arccos(1/5·√5))                 | 5^(n/2)·cos(n·arccos(1/5·sqrt(5)))
        3 − 2n²                                       | 3 - 2·n^2
        Σ_{λ^3 - λ - 1 = 0} (1/2 + λ)·λ^n             | Σ_{λ^3 - λ - 1 = 0} (1/2 + λ)·λ^n
        2pin                                          | 2·(π·n)
        """)
    void readsSequenceClaims(String text, String read) {
        assertEquals(read, sequence(text).formula().toString());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        e^(-2t)(cos(3t) + 2/3 sin(3t))                | e^(-2·t)·(cos(3·t) + 2/3·sin(3·t))
        y(t) = (3 + 2t)e^(-t)                         | (3 + 2·t)·e^(-t)
        2cos(3t - pi/4)                               | 2·cos(3·t - π/4)
        e^(-(t - 1/2))·cos(2(t - 1/2))                | e^(-(t - 1/2))·cos(2·(t - 1/2))
        tcos(t)                                       | t·cos(t)
        y = exp(-t)                                   | exp(-t)
        """)
    void readsFunctionClaims(String text, String read) {
        assertEquals(read, function(text).formula().toString());
    }

    @Test
    void readsARangeAndValuesClaimedOneByOne() {
        Claim c = sequence("x[n] = -1 + 3·n\nfor n ≥ 1\nx[0] = 1; x[-1] = 2/3");
        assertEquals(Optional.of(1L), c.from());
        assertEquals(2, c.values().size());
        assertEquals(-1, c.values().get(1).index());
        assertEquals(Rational.of(2, 3), ((Expr.Binary) c.values().get(1).value()).left() instanceof Expr.Number n
                ? n.value().divide(Rational.of(3)) : null);
        assertEquals(Optional.of(3L), sequence("2^n for n > 2").from());
        assertEquals(Optional.empty(), function("e^t for all t").from());
    }

    @Test
    void readsTheRootSumPolynomialMonic() {
        Expr.RootSum r = assertInstanceOf(Expr.RootSum.class, sequence("Σ_{2λ^2 - 2 = 0} λ^n").formula());
        assertEquals("x^2 - 1", r.factor().toString());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        2^(n+1                        | 2  | unbalanced
        2^n)                          | 3  | unbalanced
        tan(n) + 1                    | 0  | unknown function 'tan'
        2^k - 1                       | 2  | unknown name 'k'
        y(t) = 2^t                    | 0  | the claim is about y
        x[k] = 2^k                    | 2  | the claim is in k
        2^n + x                       | 6  | must not contain the unknown x
        λ^n                           | 0  | only inside a root sum
        2^n for n >= 1.5              | 13 | must be an integer
        2^n; 3^n                      | 5  | one formula
        Σ_{λ^2 - 2λ + 1 = 0} λ^n      | 3  | distinct roots
        n'' + 1                       | 1  | not an equation with derivatives
        x[n+1] - x[n]                 | 0  | must not contain the unknown x
        2^n = 3                       | 4  | unexpected '='
        """)
    void refusesBadClaimsAtTheirPlace(String text, int position, String message) {
        InputException e = assertThrows(InputException.class, () -> sequence(text));
        assertEquals(position, e.position(), e.getMessage());
        assertTrue(e.getMessage().contains(message), e.getMessage());
        assertEquals(text, e.source());
    }

    @Test
    void refusesAFunctionClaimInAnotherVariable() {
        InputException e = assertThrows(InputException.class, () -> function("e^(-2x)"));
        assertTrue(e.getMessage().contains("unknown name 'x'"), e.getMessage());
        assertEquals(5, e.position());
    }
}
