package dev.rootform.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import dev.rootform.cli.MainTest.Run;
import java.math.BigInteger;
import org.junit.jupiter.api.Test;

/** {@code --all-digits}: sequence values printed exactly with every digit, in text and JSON. */
class AllDigitsCommandTest {
    private static final String FIBONACCI = "x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1";

    /** F(n) by integer iteration (the recurrence itself). */
    private static String fibonacci(int n) {
        BigInteger a = BigInteger.ZERO;
        BigInteger b = BigInteger.ONE;
        for (int i = 0; i < n; i++) {
            BigInteger next = a.add(b);
            a = b;
            b = next;
        }
        return a.toString();
    }

    @Test
    void textShowsEveryDigitOnlyWhenAsked() {
        String digits = fibonacci(5000);
        Run rounded = MainTest.run("solve", FIBONACCI, "--values-at", "5000");
        assertEquals(0, rounded.code(), rounded.err());
        assertTrue(rounded.out().contains("x[5000] ≈ " + digits.charAt(0) + "." + digits.substring(1, 25)), rounded.out());
        assertTrue(!rounded.out().contains(digits), "all digits without --all-digits");
        Run all = MainTest.run("solve", FIBONACCI, "--values-at", "5000", "--all-digits");
        assertEquals(0, all.code(), all.err());
        assertTrue(all.out().contains("x[5000] = " + digits + "\n"), all.out());
    }

    @Test
    void jsonCarriesEveryDigitOfAFraction() throws Exception {
        Run r = MainTest.run("solve", "x[n+1] = x[n]/2 + 1; x[0] = 0", "--values-at", "3000", "--all-digits", "--format", "json");
        assertEquals(0, r.code(), r.err());
        // the geometric sum 2 − 2^(1−n) = (2^n − 1)/2^(n−1) (common practice)
        String expected = BigInteger.ONE.shiftLeft(3000).subtract(BigInteger.ONE) + "/" + BigInteger.ONE.shiftLeft(2999);
        assertEquals(expected, new ObjectMapper().readTree(r.out()).get("values").get(0).get("exact").asText());
    }

    @Test
    void functionValuesAreRefusedWithOneLine() {
        Run r = MainTest.run("solve", "y' = y; y(0) = 1", "--values-at", "1", "--all-digits");
        assertEquals(2, r.code());
        assertEquals("", r.out());
        assertTrue(r.err().contains("values with all their digits are for sequences"), r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
    }
}
