package dev.rootform.reference.bench;

import java.lang.reflect.Method;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * One build of rootform loaded from its jar ({@code cli/target/rootform.jar}, whose manifest lists
 * the module jars and libraries in {@code lib/}) into a class loader of its own, so that two
 * releases run side by side in one JVM on the same inputs. Calls go through the public API by
 * reflection (the API of both builds, not the benchmark's own classpath). Not thread-safe.
 */
final class Release {
    private final String name;
    private final Path jar;
    private final Method solve;
    private final Method request;
    private final Method with;
    private final Method builder;
    private final Method parse;
    private final Method polynomial;
    private final Class<?> finder;
    private final Class<?> rational;

    Release(String name, Path jar) throws Exception {
        this.name = name;
        this.jar = jar.toAbsolutePath();
        ClassLoader loader = new URLClassLoader(new URL[] {this.jar.toUri().toURL()}, ClassLoader.getPlatformClassLoader());
        Class<?> rootform = loader.loadClass("dev.rootform.api.Rootform");
        Class<?> solveRequest = loader.loadClass("dev.rootform.api.SolveRequest");
        Class<?> options = loader.loadClass("dev.rootform.api.Options");
        rational = loader.loadClass("dev.rootform.symbolic.algebra.Rational");
        finder = loader.loadClass("dev.rootform.numeric.roots.RootFinder");
        solve = rootform.getMethod("solve", solveRequest);
        request = solveRequest.getMethod("of", String.class);
        with = solveRequest.getMethod("with", options);
        builder = options.getMethod("builder");
        parse = rational.getMethod("parse", String.class);
        polynomial = loader.loadClass("dev.rootform.symbolic.algebra.RationalPolynomial").getMethod("of", List.class);
    }

    String name() {
        return name;
    }

    /** The launcher next to the build ({@code <checkout>/rootform} for {@code <checkout>/cli/target/rootform.jar}), if any. */
    Optional<Path> launcher() {
        Path checkout = jar.getParent().getParent().getParent();
        Path script = checkout.resolve("rootform");
        return Files.isExecutable(script) ? Optional.of(script) : Optional.empty();
    }

    /** The whole solve job with values at {@code points} to {@code digits} digits; true when the answer is verified. */
    boolean solve(String text, int digits, List<String> points) throws Exception {
        Object b = builder.invoke(null);
        b = b.getClass().getMethod("digits", int.class).invoke(b, digits);
        b = b.getClass().getMethod("points", List.class).invoke(b, points);
        Object options = b.getClass().getMethod("build").invoke(b);
        Object result = solve.invoke(null, with.invoke(request.invoke(null, text), options));
        Optional<?> answer = (Optional<?>) result.getClass().getMethod("answer").invoke(result);
        return answer.isPresent() && (Boolean) answer.get().getClass().getMethod("verified").invoke(answer.get());
    }

    /** Certified enclosures of the roots of Σ c_i x^i to {@code digits} digits; their count. */
    int roots(long[] coefficients, int digits) throws Exception {
        List<Object> c = new ArrayList<>();
        for (long x : coefficients) {
            c.add(parse.invoke(null, Long.toString(x)));
        }
        Object p = polynomial.invoke(null, c);
        Object f = finder.getConstructor(int.class).newInstance(digits);
        return ((List<?>) finder.getMethod("roots", polynomial.getReturnType()).invoke(f, p)).size();
    }
}
