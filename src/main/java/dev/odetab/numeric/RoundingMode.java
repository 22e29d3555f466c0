package dev.odetab.numeric;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;

/**
 * The rounding-direction attributes of IEEE 754-2019 §4.3 that a table may ask for.
 *
 * <p>{@link #NEAREST_EVEN} is roundTiesToEven (§4.3.1), {@link #DOWN} roundTowardNegative,
 * {@link #UP} roundTowardPositive and {@link #TOWARD_ZERO} roundTowardZero (§4.3.2).
 * The directed modes make enclosure tables: a DOWN entry never exceeds the exact value and
 * an UP entry is never below it.
 */
public enum RoundingMode {
    NEAREST_EVEN("nearest-even"),
    DOWN("down"),
    UP("up"),
    TOWARD_ZERO("toward-zero");

    private final String spelling;

    RoundingMode(String spelling) {
        this.spelling = spelling;
    }

    /** The spelling used in spec files and provenance: {@code nearest-even}, {@code down}, {@code up}, {@code toward-zero}. */
    public String spelling() {
        return spelling;
    }

    /**
     * Exact: the mode spelled {@code text} (as {@link #spelling()} writes it; case-sensitive,
     * surrounding blanks ignored).
     *
     * @throws IllegalArgumentException naming the text and listing the valid spellings
     */
    public static RoundingMode parse(String text) {
        String s = text == null ? "" : text.strip();
        for (RoundingMode m : values()) {
            if (m.spelling.equals(s)) {
                return m;
            }
        }
        throw new IllegalArgumentException(String.format(Locale.ROOT,
                "unknown rounding mode '%s'; expected one of %s", text, validSpellings()));
    }

    /** The valid spellings, comma-separated, for messages. */
    public static String validSpellings() {
        return Arrays.stream(values()).map(RoundingMode::spelling).collect(Collectors.joining(", "));
    }

    /**
     * Whether a value of the given sign, when inexact, is rounded to the neighbour of larger
     * magnitude in this directed mode (IEEE 754-2019 §4.3.2). Not meaningful for
     * {@link #NEAREST_EVEN}, which returns false.
     */
    boolean awayFromZero(boolean negative) {
        return (this == UP && !negative) || (this == DOWN && negative);
    }

    /** The same direction for BigDecimal rounding. */
    java.math.RoundingMode toJava() {
        return switch (this) {
            case NEAREST_EVEN -> java.math.RoundingMode.HALF_EVEN;
            case DOWN -> java.math.RoundingMode.FLOOR;
            case UP -> java.math.RoundingMode.CEILING;
            case TOWARD_ZERO -> java.math.RoundingMode.DOWN;
        };
    }
}
