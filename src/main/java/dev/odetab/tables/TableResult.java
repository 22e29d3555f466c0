package dev.odetab.tables;

import dev.odetab.numeric.Entry;
import dev.odetab.numeric.Rational;
import java.math.BigDecimal;
import java.util.List;

/**
 * The evaluated table: one row per grid point, one correctly rounded entry per column.
 *
 * @param table the definition
 * @param rows the rows in grid order
 * @param maxRelativeRadius the largest relative radius of a deciding enclosure (the proven
 *     error before rounding, relative to the value; zero when every entry was exact)
 * @param maxPrecBits the highest working precision any entry needed
 * @param proof how the set of rows was proven complete, for the provenance (zeros tables:
 *     how the zeros were isolated and counted); null when the rows are just the grid's points
 */
public record TableResult(TableDef table, List<Row> rows, BigDecimal maxRelativeRadius, int maxPrecBits, String proof) {
    /** One grid point: its exact abscissa (null for an irrational node) and the entries in column order. */
    public record Row(Rational x, List<Entry> entries) {
        public Row {
            entries = List.copyOf(entries);
        }
    }

    public TableResult {
        rows = List.copyOf(rows);
    }

    /** A result whose rows are the grid's points (no completeness proof to state). */
    public TableResult(TableDef table, List<Row> rows, BigDecimal maxRelativeRadius, int maxPrecBits) {
        this(table, rows, maxRelativeRadius, maxPrecBits, null);
    }
}
