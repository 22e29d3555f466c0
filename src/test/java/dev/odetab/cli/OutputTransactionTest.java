package dev.odetab.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.emit.OutputFolder;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 17, the output transaction (hostile inputs of its own under
 * {@code src/test/resources/hostile/txn/}): a build or an audit that fails changes no file of
 * the folder it writes to (every entry hashed before and after, hidden ones included), says
 * where the problem is, and exits 2; an interrupted commit is completed by the next run, and
 * its leftovers are deleted.
 */
class OutputTransactionTest {
    private static final String DIR = "src/test/resources/hostile/txn/";

    /** Builds small.toml into {@code out}: the old outputs that every refused command must leave alone. */
    private static Path builtFolder(Path tmp) {
        Path out = tmp.resolve("out");
        CliRunner.Result r = CliRunner.run("build", DIR + "small.toml", "--out", out.toString());
        assertEquals(0, r.code(), r.err());
        return out;
    }

    /** Runs the command, expects exit 2 and exactly {@code message} on stderr, and that {@code watched} did not change. */
    private static void refused(Path watched, String message, String... args) {
        Map<String, String> before = FolderState.of(watched);
        CliRunner.Result r = CliRunner.run(args);
        assertEquals(2, r.code(), "exit code of " + String.join(" ", args) + "; stderr: " + r.err());
        assertEquals("odetab: " + message + "\n", r.err());
        assertEquals("", r.out());
        assertEquals(before, FolderState.of(watched), "the folder after " + String.join(" ", args));
    }

    @Test
    void tableNamesDifferingOnlyInCaseAreRefusedAtTheSpecLine(@TempDir Path tmp) {
        Path out = builtFolder(tmp);
        refused(out, DIR + "case-collision.toml:10:1: table AI would write AI.csv, which differs only in case from Ai.csv of table Ai (at "
                + DIR + "case-collision.toml:3:1): on a case-insensitive file system one would replace the other; rename one of the tables",
                "build", DIR + "case-collision.toml", "--out", out.toString());
    }

    @Test
    void twoTablesWritingOneCFileAreRefusedBeforeEvaluation(@TempDir Path tmp) {
        Path out = builtFolder(tmp);
        refused(out, DIR + "c-clash.toml:16:1: table BI would write bi.h, which table Bi (at " + DIR
                + "c-clash.toml:9:1) writes too: rename one of the tables",
                "build", DIR + "c-clash.toml", "--out", out.toString());
    }

    @Test
    void aSpecWithoutTablesBuildsNothingAndKeepsTheManifest(@TempDir Path tmp) {
        Path out = builtFolder(tmp);
        for (String spec : new String[] {"empty.toml", "comment-only.toml", "functions-only.toml"}) {
            refused(out, DIR + spec + ":1:1: nothing to build: the spec defines no table ([tables.NAME])",
                    "build", DIR + spec, "--out", out.toString());
        }
    }

    @Test
    void aFolderWhereAnOutputGoesStopsTheBuildBeforeAnyRename(@TempDir Path tmp) throws IOException {
        Path out = builtFolder(tmp);
        Files.delete(out.resolve("Ai.java"));
        Files.createDirectory(out.resolve("Ai.java"));
        refused(out, "cannot write the outputs: " + out.resolve("Ai.java") + " is a folder; nothing was written (remove it or choose another output folder)",
                "build", DIR + "small-v2.toml", "--out", out.toString());
    }

    @Test
    void anOutputFolderThatIsAFileIsNamed(@TempDir Path tmp) throws IOException {
        Path file = Files.writeString(tmp.resolve("afile"), "not a folder");
        refused(tmp, "cannot write the outputs: " + file + " is a file, not a folder", "build", DIR + "small.toml", "--out", file.toString());
        refused(tmp, "cannot write the outputs: " + file.resolve("sub") + ": " + file + " is a file, not a folder",
                "build", DIR + "small.toml", "--out", file.resolve("sub").toString());
    }

    @Test
    void aLockedFolderIsRefusedAndFreeAgainWhenReleased(@TempDir Path tmp) throws IOException {
        Path out = builtFolder(tmp);
        try (OutputFolder held = OutputFolder.open(out)) {
            refused(tmp, "cannot write the outputs: another odetab (process " + ProcessHandle.current().pid() + ") is writing to " + out
                    + "; run again when it has finished", "build", DIR + "small-v2.toml", "--out", out.toString());
        }
        assertEquals(0, CliRunner.run("build", DIR + "small-v2.toml", "--out", out.toString()).code());
        assertTrue(FolderState.of(out).containsKey("bi.csv"), "the new outputs");
    }

    /**
     * A commit interrupted after its journal was written (one of two renames done) and stray
     * temporaries: the next build completes the commit, deletes the temporaries, says so, and
     * then writes exactly what a build into a clean folder writes.
     */
    @Test
    void theNextBuildCompletesAnInterruptedCommitAndSweepsLeftovers(@TempDir Path tmp) throws IOException {
        Path clean = tmp.resolve("clean");
        assertEquals(0, CliRunner.run("build", DIR + "small-v2.toml", "--out", clean.toString()).code());
        Path out = builtFolder(tmp);
        Files.writeString(out.resolve(".odetab-1.tmp"), "the new ai.csv");
        Files.writeString(out.resolve(".odetab-2.tmp"), "a temporary the killed run had not listed yet");
        Files.writeString(out.resolve(".odetab-journal"), "odetab journal 1\n.odetab-3.tmp\tAi.java\n.odetab-1.tmp\tai.csv\n");
        CliRunner.Result r = CliRunner.run("build", DIR + "small-v2.toml", "--out", out.toString());
        assertEquals(0, r.code(), r.err());
        assertEquals("odetab: " + out + ": completed the commit of an interrupted run (1 of 2 files were still to be renamed)\n"
                + "odetab: " + out + ": deleted 1 temporary file(s) left by an interrupted run\n", r.err());
        assertEquals(FolderState.of(clean), FolderState.of(out), "the outputs after the recovery and the build");
    }

    /** A journal naming a target outside the folder (damaged, or written by someone else) moves nothing. */
    @Test
    void aJournalNamingAFileOutsideTheFolderMovesNothing(@TempDir Path tmp) throws IOException {
        Path out = builtFolder(tmp);
        Files.writeString(out.resolve(".odetab-1.tmp"), "int odetab_injected;");
        Files.writeString(out.resolve(".odetab-journal"), "odetab journal 1\n.odetab-1.tmp\t../escape.c\n");
        refused(tmp, "cannot write the outputs: " + out.resolve(".odetab-journal") + " is damaged (line '.odetab-1.tmp\t../escape.c');"
                + " remove it after checking the folder", "build", DIR + "small.toml", "--out", out.toString());
    }

    @Test
    void anAuditDoesNotReplaceTheReportOfAnotherFile(@TempDir Path tmp) throws IOException {
        Path out = builtFolder(tmp);
        Files.copy(out.resolve("ai.csv"), out.resolve("good.csv"));
        Files.copy(out.resolve("Ai.java"), out.resolve("good.java"));
        CliRunner.Result first = CliRunner.run("audit", DIR + "small.toml#ai", out.resolve("good.csv").toString());
        assertEquals(0, first.code(), first.err());
        refused(out, "argument 3 '" + out.resolve("good.java") + "', column 1: the default report folder " + out.resolve("good.audit")
                + " holds the report of " + out.resolve("good.csv") + "; name another folder with --report",
                "audit", DIR + "small.toml#ai", out.resolve("good.java").toString());
        CliRunner.Result other = CliRunner.run("audit", DIR + "small.toml#ai", out.resolve("good.java").toString(),
                "--report", out.resolve("good-java.audit").toString());
        assertEquals(0, other.code(), other.err());
    }

    @Test
    void aBlockedReportFolderLeavesTheOldReportWhole(@TempDir Path tmp) throws IOException {
        Path out = builtFolder(tmp);
        Path csv = out.resolve("ai.csv");
        assertEquals(0, CliRunner.run("audit", DIR + "small.toml#ai", csv.toString()).code());
        Path report = out.resolve("ai.audit");
        Files.delete(report.resolve("error.png"));
        Files.createDirectory(report.resolve("error.png"));
        refused(report, "cannot write the report: " + report.resolve("error.png") + " is a folder; nothing was written (remove it or choose another output folder)",
                "audit", DIR + "small.toml#ai", csv.toString(), "--tolerance", "2");
    }
}
