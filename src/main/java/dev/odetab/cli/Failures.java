package dev.odetab.cli;

import dev.odetab.base.ExprException;
import java.io.PrintWriter;

/** The one-line messages of bad input shared by the commands that take a FUNCTION. */
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

    /** The --verbose line for one point. */
    static String work(String point, boolean exact, int precBits, int attempts, int steps, int terms) {
        return "odetab: x = " + point + ": " + (exact ? "exact (a polynomial solution, evaluated in rational arithmetic)"
                : precBits + " bits, " + attempts + " attempt(s), " + steps + " step(s), " + terms + " terms");
    }
}
