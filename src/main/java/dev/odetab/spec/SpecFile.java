package dev.odetab.spec;

import dev.odetab.base.InputError;

import dev.odetab.expr.ConstExpr;
import dev.odetab.expr.EquationParser;
import dev.odetab.base.ExprException;
import dev.odetab.expr.ExprParser;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import dev.odetab.ode.FunctionDef;
import dev.odetab.ode.family.Catalog;
import dev.odetab.ode.family.Family;
import dev.odetab.ode.family.ParameterException;
import dev.odetab.tables.TableDef;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import javax.lang.model.SourceVersion;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Pattern;
import org.tomlj.Toml;
import org.tomlj.TomlParseError;
import org.tomlj.TomlParseResult;
import org.tomlj.TomlPosition;
import org.tomlj.TomlTable;

/**
 * A spec file (TOML, DESIGN.md "Spec file"): reading, validation with positions, and the
 * functions it defines. Every problem is an {@link InputError} located as
 * {@code file:line:column}; for a problem inside a string value the column points at the
 * character inside the string (exact for strings without escape sequences).
 */
public final class SpecFile {
    /**
     * The precision cap, in bits, of a table without {@code precision_cap_bits} and of {@code eval}
     * without {@code --precision-cap-bits}: one documented number (README), so that eval and a
     * table decide the same entries.
     */
    public static final int DEFAULT_PRECISION_CAP_BITS = 4096;

    static final Set<String> TOP_LEVEL_KEYS = Set.of("title", "java_package", "functions", "tables");
    static final Set<String> EQUATION_KEYS = Set.of("equation", "at", "value", "slope");
    private static final Pattern COLUMN_IN_TEXT = Pattern.compile("at column (\\d+)");

    private final Path path;
    private final String display;
    private final List<String> lines;
    private final TomlParseResult toml;
    private final byte[] bytes;

    private SpecFile(Path path, String display, List<String> lines, TomlParseResult toml, byte[] bytes) {
        this.path = path;
        this.display = display;
        this.lines = lines;
        this.toml = toml;
        this.bytes = bytes;
    }

    /**
     * Reads and parses a spec (TOML syntax and the top-level keys; functions are checked when
     * asked for).
     */
    public static SpecFile load(Path path) throws InputError {
        String display = path.toString();
        String text;
        byte[] bytes;
        try {
            bytes = TomlLimits.read(path, display);
            text = TomlLimits.withoutBom(new String(bytes, StandardCharsets.UTF_8));
        } catch (NoSuchFileException e) {
            throw new InputError(display, "no such spec file");
        } catch (IOException e) {
            throw new InputError(display, "cannot read the spec file: " + e.getMessage());
        }
        TomlLimits.checkNesting(text, display);
        TomlParseResult toml = Toml.parse(text);
        if (toml.hasErrors()) {
            TomlParseError first = toml.errors().get(0);
            TomlPosition p = first.position();
            String message = first.getMessage().replaceFirst("\\s*\\(line \\d+, column \\d+\\)$", "");
            throw new InputError(display + ":" + p.line() + ":" + p.column(), "TOML syntax: " + message);
        }
        SpecFile spec = new SpecFile(path, display, text.lines().toList(), toml, bytes);
        for (String key : toml.keySet()) {
            if (!TOP_LEVEL_KEYS.contains(key)) {
                throw spec.error(List.of(key), "unknown key '" + key + "'" + Suggestions.hint(key, TOP_LEVEL_KEYS)
                        + " (allowed at the top: " + String.join(", ", new TreeSet<>(TOP_LEVEL_KEYS)) + ")");
            }
        }
        if (toml.contains("title") && !(toml.get("title") instanceof String)) {
            throw spec.error(List.of("title"), "'title' must be a string");
        }
        if (toml.contains("tables") && !toml.isTable("tables")) {
            throw spec.error(List.of("tables"), "'tables' must be a table of tables ([tables.NAME])");
        }
        if (toml.contains("functions") && !toml.isTable("functions")) {
            throw spec.error(List.of("functions"), "'functions' must be a table of functions ([functions.NAME])");
        }
        return spec;
    }

    public String display() {
        return display;
    }

    public Path path() {
        return path;
    }

    /** The file's bytes as read (for its SHA-256 in provenance). */
    public byte[] bytes() {
        return bytes.clone();
    }

    /** The spec's title, or empty. */
    public String title() {
        return toml.contains("title") ? toml.getString("title") : "";
    }

    /**
     * The package of a table's {@code java} output: the table's own {@code java_package}, else the
     * spec's top-level one, else empty (the default package, which no named package can import).
     *
     * @throws InputError at the key when the value is not a string or not a Java package name
     *     (dot-separated identifiers, no keyword: JLS 7.4.1 and 3.9)
     */
    public String javaPackage(String table) throws InputError {
        List<String> key = List.of("tables", table, "java_package");
        if (!toml.contains(key)) {
            key = List.of("java_package");
        }
        if (!toml.contains(key)) {
            return "";
        }
        Object v = toml.get(key);
        if (!(v instanceof String text)) {
            throw error(key, "'java_package' must be a string, like \"com.example.tables\"");
        }
        int column = 1;
        for (String part : text.split("\\.", -1)) {
            if (!SourceVersion.isIdentifier(part) || SourceVersion.isKeyword(part)) {
                throw errorInString(key, column, "'" + text + "' is not a Java package name: '" + part + "' is "
                        + (SourceVersion.isKeyword(part) ? "a Java keyword" : "not a Java identifier")
                        + " (write dot-separated identifiers, like \"com.example.tables\")");
            }
            column += part.length() + 1;
        }
        return text;
    }

    /** Every table of the spec, validated; the first problem found is the error. */
    public List<TableDef> tables() throws InputError {
        // relative to the spec path as given, so that template paths in messages read as the user typed them
        Path dir = path.getParent() == null ? Path.of("") : path.getParent();
        return new SpecTables(this, toml, dir).all();
    }

    /** Names of the functions defined in {@code [functions.*]}, in file order. */
    public Set<String> functionNames() {
        TomlTable t = toml.getTable("functions");
        return t == null ? Set.of() : new LinkedHashSet<>(t.keySet());
    }

    /**
     * The catalog family that defines the function {@code name} ({@code family = "…"}), empty for
     * an equation of its own or a name that is not a function of this spec.
     */
    Optional<Family> family(String name) {
        Object familyName = toml.get(List.of("functions", name, "family"));
        return familyName instanceof String s ? Catalog.lookup(s) : Optional.empty();
    }

    /** The function {@code name}, validated. */
    public FunctionDef function(String name) throws InputError {
        TomlTable functions = toml.getTable("functions");
        if (functions == null || !functions.contains(List.of(name))) {
            throw new InputError(display, "no function '" + name + "' in [functions]"
                    + Suggestions.hint(name, functionNames())
                    + (functionNames().isEmpty() ? " (the spec defines none)" : " (defined: " + String.join(", ", functionNames()) + ")"));
        }
        List<String> base = List.of("functions", name);
        if (!functions.isTable(List.of(name))) {
            throw error(base, "functions." + name + " must be a table with 'equation', 'at', 'value', 'slope' or with 'family'");
        }
        TomlTable f = functions.getTable(List.of(name));
        String qualified = display + "#" + name;
        if (f.contains("family")) {
            return familyFunction(qualified, base, f);
        }
        return equationFunction(qualified, base, f);
    }

    private FunctionDef equationFunction(String qualified, List<String> base, TomlTable f) throws InputError {
        for (String key : f.keySet()) {
            if (!EQUATION_KEYS.contains(key)) {
                throw error(child(base, key), "unknown key '" + key + "'" + Suggestions.hint(key, union(EQUATION_KEYS, Set.of("family")))
                        + " (a function has 'equation', 'at', 'value', 'slope', or 'family' and its parameters)");
            }
        }
        for (String required : List.of("equation", "value", "slope")) {
            if (!f.contains(required)) {
                throw error(base, "function '" + base.get(1) + "' needs '" + required + "' (or 'family')");
            }
        }
        String eqText = string(base, f, "equation");
        Equation eq;
        try {
            eq = Equation.of(EquationParser.parse(eqText, Map.of()));
        } catch (ExprException e) {
            throw errorInString(child(base, "equation"), e.column(), e.getMessage());
        }
        Rational at = Rational.ZERO;
        if (f.contains("at")) {
            String atText = string(base, f, "at");
            ConstExpr atExpr = constant(child(base, "at"), atText);
            at = atExpr.exact().orElseThrow(() -> error(child(base, "at"),
                    "the normalization point must be an exact rational, got '" + atText + "'"));
            if (!eq.isOrdinary(at)) {
                throw error(child(base, "at"), "x = " + at.toDecimalOrFraction()
                        + " is a singular point of the equation (its coefficient of y'' vanishes there); choose an ordinary point");
            }
        }
        ConstExpr value = constant(child(base, "value"), string(base, f, "value"));
        ConstExpr slope = constant(child(base, "slope"), string(base, f, "slope"));
        return new FunctionDef(qualified, eq, at, value, slope, Map.of(), "defined in " + display);
    }

    private FunctionDef familyFunction(String qualified, List<String> base, TomlTable f) throws InputError {
        String familyName = string(base, f, "family");
        Family family = Catalog.lookup(familyName).orElseThrow(() -> error(child(base, "family"),
                "unknown family '" + familyName + "'" + Suggestions.hint(familyName, Catalog.names())
                        + " (known: " + String.join(", ", Catalog.names()) + ")"));
        Set<String> allowed = new LinkedHashSet<>();
        family.parameters().forEach(p -> allowed.add(p.name()));
        Map<String, Rational> values = new HashMap<>();
        for (String key : f.keySet()) {
            if (key.equals("family")) {
                continue;
            }
            if (!allowed.contains(key)) {
                throw error(child(base, key), "unknown key '" + key + "' for family " + familyName
                        + Suggestions.hint(key, allowed)
                        + (allowed.isEmpty() ? " (it takes no parameters)" : " (its parameters: " + String.join(", ", allowed) + ")"));
            }
            values.put(key, parameter(child(base, key), f.get(key)));
        }
        try {
            FunctionDef d = family.define(values);
            return new FunctionDef(qualified, d.equation(), d.at(), d.value(), d.slope(), d.parameters(), d.source());
        } catch (ParameterException e) {
            List<String> where = e.parameter() != null && f.contains(e.parameter()) ? child(base, e.parameter()) : child(base, "family");
            throw error(where, e.getMessage());
        }
    }

    private Rational parameter(List<String> key, Object raw) throws InputError {
        if (raw instanceof Long l) {
            return Rational.of(l);
        }
        if (raw instanceof String s) {
            ConstExpr e = constant(key, s);
            return e.exact().orElseThrow(() -> error(key,
                    "a parameter must be an exact rational, and '" + s + "' is not known to be one"));
        }
        if (raw instanceof Double) {
            throw error(key, "write the parameter as a string (\"0.5\", \"1/3\") so that it stays exact; TOML floats are binary");
        }
        throw error(key, "a parameter must be an integer or a string holding an exact rational");
    }

    ConstExpr constant(List<String> key, String text) throws InputError {
        try {
            ConstExpr e = ExprParser.parseConstant(text, Map.of());
            e.evaluate(64);
            return e;
        } catch (ExprException e) {
            throw errorInString(key, e.column(), e.getMessage());
        }
    }

    private String string(List<String> base, TomlTable f, String key) throws InputError {
        Object v = f.get(List.of(key));
        if (!(v instanceof String s)) {
            throw error(child(base, key), "'" + key + "' must be a string");
        }
        return s;
    }

    private static List<String> child(List<String> base, String key) {
        List<String> r = new ArrayList<>(base);
        r.add(key);
        return r;
    }

    private static Set<String> union(Set<String> a, Set<String> b) {
        Set<String> r = new LinkedHashSet<>(a);
        r.addAll(b);
        return r;
    }

    /**
     * Where a table is defined: {@code file:line:column} of its {@code [tables.NAME]} key (the
     * file alone when the position is unknown), for errors found while evaluating it.
     */
    public String tablePosition(String table) {
        TomlPosition p = toml.inputPositionOf(List.of("tables", table));
        return p == null ? display : display + ":" + p.line() + ":" + p.column();
    }

    /** An error located at a key (the key's own position). */
    InputError error(List<String> key, String message) {
        TomlPosition p = toml.inputPositionOf(key);
        String where = p == null ? display : display + ":" + p.line() + ":" + p.column();
        return new InputError(where, message);
    }

    /** An error at a 1-based column inside the string value of a key. */
    InputError errorInString(List<String> key, int columnInString, String message) {
        TomlPosition p = toml.inputPositionOf(key);
        if (p == null) {
            return new InputError(display, message);
        }
        int line = p.line();
        String text = line - 1 < lines.size() ? lines.get(line - 1) : "";
        int eq = text.indexOf('=', Math.max(0, p.column() - 1));
        int col = p.column();
        if (eq >= 0) {
            int i = eq + 1;
            while (i < text.length() && (text.charAt(i) == ' ' || text.charAt(i) == '\t')) {
                i++;
            }
            if (i < text.length() && (text.charAt(i) == '"' || text.charAt(i) == '\'')) {
                col = i + 1 + columnInString;
                message = fileColumns(message, i + 1);
            }
        }
        return new InputError(display + ":" + line + ":" + col, message);
    }

    /**
     * An expression message may name a second column of the parsed text ("the '(' at column
     * 7"); beside the file position it must be a file column too.
     */
    private static String fileColumns(String message, int offset) {
        return COLUMN_IN_TEXT.matcher(message).replaceAll(m -> "at column " + (Integer.parseInt(m.group(1)) + offset));
    }
}
