package dev.odetab.spec;

import static dev.odetab.spec.SpecTables.child;

import dev.odetab.base.InputError;
import dev.odetab.numeric.Rational;
import dev.odetab.tables.Grid;
import dev.odetab.tables.TableKind;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.tomlj.TomlArray;
import org.tomlj.TomlPosition;
import org.tomlj.TomlTable;

/**
 * The points of a table, checked with positions: {@code grid} (from/to/step or Chebyshev nodes)
 * or {@code points} for values and taylor tables, {@code search} for zeros tables; every exact
 * point through {@link ExactPoints}.
 */
final class SpecGrid {
    static final Set<String> GRID_KEYS = new LinkedHashSet<>(List.of("from", "to", "step"));
    static final int MAX_POINTS = 10_000_000;
    static final Set<String> CHEBYSHEV_KEYS = new LinkedHashSet<>(List.of("chebyshev", "n", "from", "to"));
    static final int MAX_NODES = 100_000;


    private final SpecFile spec;

    SpecGrid(SpecFile spec) {
        this.spec = spec;
    }

    Grid grid(List<String> base, TomlTable t) throws InputError {
        boolean hasGrid = t.contains("grid");
        boolean hasPoints = t.contains("points");
        if (hasGrid && hasPoints) {
            throw spec.error(child(base, "points"), "give either 'grid' or 'points', not both");
        }
        if (!hasGrid && !hasPoints) {
            throw spec.error(base, "a values table needs 'grid' or 'points'");
        }
        if (hasPoints) {
            TomlArray arr = t.getArray(List.of("points"));
            if (arr == null || arr.size() == 0) {
                throw spec.error(child(base, "points"), "'points' must be a non-empty array of exact numbers as strings (\"0.1\", \"1/3\", \"2^-3\")");
            }
            List<Rational> pts = new ArrayList<>();
            for (int i = 0; i < arr.size(); i++) {
                pts.add(exact(arr, i));
            }
            return new Grid.Points(pts);
        }
        List<String> gk = child(base, "grid");
        if (!t.isTable(List.of("grid"))) {
            throw spec.error(gk, "'grid' must be an inline table { from = \"…\", to = \"…\", step = \"…\" }");
        }
        TomlTable g = t.getTable(List.of("grid"));
        if (g.contains("chebyshev")) {
            return chebyshev(gk, g);
        }
        for (String key : g.keySet()) {
            if (!GRID_KEYS.contains(key)) {
                throw spec.error(child(gk, key), "unknown key '" + key + "' in grid" + Suggestions.hint(key, GRID_KEYS) + " (a grid has: from, to, step)");
            }
        }
        for (String key : GRID_KEYS) {
            if (!g.contains(key)) {
                throw spec.error(gk, "the grid needs '" + key + "'");
            }
        }
        Rational from = exactValue(child(gk, "from"), g.get(List.of("from")));
        Rational to = exactValue(child(gk, "to"), g.get(List.of("to")));
        Rational step = exactValue(child(gk, "step"), g.get(List.of("step")));
        if (step.signum() == 0 || (to.compareTo(from) != 0 && step.signum() != to.subtract(from).signum())) {
            throw spec.error(child(gk, "step"), "the step " + step.toDecimalOrFraction() + " does not lead from "
                    + from.toDecimalOrFraction() + " to " + to.toDecimalOrFraction());
        }
        Rational count = to.subtract(from).divide(step);
        if (!count.isInteger()) {
            throw spec.error(child(gk, "step"), "the step " + step.toDecimalOrFraction() + " does not divide the range from "
                    + from.toDecimalOrFraction() + " to " + to.toDecimalOrFraction() + " (" + count.toDecimalOrFraction() + " steps)");
        }
        if (count.compareTo(Rational.of(MAX_POINTS - 1)) > 0) {
            throw spec.error(child(gk, "step"), "the grid has " + count.add(Rational.ONE) + " points; at most " + MAX_POINTS + " are allowed");
        }
        return new Grid.Uniform(from, to, step);
    }

    TableKind.Zeros zeroSearch(List<String> base, TomlTable t) throws InputError {
        if (t.contains("grid") || t.contains("points")) {
            throw spec.error(child(base, t.contains("grid") ? "grid" : "points"), "a zeros table searches an interval: give 'search' instead of a grid");
        }
        if (!t.isTable(List.of("search"))) {
            throw spec.error(t.contains("search") ? child(base, "search") : base,
                    "a zeros table needs search = { from = \"…\", to = \"…\" } (zeros met walking from 'from' to 'to')");
        }
        List<String> sk = child(base, "search");
        TomlTable g = t.getTable(List.of("search"));
        for (String key : g.keySet()) {
            if (!key.equals("from") && !key.equals("to")) {
                throw spec.error(child(sk, key), "unknown key '" + key + "' in search (it has: from, to)");
            }
        }
        if (!g.contains("from") || !g.contains("to")) {
            throw spec.error(sk, "search needs 'from' and 'to'");
        }
        Rational from = exactValue(child(sk, "from"), g.get(List.of("from")));
        Rational to = exactValue(child(sk, "to"), g.get(List.of("to")));
        if (from.equals(to)) {
            throw spec.error(child(sk, "to"), "the search interval is empty (from = to)");
        }
        int count = 0;
        if (t.contains("count")) {
            Object v = t.get(List.of("count"));
            if (!(v instanceof Long l) || l < 1 || l > 100_000) {
                throw spec.error(child(base, "count"), "'count' must be an integer from 1 to 100000");
            }
            count = (int) (long) l;
        }
        boolean ofDerivative = false;
        if (t.contains("of")) {
            String of = SpecTables.string(spec, base, t, "of");
            if (!of.equals("value") && !of.equals("derivative")) {
                throw spec.error(child(base, "of"), "'of' must be \"value\" (zeros of y) or \"derivative\" (zeros of y')");
            }
            ofDerivative = of.equals("derivative");
        }
        return new TableKind.Zeros(from, to, count, ofDerivative);
    }

    private Grid chebyshev(List<String> gk, TomlTable g) throws InputError {
        for (String key : g.keySet()) {
            if (!CHEBYSHEV_KEYS.contains(key)) {
                throw spec.error(child(gk, key), "unknown key '" + key + "' in a Chebyshev grid" + Suggestions.hint(key, CHEBYSHEV_KEYS)
                        + " (it has: chebyshev, n, from, to)");
            }
        }
        for (String key : CHEBYSHEV_KEYS) {
            if (!g.contains(key)) {
                throw spec.error(gk, "the Chebyshev grid needs '" + key + "'");
            }
        }
        Object kindValue = g.get(List.of("chebyshev"));
        int kind = "first".equals(kindValue) ? 1 : "second".equals(kindValue) ? 2 : 0;
        if (kind == 0) {
            throw spec.error(child(gk, "chebyshev"), "chebyshev must be \"first\" (zeros of T_n) or \"second\" (extrema, ends included)");
        }
        Object nValue = g.get(List.of("n"));
        int min = kind == 1 ? 1 : 2;
        if (!(nValue instanceof Long l) || l < min || l > MAX_NODES) {
            throw spec.error(child(gk, "n"), "n must be an integer from " + min + " to " + MAX_NODES);
        }
        Rational from = exactValue(child(gk, "from"), g.get(List.of("from")));
        Rational to = exactValue(child(gk, "to"), g.get(List.of("to")));
        if (from.compareTo(to) >= 0) {
            throw spec.error(child(gk, "to"), "the interval must have from < to");
        }
        return new Grid.Chebyshev(kind, (int) (long) (Long) nValue, from, to);
    }

    /** Entry i of an array of points ({@link ExactPoints}), errors located inside the entry's string. */
    private Rational exact(TomlArray arr, int i) throws InputError {
        TomlPosition p = arr.inputPositionOf(i);
        return ExactPoints.parse(arr.get(i), "point",
                (column, message) -> new InputError(spec.display() + ":" + p.line() + ":" + (p.column() + column), message));
    }

    /** The value of a key holding one exact point ({@link ExactPoints}). */
    private Rational exactValue(List<String> key, Object v) throws InputError {
        return ExactPoints.parse(v, "number", (column, message) -> column == 0 ? spec.error(key, message) : spec.errorInString(key, column, message));
    }
}
