package dev.odetab.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The precision cap is honoured for every format (issue 17, item 7): a format holding more
 * significant bits than the cap can decide is refused before any work, exit 2 at the key or option
 * that set the cap (or at the format when the cap is the default), and a build leaves its output
 * folder as it was. Specs under src/test/resources/hostile/budget/.
 */
class FormatCapTest {
    static final String SPECS = "src/test/resources/hostile/budget/";

    @Test
    void evalRefusesAFormatWiderThanTheCapAtTheOption() {
        CliRunner.Result r = CliRunner.run("eval", "airy-ai", "1", "--format", "decimal:1000", "--precision-cap-bits", "64");
        assertEquals(2, r.code(), r.err());
        assertEquals("", r.out());
        assertEquals("odetab: argument 7 '64', column 1: decimal:1000 holds 3323 significant bits, more than the precision cap"
                + " of 64 bits can decide; raise the cap to at least 3323 bits, or choose a narrower format\n", r.err());
        r = CliRunner.run("eval", "airy-ai", "1", "--format", "decimal:10000");
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().startsWith("odetab: argument 5 'decimal:10000', column 1: decimal:10000 holds 33221 significant bits"), r.err());
    }

    @Test
    void buildRefusesAFormatWiderThanTheCapAtTheKeyAndChangesNothing(@TempDir Path out) throws IOException {
        assertBuildsRefused(out, 2, Map.of(
                "decimal-10000.toml", "4:1: decimal:10000 holds 33221 significant bits, more than the precision cap of 4096 bits",
                "cap-64-decimal-1000.toml", "5:1: decimal:1000 holds 3323 significant bits, more than the precision cap of 64 bits"));
    }

    /**
     * Builds each spec of {@code expected} (files of {@link #SPECS}) into {@code out}, which holds
     * earlier outputs, and asserts the exit code, a message that starts with the spec's path and
     * the expected text, and an output folder unchanged.
     */
    static void assertBuildsRefused(Path out, int code, Map<String, String> expected) throws IOException {
        Files.writeString(out.resolve("manifest.json"), "{}\n");
        Files.writeString(out.resolve("old.csv"), "old\n");
        Map<String, String> before = snapshot(out);
        for (Map.Entry<String, String> e : expected.entrySet()) {
            CliRunner.Result r = CliRunner.run("build", SPECS + e.getKey(), "--out", out.toString());
            assertEquals(code, r.code(), e.getKey() + ": " + r.err());
            assertTrue(r.err().startsWith("odetab: " + SPECS + e.getKey() + ":" + e.getValue()), r.err());
            assertEquals(before, snapshot(out), e.getKey());
        }
    }

    /** Every file of {@code dir} by name, with its contents. */
    static Map<String, String> snapshot(Path dir) throws IOException {
        Map<String, String> m = new TreeMap<>();
        try (Stream<Path> files = Files.list(dir)) {
            for (Path p : (Iterable<Path>) files::iterator) {
                m.put(p.getFileName().toString(), Files.readString(p));
            }
        }
        return m;
    }
}
