package dev.odetab.emit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import com.univocity.parsers.csv.CsvParser;
import com.univocity.parsers.csv.CsvParserSettings;
import dev.odetab.cli.CliRunner;
import dev.odetab.oracle.BinaryInterchange;
import java.io.IOException;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.math.BigInteger;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.function.UnaryOperator;
import java.util.stream.Stream;
import org.tomlj.Toml;
import org.tomlj.TomlArray;
import org.tomlj.TomlParseResult;
import org.tomlj.TomlTable;

/**
 * The build of {@code src/test/resources/build/every-format.toml} (one table per format),
 * made once per test run, and what each emitted array must hold according to the CSV of its
 * table. The spec is read here with tomlj directly, not through odetab.
 */
public final class EveryFormatBuild {
    public static final Path SPEC = Path.of("src/test/resources/build/every-format.toml");
    private static final Path DIR = Path.of("target/test-builds/every-format");
    private static boolean built;

    private EveryFormatBuild() {
    }

    /** A table as the spec declares it. */
    public record Table(String name, String format, List<String> columns, boolean saturates) {
        public boolean signedFixed() {
            return format.startsWith("fixed:s");
        }

        /** F of fixed:sT.F or fixed:uT.F. */
        public int fractionBits() {
            return Integer.parseInt(format.substring(format.indexOf('.') + 1));
        }
    }

    /** How an element of an emitted array is compared: its bits in hex, or its text. */
    public enum Kind {
        BINARY16_BITS, BINARY32_BITS, BINARY64_BITS, UINT64_BITS, STRING, SIGNED_INTEGER, UNSIGNED_INTEGER
    }

    /** One emitted array ({@code value}, {@code value_hi}, {@code value_bits_lo}, …) and its expected elements. */
    public record Array(Table table, String name, Kind kind, List<String> expected) {
    }

    /** The output folder, built on first use (exit code 0 asserted). */
    public static synchronized Path dir() {
        if (!built) {
            deleteTree(DIR);
            CliRunner.Result r = CliRunner.run("build", SPEC.toString(), "--out", DIR.toString());
            assertEquals(0, r.code(), "building " + SPEC + ": " + r.err());
            built = true;
        }
        return DIR;
    }

    public static List<Table> tables() {
        try {
            TomlParseResult toml = Toml.parse(SPEC);
            assertFalse(toml.hasErrors(), () -> toml.errors().toString());
            TomlTable tables = toml.getTable("tables");
            List<Table> r = new ArrayList<>();
            for (String name : tables.keySet()) {
                TomlTable t = tables.getTable(List.of(name));
                TomlArray cols = t.getArray("columns");
                List<String> columns = new ArrayList<>();
                for (int i = 0; i < cols.size(); i++) {
                    columns.add(cols.getString(i));
                }
                r.add(new Table(name, t.getString("format"), columns, "saturate".equals(t.getString("out_of_range"))));
            }
            return r;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Every row of a table's CSV, the header first, read by univocity-parsers (RFC 4180). */
    public static List<String[]> csv(String table) {
        CsvParserSettings s = new CsvParserSettings();
        s.getFormat().setLineSeparator("\n");
        s.setHeaderExtractionEnabled(false);
        s.setMaxCharsPerColumn(100_000);
        try {
            String text = Files.readString(dir().resolve(table + ".csv"), StandardCharsets.UTF_8);
            return new CsvParser(s).parseAll(new StringReader(text));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The cells of CSV column {@code header} (without the header row). */
    public static List<String> column(List<String[]> rows, String header) {
        int c = Arrays.asList(rows.get(0)).indexOf(header);
        if (c < 0) {
            throw new AssertionError("no CSV column '" + header + "' in " + Arrays.toString(rows.get(0)));
        }
        List<String> r = new ArrayList<>();
        for (String[] row : rows.subList(1, rows.size())) {
            r.add(row[c]);
        }
        return r;
    }

    /**
     * Every array the C and Java outputs hold, with the elements the CSV says they hold:
     * binary32 and binary64 bits through Float.parseFloat and Double.parseDouble of the
     * {@code _hex} literal (Java SE API), binary16 and binary128 bits through the exact oracle,
     * fixed point as the integer column, decimal as the text.
     */
    public static List<Array> arrays() {
        List<Array> r = new ArrayList<>();
        for (Table t : tables()) {
            List<String[]> rows = csv(t.name());
            for (String c : t.columns()) {
                switch (t.format()) {
                    case "binary16" -> r.add(new Array(t, c, Kind.BINARY16_BITS, map(column(rows, c + "_hex"),
                            h -> String.format(Locale.ROOT, "%04x", BinaryInterchange.BINARY16.encodeHex(h)))));
                    case "binary32" -> r.add(new Array(t, c, Kind.BINARY32_BITS, map(column(rows, c + "_hex"), EveryFormatBuild::float32Bits)));
                    case "binary64" -> r.add(new Array(t, c, Kind.BINARY64_BITS, map(column(rows, c + "_hex"), EveryFormatBuild::float64Bits)));
                    case "binary128" -> {
                        List<String> hex = column(rows, c + "_hex");
                        r.add(new Array(t, c + "_bits_hi", Kind.UINT64_BITS,
                                map(hex, h -> hex64(BinaryInterchange.high64(BinaryInterchange.BINARY128.encodeHex(h))))));
                        r.add(new Array(t, c + "_bits_lo", Kind.UINT64_BITS,
                                map(hex, h -> hex64(BinaryInterchange.low64(BinaryInterchange.BINARY128.encodeHex(h))))));
                    }
                    case "double-double" -> {
                        r.add(new Array(t, c + "_hi", Kind.BINARY64_BITS, map(column(rows, c + "_hi_hex"), EveryFormatBuild::float64Bits)));
                        r.add(new Array(t, c + "_lo", Kind.BINARY64_BITS, map(column(rows, c + "_lo_hex"), EveryFormatBuild::float64Bits)));
                    }
                    default -> {
                        if (t.format().startsWith("decimal:")) {
                            r.add(new Array(t, c, Kind.STRING, column(rows, c)));
                        } else {
                            r.add(new Array(t, c, t.signedFixed() ? Kind.SIGNED_INTEGER : Kind.UNSIGNED_INTEGER, column(rows, c)));
                        }
                    }
                }
            }
        }
        return r;
    }

    /** The binary32 bits of a hex literal, through the Java SE API. */
    public static String float32Bits(String hex) {
        return String.format(Locale.ROOT, "%08x", Float.floatToRawIntBits(Float.parseFloat(hex)));
    }

    /** The binary64 bits of a hex literal, through the Java SE API. */
    public static String float64Bits(String hex) {
        return String.format(Locale.ROOT, "%016x", Double.doubleToRawLongBits(Double.parseDouble(hex)));
    }

    public static String hex64(BigInteger v) {
        return String.format(Locale.ROOT, "%016x", v);
    }

    private static List<String> map(List<String> in, UnaryOperator<String> f) {
        return in.stream().map(f).toList();
    }

    /** {@code ai_fine} → {@code AiFine}, as the Java output names classes and (lower-cased first) accessors. */
    public static String camel(String name) {
        StringBuilder sb = new StringBuilder();
        for (String part : name.split("_")) {
            if (!part.isEmpty()) {
                sb.append(Character.toUpperCase(part.charAt(0))).append(part.substring(1));
            }
        }
        return sb.toString();
    }

    /** Asserts two lists of lines equal, reporting the first difference, then the counts. */
    public static void assertSameLines(List<String> expected, List<String> actual, String what) {
        for (int i = 0; i < Math.min(expected.size(), actual.size()); i++) {
            assertEquals(expected.get(i), actual.get(i), what + ", line " + (i + 1));
        }
        assertEquals(expected.size(), actual.size(), what + ": number of lines");
    }

    public static void deleteTree(Path p) {
        if (!Files.exists(p)) {
            return;
        }
        try (Stream<Path> s = Files.walk(p)) {
            for (Path q : s.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(q);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
