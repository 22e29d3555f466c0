package dev.odetab.base;

/**
 * Bad input from the user (exit code 2): a message and where the problem is, as
 * {@code file:line:column} for files or {@code argument N, column C} for the command line.
 */
public final class InputError extends Exception {
    private static final long serialVersionUID = 1L;
    private final String where;
    private final String what;

    public InputError(String where, String what) {
        super(where + ": " + what);
        this.where = where;
        this.what = what;
    }

    public String where() {
        return where;
    }

    public String what() {
        return what;
    }

    /** The location of a column inside a command-line argument (1-based index and column). */
    public static String argument(int index, String text, int column) {
        return "argument " + index + " '" + text + "', column " + column;
    }
}
