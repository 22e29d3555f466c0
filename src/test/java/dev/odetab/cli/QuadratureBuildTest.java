package dev.odetab.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Quadrature tables through the command line (DESIGN.md "Spec file", exit codes): a weight below
 * the smallest normal number of the format (IEEE 754-2019 §3.3: 2^-14 for binary16) stops the
 * build with exit 2 and names both remedies; with {@code weight_underflow = "flush"} it is written
 * as 0 and flagged in {@code weight_flag}.
 */
class QuadratureBuildTest {
    private static final String RULE = """
            [functions.h24]
            family = "hermite-h"
            n = 24

            [tables.gh24]
            kind = "quadrature"
            function = "h24"
            format = "binary16"
            """;

    @Test
    void underflowingWeightsStopTheBuildUnlessFlushed(@TempDir Path tmp) throws Exception {
        Path spec = tmp.resolve("gh.toml");
        Files.writeString(spec, RULE);
        Path out = tmp.resolve("out");
        CliRunner.Result r = CliRunner.run("build", spec.toString(), "--out", out.toString());
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().matches("(?s)odetab: \\S*gh\\.toml:\\d+:\\d+: table gh24: 12 weights, at nodes from x = -6\\.0159.*") && r.err().contains("underflow binary16")
                && r.err().contains("weight_underflow = \"flush\"") && r.err().contains("scaled_weight"), r.err());
        assertFalse(Files.exists(out), "nothing is written");

        Files.writeString(spec, RULE + "weight_underflow = \"flush\"\ncolumns = [\"node\", \"weight\", \"scaled_weight\"]\n");
        r = CliRunner.run("build", spec.toString(), "--out", out.toString());
        assertEquals(0, r.code(), r.err());
        List<String> csv = Files.readAllLines(out.resolve("gh24.csv"));
        assertEquals("node,node_hex,weight,weight_hex,weight_flag,weight_flag_hex,scaled_weight,scaled_weight_hex", csv.get(0));
        assertEquals(25, csv.size());
        int flagged = 0;
        for (String line : csv.subList(1, csv.size())) {
            String[] cells = line.split(",");
            boolean flag = cells[4].equals("1");
            assertEquals(flag, cells[2].equals("0"), "a flushed weight is 0 and flagged: " + line);
            assertTrue(flag || cells[4].equals("0"), line);
            assertFalse(cells[6].equals("0"), "scaled weights do not underflow: " + line);
            flagged += flag ? 1 : 0;
        }
        // the six outermost nodes on each side: |x| >= 3.01, w ≈ e^(−x²) · 0.47 < 2^-14 (A&S 25.4.46)
        assertEquals(12, flagged);
    }
}
