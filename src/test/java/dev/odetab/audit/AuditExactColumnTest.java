package dev.odetab.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.cli.CliRunner;
import java.io.IOException;
import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The README's audit example, and the report's exact column: every digit it prints is decided,
 * so the true value (apfloat 1.15.0, ApfloatMath.airyAi at 40 digits, an independent library)
 * lies within half a unit in its last digit.
 */
class AuditExactColumnTest {
    @Test
    void theReadmeExampleFindsTheLegacyErrorsAndPrintsOnlyDecidedDigits(@TempDir Path tmp) throws IOException {
        Path report = tmp.resolve("report");
        CliRunner.Result r = CliRunner.run("audit", "tables/inherited/inherited.toml#ai_legacy", "tables/inherited/ai_legacy.c",
                "--report", report.toString());
        assertEquals(1, r.code(), r.err());
        assertTrue(r.out().contains("max |error|     36.2680 ulp"), r.out());
        List<String> lines = Files.readAllLines(report.resolve("audit.csv"));
        assertTrue(lines.get(0).startsWith("index,x,entry,line,column,exact,exact_digits,"), lines.get(0));
        assertEquals(98, lines.size());
        for (String line : lines.subList(1, lines.size())) {
            String[] c = line.split(",");
            BigDecimal exact = new BigDecimal(c[5]);
            int digits = Integer.parseInt(c[6]);
            assertEquals(digits, exact.precision(), line);
            // binary32 entries: the enclosure is within 2^-10 ulp, so at least 10 digits are decided
            assertTrue(digits >= 10, line);
            if (c[1].equals("0")) {
                continue; // apfloat holds 0 at infinite precision and cannot evaluate there; Ai(0) is in reference-data
            }
            BigDecimal truth = new BigDecimal(ApfloatMath.airyAi(new Apfloat(c[1], 40)).toString(true));
            BigDecimal halfUnit = BigDecimal.ONE.scaleByPowerOfTen(-exact.scale()).multiply(new BigDecimal("0.5"));
            assertTrue(truth.subtract(exact).abs().compareTo(halfUnit) <= 0,
                    "x = " + c[1] + ": " + exact + " against " + truth + " (half unit " + halfUnit + ")");
        }
        // Ai(2) = 0.034924130423274379135… : twelve decided digits, no undecided tail
        assertTrue(lines.get(97).startsWith("96,2,3.492408991e-02f,"), lines.get(97));
        assertEquals("0.0349241304233", lines.get(97).split(",")[5]);
    }
}
