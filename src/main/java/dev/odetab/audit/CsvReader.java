package dev.odetab.audit;

import com.univocity.parsers.csv.CsvParser;
import com.univocity.parsers.csv.CsvParserSettings;
import dev.odetab.numeric.Format;
import dev.odetab.numeric.Rational;
import dev.odetab.base.InputError;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * A CSV table (RFC 4180, header row first), as odetab writes it or as a spreadsheet exports it.
 *
 * <p>Trust level: Exact. The value column is the one named {@code column}; for a binary
 * format its {@code column_hex} companion is read instead when present (exact bits). A decimal
 * is rounded once, to nearest-even, into the table's format; a fixed-point column holds stored
 * integers (a {@code …_decoded} column holds their exact values). When an {@code x} column is
 * present each entry maps to its x, which must be a point of the grid (exactly, or after
 * rounding the grid point into the format, since odetab writes inexact points rounded);
 * otherwise entries map to grid points by position; with both {@code x} and {@code x_hex} the
 * two must name the same grid point. Empty, NaN and unreadable fields, a duplicate column name
 * and a row with more or fewer fields than the header are bad input located as
 * {@code file:line:column}.
 */
final class CsvReader {
    private CsvReader() {
    }

    /** Exact: the entries of the chosen column, and their grid indices when the file has an x column. */
    static Entries read(String display, String text, String column, Format format, List<Rational> grid) throws InputError {
        CsvParserSettings settings = new CsvParserSettings();
        settings.setHeaderExtractionEnabled(false);
        settings.setLineSeparatorDetectionEnabled(true);
        settings.setSkipEmptyLines(true);
        settings.setIgnoreLeadingWhitespaces(false);
        settings.setIgnoreTrailingWhitespaces(false);
        settings.setMaxCharsPerColumn(-1);
        settings.setNullValue("");
        CsvParser parser = new CsvParser(settings);
        List<String[]> rows = new ArrayList<>();
        List<Integer> lines = new ArrayList<>();
        parser.beginParsing(new StringReader(text));
        String[] row;
        while ((row = parser.parseNext()) != null) {
            rows.add(row);
            lines.add((int) parser.getContext().currentLine());
        }
        if (rows.isEmpty()) {
            throw new InputError(display, "empty CSV file (expected a header row)");
        }
        List<String> header = Arrays.stream(rows.get(0)).map(h -> h == null ? "" : h.strip()).toList();
        String headerLine = text.split("\r\n|\r|\n", 2)[0];
        for (int c = 0; c < header.size(); c++) {
            if (header.indexOf(header.get(c)) != c) {
                throw new InputError(display + ":" + lines.get(0) + ":" + column(headerLine, c),
                        "the column '" + header.get(c) + "' appears twice in the header");
            }
        }
        int valueCol = chooseColumn(display, header, column, format);
        boolean hex = header.get(valueCol).endsWith("_hex");
        boolean decoded = header.get(valueCol).endsWith("_decoded");
        int xCol = header.indexOf("x");
        int xHex = header.indexOf("x_hex");
        String[] raw = text.split("\r\n|\r|\n", -1);
        List<Entries.Item> items = new ArrayList<>();
        List<Integer> xs = xCol >= 0 ? new ArrayList<>() : null;
        Map<Rational, Integer> exactGrid = new HashMap<>();
        Map<Rational, Integer> heldGrid = new HashMap<>();
        for (int i = grid.size() - 1; i >= 0; i--) {
            exactGrid.put(grid.get(i), i);
            Rational h = format.kind() == Format.Kind.BINARY ? Held.held(grid.get(i), (Format.BinaryFormat) format) : grid.get(i);
            if (h != null) {
                heldGrid.put(h, i);
            }
        }
        for (int r = 1; r < rows.size(); r++) {
            int line = lines.get(r);
            String lineText = line >= 1 && line <= raw.length ? raw[line - 1] : "";
            if (rows.get(r).length != header.size()) {
                int c = Math.min(rows.get(r).length, header.size());
                throw new InputError(where(display, line, lineText, c), "this row has " + rows.get(r).length
                        + " field(s), the header " + header.size());
            }
            items.add(field(display, rows.get(r), valueCol, line, lineText, format, hex || decoded));
            if (xs != null) {
                int c = xHex >= 0 && format.kind() == Format.Kind.BINARY ? xHex : xCol;
                String xText = cell(rows.get(r), c);
                int index = gridIndex(display, rows.get(r), c, line, lineText, format, c == xHex, exactGrid, heldGrid);
                if (c == xHex && xCol >= 0) {
                    int typed = gridIndex(display, rows.get(r), xCol, line, lineText, format, false, exactGrid, heldGrid);
                    if (typed != index) {
                        throw new InputError(where(display, line, lineText, xCol), "x = " + cell(rows.get(r), xCol)
                                + " disagrees with x_hex = " + xText + " (grid points " + (typed + 1) + " and " + (index + 1) + ")");
                    }
                }
                if (xs.contains(index)) {
                    throw new InputError(where(display, line, lineText, c), "x = " + xText + " appears twice");
                }
                xs.add(index);
            }
        }
        return new Entries(display, header.get(valueCol), items, xs);
    }

    /** Exact: the grid index of the x in field {@code c} (an exact grid point, or one rounded into the format). */
    private static int gridIndex(String display, String[] row, int c, int line, String lineText, Format format, boolean exact,
            Map<Rational, Integer> exactGrid, Map<Rational, Integer> heldGrid) throws InputError {
        String xText = cell(row, c);
        Integer index = null;
        try {
            index = exactGrid.get(Rational.parse(xText));
        } catch (NumberFormatException e) {
            // not a plain decimal: read it as an entry of the format below
        }
        if (index == null) {
            Entries.Item x = field(display, row, c, line, lineText, format, exact);
            index = x.infinite() ? null : heldGrid.get(x.value());
        }
        if (index == null) {
            throw new InputError(where(display, line, lineText, c), "x = " + xText + " is not a point of the table's grid");
        }
        return index;
    }

    /** Exact: the index of the value column ({@code NAME_hex} preferred in binary formats). */
    private static int chooseColumn(String display, List<String> header, String column, Format format) throws InputError {
        int hexCol = header.indexOf(column + "_hex");
        if (hexCol >= 0 && format.kind() == Format.Kind.BINARY && !column.endsWith("_hex")) {
            return hexCol;
        }
        int c = header.indexOf(column);
        if (c >= 0) {
            return c;
        }
        throw new InputError(display + ":1:1", "no column '" + column + "' in the header (columns: "
                + String.join(", ", header) + "); choose one with --column NAME");
    }

    private static String cell(String[] row, int c) {
        return c < row.length && row[c] != null ? row[c].strip() : "";
    }

    /** Exact: one field read as an entry of the format ({@code exact}: a hex or decoded column, never a stored integer). */
    private static Entries.Item field(String display, String[] row, int c, int line, String lineText, Format format, boolean exact)
            throws InputError {
        String s = cell(row, c);
        String where = where(display, line, lineText, c);
        if (s.isEmpty()) {
            throw new InputError(where, "empty field (expected a number)");
        }
        boolean negative = s.startsWith("-");
        String body = s.startsWith("-") || s.startsWith("+") ? s.substring(1) : s;
        String lower = body.toLowerCase(Locale.ROOT);
        if (lower.equals("nan")) {
            throw new InputError(where, "NaN is not allowed in a table of values");
        }
        if (lower.equals("infinity") || lower.equals("inf")) {
            if (format.kind() != Format.Kind.BINARY) {
                throw new InputError(where, s + " is not a value of " + format.name());
            }
            return new Entries.Item(s, line, column(lineText, c), null, negative);
        }
        Literal lit = Literal.parse(body);
        if (lit == null || body.matches(".*[fFdDlLuU]$") && !body.matches("(?i)0x[0-9a-f]+")) {
            throw new InputError(where, "'" + s + "' is not a number");
        }
        if (lit.beyond() != Literal.Beyond.NO) {
            lit = new Literal(null, format.kind() == Format.Kind.FIXED ? lit.type() : Literal.Type.TEXT, lit.beyond());
        } else if (exact && format.kind() == Format.Kind.FIXED) {
            Format.FixedFormat f = (Format.FixedFormat) format;
            Rational k = lit.value().multiply(Rational.TWO.pow(f.fractionBits()));
            if (!k.isInteger()) {
                throw new InputError(where, "'" + s + "' is not a multiple of 2^-" + f.fractionBits());
            }
            lit = new Literal(k, Literal.Type.INTEGER);
        } else if (format.kind() != Format.Kind.FIXED) {
            lit = new Literal(lit.value(), Literal.Type.TEXT);
        }
        try {
            return Held.of(s, line, column(lineText, c), lit, negative, format, false);
        } catch (Held.NotHeld e) {
            throw new InputError(where, e.getMessage());
        }
    }

    private static String where(String display, int line, String lineText, int c) {
        return display + ":" + line + ":" + column(lineText, c);
    }

    /** Exact: the 1-based character column where field {@code c} starts on its line (RFC 4180 quotes respected). */
    static int column(String lineText, int c) {
        int field = 0;
        boolean quoted = false;
        for (int i = 0; i < lineText.length(); i++) {
            if (field == c) {
                return i + 1;
            }
            char ch = lineText.charAt(i);
            if (ch == '"') {
                quoted = !quoted;
            } else if (ch == ',' && !quoted) {
                field++;
            }
        }
        return lineText.length() + 1;
    }
}
