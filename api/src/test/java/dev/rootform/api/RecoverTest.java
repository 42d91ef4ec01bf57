package dev.rootform.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.Report;
import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.symbolic.algebra.Rational;
import java.math.BigInteger;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Every kind of {@link Recovery} from the front door. */
class RecoverTest {
    @Test
    void fibonacciIsRecoveredAndSolved() {
        // Fibonacci numbers, OEIS A000045 (from memory); F(30) = 832040 (OEIS A000045, from memory)
        Recovery r = Rootform.recover(RecoverRequest.of("0, 1, 1, 2, 3, 5, 8, 13, 21, 34")
                .with(Options.builder().points("30").build()));
        Recovery.Recovered rec = assertInstanceOf(Recovery.Recovered.class, r);
        assertEquals("x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1", rec.equation());
        assertEquals(2, rec.order());
        assertEquals(10, rec.termsUsed());
        assertEquals(6, rec.confirmingTerms());
        Result.Solved s = assertInstanceOf(Result.Solved.class, rec.result());
        assertEquals(Rational.of(BigInteger.valueOf(832040)), s.report().values().get(0).exact().orElseThrow());
    }

    @Test
    void theSolvedFormReproducesEveryGivenTermAtItsIndex() {
        // 3·2^n − n − 2 from n = 4 (common practice: (λ − 2)(λ − 1)² annihilates it)
        List<String> terms = List.of("42", "89", "184", "375", "758", "1525", "3060", "6131", "12274");
        List<String> points = List.of("4", "5", "6", "7", "8", "9", "10", "11", "12");
        Recovery r = Rootform.recover(RecoverRequest.of(terms).startingAt(4).with(Options.builder().points(points).build()));
        Recovery.Recovered rec = assertInstanceOf(Recovery.Recovered.class, r);
        assertEquals("x[n+3] = 4x[n+2] - 5x[n+1] + 2x[n]; x[4] = 42; x[5] = 89; x[6] = 184", rec.equation());
        Report report = assertInstanceOf(Result.Solved.class, rec.result()).report();
        assertEquals(terms.stream().map(Rational::parse).toList(),
                report.values().stream().map(PointValue::exact).map(v -> v.orElseThrow()).toList());
    }

    @Test
    void aZeroRootAboveIndexZeroIsSolvedFromTheFirstTerm() {
        // 5, then powers of 2 from index 3: λ(λ − 2), the equation counts n from the first term
        Recovery r = Rootform.recover(RecoverRequest.of("5 1 2 4 8 16").startingAt(3));
        Recovery.Recovered rec = assertInstanceOf(Recovery.Recovered.class, r);
        assertEquals("x[n+2] = 2x[n+1]; x[0] = 5; x[1] = 1", rec.equation());
        assertInstanceOf(Result.Solved.class, rec.result());
    }

    @Test
    void tooFewTermsCountTheTermsStillNeeded() {
        // tribonacci, OEIS A000073 (from memory): order 3 needs 8 terms, 7 given
        Recovery r = Rootform.recover(RecoverRequest.of("0, 0, 1, 1, 2, 4, 7"));
        Recovery.TooFewTerms few = assertInstanceOf(Recovery.TooFewTerms.class, r);
        assertEquals(1, few.termsNeeded());
        assertEquals(3, few.order());
        assertTrue(few.message().contains("give at least 1 more"), few.message());
    }

    @Test
    void aBadTermIsRefusedWithItsPosition() {
        Recovery r = Rootform.recover(RecoverRequest.of(List.of("1", "2", "three")));
        Result.Refused refused = assertInstanceOf(Result.Refused.class, assertInstanceOf(Recovery.NotRecovered.class, r).result());
        assertEquals("1, 2, three", refused.source());
        assertEquals(6, refused.position());
    }

    @Test
    void badPointsAreRefusedBeforeRecovery() {
        Recovery r = Rootform.recover(RecoverRequest.of("1 2 4 8 16").with(Options.builder().points("ten").build()));
        assertInstanceOf(Result.Refused.class, assertInstanceOf(Recovery.NotRecovered.class, r).result());
    }

    @Test
    void allZeroTermsAreRefused() {
        Recovery r = Rootform.recover(RecoverRequest.of("0 0 0 0 0"));
        assertInstanceOf(Result.Refused.class, assertInstanceOf(Recovery.NotRecovered.class, r).result());
    }
}
