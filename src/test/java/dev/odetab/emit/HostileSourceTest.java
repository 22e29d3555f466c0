package dev.odetab.emit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.cli.CliRunner;
import dev.odetab.cli.FolderHash;
import java.lang.reflect.Field;
import java.lang.reflect.Method;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.tools.DiagnosticCollector;
import javax.tools.JavaCompiler;
import javax.tools.JavaFileObject;
import javax.tools.StandardJavaFileManager;
import javax.tools.ToolProvider;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Hostile text cannot become code in a generated source (issue 17, item 1): a spec in a folder
 * whose name holds a comment end, with a title and a function name that try to close the comment
 * (directly, through a Java Unicode escape, with a bidirectional control), builds C and Java
 * that compile warning-free and declare nothing but the table; table names that are reserved
 * words are refused at the spec line and leave the output folder as it was.
 */
class HostileSourceTest {
    private static final String HOSTILE = "f */ int odetab_injected; /* \\\\u002a/ int odetab_injected2; /* \\u202E \\u0007 \\\\";

    @Test
    void commentEscapes() {
        assertEquals("a *\\/ b /\\* c", SourceText.comment("a */ b /* c"));
        assertEquals("\\\\u002a/", SourceText.comment("\\u002a/"));
        assertEquals("x<U+000A>y<U+202E>z<U+0000>", SourceText.comment("x\ny\u202Ez\u0000"));
        assertEquals("Gauss–Hermite π ≤ 1", SourceText.comment("Gauss–Hermite π ≤ 1"));
        assertEquals("<U+D800>", SourceText.comment("\uD800"));
        assertEquals("\uD835\uDF0B", SourceText.comment("\uD835\uDF0B"));
    }

    @Test
    void hostileTextCompilesAsCommentsOnly(@TempDir Path tmp) throws Exception {
        Path dir = Files.createDirectories(tmp.resolve("evil*"));
        Path spec = dir.resolve("s.toml");
        Files.writeString(spec, String.join("\n",
                "title = \"" + HOSTILE + "\"",
                "[functions.\"" + HOSTILE + "\"]", "equation = \"y'' = x*y\"", "at = \"0\"", "value = \"1\"", "slope = \"0\"",
                "[tables.hostile]", "function = \"" + HOSTILE + "\"", "grid = { from = \"0\", to = \"1\", step = \"1/2\" }",
                "columns = [\"x\", \"value\"]", "outputs = [\"c\", \"java\", \"csv\"]", ""), StandardCharsets.UTF_8);
        Path out = tmp.resolve("out");
        CliRunner.Result r = CliRunner.run("build", spec.toString(), "--out", out.toString(), "--quiet");
        assertEquals(0, r.code(), r.err());
        String c = Files.readString(out.resolve("hostile.c"));
        assertTrue(c.contains("../evil*\\/s.toml"), c);
        assertTrue(c.contains("<U+202E>"), c);

        CCompileTest.requireGcc();
        for (String file : List.of("hostile.c", "hostile.h")) {
            CCompileTest.Run cc = CCompileTest.run(List.of("gcc", "-std=c99", "-pedantic", "-Wall", "-Wextra", "-Werror", "-fsyntax-only", "-x", "c",
                    out.resolve(file).toString()));
            assertEquals(0, cc.code(), file + ":\n" + cc.output());
            CCompileTest.Run code = CCompileTest.run(List.of("gcc", "-fpreprocessed", "-E", "-x", "c", out.resolve(file).toString()));
            assertEquals(0, code.code(), code.output());
            assertFalse(code.output().contains("odetab_injected"), "code outside comments:\n" + code.output());
        }

        JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
        assertNotNull(javac, "the tests need a JDK");
        Path classes = tmp.resolve("classes");
        DiagnosticCollector<JavaFileObject> diagnostics = new DiagnosticCollector<>();
        try (StandardJavaFileManager fm = javac.getStandardFileManager(diagnostics, Locale.ROOT, StandardCharsets.UTF_8)) {
            List<String> options = List.of("-Xlint:all", "-Werror", "--release", "17", "-d", classes.toString());
            boolean ok = javac.getTask(null, fm, diagnostics, options, null,
                    fm.getJavaFileObjectsFromFiles(List.of(out.resolve("Hostile.java").toFile()))).call();
            assertTrue(ok, "javac: " + diagnostics.getDiagnostics());
        }
        try (URLClassLoader loader = new URLClassLoader(new URL[] {classes.toUri().toURL()}, null)) {
            Class<?> k = loader.loadClass("Hostile");
            List<String> members = new ArrayList<>();
            for (Field f : k.getDeclaredFields()) {
                members.add(f.getName());
            }
            for (Method m : k.getDeclaredMethods()) {
                members.add(m.getName() + "()");
            }
            members.sort(null);
            assertEquals(List.of("LENGTH", "VALUE", "X", "value()", "x()"), members);
        }
    }

    @Test
    void reservedTableNamesAreRefusedAtTheSpecLine(@TempDir Path tmp) throws Exception {
        Path out = Files.createDirectories(tmp.resolve("out"));
        Files.writeString(out.resolve("keep.c"), "/* an older output */\n");
        String before = FolderHash.of(out);
        for (String name : List.of("int", "Class", "TRUE", "null", "String", "namespace")) {
            Path spec = tmp.resolve(name + ".toml");
            Files.writeString(spec, String.join("\n", "# a table named after a reserved word", "[tables." + name + "]",
                    "function = \"airy-ai\"", "grid = { from = \"0\", to = \"1\", step = \"1/2\" }", "outputs = [\"c\", \"java\"]", ""));
            CliRunner.Result r = CliRunner.run("build", spec.toString(), "--out", out.toString(), "--quiet");
            assertEquals(2, r.code(), name + ": " + r.err());
            assertTrue(r.err().startsWith("odetab: " + spec + ":2:1: table name '" + name + "' would make the "), r.err());
            assertEquals(before, FolderHash.of(out), name + ": the output folder changed");
        }
    }
}
