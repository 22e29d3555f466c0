package dev.odetab.tables;

import dev.odetab.tables.rows.StoredRows;

import dev.odetab.tables.rows.RowStore;

import dev.odetab.numeric.Entry;
import dev.odetab.numeric.Rational;
import java.math.BigDecimal;
import java.util.List;

/**
 * The evaluated table: one row per grid point, one correctly rounded entry per column.
 *
 * <p>The rows of a long table are not in memory: they come as {@link StoredRows} from a
 * {@link RowStore}, read as they are iterated; {@link #close()} releases their storage.
 *
 * @param table the definition
 * @param rows the rows in grid order (kept as given when they are {@link StoredRows}, else copied)
 * @param maxRelativeRadius the largest relative radius of a deciding enclosure (the proven
 *     error before rounding, relative to the value; zero when every entry was exact)
 * @param maxPrecBits the highest working precision any entry needed
 * @param proof how the set of rows was proven complete, for the provenance (zeros tables:
 *     how the zeros were isolated and counted); null when the rows are just the grid's points
 */
public record TableResult(TableDef table, List<Row> rows, BigDecimal maxRelativeRadius, int maxPrecBits, String proof)
        implements AutoCloseable {
    /** One grid point: its exact abscissa (null for an irrational node) and the entries in column order. */
    public record Row(Rational x, List<Entry> entries) {
        public Row {
            entries = List.copyOf(entries);
        }
    }

    public TableResult {
        rows = rows instanceof StoredRows ? rows : List.copyOf(rows);
    }

    /** Releases the storage of the rows (a temporary file for a long table); they cannot be read afterwards. */
    @Override
    public void close() {
        if (rows instanceof StoredRows s) {
            s.close();
        }
    }

    /** A result whose rows are the grid's points (no completeness proof to state). */
    public TableResult(TableDef table, List<Row> rows, BigDecimal maxRelativeRadius, int maxPrecBits) {
        this(table, rows, maxRelativeRadius, maxPrecBits, null);
    }
}
