package dev.odetab.audit;

import dev.odetab.numeric.Rational;
import java.util.List;

/**
 * The entries read from a foreign table, in file order.
 *
 * @param source the file as given on the command line
 * @param name the array or column the entries come from
 * @param entries the entries
 * @param xs the abscissa each entry maps to (a CSV {@code x} column, already matched to grid
 *     points as grid indices), or null when entries map to grid points by position
 */
public record Entries(String source, String name, List<Item> entries, List<Integer> xs) {
    public Entries {
        entries = List.copyOf(entries);
        xs = xs == null ? null : List.copyOf(xs);
    }

    /**
     * One entry.
     *
     * @param text the entry as written in the file
     * @param line 1-based line of the entry
     * @param column 1-based column of the entry
     * @param value the exact value held (for an infinity, null)
     * @param negative the sign bit (a negative zero has it)
     */
    public record Item(String text, int line, int column, Rational value, boolean negative) {
        public boolean infinite() {
            return value == null;
        }
    }
}
