package dev.odetab.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;

/**
 * Exit codes are mapped in one place: whatever no command maps, an Error included, is exit 70
 * with one line on stderr, never 1 (which tells a CI script that a difference was found).
 */
class ExitCodesTest {
    @Test
    void errorsAreInternalNeverOne() {
        for (Throwable t : new Throwable[] {new StackOverflowError(), new IllegalStateException("bug"), new OutOfMemoryError("Java heap space")}) {
            StringWriter err = new StringWriter();
            assertEquals(Main.INTERNAL_ERROR, Failures.internalError(t, new PrintWriter(err, true)), t.toString());
            assertEquals(1, err.toString().lines().count(), "one line: " + err);
            assertTrue(err.toString().startsWith("odetab: "), err.toString());
        }
    }

    /** The exit-3 message is one short line with the advice that applies (issue 17, item 9). */
    @Test
    void theCapMessageIsShortAndAdvises() {
        // ψ_1 is a multiple of x e^(-x²/2), whose derivative (1 - x²) e^(-x²/2) is exactly 0 at x = 1; it is no polynomial
        CliRunner.Result r = CliRunner.run("eval", "hermite-function", "-p", "n=1", "1", "--derivative", "--format", "binary64",
                "--rounding", "toward-negative", "--precision-cap-bits", "512");
        assertEquals(Main.NUMERICAL_LIMIT, r.code(), r.err());
        assertEquals(1, r.err().lines().count(), r.err());
        assertTrue(r.err().length() < 400, r.err());
        assertTrue(r.err().contains("the enclosure still contains 0"), r.err());
    }
}
