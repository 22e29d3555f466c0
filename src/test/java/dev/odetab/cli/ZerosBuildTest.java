package dev.odetab.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.reference.AiryZerosReferenceData;
import java.io.IOException;
import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Zeros tables from the command line (DESIGN.md "Command line" exit codes): the provenance says
 * how the count was proved; a search without zeros is refused (exit 2) and a zero the cap cannot
 * decide stops the build (exit 3), both writing nothing.
 */
class ZerosBuildTest {
    private static final String DIR = "src/test/resources/zeros/";

    @Test
    void theOutputsSayHowTheZerosWereCounted(@TempDir Path tmp) throws IOException {
        CliRunner.Result r = CliRunner.run("build", DIR + "ai-zeros.toml", "--out", tmp.toString());
        assertEquals(0, r.code(), r.err());
        String c = Files.readString(tmp.resolve("fringes.c"));
        assertTrue(c.contains("zeros: 5 found walking from 0 toward -10, the walk stopping at x = "), c);
        assertTrue(c.contains("proves y of one sign or y' of one sign"), c);
        String manifest = Files.readString(tmp.resolve("manifest.json"));
        assertTrue(manifest.contains("zeros: 5 found walking from 0 toward -10"), manifest);
        // the zeros of Ai' on [−10, 0] (apfloat 1.15.0 reference file: a'_7 ≈ −9.53, a'_8 ≈ −10.53)
        long inside = AiryZerosReferenceData.read(AiryZerosReferenceData.Kind.AI_PRIME).stream()
                .filter(z -> z.zero().compareTo(BigDecimal.valueOf(-10)) >= 0).count();
        assertEquals(7, inside);
        assertEquals(1 + inside, Files.readAllLines(tmp.resolve("fringe_peaks.csv")).size());
        assertTrue(manifest.contains("zeros: 7 found on [-10, 0], walking from 0"), manifest);
    }

    @Test
    void aSearchWithoutZerosIsBadInput(@TempDir Path tmp) {
        CliRunner.Result r = CliRunner.run("build", DIR + "no-zeros.toml", "--out", tmp.toString());
        assertEquals(2, r.code(), r.err());
        // located at the table's [tables.NAME] line in the spec
        assertTrue(r.err().matches("(?s)odetab: \\S*no-zeros\\.toml:\\d+:\\d+: table dark_side: y has no zero on \\[0, 3\\] \\(proven: .*"), r.err());
        assertFalse(Files.exists(tmp.resolve("dark_side.csv")));
    }

    @Test
    void aZeroThatTheCapCannotDecideIsANumericalLimit(@TempDir Path tmp) {
        CliRunner.Result r = CliRunner.run("build", DIR + "undecided.toml", "--out", tmp.toString());
        assertEquals(3, r.code(), r.err());
        assertTrue(r.err().matches("(?s)odetab: \\S*undecided\\.toml:\\d+:\\d+: table psi1_turning: the precision cap of 256 bits"
                + " cannot decide the zero of y' near x = -1.*"), r.err());
        assertFalse(Files.exists(tmp.resolve("psi1_turning.csv")));
    }
}
