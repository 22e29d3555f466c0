package dev.odetab.numeric;

/**
 * What a fixed-point entry does when its rounded value lies outside the representable
 * range (DESIGN "Formats and rounding": error, or saturate and flag).
 */
public enum OutOfRange {
    /** The entry is {@link Entry.Kind#OUT_OF_RANGE}; the caller reports an error. */
    ERROR,
    /** The entry is clamped to the nearest end of the range and flagged {@link Entry.Kind#SATURATED}. */
    SATURATE
}
