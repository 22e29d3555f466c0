package dev.odetab.emit;

import dev.odetab.numeric.Entry;
import dev.odetab.numeric.Format;
import dev.odetab.numeric.Rational;
import dev.odetab.numeric.Rounding;
import dev.odetab.numeric.Target;
import dev.odetab.tables.Identifiers;
import dev.odetab.tables.Column;
import dev.odetab.tables.Grid;
import dev.odetab.tables.TableKind;
import dev.odetab.base.Progress;
import dev.odetab.tables.TableResult;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The data model every template receives (documented in DEVELOPERS.md): plain maps, lists and
 * strings only, every literal already formatted. Every text is comment-safe ({@link SourceText}),
 * every name a valid C and Java identifier (the spec refuses others).
 */
final class EmitModel {
    private EmitModel() {
    }

    /** The model of a table; the literals are made as a template reads them, and reported to {@code progress}. */
    static Map<String, Object> of(TableResult result, Provenance provenance, String specTitle, String javaPackage, Progress progress) {
        var t = result.table();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("tool", Map.of("version", SourceText.comment(provenance.toolVersion())));
        Map<String, Object> spec = new LinkedHashMap<>();
        spec.put("path", SourceText.comment(provenance.specPath()));
        spec.put("sha256", provenance.specSha256());
        spec.put("title", SourceText.comment(specTitle));
        m.put("spec", spec);
        Map<String, Object> table = new LinkedHashMap<>();
        table.put("name", t.name());
        table.put("identifier", t.name().toLowerCase(Locale.ROOT));
        table.put("macro", t.name().toUpperCase(Locale.ROOT));
        table.put("className", Identifiers.className(t.name()));
        table.put("javaPackage", javaPackage);
        table.put("length", Integer.toString(result.rows().size()));
        table.put("format", t.format().name());
        table.put("rounding", t.rounding().spelling());
        table.put("function", SourceText.comment(t.functionName()));
        m.put("table", table);
        m.put("provenance", provenance.lines().stream().map(SourceText::comment).toList());
        m.put("grid", grid(t.kind()));
        List<Map<String, Object>> columns = new ArrayList<>();
        for (int c = 0; c < t.columns().size(); c++) {
            Column col = t.columns().get(c);
            List<Literals.Part> parts = Literals.parts(t.format());
            for (int p = 0; p < parts.size(); p++) {
                Literals.Part part = parts.get(p);
                String name = col.name() + part.suffix();
                int column = c;
                int index = p;
                List<String> cLits = new LiteralList(result.rows(), row -> Literals.c(row.entries().get(column), index), progress);
                List<String> javaLits = new LiteralList(result.rows(), row -> Literals.java(row.entries().get(column), index), progress);
                Map<String, Object> cm = new LinkedHashMap<>();
                cm.put("name", name);
                cm.put("macro", name.toUpperCase(Locale.ROOT));
                cm.put("accessor", Identifiers.accessor(name));
                cm.put("cType", part.cType());
                cm.put("javaType", part.javaType());
                cm.put("description", SourceText.comment(col.name() + ": " + part.description() + ", rounded " + t.rounding().spelling()));
                cm.put("c", cLits);
                cm.put("java", javaLits);
                columns.add(cm);
            }
        }
        m.put("columns", columns);
        return m;
    }

    private static Map<String, Object> grid(TableKind kind) {
        Map<String, Object> m = new LinkedHashMap<>();
        if (kind.givenPoints().orElse(null) instanceof Grid.Uniform u) {
            m.put("uniform", true);
            m.put("from", constant(u.from()));
            m.put("to", constant(u.to()));
            m.put("step", constant(u.step()));
        } else {
            m.put("uniform", false);
        }
        m.put("description", SourceText.comment(kind.describe()));
        return m;
    }

    /** A grid constant: its exact text and its binary64 nearest-even hex literal (and whether that is exact). */
    private static Map<String, Object> constant(Rational r) {
        Entry e = Rounding.round(r, Target.nearest(Format.BinaryFormat.BINARY64));
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("exact", SourceText.comment(r.toDecimalOrFraction()));
        m.put("binary64", e.hexLiteral());
        m.put("isExact", r.equals(e.value()));
        return m;
    }
}
