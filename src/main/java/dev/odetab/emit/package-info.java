/**
 * Outputs: CSV (univocity-parsers), C, Java and user templates (FreeMarker), provenance and
 * {@code manifest.json}, each written to a temporary file and renamed into place.
 *
 * <p>Invariant: nothing here computes a table value: every entry's literal is spelled from an
 * already decided entry (hex floats, shortest decimals, stored integers), the one rounding
 * here (an exact grid constant to its binary64 literal) goes through
 * {@link dev.odetab.numeric.Rounding}, templates only lay literals out, and the same table gives the same bytes (no timestamps, {@code Locale.ROOT},
 * UTF-8, {@code \n}). A failing write leaves every existing file as it was.
 */
package dev.odetab.emit;
