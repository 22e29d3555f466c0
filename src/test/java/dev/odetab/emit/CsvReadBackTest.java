package dev.odetab.emit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.emit.EveryFormatBuild.Table;
import dev.odetab.oracle.BinaryInterchange;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.Function;
import org.junit.jupiter.api.Test;

/**
 * The CSV of every format reads back through univocity-parsers (RFC 4180) with the header
 * DESIGN.md "Outputs" names, and every cell says what its companion says: a binary decimal is
 * the shortest one that reads back (Float.parseFloat / Double.parseDouble, roundTiesToEven,
 * IEEE 754-2019 5.12.2; the exact oracle for binary16 and binary128) to the bits of its
 * {@code _hex} literal; a double-double decimal is exactly hi + lo with |lo| <= ulp(hi)/2; a
 * fixed-point integer k decodes to exactly k / 2^F; a decimal:N cell has N significant digits.
 */
class CsvReadBackTest {
    @Test
    void headersAreTheSpecColumnsAndTheirCompanions() {
        for (Table t : EveryFormatBuild.tables()) {
            List<String> expected = new ArrayList<>();
            for (String c : t.columns()) {
                expected.add(c);
                if (t.format().startsWith("binary")) {
                    expected.add(c + "_hex");
                } else if (t.format().equals("double-double")) {
                    expected.addAll(List.of(c + "_hi_hex", c + "_lo_hex"));
                } else if (t.format().startsWith("fixed:")) {
                    expected.add(c + "_decoded");
                    if (t.saturates() && !c.equals("x")) {
                        expected.add(c + "_flag");
                    }
                }
            }
            List<String[]> rows = EveryFormatBuild.csv(t.name());
            assertEquals(expected, Arrays.asList(rows.get(0)), t.name() + ".csv header");
            assertTrue(rows.size() > 2, t.name() + ".csv has rows");
            for (int r = 1; r < rows.size(); r++) {
                String[] row = rows.get(r);
                assertEquals(expected.size(), row.length, t.name() + ".csv row " + r + " " + Arrays.toString(row));
                for (int k = 0; k < row.length; k++) {
                    String cell = row[k];
                    if (expected.get(k).endsWith("_flag")) {
                        // DESIGN.md "saturate (flagged in the output)": the flag is 'saturated' or empty
                        assertTrue(cell == null || cell.isEmpty() || cell.equals("saturated"), t.name() + ".csv row " + r + " flag " + cell);
                    } else {
                        assertTrue(cell != null && !cell.isEmpty(), t.name() + ".csv row " + r + " has an empty cell");
                    }
                }
            }
        }
    }

    @Test
    void binaryDecimalsAreShortestAndReadBackToTheHexBits() {
        int checked = 0;
        for (Table t : EveryFormatBuild.tables()) {
            Function<String, String> fromDecimal;
            Function<String, String> fromHex;
            switch (t.format()) {
                case "binary32" -> {
                    fromDecimal = d -> EveryFormatBuild.float32Bits(Float.toHexString(Float.parseFloat(d)));
                    fromHex = EveryFormatBuild::float32Bits;
                }
                case "binary64" -> {
                    fromDecimal = d -> EveryFormatBuild.float64Bits(Double.toHexString(Double.parseDouble(d)));
                    fromHex = EveryFormatBuild::float64Bits;
                }
                case "binary16" -> {
                    fromDecimal = d -> BinaryInterchange.BINARY16.roundDecimal(d).toString(16);
                    fromHex = h -> BinaryInterchange.BINARY16.encodeHex(h).toString(16);
                }
                case "binary128" -> {
                    fromDecimal = d -> BinaryInterchange.BINARY128.roundDecimal(d).toString(16);
                    fromHex = h -> BinaryInterchange.BINARY128.encodeHex(h).toString(16);
                }
                default -> {
                    continue;
                }
            }
            BinaryInterchange oracle = switch (t.format()) {
                case "binary32" -> BinaryInterchange.BINARY32;
                case "binary64" -> BinaryInterchange.BINARY64;
                case "binary16" -> BinaryInterchange.BINARY16;
                default -> BinaryInterchange.BINARY128;
            };
            List<String[]> rows = EveryFormatBuild.csv(t.name());
            for (String c : t.columns()) {
                List<String> decimals = EveryFormatBuild.column(rows, c);
                List<String> hexes = EveryFormatBuild.column(rows, c + "_hex");
                for (int i = 0; i < decimals.size(); i++) {
                    String d = decimals.get(i);
                    String h = hexes.get(i);
                    String where = t.name() + "." + c + "[" + i + "] = " + d + " / " + h;
                    String bits = fromHex.apply(h);
                    assertEquals(bits, fromDecimal.apply(d), where + ": the decimal reads back to other bits");
                    // the oracle agrees with the JDK where both apply, and with itself on hex and decimal
                    assertEquals(oracle.encodeHex(h), oracle.roundDecimal(d), where + ": oracle");
                    assertShortest(d, BinaryInterchange.hexValue(h), bits, fromDecimal, where);
                    checked++;
                }
            }
        }
        assertTrue(checked > 150, "checked " + checked);
    }

    /** No decimal with fewer significant digits reads back to the same bits (one of the two nearest would). */
    private static void assertShortest(String decimal, BigDecimal exact, String bits, Function<String, String> read, String where) {
        int digits = new BigDecimal(decimal).stripTrailingZeros().precision();
        if (digits <= 1 || exact.signum() == 0) {
            return;
        }
        for (RoundingMode m : List.of(RoundingMode.FLOOR, RoundingMode.CEILING)) {
            String shorter = exact.round(new MathContext(digits - 1, m)).toString();
            assertNotEquals(bits, read.apply(shorter), where + ": " + shorter + " is shorter and reads back to the same bits");
        }
    }

    @Test
    void exactGridPointsAreWrittenExactly() {
        // every-format.toml: swing32 has grid = { from = "-1", to = "2", step = "1/8" }, binary32, nearest-even
        List<String> xs = EveryFormatBuild.column(EveryFormatBuild.csv("swing32"), "x");
        assertEquals(25, xs.size());
        for (int i = 0; i < xs.size(); i++) {
            BigDecimal exact = BigDecimal.valueOf(-1).add(BigDecimal.valueOf(i).multiply(new BigDecimal("0.125")));
            assertEquals(0, exact.compareTo(new BigDecimal(xs.get(i))), "x[" + i + "] = " + xs.get(i) + ", expected " + exact);
        }
    }

    @Test
    void doubleDoubleIsTheExactSumOfItsParts() {
        int checked = 0;
        for (Table t : EveryFormatBuild.tables()) {
            if (!t.format().equals("double-double")) {
                continue;
            }
            List<String[]> rows = EveryFormatBuild.csv(t.name());
            for (String c : t.columns()) {
                List<String> sums = EveryFormatBuild.column(rows, c);
                List<String> his = EveryFormatBuild.column(rows, c + "_hi_hex");
                List<String> los = EveryFormatBuild.column(rows, c + "_lo_hex");
                for (int i = 0; i < sums.size(); i++) {
                    double hi = Double.parseDouble(his.get(i));
                    double lo = Double.parseDouble(los.get(i));
                    String where = t.name() + "." + c + "[" + i + "] = " + sums.get(i);
                    assertEquals(0, new BigDecimal(hi).add(new BigDecimal(lo)).compareTo(new BigDecimal(sums.get(i))), where + " is not hi + lo");
                    // DESIGN.md "Formats and rounding": |lo| <= ulp(hi)/2
                    assertTrue(Math.abs(lo) <= Math.ulp(hi) / 2, where + ": |lo| > ulp(hi)/2");
                    checked++;
                }
            }
        }
        assertTrue(checked > 20, "checked " + checked);
    }

    @Test
    void fixedPointIntegersDecodeExactlyAndStayInRange() {
        int checked = 0;
        for (Table t : EveryFormatBuild.tables()) {
            if (!t.format().startsWith("fixed:")) {
                continue;
            }
            int totalBits = Integer.parseInt(t.format().substring("fixed:s".length(), t.format().indexOf('.')));
            BigInteger min = t.signedFixed() ? BigInteger.ONE.shiftLeft(totalBits - 1).negate() : BigInteger.ZERO;
            BigInteger max = BigInteger.ONE.shiftLeft(t.signedFixed() ? totalBits - 1 : totalBits).subtract(BigInteger.ONE);
            BigDecimal scale = new BigDecimal(BigInteger.TWO.pow(t.fractionBits()));
            List<String[]> rows = EveryFormatBuild.csv(t.name());
            for (String c : t.columns()) {
                List<String> ints = EveryFormatBuild.column(rows, c);
                List<String> decoded = EveryFormatBuild.column(rows, c + "_decoded");
                for (int i = 0; i < ints.size(); i++) {
                    BigInteger k = new BigInteger(ints.get(i));
                    String where = t.name() + "." + c + "[" + i + "] = " + k;
                    assertTrue(k.compareTo(min) >= 0 && k.compareTo(max) <= 0, where + " outside " + t.format());
                    assertEquals(0, new BigDecimal(k).divide(scale).compareTo(new BigDecimal(decoded.get(i))),
                            where + " does not decode to " + decoded.get(i));
                    checked++;
                }
            }
        }
        assertTrue(checked > 20, "checked " + checked);
    }

    @Test
    void decimalCellsHaveTheDigitsOfTheFormat() {
        for (Table t : EveryFormatBuild.tables()) {
            if (!t.format().startsWith("decimal:")) {
                continue;
            }
            int digits = Integer.parseInt(t.format().substring("decimal:".length()));
            List<String[]> rows = EveryFormatBuild.csv(t.name());
            for (String c : t.columns()) {
                for (String cell : EveryFormatBuild.column(rows, c)) {
                    assertEquals(digits, new BigDecimal(cell).precision(), t.name() + "." + c + " = " + cell);
                }
            }
        }
    }
}
