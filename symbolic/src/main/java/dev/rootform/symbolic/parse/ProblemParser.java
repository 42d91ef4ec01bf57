package dev.rootform.symbolic.parse;

import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.Limits;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.model.Problem;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads a problem written in ordinary notation: a linear constant-coefficient differential
 * equation ({@code y'' + 2y' + 5y = 0}, {@code d2y/dt2 + y = sin(3t)}, {@code (D+1)^2 y = e^(-t)})
 * or recurrence ({@code x[n+2] = x[n+1] + x[n]}, {@code (E-2)^2 x = 3^n}), optionally followed by
 * conditions separated by {@code ;} ({@code y(0)=1; y'(0)=0}, {@code x[0]=0}).
 *
 * <p>Sign convention: the equation is brought to the form left − right = 0. The coefficients of
 * the unknown keep the signs they have on the left side (they are not made monic) and everything
 * that does not involve the unknown is moved to the right as the forcing. So
 * {@code x[n] = 3x[n-1] - 2x[n-2]} has coefficients [2, -3, 1] with shift -2, and
 * {@code y'' = -y + t} has coefficients [1, 0, 1] with forcing t.
 *
 * @since 0.1
 */
public final class ProblemParser {
    private ProblemParser() {
    }

    /**
     * Parses an equation with its conditions.
     *
     * @param text the equation, optionally followed by {@code ;}-separated conditions
     * @param given further conditions, each read on its own (may itself contain {@code ;})
     * @param variable the independent variable of a differential equation, or null to take it from
     *     the text ({@code y(x)}, {@code dy/dx}) or default to t; recurrences take the index name
     *     from the brackets, default n
     * @return the equation in normal form and its conditions in the order written
     * @throws InputException naming the problem and its position in {@code text} or in the one
     *     {@code given} string it was found in
     */
    public static Problem parse(String text, List<String> given, String variable) {
        String source = text == null ? "" : text;
        requireShort(source);
        List<int[]> segments = segments(source);
        if (segments.isEmpty()) {
            throw new InputException("empty input", source, 0);
        }
        int[] first = segments.get(0);
        Parser.Equality sides = new Parser(source, first[0], first[1], variable).equality("equation");
        Shape shape = Shape.of(source, List.of(sides.left(), sides.right()), variable);
        Linearizer linearizer = new Linearizer(source, shape);
        Value difference = linearizer.evaluate(sides.left()).add(linearizer.evaluate(sides.right()).negate());
        LinearEquation equation = NormalForm.of(shape, difference, source, sides.left().start());

        ConditionReader reader = new ConditionReader(shape, equation.order());
        List<Condition> conditions = new ArrayList<>();
        for (int[] segment : segments.subList(1, segments.size())) {
            conditions.add(reader.read(source, segment[0], segment[1]));
        }
        for (String condition : given == null ? List.<String>of() : given) {
            requireShort(condition);
            for (int[] segment : segments(condition)) {
                conditions.add(reader.read(condition, segment[0], segment[1]));
            }
        }
        return new Problem(equation, conditions);
    }

    /**
     * Reads a right-hand side alone, in the forms a forced equation accepts: polynomials,
     * exponentials, cos and sin of the independent variable, their products and sums
     * ({@code 2sin(3t)}, {@code e^(-t)}, {@code (1/2)^n}, {@code n^2 + 1}).
     *
     * @param text the expression
     * @param domain {@link Domain#DIFFERENTIAL} for a function of t, {@link Domain#DIFFERENCE} for a
     *     sequence in n
     * @return the terms in a fixed order; empty for an expression that is 0
     * @throws InputException naming the problem and its position in {@code text}
     */
    public static List<ForcingTerm> forcing(String text, Domain domain) {
        String source = text == null ? "" : text;
        if (source.isBlank()) {
            throw new InputException("empty input", source, 0);
        }
        requireShort(source);
        String variable = domain == Domain.DIFFERENCE ? Names.DEFAULT_INDEX : Names.DEFAULT_TIME;
        Node node = new Parser(source, 0, source.length(), variable).expressionOnly();
        Value value = new Linearizer(source, new Shape(domain, "", variable)).evaluate(node);
        return value.forcing().toTerms();
    }

    /** @throws InputException for a text longer than {@link Limits#MAX_INPUT_LENGTH} characters */
    static void requireShort(String text) {
        if (text.length() > Limits.MAX_INPUT_LENGTH) {
            throw new InputException("input of " + text.length() + " characters: at most " + Limits.MAX_INPUT_LENGTH
                    + " are accepted", text.substring(0, 60), -1);
        }
    }

    /** The [begin, end) ranges between semicolons that contain more than white space. */
    static List<int[]> segments(String text) {
        List<int[]> segments = new ArrayList<>();
        int begin = 0;
        for (int i = 0; i <= text.length(); i++) {
            if (i == text.length() || text.charAt(i) == ';') {
                if (!text.substring(begin, i).isBlank()) {
                    segments.add(new int[] {begin, i});
                }
                begin = i + 1;
            }
        }
        return segments;
    }
}
