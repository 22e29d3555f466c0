package dev.odetab.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Byte-for-byte regeneration does not depend on how the spec's path is typed nor on the working
 * directory: provenance records the spec's path relative to the output folder.
 */
class SpecPathSpellingTest {
    private static final Path SPEC = Path.of("src/test/resources/build/small.toml");

    @Test
    void everySpellingOfTheSpecPathPassesCheck(@TempDir Path tmp) throws IOException, InterruptedException {
        Path out = tmp.resolve("out");
        CliRunner.Result built = CliRunner.run("build", SPEC.toString(), "--out", out.toString(), "--quiet");
        assertEquals(0, built.code(), built.err());
        String expected = out.toAbsolutePath().relativize(SPEC.toAbsolutePath()).toString().replace('\\', '/');
        assertTrue(Files.readString(out.resolve("small.c")).contains(" * spec:          " + expected + " (sha256 "),
                Files.readString(out.resolve("small.c")));

        for (String spelling : List.of("./" + SPEC, SPEC.toAbsolutePath().toString(), "src/test/../test/resources/build/small.toml")) {
            CliRunner.Result r = CliRunner.run("build", spelling, "--out", out.toString(), "--check", "--quiet");
            assertEquals(0, r.code(), spelling + ": " + r.out() + r.err());
        }

        // From the spec's own folder, in a process whose working directory is that folder.
        Path java = Path.of(System.getProperty("java.home"), "bin", "java");
        Process p = new ProcessBuilder(java.toString(), "-cp", System.getProperty("java.class.path"), Main.class.getName(),
                "build", "small.toml", "--out", out.toAbsolutePath().toString(), "--check", "--quiet")
                .directory(SPEC.toAbsolutePath().getParent().toFile()).redirectErrorStream(true).start();
        String output = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(120, TimeUnit.SECONDS), "the build from the spec's folder did not end");
        assertEquals(0, p.exitValue(), output);
    }
}
