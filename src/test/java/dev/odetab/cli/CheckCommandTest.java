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
    void orthogonalPolynomialSourcesAndIdentitiesPass() {
        CliRunner.Result r = CliRunner.run("check");
        assertEquals(0, r.code(), r.out() + r.err());
        for (String line : new String[] {
            "PASS  orthogonal-polynomials-closed-forms.csv  (DLMF 14.5.1; DLMF 18.6.1; DLMF 18.5.13; "
                    + "DLMF 18.5.13 with He_n(x) = 2^(-n/2) H_n(x/sqrt 2); DLMF 18.5.1): 243 values",
            "PASS  orthogonal-polynomials-commons-math3-3.6.1.csv  (commons-math3 3.6.1): 156 values",
            "PASS  identity (n+1) P_n+1 = (2n+1) x P_n - n P_n-1  (DLMF 18.9.1): 6 values",
            "PASS  identity T_n+1 = 2x T_n - T_n-1  (DLMF 18.9.1): 6 values",
            "PASS  identity H_n+1 = 2x H_n - 2n H_n-1  (DLMF 18.9.1): 6 values",
            "PASS  identity (n+1) L_n+1 = (2n+1-x) L_n - n L_n-1  (DLMF 18.9.1): 6 values",
            "PASS  identity W{P_n, Q_n} = 1/(1-x^2)  (DLMF 14.2.4 (mu = 0)): 9 values",
            "PASS  cross-check of BallFunctions  (big-math 2.3.2, an independent implementation): 19 values",
        }) {
            assertTrue(r.out().contains(line + "\n") || r.out().contains(line + ", worst"), line + "\n" + r.out());
        }
        assertTrue(r.out().endsWith("odetab check: all 14 sources pass\n"), r.out());
    }

    @Test
    void aWrongPolynomialValueFails(@TempDir Path dir) throws Exception {
        // P_4(0) = 3/8 (DLMF 14.5.1), written exactly with 40 digits, then the last digit changed by 1: an exact
        // reference must agree within half a unit of its last digit, so this fails.
        Files.writeString(dir.resolve("planted.csv"), "function,parameters,x,quantity,value,source\n"
                + "legendre-p,n=4,0,value,0.3750000000000000000000000000000000000000,DLMF 14.5.1\n"
                + "legendre-p,n=4,0,value,0.3750000000000000000000000000000000000001,planted error\n");
        CliRunner.Result r = CliRunner.run("check", "--data", dir.toString());
        assertEquals(1, r.code(), r.out() + r.err());
        assertTrue(r.out().contains("FAIL  planted.csv  (DLMF 14.5.1; planted error): 2 values"), r.out());
        assertTrue(r.out().contains("planted.csv:3: legendre-p (n=4) value at x = 0: reference 0.3750000000000000000000000000000000000001"), r.out());
        assertTrue(!r.out().contains("planted.csv:2:"), r.out());
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

    @Test
    void theShippedZerosAreChecked() {
        CliRunner.Result r = CliRunner.run("check");
        assertEquals(0, r.code(), r.out() + r.err());
        assertTrue(r.out().contains("PASS  zeros/airy-zeros-apfloat-1.15.0.csv  (apfloat 1.15.0): 200 values\n"), r.out());
    }

    @Test
    void aWrongZeroFails(@TempDir Path dir) throws Exception {
        // a_1 of Ai = -2.3381074104597670384891972524467… (the shipped apfloat zeros file): right to 20 digits, then
        // with its 20th digit changed by one, which moves the interval ± half a unit off the zero
        Files.createDirectories(dir.resolve("zeros"));
        Files.writeString(dir.resolve("zeros/planted.csv"), "function,of,k,zero,other,source\n"
                + "airy-ai,value,1,-2.3381074104597670385,0.7012108227206913625,apfloat 1.15.0\n"
                + "airy-ai,value,1,-2.3381074104597670386,0.7012108227206913625,planted error\n");
        String out = failingCheck(dir);
        assertTrue(out.contains("FAIL  zeros/planted.csv  (apfloat 1.15.0; planted error): 2 values\n"), out);
        assertTrue(out.contains("zeros/planted.csv:3: zero 1 of airy-ai: no proven sign change between the ends of "
                + "-2.3381074104597670386 ± ½ unit of its last digit"), out);
        assertTrue(!out.contains("planted.csv:2:"), out);
    }

    /** The output of a check of {@code dir} that must fail with exit 1. */
    private static String failingCheck(Path dir) {
        CliRunner.Result r = CliRunner.run("check", "--data", dir.toString());
        assertEquals(1, r.code(), r.out() + r.err());
        return r.out();
    }
}
