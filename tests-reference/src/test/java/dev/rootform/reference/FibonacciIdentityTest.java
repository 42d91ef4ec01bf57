package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Classical Fibonacci and Lucas identities checked on the exact values F(0..60), L(0..60) that the
 * closed forms give (R. L. Graham, D. E. Knuth, O. Patashnik, Concrete Mathematics, 2nd ed., §6.6
 * — section from memory; the identities themselves are common practice).
 */
class FibonacciIdentityTest {
    private static final int TERMS = 61;
    private static List<Rational> fib;
    private static List<Rational> lucas;

    /** One identity: true when it holds at n (its range keeps every index inside the table). */
    @FunctionalInterface
    interface Identity {
        boolean holdsAt(int n);
    }

    @BeforeAll
    static void solve() {
        fib = SequenceValues.of("x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1", TERMS);
        lucas = SequenceValues.of("x[n+2] = x[n+1] + x[n]; x[0] = 2; x[1] = 1", TERMS);
    }

    static Stream<Arguments> identities() {
        return Stream.of(
                Arguments.of("Cassini: F(n+1)F(n-1) - F(n)² = (-1)^n", (Identity) n -> n < 1 || n > 59
                        || f(n + 1).multiply(f(n - 1)).subtract(f(n).multiply(f(n))).equals(Rational.MINUS_ONE.pow(n))),
                Arguments.of("d'Ocagne: F(m)F(n+1) - F(m+1)F(n) = (-1)^n F(m-n), m = n + 7", (Identity) n -> n > 52
                        || f(n + 7).multiply(f(n + 1)).subtract(f(n + 8).multiply(f(n))).equals(Rational.MINUS_ONE.pow(n).multiply(f(7)))),
                Arguments.of("F(2n) = F(n) L(n)", (Identity) n -> n > 30 || f(2 * n).equals(f(n).multiply(lucas.get(n)))),
                Arguments.of("F(n)² + F(n+1)² = F(2n+1)", (Identity) n -> n > 29
                        || f(n).multiply(f(n)).add(f(n + 1).multiply(f(n + 1))).equals(f(2 * n + 1))),
                Arguments.of("F(0) + … + F(n) = F(n+2) - 1", (Identity) n -> n > 58
                        || fib.subList(0, n + 1).stream().reduce(Rational.ZERO, Rational::add).equals(f(n + 2).subtract(Rational.ONE))),
                Arguments.of("L(n) = F(n-1) + F(n+1)", (Identity) n -> n < 1 || n > 59 || lucas.get(n).equals(f(n - 1).add(f(n + 1)))));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("identities")
    void identityHoldsOnExactValues(String name, Identity identity) {
        for (int n = 0; n < TERMS; n++) {
            assertTrue(identity.holdsAt(n), name + " fails at n = " + n);
        }
        assertEquals(Rational.parse("1548008755920"), f(60), "F(60) (OEIS A000045, from memory)");
    }

    private static Rational f(int n) {
        return fib.get(n);
    }
}
