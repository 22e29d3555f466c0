package dev.odetab.ode;

/** A path of continuation would cross (or end on) a real singular point of the equation. */
public final class SingularCrossingException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    SingularCrossingException(String message) {
        super(message);
    }
}
