package dev.rootform.export.notation;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.rootform.symbolic.closedform.ExactRoot;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class RootTextTest {

    /** e^(2πik/order) = cos(2πk/order) + i·sin(2πk/order) (Euler's formula, common practice), angle in lowest terms. */
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "8 | 1 | cos(π/4) + i·sin(π/4)",
        "8 | 3 | cos(3π/4) + i·sin(3π/4)",
        "8 | 7 | cos(7π/4) + i·sin(7π/4)",
        "5 | 2 | cos(4π/5) + i·sin(4π/5)",
        "5 | 1 | cos(2π/5) + i·sin(2π/5)",
        "12 | 5 | cos(5π/6) + i·sin(5π/6)",
    })
    void rootOfUnityAngleInLowestTerms(int order, int k, String expected) {
        assertEquals(expected, RootText.exact(new ExactRoot.OfUnity(order, k, 1)));
    }
}
