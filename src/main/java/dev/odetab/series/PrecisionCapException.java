package dev.odetab.series;

import dev.odetab.numeric.Ball;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * The one "precision cap reached" of the program: a precision loop ({@link PrecisionLoop}) could
 * not decide what it was asked within the cap, so nothing is guessed. The command line maps it
 * to exit code 3 in one place. The message says what stayed undecided (entries, points, zeros)
 * and how to go on.
 */
public final class PrecisionCapException extends Exception {
    private static final long serialVersionUID = 1L;
    private final transient Ball lastEnclosure;
    private final int capBits;

    /** A single value whose rounding the cap could not decide, with its last enclosure. */
    public PrecisionCapException(int capBits, Ball lastEnclosure) {
        super("the precision cap of " + capBits + " bits was reached before the rounding could be decided (last enclosure "
                + brief(lastEnclosure) + ")");
        this.capBits = capBits;
        this.lastEnclosure = lastEnclosure;
    }

    /** Anything else the cap could not decide, described by {@code message} (which names the cap). */
    public PrecisionCapException(String message, int capBits) {
        super(message);
        this.capBits = capBits;
        this.lastEnclosure = null;
    }

    /**
     * An enclosure in a few characters: its midpoint to 17 significant digits and its radius
     * rounded up to 2, so that a message stays one line whatever the precision (the full midpoint
     * at the cap has thousands of digits).
     */
    static String brief(Ball b) {
        String mid = b.mid().round(new MathContext(17, RoundingMode.HALF_EVEN)).stripTrailingZeros().toString();
        String rad = b.rad().round(new MathContext(2, RoundingMode.UP)).stripTrailingZeros().toString();
        return (mid + " ± " + rad).replace("E", "e");
    }

    /** The last enclosure of a single value; null for the other failures. */
    public Ball lastEnclosure() {
        return lastEnclosure;
    }

    public int capBits() {
        return capBits;
    }
}
