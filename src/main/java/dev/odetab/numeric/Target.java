package dev.odetab.numeric;

import java.util.Objects;

/**
 * What an exact value or an enclosure is rounded to: a format, a rounding mode and the policy
 * for values beyond a fixed-point range (DESIGN "Formats and rounding"). The three always
 * travel together, from the spec or the command line to {@link Rounding#round} and
 * {@link Rounding#decide}.
 *
 * @param format     the entries' format
 * @param rounding   the rounding mode
 * @param outOfRange what a value beyond the range becomes; read only by formats whose
 *                   {@link Format#hasOutOfRangePolicy()} is true, {@link OutOfRange#ERROR}
 *                   for the others
 */
public record Target(Format format, RoundingMode rounding, OutOfRange outOfRange) {
    public Target {
        Objects.requireNonNull(format, "format");
        Objects.requireNonNull(rounding, "rounding mode");
        Objects.requireNonNull(outOfRange, "out-of-range policy");
    }

    /** {@code format} in {@code rounding} mode, with the default policy {@link OutOfRange#ERROR}. */
    public static Target of(Format format, RoundingMode rounding) {
        return new Target(format, rounding, OutOfRange.ERROR);
    }

    /** {@code format}, nearest-even (IEEE 754-2019 roundTiesToEven), policy {@link OutOfRange#ERROR}. */
    public static Target nearest(Format format) {
        return of(format, RoundingMode.NEAREST_EVEN);
    }
}
