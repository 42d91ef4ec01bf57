package dev.rootform.export.code;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The error bound a generated file states in its header, read back from the text:
 * |value − exact| ≤ max(relative·|exact|, term·L), L the largest term the code adds up.
 */
record StatedBound(double relative, double term) {
    private static final Pattern BOUND = Pattern.compile("(For \\S+ >= t0|For every n|For \\S+ < t0) \\(.*?Stated bound: "
            + "\\|value - exact\\| <= max\\((\\S+)\\*\\|exact\\|, (\\S+)\\*L\\)");

    /** The bounds in the header of {@code source} (comment lines joined): forward (t &ge; t0, or a sequence), then backward. */
    static List<StatedBound> of(String source) {
        Matcher m = BOUND.matcher(source.replace("\n *   ", " ").replace("\n *  ", " "));
        List<StatedBound> out = new ArrayList<>();
        while (m.find()) {
            out.add(new StatedBound(Double.parseDouble(m.group(2)), Double.parseDouble(m.group(3))));
        }
        assertTrue(!out.isEmpty(), source);
        return out;
    }

    /** The bound that applies at an input: forward unless it lies before t0. */
    static StatedBound at(List<StatedBound> bounds, boolean backward) {
        return backward ? bounds.get(1) : bounds.get(0);
    }

    /** Whether {@code value} is within the bound of {@code exact}, allowing {@code slack} relative to L on top. */
    boolean holds(double value, BigDecimal exact, double largestTerm, double slack) {
        if (!Double.isFinite(value)) {
            return false;
        }
        BigDecimal error = CodeMeasurement.measurable(new BigDecimal(value).subtract(exact).abs(), exact);
        BigDecimal allowed = exact.abs().multiply(new BigDecimal(relative))
                .max(new BigDecimal((term + slack) * largestTerm));
        return error.compareTo(allowed) <= 0;
    }
}
