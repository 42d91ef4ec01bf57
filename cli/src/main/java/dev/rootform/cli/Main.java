package dev.rootform.cli;

import java.io.PrintWriter;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * Entry point of the {@code rootform} command. The only class that exits the JVM; it maps every
 * failure to an exit code with one line on stderr and never a stack trace.
 */
@Command(name = "rootform", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        subcommands = {SolveCommand.class, CheckCommand.class, ResponseCommand.class, RecoverCommand.class, SystemCommand.class,
            BatchCommand.class, DemoCommand.class},
        description = "Exact closed forms of linear constant-coefficient difference and differential equations.")
public final class Main implements Runnable {
    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    public static void main(String[] args) {
        System.exit(execute(args, new PrintWriter(System.out, true), new PrintWriter(System.err, true)));
    }

    /** Runs the command with the given streams and returns its exit code (used by tests). */
    public static int execute(String[] args, PrintWriter out, PrintWriter err) {
        CommandLine cl = new CommandLine(new Main());
        cl.setOut(out);
        cl.setErr(err);
        cl.setExitCodeExceptionMapper(e -> ExitCode.INTERNAL);
        cl.setParameterExceptionHandler((e, a) -> {
            err.println("rootform: " + e.getMessage());
            err.println("Try 'rootform --help'.");
            return ExitCode.BAD_INPUT;
        });
        cl.setExecutionExceptionHandler((e, c, p) -> {
            err.println("rootform: internal error: " + e);
            return ExitCode.INTERNAL;
        });
        return cl.execute(args);
    }

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** The version from the jar manifest, or "dev" when run from classes. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            String v = Main.class.getPackage().getImplementationVersion();
            return new String[] {"rootform " + (v == null ? "dev" : v)};
        }
    }
}
