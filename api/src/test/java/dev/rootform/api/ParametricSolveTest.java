package dev.rootform.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.document.ParametricReport;
import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.numeric.params.CaseValues;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.params.ParametricCase;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * {@link Rootform#solveWithParameters}: the case formula at --at must agree with the ordinary exact
 * solver on the problem with the values put in.
 */
class ParametricSolveTest {

    private static ParametricReport solved(ParametricRequest request) {
        ParametricResult r = Rootform.solveWithParameters(request);
        return assertInstanceOf(ParametricResult.Solved.class, r, r.toString()).report();
    }

    @Test
    void dampedOscillatorAtValuesAgreesWithTheOrdinarySolver() {
        ParametricReport r = solved(ParametricRequest.of("m y'' + c y' + k y = 0; y(0) = x0; y'(0) = v0", "m,c,k,x0,v0")
                .where("m > 0, c >= 0, k > 0").at("m=2, c=0.4, k=8, x0=0.01, v0=0")
                .with(Options.builder().points("1", "5/2").build()));
        assertTrue(r.verified());
        ParametricReport.Specialisation at = r.at().orElseThrow();
        assertEquals(1, at.caseNumber());
        ParametricCase c = r.answer().cases().get(0);
        for (PointValue v : at.report().values()) {
            double formula = CaseValues.functionValue(c, at.values(), v.at().doubleValue());
            assertEquals(v.value().doubleValue(), formula, 1e-12, "t = " + v.at());
        }
        assertTrue(r.checks().size() >= 2 && r.checks().stream().allMatch(ParametricReport.Agreement::agreed));
    }

    @Test
    void criticalDampingPicksTheDoubleRootCase() {
        // c = 2√(km) with m = 1, k = 4: c = 4 (critical damping, common practice)
        ParametricReport r = solved(ParametricRequest.of("m y'' + c y' + k y = 0; y(0) = 1; y'(0) = 0", "m,c,k")
                .where("m > 0, c >= 0, k > 0").at("m=1, c=4, k=4"));
        assertEquals(2, r.at().orElseThrow().caseNumber());
        assertTrue(r.verified());
    }

    @Test
    void resonantRecurrenceAgreesExactly() {
        ParametricReport r = solved(ParametricRequest.of("x[n+1] = a x[n] + 1; x[0] = 0", "a").at("a=1")
                .with(Options.builder().points("0", "5", "9").build()));
        ParametricReport.Specialisation at = r.at().orElseThrow();
        assertEquals(2, at.caseNumber());
        for (PointValue v : at.report().values()) {
            assertEquals(v.exact().orElseThrow(), CaseValues.sequenceValue(r.answer().cases().get(1), at.values(),
                    v.at().toBigInteger().intValueExact()));
            assertEquals(v.at(), v.exact().orElseThrow());
        }
    }

    @Test
    void badInputIsRefusedAsAValue() {
        ParametricResult r = Rootform.solveWithParameters(ParametricRequest.of("m y'' + q y = 0", "m, k"));
        Result.Refused refused = assertInstanceOf(Result.Refused.class, assertInstanceOf(ParametricResult.NotSolved.class, r).result());
        assertTrue(refused.message().contains("undeclared parameter 'q'"), refused.message());
    }

    @Test
    void valuesOutsideTheAssumptionsAreRefused() {
        ParametricResult r = Rootform.solveWithParameters(ParametricRequest.of("m y'' + k y = 0", "m, k").where("m > 0").at("m=-1, k=1"));
        assertInstanceOf(ParametricResult.NotSolved.class, r);
    }
}
