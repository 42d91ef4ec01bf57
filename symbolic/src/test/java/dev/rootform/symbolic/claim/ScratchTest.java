package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.parse.ProblemParser;
import dev.rootform.symbolic.solve.Solution;
import dev.rootform.symbolic.solve.Solver;
import java.util.List;
import org.junit.jupiter.api.Test;

class ScratchTest {
    @Test
    void scratch() {
        String[][] cases = {
            {"x[n+1] = 2x[n] + 1; x[0]=1", "2^(n+2) - 1"},
            {"y'' + 2y' + y = 0; y(0)=3; y'(0)=-1", "(3 + 2)e^(-t)"},
            {"x[n+2] = x[n+1] + 6x[n]; x[0]=2; x[1]=1", "3^n + 2^n"},
            {"y'' + 2y' + 5y = 0; y(0)=1; y'(0)=0", "e^(-t)(sin(2t) + 1/2 cos(2t))"},
            {"y'' + 2y' + 5y = 0; y(0)=1; y'(0)=0", "e^(-t)(cos(2t) - 1/2 sin(2t))"},
            {"x[n+1] = 2x[n] + 1; x[0]=1", "2·2^n"},
            {"x[n+3] = 2x[n+2] - x[n+1]; x[0]=1; x[1]=2; x[2]=5", "-1 + 3n"},
            {"y'' - 2y' + y = e^t; y(0)=0; y'(0)=0", "t e^t/2"},
        };
        for (String[] c : cases) {
            Problem p = ProblemParser.parse(c[0], List.of(), null);
            Solution s = Solver.solve(p);
            Claim claim = ClaimParser.parse(c[1], p.equation().domain(), p.equation().function(), p.equation().variable());
            long start = System.nanoTime();
            ClaimFindings f = ClaimChecker.check(s, claim);
            long ms = (System.nanoTime() - start) / 1_000_000;
            System.out.println(c[0] + "  |  " + c[1] + "\n   -> " + f.verdict() + " (" + ms + " ms) " + s.closedForm().terms());
            for (Slip slip : f.slips()) {
                System.out.println("   slip " + slip.kind() + ": " + slip.explanation() + " => " + slip.corrected().terms() + " from " + slip.corrected().validFrom() + " " + slip.corrected().leadingValues());
            }
        }
    }
}
