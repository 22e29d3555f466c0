package dev.odetab.emit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import dev.odetab.cli.CliRunner;
import java.io.IOException;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * User templates (DESIGN.md "Outputs": a path to a .ftl file) run in a locked-down FreeMarker
 * (FreeMarker manual, "Security considerations": TemplateClassResolver.ALLOWS_NOTHING_RESOLVER
 * for {@code ?new}, api_builtin_enabled = false for {@code ?api}): an attempt to reach Java is
 * exit 2 with file:line:column and writes nothing; {@code NAME.EXT.ftl} writes {@code TABLE.EXT}.
 */
class TemplateLockdownTest {
    private static final String DIR = "src/test/resources/build/templates/";

    private static void expectRejected(String spec, String message, Path tmp) {
        Path out = tmp.resolve("out");
        CliRunner.Result r = CliRunner.run("build", DIR + spec, "--out", out.toString());
        assertEquals("odetab: " + message + "\n", r.err());
        assertEquals(2, r.code(), "exit code");
        assertEquals("", r.out());
        assertFalse(Files.exists(out), "nothing written");
    }

    @Test
    void newCannotInstantiateExecute(@TempDir Path tmp) {
        expectRejected("execute.toml", DIR + "execute.ftl:2:1: template error: "
                + "Instantiating freemarker.template.utility.Execute is not allowed in the template for security reasons.", tmp);
    }

    @Test
    void apiIsDisabled(@TempDir Path tmp) {
        expectRejected("api.toml", DIR + "api.ftl:3:3: template error: Can't use ?api, because the \"api_builtin_enabled\" "
                + "configuration setting is false. Think twice before you set it to true though. Especially, it shouldn't "
                + "abused for modifying Map-s and Collection-s.", tmp);
    }

    @Test
    void syntaxErrorIsLocated(@TempDir Path tmp) {
        expectRejected("syntax.toml", DIR + "broken.ftl:3:12: template syntax: Unexpected end of file reached. You have an "
                + "unclosed #list. Check if the FreeMarker end-tags are present, and aren't malformed. (Note that FreeMarker "
                + "end-tags must have # or @ after the / character.)", tmp);
    }

    @Test
    void innerExtensionNamesTheOutput(@TempDir Path tmp) throws IOException {
        Path out = tmp.resolve("out");
        CliRunner.Result r = CliRunner.run("build", DIR + "rust.toml", "--out", out.toString());
        assertEquals(0, r.code(), r.err());
        assertEquals("// t: 2 entries, binary64\n"
                + "pub const X: [f64; 2] = [0x0p+0, 0x1p-1];\n"
                + "pub const VALUE: [f64; 2] = [0x1.6b8c7962715b8p-2, 0x1.da822d743844p-3];\n",
                Files.readString(out.resolve("t.rs"), StandardCharsets.UTF_8));
        // Ai(0) = 1/(3^(2/3) Γ(2/3)) (closed form DLMF 9.2.3) = 0.35502805388781723926…, digits recalled from memory
        // as in reference-data/airy-dlmf-9.2.csv; Ai(1/2) from apfloat 1.15.0 (ApfloatMath.airyAi, 40 digits)
        assertEquals(0.35502805388781723926, Double.parseDouble("0x1.6b8c7962715b8p-2"));
        double aiHalf = new BigDecimal(ApfloatMath.airyAi(new Apfloat("0.5", 40)).toString(true)).doubleValue();
        assertEquals(aiHalf, Double.parseDouble("0x1.da822d743844p-3"));
        try (var files = Files.list(out)) {
            assertEquals(2, files.count(), "t.rs and manifest.json");
        }
    }
}
