package dev.rootform.maven;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.List;
import org.apache.maven.plugin.MojoFailureException;
import org.apache.maven.project.MavenProject;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The generate goal's work on a directory of specs: sources, incremental runs, failures. */
class EvaluatorSourcesTest {
    private static final String FIBONACCI = "{\"problem\": \"x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1\","
            + " \"class\": \"Fibonacci\", \"package\": \"com.example.seq\"}";
    private static final String DECAY = "{\"problem\": \"y' + 2y = 0; y(0) = 5\", \"class\": \"Decay\"}";
    private static final FileTime LONG_AGO = FileTime.fromMillis(1_000_000_000_000L);

    @TempDir
    Path project;

    private Path spec(String name, String json) throws Exception {
        Path dir = Files.createDirectories(project.resolve("src/main/rootform"));
        return Files.writeString(dir.resolve(name), json);
    }

    private EvaluatorSources sources(String version) {
        return new EvaluatorSources(project.resolve("src/main/rootform"), project.resolve("target/generated-sources/rootform"),
                project.resolve("target/rootform-stamps"), version, project);
    }

    private Path generated(String path) {
        return project.resolve("target/generated-sources/rootform").resolve(path);
    }

    @Test
    void eachSpecGivesItsClassAndAnUnchangedSpecIsNotGeneratedAgain() throws Exception {
        spec("fibonacci.json", FIBONACCI);
        spec("decay.json", DECAY);
        EvaluatorSources.Summary first = sources("1.0").update();
        assertEquals(new EvaluatorSources.Summary(2, 0, 0, List.of()), first);
        assertTrue(Files.readString(generated("com/example/seq/Fibonacci.java")).contains("public final class Fibonacci"));
        assertTrue(Files.readString(generated("Decay.java")).contains("public static double value(double t)"));
        Files.setLastModifiedTime(generated("Decay.java"), LONG_AGO);

        assertEquals(new EvaluatorSources.Summary(0, 2, 0, List.of()), sources("1.0").update());
        assertEquals(LONG_AGO, Files.getLastModifiedTime(generated("Decay.java")));
    }

    @Test
    void aChangedSpecOrPluginVersionIsGeneratedAgain() throws Exception {
        spec("decay.json", DECAY);
        sources("1.0").update();
        Files.setLastModifiedTime(generated("Decay.java"), LONG_AGO);
        assertEquals(new EvaluatorSources.Summary(1, 0, 0, List.of()), sources("1.1").update());
        assertFalse(Files.getLastModifiedTime(generated("Decay.java")).equals(LONG_AGO));

        spec("decay.json", DECAY.replace("\"Decay\"", "\"Cooling\""));
        assertEquals(new EvaluatorSources.Summary(1, 0, 0, List.of()), sources("1.1").update());
        assertTrue(Files.exists(generated("Cooling.java")));
        assertFalse(Files.exists(generated("Decay.java")), "the class the spec no longer names is removed");
    }

    @Test
    void aDeletedSpecTakesItsSourceAlong() throws Exception {
        Path decay = spec("decay.json", DECAY);
        spec("fibonacci.json", FIBONACCI);
        sources("1.0").update();
        Files.delete(decay);
        assertEquals(new EvaluatorSources.Summary(0, 1, 1, List.of()), sources("1.0").update());
        assertFalse(Files.exists(generated("Decay.java")));
    }

    @Test
    void aFailingSpecIsNamedByItsPathWithTheMessage() throws Exception {
        spec("fibonacci.json", FIBONACCI);
        spec("general.json", "{\"problem\": \"(D+1) y = 0\", \"class\": \"Free\"}");
        spec("typo.json", "{\"problem\": \"y'' + (2y' = 0\"}");
        spec("twin.json", FIBONACCI);
        EvaluatorSources.Summary s = sources("1.0").update();
        assertEquals(1, s.generated());
        assertEquals(List.of(
                "src/main/rootform/general.json: code output needs fitted constants: give conditions for the free constants C1",
                "src/main/rootform/twin.json: generates com/example/seq/Fibonacci.java like src/main/rootform/fibonacci.json;"
                        + " give it another class or package",
                "src/main/rootform/typo.json: unbalanced '(' (at column 7 of \"y'' + (2y' = 0\")"), s.failures());
    }

    @Test
    void theGoalAddsTheSourceRootAndFailsTheBuildOnABadSpec() throws Exception {
        spec("decay.json", DECAY);
        GenerateMojo mojo = mojo();
        mojo.execute();
        assertEquals(List.of(generated("").toString().replaceAll("/$", "")), mojo.project.getCompileSourceRoots());

        spec("bad.json", "{\"problem\": \"x[n+1] = x[n]; x[0] = 1\", \"digits\": \"many\"}");
        MojoFailureException e = assertThrows(MojoFailureException.class, mojo()::execute);
        assertEquals("src/main/rootform/bad.json: \"digits\" must be a whole number in 1..10000, not \"many\"", e.getMessage());
    }

    private GenerateMojo mojo() {
        GenerateMojo mojo = new GenerateMojo();
        mojo.specDirectory = project.resolve("src/main/rootform").toFile();
        mojo.outputDirectory = generated("").toFile();
        mojo.stateDirectory = project.resolve("target/rootform-stamps").toFile();
        mojo.pluginVersion = "1.0";
        mojo.project = new MavenProject();
        mojo.project.setFile(new File(project.toFile(), "pom.xml"));
        return mojo;
    }
}
