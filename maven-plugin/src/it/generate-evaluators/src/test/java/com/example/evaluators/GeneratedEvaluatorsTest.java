package com.example.evaluators;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigInteger;
import org.junit.jupiter.api.Test;

/** The evaluators generated at build time, against values published outside rootform. */
class GeneratedEvaluatorsTest {
    @Test
    void fibonacciNumbers() {
        // F(40) = 102334155, F(50) = 12586269025 (OEIS A000045, from memory)
        assertEquals(102334155L, Fibonacci.termExact(40));
        assertEquals(new BigInteger("12586269025"), Fibonacci.term(50));
        assertEquals(12586269025.0, Fibonacci.value(50), 12586269025.0 * 1e-13);
    }

    @Test
    void pellNumbers() {
        // P(20) = 15994428 (OEIS A000129, from memory)
        assertEquals(15994428L, Pell.termExact(20));
        assertEquals(15994428.0, Pell.value(20), 15994428.0 * 1e-13);
    }

    @Test
    void theSwingIsTheSine() {
        // sin 1 = 0.8414709848078965066525... (OEIS A049469, decimal expansion of sin(1), from memory)
        assertEquals(0.8414709848078965, Swing.value(1.0), 1e-14);
    }
}
