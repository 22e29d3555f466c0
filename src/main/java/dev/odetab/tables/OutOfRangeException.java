package dev.odetab.tables;

/**
 * A table that cannot be written: an entry outside the range of a fixed-point format whose policy
 * is "error", an underflowing weight, or a zero search that finds fewer zeros than asked.
 */
public final class OutOfRangeException extends Exception {
    private static final long serialVersionUID = 1L;

    public OutOfRangeException(String message) {
        super(message);
    }
}
