/**
 * Values and Taylor-coefficient tables on given points (uniform grids, point lists, Chebyshev
 * nodes): {@link dev.odetab.tables.values.ValuesEvaluator} cuts the points into chunks and
 * decides each row by the exact path (polynomials at exact points), the double-double fast tier
 * ({@link dev.odetab.tables.values.FastTier}) or BigDecimal walks at rising precision.
 *
 * <p>Invariant: every entry is the correct rounding of a proven enclosure (or of the exact
 * value), whichever tier decided it; a row the cap cannot decide stops the table. Chunks are
 * deterministic, so the bytes never depend on the number of threads.
 */
package dev.odetab.tables.values;
