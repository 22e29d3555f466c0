package dev.odetab.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * Golden files (STYLE.md "Tests"): the README's command {@code ./odetab build tables/quillmere.toml}
 * leaves tables/out/ as committed, byte for byte: {@code --check} finds no difference (the tests
 * run from the project root). With {@code -Dgolden.update=true} the test builds tables/out/
 * instead, to be committed with the change that caused it.
 */
class GoldenDemoTest {
    private static final String SPEC = "tables/quillmere.toml";

    @Test
    void demoSpecRebuildsTheCommittedTables() {
        if (Boolean.getBoolean("golden.update")) {
            CliRunner.Result r = CliRunner.run("build", SPEC, "--quiet");
            assertEquals(0, r.code(), r.err());
            return;
        }
        CliRunner.Result r = CliRunner.run("build", SPEC, "--check", "--quiet");
        assertEquals(0, r.code(), "tables/out against a rebuild of " + SPEC
                + " (regenerate with -Dgolden.update=true if the change is intended):\n" + r.out() + r.err());
    }
}
