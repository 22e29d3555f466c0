package dev.odetab.cli;

import dev.odetab.base.ExprException;
import dev.odetab.series.PrecisionCapException;
import java.io.PrintWriter;

/** The one-line messages of bad input and of numerical limits, shared by the commands. */
final class Failures {
    private Failures() {
    }

    /** Prints the message for bad input (a located input error, a constant that cannot be evaluated, a singular path) and returns exit code 2. */
    static int badInput(Exception e, String function, PrintWriter err) {
        if (e instanceof ExprException) {
            err.println("odetab: " + function + ": a normalization constant cannot be evaluated: " + e.getMessage());
        } else {
            err.println("odetab: " + e.getMessage());
        }
        return Main.BAD_INPUT;
    }

    /**
     * Prints the message of a precision cap that was reached ({@code context} first: the table or
     * the point; then {@code remedy}) and returns exit code 3, the one mapping of
     * {@link PrecisionCapException} to an exit code.
     */
    static int numericalLimit(String context, PrecisionCapException e, String remedy, PrintWriter err) {
        err.println("odetab: " + context + e.getMessage() + remedy);
        return Main.NUMERICAL_LIMIT;
    }

    /**
     * Prints the message of a failure that no command maps (a bug, or the JVM out of memory) and
     * returns exit code 70, the one mapping of the unexpected; {@code ODETAB_DEBUG} adds the
     * stack trace.
     */
    static int internalError(Throwable e, PrintWriter err) {
        if (e instanceof OutOfMemoryError) {
            err.println("odetab: out of memory (" + (Runtime.getRuntime().maxMemory() >> 20)
                    + " MiB of heap); give Java more with JDK_JAVA_OPTIONS=-Xmx2g, or build a smaller table");
        } else {
            err.println("odetab: internal error: " + e);
        }
        if (System.getenv("ODETAB_DEBUG") != null) {
            e.printStackTrace(err);
        }
        return Main.INTERNAL_ERROR;
    }

    /** The --verbose line for one point. */
    static String work(String point, boolean exact, int precBits, int attempts, int steps, int terms) {
        return "odetab: x = " + point + ": " + (exact ? "exact (a polynomial solution, evaluated in rational arithmetic)"
                : precBits + " bits, " + attempts + " attempt(s), " + steps + " step(s), " + terms + " terms");
    }
}
