package dev.odetab.cli;

import dev.odetab.numeric.Entry;

/** An entry as a table holds it, for {@code eval --format}. */
final class EntryText {
    private EntryText() {
    }

    /**
     * Binary formats: the C99 hex float literal; double-double: the head and the tail literals,
     * separated by a space; decimal: the N-digit decimal; fixed point: the stored integer.
     */
    static String of(Entry e) {
        return switch (e.format().kind()) {
            case BINARY -> e.hexLiteral();
            case DOUBLE_DOUBLE -> e.hi().hexLiteral() + " " + e.lo().hexLiteral();
            case DECIMAL -> e.decimalText();
            case FIXED -> e.fixedInteger().toString();
        };
    }
}
