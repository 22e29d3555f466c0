/**
 * Taylor series at ordinary points: the coefficient recurrence, the rigorous tail bound,
 * summation in ball arithmetic, continuation along the real line, and the precision loop.
 *
 * <p>Invariant: every {@link dev.odetab.series.Jet} returned here contains the exact value and
 * derivative of the solution it names. Heuristics (term counts, step lengths, working
 * precision) only choose; they never set a radius.
 */
package dev.odetab.series;
