package dev.rootform.cli;

import dev.rootform.api.Options;
import dev.rootform.api.Result;
import dev.rootform.api.Rootform;
import dev.rootform.api.SolveRequest;
import dev.rootform.export.Report;
import dev.rootform.export.document.TextRenderer;
import java.io.PrintWriter;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code rootform demo}: a few solved examples from an invented scenario, a rooftop greenhouse
 * whose parts are modelled by small linear equations. The data are made up for the demo.
 */
@Command(name = "demo", description = "Solve a few built-in examples (an invented rooftop-greenhouse scenario).",
        mixinStandardHelpOptions = true)
final class DemoCommand implements Callable<Integer> {
    /** One demo case: what it models, the input, and where to show values. */
    record Example(String title, String input, String valuesAt) {
    }

    static final List<Example> EXAMPLES = List.of(
            new Example("Vent flap after a gust (mass-spring-damper, underdamped), displacement in m",
                    "y'' + 4y' + 13y = 0; y(0) = 0.2; y'(0) = 0", "0.5,1"),
            new Example("Irrigation pump pressure at start-up (critically damped)",
                    "y'' + 6y' + 9y = 0; y(0) = 0; y'(0) = 1.5", "1"),
            new Example("Humidity sensor smoothing filter, impulse response (two real poles)",
                    "x[n] = 1.5x[n-1] - 0.56x[n-2]; x[0] = 0; x[1] = 1", "10,100"),
            new Example("Seedling trays filled per week (a third-order count with no radical roots shown)",
                    "x[n+3] = x[n+1] + x[n]; x[0] = 1; x[1] = 1; x[2] = 1", "20,1000"),
            new Example("Bench heater temperature under a sinusoidal daily load, from rest (forced, stable)",
                    "y'' + 3y' + 2y = 2sin(t); y(0) = 0; y'(0) = 0", "1,10"),
            new Example("Greenhouse roof loan: monthly balance at 0.4 % interest with payments of 900",
                    "b[n] = 1.004 b[n-1] - 900; b[0] = 60000", "12,60"),
            new Example("Shade-net ridge wire between two posts 4 m apart, small-sag model (boundary values)",
                    "y''(x) - 0.01y(x) = 0.05; y(0) = 0; y(4) = 0", "2"));

    /** Significant digits of the demo's values. */
    static final int DIGITS = 20;

    @Spec
    CommandSpec spec;

    /** The command line that gives the same answer as the demo's call for {@code e}: same input, points and digits. */
    static String command(Example e) {
        return "rootform solve \"" + e.input() + "\" --values-at " + e.valuesAt() + " --digits " + DIGITS;
    }

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        boolean allVerified = true;
        for (Example e : EXAMPLES) {
            Options options = Options.builder().digits(DIGITS).points(e.valuesAt().split(",")).build();
            Result result = Rootform.solve(SolveRequest.of(e.input()).with(options));
            Report report = result.answer().orElseThrow(() -> new IllegalStateException(e.input() + ": " + result));
            out.println("== " + e.title());
            out.println("   " + command(e));
            out.println();
            out.println(TextRenderer.render(report));
            allVerified &= result instanceof Result.Solved;
        }
        out.flush();
        return allVerified ? ExitCode.VERIFIED : ExitCode.CHECK_FAILED;
    }
}
