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

    @Test
    void familiesListsEquationsAndParameterRanges() {
        CliRunner.Result r = CliRunner.run("families");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().startsWith("airy-ai  Airy function Ai(x) (DLMF 9.2)\n    equation   y'' - x*y = 0\n    parameters none\n"), r.out());
        assertTrue(r.out().contains("laguerre-l  generalized Laguerre polynomial L_n^(alpha)(x) (DLMF 18.3, 18.8)\n"
                + "    equation   x*y'' + (alpha + 1 - x)*y' + n*y = 0\n"), r.out());
        assertTrue(r.out().contains("    alpha (optional, default 0): "), r.out());
    }

    @Test
    void evalExplainsFixedPointAndRoundingDirections() {
        String h = help("eval");
        assertTrue(h.contains("fixed:s16.15 is 16 bits with 15 fraction bits (Q-format Q0.15, \"Q15\"), fixed:u32.24 is UQ8.24."), h);
        assertTrue(h.contains("toward-negative (never above the exact value; alias down); toward-positive (never below it; alias up)"), h);
    }
}
