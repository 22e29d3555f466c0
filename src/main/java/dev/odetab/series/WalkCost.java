package dev.odetab.series;

import dev.odetab.base.ExprException;
import dev.odetab.expr.Poly;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import java.util.List;
import java.util.Locale;

/**
 * What a walk of the one walker ({@link Continuation}) from a start to a point will cost,
 * estimated before it begins, so that work beyond the precision cap or the walk limit is refused
 * at once instead of running for minutes.
 *
 * <p>Trust level: Heuristic. Nothing here sets a radius; the figures only decide whether to start
 * (and what to tell the user). In doubles, from the reduced equation P2 y'' + P1 y' + P0 y = 0 and
 * its local rate ω(x) = √|P0/P2| (docs/methods.md §4: the solutions behave like e^(±∫ω) where −P0/P2 &gt; 0
 * and oscillate with frequency ω where it is negative):
 * <ul>
 * <li>{@code growthBits}: where the walk follows a recessive solution through a region of growth
 * (−P0/P2 &gt; 0 and y'/y pointing against the direction of the walk at the start), every error
 * is amplified against the solution by e^(2∫ω), so the walk loses about 2∫ω/ln 2 bits; for Ai
 * continued from 0 to x that is (4/3)·x^(3/2)/ln 2. A dominant solution, or an oscillating
 * stretch, loses nothing of this kind.</li>
 * <li>{@code steps}: the steps of {@link StepChooser.Use#CONTINUATION}, ∫ (1 + ω + |P1/P2|)/2 dx
 * (the oscillation term of the step rule; the contraction-radius term is left out, so the figure
 * is low near singular points, which only makes the refusal less eager).</li>
 * </ul>
 * Both integrals are taken by the midpoint rule on {@value #SAMPLES} equal pieces, exact enough
 * for a decision about orders of magnitude; a path whose end does not fit a double costs +∞.
 */
public final class WalkCost {
    /** The longest walk the program starts (steps of the continuation rule), a documented limit. */
    public static final double MAX_STEPS = 100_000;

    /** Pieces of the midpoint rule. */
    private static final int SAMPLES = 4096;

    private WalkCost() {
    }

    /**
     * The estimate for one walk: the bits it may lose and its steps (class comment); either may be
     * +∞.
     */
    public record Estimate(double growthBits, double steps) {
        /** The larger of two estimates, figure by figure (the worse of two walks). */
        public Estimate max(Estimate o) {
            return new Estimate(Math.max(growthBits, o.growthBits), Math.max(steps, o.steps));
        }
    }

    /**
     * Heuristic: the cost of walking the solution that {@code start} names from its point to
     * {@code to} (class comment). The direction in which the solution is recessive is read from
     * the signs of y and y' at the start, at 64 bits.
     *
     * @throws ExprException when a normalization constant cannot be evaluated
     */
    public static Estimate estimate(Start start, Rational to) throws ExprException {
        Jet at = start.jet(64);
        double y = at.value().mid().doubleValue();
        double dy = at.derivative().mid().doubleValue();
        double from = start.point().doubleEstimate();
        double end = to.doubleEstimate();
        boolean recessive = y != 0 && Math.signum(dy) * Math.signum(y) * Math.signum(end - from) < 0;
        return estimate(start.equation().reduced(), from, end, recessive);
    }

    /**
     * Heuristic: the cost of the walks from {@code start} to each of {@code ends} (the ends of a
     * grid or of a search, which bound every point between them): the largest growth and the sum
     * of the steps.
     *
     * @throws ExprException when a normalization constant cannot be evaluated
     */
    public static Estimate estimate(Start start, List<Rational> ends) throws ExprException {
        double bits = 0;
        double steps = 0;
        for (Rational end : ends) {
            Estimate e = estimate(start, end);
            bits = Math.max(bits, e.growthBits());
            steps += e.steps();
        }
        return new Estimate(bits, steps);
    }

    /**
     * Refuses, before any work, walks from {@code start} to {@code ends} that the estimate
     * (class comment) puts above the precision cap (the bits the walk loses plus
     * {@code neededBits}, what the answer itself needs) or above {@link #MAX_STEPS}.
     *
     * @throws PrecisionCapException naming the estimate, the cap or the limit, and what to do
     * @throws ExprException when a normalization constant cannot be evaluated
     */
    public static void check(Start start, List<Rational> ends, int neededBits, int capBits)
            throws PrecisionCapException, ExprException {
        Estimate e = estimate(start, ends);
        double bits = e.growthBits() + neededBits;
        if (bits > capBits) {
            throw new PrecisionCapException("the walk from x = " + start.point() + " needs " + figure(bits)
                    + " bits (estimated before any work: the solution is recessive there and loses "
                    + figure(e.growthBits()) + " bits to the growing one), above the precision cap of " + capBits
                    + " bits; raise the cap (--precision-cap-bits, precision_cap_bits) to at least that, or normalize the function nearer to the points", capBits);
        }
        if (e.steps() > MAX_STEPS) {
            throw new PrecisionCapException("the walk from x = " + start.point() + " takes " + figure(e.steps())
                    + " steps (estimated before any work), above the limit of " + (long) MAX_STEPS
                    + " steps of one walk (README, Limits); normalize the function nearer to the points", capBits);
        }
    }

    /** An estimated figure for a message: "about N", whole up to 10^12, then three digits and an exponent. */
    public static String figure(double v) {
        if (Double.isInfinite(v)) {
            return "more than 10^308";
        }
        return "about " + (v < 1e12 ? Long.toString((long) Math.ceil(v)) : String.format(Locale.ROOT, "%.2e", v));
    }

    /** The integrals of the class comment on [from, to] of the reduced equation. */
    static Estimate estimate(Equation reduced, double from, double to, boolean recessive) {
        if (!Double.isFinite(from) || !Double.isFinite(to)) {
            return new Estimate(recessive ? Double.POSITIVE_INFINITY : 0, Double.POSITIVE_INFINITY);
        }
        double[] p2 = coefficients(reduced.p2());
        double[] p1 = coefficients(reduced.p1());
        double[] p0 = coefficients(reduced.p0());
        double h = (to - from) / SAMPLES;
        double growth = 0;
        double steps = 0;
        for (int i = 0; i < SAMPLES; i++) {
            double x = from + (i + 0.5) * h;
            double a = horner(p2, x);
            double q = -horner(p0, x) / a;
            double omega = Math.sqrt(Math.abs(q));
            if (q > 0) {
                growth += omega;
            }
            steps += (1 + omega + Math.abs(horner(p1, x) / a)) / 2;
        }
        double length = Math.abs(h);
        double bits = recessive ? 2 * growth * length / Math.log(2) : 0;
        return new Estimate(Double.isNaN(bits) ? Double.POSITIVE_INFINITY : bits,
                Double.isNaN(steps) ? Double.POSITIVE_INFINITY : Math.ceil(steps * length));
    }

    private static double[] coefficients(Poly p) {
        double[] c = new double[p.degree() + 1];
        for (int i = 0; i < c.length; i++) {
            c[i] = p.coefficient(i).doubleEstimate();
        }
        return c;
    }

    private static double horner(double[] c, double x) {
        double s = 0;
        for (int i = c.length - 1; i >= 0; i--) {
            s = s * x + c[i];
        }
        return s;
    }
}
