package dev.rootform.api.batch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Specs of build-time code generation: a Java source for a fitted, verified solution, else one line why not. */
class EvaluatorSpecTest {
    @Test
    void aFittedSolutionGivesItsJavaClass() {
        GeneratedCode code = EvaluatorSpec.generate("""
                {"description": "Fibonacci numbers", "problem": "x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1",
                 "class": "Fibonacci", "package": "com.example.sequences", "digits": 20}""");
        GeneratedCode.Source s = assertInstanceOf(GeneratedCode.Source.class, code);
        assertEquals(Optional.of("com.example.sequences"), s.packageName());
        assertEquals("com/example/sequences/Fibonacci.java", s.relativePath());
        assertTrue(s.text().startsWith("/*") || s.text().startsWith("//"), s.text());
        assertTrue(s.text().contains("package com.example.sequences;"), s.text());
        assertTrue(s.text().contains("public final class Fibonacci"), s.text());
    }

    @Test
    void theDefaultClassHasNoPackage() {
        GeneratedCode.Source s = assertInstanceOf(GeneratedCode.Source.class,
                EvaluatorSpec.generate("{\"problem\": \"y' + 2y = 0; y(0) = 1\"}"));
        assertEquals("Solution.java", s.relativePath());
    }

    @ParameterizedTest(name = "[{index}] {0}")
    @CsvSource(delimiter = '|', textBlock = """
        {"problem": "(D+1) y = 0", "class": "Decay"}                       | code output needs fitted constants: give conditions for the free constants C1
        {"problem": "y'' + (2y' = 0"}                                      | unbalanced '(' (at column 7 of "y'' + (2y' = 0")
        {"problem": "x[n+1] = x[n]; x[0] = 1", "function": "f"}            | unknown field "function" for a spec
        {"problem": "x[n+2] = -x[n]; x[0] = 1; x[2] = 0"}                  | every solution has x[0] + x[2] = 0
        {"problem": "x[n+1] = x[n]; x[0] = 1", "package": "com.class"}     | 'com.class' is not a Java package name
        {"problem": "x[n+1] = x[n]; x[0] = 1"                              | the spec is not JSON
        "x[n+1] = x[n]"                                                    | the spec is not a JSON object
        """)
    void aBadSpecGivesOneLineWhy(String spec, String message) {
        GeneratedCode.Failure f = assertInstanceOf(GeneratedCode.Failure.class, EvaluatorSpec.generate(spec));
        assertTrue(f.message().contains(message), f.message());
    }
}
