package dev.odetab.cli;

import java.io.PrintWriter;
import java.io.StringWriter;

/** Runs the command line in-process and captures what it prints. */
public final class CliRunner {
    private CliRunner() {
    }

    /** Exit code and the two streams. */
    public record Result(int code, String out, String err) {
    }

    public static Result run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new PrintWriter(out), new PrintWriter(err));
        return new Result(code, out.toString(), err.toString());
    }
}
