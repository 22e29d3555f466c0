package dev.odetab.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Hostile input to the parsers (issue 17, item 5): nesting and size beyond the documented limits
 * is bad input (exit 2) with its position, never a stack overflow or an out-of-memory error, and
 * the output folder is left as it was.
 */
class ParserLimitsTest {
    private static final String HEAD = String.join("\n", "[functions.f]", "equation = \"y'' = x*y\"", "at = \"0\"", "slope = \"0\"", "");
    private static final String TABLE = String.join("\n", "[tables.t]", "function = \"f\"",
            "grid = { from = \"0\", to = \"1\", step = \"1/2\" }", "outputs = [\"csv\"]", "");

    @TempDir
    Path tmp;

    /** Builds {@code spec} into an output folder holding an older file; asserts exit 2, the message's start, and an unchanged folder. */
    private void refused(String spec, String messageStart) throws Exception {
        Path file = tmp.resolve("hostile.toml");
        Files.writeString(file, spec, StandardCharsets.UTF_8);
        refused(file, messageStart);
    }

    private void refused(Path file, String messageStart) throws Exception {
        Path out = Files.createDirectories(tmp.resolve("out"));
        Files.writeString(out.resolve("t.csv"), "x,value\n");
        String before = FolderHash.of(out);
        CliRunner.Result r = CliRunner.run("build", file.toString(), "--out", out.toString(), "--quiet");
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().startsWith("odetab: " + messageStart), "message: " + r.err());
        assertEquals(1, r.err().lines().count(), "one line, no stack trace: " + r.err());
        assertEquals(before, FolderHash.of(out), "the output folder changed");
    }

    @Test
    void deepParenthesesInAnExpression() throws Exception {
        String value = "(".repeat(2000) + "1" + ")".repeat(2000);
        refused(HEAD + "value = \"" + value + "\"\n" + TABLE, tmp.resolve("hostile.toml") + ":5:");
    }

    @Test
    void aSumOfThreeThousandTerms() throws Exception {
        String value = "1" + "+1".repeat(2999);
        refused(HEAD + "value = \"" + value + "\"\n" + TABLE, tmp.resolve("hostile.toml") + ":5:");
    }

    @Test
    void anEquationThatIsTooDeep() throws Exception {
        String spec = HEAD.replace("y'' = x*y", "y'' = " + "-".repeat(300) + "x*y") + "value = \"1\"\n" + TABLE;
        refused(spec, tmp.resolve("hostile.toml") + ":2:");
    }

    @Test
    void expressionsAtTheLimitStillWork() throws Exception {
        // 255 operands: a tree 256 levels deep (255 additions over the first operand) is accepted
        String value = "1/255" + "+1/255".repeat(254);
        Path file = tmp.resolve("limit.toml");
        Files.writeString(file, HEAD + "value = \"" + value + "\"\n" + TABLE);
        CliRunner.Result r = CliRunner.run("build", file.toString(), "--out", tmp.resolve("ok").toString(), "--quiet");
        assertEquals(0, r.code(), r.err());
    }

    @Test
    void deepInlineTablesAndArrays() throws Exception {
        refused(TABLE + "x = " + "{a = ".repeat(1000) + "1" + "}".repeat(1000) + "\n", tmp.resolve("hostile.toml") + ":5:");
        refused(TABLE + "x = " + "[".repeat(100_000) + "]".repeat(100_000) + "\n", tmp.resolve("hostile.toml") + ":5:");
    }

    @Test
    void bracketsInStringsAndCommentsAreNotNesting() throws Exception {
        Path file = tmp.resolve("strings.toml");
        Files.writeString(file, "title = \"" + "[".repeat(200) + "\" # " + "{".repeat(200) + "\n" + HEAD + "value = '''" + "[".repeat(100)
                + "'''\n".replace("'''\n", "1'''\n") + TABLE);
        CliRunner.Result r = CliRunner.run("build", file.toString(), "--out", tmp.resolve("ok").toString(), "--quiet");
        assertTrue(r.err().contains("strings.toml:6:"), "the value's own error, not nesting: " + r.err());
    }

    @Test
    void aSpecBeyondFourMebibytesOrADevice() throws Exception {
        Path big = tmp.resolve("big.toml");
        Files.writeString(big, ("# " + "x".repeat(1000) + "\n").repeat(4300));
        refused(big, big + ": the spec is larger than 4 MiB");
        Path zero = Path.of("/dev/zero");
        if (Files.exists(zero)) {
            refused(zero, "/dev/zero: the spec is larger than 4 MiB");
        }
    }

    @Test
    void aByteOrderMarkIsSkipped() throws Exception {
        Path file = tmp.resolve("bom.toml");
        Files.writeString(file, "\uFEFF" + HEAD + "value = \"1\"\n" + TABLE, StandardCharsets.UTF_8);
        CliRunner.Result r = CliRunner.run("build", file.toString(), "--out", tmp.resolve("bom").toString(), "--quiet");
        assertEquals(0, r.code(), r.err());
        Files.writeString(file, "\uFEFF" + HEAD + "value = \"1 +\"\n" + TABLE, StandardCharsets.UTF_8);
        r = CliRunner.run("build", file.toString(), "--out", tmp.resolve("bom").toString(), "--quiet");
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().startsWith("odetab: " + file + ":5:"), "columns count from after the mark: " + r.err());
    }
}
