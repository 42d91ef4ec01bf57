package dev.rootform.export.code;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.Corpus;
import dev.rootform.export.CodeFacts;
import dev.rootform.export.NumericForm;
import dev.rootform.export.Report;
import dev.rootform.symbolic.algebra.Rational;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Compiles the generated C of every corpus equation with gcc (strict C99) and checks its values. */
class GeneratedCTest {
    /** Allowance, in units of the largest term, for a C math library that differs from StrictMath in the last bits. */
    private static final double LIBM_SLACK = 1e-15;

    @TempDir
    Path dir;

    @Test
    void compilesStrictlyAndMatchesTheStatedAccuracy() throws Exception {
        List<String> all = new ArrayList<>(Corpus.SEQUENCES);
        all.addAll(Corpus.FUNCTIONS);
        List<String> sources = new ArrayList<>(List.of("main.c"));
        StringBuilder main = new StringBuilder("#include <stdio.h>\n");
        StringBuilder calls = new StringBuilder();
        List<Expected> expected = new ArrayList<>();
        for (int i = 0; i < all.size(); i++) {
            Report r = Corpus.codeReport(all.get(i));
            NumericForm form = r.code().orElseThrow().form();
            CodeFacts facts = r.code().orElseThrow().facts();
            String f = "case" + i;
            boolean separate = i % 2 == 0;
            CSource c = CRenderer.render(r, f, separate ? Optional.of(f + ".h") : Optional.empty());
            Files.writeString(dir.resolve(f + ".c"), c.source());
            c.header().ifPresent(h -> write(dir.resolve(f + ".h"), h));
            sources.add(f + ".c");
            main.append(separate ? "#include \"" + f + ".h\"\n" : "double " + f + (form.differential() ? "(double);\n" : "(long);\n"));
            List<StatedBound> bounds = StatedBound.of(c.source());
            for (int p = 0; p < facts.points().size(); p++) {
                Rational at = facts.points().get(p);
                String arg = form.differential() ? Double.toString(at.doubleValue()) : at.toBigInteger() + "L";
                calls.append("    printf(\"%.17g\\n\", ").append(f).append('(').append(arg).append("));\n");
                StatedBound bound = StatedBound.at(bounds, form.differential() && at.doubleValue() < form.origin());
                expected.add(new Expected(all.get(i), at, facts.exact().get(p), bound, CodeMeasurement.largestTerm(form, at)));
            }
        }
        main.append("int main(void) {\n").append(calls).append("    return 0;\n}\n");
        Files.writeString(dir.resolve("main.c"), main);
        List<String> gcc = new ArrayList<>(List.of("gcc", "-std=c99", "-Wall", "-Wextra", "-Werror", "-pedantic", "-O2", "-o", "check"));
        gcc.addAll(sources);
        gcc.add("-lm");
        assertEquals("", run(gcc).strip());
        List<String> lines = run(List.of(dir.resolve("check").toString())).lines().toList();
        assertEquals(expected.size(), lines.size());
        for (int i = 0; i < lines.size(); i++) {
            Expected e = expected.get(i);
            double got = Double.parseDouble(lines.get(i));
            assertTrue(e.bound().holds(got, e.exact(), e.largestTerm(), LIBM_SLACK), e.input() + " at " + e.at() + ": C value " + got
                    + " vs " + e.exact());
        }
    }

    /** One value the C program prints, with what it must agree with. */
    private record Expected(String input, Rational at, java.math.BigDecimal exact, StatedBound bound, double largestTerm) {
    }

    private static void write(Path p, String text) {
        try {
            Files.writeString(p, text);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    private String run(List<String> command) throws Exception {
        return Processes.run(dir, command);
    }
}
