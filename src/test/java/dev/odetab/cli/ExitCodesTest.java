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
}
