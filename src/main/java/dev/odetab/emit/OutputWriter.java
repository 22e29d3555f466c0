package dev.odetab.emit;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.security.SecureRandom;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;

/**
 * Writes a build's files: every file first goes to a temporary file in the output folder, and
 * only when all are written are they renamed over their targets (atomic rename where the file
 * system has it). A build that fails before that leaves every existing file as it was.
 */
public final class OutputWriter {
    private static final SecureRandom RANDOM = new SecureRandom();

    private OutputWriter() {
    }

    /** Files that differ from what would be written (for {@code --check}), sorted by name. */
    public static List<String> differences(Path dir, Map<String, byte[]> files) throws IOException {
        List<String> diff = new ArrayList<>();
        for (Map.Entry<String, byte[]> e : files.entrySet()) {
            Path p = dir.resolve(e.getKey());
            if (!Files.isRegularFile(p)) {
                diff.add(e.getKey() + " (missing)");
            } else if (!Arrays.equals(Files.readAllBytes(p), e.getValue())) {
                diff.add(e.getKey() + " (differs)");
            }
        }
        return diff;
    }

    /**
     * A new empty file {@code .odetab-N.tmp} in {@code dir}. Unlike {@link Files#createTempFile},
     * which makes it readable by its owner only, it gets the permissions of any new file (the
     * umask applies), which the output keeps after the rename.
     */
    private static Path createTemporary(Path dir) throws IOException {
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
        List<Path[]> moves = new ArrayList<>();
        try {
            for (Map.Entry<String, byte[]> e : files.entrySet()) {
                Path target = dir.resolve(e.getKey()).normalize();
                if (!target.startsWith(dir.normalize())) {
                    throw new IOException("refusing to write outside the output folder: " + e.getKey());
                }
                Path tmp = createTemporary(dir);
                moves.add(new Path[] {tmp, target});
                Files.write(tmp, e.getValue());
            }
        } catch (IOException | RuntimeException ex) {
            for (Path[] m : moves) {
                Files.deleteIfExists(m[0]);
            }
            throw ex;
        }
        for (Path[] m : moves) {
            try {
                Files.move(m[0], m[1], StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(m[0], m[1], StandardCopyOption.REPLACE_EXISTING);
            }
        }
    }
}
