package dev.rootform.cli;

import static dev.rootform.cli.MainTest.run;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The embedded C options --c-type and --c-no-libm end to end. */
class EmbeddedCOptionsTest {
    private static final String FIBONACCI = "x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1";

    @Test
    void floatCodeUsesSinglePrecisionAndStatesItsOwnAccuracy() {
        MainTest.Run r = run("solve", FIBONACCI, "--format", "c", "--function", "fib", "--c-type", "float");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("float fib(long n);") && r.out().contains("powf(") && r.out().contains("Valid input range of this code in float"), r.out());
        assertTrue(r.out().contains("int fib_term(long n, uint64_t *out);"), r.out());
        assertFalse(r.out().contains("double"), r.out());
    }

    @Test
    void codeWithoutLibmCallsNoMathFunction() {
        MainTest.Run r = run("solve", FIBONACCI, "--format", "c", "--function", "fib", "--c-no-libm");
        assertEquals(0, r.code(), r.err());
        assertFalse(r.out().contains("math.h") || java.util.regex.Pattern.compile("(?<![A-Za-z0-9_])(pow|exp|cos)f?\\(").matcher(r.out()).find(),
                r.out());
        assertTrue(r.out().contains("fib_ipow(") && r.out().contains("fib_term("), r.out());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "y'' + 2y' + 5y = 0; y(0) = 1; y'(0) = 0 | c | --c-no-libm | needs exp",
        "x[n+1] = x[n]/2 + cos(pi n/3) + 2; x[0] = 1 | c | --c-no-libm | needs cos",
        FIBONACCI + " | java | --c-no-libm | is for --format c",
        FIBONACCI + " | c | --c-type=half | is not one of double, float",
        FIBONACCI + " | text | --c-type=float | is for --format c"})
    void refusesWhatTheVariantCannotDoInOneLine(String problem, String format, String option, String message) {
        MainTest.Run r = run("solve", problem, "--format", format, option);
        assertEquals(2, r.code(), r.err());
        assertEquals("", r.out());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertTrue(r.err().contains(message), r.err());
    }
}
