package dev.rootform.export.code;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.Corpus;
import dev.rootform.export.CodeFacts;
import dev.rootform.export.NumericForm;
import dev.rootform.export.Report;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.solve.ExactSolution;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Method;
import java.math.BigInteger;
import java.net.URLClassLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.tools.JavaCompiler;
import javax.tools.ToolProvider;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Compiles the generated Java of every corpus equation in-process and checks it against exact values. */
class GeneratedJavaTest {
    @TempDir
    Path dir;

    @Test
    void statedAccuracyHoldsForEveryEquationAndTermsAreExact() throws Exception {
        List<String> all = new ArrayList<>(Corpus.SEQUENCES);
        all.addAll(Corpus.FUNCTIONS);
        List<Report> reports = new ArrayList<>();
        List<String> names = new ArrayList<>();
        Files.createDirectories(dir.resolve("gen"));
        for (int i = 0; i < all.size(); i++) {
            Report r = Corpus.codeReport(all.get(i));
            String name = "Case" + i;
            Files.writeString(dir.resolve("gen/" + name + ".java"), JavaRenderer.render(r, "gen", name));
            reports.add(r);
            names.add(name);
        }
        JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
        assertNotNull(javac, "no system Java compiler");
        List<String> args = new ArrayList<>(List.of("-d", dir.resolve("classes").toString(), "-cp", dir.resolve("gen").toString(), "-encoding", "UTF-8", "-Xlint:all", "-Werror"));
        names.forEach(n -> args.add(dir.resolve("gen/" + n + ".java").toString()));
        assertEquals(0, javac.run(null, null, null, args.toArray(String[]::new)), "javac failed");
        try (URLClassLoader loader = new URLClassLoader(new java.net.URL[] {dir.resolve("classes").toUri().toURL()})) {
            for (int i = 0; i < reports.size(); i++) {
                check(all.get(i), reports.get(i), loader.loadClass("gen." + names.get(i)));
            }
        }
    }

    private void check(String input, Report r, Class<?> generated) throws Exception {
        NumericForm form = r.code().orElseThrow().form();
        CodeFacts facts = r.code().orElseThrow().facts();
        String source = Files.readString(dir.resolve("gen/" + generated.getSimpleName() + ".java"));
        List<StatedBound> bounds = StatedBound.of(source);
        assertTrue(bounds.get(0).relative() < 1e-9, input + ": stated relative bound " + bounds.get(0).relative());
        assertTrue(bounds.get(0).relative() >= facts.forward().relativeBound() && bounds.get(0).term() >= facts.forward().termBound(),
                input + ": header rounds down");
        java.util.Optional<ExactSolution> exact = r.solution().exact();
        Method value = generated.getMethod("value", form.differential() ? double.class : long.class);
        for (int i = 0; i < facts.points().size(); i++) {
            Rational p = facts.points().get(i);
            double got = (double) value.invoke(null, form.differential() ? (Object) p.doubleValue() : (Object) p.toBigInteger().longValueExact());
            assertEquals(CodeMeasurement.evaluate(form, p), got, 0.0, input + " at " + p + ": the code and its model differ");
            double term = CodeMeasurement.largestTerm(form, p);
            StatedBound bound = StatedBound.at(bounds, form.differential() && p.doubleValue() < form.origin());
            assertTrue(bound.holds(got, facts.exact().get(i), term, 0), input + " at " + p + ": " + got + " vs " + facts.exact().get(i));
        }
        if (exact.flatMap(IntegerRecurrence::of).isPresent()) {
            checkTerms(input, exact.get(), generated);
        }
    }

    private static void checkTerms(String input, ExactSolution exact, Class<?> generated) throws Exception {
        Method term = generated.getMethod("term", long.class);
        Method termExact = generated.getMethod("termExact", long.class);
        long first = exact.origin().toBigInteger().longValueExact();
        for (long n : new long[] {first, first + 1, first + 2, first + 7, first + 40, first + 1000}) {
            BigInteger expected = exact.valueAt(n).toBigInteger();
            assertEquals(expected, term.invoke(null, n), input + " term(" + n + ")");
            if (expected.bitLength() < 63) {
                assertEquals(expected.longValueExact(), termExact.invoke(null, n), input + " termExact(" + n + ")");
            } else {
                InvocationTargetException thrown = assertThrows(InvocationTargetException.class, () -> termExact.invoke(null, n));
                assertTrue(thrown.getCause() instanceof ArithmeticException, input);
            }
        }
    }
}
