package dev.odetab.tables;

/** Entries that the precision cap could not decide, with their points. */
public final class UndecidedException extends Exception {
    private static final long serialVersionUID = 1L;

    public UndecidedException(String message) {
        super(message);
    }
}
