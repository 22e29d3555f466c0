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
    NEAREST_EVEN("nearest-even", null, "roundTiesToEven: the nearest entry, ties to the even one"),
    DOWN("toward-negative", "down", "roundTowardNegative: never above the exact value"),
    UP("toward-positive", "up", "roundTowardPositive: never below the exact value"),
    TOWARD_ZERO("toward-zero", null, "roundTowardZero: never larger in magnitude than the exact value");

    private final String spelling;
    private final String alias;
    private final String direction;

    RoundingMode(String spelling, String alias, String direction) {
        this.spelling = spelling;
        this.alias = alias;
        this.direction = direction;
    }

    /**
     * The spelling used in spec files and provenance: {@code nearest-even}, {@code toward-negative},
     * {@code toward-positive}, {@code toward-zero} (IEEE 754-2019's attribute names, which cannot be
     * misread as Java's {@code RoundingMode.DOWN}, toward zero).
     */
    public String spelling() {
        return spelling;
    }

    /** The IEEE 754-2019 attribute and the direction in words, for help texts and provenance. */
    public String direction() {
        return direction;
    }

    /**
     * Exact: the mode spelled {@code text} (as {@link #spelling()} writes it, or the earlier
     * aliases {@code down} and {@code up}; case-sensitive, surrounding blanks ignored).
     *
     * @throws IllegalArgumentException naming the text and listing the valid spellings
     */
    public static RoundingMode parse(String text) {
        String s = text == null ? "" : text.strip();
        for (RoundingMode m : values()) {
            if (m.spelling.equals(s) || s.equals(m.alias)) {
                return m;
            }
        }
        throw new IllegalArgumentException(String.format(Locale.ROOT,
                "unknown rounding mode '%s'; expected one of %s", text, validSpellings()));
    }

    /** The valid spellings, comma-separated, for messages. */
    public static String validSpellings() {
        return Arrays.stream(values()).map(RoundingMode::spelling).collect(Collectors.joining(", "))
                + " (down and up are accepted for toward-negative and toward-positive)";
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
