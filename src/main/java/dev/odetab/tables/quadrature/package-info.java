/**
 * Gauss quadrature tables: {@link dev.odetab.tables.quadrature.GaussRule} proves the n nodes
 * of a family's rule by one interval Newton step each from heuristic seeds, and encloses each
 * weight from the family's closed formula (docs/methods.md §6); the families hold their recurrences and
 * weight constants ({@link dev.odetab.ode.family.OrthogonalFamily}), and
 * {@link dev.odetab.tables.quadrature.GaussPolynomial} evaluates them exactly for every family.
 *
 * <p>Invariant: n pairwise disjoint node enclosures, so every node is found once and none is
 * missed; every node and weight entry is correctly rounded from its enclosure; seeds only
 * choose where to look.
 */
package dev.odetab.tables.quadrature;
