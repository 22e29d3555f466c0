package dev.odetab.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.emit.OutputFolder;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 17, the output transaction against kills and concurrent builds, with the real command
 * line in child JVMs. The children run with {@code -Dodetab.test.commitPauseMillis} (read only
 * by {@link OutputFolder#commit}, for tests), which makes the commit window last long enough
 * to be hit. Every folder starts with the old outputs (small.toml) and the child builds the new
 * ones (small-v2.toml: another grid, one more table); after a SIGKILL the folder must hold the
 * old outputs whole, or the new ones whole once the journal is completed, and the next build
 * must write exactly what an uninterrupted build writes, leaving no hidden file behind.
 * Randomized: {@code -Dtest.seed=N} repeats a run; the seed is in every failure message.
 */
class KillAndLockTest {
    private static final String DIR = "src/test/resources/hostile/txn/";
    private static final String PAUSE = "120";

    @TempDir
    Path tmp;
    private final long seed = Long.getLong("test.seed", System.nanoTime());
    private final Random random = new Random(seed);
    /** The folder's state after an uninterrupted build of small.toml (old) and of small-v2.toml (fresh). */
    private Map<String, String> old;
    private Map<String, String> fresh;

    @BeforeEach
    void references() {
        old = reference("small.toml");
        fresh = reference("small-v2.toml");
    }

    private static Process child(Path out, String spec, Path log, Path workDir) throws IOException {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        List<String> command = new ArrayList<>(List.of(java, "-Dodetab.test.commitPauseMillis=" + PAUSE,
                "-cp", System.getProperty("java.class.path"), "dev.odetab.cli.Main", "build", Path.of(spec).toAbsolutePath().toString(),
                "--quiet", "--out", out.toString()));
        ProcessBuilder pb = new ProcessBuilder(command).redirectErrorStream(true).redirectOutput(log.toFile());
        if (workDir != null) {
            pb.directory(workDir.toFile());
        }
        return pb.start();
    }

    private static void buildInProcess(String spec, Path out) {
        CliRunner.Result r = CliRunner.run("build", spec, "--quiet", "--out", out.toString());
        assertEquals(0, r.code(), r.err());
    }

    private static void await(Process p) throws InterruptedException {
        if (!p.waitFor(2, TimeUnit.MINUTES)) {
            p.destroyForcibly();
            throw new AssertionError("a child build did not end");
        }
    }

    /**
     * The state after a kill: without a journal, the old or the new outputs whole; with one,
     * the new outputs whole once it is completed (by opening the folder as any next run does).
     * Then the next build writes the new outputs exactly, and nothing else stays in the folder.
     */
    private void assertOldOrNew(Path out, String context) throws IOException {
        if (Files.exists(out.resolve(".odetab-journal"))) {
            OutputFolder.open(out).close();
            assertEquals(fresh, FolderState.of(out), context + ": the folder after completing the journal");
        } else {
            Map<String, String> now = FolderState.outputs(out);
            assertTrue(now.equals(old) || now.equals(fresh), context + ": neither the old nor the new outputs: " + now.keySet());
        }
        buildInProcess(DIR + "small-v2.toml", out);
        assertEquals(fresh, FolderState.of(out), context + ": the next build's folder");
    }

    @Test
    void aBuildKilledAtAnyMomentLeavesTheOldOrTheNewOutputs() throws Exception {
        for (int i = 0; i < 4; i++) {
            Path out = tmp.resolve("kill" + i);
            buildInProcess(DIR + "small.toml", out);
            int delay = random.nextInt(3000);
            Process p = child(out, DIR + "small-v2.toml", tmp.resolve("log" + i), null);
            p.waitFor(delay, TimeUnit.MILLISECONDS);
            p.destroyForcibly();
            await(p);
            assertOldOrNew(out, "seed " + seed + ", killed after " + delay + " ms");
        }
    }

    @Test
    void aBuildKilledInsideTheCommitWindowIsCompletedByTheNextRun() throws Exception {
        Path out = tmp.resolve("out");
        Process p = inCommitWindow(out);
        int delay = random.nextInt(4 * Integer.parseInt(PAUSE));
        p.waitFor(delay, TimeUnit.MILLISECONDS);
        p.destroyForcibly();
        await(p);
        String context = "seed " + seed + ", killed " + delay + " ms after the journal appeared";
        assertTrue(Files.exists(out.resolve(".odetab-journal")), context + ": the journal is still there");
        CliRunner.Result next = CliRunner.run("build", DIR + "small-v2.toml", "--quiet", "--out", out.toString());
        assertEquals(0, next.code(), next.err());
        assertTrue(next.err().startsWith("odetab: " + out + ": completed the commit of an interrupted run"), context + ": " + next.err());
        assertEquals(fresh, FolderState.of(out), context + ": the next build's folder");
        assertFalse(old.equals(fresh), "the two specs must give different outputs");
    }

    @Test
    void aSecondBuildIntoALockedFolderIsRefusedAndTheFirstCompletes() throws Exception {
        Path out = tmp.resolve("out");
        Process first = inCommitWindow(out);
        CliRunner.Result second = CliRunner.run("build", DIR + "small.toml", "--quiet", "--out", out.toString());
        assertEquals(2, second.code(), second.err());
        assertEquals("odetab: cannot write the outputs: another odetab (process " + first.pid() + ") is writing to " + out
                + "; run again when it has finished\n", second.err());
        await(first);
        assertEquals(0, first.exitValue(), Files.readString(tmp.resolve("log")));
        assertEquals(fresh, FolderState.of(out), "the first build's outputs, whole");
    }

    /** {@code --out .} and {@code --out ""} name the working folder (they were refused as outside it). */
    @Test
    void theWorkingFolderIsAnOutputFolder() throws Exception {
        for (String out : new String[] {".", ""}) {
            Path work = Files.createDirectory(tmp.resolve("work" + out.length()));
            Process p = child(Path.of(out), DIR + "small.toml", tmp.resolve("log" + out.length()), work);
            await(p);
            assertEquals(0, p.exitValue(), Files.readString(tmp.resolve("log" + out.length())));
            assertEquals(old, FolderState.of(work), "--out '" + out + "'");
        }
    }

    private Map<String, String> reference(String spec) {
        Path out = tmp.resolve("reference-" + spec);
        buildInProcess(DIR + spec, out);
        return FolderState.of(out);
    }

    /** A child building small-v2.toml over small.toml's outputs in {@code out}, once its journal is written. */
    private Process inCommitWindow(Path out) throws IOException, InterruptedException {
        buildInProcess(DIR + "small.toml", out);
        Process p = child(out, DIR + "small-v2.toml", tmp.resolve("log"), null);
        waitForJournal(out, p);
        return p;
    }

    private static void waitForJournal(Path out, Process p) throws InterruptedException {
        while (!Files.exists(out.resolve(".odetab-journal"))) {
            if (!p.isAlive()) {
                throw new AssertionError("the child ended before its commit (exit " + p.exitValue() + ")");
            }
            Thread.sleep(2);
        }
    }
}
