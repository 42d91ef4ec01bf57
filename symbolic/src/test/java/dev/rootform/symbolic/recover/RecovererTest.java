package dev.rootform.symbolic.recover;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.InputException;
import java.util.ArrayList;
import java.util.List;
import java.util.function.IntFunction;
import org.junit.jupiter.api.Test;

/**
 * Recovery on sequences whose shortest recurrence is known independently: closed forms whose
 * characteristic factors are a fact of the trade (n^p·r^n is annihilated by (λ − r)^{p+1}, common
 * practice) and the exact values of OEIS entries (from memory; each list is also checked by exact
 * iteration of the recovered recurrence, {@link RecoveredRecurrence#iterate}).
 */
class RecovererTest {
    private static final RationalPolynomial LAMBDA = RationalPolynomial.X;

    @Test
    void fibonacciNeedsTenTermsToBeConfirmed() {
        // Fibonacci numbers, OEIS A000045 (from memory)
        RecoveredRecurrence r = Recoverer.recover(terms("0 1 1 2 3 5 8 13 21 34"), 0);
        assertEquals(RationalPolynomial.ofIntegers(-1, -1, 1), r.characteristic());
        assertEquals("x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1", r.text());
        assertEquals(6, r.confirmingTerms());
        assertTrue(r.confirmed());
    }

    @Test
    void tooFewTermsNameHowManyMoreAreNeeded() {
        // tribonacci, OEIS A000073 (from memory): order 3 needs 2·3 + 2 = 8 terms
        RecoveredRecurrence r = Recoverer.recover(terms("0 0 1 1 2 4 7"), 0);
        assertEquals(3, r.order());
        assertFalse(r.confirmed());
        assertEquals(1, r.termsNeeded());
        assertEquals(-1, Recoverer.recover(terms("5"), 0).confirmingTerms());
        assertEquals(3, Recoverer.recover(terms("5"), 0).termsNeeded());
    }

    @Test
    void squaresPlusPowersOfTwoHaveOrderFour() {
        // n² + 2^n: (λ − 1)³(λ − 2) (common practice)
        RecoveredRecurrence r = Recoverer.recover(values(12, n -> Rational.of((long) n * n + (1L << n))), 0);
        assertEquals(lambdaMinus(1).pow(3).multiply(lambdaMinus(2)), r.characteristic());
        assertEquals(4, r.confirmingTerms());
    }

    @Test
    void polynomialOfDegreeThreeHasTheFourfoldRootOne() {
        // 2n³ − n + 7: (λ − 1)⁴ (common practice: the fourth difference of a cubic vanishes)
        RecoveredRecurrence r = Recoverer.recover(values(10, n -> Rational.of(2L * n * n * n - n + 7)), 5);
        assertEquals(lambdaMinus(1).pow(4), r.characteristic());
        assertEquals("x[n+4] = 4x[n+3] - 6x[n+2] + 4x[n+1] - x[n]", r.equation());
        assertEquals(List.of("x[5] = 7", "x[6] = 8", "x[7] = 21", "x[8] = 58"), r.conditions());
    }

    @Test
    void nTimesAPowerHasADoubleRoot() {
        // n·(−3)^n: (λ + 3)² (common practice)
        RecoveredRecurrence r = Recoverer.recover(values(8, n -> Rational.of(-3).pow(n).multiply(n)), 0);
        assertEquals(lambdaMinus(-3).pow(2), r.characteristic());
        assertEquals("x[n+2] = -6x[n+1] - 9x[n]", r.equation());
    }

    @Test
    void fractionsAndDecimalsGiveRationalCoefficients() {
        // x[n] = (2/3)^n + (-1/2)^n: (λ − 2/3)(λ + 1/2) = λ² − 1/6 λ − 1/3 (common practice)
        RecoveredRecurrence r = Recoverer.recover(values(8,
                n -> Rational.of(2, 3).pow(n).add(Rational.of(-1, 2).pow(n))), 0);
        assertEquals("x[n+2] = 1/6 x[n+1] + 1/3 x[n]", r.equation());
        // 0.5^n: the decimals 1, 0.5, 0.25, ... are exact halves
        assertEquals("x[n+1] = 1/2 x[n]; x[0] = 1", Recoverer.recover(terms("1 0.5 0.25 0.125 0.0625"), 0).text());
    }

    @Test
    void anExceptionalFirstTermIsAZeroRoot() {
        // 5, then powers of 2: x[n+2] = 2x[n+1] holds from n = 0, χ = λ(λ − 2)
        RecoveredRecurrence r = Recoverer.recover(terms("5 1 2 4 8 16"), 0);
        assertEquals(LAMBDA.multiply(lambdaMinus(2)), r.characteristic());
        assertEquals(1, r.zeroRootMultiplicity());
        assertEquals("x[n+2] = 2x[n+1]; x[0] = 5; x[1] = 1", r.text());
    }

    @Test
    void aZeroRootAboveIndexZeroCountsFromTheFirstTerm() {
        RecoveredRecurrence r = Recoverer.recover(terms("5 1 2 4 8 16"), 3);
        assertEquals(0, r.equationStart());
        assertEquals("x[n+2] = 2x[n+1]; x[0] = 5; x[1] = 1", r.text());
        assertEquals(-2, Recoverer.recover(terms("5 1 2 4 8 16"), -2).equationStart());
        assertEquals(3, Recoverer.recover(terms("1 2 4 8 16"), 3).equationStart());
    }

    @Test
    void leadingZerosAreZeroRoots() {
        // 0, 0, 0, then 3^n: λ³(λ − 3)
        RecoveredRecurrence r = Recoverer.recover(terms("0 0 0 1 3 9 27 81 243 729"), 0);
        assertEquals(LAMBDA.pow(3).multiply(lambdaMinus(3)), r.characteristic());
        assertEquals("x[n+4] = 3x[n+3]", r.equation());
    }

    @Test
    void aSequenceThatDiesIsAllZeroRoots() {
        RecoveredRecurrence r = Recoverer.recover(terms("7 0 0 0 0"), 0);
        assertEquals("x[n+1] = 0; x[0] = 7", r.text());
    }

    @Test
    void allZeroTermsAreRefused() {
        assertThrows(InputException.class, () -> Recoverer.recover(terms("0 0 0 0"), 0));
    }

    @Test
    void iterationReproducesEveryTerm() {
        // Perrin numbers, OEIS A001608 (from memory)
        List<Rational> perrin = terms("3 0 2 3 2 5 5 7 10 12 17 22 29 39 51 68 90");
        RecoveredRecurrence r = Recoverer.recover(perrin, 0);
        assertEquals(RationalPolynomial.ofIntegers(-1, -1, 0, 1), r.characteristic());
        assertEquals(perrin, r.iterate(perrin.size()));
    }

    private static RationalPolynomial lambdaMinus(long r) {
        return RationalPolynomial.ofIntegers(-r, 1);
    }

    private static List<Rational> terms(String text) {
        return TermsReader.read(text);
    }

    private static List<Rational> values(int count, IntFunction<Rational> f) {
        List<Rational> v = new ArrayList<>();
        for (int n = 0; n < count; n++) {
            v.add(f.apply(n));
        }
        return v;
    }
}
