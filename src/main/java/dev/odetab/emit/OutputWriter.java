package dev.odetab.emit;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.security.SecureRandom;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Writes a build's files: every file first goes to a temporary file in the output folder, and
 * only when all are written are they renamed over their targets (atomic rename where the file
 * system has it). A build that fails before that leaves every existing file as it was.
 */
public final class OutputWriter {
    private static final SecureRandom RANDOM = new SecureRandom();
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
     * A new empty file {@code .odetab-N.tmp} in {@code dir}. Unlike {@link Files#createTempFile},
     * which makes it readable by its owner only, it gets the permissions of any new file (the
     * umask applies), which the output keeps after the rename.
     */
    static Path createTemporary(Path dir) throws IOException {
        while (true) {
            Path tmp = dir.resolve(".odetab-" + Long.toUnsignedString(RANDOM.nextLong()) + ".tmp");
            try {
                return Files.createFile(tmp);
            } catch (FileAlreadyExistsException e) {
                // another name
            }
        }
    }

    /** Writes every file into {@code dir} (created when missing). */
    public static void write(Path dir, Map<String, byte[]> files) throws IOException {
        Files.createDirectories(dir);
        Map<String, Path> staged = new LinkedHashMap<>();
        try {
            for (Map.Entry<String, byte[]> e : files.entrySet()) {
                Path tmp = createTemporary(dir);
                staged.put(e.getKey(), tmp);
                Files.write(tmp, e.getValue());
            }
            commit(dir, staged);
        } finally {
            for (Path tmp : staged.values()) {
                Files.deleteIfExists(tmp);
            }
        }
    }

    /**
     * Renames each staged file (a temporary file in {@code dir}) over its target. Every name is
     * checked first, so a name outside the folder moves nothing.
     */
    static void commit(Path dir, Map<String, Path> staged) throws IOException {
        for (String name : staged.keySet()) {
            if (!dir.resolve(name).normalize().startsWith(dir.normalize())) {
                throw new IOException("refusing to write outside the output folder: " + name);
            }
        }
        for (Map.Entry<String, Path> e : staged.entrySet()) {
            Path target = dir.resolve(e.getKey()).normalize();
            try {
                Files.move(e.getValue(), target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException x) {
                Files.move(e.getValue(), target, StandardCopyOption.REPLACE_EXISTING);
            }
        }
    }
}
