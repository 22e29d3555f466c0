package dev.odetab.numeric;

import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Optional;

/** Conversions between binary precision (the unit users and the engine speak) and decimal digits. */
public final class Precision {
    /** Significant decimal digits of every stored radius; radii are always rounded up to this. */
    public static final int RADIUS_DIGITS = 12;
    static final MathContext RADIUS_UP = new MathContext(RADIUS_DIGITS, RoundingMode.CEILING);
    static final MathContext RADIUS_DOWN = new MathContext(RADIUS_DIGITS, RoundingMode.FLOOR);

    private Precision() {
    }

    /**
     * Decimal digits that carry at least {@code precBits} bits: ceil(precBits · log10 2) + 1.
     * The +1 makes the relative rounding error of a midpoint at most 2^-precBits.
     */
    public static int digits10(int precBits) {
        if (precBits < 2) {
            throw new IllegalArgumentException("precision must be at least 2 bits, got " + precBits);
        }
        return (int) Math.ceil(precBits * 0.30102999566398120) + 1;
    }

    /** Bits carried by {@code digits10} decimal digits (rounded up): the inverse of {@link #digits10}. */
    public static int bitsForDigits(int digits10) {
        return (int) Math.ceil(digits10 * 3.3219280948873623) + 1;
    }

    /**
     * Why format {@code f} cannot be rounded to within a precision cap of {@code capBits}, or empty
     * when it can: an enclosure computed at p bits is about 2^−p wide relative to the value, so it
     * decides a rounding to more than p significant bits only by chance, and the precision loop
     * never works above the cap. Such a format is refused before any work.
     */
    public static Optional<String> formatAboveCap(Format f, int capBits) {
        if (f.significantBits() <= capBits) {
            return Optional.empty();
        }
        return Optional.of(f.name() + " holds " + f.significantBits() + " significant bits, more than the precision cap of " + capBits
                + " bits can decide; raise the cap to at least " + f.significantBits() + " bits, or choose a narrower format");
    }

    /** Round-half-even context for midpoints at {@code precBits}. */
    public static MathContext midpoint(int precBits) {
        return new MathContext(digits10(precBits), RoundingMode.HALF_EVEN);
    }
}
