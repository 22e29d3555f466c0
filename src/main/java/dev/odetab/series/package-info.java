/**
 * Taylor series at ordinary points: the coefficient recurrence, the rigorous tail bound,
 * summation in ball arithmetic, and the seam every evaluation goes through: a {@link
 * dev.odetab.series.Start} (where a walk begins), the one walker ({@link
 * dev.odetab.series.Continuation}) with its step choices in one place ({@link
 * dev.odetab.series.StepChooser}), and the one precision driver ({@link
 * dev.odetab.series.PrecisionLoop}).
 *
 * <p>Invariant: every {@link dev.odetab.series.Jet} returned here contains the exact value and
 * derivative of the solution it names. Heuristics (term counts, step lengths, working
 * precision) only choose; they never set a radius.
 */
package dev.odetab.series;
