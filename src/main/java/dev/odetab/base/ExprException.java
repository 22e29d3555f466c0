package dev.odetab.base;

/**
 * A malformed or meaningless expression or equation, with the position of the fault.
 *
 * <p>{@link #getMessage()} is the bare reason, without any position prefix (for example
 * {@code expected a number, a name or '(' after '+', found the end of the text}); the caller
 * adds file, line and {@link #column()} in its own format ({@code spec.toml:4:17: ...}).
 */
public final class ExprException extends Exception {
    private static final long serialVersionUID = 1L;

    private final int column;

    /**
     * @param column 1-based column in the parsed text; one past the last character when the
     *     fault is the end of the text
     * @param message what was expected or what is wrong, without a position
     */
    public ExprException(int column, String message) {
        super(message);
        if (column < 1) {
            throw new IllegalArgumentException("column must be 1-based, got " + column);
        }
        this.column = column;
    }

    /** The 1-based column, in the text given to the parser, of the offending character, operator or name. */
    public int column() {
        return column;
    }
}
