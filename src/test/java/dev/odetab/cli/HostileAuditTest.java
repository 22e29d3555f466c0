package dev.odetab.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Hostile audited tables (issue 17, items 6 and 7): an infinite or overflowing entry is a finding
 * (exit 1, reported on its row), a malformed one or a malformed CSV is bad input (exit 2) with its
 * position and no report written; never an internal error (exit 70).
 */
class HostileAuditTest {
    private static final String SPEC = String.join("\n", "[tables.t]", "function = \"airy-ai\"",
            "grid = { from = \"0\", to = \"1\", step = \"1/2\" }", "columns = [\"x\", \"value\"]", "format = \"binary64\"",
            "outputs = [\"csv\"]", "");
    // Ai(0), Ai(1/2), Ai(1) in binary64, as odetab's own CSV of this spec holds them
    private static final String[] GOOD = {"0x1.6b8c7962715b8p-2", "0x1.da822d743844p-3", "0x1.151430bbaf656p-3"};

    @TempDir
    Path tmp;

    private CliRunner.Result audit(String file, String content) throws Exception {
        Path spec = tmp.resolve("t.toml");
        Files.writeString(spec, SPEC);
        Path table = tmp.resolve(file);
        Files.writeString(table, content);
        return CliRunner.run("audit", spec + "#t", table.toString());
    }

    private static String array(String first) {
        return "const double t_value[3] = { " + first + ", " + GOOD[1] + ", " + GOOD[2] + " };\n";
    }

    @Test
    void infiniteAndOverflowingEntriesAreFindings() throws Exception {
        for (String entry : new String[] {"INFINITY", "-INFINITY", "Double.POSITIVE_INFINITY", "HUGE_VAL", "1e400", "0x1p99999999999",
            "1e999999999", "-1e999999999"}) {
            CliRunner.Result r = audit("t.c", array(entry));
            assertEquals(1, r.code(), entry + ": " + r.err());
            assertTrue(r.out().contains("entries beyond  0.5 ulp: 1 "), entry + ": " + r.out());
            assertTrue(r.out().contains("         0  x = 0"), entry + ": the finding names entry 0\n" + r.out());
        }
    }

    @Test
    void entriesBelowEveryFormatAreHeldAsZero() throws Exception {
        for (String entry : new String[] {"1e-999999999", "0x1.8p-99999999999"}) {
            CliRunner.Result r = audit("t.c", array(entry));
            assertEquals(1, r.code(), entry + ": " + r.err());
            assertTrue(r.out().contains("entries beyond  0.5 ulp: 1 "), entry + ": " + r.out());
        }
        CliRunner.Result zero = audit("t.c", array("0e99999999999"));
        assertEquals(1, zero.code(), zero.err());
    }

    @Test
    void csvInfinitiesAreFindings() throws Exception {
        CliRunner.Result r = audit("t.csv", "x,value\n0,inf\n0.5,-Infinity\n1,1e999999999\n");
        assertEquals(1, r.code(), r.err());
        assertTrue(r.out().contains("entries beyond  0.5 ulp: 3 "), r.out());
    }

    private void refused(String file, String content, String where, String what) throws Exception {
        CliRunner.Result r = audit(file, content);
        assertEquals(2, r.code(), r.err());
        assertEquals("odetab: " + tmp.resolve(file) + ":" + where + ": " + what + "\n", r.err());
        assertTrue(!Files.exists(tmp.resolve(file.replaceFirst("\\.[a-z]+$", ".audit"))), "no report is written");
    }

    @Test
    void malformedEntriesAreBadInputWithTheirPosition() throws Exception {
        refused("t.c", array("0x1p-1e11"), "1:29", "'0x1p-1e11' is not a numeric literal");
        refused("t.csv", "x,value\n0,1e99x\n0.5," + GOOD[1] + "\n1," + GOOD[2] + "\n", "2:3", "'1e99x' is not a number");
    }

    @Test
    void malformedCsvIsBadInput() throws Exception {
        String rest = "\n1,0x1p+0," + GOOD[2] + "\n";
        refused("extra.csv", "x,x_hex,value\n0,0x0p+0," + GOOD[0] + "\n0.5,0x1p-1," + GOOD[1] + ",9" + rest,
                "3:" + (("0.5,0x1p-1," + GOOD[1] + ",").length() + 1), "this row has 4 field(s), the header 3");
        refused("short.csv", "x,x_hex,value\n0,0x0p+0," + GOOD[0] + "\n0.5,0x1p-1" + rest,
                "3:" + ("0.5,0x1p-1".length() + 1), "this row has 2 field(s), the header 3");
        refused("twice.csv", "x,value,value\n0," + GOOD[0] + "," + GOOD[0] + "\n", "1:9", "the column 'value' appears twice in the header");
        refused("disagree.csv", "x,x_hex,value\n0,0x0p+0," + GOOD[0] + "\n1,0x1p-1," + GOOD[1] + "\n0.5,0x1p+0," + GOOD[2] + "\n",
                "3:1", "x = 1 disagrees with x_hex = 0x1p-1 (grid points 3 and 2)");
    }
}
