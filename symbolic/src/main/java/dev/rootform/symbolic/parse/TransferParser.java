package dev.rootform.symbolic.parse;

import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.transfer.LowestTerms;
import dev.rootform.symbolic.transfer.TransferFunction;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads a transfer function written as engineers write one: {@code H(s) = (s + 3)/(s^2 + 2s + 5)},
 * {@code H(z) = (1 + z^-1)/(1 - 1.5z^-1 + 0.56z^-2)}, factored or expanded, with named parts and
 * their compositions separated by {@code ;}: {@code G(s) = 10/(s(s + 2)); H(s) = G/(1 + G)}.
 * Sums, products, quotients and integer powers of parts are allowed (parallel, series and feedback
 * connections); coefficients are exact integers, decimals or fractions. The last part is the one
 * answered; a bare expression is named H.
 *
 * <p>The result is in lowest terms. A common factor that only the notation introduces is not
 * reported: a named part used twice cancels its own factors (the loop algebra of G/(1 + G)), and
 * in z the powers of z that z^-1 notation brings cancel freely. Every other common factor of the
 * final numerator and denominator is a cancelled pole–zero pair and is named
 * ({@link TransferFunction#cancelled()}).
 *
 * @since 0.3
 */
public final class TransferParser {
    private TransferParser() {
    }

    /**
     * @throws InputException naming the problem and its position: a syntax error, an unknown or
     *     twice-defined name, s and z mixed, a time delay e^(-s) or any other expression that is not
     *     a rational function, division by zero, or a zero transfer function
     */
    public static TransferFunction parse(String text) {
        String source = text == null ? "" : text;
        List<int[]> segments = ProblemParser.segments(source);
        if (segments.isEmpty()) {
            throw new InputException("empty input", source, 0);
        }
        String variable = TransferVariable.of(source, segments);
        Domain domain = variable.equals(TransferVariable.S) ? Domain.DIFFERENTIAL : Domain.DIFFERENCE;
        TransferEvaluator evaluator = new TransferEvaluator(source, variable);
        Map<String, Block> parts = new LinkedHashMap<>();
        String name = null;
        Block last = null;
        for (int[] segment : segments) {
            boolean definition = source.substring(segment[0], segment[1]).contains("=");
            Parser parser = new Parser(source, segment[0], segment[1], variable);
            Node left = null;
            Node right;
            if (definition) {
                Parser.Equality sides = parser.equality("definition");
                left = sides.left();
                right = sides.right();
            } else {
                right = parser.expressionOnly();
            }
            name = left == null ? "H" : partName(source, left, variable);
            if (parts.containsKey(name)) {
                throw new InputException(name + " is defined twice", source, left == null ? right.start() : left.start());
            }
            last = evaluator.evaluate(right, parts);
            parts.put(name, last);
        }
        if (last.isZero()) {
            int[] final_ = segments.get(segments.size() - 1);
            throw new InputException(name + "(" + variable + ") is zero: there is no system to analyse", source, final_[0]);
        }
        LowestTerms reduced = last.lowestTerms();
        return new TransferFunction(domain, name, variable, reduced.value(), reduced.cancelled());
    }

    /** The name on the left of {@code =}: {@code H} or {@code H(s)}. */
    private static String partName(String source, Node left, String variable) {
        String name;
        if (left instanceof Node.Name n) {
            name = n.name();
        } else if (left instanceof Node.Call c && c.argument() instanceof Node.Name arg) {
            if (!arg.name().equals(variable)) {
                throw new InputException(c.name() + "(" + arg.name() + "): the variable is " + variable, source, arg.start());
            }
            name = c.name();
        } else {
            throw new InputException("expected a name such as H(" + variable + ") before '='", source, left.start());
        }
        if (Names.isReserved(name, variable) || TransferVariable.isVariable(name)) {
            throw new InputException(name + " is a reserved name and cannot name a part", source, left.start());
        }
        return name;
    }
}
