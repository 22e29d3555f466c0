package dev.odetab.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code eval --format}: entries as a table holds them, and the numerical-limit and bad-format exits. */
class EvalFormatTest {
    @Test
    void binary64EntryIsTheCorrectRoundingOfTheFortyDigitValue() {
        // Independent rounding path: the 40-digit decimal that eval prints, converted by Java's
        // correctly rounded BigDecimal.doubleValue (Java SE API), must give the same bits as the
        // hex literal eval prints for --format binary64 (Double.parseDouble reads C99 hex literals).
        for (String x : new String[] {"-7.25", "1/3", "2.5"}) {
            CliRunner.Result dec = CliRunner.run("eval", "airy-ai", x, "--digits", "40");
            CliRunner.Result hex = CliRunner.run("eval", "airy-ai", x, "--format", "binary64");
            assertEquals(0, dec.code(), dec.err());
            assertEquals(0, hex.code(), hex.err());
            double fromDecimal = new BigDecimal(dec.out().split("\t")[1].strip()).doubleValue();
            double fromHex = Double.parseDouble(hex.out().split("\t")[1].strip());
            assertEquals(Double.doubleToRawLongBits(fromDecimal), Double.doubleToRawLongBits(fromHex), "Ai(" + x + ")");
        }
    }

    @Test
    void capTooLowIsExitThreeWithThePointNamed() {
        CliRunner.Result r = CliRunner.run("eval", "airy-ai", "15", "--format", "binary64", "--precision-cap-bits", "64");
        assertEquals(3, r.code());
        assertEquals("", r.out());
        assertTrue(r.err().startsWith("odetab: airy-ai at x = 15: the walk from x = 0 needs about 165 bits (estimated before any work"), r.err());
    }

    @Test
    void unknownFormatIsExitTwo() {
        CliRunner.Result r = CliRunner.run("eval", "airy-ai", "1", "--format", "binary99");
        assertEquals(2, r.code());
        assertTrue(r.err().startsWith("odetab: argument 5 'binary99', column 1: unknown format 'binary99'"), r.err());
    }

    @Test
    void fixedPointOutOfRangeIsAnErrorUnlessSaturating() {
        // Bi(5) = 657.69... (DLMF 9.2, from memory) does not fit fixed:s8.4 (range −8 … 7.9375).
        CliRunner.Result r = CliRunner.run("eval", "airy-bi", "5", "--format", "fixed:s8.4");
        assertEquals(2, r.code());
        CliRunner.Result s = CliRunner.run("eval", "airy-bi", "5", "--format", "fixed:s8.4", "--out-of-range", "saturate");
        assertEquals(0, s.code(), s.err());
        assertEquals("5\t127\n", s.out());
        assertTrue(s.err().contains("saturated"), s.err());
    }

    @Test
    void hexFloatPointsAreExact() {
        // 0x1p-2 = 1/4 and -0x1.8p+1 = -3 exactly (C99 6.4.4.2); the point is echoed as given
        CliRunner.Result hex = CliRunner.run("eval", "airy-ai", "0x1p-2", "-0x1.8p+1", "0x.8P1", "--digits", "30");
        CliRunner.Result dec = CliRunner.run("eval", "airy-ai", "0.25", "-3", "1", "--digits", "30");
        assertEquals(0, hex.code(), hex.err());
        assertEquals(0, dec.code(), dec.err());
        assertEquals("0x1p-2\t0.291163954348545206272107194187\n-0x1.8p+1\t-0.378814293677658074347243916500\n"
                + "0x.8P1\t0.135292416312881415524147423515\n", hex.out());
        assertEquals(dec.out().replaceAll("(?m)^[^\t]*\t", ""), hex.out().replaceAll("(?m)^[^\t]*\t", ""));
    }

    @Test
    void hexFloatOfACsvRowReadsBackToItsEntry() {
        // x_hex of a binary64 grid point (1/3 rounded to binary64) is that double exactly: the
        // entry at it equals the entry at the same double's exact decimal expansion
        String xHex = "0x1.5555555555555p-2";
        String xDecimal = new BigDecimal(Double.parseDouble(xHex)).toPlainString();
        CliRunner.Result a = CliRunner.run("eval", "airy-ai", xHex, "--format", "binary64");
        CliRunner.Result b = CliRunner.run("eval", "airy-ai", xDecimal, "--format", "binary64");
        assertEquals(0, a.code(), a.err());
        assertEquals(b.out().split("\t")[1], a.out().split("\t")[1]);
    }

    @Test
    void specPointsTakeHexFloatsToo(@TempDir Path tmp) throws IOException {
        Path spec = tmp.resolve("hex.toml");
        Files.writeString(spec, String.join("\n", "[tables.t]", "function = \"airy-ai\"",
                "points = [\"0x1p-2\", \"-0x1.8p+1\"]", "columns = [\"x\", \"value\"]", "outputs = [\"csv\"]", ""));
        CliRunner.Result r = CliRunner.run("build", spec.toString(), "--out", tmp.resolve("out").toString(), "--quiet");
        assertEquals(0, r.code(), r.err());
        String csv = Files.readString(tmp.resolve("out/t.csv"));
        assertTrue(csv.contains("\n0.25,0x1p-2,") && csv.contains("\n-3,-0x1.8p+1,"), csv);
    }
}
