package dev.odetab.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** What a new user reads first: each command's --help states the facts the README states. */
class HelpTextTest {
    private static String help(String command) {
        CliRunner.Result r = CliRunner.run(command, "--help");
        assertEquals(0, r.code(), r.err());
        return r.out().replaceAll("\\s+", " ");
    }

    @Test
    void auditNamesEveryExitCode() {
        String h = help("audit");
        assertTrue(h.contains("Exit codes: 0 every entry is within the tolerance; 1 some entry is beyond it; 2 bad input"), h);
        assertTrue(h.contains("3 the precision cap cannot settle an entry."), h);
    }

    @Test
    void buildSaysJobsAlsoSplitsLongTables() {
        String h = help("build");
        assertTrue(h.contains("tables, and the chunks of a long table, run in parallel; the bytes never depend on N"), h);
    }
}
