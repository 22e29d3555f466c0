package dev.odetab.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.cli.CliRunner;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Audit compares a foreign table with the engine at exact grid points; a quadrature table (its
 * nodes are found, not given) is refused as bad input, named, never audited against wrong points.
 */
class AuditFoundTablesTest {
    @Test
    void aQuadratureTableIsRefusedWithItsName(@TempDir Path tmp) throws Exception {
        Path spec = tmp.resolve("gl.toml");
        Files.writeString(spec, String.join("\n", "title = \"Quillmere Instruments: Gauss-Legendre audit check\"",
                "[functions.p3]", "family = \"legendre-p\"", "n = 3",
                "[tables.gl3]", "kind = \"quadrature\"", "function = \"p3\"", "columns = [\"node\", \"weight\"]",
                "format = \"binary64\"", "outputs = [\"csv\"]", ""));
        // The 3-point rule of A&S 25.4 (nodes 0, ±√(3/5), weights 8/9, 5/9), as some other tool might have written it.
        Path csv = tmp.resolve("gl3.csv");
        Files.writeString(csv, "node,weight\n-0.7745966692414834,0.5555555555555556\n0,0.8888888888888888\n0.7745966692414834,0.5555555555555556\n");
        CliRunner.Result r = CliRunner.run("audit", spec + "#gl3", csv.toString(), "--column", "weight");
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().contains("table gl3 is a zeros or quadrature table"), r.err());
    }
}
