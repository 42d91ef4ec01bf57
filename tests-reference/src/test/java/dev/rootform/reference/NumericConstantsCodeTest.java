package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.Report;
import dev.rootform.export.code.JavaRenderer;
import java.lang.reflect.Method;
import java.net.URLClassLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import java.util.stream.Stream;
import javax.tools.JavaCompiler;
import javax.tools.ToolProvider;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Generated Java for solutions whose constants are fixed numerically (boundary values with
 * transcendental entries, a forcing frequency qπ) or exactly (boundary values at multiples of π with
 * exact cos and sin): compiled in-process and compared with the known solutions.
 */
class NumericConstantsCodeTest {
    @TempDir
    Path dir;

    static Stream<Arguments> cases() {
        return Stream.of(
                // y'' + y = 0, y(0) = 1, y(π/2) = 2 → cos t + 2 sin t (common practice): exact constants now
                Arguments.of("y'' + y = 0; y(0) = 1; y(pi/2) = 2", (DoubleUnaryOperator) t -> Math.cos(t) + 2 * Math.sin(t), false),
                // y'' - y = 0, y(0) = 0, y(1) = 1 → sinh t / sinh 1 (common practice): e^(±1) is transcendental
                Arguments.of("y'' - y = 0; y(0) = 0; y(1) = 1", (DoubleUnaryOperator) t -> Math.sinh(t) / Math.sinh(1), true),
                // y'' + y = sin(πt) from rest → (sin πt - π sin t)/(1 - π²) (undetermined coefficients, by hand)
                Arguments.of("y'' + y = sin(pi t); y(0) = 0; y'(0) = 0",
                        (DoubleUnaryOperator) t -> (Math.sin(Math.PI * t) - Math.PI * Math.sin(t)) / (1 - Math.PI * Math.PI), true));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void generatedJavaMatchesTheKnownSolution(String input, DoubleUnaryOperator known, boolean numeric) throws Exception {
        Report report = Answers.codeReport(input, 30);
        String source = JavaRenderer.render(report, "gen", "Numeric");
        assertEquals(numeric, source.contains("Constants fixed numerically"), source);
        Path gen = Files.createDirectories(dir.resolve("gen"));
        Files.writeString(gen.resolve("Numeric.java"), source);
        JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
        assertNotNull(javac, "no system Java compiler");
        assertEquals(0, javac.run(null, null, null, "-d", dir.resolve("classes").toString(), gen.resolve("Numeric.java").toString()));
        try (URLClassLoader loader = new URLClassLoader(new java.net.URL[] {dir.resolve("classes").toUri().toURL()})) {
            Method value = loader.loadClass("gen.Numeric").getMethod("value", double.class);
            for (double t : new double[] {-1.5, 0, 0.5, 1, 2.5, 7}) {
                double expected = known.applyAsDouble(t);
                assertEquals(expected, (double) value.invoke(null, t), 1e-12 * Math.max(1, Math.abs(expected)), input + " at " + t);
            }
        }
    }
}
