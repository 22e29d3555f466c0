package dev.odetab.spec;

import dev.odetab.base.InputError;

import dev.odetab.numeric.Format;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.FunctionDef;
import dev.odetab.ode.family.Catalog;
import dev.odetab.ode.family.Family;
import dev.odetab.ode.family.OrthogonalFamily;
import dev.odetab.tables.Column;
import dev.odetab.tables.quadrature.GaussPolynomial;
import dev.odetab.tables.TableKind;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.tomlj.TomlArray;
import org.tomlj.TomlPosition;
import org.tomlj.TomlTable;

/**
 * The keys of a quadrature table ({@code kind = "quadrature"}): the rule named by the table's
 * function, its columns and {@code weight_underflow}, checked with positions.
 */
final class SpecQuadrature {
    static final List<String> COLUMNS = List.of("node", "weight", "scaled_weight");

    /** The rule and the columns (with {@code weight_flag} after {@code weight} when flushing). */
    record Parsed(TableKind.Quadrature kind, List<Column> columns) {
    }

    private final SpecFile spec;

    SpecQuadrature(SpecFile spec) {
        this.spec = spec;
    }

    Parsed table(List<String> base, TomlTable t, String fname, FunctionDef f, Format format) throws InputError {
        for (String key : List.of("grid", "points")) {
            if (t.contains(key)) {
                throw spec.error(child(base, key), "a quadrature table takes no '" + key + "': its points are the nodes of the Gauss rule");
            }
        }
        GaussPolynomial rule = rule(child(base, "function"), fname, f);
        boolean flush = false;
        if (t.contains("weight_underflow")) {
            List<String> key = child(base, "weight_underflow");
            Object v = t.get(List.of("weight_underflow"));
            if (!"error".equals(v) && !"flush".equals(v)) {
                throw spec.error(key, "weight_underflow must be \"error\" (a weight below the smallest normal number stops the build) "
                        + "or \"flush\" (it becomes 0, flagged in the column weight_flag)");
            }
            if (format.normalEmin().isEmpty()) {
                throw spec.error(key, "weight_underflow applies to binary formats and double-double (which have a smallest normal number), "
                        + "and this table's format is " + format.name());
            }
            flush = v.equals("flush");
        }
        List<Column> columns = columns(base, t, rule);
        if (flush) {
            int w = columns.stream().map(Column::name).toList().indexOf("weight");
            if (w < 0) {
                throw spec.error(child(base, "weight_underflow"), "weight_underflow = \"flush\" applies to the column weight, and this table has none");
            }
            columns.add(w + 1, Column.quadrature("weight_flag"));
        }
        return new Parsed(new TableKind.Quadrature(rule, flush), columns);
    }

    /** The rule of the function: a family with a Gauss rule, an integer degree n from 1 to the cap. */
    private GaussPolynomial rule(List<String> key, String fname, FunctionDef f) throws InputError {
        Family family = spec.family(fname).orElseThrow(() -> spec.error(key, "a quadrature table needs a function defined with the family of its Gauss rule ("
                + Catalog.gaussRuleNames() + ") and its degree n; '" + fname + "' is "
                + (spec.functionNames().contains(fname) ? "an equation of its own" : "a built-in family without a Gauss rule")));
        if (!(family instanceof OrthogonalFamily orthogonal)) {
            throw spec.error(key, "the family " + family.name()
                    + " of function '" + fname + "' has no Gauss rule (quadrature tables take " + Catalog.gaussRuleNames() + ")");
        }
        Rational n = f.parameters().get("n");
        if (!n.isInteger() || n.signum() <= 0 || n.compareTo(Rational.of(GaussPolynomial.MAX_NODES)) > 0) {
            throw spec.error(key, "a Gauss rule has an integer number of nodes n from 1 to " + GaussPolynomial.MAX_NODES
                    + ", and function '" + fname + "' has n = " + n.toDecimalOrFraction());
        }
        return new GaussPolynomial(orthogonal, n.numerator().intValueExact(), f.parameters());
    }

    private List<Column> columns(List<String> base, TomlTable t, GaussPolynomial rule) throws InputError {
        List<Column> r = new ArrayList<>();
        if (!t.contains("columns")) {
            r.add(Column.quadrature("node"));
            r.add(Column.quadrature("weight"));
            return r;
        }
        TomlArray arr = t.getArray(List.of("columns"));
        if (arr == null || arr.size() == 0) {
            throw spec.error(child(base, "columns"), "'columns' must be a non-empty array of column names");
        }
        Set<String> seen = new LinkedHashSet<>();
        for (int i = 0; i < arr.size(); i++) {
            Object v = arr.get(i);
            TomlPosition p = arr.inputPositionOf(i);
            String where = spec.display() + ":" + p.line() + ":" + p.column();
            String given = String.valueOf(v);
            if (!(v instanceof String) || !COLUMNS.contains(given)) {
                throw new InputError(where, "column '" + given + "' is not available in a quadrature table"
                        + Suggestions.hint(given, COLUMNS) + " (available: " + String.join(", ", COLUMNS) + ")");
            }
            if (given.equals("scaled_weight") && !rule.hasScaledWeight()) {
                throw new InputError(where, "column 'scaled_weight' belongs to Gauss–Hermite (w·e^(x²)) and Gauss–Laguerre (w·e^x) rules; "
                        + "this table's rule is " + rule.family().name());
            }
            if (!seen.add(given)) {
                throw new InputError(where, "column '" + given + "' appears twice");
            }
            r.add(Column.quadrature(given));
        }
        return r;
    }

    private static List<String> child(List<String> base, String key) {
        List<String> r = new ArrayList<>(base);
        r.add(key);
        return r;
    }
}
