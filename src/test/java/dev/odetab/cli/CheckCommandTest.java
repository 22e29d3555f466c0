package dev.odetab.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code odetab check}: the shipped reference data pass; a planted wrong digit fails with exit 1 and its line. */
class CheckCommandTest {
    @Test
    void shippedReferenceDataPass() {
        CliRunner.Result r = CliRunner.run("check");
        assertEquals(0, r.code(), r.out() + r.err());
        assertTrue(r.out().contains("PASS  airy-apfloat-1.15.0.csv  (apfloat 1.15.0): 2004 values"), r.out());
        assertTrue(r.out().contains("PASS  identity W{Ai, Bi} = 1/pi  (DLMF 9.2.7)"), r.out());
        assertTrue(r.out().endsWith("sources pass\n"), r.out());
    }

    @Test
    void aWrongDigitFails(@TempDir Path dir) throws Exception {
        // Ai(1) = 0.13529241631288141552 (from memory, confirmed by the shipped data); the last digit changed by 2.
        Files.writeString(dir.resolve("planted.csv"), "function,parameters,x,quantity,value,source\n"
                + "airy-ai,,1,value,0.13529241631288141554,planted error\n");
        CliRunner.Result r = CliRunner.run("check", "--data", dir.toString());
        assertEquals(1, r.code(), r.out() + r.err());
        assertTrue(r.out().contains("FAIL  planted.csv  (planted error): 1 values"), r.out());
        assertTrue(r.out().contains("planted.csv:2: airy-ai value at x = 1: reference 0.13529241631288141554 is not consistent"), r.out());
    }

    @Test
    void malformedDataIsExitTwoWithItsLine(@TempDir Path dir) throws Exception {
        Files.writeString(dir.resolve("bad.csv"), "function,parameters,x,quantity,value,source\nairy-ai,,1,value\n");
        CliRunner.Result r = CliRunner.run("check", "--data", dir.toString());
        assertEquals(2, r.code());
        assertEquals("odetab: bad.csv:2:1: expected 6 fields (function,parameters,x,quantity,value,source), found 4\n", r.err());
    }
}
