package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.Report;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.ExactRoot;
import dev.rootform.symbolic.closedform.Surd;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The damped oscillator y'' + 2ζω y' + ω² y = 0 (common practice in vibration and control texts):
 * ζ = 1 is critical damping, a double root −ω; ζ &gt; 1 gives two distinct real roots
 * −ω(ζ ± √(ζ² − 1)); ζ &lt; 1 a conjugate pair with real part −ζω. The roots the tool reports must
 * fall in the stated regime, with the stated real parts.
 */
class DampingRegimeTest {
    @ParameterizedTest(name = "zeta = {0}, omega = {1}")
    @CsvSource(delimiter = '|', value = {"1|3", "1|1/2", "1|7/4", "5/3|3", "5/4|4", "1/3|3", "3/5|5"})
    void rootsFollowTheDampingRatio(String zetaText, String omegaText) {
        Rational zeta = Rational.parse(zetaText);
        Rational omega = Rational.parse(omegaText);
        String input = "y'' + (" + zeta.multiply(omega).multiply(2) + ") y' + (" + omega.multiply(omega) + ") y = 0; y(0) = 1; y'(0) = 0";
        Report report = Answers.report(input, 20, List.of());
        assertTrue(report.verified(), input);
        List<ExactRoot> roots = report.solution().roots();
        int comparison = zeta.compareTo(Rational.ONE);
        if (comparison == 0) {
            assertEquals(List.of(new ExactRoot.Explicit(Surd.of(omega.negate()), Surd.of(Rational.ZERO), 2)), roots, input);
        } else if (comparison > 0) {
            assertEquals(2, roots.size(), input);
            roots.forEach(r -> assertEquals(Surd.of(Rational.ZERO), ((ExactRoot.Explicit) r).im(), input));
            roots.forEach(r -> assertEquals(1, r.multiplicity(), input));
            Rational sum = roots.stream().map(r -> ((ExactRoot.Explicit) r).re().rational()).reduce(Rational.ZERO, Rational::add);
            assertEquals(zeta.multiply(omega).multiply(-2), sum, "sum of the roots is -2ζω: " + input);
        } else {
            ExactRoot.Explicit pair = (ExactRoot.Explicit) roots.get(0);
            assertEquals(Surd.of(zeta.multiply(omega).negate()), pair.re(), input);
            assertTrue(!pair.im().equals(Surd.of(Rational.ZERO)), input);
        }
    }
}
