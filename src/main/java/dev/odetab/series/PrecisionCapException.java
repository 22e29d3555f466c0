package dev.odetab.series;

import dev.odetab.numeric.Ball;

/** The precision loop reached its cap without deciding the rounding; carries the last enclosure. */
public final class PrecisionCapException extends Exception {
    private static final long serialVersionUID = 1L;
    private final transient Ball lastEnclosure;
    private final int capBits;

    public PrecisionCapException(int capBits, Ball lastEnclosure) {
        super("the precision cap of " + capBits + " bits was reached before the rounding could be decided (last enclosure "
                + lastEnclosure + ")");
        this.capBits = capBits;
        this.lastEnclosure = lastEnclosure;
    }

    public Ball lastEnclosure() {
        return lastEnclosure;
    }

    public int capBits() {
        return capBits;
    }
}
