package dev.odetab.emit;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.odetab.cli.CliRunner;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The literal lists of the template model are made from the stored rows as they are read;
 * a template may index them, take their size and read them backwards, not only list them
 * (DEVELOPERS.md "How to add a template"), and gets the literals a listing gets.
 */
class TemplateModelTest {
    @Test
    void literalListsCanBeIndexedSizedAndReversed(@TempDir Path tmp) throws IOException {
        Path out = tmp.resolve("out");
        CliRunner.Result r = CliRunner.run("build", "src/test/resources/build/templates/zip.toml", "--out", out.toString());
        assertEquals(0, r.code(), r.err());
        // Ai(0) = 1/(3^(2/3) Γ(2/3)) (closed form DLMF 9.2.3) = 0.35502805388781723926…, digits recalled from memory
        // as in reference-data/airy-dlmf-9.2.csv; binary64 0x1.6b8c7962715b8p-2
        assertEquals(0.35502805388781723926, Double.parseDouble("0x1.6b8c7962715b8p-2"));
        assertEquals("0x0p+0 0x1.6b8c7962715b8p-2\n"
                + "0x1p-1 0x1.da822d743844p-3\n"
                + "0x1.da822d743844p-3 0x1.6b8c7962715b8p-2\n", Files.readString(out.resolve("t.txt"), StandardCharsets.UTF_8));
        // the same literals as a plain listing writes
        assertEquals("// t: 2 entries, binary64\n"
                + "pub const X: [f64; 2] = [0x0p+0, 0x1p-1];\n"
                + "pub const VALUE: [f64; 2] = [0x1.6b8c7962715b8p-2, 0x1.da822d743844p-3];\n",
                Files.readString(out.resolve("t.rs"), StandardCharsets.UTF_8));
    }
}
