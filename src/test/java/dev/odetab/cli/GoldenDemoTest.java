package dev.odetab.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Golden files (STYLE.md "Tests"): the demo spec rebuilds tables/out/ byte for byte. The spec
 * is named by the same relative path as in the committed provenance (the tests run from the
 * project root). With {@code -Dgolden.update=true} the test rewrites tables/out/ instead, to
 * be committed with the change that caused it.
 */
class GoldenDemoTest {
    private static final String SPEC = "tables/quillmere.toml";
    private static final Path GOLDEN = Path.of("tables/out");

    @Test
    void demoSpecRebuildsTheCommittedTables(@TempDir Path tmp) throws IOException {
        Path out = tmp.resolve("out");
        CliRunner.Result r = CliRunner.run("build", SPEC, "--out", out.toString());
        assertEquals(0, r.code(), r.err());
        Map<String, byte[]> rebuilt = BuildDeterminismTest.snapshot(out);
        if (Boolean.getBoolean("golden.update")) {
            for (String name : BuildDeterminismTest.snapshot(GOLDEN).keySet()) {
                Files.delete(GOLDEN.resolve(name));
            }
            for (Map.Entry<String, byte[]> e : rebuilt.entrySet()) {
                Files.write(GOLDEN.resolve(e.getKey()), e.getValue());
            }
            return;
        }
        BuildDeterminismTest.assertSameFiles(BuildDeterminismTest.snapshot(GOLDEN), rebuilt,
                "tables/out against a rebuild of " + SPEC + " (regenerate with -Dgolden.update=true if the change is intended)");
    }
}
