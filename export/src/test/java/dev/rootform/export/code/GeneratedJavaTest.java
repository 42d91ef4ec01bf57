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
import java.math.BigDecimal;
import java.math.BigInteger;
import java.net.URLClassLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.tools.JavaCompiler;
import javax.tools.ToolProvider;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Compiles the generated Java of every corpus equation in-process and checks it against exact values. */
class GeneratedJavaTest {
    private static final Pattern STATED = Pattern.compile("(max relative error (\\S+)|exact at every sampled point to the "
            + "resolution of a double \\(relative error at most 2\\^-53\\)) against");

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
        Matcher m = STATED.matcher(source.replace("\n * ", " ").replaceAll("\\s+", " "));
        assertTrue(m.find(), source);
        double stated = m.group(2) == null ? CodeHeader.DOUBLE_RESOLUTION : Double.parseDouble(m.group(2));
        assertTrue(stated < 1e-9, input + ": stated error " + stated);
        java.util.Optional<ExactSolution> exact = r.solution().exact();
        java.util.function.LongFunction<BigDecimal> sequence = n -> r.solution().radical()
                .map(q -> q.valueAt(n).toBigDecimal(new java.math.MathContext(40)))
                .orElseGet(() -> exact.orElseThrow().valueAt(n).toBigDecimal(new java.math.MathContext(40)));
        Method value = generated.getMethod("value", form.differential() ? double.class : long.class);
        for (int i = 0; i < facts.points().size(); i++) {
            Rational p = facts.points().get(i);
            double got = (double) value.invoke(null, form.differential() ? (Object) p.doubleValue() : (Object) p.toBigInteger().longValueExact());
            BigDecimal reference = form.differential() ? facts.exact().get(i) : sequence.apply(p.toBigInteger().longValueExact());
            double error = CodeMeasurement.relativeError(got, reference);
            assertTrue(error <= stated, input + " at " + p + ": error " + error + " > stated " + stated);
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
