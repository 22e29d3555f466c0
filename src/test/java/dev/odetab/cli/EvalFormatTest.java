package dev.odetab.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import org.junit.jupiter.api.Test;

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
        assertTrue(r.err().startsWith("odetab: airy-ai at x = 15: the precision cap of 64 bits was reached before the rounding could be decided"), r.err());
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
}
