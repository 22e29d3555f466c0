package dev.odetab.spec;

import dev.odetab.base.InputError;

import dev.odetab.numeric.Format;
import dev.odetab.numeric.OutOfRange;
import dev.odetab.numeric.Rational;
import dev.odetab.numeric.RoundingMode;
import dev.odetab.numeric.Target;
import dev.odetab.ode.FunctionDef;
import dev.odetab.ode.family.Catalog;
import dev.odetab.tables.Column;
import dev.odetab.tables.Grid;
import dev.odetab.tables.TableDef;
import dev.odetab.tables.TableKind;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.tomlj.TomlArray;
import org.tomlj.TomlPosition;
import org.tomlj.TomlTable;

/** Reading and validating the {@code [tables.*]} part of a spec (DESIGN.md "Spec file"). */
final class SpecTables {
    static final Set<String> TABLE_KEYS = new LinkedHashSet<>(List.of("function", "kind", "grid", "points", "columns",
            "format", "rounding", "out_of_range", "precision_cap_bits", "outputs", "java_package", "terms", "search", "count", "of", "weight_underflow"));
    static final Set<String> GRID_KEYS = new LinkedHashSet<>(List.of("from", "to", "step"));
    static final Set<String> KINDS = new LinkedHashSet<>(List.of("values", "zeros", "quadrature", "taylor"));
    static final Set<String> BUILT_IN_OUTPUTS = new LinkedHashSet<>(List.of("csv", "c", "java"));
    static final int MAX_POINTS = 10_000_000;
    /**
     * Array entries one {@code java} output may hold. Its class initializer fills the arrays,
     * and a method's code must be shorter than 65536 bytes (JVMS §4.7.3, code_length): javac
     * spends up to 8 bytes per entry (dup, sipush index, ldc_w or ldc2_w constant, store) and
     * about 8 per array, so 8000 entries stay below the limit with room for 130 arrays.
     */
    static final int MAX_JAVA_ENTRIES = 8000;
    static final int DEFAULT_CAP_BITS = 4096;
    static final int MAX_CAP_BITS = 1 << 20;

    private final SpecFile spec;
    private final TomlTable root;
    private final Path specDir;

    SpecTables(SpecFile spec, TomlTable root, Path specDir) {
        this.spec = spec;
        this.root = root;
        this.specDir = specDir;
    }

    List<TableDef> all() throws InputError {
        List<TableDef> r = new ArrayList<>();
        TomlTable tables = root.getTable("tables");
        if (tables == null) {
            return r;
        }
        for (String name : tables.keySet()) {
            r.add(table(name));
        }
        return r;
    }

    private TableDef table(String name) throws InputError {
        List<String> base = List.of("tables", name);
        if (!name.matches("[A-Za-z][A-Za-z0-9_]*")) {
            throw spec.error(base, "table name '" + name + "' must start with a letter and hold only letters, digits and '_' (it names files and identifiers)");
        }
        TomlTable t = root.getTable(base);
        if (t == null) {
            throw spec.error(base, "tables." + name + " must be a table ([tables." + name + "])");
        }
        for (String key : t.keySet()) {
            if (!TABLE_KEYS.contains(key)) {
                throw spec.error(child(base, key), "unknown key '" + key + "'" + Suggestions.hint(key, TABLE_KEYS)
                        + " (a table has: " + String.join(", ", TABLE_KEYS) + ")");
            }
        }
        String kind = t.contains("kind") ? string(base, t, "kind") : "values";
        if (!KINDS.contains(kind)) {
            throw spec.error(child(base, "kind"), "unknown kind '" + kind + "'" + Suggestions.hint(kind, KINDS)
                    + " (kinds: " + String.join(", ", KINDS) + ")");
        }
        if (!kind.equals("quadrature") && t.contains("weight_underflow")) {
            throw spec.error(child(base, "weight_underflow"), "'weight_underflow' belongs to quadrature tables (kind = \"quadrature\")");
        }
        for (String zeroKey : List.of("search", "count", "of")) {
            if (!kind.equals("zeros") && t.contains(zeroKey)) {
                throw spec.error(child(base, zeroKey), "'" + zeroKey + "' belongs to zeros tables (kind = \"zeros\")");
            }
        }
        int terms = 0;
        if (kind.equals("taylor")) {
            Object v = t.get(List.of("terms"));
            if (v == null) {
                throw spec.error(base, "a taylor table needs 'terms' (how many Taylor coefficients per center, 1 to " + Column.MAX_TAYLOR_TERMS + ")");
            }
            if (!(v instanceof Long l) || l < 1 || l > Column.MAX_TAYLOR_TERMS) {
                throw spec.error(child(base, "terms"), "'terms' must be an integer from 1 to " + Column.MAX_TAYLOR_TERMS);
            }
            terms = (int) (long) l;
        } else if (t.contains("terms")) {
            throw spec.error(child(base, "terms"), "'terms' belongs to taylor tables (kind = \"taylor\")");
        }
        if (!t.contains("function")) {
            throw spec.error(base, "table '" + name + "' needs 'function' (a name from [functions] or a built-in family without parameters)");
        }
        String fname = string(base, t, "function");
        FunctionDef f = function(child(base, "function"), fname);
        boolean quadrature = kind.equals("quadrature");
        Grid grid = quadrature || kind.equals("zeros") ? null : grid(base, t);
        TableKind tableKind = kind.equals("zeros") ? zeroSearch(base, t) : null;
        List<Column> columns = quadrature ? null
                : kind.equals("zeros") && !t.contains("columns") ? List.of(Column.parse("x")) : columns(base, t, terms);
        Format format = Format.BinaryFormat.BINARY64;
        if (t.contains("format")) {
            String text = string(base, t, "format");
            try {
                format = Format.parse(text);
            } catch (IllegalArgumentException e) {
                throw spec.error(child(base, "format"), e.getMessage());
            }
        }
        RoundingMode rounding = RoundingMode.NEAREST_EVEN;
        if (t.contains("rounding")) {
            try {
                rounding = RoundingMode.parse(string(base, t, "rounding"));
            } catch (IllegalArgumentException e) {
                throw spec.error(child(base, "rounding"), e.getMessage());
            }
        }
        OutOfRange outOfRange = OutOfRange.ERROR;
        if (t.contains("out_of_range")) {
            String text = string(base, t, "out_of_range");
            if (!format.hasOutOfRangePolicy()) {
                throw spec.error(child(base, "out_of_range"), "out_of_range applies to fixed-point formats only, and this table's format is " + format.name());
            }
            switch (text) {
                case "error" -> outOfRange = OutOfRange.ERROR;
                case "saturate" -> outOfRange = OutOfRange.SATURATE;
                default -> throw spec.error(child(base, "out_of_range"), "out_of_range must be \"error\" or \"saturate\", got \"" + text + "\"");
            }
        }
        int cap = DEFAULT_CAP_BITS;
        if (t.contains("precision_cap_bits")) {
            Object v = t.get(List.of("precision_cap_bits"));
            if (!(v instanceof Long l) || l < 64 || l > MAX_CAP_BITS) {
                throw spec.error(child(base, "precision_cap_bits"), "precision_cap_bits must be an integer from 64 to " + MAX_CAP_BITS);
            }
            cap = (int) (long) l;
        }
        if (quadrature) {
            SpecQuadrature.Parsed rule = new SpecQuadrature(spec, root).table(base, t, fname, f, format);
            tableKind = rule.kind();
            columns = rule.columns();
        } else if (grid != null && grid.hasIrrationalPoints()) {
            for (Column c : columns) {
                if (c.order() >= 2 || c.taylor()) {
                    throw spec.error(child(base, "columns"), "column '" + c.name()
                            + "' needs exact grid points; a Chebyshev grid has irrational nodes (available there: x, value, derivative)");
                }
            }
        }
        if (tableKind == null) {
            tableKind = terms > 0 ? new TableKind.Taylor(grid, terms) : new TableKind.Values(grid);
        }
        List<String> outputs = outputs(base, t, javaEntries(tableKind, columns, format));
        return new TableDef(name, fname, f, tableKind, columns, new Target(format, rounding, outOfRange), cap, outputs);
    }

    private FunctionDef function(List<String> key, String fname) throws InputError {
        if (spec.functionNames().contains(fname)) {
            return spec.function(fname);
        }
        var family = Catalog.lookup(fname);
        if (family.isPresent() && family.get().parameters().isEmpty()) {
            try {
                return family.get().define(Map.of());
            } catch (dev.odetab.ode.family.ParameterException e) {
                throw spec.error(key, e.getMessage());
            }
        }
        if (family.isPresent()) {
            List<String> params = family.get().parameters().stream().map(p -> p.name()).toList();
            throw spec.error(key, "the family " + fname + " takes parameters (" + String.join(", ", params)
                    + "), so a table cannot name it directly: define a function under [functions] with family = \""
                    + fname + "\" and its parameters, and name that function here");
        }
        Set<String> known = new TreeSet<>(spec.functionNames());
        throw spec.error(key, "unknown function '" + fname + "'" + Suggestions.hint(fname, known)
                + (known.isEmpty() ? " (the spec defines no [functions])" : " (defined: " + String.join(", ", spec.functionNames()) + ")"));
    }

    private Grid grid(List<String> base, TomlTable t) throws InputError {
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

    private TableKind.Zeros zeroSearch(List<String> base, TomlTable t) throws InputError {
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
            String of = string(base, t, "of");
            if (!of.equals("value") && !of.equals("derivative")) {
                throw spec.error(child(base, "of"), "'of' must be \"value\" (zeros of y) or \"derivative\" (zeros of y')");
            }
            ofDerivative = of.equals("derivative");
        }
        return new TableKind.Zeros(from, to, count, ofDerivative);
    }

    static final Set<String> CHEBYSHEV_KEYS = new LinkedHashSet<>(List.of("chebyshev", "n", "from", "to"));
    static final int MAX_NODES = 100_000;

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

    private List<Column> columns(List<String> base, TomlTable t, int terms) throws InputError {
        if (!t.contains("columns")) {
            return terms > 0 ? expand(List.of(Column.parse("x")), terms) : List.of(Column.parse("x"), Column.parse("value"));
        }
        TomlArray arr = t.getArray(List.of("columns"));
        if (arr == null || arr.size() == 0) {
            throw spec.error(child(base, "columns"), "'columns' must be a non-empty array of column names");
        }
        List<Column> r = new ArrayList<>();
        Set<String> seen = new LinkedHashSet<>();
        for (int i = 0; i < arr.size(); i++) {
            Object v = arr.get(i);
            TomlPosition p = arr.inputPositionOf(i);
            String where = spec.display() + ":" + p.line() + ":" + p.column();
            Column c = v instanceof String s ? Column.parse(s) : null;
            if (terms > 0) {
                c = "taylor".equals(v) ? new Column("taylor", 0, true) : "x".equals(v) ? Column.parse("x") : null;
                if (c == null) {
                    String given = String.valueOf(v);
                    throw new InputError(where, "column '" + given + "' is not available in a taylor table"
                            + Suggestions.hint(given, List.of("x", "taylor")) + " (available: x, taylor)");
                }
            }
            if (c == null) {
                String given = String.valueOf(v);
                throw new InputError(where, "column '" + given + "' is not available in a values table"
                        + Suggestions.hint(given, List.of("x", "value", "derivative"))
                        + " (available: x, value, derivative, derivative2 … derivative" + Column.MAX_DERIVATIVE + ")");
            }
            if (!seen.add(c.name())) {
                throw new InputError(where, "column '" + c.name() + "' appears twice");
            }
            r.add(c);
        }
        return terms > 0 ? expand(r, terms) : r;
    }

    /** The spec's column {@code taylor} becomes taylor0 … taylor(terms−1). */
    private static List<Column> expand(List<Column> cols, int terms) {
        List<Column> r = new ArrayList<>();
        for (Column c : cols) {
            if (c.taylor()) {
                for (int k = 0; k < terms; k++) {
                    r.add(Column.taylor(k));
                }
            } else {
                r.add(c);
            }
        }
        if (r.stream().noneMatch(Column::taylor)) {
            for (int k = 0; k < terms; k++) {
                r.add(Column.taylor(k));
            }
        }
        return r;
    }

    /**
     * The entries of a {@code java} output's arrays: rows × columns, twice that for binary128
     * and double-double (two arrays per column); a zeros table counts its {@code count}, and
     * 0 when that is not given (the number of zeros is known only after the search).
     */
    private static long javaEntries(TableKind kind, List<Column> columns, Format format) {
        long rows = kind.rowsBeforeEvaluation();
        int arrays = switch (format.kind()) {
            case DOUBLE_DOUBLE -> 2;
            case BINARY -> format.equals(Format.BinaryFormat.BINARY128) ? 2 : 1;
            case DECIMAL, FIXED -> 1;
        };
        return rows * columns.size() * arrays;
    }

    private List<String> outputs(List<String> base, TomlTable t, long javaEntries) throws InputError {
        if (!t.contains("outputs")) {
            return List.of("csv");
        }
        TomlArray arr = t.getArray(List.of("outputs"));
        if (arr == null || arr.size() == 0) {
            throw spec.error(child(base, "outputs"), "'outputs' must be a non-empty array of template names (csv, c, java) or .ftl paths");
        }
        List<String> r = new ArrayList<>();
        for (int i = 0; i < arr.size(); i++) {
            Object v = arr.get(i);
            TomlPosition p = arr.inputPositionOf(i);
            String where = spec.display() + ":" + p.line() + ":" + p.column();
            if (!(v instanceof String s)) {
                throw new InputError(where, "an output must be a template name (csv, c, java) or a path to a .ftl file");
            }
            if (s.equals("java") && javaEntries > MAX_JAVA_ENTRIES) {
                throw new InputError(where, "a java output holds the whole table in one class, whose initializer the JVM limits to"
                        + " 64 KiB of bytecode (JVMS 4.7.3): at most " + MAX_JAVA_ENTRIES + " array entries, and this table has "
                        + javaEntries + "; use \"c\" or \"csv\" for it, or split it into smaller tables");
            }
            if (BUILT_IN_OUTPUTS.contains(s)) {
                r.add(s);
            } else if (s.endsWith(".ftl")) {
                Path tp = specDir.resolve(s).normalize();
                if (!Files.isRegularFile(tp)) {
                    throw new InputError(where, "template file '" + s + "' does not exist (looked for " + tp + ")");
                }
                r.add(tp.toString());
            } else {
                throw new InputError(where, "unknown template '" + s + "'" + Suggestions.hint(s, BUILT_IN_OUTPUTS)
                        + " (built-in: csv, c, java; or a path to a .ftl file)");
            }
        }
        return r;
    }

    private String string(List<String> base, TomlTable t, String key) throws InputError {
        Object v = t.get(List.of(key));
        if (!(v instanceof String s)) {
            throw spec.error(child(base, key), "'" + key + "' must be a string");
        }
        return s;
    }

    private static List<String> child(List<String> base, String key) {
        List<String> r = new ArrayList<>(base);
        r.add(key);
        return r;
    }
}
