package dev.odetab.spec;

import dev.odetab.base.InputError;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;

/**
 * The limits a spec is held to before the TOML reader sees it (README, "Limits"): its size,
 * read with a bound so that a device or an endless file fails at once, and the nesting of its
 * arrays and inline tables, measured by a scan that knows TOML's strings and comments, because
 * the TOML reader descends recursively and would exhaust the stack on deep nesting. A UTF-8 byte
 * order mark, which some editors write, is accepted and skipped.
 */
final class TomlLimits {
    /** The largest spec read, in bytes. */
    static final int MAX_BYTES = 4 << 20;
    /** The deepest nesting of arrays and inline tables. */
    static final int MAX_DEPTH = 64;

    private TomlLimits() {
    }

    /** The bytes of the spec at {@code path}, refused beyond {@link #MAX_BYTES}. */
    static byte[] read(Path path, String display) throws IOException, InputError {
        try (InputStream in = Files.newInputStream(path)) {
            byte[] buf = in.readNBytes(MAX_BYTES + 1);
            if (buf.length > MAX_BYTES) {
                throw new InputError(display, "the spec is larger than " + (MAX_BYTES >> 20) + " MiB (the limit for a spec file)");
            }
            return Arrays.copyOf(buf, buf.length);
        }
    }

    /** {@code text} without a leading byte order mark. */
    static String withoutBom(String text) {
        return text.startsWith("\uFEFF") ? text.substring(1) : text;
    }

    /** Refuses arrays and inline tables nested deeper than {@link #MAX_DEPTH}, at the bracket that goes too deep. */
    static void checkNesting(String text, String display) throws InputError {
        int depth = 0;
        int line = 1;
        int lineStart = 0;
        int i = 0;
        int n = text.length();
        while (i < n) {
            char c = text.charAt(i);
            if (c == '\n') {
                line++;
                lineStart = i + 1;
                i++;
            } else if (c == '#') {
                while (i < n && text.charAt(i) != '\n') {
                    i++;
                }
            } else if (c == '"' || c == '\'') {
                boolean multi = text.startsWith(c == '"' ? "\"\"\"" : "'''", i);
                int j = i + (multi ? 3 : 1);
                while (j < n) {
                    char d = text.charAt(j);
                    if (d == '\\' && c == '"') {
                        j += 2;
                        continue;
                    }
                    if (d == c && (!multi || text.startsWith(c == '"' ? "\"\"\"" : "'''", j))) {
                        break;
                    }
                    if (d == '\n') {
                        if (!multi) {
                            break;
                        }
                        line++;
                        lineStart = j + 1;
                    }
                    j++;
                }
                // an unterminated string is the TOML reader's error to report
                i = Math.min(n, j + (j < n && text.charAt(j) == c ? (multi ? 3 : 1) : 0));
            } else {
                if (c == '[' || c == '{') {
                    depth++;
                    if (depth > MAX_DEPTH) {
                        throw new InputError(display + ":" + line + ":" + (i - lineStart + 1),
                                "arrays and inline tables nest deeper than " + MAX_DEPTH + " levels (the limit for a spec)");
                    }
                } else if ((c == ']' || c == '}') && depth > 0) {
                    depth--;
                }
                i++;
            }
        }
    }
}
