package dev.odetab.ode.family;

/** A parameter value outside its allowed range, or a missing or unknown parameter. */
public final class ParameterException extends Exception {
    private static final long serialVersionUID = 1L;
    private final String parameter;

    public ParameterException(String parameter, String message) {
        super(message);
        this.parameter = parameter;
    }

    /** The parameter concerned (null when the message is about the set of parameters). */
    public String parameter() {
        return parameter;
    }
}
