package dev.rootform.api;

import dev.rootform.export.Report;
import dev.rootform.export.document.ParametricReport;
import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.numeric.params.CaseValues;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.params.ParametricAnswer;
import dev.rootform.symbolic.params.ParametricCase;
import dev.rootform.symbolic.params.Relation;
import dev.rootform.symbolic.parse.ParametricParser;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Random;

/**
 * Checks case formulas against the ordinary exact solver: the problem with rational parameter
 * values put in is solved as usual, and its values are compared with the case's formula at the same
 * values (sequences exactly at n = 0..7; functions at t = 1/4, 1, 3 to a relative 1e-9 of
 * max(1, |y|), the formula being evaluated in double precision).
 */
final class Specialiser {
    /** Random points tried, and points kept. */
    private static final int TRIES = 40;
    private static final int POINTS = 2;
    private static final double TOLERANCE = 1e-9;
    private static final List<String> SEQUENCE_POINTS = List.of("0", "1", "2", "3", "4", "5", "6", "7");
    private static final List<String> FUNCTION_POINTS = List.of("1/4", "1", "3");

    private Specialiser() {
    }

    /** The number (from 1) of the first case that holds at the values, 0 when none does. */
    static int caseAt(ParametricAnswer answer, Map<String, Rational> values) {
        for (int i = 0; i < answer.cases().size(); i++) {
            try {
                if (answer.cases().get(i).holdsAt(values)) {
                    return i + 1;
                }
            } catch (ArithmeticException e) {
                // a denominator of the case vanishes there: not this case
            }
        }
        return 0;
    }

    /** Comparisons at up to two seeded random rational points (none for a general solution). */
    static List<ParametricReport.Agreement> randomChecks(ParametricAnswer answer) {
        List<ParametricReport.Agreement> out = new ArrayList<>();
        if (answer.cases().isEmpty() || !answer.cases().get(0).freeConstants().isEmpty()) {
            return out;
        }
        Random random = new Random(20261202L);
        for (int t = 0; t < TRIES && out.size() < POINTS; t++) {
            Map<String, Rational> values = new LinkedHashMap<>();
            for (String name : answer.problem().parameters()) {
                Relation sign = answer.assumptions().of(name);
                int numerator = 1 + random.nextInt(9);
                boolean negative = sign == Relation.NEGATIVE || sign == Relation.NONPOSITIVE
                        || sign == null && random.nextBoolean();
                values.put(name, Rational.of(negative ? -numerator : numerator, 1 + random.nextInt(4)));
            }
            int number = caseAt(answer, values);
            if (number > 0) {
                agreement(answer, values, number, Options.defaults()).ifPresent(out::add);
            }
        }
        return out;
    }

    /** The comparison at the values, where case {@code number} holds; empty for a general solution. */
    static Optional<ParametricReport.Agreement> agreement(ParametricAnswer answer, Map<String, Rational> values, int number,
            Options options) {
        ParametricCase c = answer.cases().get(number - 1);
        if (!c.freeConstants().isEmpty()) {
            return Optional.empty();
        }
        boolean sequence = answer.problem().domain() == Domain.DIFFERENCE;
        List<String> points = sequence ? SEQUENCE_POINTS : FUNCTION_POINTS;
        String text = ParametricParser.substitute(answer.problem(), values);
        Options.Builder builder = Options.builder().digits(20).points(points.toArray(new String[0])).timeLimit(options.timeLimit());
        Options at = (sequence ? builder : builder.variable(answer.problem().variable())).build();
        Optional<Report> report = Rootform.solve(SolveRequest.of(text).with(at)).answer();
        if (report.isEmpty()) {
            return Optional.of(new ParametricReport.Agreement(values, number, points, "not compared: the specialised problem has no answer",
                    false));
        }
        double largest = 0;
        boolean exact = true;
        for (PointValue v : report.get().values()) {
            if (sequence) {
                Rational formula = CaseValues.sequenceValue(c, values, v.at().toBigInteger().intValueExact());
                exact &= v.exact().isPresent() && v.exact().get().equals(formula);
            } else {
                double formula = CaseValues.functionValue(c, values, v.at().doubleValue());
                double reference = v.value().doubleValue();
                largest = Math.max(largest, Math.abs(formula - reference) / Math.max(1, Math.abs(reference)));
            }
        }
        String difference = sequence ? (exact ? "0 (exact)" : "values differ")
                : new BigDecimal(largest).round(new MathContext(2)).toString();
        return Optional.of(new ParametricReport.Agreement(values, number, points, difference, sequence ? exact : largest <= TOLERANCE));
    }
}
