package dev.odetab.emit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.cli.CliRunner;
import dev.odetab.emit.EveryFormatBuild.Array;
import java.io.File;
import java.lang.reflect.Method;
import java.lang.reflect.Modifier;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import javax.tools.DiagnosticCollector;
import javax.tools.JavaCompiler;
import javax.tools.JavaFileObject;
import javax.tools.StandardJavaFileManager;
import javax.tools.ToolProvider;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The Java output compiles with {@code javac -Xlint:all -Werror} (javax.tools, Java SE API) and
 * every accessor returns exactly the entry of the CSV: floating-point entries compared by
 * {@link Double#doubleToRawLongBits} / {@link Float#floatToRawIntBits} (JLS 3.10.2 hex
 * literals are exact), binary16 and binary128 by their encodings, the rest by value.
 */
class JavaCompileTest {
    @Test
    void everyFormatCompilesAndReturnsTheCsvBits(@TempDir Path classes) throws Exception {
        Path out = EveryFormatBuild.dir();
        List<File> sources;
        try (Stream<Path> files = Files.list(out)) {
            sources = files.filter(p -> p.toString().endsWith(".java")).sorted().map(Path::toFile).toList();
        }
        assertEquals(EveryFormatBuild.tables().size(), sources.size(), "one class per table: " + sources);

        JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
        assertNotNull(javac, "the tests need a JDK, not a JRE");
        DiagnosticCollector<JavaFileObject> diagnostics = new DiagnosticCollector<>();
        try (StandardJavaFileManager fm = javac.getStandardFileManager(diagnostics, Locale.ROOT, StandardCharsets.UTF_8)) {
            List<String> options = List.of("-Xlint:all", "-Werror", "--release", "17", "-d", classes.toString());
            boolean ok = javac.getTask(null, fm, diagnostics, options, null, fm.getJavaFileObjectsFromFiles(sources)).call();
            String report = diagnostics.getDiagnostics().stream().map(d -> d.toString()).collect(Collectors.joining("\n"));
            assertTrue(ok, "javac -Xlint:all -Werror rejects the emitted Java:\n" + report);
            assertEquals("", report, "javac diagnostics");
        }

        int checked = 0;
        try (URLClassLoader loader = new URLClassLoader(new URL[] {classes.toUri().toURL()}, null)) {
            for (Array a : EveryFormatBuild.arrays()) {
                Class<?> c = loader.loadClass(EveryFormatBuild.camel(a.table().name()));
                assertTrue(Modifier.isFinal(c.getModifiers()), c + " is final");
                assertEquals(a.expected().size(), c.getField("LENGTH").getInt(null), c + ".LENGTH");
                String accessor = EveryFormatBuild.camel(a.name());
                Method m = c.getMethod(Character.toLowerCase(accessor.charAt(0)) + accessor.substring(1), int.class);
                List<String> actual = new ArrayList<>();
                for (int i = 0; i < a.expected().size(); i++) {
                    actual.add(text(a, m.invoke(null, i)));
                }
                EveryFormatBuild.assertSameLines(a.expected(), actual, c.getName() + "." + m.getName());
                checked += actual.size();
            }
        }
        assertTrue(checked > 200, "the spec should exercise many entries, checked " + checked);
    }

    /**
     * The largest table a spec may send to a java output (8000 array entries, the limit of
     * spec validation) compiles: javac keeps its class initializer under the 65536 bytes of
     * code a method may have (JVMS 4.7.3). Entries 1 … 4000 and their P_2 values are distinct
     * non-trivial doubles, each loaded by ldc2_w at an index needing sipush: the costliest case.
     */
    @Test
    void theLargestTableAllowedInJavaCompiles(@TempDir Path tmp) throws Exception {
        Path spec = tmp.resolve("limit.toml");
        Files.writeString(spec, String.join("\n", "title = \"Quillmere Instruments: the longest Java table\"",
                "[functions.p2]", "family = \"legendre-p\"", "n = 2", "[tables.limit]", "function = \"p2\"",
                "grid = { from = \"1\", to = \"4000\", step = \"1\" }", "columns = [\"x\", \"value\"]", "outputs = [\"java\"]", ""));
        Path out = tmp.resolve("out");
        CliRunner.Result r = CliRunner.run("build", spec.toString(), "--out", out.toString());
        assertEquals(0, r.code(), r.err());
        JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
        DiagnosticCollector<JavaFileObject> diagnostics = new DiagnosticCollector<>();
        try (StandardJavaFileManager fm = javac.getStandardFileManager(diagnostics, Locale.ROOT, StandardCharsets.UTF_8)) {
            List<String> options = List.of("--release", "17", "-d", tmp.resolve("classes").toString());
            boolean ok = javac.getTask(null, fm, diagnostics, options, null,
                    fm.getJavaFileObjectsFromFiles(List.of(out.resolve("Limit.java").toFile()))).call();
            assertTrue(ok, "javac rejects a table of 8000 entries: " + diagnostics.getDiagnostics());
        }
    }

    private static String text(Array a, Object v) {
        return switch (a.kind()) {
            case BINARY32_BITS -> String.format(Locale.ROOT, "%08x", Float.floatToRawIntBits((Float) v));
            case BINARY64_BITS -> String.format(Locale.ROOT, "%016x", Double.doubleToRawLongBits((Double) v));
            case BINARY16_BITS -> String.format(Locale.ROOT, "%04x", ((Short) v) & 0xffff);
            case UINT64_BITS -> String.format(Locale.ROOT, "%016x", (Long) v);
            case STRING -> (String) v;
            // Java has no unsigned types: an unsigned fixed-point format takes the next wider signed one
            case SIGNED_INTEGER, UNSIGNED_INTEGER -> v.toString();
        };
    }

    /** A spec's java_package gives the class a package line, so code in a named package can import it. */
    @Test
    void aJavaPackageMakesTheClassImportable(@TempDir Path tmp) throws Exception {
        Path spec = tmp.resolve("packaged.toml");
        Files.writeString(spec, String.join("\n", "java_package = \"org.example.optics\"", "[tables.ai4]", "function = \"airy-ai\"",
                "grid = { from = \"0\", to = \"1\", step = \"1/4\" }", "columns = [\"x\", \"value\"]", "outputs = [\"java\"]", ""));
        Path user = tmp.resolve("src/org/example/app/Use.java");
        Files.createDirectories(user.getParent());
        Files.writeString(user, String.join("\n", "package org.example.app;", "import org.example.optics.Ai4;",
                "public final class Use {", "    public static double first() {", "        return Ai4.value(0);", "    }", "}", ""));
        Path out = tmp.resolve("out");
        CliRunner.Result r = CliRunner.run("build", spec.toString(), "--out", out.toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(Files.readString(out.resolve("Ai4.java")).contains("\n */\npackage org.example.optics;\n\n/** Table ai4"));
        JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
        DiagnosticCollector<JavaFileObject> diagnostics = new DiagnosticCollector<>();
        Path classes = tmp.resolve("classes");
        try (StandardJavaFileManager fm = javac.getStandardFileManager(diagnostics, Locale.ROOT, StandardCharsets.UTF_8)) {
            List<String> options = List.of("-Xlint:all", "-Werror", "--release", "17", "-d", classes.toString());
            boolean ok = javac.getTask(null, fm, diagnostics, options, null,
                    fm.getJavaFileObjectsFromFiles(List.of(out.resolve("Ai4.java").toFile(), user.toFile()))).call();
            assertTrue(ok, "javac: " + diagnostics.getDiagnostics());
        }
        try (URLClassLoader loader = new URLClassLoader(new URL[] {classes.toUri().toURL()}, null)) {
            // Ai(0) = 0.35502805388781723926… (closed form DLMF 9.2.3; digits recalled from memory, as in
            // reference-data/airy-dlmf-9.2.csv): the binary64 entry is their rounding
            double first = (double) loader.loadClass("org.example.app.Use").getMethod("first").invoke(null);
            assertEquals(0.35502805388781723926, first);
        }
    }
}
