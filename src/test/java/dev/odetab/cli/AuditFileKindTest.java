package dev.odetab.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * An audited FILE that is not a regular file (a FIFO waited forever for a writer, issue 17 item 4;
 * a folder) is refused at once as bad input, naming the file, and no report is written.
 */
class AuditFileKindTest {
    private static final String TABLE = "tables/inherited/inherited.toml#ai_legacy";

    @Test
    void aFifoIsRefusedWithoutWaiting(@TempDir Path tmp) throws Exception {
        Path fifo = tmp.resolve("table.csv");
        int made;
        try {
            made = new ProcessBuilder("mkfifo", fifo.toString()).start().waitFor();
        } catch (java.io.IOException e) {
            made = -1;
        }
        assumeTrue(made == 0, "mkfifo is not available here");
        CliRunner.Result r = CliRunner.run("audit", TABLE, fifo.toString(), "--report", tmp.resolve("report").toString());
        assertEquals(2, r.code(), r.err());
        assertEquals("odetab: " + fifo + ": not a regular file (a FIFO, a device or a folder): audit reads a table from a file\n", r.err());
        assertTrue(Files.notExists(tmp.resolve("report")));
    }

    @Test
    void aFolderIsRefused(@TempDir Path tmp) throws Exception {
        Path dir = Files.createDirectory(tmp.resolve("table.c"));
        CliRunner.Result r = CliRunner.run("audit", TABLE, dir.toString(), "--report", tmp.resolve("report").toString());
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().startsWith("odetab: " + dir + ": not a regular file"), r.err());
        assertTrue(Files.notExists(tmp.resolve("report")));
    }
}
