package dev.odetab.ode;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * One singular point of P2 y'' + P1 y' + P0 y = 0: a root of the reduced P2.
 *
 * <p>Trust level: Rigorous (see {@link SingularPoints#of(Equation)}): {@code location}
 * contains this root and no other root of P2; {@code exact}, when not null, is the root
 * itself, verified by exact evaluation; {@code multiplicity} and {@code kind} are decided in
 * exact rational polynomial arithmetic; {@code real} is true exactly when the root is real
 * (proven both ways).
 *
 * @param location     isolating disk of the root
 * @param exact        the root in exact notation ({@code "1"}, {@code "-2i"},
 *                     {@code "-1/2 + 3i"}), or null when it was not recognised as a Gaussian
 *                     rational
 * @param multiplicity multiplicity as a root of the reduced P2
 * @param kind         Fuchs classification (DLMF 2.7(i), 2.7(ii))
 * @param real         true when the root is proven real, false when it is proven non-real
 */
public record SingularPoint(ComplexEnclosure location, String exact, int multiplicity, Kind kind, boolean real) {
    /** Fuchs: regular when P1/P2 has at most a simple and P0/P2 at most a double pole (DLMF 2.7(i)). */
    public enum Kind {
        REGULAR, IRREGULAR
    }

    private static final MathContext SHOWN = new MathContext(20, RoundingMode.HALF_EVEN);

    /** E.g. {@code x = 2i (regular, simple root of P2)}; an inexact root shows its center to 20 digits after {@code x ≈}. */
    @Override
    public String toString() {
        String where;
        if (exact != null) {
            where = "x = " + exact;
        } else {
            String re = location.re().round(SHOWN).toString();
            where = "x ≈ " + re;
            if (!real) {
                BigDecimal im = location.im().round(SHOWN);
                where += (im.signum() < 0 ? " - " : " + ") + im.abs() + "i";
            }
        }
        String root = switch (multiplicity) {
            case 1 -> "simple root";
            case 2 -> "double root";
            case 3 -> "triple root";
            default -> "root of multiplicity " + multiplicity;
        };
        return where + " (" + kind.name().toLowerCase(java.util.Locale.ROOT) + ", " + root + " of P2)";
    }
}
