package dev.odetab.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.emit.EveryFormatBuild;
import java.io.IOException;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * DESIGN.md "Outputs" and "Command line": the same spec gives the same bytes (manifest.json
 * included, whatever --jobs, with or without --quiet); {@code --check} writes nothing and exits
 * 1 naming a changed file; outputs are written atomically, so a build that fails leaves every
 * file as it was, and leaves no temporary file behind.
 */
class BuildDeterminismTest {
    private static final String DIR = "src/test/resources/build/";

    /** Every file under {@code dir} (hidden ones too) by relative name, with its bytes; empty when absent. */
    static Map<String, byte[]> snapshot(Path dir) throws IOException {
        Map<String, byte[]> r = new TreeMap<>();
        if (!Files.exists(dir)) {
            return r;
        }
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.filter(Files::isRegularFile).toList()) {
                r.put(dir.relativize(p).toString(), Files.readAllBytes(p));
            }
        }
        return r;
    }

    static void assertSameFiles(Map<String, byte[]> expected, Map<String, byte[]> actual, String what) {
        assertEquals(expected.keySet(), actual.keySet(), what + ": file names");
        for (String name : expected.keySet()) {
            assertArrayEquals(expected.get(name), actual.get(name), what + ": bytes of " + name);
        }
    }

    @Test
    void buildingTwiceGivesTheSameBytesWhateverTheJobs() throws IOException {
        Map<String, byte[]> first = snapshot(EveryFormatBuild.dir());
        assertTrue(first.containsKey("manifest.json") && first.size() > 20, "files of the first build: " + first.keySet());
        for (String jobs : new String[] {"1", "2"}) {
            // a sibling of the first build's folder: provenance names the spec relative to the output folder
            Path again = EveryFormatBuild.dir().resolveSibling("every-format-jobs" + jobs);
            EveryFormatBuild.deleteTree(again);
            CliRunner.Result r = CliRunner.run("build", EveryFormatBuild.SPEC.toString(), "--out", again.toString(), "--jobs", jobs,
                    "--quiet");
            assertEquals(0, r.code(), r.err());
            assertEquals("", r.err(), "--quiet: nothing on stderr");
            assertSameFiles(first, snapshot(again), "a second build with --jobs " + jobs);
        }
    }

    @Test
    void checkPassesAfterABuildAndNamesAChangedFile(@TempDir Path tmp) throws IOException {
        Path out = tmp.resolve("out");
        String spec = DIR + "small.toml";
        assertEquals(0, CliRunner.run("build", spec, "--out", out.toString()).code());

        CliRunner.Result clean = CliRunner.run("build", spec, "--out", out.toString(), "--check");
        assertEquals(0, clean.code(), clean.err());
        assertEquals("odetab: 5 files in " + out + " are up to date\n", clean.out());

        Path changed = out.resolve("small.c");
        Files.writeString(changed, Files.readString(changed).replace("0x1p+0", "0x1.0000000000001p+0"));
        Files.delete(out.resolve("Small.java"));
        Map<String, byte[]> before = snapshot(out);
        CliRunner.Result dirty = CliRunner.run("build", spec, "--out", out.toString(), "--check");
        assertEquals(1, dirty.code(), dirty.out() + dirty.err());
        assertEquals("odetab: would change " + out.resolve("Small.java") + " (missing)\n"
                + "odetab: would change " + changed + " (differs)\n", dirty.out());
        assertEquals("", dirty.err());
        assertSameFiles(before, snapshot(out), "--check wrote nothing");
    }

    @Test
    void aBuildThatFailsHalfWayChangesNothing(@TempDir Path tmp) throws IOException {
        Path out = tmp.resolve("out");
        assertEquals(0, CliRunner.run("build", DIR + "atomic-good.toml", "--out", out.toString()).code());
        Map<String, byte[]> before = snapshot(out);
        assertEquals(5, before.size(), before.keySet().toString());

        // the first table of each failing spec has other points, so writing it would change every file
        CliRunner.Result range = CliRunner.run("build", DIR + "atomic-out-of-range.toml", "--out", out.toString());
        assertEquals(2, range.code(), range.err());
        assertEquals("odetab: " + DIR + "atomic-out-of-range.toml:20:1: table second: the value at x = 0 lies outside the range of fixed:s16.15 "
                + "(out_of_range = \"error\"; choose a wider format or out_of_range = \"saturate\")\n", range.err());
        assertSameFiles(before, snapshot(out), "after a build failing on an out-of-range entry");

        CliRunner.Result undecided = CliRunner.run("build", DIR + "atomic-undecided.toml", "--out", out.toString());
        assertEquals(3, undecided.code(), undecided.err());
        assertEquals("odetab: " + DIR + "atomic-undecided.toml:21:1: table second: the precision cap of 128 bits cannot decide the rounding of 1 row(s), at x = 0 "
                + "(if such a value is an exact rounding boundary, for example an exact zero of a solution that is not a polynomial "
                + "under a directed rounding, no cap decides it: change the rounding or leave the point out; otherwise raise "
                + "precision_cap_bits)\n", undecided.err());
        assertSameFiles(before, snapshot(out), "after a build failing at the precision cap");

        // outputs are streamed to temporary files as they are rendered: the first table's are
        // written when the second table's template fails; none may remain (snapshot sees hidden files)
        CliRunner.Result template = CliRunner.run("build", DIR + "atomic-template-error.toml", "--out", out.toString());
        assertEquals(2, template.code(), template.err());
        assertTrue(template.err().startsWith("odetab: " + DIR + "templates/execute.ftl:2:1: template error: "), template.err());
        assertSameFiles(before, snapshot(out), "after a build failing in a template");

        for (String spec : new String[] {"atomic-out-of-range.toml", "atomic-template-error.toml"}) {
            Path fresh = tmp.resolve("fresh/deeper");
            assertEquals(2, CliRunner.run("build", DIR + spec, "--out", fresh.toString()).code());
            assertFalse(Files.exists(fresh.getParent()), "a failed build creates no output folder: " + spec);
        }
    }

    @Test
    void outputsGetTheUsualPermissionsOfNewFiles(@TempDir Path tmp) throws IOException {
        if (!FileSystems.getDefault().supportedFileAttributeViews().contains("posix")) {
            return;
        }
        Path out = tmp.resolve("out");
        assertEquals(0, CliRunner.run("build", DIR + "small.toml", "--out", out.toString()).code());
        // a file created the ordinary way gets 0666 minus the umask; an output should too, not owner-only
        Path plain = Files.createFile(tmp.resolve("plain"));
        for (String name : snapshot(out).keySet()) {
            assertEquals(Files.getPosixFilePermissions(plain), Files.getPosixFilePermissions(out.resolve(name)), name);
        }
    }
}
