package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.api.Options;
import dev.rootform.api.RecoverRequest;
import dev.rootform.api.Recovery;
import dev.rootform.api.Result;
import dev.rootform.api.Rootform;
import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.parse.ProblemParser;
import java.util.Arrays;
import java.util.List;
import java.util.stream.IntStream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

/**
 * {@code recover} against published recurrences: the integer-sequence table that {@code solve} is
 * tested on (OEIS entry per row) and a table of recovery cases (fractions, decimals, n·r^n,
 * polynomial plus exponential, exceptional leading terms, start indices). Each table is first
 * checked against exact rational iteration of its own recurrence, so terms written from memory
 * cannot pass by agreeing with rootform alone; then the recovered recurrence must be the published
 * one or a divisor of it that still generates the terms, and the solve answer for the recovered
 * text must be verified and give back every term exactly at its index.
 */
class RecoverReferenceTest {
    @ParameterizedTest(name = "{0} ({1})")
    @CsvFileSource(resources = "/reference/integer-sequences.csv", delimiter = '|')
    void publishedRecurrencesAreRecovered(String name, String entry, String input, String terms) {
        Problem published = ProblemParser.parse(input, List.of(), null);
        List<Rational> values = checkedTerms(published, terms);
        Recovery.Recovered rec = recover(values, 0);
        RationalPolynomial chi = RationalPolynomial.of(published.equation().coefficients()).monic();
        assertTrue(chi.mod(rec.recurrence().characteristic()).isZero(), name + ": recovered " + rec.equation());
        assertSolvedBack(rec, values, name);
    }

    @ParameterizedTest(name = "{0} ({1})")
    @CsvFileSource(resources = "/reference/recover-sequences.csv", delimiter = '|')
    void recoveryCasesGiveTheirRecurrence(String name, String source, int start, String terms, String equation) {
        List<Rational> values = checkedTerms(ProblemParser.parse(equation, List.of(), null), terms);
        Recovery.Recovered rec = recover(values, start);
        assertEquals(equation, rec.equation(), name);
        assertSolvedBack(rec, values, name);
    }

    /** The terms of a table row, after checking them against exact iteration of the row's recurrence. */
    private static List<Rational> checkedTerms(Problem problem, String terms) {
        List<Rational> values = Arrays.stream(terms.trim().split("\\s+")).map(Rational::parse).toList();
        List<Rational> start = problem.conditions().stream().map(Condition::value).toList();
        assertEquals(values, ExactIteration.values(problem.equation().coefficients(), start, values.size()),
                "table against exact iteration");
        return values;
    }

    private static Recovery.Recovered recover(List<Rational> values, int start) {
        List<String> terms = values.stream().map(Rational::toString).toList();
        List<String> points = IntStream.range(start, start + values.size()).mapToObj(Integer::toString).toList();
        Recovery r = Rootform.recover(RecoverRequest.of(terms).startingAt(start).with(Options.builder().points(points).build()));
        return assertInstanceOf(Recovery.Recovered.class, r, () -> r.toString());
    }

    /** The solve answer is verified and its exact values at the terms' indices are the terms. */
    private static void assertSolvedBack(Recovery.Recovered rec, List<Rational> values, String name) {
        Result.Solved solved = assertInstanceOf(Result.Solved.class, rec.result(), name);
        List<PointValue> at = solved.report().values();
        assertEquals(values.size(), at.size(), name);
        for (int i = 0; i < values.size(); i++) {
            assertEquals(values.get(i), at.get(i).exact().orElseThrow(), name + " at " + at.get(i).at());
        }
    }
}
