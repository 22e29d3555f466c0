/**
 * Gauss quadrature tables: {@link dev.odetab.tables.quadrature.GaussRule} proves the n nodes
 * of a family's rule by one interval Newton step each from heuristic seeds, and encloses each
 * weight from the family's closed formula (METHODS §6); {@link dev.odetab.tables.quadrature.GaussFamily}
 * holds the three-term recurrences and weight constants.
 *
 * <p>Invariant: n pairwise disjoint node enclosures, so every node is found once and none is
 * missed; every node and weight entry is correctly rounded from its enclosure; seeds only
 * choose where to look.
 */
package dev.odetab.tables.quadrature;
