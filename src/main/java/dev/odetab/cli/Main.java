package dev.odetab.cli;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.List;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The {@code odetab} command line. Exit codes (DESIGN.md, README): 0 success; 1 a check or an
 * audit found a difference; 2 bad input; 3 a numerical limit was reached; 70 an internal error
 * (a bug: please report it with the command that caused it; also the JVM running out of memory).
 * These are the only codes {@link #run} returns: every failure that no command maps is mapped to
 * 70 by {@link Failures#internalError}.
 */
@Command(name = "odetab", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        description = "Correctly rounded tables of solutions of second-order linear equations, with proven error bounds.",
        subcommands = {BuildCommand.class, EvalCommand.class, InspectCommand.class, AuditCommand.class, CheckCommand.class, FamiliesCommand.class,
            CommandLine.HelpCommand.class})
public final class Main implements Runnable {
    public static final int OK = 0;
    public static final int DIFFERENCE = 1;
    public static final int BAD_INPUT = 2;
    public static final int NUMERICAL_LIMIT = 3;
    public static final int INTERNAL_ERROR = 70;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    private static volatile boolean processStreams;

    public static void main(String[] args) {
        processStreams = true;
        System.exit(run(args, new PrintWriter(System.out, true, StandardCharsets.UTF_8),
                new PrintWriter(System.err, true, StandardCharsets.UTF_8)));
    }

    /** True when the commands write to the process's own stdout and stderr ({@link #main}), not to a caller's writers. */
    static boolean processStreams() {
        return processStreams;
    }

    /** Runs one command line; returns the exit code. Used by tests too. */
    public static int run(String[] args, PrintWriter out, PrintWriter err) {
        CommandLine cl = new CommandLine(new Main());
        cl.setOut(out);
        cl.setErr(err);
        cl.setUnmatchedOptionsAllowedAsOptionParameters(false);
        // points may be negative rationals (-1/3) without '--'; an unknown option then reaches
        // Points.parse, which names it
        cl.getSubcommands().get("eval").setUnmatchedOptionsArePositionalParams(true);
        cl.setParameterExceptionHandler((ex, a) -> {
            err.println("odetab: " + ex.getMessage());
            CommandLine sub = ex.getCommandLine();
            err.println("Try 'odetab " + (sub.getParent() == null ? "" : sub.getCommandName() + " ") + "--help'.");
            return BAD_INPUT;
        });
        cl.setExecutionExceptionHandler((ex, c, parsed) -> Failures.internalError(ex, err));
        CommandContext.set(List.of(args));
        int code;
        try {
            code = cl.execute(args);
        } catch (Error | RuntimeException e) {
            // what escapes picocli's handlers (an Error such as StackOverflowError or
            // OutOfMemoryError) is mapped here, so that a crash never exits with 1
            code = Failures.internalError(e, err);
        }
        out.flush();
        err.flush();
        return code;
    }

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** The version from the jar's manifest or the build's properties. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] {"odetab " + ToolVersion.get()};
        }
    }
}
