/**
 * Zeros tables: {@link dev.odetab.tables.zeros.ZeroFinder} walks a search interval cell by
 * cell, isolates every zero of the solution (or of its derivative) on it and refines each by
 * interval Newton until its entry is decided (docs/methods.md §6).
 *
 * <p>Invariant: every zero on the closed search interval is counted exactly once, each
 * reported zero lies in its proven enclosure, and its entry and the other columns at it are
 * correctly rounded; a zero the cap cannot decide stops the table.
 */
package dev.odetab.tables.zeros;
