package dev.rootform.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.CodeNames;
import dev.rootform.symbolic.algebra.Rational;
import java.math.BigInteger;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Every kind of {@link Result} from the front door. */
class RootformTest {
    @Test
    void fibonacciIsSolvedWithExactValues() {
        // F(30) = 832040 (OEIS A000045, from memory; also exact rational iteration in tests-reference).
        Result r = Rootform.solve(SolveRequest.of("x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1")
                .with(Options.builder().points("30").build()));
        Result.Solved s = assertInstanceOf(Result.Solved.class, r);
        assertEquals(Rational.of(BigInteger.valueOf(832040)), s.report().values().get(0).exact().orElseThrow());
    }

    @Test
    void noConditionsGiveTheGeneralSolution() {
        Result r = Rootform.solve(SolveRequest.of("(D+1)^2 (D^2+4) y = 0"));
        Result.General g = assertInstanceOf(Result.General.class, r);
        assertTrue(g.report().solution().problem().conditions().isEmpty());
    }

    @Test
    void contradictoryConditionsCarryTheRelation() {
        // x[n+2] = -x[n] forces x[0] + x[2] = 0 (common practice: substitute n = 0).
        Result r = Rootform.solve(SolveRequest.of("x[n+2] = -x[n]; x[0] = 1; x[2] = 0"));
        Result.Contradictory c = assertInstanceOf(Result.Contradictory.class, r);
        assertTrue(c.explanation().contains("x[0] + x[2]"), c.explanation());
    }

    @Test
    void underdeterminedConditionsCarryAFreeSolution() {
        // sin(πn/2) vanishes at n = 0 and n = 2, so x[0] and x[2] leave it free (common practice).
        Result r = Rootform.solve(SolveRequest.of("x[n+2] = -x[n]; x[0] = 1; x[2] = -1"));
        Result.Underdetermined u = assertInstanceOf(Result.Underdetermined.class, r);
        assertTrue(u.freeSolution().isPresent(), u.explanation());
    }

    @Test
    void badInputIsRefusedWithItsPosition() {
        Result r = Rootform.solve(SolveRequest.of("y'' + (2y' = 0"));
        Result.Refused f = assertInstanceOf(Result.Refused.class, r);
        assertEquals('(', f.source().charAt(f.position()));
    }

    @Test
    void aBadPointIsRefusedAtItsPlace() {
        Result r = Rootform.solve(SolveRequest.of("x[n+1] = 2x[n]; x[0] = 1").with(Options.builder().points("1", "zz").build()));
        Result.Refused f = assertInstanceOf(Result.Refused.class, r);
        assertEquals("1,zz", f.source());
        assertEquals(2, f.position());
    }

    @Test
    void everyFormatRendersASolvedAnswer() {
        Result.Solved s = assertInstanceOf(Result.Solved.class,
                Rootform.solve(SolveRequest.of("y'' + 3y' + 2y = 0; y(0) = 1; y'(0) = 0").with(Options.builder().code(true).build())));
        assertTrue(s.report().code().isPresent());
        for (String format : Exporters.names()) {
            String text = Exporters.byName(format).orElseThrow().render(s.report(), CodeNames.defaults()).text();
            assertTrue(!text.isBlank(), format);
        }
        assertEquals(List.of("text", "json", "latex", "mathml", "html", "java", "c"), Exporters.names());
        assertTrue(Exporters.byName("pdf").isEmpty());
    }

    @Test
    void codeNeedsItsModel() {
        Result.Solved s = assertInstanceOf(Result.Solved.class, Rootform.solve(SolveRequest.of("x[n+1] = 2x[n]; x[0] = 1")));
        assertTrue(s.report().code().isEmpty());
        assertTrue(Exporters.byName("java").orElseThrow().refusal(s.report()).isPresent());
        assertTrue(Exporters.byName("text").orElseThrow().refusal(s.report()).isEmpty());
    }

    @Test
    void optionsAreValidated() {
        assertThrows(IllegalArgumentException.class, () -> Options.builder().digits(0).build());
        assertThrows(IllegalArgumentException.class, () -> Options.builder().timeLimit(java.time.Duration.ZERO).build());
    }
}
