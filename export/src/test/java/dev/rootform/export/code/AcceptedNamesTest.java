package dev.rootform.export.code;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.Corpus;
import dev.rootform.export.Report;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import javax.tools.JavaCompiler;
import javax.tools.ToolProvider;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Names that pass {@link Identifiers} compile: generated Java with a sample of accepted class and
 * package names (close to the refused keywords) is compiled in-process, generated C with a sample
 * of accepted function names (close to C99 library names) by gcc in strict C99 with every warning
 * an error, all functions in one program that also includes the standard headers whose names are
 * refused. And the refused names are refused.
 */
class AcceptedNamesTest {
    private static final List<String> JAVA_CLASSES = List.of("Var2", "Records", "Yielded", "SealedBox", "Permit", "Module",
            "Open", "To", "With", "Exports_", "$Value", "Über");
    private static final List<String> JAVA_PACKAGES = List.of("org.example.fit", "vars.records", "javaish.x", "org.javax",
            "a.b.c");
    private static final List<String> C_FUNCTIONS = List.of("sine_wave", "is_stable", "to_value", "store", "mem_value",
            "nan_safe", "printf_value", "value_t0", "Enumerated", "e1_value", "logistic", "fib");

    @TempDir
    Path dir;

    @Test
    void acceptedJavaNamesCompile() throws Exception {
        Report r = Corpus.codeReport("x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1");
        List<String> args = new ArrayList<>(List.of("-d", dir.resolve("classes").toString(), "-cp", dir.resolve("src").toString(),
                "-encoding", "UTF-8", "-Xlint:all", "-Werror"));
        for (int i = 0; i < JAVA_CLASSES.size(); i++) {
            String name = JAVA_CLASSES.get(i);
            String pkg = JAVA_PACKAGES.get(i % JAVA_PACKAGES.size());
            assertEquals(Optional.empty(), Identifiers.javaClassRefusal(name), name);
            assertEquals(Optional.empty(), Identifiers.javaPackageRefusal(pkg), pkg);
            Path file = dir.resolve("src/" + pkg.replace('.', '/') + "/" + name + ".java");
            Files.createDirectories(file.getParent());
            Files.writeString(file, JavaRenderer.render(r, pkg, name));
            args.add(file.toString());
        }
        JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
        assertNotNull(javac, "no system Java compiler");
        assertEquals(0, javac.run(null, null, null, args.toArray(String[]::new)), "javac failed");
    }

    @Test
    void acceptedCNamesCompileBesideTheStandardLibrary() throws Exception {
        Report r = Corpus.codeReport("y'' + 2y' + 5y = 0; y(0) = 1; y'(0) = 0");
        StringBuilder main = new StringBuilder("#include <math.h>\n#include <stdio.h>\n#include <stdlib.h>\n#include <string.h>\n"
                + "#include <ctype.h>\n#include <errno.h>\n#include <assert.h>\n#include <stddef.h>\n#include <limits.h>\n");
        StringBuilder calls = new StringBuilder();
        List<String> command = new ArrayList<>(List.of("gcc", "-std=c99", "-Wall", "-Wextra", "-Werror", "-pedantic", "-o", "check", "main.c"));
        for (String f : C_FUNCTIONS) {
            assertEquals(Optional.empty(), Identifiers.cFunctionRefusal("--function", f), f);
            CSource c = CRenderer.render(r, f, Optional.of(f + ".h"));
            Files.writeString(dir.resolve(f + ".c"), c.source());
            Files.writeString(dir.resolve(f + ".h"), c.header().orElseThrow());
            main.append("#include \"").append(f).append(".h\"\n");
            calls.append("    printf(\"%.17g\\n\", ").append(f).append("(1.0));\n");
            command.add(f + ".c");
        }
        main.append("int main(void) {\n").append(calls).append("    return 0;\n}\n");
        Files.writeString(dir.resolve("main.c"), main);
        command.add("-lm");
        Process gcc = new ProcessBuilder(command).directory(dir.toFile()).redirectErrorStream(true).start();
        String out = new String(gcc.getInputStream().readAllBytes());
        assertTrue(gcc.waitFor(120, TimeUnit.SECONDS), "gcc timed out");
        assertEquals(0, gcc.exitValue(), out);
    }

    @Test
    void namesThatBreakCompilationAreRefused() {
        for (String name : List.of("var", "record", "yield", "sealed", "permits", "non-sealed", "class", "int", "true", "null", "_")) {
            assertTrue(Identifiers.javaClassRefusal(name).isPresent(), name);
        }
        for (String pkg : List.of("java", "java.util", "javax.fit", "org.var.x", "org.record", "a.int.b")) {
            assertTrue(Identifiers.javaPackageRefusal(pkg).isPresent(), pkg);
        }
        for (String f : List.of("sin", "sinf", "cosl", "printf", "NAN", "INFINITY", "isnan", "fpclassify", "malloc", "errno",
                "strlen", "isdigit", "tolower", "memcpy", "strfoo", "EDOM", "E2BIG", "_Value", "__x", "int", "main")) {
            assertTrue(Identifiers.cFunctionRefusal("--function", f).isPresent(), f);
        }
    }
}
