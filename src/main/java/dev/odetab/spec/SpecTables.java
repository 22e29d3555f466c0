package dev.odetab.spec;

import dev.odetab.base.InputError;

import dev.odetab.numeric.Format;
import dev.odetab.numeric.OutOfRange;
import dev.odetab.numeric.Precision;
import dev.odetab.numeric.RoundingMode;
import dev.odetab.numeric.Target;
import dev.odetab.ode.FunctionDef;
import dev.odetab.ode.family.Catalog;
import dev.odetab.tables.Column;
import dev.odetab.tables.Grid;
import dev.odetab.tables.Identifiers;
import dev.odetab.tables.TableDef;
import dev.odetab.tables.TableKind;
import dev.odetab.tables.values.TaylorEvaluator;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import org.tomlj.TomlArray;
import org.tomlj.TomlPosition;
import org.tomlj.TomlTable;

/** Reading and validating the {@code [tables.*]} part of a spec (DESIGN.md "Spec file"). */
final class SpecTables {
    static final Set<String> TABLE_KEYS = new LinkedHashSet<>(List.of("function", "kind", "grid", "points", "columns",
            "format", "rounding", "out_of_range", "precision_cap_bits", "outputs", "java_package", "terms", "search", "count", "of", "weight_underflow"));
    static final Set<String> KINDS = new LinkedHashSet<>(List.of("values", "zeros", "quadrature", "taylor"));
    static final Set<String> BUILT_IN_OUTPUTS = new LinkedHashSet<>(List.of("csv", "c", "java"));
    /**
     * Array entries one {@code java} output may hold. Its class initializer fills the arrays,
     * and a method's code must be shorter than 65536 bytes (JVMS §4.7.3, code_length): javac
     * spends up to 8 bytes per entry (dup, sipush index, ldc_w or ldc2_w constant, store) and
     * about 8 per array, so 8000 entries stay below the limit with room for 130 arrays.
     */
    static final int MAX_JAVA_ENTRIES = 8000;
    static final int DEFAULT_CAP_BITS = SpecFile.DEFAULT_PRECISION_CAP_BITS;
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
        String reserved = Identifiers.problem(name);
        if (reserved != null) {
            throw spec.error(base, reserved);
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
        String kind = kind(base, t);
        int terms = kind.equals("taylor") ? terms(base, t) : 0;
        if (!t.contains("function")) {
            throw spec.error(base, "table '" + name + "' needs 'function' (a name from [functions] or a built-in family without parameters)");
        }
        String fname = string(base, t, "function");
        FunctionDef f = function(child(base, "function"), fname);
        boolean quadrature = kind.equals("quadrature");
        Grid grid = quadrature || kind.equals("zeros") ? null : new SpecGrid(spec).grid(base, t);
        TableKind tableKind = kind.equals("zeros") ? new SpecGrid(spec).zeroSearch(base, t) : null;
        List<Column> columns = quadrature ? null
                : kind.equals("zeros") && !t.contains("columns") ? List.of(Column.parse("x")) : columns(base, t, terms);
        Target target = target(base, t);
        int cap = capBits(base, t, target.format());
        if (quadrature) {
            SpecQuadrature.Parsed rule = new SpecQuadrature(spec).table(base, t, fname, f, target.format());
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
        List<String> outputs = outputs(base, t, javaEntries(tableKind, columns, target.format()));
        return new TableDef(name, fname, f, tableKind, columns, target, cap, outputs);
    }

    /** The table's kind ({@code values} when not given), after checking that the keys of other kinds are absent. */
    private String kind(List<String> base, TomlTable t) throws InputError {
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
        if (!kind.equals("taylor") && t.contains("terms")) {
            throw spec.error(child(base, "terms"), "'terms' belongs to taylor tables (kind = \"taylor\")");
        }
        return kind;
    }

    /** The {@code terms} of a taylor table: how many Taylor coefficients per center. */
    private int terms(List<String> base, TomlTable t) throws InputError {
        Object v = t.get(List.of("terms"));
        if (v == null) {
            throw spec.error(base, "a taylor table needs 'terms' (how many Taylor coefficients per center, 1 to " + Column.MAX_TAYLOR_TERMS + ")");
        }
        if (!(v instanceof Long l) || l < 1 || l > Column.MAX_TAYLOR_TERMS) {
            throw spec.error(child(base, "terms"), "'terms' must be an integer from 1 to " + Column.MAX_TAYLOR_TERMS);
        }
        return (int) (long) l;
    }

    /** The entries' format, rounding mode and fixed-point policy (binary64, nearest-even, error when not given). */
    private Target target(List<String> base, TomlTable t) throws InputError {
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
        return new Target(format, rounding, outOfRange);
    }

    /**
     * The precision cap of the table's precision loops, which must be able to decide {@code format}
     * ({@link Precision#formatAboveCap}: refused at the key, or at the format when the cap is the default).
     */
    private int capBits(List<String> base, TomlTable t, Format format) throws InputError {
        int cap = DEFAULT_CAP_BITS;
        if (t.contains("precision_cap_bits")) {
            Object v = t.get(List.of("precision_cap_bits"));
            if (!(v instanceof Long l) || l < 64 || l > MAX_CAP_BITS) {
                throw spec.error(child(base, "precision_cap_bits"), "precision_cap_bits must be an integer from 64 to " + MAX_CAP_BITS);
            }
            cap = (int) (long) l;
        }
        Optional<String> aboveCap = Precision.formatAboveCap(format, cap);
        if (aboveCap.isPresent()) {
            throw spec.error(child(base, t.contains("precision_cap_bits") ? "precision_cap_bits" : "format"), aboveCap.get());
        }
        return cap;
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
                r.addAll(TaylorEvaluator.coefficientColumns(terms));
            } else {
                r.add(c);
            }
        }
        if (r.stream().noneMatch(Column::taylor)) {
            r.addAll(TaylorEvaluator.coefficientColumns(terms));
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
        return string(spec, base, t, key);
    }

    /** The string value of {@code key} in {@code t}, or an error at the key. */
    static String string(SpecFile spec, List<String> base, TomlTable t, String key) throws InputError {
        Object v = t.get(List.of(key));
        if (!(v instanceof String s)) {
            throw spec.error(child(base, key), "'" + key + "' must be a string");
        }
        return s;
    }

    static List<String> child(List<String> base, String key) {
        List<String> r = new ArrayList<>(base);
        r.add(key);
        return r;
    }
}
