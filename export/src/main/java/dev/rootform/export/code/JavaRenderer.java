package dev.rootform.export.code;

import dev.rootform.export.CodeFacts;
import dev.rootform.export.NumericForm;
import dev.rootform.export.Report;
import dev.rootform.symbolic.solve.Solution;
import java.math.BigInteger;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * A self-contained Java class that evaluates the closed form of a fitted solution in double
 * precision ({@code value(double t)} or {@code value(long n)}), and for integer-valued recurrences
 * also exactly ({@code term(long n)}, {@code termExact(long n)}) by Fiduccia's method.
 *
 * @since 0.2
 */
public final class JavaRenderer {
    private static final String EXACT_METHODS = """

                /**
                 * The exact term x[n] for n >= FIRST, by Fiduccia's method (C. M. Fiduccia, "An efficient formula for
                 * linear recurrences", SIAM J. Comput. 14 (1985) 106-112): x[FIRST + m] = sum_i r_i x[FIRST + i] where
                 * sum_i r_i L^i = L^m mod chi(L); L^m is formed by binary powering, O(k^2 log m) multiplications.
                 *
                 * @throws IllegalArgumentException if n < FIRST
                 */
                public static java.math.BigInteger term(long n) {
                    if (n < FIRST) {
                        throw new IllegalArgumentException("index " + n + " is below the first index " + FIRST);
                    }
                    long m = Math.subtractExact(n, FIRST);
                    java.math.BigInteger[] r = new java.math.BigInteger[STEP.length];
                    java.util.Arrays.fill(r, java.math.BigInteger.ZERO);
                    r[0] = java.math.BigInteger.ONE;
                    for (int bit = 63 - Long.numberOfLeadingZeros(m); bit >= 0; bit--) {
                        r = squareMod(r);
                        if ((m >>> bit & 1L) != 0) {
                            r = timesL(r);
                        }
                    }
                    java.math.BigInteger sum = java.math.BigInteger.ZERO;
                    for (int i = 0; i < r.length; i++) {
                        sum = sum.add(r[i].multiply(START[i]));
                    }
                    return sum;
                }

                /** x[n] exactly as a long. @throws ArithmeticException if it does not fit in a long */
                public static long termExact(long n) {
                    return term(n).longValueExact();
                }

                /**
                 * a(L)^2 mod chi(L), where L^k = sum_j STEP[j] L^j: k squarings and k(k-1)/2 products (each
                 * cross term once, doubled by a shift); for k = 2 as many big multiplications as fast doubling.
                 */
                private static java.math.BigInteger[] squareMod(java.math.BigInteger[] a) {
                    int k = STEP.length;
                    java.math.BigInteger[] p = new java.math.BigInteger[2 * k - 1];
                    java.util.Arrays.fill(p, java.math.BigInteger.ZERO);
                    for (int i = 0; i < k; i++) {
                        p[2 * i] = p[2 * i].add(a[i].multiply(a[i]));
                        for (int j = i + 1; j < k; j++) {
                            p[i + j] = p[i + j].add(a[i].multiply(a[j]).shiftLeft(1));
                        }
                    }
                    for (int d = 2 * k - 2; d >= k; d--) {
                        for (int j = 0; j < k; j++) {
                            if (STEP[j].signum() != 0) {
                                p[d - k + j] = p[d - k + j].add(p[d].multiply(STEP[j]));
                            }
                        }
                    }
                    return java.util.Arrays.copyOf(p, k);
                }

                /** L*a(L) mod chi(L). */
                private static java.math.BigInteger[] timesL(java.math.BigInteger[] a) {
                    int k = STEP.length;
                    java.math.BigInteger top = a[k - 1];
                    java.math.BigInteger[] b = new java.math.BigInteger[k];
                    for (int j = 0; j < k; j++) {
                        b[j] = top.multiply(STEP[j]).add(j == 0 ? java.math.BigInteger.ZERO : a[j - 1]);
                    }
                    return b;
                }
            """;

    private JavaRenderer() {
    }

    /**
     * @param packageName the package, or null/empty for none (validated by {@link Identifiers#javaPackageRefusal})
     * @param className the class name (validated by {@link Identifiers#javaClassRefusal})
     * @throws IllegalArgumentException for a bad name, or a report {@link CodeRequests#refusal} refuses
     *     (callers check first)
     */
    public static String render(Report r, String packageName, String className) {
        boolean hasPackage = packageName != null && !packageName.isEmpty();
        CodeRequests.require(Identifiers.javaClassRefusal(className)
                .or(() -> hasPackage ? Identifiers.javaPackageRefusal(packageName) : Optional.empty())
                .or(() -> CodeRequests.refusal(r)));
        Solution s = r.solution();
        NumericForm form = r.code().orElseThrow().form();
        CodeFacts facts = r.code().orElseThrow().facts();
        Optional<IntegerRecurrence> exact = s.exact().flatMap(IntegerRecurrence::of);
        List<String> header = CodeHeader.lines(r, form, facts, exact.map(e -> List.of("Exact terms: term(n) and termExact(n) by "
                + "Fiduccia's method; the values are integers because the recurrence divided by its leading coefficient has integer "
                + "coefficients and its first values are integers.")).orElse(List.of()));
        StringBuilder out = new StringBuilder("/*\n");
        header.forEach(l -> out.append(" * ").append(l).append('\n'));
        out.append(" */\n");
        if (hasPackage) {
            out.append("package ").append(packageName).append(";\n");
        }
        out.append("\n/** The closed form evaluated in double precision; see the comment above for range and accuracy. */\n")
                .append("public final class ").append(className).append(" {\n");
        for (WaveLoop.Array a : WaveLoop.arrays(form, WaveLoop.Dialect.JAVA)) {
            out.append("    private static final ").append(a.kind().name().toLowerCase(java.util.Locale.ROOT).replace("real", "double"))
                    .append("[] ").append(a.name()).append(" = {").append(String.join(", ", a.values())).append("};\n");
        }
        if (!form.series().isEmpty()) {
            out.append("    private static final double SERIES_RADIUS = ").append(WaveLoop.seriesRadius(form, WaveLoop.Dialect.JAVA))
                    .append(";\n");
        }
        if (form.differential()) {
            out.append("    private static final double ORIGIN = ").append(form.origin()).append(";\n");
        } else {
            out.append("    private static final long FIRST = ").append(form.first()).append("L;\n")
                    .append("    private static final long VALID_FROM = ").append(form.validFrom()).append("L;\n")
                    .append("    private static final double[] LEADING = {")
                    .append(form.leading().stream().map(String::valueOf).collect(Collectors.joining(", "))).append("};\n");
        }
        exact.ifPresent(e -> out.append("    private static final java.math.BigInteger[] STEP = ").append(bigArray(e.step()))
                .append(";\n    private static final java.math.BigInteger[] START = ").append(bigArray(e.start())).append(";\n"));
        out.append("\n    private ").append(className).append("() {\n    }\n\n");
        if (form.differential()) {
            out.append("    /** y(t) in double precision. */\n    public static double value(double t) {\n")
                    .append("        double v = t - ORIGIN;\n");
        } else {
            out.append("    /** x[n] in double precision. @throws IllegalArgumentException if n < FIRST */\n")
                    .append("    public static double value(long n) {\n")
                    .append("        if (n < FIRST) {\n            throw new IllegalArgumentException(\"index \" + n + \" is below the first index \" + FIRST);\n        }\n")
                    .append("        if (n < VALID_FROM) {\n            return LEADING[(int) (n - FIRST)];\n        }\n")
                    .append("        double v = n;\n");
        }
        out.append(WaveLoop.body(form, WaveLoop.Dialect.JAVA, name -> name, "        ")).append("    }\n");
        exact.ifPresent(e -> out.append(EXACT_METHODS));
        return out.append("}\n").toString();
    }

    private static String bigArray(List<BigInteger> values) {
        return values.stream().map(v -> "new java.math.BigInteger(\"" + v + "\")")
                .collect(Collectors.joining(", ", "{", "}"));
    }
}
