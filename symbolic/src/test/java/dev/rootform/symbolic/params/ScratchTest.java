package dev.rootform.symbolic.params;

import dev.rootform.symbolic.parse.ParametricParser;
import org.junit.jupiter.api.Test;

class ScratchTest {
    void show(String text, String params, String where) {
        long t0 = System.nanoTime();
        java.util.List<String> names = ParametricParser.names(params);
        ParametricProblem p = ParametricParser.parse(text, names, null);
        ParametricAnswer a = ParametricSolver.solve(p, Assumptions.parse(where, names));
        System.out.println("== " + text + " | " + where + "  (" + (System.nanoTime() - t0) / 1e6 + " ms)");
        System.out.println("stability " + a.stability());
        for (ParametricCase c : a.cases()) {
            System.out.println(" case when " + c.when() + " excl " + c.excluded() + " sub " + c.substitution() + " verified " + c.verified());
            System.out.println("   regimes " + c.regimes());
            for (ParamMode m : c.modes()) {
                System.out.println("   mode pair=" + m.pair() + " centre " + m.centre() + " W " + m.square() + " mult " + m.inEquation() + "/" + m.multiplicity());
            }
            for (ParamPiece pc : c.pieces()) {
                System.out.println("   piece " + pc);
            }
        }
        System.out.println(" notes " + a.notes());
    }

    @Test
    void scratch() {
        show("m y'' + c y' + k y = 0; y(0) = x0; y'(0) = v0", "m,c,k,x0,v0", "m > 0, c >= 0, k > 0");
        show("y'' + k y = F cos(w t); y(0) = 0; y'(0) = 0", "k,F,w", "k > 0, w > 0");
        show("m y'' + c y' + k y = F cos(w t); y(0) = 0; y'(0) = 0", "m,c,k,F,w", "m > 0, c > 0, k > 0, w > 0");
        show("x[n+1] = a x[n] + 1; x[0] = 0", "a", "");
        show("x[n+2] + a1 x[n+1] + a0 x[n] = 0", "a1,a0", "");
        show("y''' + a2 y'' + a1 y' + a0 y = 0", "a2,a1,a0", "");
        show("y'''' + a3 y''' + a2 y'' + a1 y' + a0 y = 0", "a3,a2,a1,a0", "");
    }
}
