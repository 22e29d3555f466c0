/**
 * Row storage: decided rows are encoded exactly ({@link dev.odetab.tables.rows.RowCodec}) into a
 * {@link dev.odetab.tables.rows.RowStore} that keeps up to 1 MiB in memory and the rest in an
 * unlinked temporary file, and read back as a streaming list
 * ({@link dev.odetab.tables.rows.StoredRows}).
 *
 * <p>Invariant: a row reads back equal to the row stored (rationals, formats, kinds, signs,
 * double-double parts), in the order appended; memory does not grow with the table's length.
 */
package dev.odetab.tables.rows;
