package dev.odetab.tables;

import dev.odetab.numeric.Format;
import dev.odetab.numeric.OutOfRange;
import dev.odetab.numeric.RoundingMode;
import dev.odetab.numeric.Target;
import dev.odetab.ode.FunctionDef;
import java.util.List;

/**
 * One table of a spec, validated.
 *
 * @param name the table's name (file names derive from it)
 * @param functionName the function as the spec names it
 * @param function the function
 * @param kind the kind of table, with its grid or what its points are found from
 * @param columns the columns, in order
 * @param target the entries' format, rounding mode and fixed-point policy
 * @param capBits the precision cap of the precision loop
 * @param outputs template names or paths, in order
 */
public record TableDef(String name, String functionName, FunctionDef function, TableKind kind, List<Column> columns,
        Target target, int capBits, List<String> outputs) {
    public TableDef {
        columns = List.copyOf(columns);
        outputs = List.copyOf(outputs);
    }

    /** The entries' format, {@code target().format()}. */
    public Format format() {
        return target.format();
    }

    /** The rounding mode, {@code target().rounding()}. */
    public RoundingMode rounding() {
        return target.rounding();
    }

    /** The fixed-point policy, {@code target().outOfRange()}. */
    public OutOfRange outOfRange() {
        return target.outOfRange();
    }

    /**
     * The grid of a table whose points are given (values and taylor tables; the evaluators of the
     * other kinds never ask).
     *
     * @throws IllegalStateException for a kind whose points are found (zeros, quadrature)
     */
    public Grid grid() {
        return kind.givenPoints().orElseThrow(() -> new IllegalStateException("table " + name + " has no grid: its points are found"));
    }
}
