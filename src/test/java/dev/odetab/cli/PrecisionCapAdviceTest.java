package dev.odetab.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * ψ₁'(x) = √2 π^(-1/4) (1 − x²) e^(−x²/2) (DLMF 18.3 with 18.5.13's H_1 = 2x) vanishes exactly at x = ±1, where no
 * precision decides a directed rounding: the build stops (exit 3), names both points apart, and says that raising
 * the cap cannot help there.
 */
class PrecisionCapAdviceTest {
    @Test
    void anExactZeroUnderADirectedRoundingIsNamedWithTheRightAdvice(@TempDir Path tmp) throws IOException {
        Path spec = tmp.resolve("psi1.toml");
        Files.writeString(spec, String.join("\n", "[functions.psi1]", "family = \"hermite-function\"", "n = 1",
                "[tables.slope]", "function = \"psi1\"", "grid = { from = \"-2\", to = \"2\", step = \"1\" }",
                "columns = [\"x\", \"derivative\"]", "rounding = \"toward-negative\"", "precision_cap_bits = 256", ""));
        CliRunner.Result r = CliRunner.run("build", spec.toString(), "--out", tmp.resolve("out").toString(), "--quiet");
        assertEquals(3, r.code(), r.out() + r.err());
        assertTrue(r.err().contains("cannot decide the rounding of 2 row(s), at x = -1, 1 (if such a value is an exact rounding "
                + "boundary, for example an exact zero of a solution that is not a polynomial under a directed rounding, no cap "
                + "decides it"), r.err());
    }
}
