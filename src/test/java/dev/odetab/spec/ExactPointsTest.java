package dev.odetab.spec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.odetab.base.InputError;
import dev.odetab.numeric.Rational;
import dev.odetab.tables.Grid;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Grid keys and {@code points} entries take the same exact values ({@link ExactPoints}):
 * decimals, hex floats, rationals and exact constant expressions; errors name the column inside
 * the offending string.
 */
class ExactPointsTest {
    private static List<Rational> points(Path dir, String points) throws Exception {
        Path spec = dir.resolve("p.toml");
        Files.writeString(spec, "[tables.t]\nfunction = \"airy-ai\"\npoints = [" + points + "]\n");
        return SpecFile.load(spec).tables().get(0).grid().points();
    }

    @Test
    void pointsTakeWhatGridsTake(@TempDir Path dir) throws Exception {
        assertEquals(List.of(Rational.of(1, 8), Rational.of(1, 3), Rational.of(-29, 4), Rational.of(1, 4), Rational.of(3), Rational.of(1, 2)),
                points(dir, "\"2^-3\", \"1/3\", \"-7.25\", \"0x1p-2\", 3, \"1/3 + 1/6\""));
        Path spec = dir.resolve("g.toml");
        Files.writeString(spec, "[tables.t]\nfunction = \"airy-ai\"\ngrid = { from = \"-7.25\", to = \"2^-3\", step = \"1/8\" }\n");
        Grid.Uniform g = (Grid.Uniform) SpecFile.load(spec).tables().get(0).grid();
        assertEquals(List.of(Rational.of(-29, 4), Rational.of(1, 8), Rational.of(1, 8)), List.of(g.from(), g.to(), g.step()));
    }

    @Test
    void aBadPointIsLocatedInsideItsString(@TempDir Path dir) {
        // line 3: points = ["0", "1/3x"]: the string opens at column 16, the unknown name x is its 4th character
        InputError e = assertThrows(InputError.class, () -> points(dir, "\"0\", \"1/3x\""));
        assertEquals(dir.resolve("p.toml") + ":3:20", e.where(), e.what());
        InputError notExact = assertThrows(InputError.class, () -> points(dir, "\"sqrt(2)\""));
        assertEquals(dir.resolve("p.toml") + ":3:11", notExact.where());
        assertEquals("'sqrt(2)' is not an exact rational; grid points must be exact", notExact.what());
    }
}
