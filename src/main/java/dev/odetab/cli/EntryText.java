package dev.odetab.cli;

import dev.odetab.numeric.Entry;
import dev.odetab.numeric.Format;

/** An entry as a table holds it, for {@code eval --format}. */
final class EntryText {
    private EntryText() {
    }

    /**
     * Binary formats: the C99 hex float literal; double-double: the head and the tail literals,
     * separated by a space; decimal: the N-digit decimal; fixed point: the stored integer.
     */
    static String of(Entry e) {
        Format f = e.format();
        if (f instanceof Format.BinaryFormat) {
            return e.hexLiteral();
        }
        if (f instanceof Format.DoubleDouble) {
            return e.hi().hexLiteral() + " " + e.lo().hexLiteral();
        }
        if (f instanceof Format.DecimalFormat) {
            return e.decimalText();
        }
        return e.fixedInteger().toString();
    }
}
