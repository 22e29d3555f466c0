package dev.odetab.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.security.DigestInputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;

/**
 * What a folder holds, to assert that a command changed nothing: every entry's name, hidden
 * ones included, with the SHA-256 of a file's bytes (Java SE MessageDigest) or {@code folder}.
 */
final class FolderState {
    private FolderState() {
    }

    /** Name → SHA-256 (or "folder") of every entry of {@code dir}, recursively; empty when {@code dir} is missing. */
    static Map<String, String> of(Path dir) {
        Map<String, String> state = new TreeMap<>();
        if (!Files.exists(dir)) {
            return state;
        }
        try (Stream<Path> all = Files.walk(dir)) {
            for (Path p : all.toList()) {
                if (!p.equals(dir)) {
                    state.put(dir.relativize(p).toString(), Files.isDirectory(p, LinkOption.NOFOLLOW_LINKS) ? "folder" : sha256(p));
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return state;
    }

    /** {@link #of} without odetab's own hidden files ({@code .odetab-*}: lock, journal, temporaries). */
    static Map<String, String> outputs(Path dir) {
        Map<String, String> state = of(dir);
        state.keySet().removeIf(name -> name.startsWith(".odetab-"));
        return state;
    }

    private static String sha256(Path file) throws IOException {
        try {
            MessageDigest md = MessageDigest.getInstance("SHA-256");
            try (InputStream in = new DigestInputStream(Files.newInputStream(file), md)) {
                in.transferTo(OutputStream.nullOutputStream());
            }
            return HexFormat.of().formatHex(md.digest());
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }
}
