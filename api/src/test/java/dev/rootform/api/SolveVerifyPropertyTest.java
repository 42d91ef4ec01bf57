package dev.rootform.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import dev.rootform.symbolic.algebra.Rational;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.IntStream;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Size;

/**
 * Property (jqwik): a random integer recurrence x[n+k] = c_{k-1} x[n+k-1] + … + c_0 x[n] with
 * integer initial values, solved through the library, is answered as solved and verified, and
 * its values at n = 12 and 25 equal exact integer iteration of the recurrence (an independent
 * reference: no closed form involved).
 */
class SolveVerifyPropertyTest {
    @Property(tries = 40)
    void solvedRecurrencesAgreeWithIteration(@ForAll @Size(min = 1, max = 3) List<@IntRange(min = -4, max = 4) Integer> c,
            @ForAll @Size(min = 3, max = 3) List<@IntRange(min = -5, max = 5) Integer> start) {
        int k = c.size();
        if (c.get(0) == 0) {
            return; // order below k: covered by the shorter lists
        }
        StringBuilder eq = new StringBuilder("x[n+" + k + "] = 0");
        for (int j = 0; j < k; j++) {
            eq.append(" + ").append("(").append(c.get(j)).append(")x[n+").append(j).append("]");
        }
        String conditions = IntStream.range(0, k).mapToObj(j -> "x[" + j + "] = " + start.get(j)).collect(Collectors.joining("; "));
        Result r = Rootform.solve(SolveRequest.of(eq + "; " + conditions).with(Options.builder().points("12", "25").build()));
        Result.Solved solved = assertInstanceOf(Result.Solved.class, r, eq + "; " + conditions);
        List<BigInteger> x = new ArrayList<>();
        for (int j = 0; j < k; j++) {
            x.add(BigInteger.valueOf(start.get(j)));
        }
        for (int n = 0; x.size() <= 25; n++) {
            BigInteger next = BigInteger.ZERO;
            for (int j = 0; j < k; j++) {
                next = next.add(BigInteger.valueOf(c.get(j)).multiply(x.get(n + j)));
            }
            x.add(next);
        }
        List<Rational> values = solved.report().analysis().values().stream()
                .map(v -> v.exact().orElseThrow()).toList();
        assertEquals(List.of(Rational.of(x.get(12)), Rational.of(x.get(25))), values, eq + "; " + conditions);
    }
}
