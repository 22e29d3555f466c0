package dev.odetab.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Hostile user templates (issue 17, items 6 and 10): an include that does not exist or leaves the
 * template's folder, an undefined variable and a symbolic link out of the folder are bad input
 * (exit 2) named in our words with the template's line and column, and the output folder is
 * left as it was; never an internal error.
 */
class HostileTemplateTest {
    @TempDir
    Path tmp;

    private void refused(String template, String expected) throws Exception {
        Path file = tmp.resolve("t/x.txt.ftl");
        Files.createDirectories(file.getParent());
        Files.deleteIfExists(file);
        Files.writeString(file, template);
        refused(expected);
    }

    private void refused(String expected) throws Exception {
        Path spec = tmp.resolve("s.toml");
        Files.writeString(spec, String.join("\n", "[tables.t]", "function = \"airy-ai\"",
                "grid = { from = \"0\", to = \"1\", step = \"1/2\" }", "outputs = [\"t/x.txt.ftl\"]", ""));
        Path out = Files.createDirectories(tmp.resolve("out"));
        Files.writeString(out.resolve("t.x.txt"), "an older output\n");
        String before = FolderHash.of(out);
        CliRunner.Result r = CliRunner.run("build", spec.toString(), "--out", out.toString(), "--quiet");
        assertEquals(2, r.code(), r.err());
        assertEquals("odetab: " + Path.of("t/x.txt.ftl") + expected + "\n", r.err().replace(tmp + "/", ""));
        assertEquals(before, FolderHash.of(out), "the output folder changed");
    }

    @Test
    void includesThatAreMissingOrOutside() throws Exception {
        Files.createDirectories(tmp.resolve("outside"));
        Files.writeString(tmp.resolve("outside/o.ftl"), "x\n");
        refused("a\n<#include \"missing.ftl\">\n", ":2:1: template error: the included template 'missing.ftl' does not exist in the template's folder");
        refused("a\n<#include \"../outside/o.ftl\">\n", ":2:1: template error: the included template '../outside/o.ftl' lies outside the template's folder");
        Files.createDirectories(tmp.resolve("t"));
        Files.createSymbolicLink(tmp.resolve("t/inc.ftl"), Path.of("../outside/o.ftl"));
        refused("a\n<#include \"inc.ftl\">\n",
                ": template error: an included template resolves outside the template's folder (a symbolic link may not leave it)");
    }

    @Test
    void undefinedVariablesAreNamed() throws Exception {
        refused("a\n  ${table.nosuch}\n", ":2:5: template error: 'table.nosuch' is not defined (the template model is listed in"
                + " DEVELOPERS.md, \"How to add a template\")");
    }

    @Test
    void aTemplateThatIsALinkOutOfItsFolder() throws Exception {
        Files.createDirectories(tmp.resolve("outside"));
        Files.writeString(tmp.resolve("outside/o.ftl"), "x\n");
        Files.createDirectories(tmp.resolve("t"));
        Files.createSymbolicLink(tmp.resolve("t/x.txt.ftl"), Path.of("../outside/o.ftl"));
        refused(": the template resolves outside its folder (a symbolic link may not leave it)");
    }
}
