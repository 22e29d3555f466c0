package dev.odetab.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.stream.Stream;

/** The SHA-256 of a folder's tree (relative names and file contents), to show that a failed command changed nothing. */
public final class FolderHash {
    private FolderHash() {
    }

    public static String of(Path dir) throws IOException, NoSuchAlgorithmException {
        MessageDigest md = MessageDigest.getInstance("SHA-256");
        try (Stream<Path> files = Files.walk(dir)) {
            for (Path p : files.sorted().toList()) {
                md.update(dir.relativize(p).toString().getBytes(StandardCharsets.UTF_8));
                md.update((byte) 0);
                if (Files.isRegularFile(p)) {
                    md.update(Files.readAllBytes(p));
                }
            }
        }
        return HexFormat.of().formatHex(md.digest());
    }
}
