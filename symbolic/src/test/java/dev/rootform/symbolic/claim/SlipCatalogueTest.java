package dev.rootform.symbolic.claim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.parse.ProblemParser;
import dev.rootform.symbolic.solve.Solution;
import dev.rootform.symbolic.solve.Solver;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * A catalogue of planted slips, each kind in each domain where it exists: the claim is the solution
 * with one typical mistake of a hand derivation, and the check must fail exactly and name that
 * mistake. The solutions are known by construction (common practice: substitute and compare the
 * conditions).
 */
class SlipCatalogueTest {
    @ParameterizedTest(name = "{2}: {1}")
    @CsvSource(delimiter = '|', textBlock = """
        x[n+1] = 3x[n] - 2; x[0] = 2                      | 1 + 3^(n+1)              | INDEX_ORIGIN
        x[n+2] = 4x[n+1] - 4x[n]; x[0] = 1; x[1] = 4      | 2^n + 2^n                | MISSING_FACTOR
        x[n+1] = 2x[n] + 2^n; x[0] = 0                    | 2^(n-1)                  | MISSING_FACTOR
        x[n+2] = x[n+1] + 6x[n]; x[0] = 2; x[1] = 1       | 3^n + 2^n                | ROOT_SIGN
        x[n+2] = -x[n]; x[0] = 0; x[1] = 1                | cos(pi n/2)              | COS_SIN
        x[n+2] = 5x[n+1] - 6x[n]; x[0] = 0; x[1] = 1      | 3^n + 2^n                | CONSTANT_SIGN
        x[n+1] = 2x[n] + 1; x[0] = 1                      | 2·2^n                    | STEADY_PART
        x[n+2] = 3x[n+1]; x[0] = 5; x[1] = 1              | 3^(n-1)                  | VALIDITY_RANGE
        y'' + 4y' + 4y = 0; y(0) = 1; y'(0) = 0           | (1 + 2)e^(-2t)           | MISSING_FACTOR
        y'' + y = 2cos(t); y(0) = 0; y'(0) = 0            | sin(t)                   | MISSING_FACTOR
        y'' - y' - 6y = 0; y(0) = 2; y'(0) = 1            | e^(3t) + e^(2t)          | ROOT_SIGN
        y'' + 4y = 0; y(0) = 0; y'(0) = 2                 | cos(2t)                  | COS_SIN
        y'' + 3y' + 2y = 0; y(0) = 0; y'(0) = 1           | e^(-t) + e^(-2t)         | CONSTANT_SIGN
        y' + y = 1; y(0) = 0                              | -e^(-t)                  | STEADY_PART
        """)
    void eachPlantedSlipIsNamed(String problem, String claim, Slip.Kind expected) {
        Problem p = ProblemParser.parse(problem, List.of(), null);
        LinearEquation eq = p.equation();
        Solution solution = Solver.solve(p);
        ClaimFindings f = ClaimChecker.check(solution, ClaimParser.parse(claim, eq.domain(), eq.function(), eq.variable()));
        assertEquals(Decision.FAILS, f.verdict(), problem + " | " + claim);
        assertTrue(f.exact(), problem + " | " + claim);
        assertTrue(f.slips().stream().anyMatch(s -> s.kind() == expected), problem + " | " + claim + ": " + f.slips());
        Slip slip = f.slips().stream().filter(s -> s.kind() == expected).findFirst().orElseThrow();
        assertTrue(ClaimChecker.check(solution, reread(slip, eq)).verdict() == Decision.HOLDS, "the correction holds: " + slip);
    }

    @ParameterizedTest(name = "{1}")
    @CsvSource(delimiter = '|', textBlock = """
        x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1        | ((1 + sqrt(5))/2)^n/sqrt(5) - ((1 - sqrt(5))/2)^n/sqrt(5)
        y'' + 9y = 0; y(0) = 1; y'(0) = 3                 | sqrt(2) cos(3t - pi/4)
        """)
    void aClaimThatHoldsHasNoSlips(String problem, String claim) {
        Problem p = ProblemParser.parse(problem, List.of(), null);
        LinearEquation eq = p.equation();
        ClaimFindings f = ClaimChecker.check(Solver.solve(p), ClaimParser.parse(claim, eq.domain(), eq.function(), eq.variable()));
        assertEquals(Decision.HOLDS, f.verdict());
        assertTrue(f.slips().isEmpty());
    }

    /** The corrected claim as a claim again, through its terms written as an expression. */
    private static Claim reread(Slip slip, LinearEquation eq) {
        var form = slip.corrected();
        List<Claim.ExplicitValue> values = new java.util.ArrayList<>();
        long first = form.origin().toBigInteger().longValueExact();
        for (int i = 0; i < form.leadingValues().size(); i++) {
            values.add(new Claim.ExplicitValue(first + i, new Expr.Number(form.leadingValues().get(i), -1)));
        }
        java.util.Optional<Long> from = eq.domain() == dev.rootform.symbolic.model.Domain.DIFFERENCE
                ? java.util.Optional.of(form.validFrom()) : java.util.Optional.empty();
        return new Claim("", eq.domain(), eq.variable(), Expressions.of(form), from, values);
    }
}
