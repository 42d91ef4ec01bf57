package dev.rootform.export.code;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.CType;
import dev.rootform.export.CVariant;
import dev.rootform.export.CodeFacts;
import dev.rootform.export.Corpus;
import dev.rootform.export.ExactTerm;
import dev.rootform.export.ExactTerm.Reach;
import dev.rootform.export.NumericForm;
import dev.rootform.export.Report;
import dev.rootform.symbolic.algebra.Rational;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every C variant (double, float; with and without libm) of every corpus equation: compiled with the
 * host gcc in strict C99 and run, its values compared with the exact ones within the accuracy its
 * header states, its exact terms compared with the exact sequence (also at the stated largest safe
 * n and just past it); and cross-compiled for a Cortex-M4F with Debian's gcc-arm-none-eabi, its
 * object checked for what it calls (no libm without libm, no double arithmetic in float, nothing
 * but math functions and the compiler's run-time helpers) and its size recorded in
 * target/embedded-sizes.md for the README.
 */
class EmbeddedCTest {
    private static final List<String> STRICT = List.of("-std=c99", "-Wall", "-Wextra", "-Werror", "-pedantic");
    private static final List<String> CORTEX_M4F = List.of("-mcpu=cortex-m4", "-mthumb", "-mfloat-abi=hard", "-mfpu=fpv4-sp-d16",
            "-Os", "-Wstack-usage=512");
    /**
     * Allowance, in units of the largest term, for a C math library that differs from the model's
     * correctly rounded functions in the last bits.
     */
    private static final Map<CType, Double> SLACK = Map.of(CType.DOUBLE, 1e-15, CType.FLOAT, 1e-6);
    private static final List<CVariant> VARIANTS = List.of(CVariant.DEFAULT, new CVariant(CType.FLOAT, true),
            new CVariant(CType.DOUBLE, false), new CVariant(CType.FLOAT, false));
    private static final Set<String> MATH = Set.of("pow", "exp", "cos", "powf", "expf", "cosf");

    @TempDir
    Path dir;

    /** One generated file: the equation, its variant, the function name. */
    private record Generated(String input, Report report, CVariant variant, String function) {
        Path source(Path dir) {
            return dir.resolve(function + ".c");
        }
    }

    /**
     * One line the check program prints, and what it must be: a value within {@code allowed} of
     * {@code value} (absolute), or an exact term with its return code.
     */
    private record Expected(String what, String call, BigDecimal value, double allowed, int code, BigInteger term) {
    }

    @Test
    void everyVariantCompilesStrictlyOnTheHostAndMatchesTheExactValues() throws Exception {
        List<Generated> all = generate();
        for (CVariant variant : VARIANTS) {
            List<Generated> cases = all.stream().filter(g -> g.variant().equals(variant)).toList();
            assertFalse(cases.isEmpty(), variant.toString());
            StringBuilder main = new StringBuilder("#include <stdio.h>\n");
            List<Expected> expected = new ArrayList<>();
            for (Generated g : cases) {
                main.append("#include \"").append(g.function()).append(".h\"\n");
                expected.addAll(values(g, Files.readString(g.source(dir))));
                expected.addAll(terms(g));
            }
            main.append("int main(void) {\n");
            expected.forEach(e -> main.append("    ").append(e.call()).append('\n'));
            main.append("    return 0;\n}\n");
            String exe = "check_" + variant.type().keyword() + (variant.libm() ? "" : "_nolibm");
            Files.writeString(dir.resolve(exe + ".c"), main);
            List<String> gcc = new ArrayList<>(List.of("gcc"));
            gcc.addAll(STRICT);
            gcc.addAll(List.of("-O2", "-o", exe, exe + ".c"));
            cases.forEach(g -> gcc.add(g.function() + ".c"));
            if (variant.libm()) {
                gcc.add("-lm");
            }
            assertEquals("", Processes.run(dir, gcc).strip());
            List<String> lines = Processes.run(dir, List.of(dir.resolve(exe).toString())).lines().toList();
            assertEquals(expected.size(), lines.size(), variant.toString());
            for (int i = 0; i < lines.size(); i++) {
                check(expected.get(i), lines.get(i));
            }
        }
    }

    @Test
    void everyVariantCrossCompilesForACortexM4fWithoutLibmOrDoublesWhereItPromises() throws Exception {
        List<Generated> all = generate();
        for (CType type : CType.values()) {
            List<String> gcc = new ArrayList<>(List.of("arm-none-eabi-gcc"));
            gcc.addAll(STRICT);
            gcc.addAll(CORTEX_M4F);
            if (type == CType.FLOAT) {
                gcc.add("-Wdouble-promotion");
            }
            gcc.add("-c");
            all.stream().filter(g -> g.variant().type() == type).forEach(g -> gcc.add(g.function() + ".c"));
            assertEquals("", Processes.run(dir, gcc).strip());
        }
        List<String> objects = all.stream().map(g -> g.function() + ".o").toList();
        Map<String, List<String[]>> symbols = perObject(Processes.run(dir, concat("arm-none-eabi-nm", "-S", objects)));
        Map<String, String[]> sections = new java.util.HashMap<>();
        Processes.run(dir, concat("arm-none-eabi-size", "-B", objects)).lines().skip(1)
                .map(l -> l.trim().split("\\s+")).forEach(f -> sections.put(f[5], f));
        StringBuilder table = new StringBuilder("| equation | variant | value function (bytes) | exact term (bytes) | object text+data |\n"
                + "|---|---|---|---|---|\n");
        for (Generated g : all) {
            List<String[]> of = symbols.get(g.function() + ".o");
            for (String[] f : of) {
                if (f.length == 2 && f[0].equals("U")) {
                    String where = g.input() + " (" + g.variant() + "): " + f[1];
                    assertTrue(f[1].startsWith("__aeabi_") || MATH.contains(f[1]), where);
                    assertTrue(g.variant().libm() || !MATH.contains(f[1]), where);
                    assertTrue(g.variant().type() == CType.DOUBLE || !f[1].startsWith("__aeabi_d") && !Set.of("pow", "exp", "cos")
                            .contains(f[1]), where);
                }
            }
            String[] size = sections.get(g.function() + ".o");
            table.append(row(g, of, Long.parseLong(size[0]) + Long.parseLong(size[1])));
        }
        Files.createDirectories(Path.of("target"));
        Files.writeString(Path.of("target", "embedded-sizes.md"), table);
    }

    private static List<String> concat(String tool, String option, List<String> files) {
        List<String> out = new ArrayList<>(List.of(tool, option));
        out.addAll(files);
        return out;
    }

    /** nm's lines of several objects, split by the "NAME.o:" line that opens each, as fields. */
    private static Map<String, List<String[]>> perObject(String nm) {
        Map<String, List<String[]>> out = new java.util.HashMap<>();
        List<String[]> current = null;
        for (String line : nm.lines().toList()) {
            if (line.endsWith(".o:")) {
                current = new ArrayList<>();
                out.put(line.substring(0, line.length() - 1), current);
            } else if (!line.isBlank()) {
                current.add(line.trim().split("\\s+"));
            }
        }
        return out;
    }

    /** Every corpus equation in every variant its code model can write, rendered with a header file. */
    private List<Generated> generate() throws Exception {
        List<String> inputs = new ArrayList<>(Corpus.SEQUENCES);
        inputs.addAll(Corpus.FUNCTIONS);
        List<Generated> out = new ArrayList<>();
        for (int i = 0; i < inputs.size(); i++) {
            Report r = Corpus.codeReport(inputs.get(i));
            for (int v = 0; v < VARIANTS.size(); v++) {
                CVariant variant = VARIANTS.get(v);
                Optional<String> refusal = CRenderer.refusal(r, variant);
                boolean writable = r.code().orElseThrow().facts(variant).isPresent()
                        || !variant.libm() && r.code().orElseThrow().exact().isPresent();
                assertEquals(!writable, refusal.isPresent(), inputs.get(i) + " " + variant);
                if (refusal.isPresent()) {
                    assertTrue(variant.libm() ? false : r.code().orElseThrow().form().needsLibm(), refusal.get());
                    continue;
                }
                Generated g = new Generated(inputs.get(i), r, variant, "e" + i + "_" + v);
                CSource c = CRenderer.render(r, g.function(), Optional.of(g.function() + ".h"), variant);
                assertFalse(c.source().contains("stdio") || c.source().contains("malloc"), g.input());
                Files.writeString(g.source(dir), c.source());
                Files.writeString(dir.resolve(g.function() + ".h"), c.header().orElseThrow());
                r.code().orElseThrow().facts(variant).ifPresent(f -> assertTrue(StatedBound.of(c.source()).get(0).relative()
                        >= f.forward().relativeBound(), g.input() + " " + variant));
                out.add(g);
            }
        }
        return out;
    }

    /**
     * The value function at its variant's sample points: within the bound its header states, plus the
     * slack of a C library in units of the largest term.
     */
    private static List<Expected> values(Generated g, String source) {
        Optional<CodeFacts> facts = g.report().code().orElseThrow().facts(g.variant());
        if (facts.isEmpty()) {
            return List.of();
        }
        NumericForm form = g.report().code().orElseThrow().form();
        CType type = g.variant().type();
        List<StatedBound> bounds = StatedBound.of(source);
        List<Expected> out = new ArrayList<>();
        for (int p = 0; p < facts.get().points().size(); p++) {
            Rational at = facts.get().points().get(p);
            String arg = form.differential() ? (type == CType.FLOAT ? Float.toString((float) at.doubleValue()) + "f"
                    : Double.toString(at.doubleValue())) : at.toBigInteger() + "L";
            BigDecimal exact = facts.get().exact().get(p);
            StatedBound bound = StatedBound.at(bounds, form.differential() && at.doubleValue() < form.origin());
            double allowed = Math.max(bound.relative() * Math.abs(exact.doubleValue()),
                    (bound.term() + SLACK.get(type)) * CodeMeasurement.largestTerm(form, at));
            out.add(new Expected(g.input() + " (" + g.variant() + ") at " + at,
                    "printf(\"%.17g\\n\", (double) " + g.function() + "(" + arg + "));", exact, allowed, 0, null));
        }
        return out;
    }

    /**
     * The exact term below the first index (2), at the first 40 indices, and by its reach: at the
     * largest safe n (exact) and past it (1), far out for a periodic sequence, inside a proved bound.
     */
    private static List<Expected> terms(Generated g) {
        Optional<ExactTerm> term = g.report().code().orElseThrow().exact();
        if (term.isEmpty()) {
            return List.of();
        }
        ExactTerm t = term.get();
        List<Long> ns = new ArrayList<>(List.of(t.first() - 1));
        for (long n = t.first(); n < t.first() + 40; n++) {
            ns.add(n);
        }
        long last;
        if (t.reach() instanceof Reach.Exact e) {
            last = e.last();
            ns.addAll(List.of(last, last + 1, last + 1000));
            BigInteger next = exact(g, last + 1);
            assertEquals(e.valueOverflows(), next.compareTo(t.minimum()) < 0 || next.compareTo(t.maximum()) > 0, g.input());
        } else if (t.reach() instanceof Reach.Periodic p) {
            last = Long.MAX_VALUE;
            ns.addAll(List.of(t.first() + 1_000_000_007L, t.first() + 123_456_789L));
        } else if (t.reach() instanceof Reach.Bounded b) {
            last = b.last();
            ns.add(t.first() + 100_000);
        } else {
            last = ((Reach.Checked) t.reach()).last();
            ns.add(t.first() + 10_000);
        }
        String c = t.unsigned() ? "unsigned long long" : "long long";
        List<Expected> out = new ArrayList<>();
        for (long n : ns) {
            int code = n < t.first() ? 2 : n > last ? 1 : 0;
            BigInteger value = code == 0 ? exact(g, n) : null;
            if (value != null) {
                assertTrue(value.compareTo(t.minimum()) >= 0 && value.compareTo(t.maximum()) <= 0, g.input() + " x[" + n + "] fits");
            }
            String type = t.unsigned() ? "uint64_t" : "int64_t";
            out.add(new Expected(g.input() + " (" + g.variant() + ") term(" + n + ")", "{ " + type + " v = 0; int rc = " + g.function()
                    + "_term(" + n + "L, &v); printf(\"%d %" + (t.unsigned() ? "llu" : "lld") + "\\n\", rc, (" + c + ") v); }",
                    null, 0, code, value));
        }
        return out;
    }

    private static BigInteger exact(Generated g, long n) {
        Rational v = g.report().solution().exact().orElseThrow().valueAt(n);
        assertTrue(v.isInteger(), g.input());
        return v.toBigInteger();
    }

    private static void check(Expected e, String line) {
        if (e.value() != null) {
            double got = Double.parseDouble(line);
            BigDecimal error = Double.isFinite(got) ? CodeMeasurement.measurable(new BigDecimal(got).subtract(e.value()).abs(), e.value())
                    : BigDecimal.valueOf(Double.MAX_VALUE);
            assertTrue(error.compareTo(new BigDecimal(e.allowed())) <= 0, e.what() + ": C value " + line + " vs " + e.value()
                    + ", error " + error + " > " + e.allowed());
            return;
        }
        String[] parts = line.split(" ");
        assertEquals(e.code(), Integer.parseInt(parts[0]), e.what());
        if (e.code() == 0) {
            assertEquals(e.term(), new BigInteger(parts[1]), e.what());
        }
    }

    /**
     * A table row: bytes of the value function's code and constants, of the exact term's (from nm's
     * symbol sizes; symbols at the same place, such as two all-zero arrays the compiler merged,
     * counted once), and the object's text+data.
     */
    private static String row(Generated g, List<String[]> symbols, long total) {
        long value = 0;
        long term = 0;
        Set<String> places = new java.util.HashSet<>();
        for (String[] f : symbols) {
            if (f.length == 4 && places.add(f[2].toLowerCase(java.util.Locale.ROOT) + f[0])) {
                long size = Long.parseLong(f[1], 16);
                boolean ofTerm = Set.of("term", "step", "start", "low", "high").stream().anyMatch(s -> f[3].startsWith(g.function() + "_" + s));
                if (ofTerm) {
                    term += size;
                } else {
                    value += size;
                }
            }
        }
        return "| `" + g.input() + "` | " + g.variant() + " | " + (value == 0 ? "-" : value) + " | " + (term == 0 ? "-" : term) + " | "
                + total + " |\n";
    }
}
