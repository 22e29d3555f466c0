package dev.odetab.emit;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Writes a set of files into an output folder all or nothing ({@link OutputFolder}: temporary
 * files, checks, journal, renames), and compares staged files with those on disk for
 * {@code --check}.
 */
public final class OutputWriter {
    private static final int CHUNK = 1 << 16;

    private OutputWriter() {
    }

    /**
     * Files that differ from their staged versions (for {@code --check}): {@code NAME (missing)}
     * or {@code NAME (differs)}, in the order of {@code staged}. Both are read in chunks, never
     * whole.
     */
    public static List<String> differences(Path dir, Map<String, Path> staged) throws IOException {
        List<String> diff = new ArrayList<>();
        for (Map.Entry<String, Path> e : staged.entrySet()) {
            Path p = dir.resolve(e.getKey());
            if (!Files.isRegularFile(p)) {
                diff.add(e.getKey() + " (missing)");
            } else if (!sameBytes(p, e.getValue())) {
                diff.add(e.getKey() + " (differs)");
            }
        }
        return diff;
    }

    private static boolean sameBytes(Path a, Path b) throws IOException {
        if (Files.size(a) != Files.size(b)) {
            return false;
        }
        try (InputStream x = Files.newInputStream(a); InputStream y = Files.newInputStream(b)) {
            while (true) {
                byte[] u = x.readNBytes(CHUNK);
                byte[] v = y.readNBytes(CHUNK);
                if (!Arrays.equals(u, v)) {
                    return false;
                }
                if (u.length < CHUNK) {
                    return true;
                }
            }
        }
    }

    /**
     * Writes every file into {@code dir} (created when missing) through {@link OutputFolder}:
     * all or nothing, under the folder's lock. Returns what opening the folder did to recover
     * from an interrupted run ({@link OutputFolder#notices}).
     */
    public static List<String> write(Path dir, Map<String, byte[]> files) throws IOException {
        try (OutputFolder folder = OutputFolder.open(dir)) {
            Map<String, Path> staged = new LinkedHashMap<>();
            try {
                for (Map.Entry<String, byte[]> e : files.entrySet()) {
                    Path tmp = folder.createTemporary();
                    staged.put(e.getKey(), tmp);
                    Files.write(tmp, e.getValue());
                }
                folder.commit(staged);
            } finally {
                for (Path tmp : staged.values()) {
                    Files.deleteIfExists(tmp);
                }
            }
            return folder.notices();
        }
    }
}
