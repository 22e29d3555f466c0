package dev.odetab.audit;

import dev.odetab.cli.CliRunner;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** Runs one more audit and returns its SVG, to compare the bytes of two runs. */
final class ErrorPlotSvg {
    private ErrorPlotSvg() {
    }

    static byte[] again(Path spec, Path file, Path report) throws IOException {
        CliRunner.Result r = CliRunner.run("audit", spec + "#ai32", file.toString(), "--report", report.toString());
        if (r.code() != 0) {
            throw new AssertionError(r.err());
        }
        return Files.readAllBytes(report.resolve("error.svg"));
    }
}
