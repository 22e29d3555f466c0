package dev.odetab.tables;

import java.util.ArrayList;
import java.util.List;

/**
 * Where the rows of a table go while it is evaluated, in grid order. This version keeps them
 * in memory; {@link #finish} gives the rows as a list for {@link TableResult}.
 */
public final class RowStore {
    private final List<TableResult.Row> rows = new ArrayList<>();

    private RowStore() {
    }

    /** A store for the rows of this table. */
    public static RowStore forTable(TableDef table) {
        return new RowStore();
    }

    /** Appends the next row. */
    public void append(TableResult.Row row) {
        rows.add(row);
    }

    /** The rows appended, in order; the store takes no more rows after this. */
    public List<TableResult.Row> finish() {
        return rows;
    }
}
