package dev.rootform.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.source.doctree.DocCommentTree;
import com.sun.source.tree.ClassTree;
import com.sun.source.tree.CompilationUnitTree;
import com.sun.source.tree.Tree;
import com.sun.source.util.DocTrees;
import com.sun.source.util.JavacTask;
import com.sun.source.util.TreePath;
import com.sun.source.util.TreePathScanner;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import javax.lang.model.element.Modifier;
import javax.tools.JavaCompiler;
import javax.tools.StandardJavaFileManager;
import javax.tools.ToolProvider;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.io.TempDir;

/**
 * The API's Javadoc as a contract: every public type carries a comment, the comments pass the
 * Javadoc checker of the compiler (HTML, references, syntax), and every example in a {@code <pre>{@code ...}}
 * block compiles against the public API alone (in a package of its own, with the imports of the
 * file it stands in) and runs, printing its result.
 */
class ApiDocumentationTest {
    private static final Path SOURCES = Path.of("src/main/java/dev/rootform/api");
    private static final Pattern EXAMPLE = Pattern.compile("<pre>\\{@code\\n");
    private static final Pattern IMPORT = Pattern.compile("^import [\\w.]+(\\.\\*)?;$", Pattern.MULTILINE);
    private static final Pattern COMMENT_MARGIN = Pattern.compile("^\\s*\\* ?", Pattern.MULTILINE);

    @TempDir
    Path work;

    @Test
    void everyPublicTypeHasAComment() throws IOException {
        List<String> undocumented = new ArrayList<>();
        List<String> documented = new ArrayList<>();
        JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
        try (StandardJavaFileManager files = javac.getStandardFileManager(null, null, StandardCharsets.UTF_8)) {
            JavacTask task = (JavacTask) javac.getTask(null, files, null, List.of("-proc:none"), null,
                    files.getJavaFileObjectsFromPaths(sources()));
            DocTrees docs = DocTrees.instance(task);
            for (CompilationUnitTree unit : task.parse()) {
                new TreePathScanner<Void, Void>() {
                    @Override
                    public Void visitClass(ClassTree type, Void unused) {
                        if (!type.getModifiers().getFlags().contains(Modifier.PUBLIC) && !inInterface(getCurrentPath())) {
                            return null;
                        }
                        DocCommentTree doc = docs.getDocCommentTree(getCurrentPath());
                        (doc == null || doc.getFullBody().isEmpty() ? undocumented : documented).add(type.getSimpleName().toString());
                        return super.visitClass(type, unused);
                    }
                }.scan(unit, null);
            }
        }
        assertEquals(List.of(), undocumented, "public types without a comment");
        assertTrue(documented.containsAll(List.of("Rootform", "SolveRequest", "Options", "Builder", "Result", "Solved",
                "Exporters", "Input", "Text", "Model")), documented.toString());
    }

    @Test
    void javadocPassesTheChecker() {
        ByteArrayOutputStream diagnostics = new ByteArrayOutputStream();
        List<String> args = new ArrayList<>(List.of("-proc:none", "-Xdoclint:all/protected,-missing", "-Werror",
                "-classpath", classpath(), "-d", work.toString()));
        sources().forEach(f -> args.add(f.toString()));
        int status = ToolProvider.getSystemJavaCompiler().run(null, diagnostics, diagnostics, args.toArray(String[]::new));
        assertEquals(0, status, () -> diagnostics.toString(StandardCharsets.UTF_8));
    }

    @TestFactory
    Stream<DynamicTest> everyExampleRuns() throws IOException {
        List<DynamicTest> tests = new ArrayList<>();
        for (Path file : sources()) {
            String text = Files.readString(file);
            List<String> examples = examples(text);
            for (int i = 0; i < examples.size(); i++) {
                String name = "Example" + tests.size();
                String source = "package example;\n" + imports(text) + "import dev.rootform.api.*;\n"
                        + "public final class " + name + " {\n    public static void run() throws Exception {\n"
                        + examples.get(i) + "\n    }\n}\n";
                tests.add(DynamicTest.dynamicTest(file.getFileName() + " example " + (i + 1), () -> assertRuns(name, source)));
            }
        }
        assertFalse(tests.isEmpty(), "no examples found under " + SOURCES.toAbsolutePath());
        return tests.stream();
    }

    private void assertRuns(String name, String source) throws Exception {
        Path dir = Files.createDirectories(work.resolve(name));
        Path file = Files.writeString(dir.resolve(name + ".java"), source);
        ByteArrayOutputStream diagnostics = new ByteArrayOutputStream();
        int status = ToolProvider.getSystemJavaCompiler().run(null, diagnostics, diagnostics,
                "-proc:none", "-classpath", classpath(), "-d", dir.toString(), file.toString());
        assertEquals(0, status, () -> "the example does not compile:\n" + diagnostics.toString(StandardCharsets.UTF_8) + "\n" + source);
        ByteArrayOutputStream printed = new ByteArrayOutputStream();
        PrintStream stdout = System.out;
        try (URLClassLoader loader = new URLClassLoader(new URL[] {dir.toUri().toURL()}, getClass().getClassLoader())) {
            System.setOut(new PrintStream(printed, true, StandardCharsets.UTF_8));
            loader.loadClass("example." + name).getMethod("run").invoke(null);
        } finally {
            System.setOut(stdout);
        }
        String output = printed.toString(StandardCharsets.UTF_8);
        assertFalse(output.isBlank(), () -> "the example printed nothing:\n" + source);
        stdout.print(output);
    }

    /** The bodies of the {@code <pre>{@code ...}} blocks: balanced braces, comment margins removed. */
    static List<String> examples(String text) {
        List<String> examples = new ArrayList<>();
        Matcher start = EXAMPLE.matcher(text);
        while (start.find()) {
            int depth = 1;
            int end = start.end();
            while (depth > 0) {
                char c = text.charAt(end++);
                depth += c == '{' ? 1 : c == '}' ? -1 : 0;
            }
            examples.add(COMMENT_MARGIN.matcher(text.substring(start.end(), end - 1)).replaceAll("").strip());
        }
        return examples;
    }

    private static String imports(String text) {
        return IMPORT.matcher(text).results().map(m -> m.group() + "\n").collect(Collectors.joining());
    }

    private static boolean inInterface(TreePath path) {
        TreePath parent = path.getParentPath();
        return parent != null && parent.getLeaf() instanceof ClassTree outer
                && outer.getKind() == Tree.Kind.INTERFACE && outer.getModifiers().getFlags().contains(Modifier.PUBLIC);
    }

    private static List<Path> sources() {
        try (Stream<Path> files = Files.list(SOURCES)) {
            return files.filter(f -> f.toString().endsWith(".java")).sorted().toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The test classpath (Surefire passes it in a property; the JVM's own is a launcher jar). */
    private static String classpath() {
        return System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
    }
}
