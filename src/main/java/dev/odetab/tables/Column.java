package dev.odetab.tables;

/**
 * A column of a values table: the point {@code x}, the {@code value}, the {@code derivative},
 * or a higher derivative {@code derivativeK} (K = 2 … 9, from the Taylor coefficients at the
 * point: y^(K)(x) = K! c_K).
 *
 * @param name the name in the spec and in the outputs
 * @param order −1 for x, 0 for the value, K for the K-th derivative
 */
public record Column(String name, int order) {
    public static final int MAX_DERIVATIVE = 9;

    public static Column parse(String name) {
        switch (name) {
            case "x":
                return new Column(name, -1);
            case "value":
                return new Column(name, 0);
            case "derivative":
                return new Column(name, 1);
            default:
                if (name.matches("derivative[2-9]")) {
                    return new Column(name, name.charAt(name.length() - 1) - '0');
                }
                return null;
        }
    }

    public boolean isPoint() {
        return order < 0;
    }
}
