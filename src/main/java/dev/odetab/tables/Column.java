package dev.odetab.tables;

/**
 * A column of a table: the point {@code x}, the {@code value}, the {@code derivative}, a higher
 * derivative {@code derivativeK} (K = 2 … 9, from the Taylor coefficients at the point:
 * y^(K)(x) = K! c_K), or, in a {@code taylor} table, the Taylor coefficient {@code taylorK} = c_K
 * at the point (the spec's column {@code taylor} expands to taylor0 … taylor(terms−1)); in a
 * {@code quadrature} table, the {@code node} (a point column), its {@code weight}, the
 * {@code scaled_weight} and the {@code weight_flag} of a flushed weight ({@link dev.odetab.tables.quadrature.GaussRule}).
 *
 * @param name the name in the spec and in the outputs
 * @param order −1 for x, 0 for the value, K for the K-th derivative or coefficient
 * @param taylor true for a Taylor coefficient c_K rather than the derivative K! c_K
 */
public record Column(String name, int order, boolean taylor) {
    public static final int MAX_DERIVATIVE = 9;
    public static final int MAX_TAYLOR_TERMS = 64;

    public Column(String name, int order) {
        this(name, order, false);
    }

    /** The Taylor coefficient c_k as a column. */
    public static Column taylor(int k) {
        return new Column("taylor" + k, k, true);
    }

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

    /** A column of a quadrature table: node, weight, scaled_weight or weight_flag; null for any other name. */
    public static Column quadrature(String name) {
        return switch (name) {
            case "node" -> new Column(name, -1);
            case "weight", "scaled_weight", "weight_flag" -> new Column(name, 0);
            default -> null;
        };
    }

    public boolean isPoint() {
        return order < 0;
    }
}
