package dev.odetab.audit;

import dev.odetab.numeric.Rational;
import dev.odetab.tables.TableDef;
import java.util.List;

/**
 * The audit of one foreign table.
 *
 * @param table the spec table the file is measured against
 * @param column the table column audited ({@code value}, {@code derivative})
 * @param entries what was read
 * @param rows one per entry, in file order
 * @param tolerance the tolerance in ulps
 * @param maxPrecBits the highest working precision an entry needed
 */
public record AuditResult(TableDef table, String column, Entries entries, List<Row> rows, double tolerance, int maxPrecBits) {
    public AuditResult {
        rows = List.copyOf(rows);
    }

    /**
     * One entry measured.
     *
     * @param index 0-based position in the file
     * @param x the grid point it stands for
     * @param item the entry as read
     * @param exact the exact value correctly rounded to {@code exactDigits} significant digits, the most (at
     *     most {@link Auditor#EXACT_DIGITS}) that its enclosure decides; empty when it decides none
     * @param exactDigits how many significant digits {@code exact} has
     * @param ulps signed error (entry − exact)/ulp(exact), at the enclosure's midpoint
     * @param ulpsRadiusBound how far the true error can be from {@code ulps} (the enclosure radius in ulps, rounded up)
     * @param absolute entry − exact
     * @param relative (entry − exact)/|exact| (infinite when exact is zero and the entry is not)
     * @param beyond whether |error| exceeds the tolerance (decided from the enclosure)
     * @param wrongSign the entry's sign differs from the exact value's
     * @param wrongExponent the entry lies outside [2^e, 2^(e+1)] (or the decimal analogue), e the exponent of the exact value
     */
    public record Row(int index, Rational x, Entries.Item item, String exact, int exactDigits, double ulps, double ulpsRadiusBound,
            double absolute, double relative, boolean beyond, boolean wrongSign, boolean wrongExponent) {
    }
}
