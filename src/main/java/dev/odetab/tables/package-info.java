/**
 * Tables: the table model that a spec builds and the writers read ({@link dev.odetab.tables.TableDef},
 * {@link dev.odetab.tables.Grid}, {@link dev.odetab.tables.Column},
 * {@link dev.odetab.tables.TableResult}), and its evaluation, one sub-package per kind of
 * table ({@code values}, {@code zeros}, {@code quadrature}) and one for row storage
 * ({@code rows}).
 *
 * <p>Invariant: every entry of a {@code TableResult} is the correct rounding, in the table's
 * {@link dev.odetab.numeric.Target}, of a proven enclosure of the exact value (or the exact
 * value itself); an entry that cannot be decided within the precision cap stops the
 * evaluation, it is never written. Heuristics (chunk sizes, starting precisions, seeds) only
 * choose; bounds from {@code series} and {@code numeric} set every radius.
 */
package dev.odetab.tables;
