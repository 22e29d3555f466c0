package dev.odetab.series;

import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import java.math.BigInteger;

/**
 * The one home of the step-length and term-count heuristics of the Taylor walks (docs/methods.md §2,
 * §4).
 *
 * <p>Trust level: Heuristic. Everything here only chooses: a step too long for the tail bound
 * is refused by {@link LocalSeries} (the walker then halves it), a step too short only costs
 * time. No value chosen here ever sets a radius.
 *
 * <p>The rule, at an exact center c of the reduced equation P2 y'' + P1 y' + P0 y = 0: the
 * length {@code min(r·ρ, s/(1 + √|P0/P2| + |P1/P2|))}, with ρ the contraction radius of
 * docs/methods.md §2 ({@link LocalSeries#contractionRadiusEstimate}) and the second term about a sixth
 * of a local period (times s) where the solution oscillates, a local growth length where it
 * grows. The fractions r and s are named per use ({@link Use}): they differ because the callers'
 * arithmetic differs, and the proven error figures of the tables depend on the steps taken, so
 * each use keeps the steps it has always taken.
 */
public final class StepChooser {
    private StepChooser() {
    }

    /**
     * Who steps, with the fractions of the rule (class comment) that suit its arithmetic.
     */
    public enum Use {
        /**
         * BigDecimal continuation ({@link Continuation}): half the contraction radius, two sixths
         * of a period; a remaining distance within that length is taken in one step.
         */
        CONTINUATION(0.5, 2.0, true),
        /**
         * The double-double fast tier ({@link FastWalk}): a quarter of the contraction radius
         * and a sixth of a period, since its 106-bit balls cannot absorb the terms that a
         * longer step needs.
         */
        FAST_TIER(0.25, 1.0, false),
        /**
         * The cells of the zero search and its walk to them: half the contraction radius and a
         * sixth of a period, so that one enclosure over a whole cell is likely to decide the
         * sign of g or of g'; steps are powers of two.
         */
        ZERO_CELL(0.5, 1.0, false);

        /** r: the fraction of the contraction radius. */
        private final double radiusFraction;
        /** s: the multiple of the oscillation length 1/(1 + √|P0/P2| + |P1/P2|). */
        private final double oscillationScale;
        /** Whether a remaining distance within the length (not only within its power of two) is taken at once. */
        private final boolean finishWithinLength;

        Use(double radiusFraction, double oscillationScale, boolean finishWithinLength) {
            this.radiusFraction = radiusFraction;
            this.oscillationScale = oscillationScale;
            this.finishWithinLength = finishWithinLength;
        }
    }

    /**
     * Heuristic: the step length the rule gives at the center of {@code rec} (class comment);
     * +∞ when nothing limits it.
     *
     * @param reduced the reduced equation, {@code rec}'s
     */
    public static double lengthEstimate(Equation reduced, Recurrence rec, Use use) {
        Rational c = rec.center();
        double a0 = Math.abs(reduced.p2().evaluate(c).doubleEstimate());
        double b0 = Math.abs(reduced.p1().evaluate(c).doubleEstimate()) / a0;
        double d0 = Math.abs(reduced.p0().evaluate(c).doubleEstimate()) / a0;
        return Math.min(use.radiusFraction * LocalSeries.contractionRadiusEstimate(rec),
                use.oscillationScale / (1.0 + Math.sqrt(d0) + b0));
    }

    /**
     * Heuristic: the signed step from the center of {@code rec} toward a target {@code remaining}
     * away: the largest power of two not above {@link #lengthEstimate}, or the whole remaining
     * distance when that is not longer (or, for {@link Use#CONTINUATION}, not longer than the
     * length itself).
     */
    public static Rational chooseStep(Equation reduced, Recurrence rec, Rational remaining, Use use) {
        double length = lengthEstimate(reduced, rec, use);
        if (use.finishWithinLength && Math.abs(remaining.doubleEstimate()) <= length) {
            return remaining;
        }
        return toward(remaining, powerOfTwoBelow(length));
    }

    /** The whole of {@code remaining} when |remaining| ≤ h, else h with the sign of {@code remaining}. */
    public static Rational toward(Rational remaining, Rational h) {
        if (h.compareTo(remaining.abs()) >= 0) {
            return remaining;
        }
        return remaining.signum() < 0 ? h.negate() : h;
    }

    /**
     * Heuristic: how many equal sub-steps a run of grid steps of length |h| takes in the fast
     * tier: |h| over the {@link Use#FAST_TIER} length, judged at both ends a and b of the run
     * (the smaller), rounded up, within 1 … 2^16.
     */
    public static int chooseSubsteps(Equation reduced, Rational a, Rational b, Rational h) {
        double length = Double.POSITIVE_INFINITY;
        for (Rational c : new Rational[] {a, b}) {
            length = Math.min(length, lengthEstimate(reduced, new Recurrence(reduced, c), Use.FAST_TIER));
        }
        double s = Math.ceil(Math.abs(h.doubleEstimate()) / length);
        return s <= 1 ? 1 : s >= 1 << 16 ? 1 << 16 : (int) s;
    }

    /**
     * The largest power of two not above {@code width}, for a positive heuristic width (clamped
     * to 2^−1022 … 2^60).
     */
    public static Rational powerOfTwoBelow(double width) {
        int e = Math.getExponent(Math.max(Math.min(width, 0x1p60), Double.MIN_NORMAL));
        return e >= 0 ? Rational.of(BigInteger.ONE.shiftLeft(e)) : Rational.of(BigInteger.ONE, BigInteger.ONE.shiftLeft(-e));
    }

    /**
     * Heuristic: the most terms one series sum may take at {@code precBits} before the step is
     * declared too long ({@link LocalSeries.StepTooLongException}): 4·precBits + 2000, far more
     * than a step of half the contraction radius needs (about precBits terms).
     */
    public static int chooseMaxTerms(int precBits) {
        return 4 * precBits + 2000;
    }
}
