package dev.rootform.export.code;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.Corpus;
import dev.rootform.export.ExactTerm;
import dev.rootform.export.ExactTerm.Reach;
import dev.rootform.export.Report;
import java.math.BigInteger;
import org.junit.jupiter.api.Test;

/** How far the exact 64-bit term reaches, against published and hand-derived limits. */
class ExactTermsTest {
    private static final BigInteger INT64_MAX = BigInteger.ONE.shiftLeft(63).subtract(BigInteger.ONE);

    private static ExactTerm term(String input) {
        return Corpus.codeReport(input).code().orElseThrow().exact().orElseThrow();
    }

    @Test
    void fibonacciFitsInUint64UpToF93() {
        // OEIS A000045: F(93) = 12200160415121876738 is the largest Fibonacci number below 2^64 (value
        // from memory; the exact solution confirms it below).
        String input = "x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1";
        ExactTerm t = term(input);
        assertTrue(t.unsigned());
        assertEquals(new Reach.Exact(93, true), t.reach());
        Report r = Corpus.codeReport(input);
        assertEquals(new BigInteger("12200160415121876738"), r.solution().exact().orElseThrow().valueAt(93).toBigInteger());
    }

    @Test
    void aProductCanLeaveInt64BeforeTheValueDoes() {
        // x[n] = 4*2^n - 3 (hand-derived, common practice): x[61] = 2^63 - 3 still fits in int64_t, but
        // forming it needs 3*x[60] = 3*(2^62 - 3) > 2^63 - 1, so the method reaches n = 60 only.
        ExactTerm t = term("x[n] = 3x[n-1] - 2x[n-2]; x[0] = 1; x[1] = 5");
        assertFalse(t.unsigned());
        assertEquals(new Reach.Exact(60, false), t.reach());
    }

    @Test
    void aPeriodicSequenceNeverOverflows() {
        // x[n+2] = -x[n] repeats 1, 2, -1, -2 with period 4.
        assertEquals(new Reach.Periodic(2, 4), term("x[n+2] = -x[n]; x[0] = 1; x[1] = 2").reach());
    }

    @Test
    void polynomialGrowthIsBoundedAnalyticallyAndTightly() {
        // x[n] = n(n-1)/2 = T(n-1), the triangular numbers (OEIS A000217). The recurrence the term runs is
        // x[m+3] = x[m] - 3x[m+1] + 3x[m+2]; its largest intermediate is 3x[m+2], so the true largest safe
        // n is the smallest n with 3*T(n-1) > 2^63 - 1 (hand-derived).
        ExactTerm t = term("x[n+2] - 2x[n+1] + x[n] = 1; x[0] = 0; x[1] = 0");
        Reach.Bounded b = (Reach.Bounded) t.reach();
        assertEquals(2, b.degree());
        assertEquals(1, b.period());
        long good = 1;
        long bad = 1L << 40;
        while (bad - good > 1) {
            long mid = (good + bad) / 2;
            BigInteger triple = BigInteger.valueOf(mid).multiply(BigInteger.valueOf(mid - 1)).multiply(BigInteger.valueOf(3)).shiftRight(1);
            if (triple.compareTo(INT64_MAX) > 0) {
                bad = mid;
            } else {
                good = mid;
            }
        }
        long trueLast = bad;
        assertTrue(b.last() <= trueLast, b.last() + " > " + trueLast);
        assertTrue(trueLast - b.last() < trueLast / 1_000_000, b.last() + " far below " + trueLast);
    }
}
