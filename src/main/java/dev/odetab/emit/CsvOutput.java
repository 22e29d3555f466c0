package dev.odetab.emit;

import com.univocity.parsers.common.TextWritingException;
import com.univocity.parsers.csv.CsvWriter;
import com.univocity.parsers.csv.CsvWriterSettings;
import dev.odetab.numeric.Entry;
import dev.odetab.numeric.Format;
import dev.odetab.numeric.OutOfRange;
import dev.odetab.numeric.RoundingMode;
import dev.odetab.tables.Column;
import dev.odetab.base.Progress;
import dev.odetab.tables.TableResult;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/**
 * The CSV of a table (RFC 4180, header row, no comment lines, {@code \n} line ends as
 * univocity writes them; DESIGN.md "Outputs"): one column per spec column, named exactly so,
 * followed by its companion ({@code NAME_hex} for binary formats, {@code NAME_decoded} for
 * fixed point, {@code NAME_hi_hex}/{@code NAME_lo_hex} for double-double). Grid points that
 * are exact decimals are written exactly in the {@code x} column. A fixed-point table that
 * saturates has a {@code NAME_flag} column after each value column: {@code saturated} or empty.
 */
final class CsvOutput {
    private CsvOutput() {
    }

    /** Writes the CSV into {@code out} (UTF-8) row by row, as the rows are read, reporting each row's entries to {@code progress}. */
    static void render(TableResult result, OutputStream out, Progress progress) throws IOException {
        Format f = result.table().format();
        List<Column> cols = result.table().columns();
        List<String> header = new ArrayList<>();
        boolean flags = f.hasOutOfRangePolicy() && result.table().outOfRange() == OutOfRange.SATURATE;
        for (Column c : cols) {
            header.addAll(Literals.csvHeader(c.name(), f, flags && !c.isPoint()));
        }
        CsvWriterSettings settings = new CsvWriterSettings();
        settings.getFormat().setLineSeparator("\n");
        settings.getFormat().setDelimiter(',');
        settings.getFormat().setQuote('"');
        settings.setQuoteEscapingEnabled(true);
        Writer text = new OutputStreamWriter(out, StandardCharsets.UTF_8);
        try {
            write(result, header, flags, new CsvWriter(text, settings), progress);
        } catch (TextWritingException e) {
            // univocity wraps a failure of the writer; a full disk is an I/O problem, not a bug
            for (Throwable c = e.getCause(); c != null; c = c.getCause()) {
                if (c instanceof IOException io) {
                    throw io;
                }
            }
            throw e;
        }
        text.flush();
    }

    private static void write(TableResult result, List<String> header, boolean flags, CsvWriter w, Progress progress) {
        List<Column> cols = result.table().columns();
        boolean exactPoints = writesExactPoint(result);
        w.writeHeaders(header);
        // Rows are formatted in blocks on all cores (formatting a decimal costs microseconds) and
        // written in order, so the bytes are those of a sequential pass.
        List<TableResult.Row> block = new ArrayList<>(BLOCK);
        for (TableResult.Row row : result.rows()) {
            block.add(row);
            if (block.size() == BLOCK) {
                writeBlock(block, cols, flags, exactPoints, w, progress);
                block.clear();
            }
        }
        writeBlock(block, cols, flags, exactPoints, w, progress);
        w.flush();
    }

    private static final int BLOCK = 4096;

    private static void writeBlock(List<TableResult.Row> block, List<Column> cols, boolean flags, boolean exactPoints, CsvWriter w,
            Progress progress) {
        Object[][] cells = new Object[block.size()][];
        java.util.stream.IntStream.range(0, block.size()).parallel()
                .forEach(i -> cells[i] = cells(block.get(i), cols, flags, exactPoints));
        for (Object[] row : cells) {
            w.writeRow(row);
            progress.advance(cols.size());
        }
    }

    private static Object[] cells(TableResult.Row row, List<Column> cols, boolean flags, boolean exactPoints) {
        List<String> cells = new ArrayList<>();
        for (int c = 0; c < cols.size(); c++) {
            Entry e = row.entries().get(c);
            List<String> parts = new ArrayList<>(Literals.csv(e, flags && !cols.get(c).isPoint()));
            if (cols.get(c).isPoint() && exactPoints) {
                if (row.x() != null && row.x().toBigDecimalExact() != null) {
                    parts.set(0, row.x().toDecimalOrFraction());
                }
            }
            cells.addAll(parts);
        }
        return cells.toArray();
    }

    /**
     * An exact decimal grid point is written as typed when the companion hex is its
     * nearest-even rounding, so that the decimal still reads back to the same bits (binary
     * formats, nearest-even); otherwise the x column is written like every other column.
     */
    private static boolean writesExactPoint(TableResult result) {
        return result.table().format().kind() == Format.Kind.BINARY
                && result.table().rounding() == RoundingMode.NEAREST_EVEN;
    }
}
