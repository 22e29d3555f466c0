package dev.odetab.emit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import dev.odetab.emit.EveryFormatBuild.Array;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The C output compiles as strict C99 and holds exactly the bits of the CSV: hex floating
 * constants are exact (ISO/IEC 9899:1999 6.4.4.2), so a program that copies every element's
 * bytes into a uint32_t/uint64_t (7.21.2.1 memcpy, 7.18.1.1 exact-width types) and prints them
 * must print the bits odetab computed. gcc is required: CI installs it, and a missing compiler
 * fails this test rather than skipping it.
 */
class CCompileTest {
    private static final List<String> GCC_FLAGS = List.of("-std=c99", "-pedantic", "-Wall", "-Wextra", "-Werror");

    @Test
    void everyFormatCompilesAndPrintsTheCsvBits(@TempDir Path work) throws Exception {
        requireGcc();
        Path out = EveryFormatBuild.dir();
        List<Array> arrays = EveryFormatBuild.arrays();
        List<String> expected = new ArrayList<>();
        for (Array a : arrays) {
            for (int i = 0; i < a.expected().size(); i++) {
                expected.add(a.table().name() + " " + a.name() + " " + i + " " + a.expected().get(i));
            }
        }
        Path program = work.resolve("print_bits.c");
        Files.writeString(program, printer(arrays), StandardCharsets.UTF_8);
        List<String> command = new ArrayList<>(List.of("gcc"));
        command.addAll(GCC_FLAGS);
        command.addAll(List.of("-I", out.toString(), "-o", work.resolve("print_bits").toString(), program.toString()));
        try (Stream<Path> files = Files.list(out)) {
            files.filter(p -> p.toString().endsWith(".c")).sorted().forEach(p -> command.add(p.toString()));
        }
        Run compile = run(command);
        assertEquals(0, compile.code(), "gcc " + String.join(" ", GCC_FLAGS) + " rejects the emitted C:\n" + compile.output());
        Run printed = run(List.of(work.resolve("print_bits").toString()));
        assertEquals(0, printed.code(), printed.output());
        EveryFormatBuild.assertSameLines(expected, printed.output().lines().toList(), "C bits against the CSV");
        assertTrue(expected.size() > 200, "the spec should exercise many entries, found " + expected.size());
    }

    /** A C99 program printing "TABLE ARRAY INDEX ELEMENT" for every element of every array. */
    private static String printer(List<Array> arrays) {
        StringBuilder c = new StringBuilder("""
                #include <inttypes.h>
                #include <stdint.h>
                #include <stdio.h>
                #include <string.h>
                """);
        Set<String> tables = new LinkedHashSet<>();
        arrays.forEach(a -> tables.add(a.table().name()));
        for (String t : tables) {
            c.append("#include \"").append(t.toLowerCase(Locale.ROOT)).append(".h\"\n");
        }
        c.append("\nint main(void) {\n    int i;\n");
        for (Array a : arrays) {
            String t = a.table().name();
            String array = t.toLowerCase(Locale.ROOT) + "_" + a.name();
            String length = t.toUpperCase(Locale.ROOT) + "_LENGTH";
            String label = t + " " + a.name() + " %d ";
            c.append("    for (i = 0; i < ").append(length).append("; i++) {\n");
            switch (a.kind()) {
                case BINARY32_BITS -> c.append("        uint32_t b;\n        memcpy(&b, &").append(array).append("[i], sizeof b);\n")
                        .append("        printf(\"").append(label).append("%08\" PRIx32 \"\\n\", i, b);\n");
                case BINARY64_BITS -> c.append("        uint64_t b;\n        memcpy(&b, &").append(array).append("[i], sizeof b);\n")
                        .append("        printf(\"").append(label).append("%016\" PRIx64 \"\\n\", i, b);\n");
                case BINARY16_BITS -> c.append("        printf(\"").append(label).append("%04x\\n\", i, (unsigned) ").append(array).append("[i]);\n");
                case UINT64_BITS -> c.append("        printf(\"").append(label).append("%016\" PRIx64 \"\\n\", i, ").append(array).append("[i]);\n");
                case STRING -> c.append("        printf(\"").append(label).append("%s\\n\", i, ").append(array).append("[i]);\n");
                case SIGNED_INTEGER -> c.append("        printf(\"").append(label).append("%\" PRId64 \"\\n\", i, (int64_t) ").append(array).append("[i]);\n");
                case UNSIGNED_INTEGER -> c.append("        printf(\"").append(label).append("%\" PRIu64 \"\\n\", i, (uint64_t) ").append(array).append("[i]);\n");
            }
            c.append("    }\n");
        }
        return c.append("    return 0;\n}\n").toString();
    }

    static void requireGcc() {
        try {
            Run r = run(List.of("gcc", "--version"));
            if (r.code() != 0) {
                fail("this test needs gcc (CI installs it), and 'gcc --version' failed:\n" + r.output());
            }
        } catch (IOException e) {
            fail("this test needs gcc on the PATH (CI installs it; apt-get install gcc): " + e.getMessage());
        }
    }

    record Run(int code, String output) {
    }

    static Run run(List<String> command) throws IOException {
        Process p = new ProcessBuilder(command).redirectErrorStream(true).start();
        try {
            String output = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
            if (!p.waitFor(60, TimeUnit.SECONDS)) {
                p.destroyForcibly();
                fail("timed out: " + String.join(" ", command));
            }
            return new Run(p.exitValue(), output);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("interrupted", e);
        }
    }
}
