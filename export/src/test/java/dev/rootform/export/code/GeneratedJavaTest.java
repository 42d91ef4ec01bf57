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
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Compiles the generated Java of every corpus equation in-process (once for the class) and checks
 * it: at the sample points the header's accuracy was measured at, at 1,000 random points of the
 * stated valid range each, and its exact terms.
 */
class GeneratedJavaTest {
    /** Random inputs per generated evaluator. */
    private static final int RANDOM_POINTS = 1000;

    @TempDir
    static Path dir;
    private static final List<String> INPUTS = new ArrayList<>();
    private static final List<Report> REPORTS = new ArrayList<>();
    private static final List<Class<?>> CLASSES = new ArrayList<>();
    private static URLClassLoader loader;

    @BeforeAll
    static void compileTheCorpus() throws Exception {
        INPUTS.addAll(Corpus.SEQUENCES);
        INPUTS.addAll(Corpus.FUNCTIONS);
        List<String> names = new ArrayList<>();
        Files.createDirectories(dir.resolve("gen"));
        for (int i = 0; i < INPUTS.size(); i++) {
            Report r = Corpus.codeReport(INPUTS.get(i));
            String name = "Case" + i;
            Files.writeString(dir.resolve("gen/" + name + ".java"), JavaRenderer.render(r, "gen", name));
            REPORTS.add(r);
            names.add(name);
        }
        JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
        assertNotNull(javac, "no system Java compiler");
        List<String> args = new ArrayList<>(List.of("-d", dir.resolve("classes").toString(), "-cp", dir.resolve("gen").toString(), "-encoding", "UTF-8", "-Xlint:all", "-Werror"));
        names.forEach(n -> args.add(dir.resolve("gen/" + n + ".java").toString()));
        assertEquals(0, javac.run(null, null, null, args.toArray(String[]::new)), "javac failed");
        loader = new URLClassLoader(new java.net.URL[] {dir.resolve("classes").toUri().toURL()});
        for (String n : names) {
            CLASSES.add(loader.loadClass("gen." + n));
        }
    }

    @AfterAll
    static void close() throws Exception {
        loader.close();
    }

    @Test
    void statedAccuracyHoldsForEveryEquationAndTermsAreExact() throws Exception {
        for (int i = 0; i < REPORTS.size(); i++) {
            check(INPUTS.get(i), REPORTS.get(i), CLASSES.get(i));
        }
    }

    /**
     * The must-show of issue 16: for every generated evaluator of the corpus, the error bound its
     * header states holds at 1,000 random inputs of its stated valid range (half uniform over the
     * range, half log-uniform in the distance from t0 or the first index, so that both the far range
     * and the neighbourhood of the start are hit), against values to 30 digits from the analysis
     * (exact sequence values or certified evaluation at large n; function values raised until two
     * working precisions agree). Seed 16.
     */
    @Test
    void statedBoundHoldsAtRandomPointsOfTheStatedRange() throws Exception {
        java.util.Random random = new java.util.Random(16);
        for (int c = 0; c < REPORTS.size(); c++) {
            Report r = REPORTS.get(c);
            NumericForm form = r.code().orElseThrow().form();
            CodeFacts facts = r.code().orElseThrow().facts();
            List<StatedBound> bounds = StatedBound.of(Files.readString(dir.resolve("gen/Case" + c + ".java")));
            List<Rational> points = randomPoints(form, facts, random);
            List<java.math.BigDecimal> exact = new dev.rootform.numeric.analysis.Analyzer(CodeMeasurement.EXACT_DIGITS)
                    .referenceValues(r.solution(), points).stream().map(dev.rootform.numeric.analysis.PointValue::value).toList();
            Method value = CLASSES.get(c).getMethod("value", form.differential() ? double.class : long.class);
            for (int i = 0; i < points.size(); i++) {
                Rational p = points.get(i);
                double got = (double) value.invoke(null, form.differential() ? (Object) p.doubleValue() : (Object) p.toBigInteger().longValueExact());
                StatedBound bound = StatedBound.at(bounds, form.differential() && p.doubleValue() < form.origin());
                assertTrue(bound.holds(got, exact.get(i), CodeMeasurement.largestTerm(form, p), 0),
                        INPUTS.get(c) + " at " + p + ": " + got + " vs " + exact.get(i) + ", stated " + bound);
            }
        }
    }

    /** Random inputs of the stated range, each the exact value of the double or long the code is called with. */
    private static List<Rational> randomPoints(NumericForm form, CodeFacts facts, java.util.Random random) {
        List<Rational> points = new ArrayList<>();
        double start = form.differential() ? 0 : form.validFrom();
        while (points.size() < RANDOM_POINTS) {
            double x;
            if (points.size() % 2 == 0) {
                x = facts.low() + random.nextDouble() * (facts.high() - facts.low());
            } else {
                boolean up = !form.differential() || random.nextBoolean();
                double far = up ? facts.high() - start : start - facts.low();
                x = start + (up ? 1 : -1) * Math.exp(Math.log(1e-9) + random.nextDouble() * (Math.log(Math.max(far, 2e-9)) - Math.log(1e-9)));
            }
            if (x < facts.low() || x > facts.high()) {
                continue;
            }
            points.add(form.differential() ? Rational.of(new java.math.BigDecimal(form.origin() + x))
                    : Rational.of(Math.max(form.first(), Math.round(x))));
        }
        return points;
    }

    private static void check(String input, Report r, Class<?> generated) throws Exception {
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
