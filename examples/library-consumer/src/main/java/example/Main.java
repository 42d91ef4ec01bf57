package example;

import dev.rootform.api.Exporters;
import dev.rootform.api.Options;
import dev.rootform.api.Result;
import dev.rootform.api.Rootform;
import dev.rootform.api.SolveRequest;
import dev.rootform.export.CodeNames;

/**
 * A sourdough starter weighs 100 g; every day half of it is discarded and 40 g of flour and water
 * are added. How heavy is it on day n, and on day 7? Exits with status 1 unless the answer is
 * solved and verified.
 */
public class Main {
    public static void main(String[] args) {
        Result result = Rootform.solve(SolveRequest.of("s[n+1] = s[n]/2 + 40; s[0] = 100")
                .with(Options.builder().points("7").build()));
        if (result instanceof Result.Solved solved) {
            System.out.print(Exporters.byName("text").orElseThrow().render(solved.report(), CodeNames.defaults()).text());
        } else {
            System.err.println("expected a verified solution, got " + result);
            System.exit(1);
        }
    }
}
