package dev.rootform.export.code;

import dev.rootform.export.ExactTerm;
import dev.rootform.export.ExactTerm.Reach;
import java.math.BigInteger;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

/**
 * The C text of an {@link ExactTerm}: {@code int NAME_term(long n, int64_t *out)} (or
 * {@code uint64_t}) that stores x[n] and returns 0, returns 1 when x[n] or a product or partial sum
 * on the way would leave the type (nothing wraps), and 2 below the first index; and its header
 * lines (method, cost, reach). Portable C99: the checks compare with bounds computed by rootform,
 * so they need no division and no compiler built-ins; the last k values are kept in a ring, so no
 * loop copies memory (a compiler would turn one into a call of memmove).
 *
 * @param term the exact term
 * @param function the name of the value function; the term is {@code function_term}
 */
record CExactTerm(ExactTerm term, String function) {
    private static final String BODY = """
            int NAME(long n, INT *out) {
                INT x[K];
                unsigned long m;
                unsigned long i;
                int j;
                int oldest = 0;
                if (n < FIRSTL) {
                    return 2;
                }
            LIMIT    m = (unsigned long) n - (unsigned long) (FIRSTL);
            PERIOD    if (m < KUL) {
                    *out = ARRAY_start[m];
                    return 0;
                }
                for (j = 0; j < K; j++) {
                    x[j] = ARRAY_start[j];
                }
                for (i = KUL; i <= m; i++) {
                    INT next = 0;
                    int at = oldest;
                    for (j = 0; j < K; j++) {
                        INT p;
                        if (PRODUCT_CHECK) {
                            return 1;
                        }
                        p = ARRAY_step[j] * x[at];
                        if (SUM_CHECK) {
                            return 1;
                        }
                        next += p;
                        at = at + 1 == K ? 0 : at + 1;
                    }
                    x[oldest] = next;
                    oldest = oldest + 1 == K ? 0 : oldest + 1;
                }
                *out = x[oldest == 0 ? K - 1 : oldest - 1];
                return 0;
            }
            """;

    /** The C integer type: {@code int64_t} or {@code uint64_t}. */
    String type() {
        return term.unsigned() ? "uint64_t" : "int64_t";
    }

    /** The function's name. */
    String name() {
        return function + "_term";
    }

    /** The declaration with its comment. */
    String declaration() {
        return "/* The exact term x[n]: 0 stored in *out, 1 on overflow (nothing wraps), 2 below the first index. */\n"
                + "int " + name() + "(long n, " + type() + " *out);\n";
    }

    /** The constant arrays and the function. */
    String definition() {
        StringBuilder c = new StringBuilder();
        c.append(array("step", term.step())).append(array("start", term.start()));
        if (!term.unsigned()) {
            c.append(array("low", term.low()));
        }
        c.append(array("high", term.high())).append('\n');
        String limit = term.reach() instanceof Reach.Exact e
                ? "    if (n > " + e.last() + "L) {\n        return 1;\n    }\n" : "";
        String period = term.reach() instanceof Reach.Periodic p
                ? "    if (m >= " + (p.from() + p.period()) + "UL) {\n        m = " + p.from() + "UL + (m - " + p.from() + "UL) % "
                        + p.period() + "UL;\n    }\n" : "";
        String product = term.unsigned() ? "x[at] > ARRAY_high[j]" : "x[at] < ARRAY_low[j] || x[at] > ARRAY_high[j]";
        String sum = term.unsigned() ? "next > UINT64_MAX - p" : "(p > 0 && next > INT64_MAX - p) || (p < 0 && next < INT64_MIN - p)";
        String body = BODY.replace("LIMIT", limit).replace("PERIOD", period).replace("PRODUCT_CHECK", product)
                .replace("SUM_CHECK", sum).replace("INT ", type() + " ").replace("FIRST", Long.toString(term.first()))
                .replace("K", Integer.toString(term.order()));
        Matcher names = Pattern.compile("NAME|ARRAY").matcher(body);
        StringBuilder out = new StringBuilder();
        while (names.find()) {
            names.appendReplacement(out, Matcher.quoteReplacement(names.group().equals("NAME") ? name() : function));
        }
        names.appendTail(out);
        return c.append(out).toString();
    }

    /** The header lines: what the function returns, why the values are integers, method and cost, and how far it fits. */
    List<String> headerLines() {
        int k = term.order();
        long first = term.first();
        String recurrence = "x[m+" + k + "] = " + java.util.stream.IntStream.range(0, k)
                .mapToObj(j -> term.step().get(j) + "*x[m" + (j == 0 ? "" : "+" + j) + "]").collect(Collectors.joining(" + "))
                .replace("+ -", "- ");
        String iterations = "(n - " + first + " - " + (k - 1) + ")*" + k;
        String reach;
        if (term.reach() instanceof Reach.Exact e) {
            reach = "Largest safe n: " + e.last() + ", found exactly by running these steps on exact integers: "
                    + (e.valueOverflows() ? "x[" + (e.last() + 1) + "] does not fit in " + type()
                            : "a product or partial sum forming x[" + (e.last() + 1) + "] does not fit in " + type())
                    + ", so " + name() + " returns 1 for every n > " + e.last() + " (at once, without iterating). Cost at most "
                    + Math.max(0, e.last() - first - k + 1) * k + " multiply-adds.";
        } else if (term.reach() instanceof Reach.Periodic p) {
            reach = "Never overflows: from n = " + (first + p.from()) + " on the values repeat with period " + p.period()
                    + " (checked exactly: (E^" + p.period() + " - 1) x = 0 there), and every value, product and partial sum before "
                    + "that fits in " + type() + "; " + name() + " reduces n by the period, so it costs at most "
                    + (p.from() + p.period() - k) * k + " multiply-adds.";
        } else if (term.reach() instanceof Reach.Bounded b) {
            reach = "Safe at least for n <= " + b.last() + ", bounded analytically: "
                    + (b.period() == 1 ? "the values are a polynomial in n" : "on each residue class of n mod " + b.period()
                            + " the values are a polynomial") + " of degree " + b.degree() + " (checked exactly), and the bound sum_i |Newton "
                    + "coefficient i|*C(q, i) keeps every value, product and partial sum within " + type()
                    + " up to there; past it " + name() + " may return 1. Cost " + iterations + " multiply-adds, linear in n.";
        } else if (term.reach() instanceof Reach.Checked c) {
            reach = "Safe at least for n <= " + c.last() + " (every step up to there run on exact integers); past it " + name()
                    + " returns 1 where a value, product or partial sum would leave " + type() + ". Cost " + iterations
                    + " multiply-adds, linear in n.";
        } else {
            throw new AssertionError(term.reach());
        }
        return List.of("Exact terms: int " + name() + "(long n, " + type() + " *out) stores x[n] in *out and returns 0; it returns 1 "
                        + "when x[n] or a product or partial sum on the way would leave " + type() + " (nothing wraps around) and 2 "
                        + "for n < " + first + ". The values are integers because the recurrence divided by its leading coefficient "
                        + "has integer coefficients and its first values are integers.",
                "Method: " + recurrence + " iterated from x[" + first + ".." + (first + k - 1) + "], each product and sum checked "
                        + "against bounds computed by rootform (no division, no built-ins): " + iterations
                        + " checked multiply-adds for n >= " + (first + k) + ".",
                reach);
    }

    private String array(String name, List<BigInteger> values) {
        return "static const " + type() + " " + function + "_" + name + "[" + values.size() + "] = {"
                + values.stream().map(this::literal).collect(Collectors.joining(", ")) + "};\n";
    }

    /** A C99 literal of the integer type, also for INT64_MIN. */
    private String literal(BigInteger v) {
        if (term.unsigned()) {
            return "UINT64_C(" + v + ")";
        }
        if (v.equals(term.minimum())) {
            return "INT64_MIN";
        }
        return v.signum() < 0 ? "-INT64_C(" + v.negate() + ")" : "INT64_C(" + v + ")";
    }
}
