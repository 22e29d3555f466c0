/**
 * Ball arithmetic over BigDecimal, exact rationals, rigorous elementary functions, and
 * correct rounding of enclosures.
 *
 * <p>Invariant: every {@link dev.odetab.numeric.Ball} returned here contains the exact value
 * of the operation on every point of its inputs; every {@code …Up} or {@code …Down} number is
 * on the stated side of the exact one. big-math is used by nothing here to prove a value.
 */
package dev.odetab.numeric;
