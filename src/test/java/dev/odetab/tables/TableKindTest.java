package dev.odetab.tables;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.numeric.Rational;
import dev.odetab.spec.SpecFile;
import dev.odetab.tables.values.TaylorEvaluator;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every kind of table the spec knows reaches its own evaluator: a spec with one table of each
 * kind, read by the spec reader, dispatched by {@link TableKind#evaluate} (recorded), then
 * evaluated by {@link TableEvaluator} with the rows each kind promises.
 */
class TableKindTest {
    private static final String SPEC = """
            [functions.p3]
            family = "legendre-p"
            n = 3

            [tables.v]
            function = "p3"
            grid = { from = "0", to = "1", step = "1/4" }

            [tables.t]
            function = "p3"
            kind = "taylor"
            terms = 3
            points = ["1/2"]

            [tables.z]
            function = "p3"
            kind = "zeros"
            search = { from = "-1", to = "1" }

            [tables.q]
            function = "p3"
            kind = "quadrature"
            """;

    @Test
    void eachKindOfTheSpecReachesItsEvaluator(@TempDir Path dir) throws Exception {
        Path spec = dir.resolve("kinds.toml");
        Files.writeString(spec, SPEC);
        List<TableDef> tables = SpecFile.load(spec).tables();
        List<String> reached = new ArrayList<>();
        for (TableDef t : tables) {
            t.kind().evaluate(t, new TableKind.Evaluators() {
                @Override
                public TableResult values(TableDef table, TableKind.Values kind) {
                    reached.add(table.name() + ":values");
                    return null;
                }

                @Override
                public TableResult taylor(TableDef table, TableKind.Taylor kind) {
                    reached.add(table.name() + ":taylor" + kind.terms());
                    return null;
                }

                @Override
                public TableResult zeros(TableDef table, TableKind.Zeros kind) {
                    reached.add(table.name() + ":zeros");
                    return null;
                }

                @Override
                public TableResult quadrature(TableDef table, TableKind.Quadrature kind) {
                    reached.add(table.name() + ":quadrature" + kind.rule().n());
                    return null;
                }
            });
        }
        assertEquals(List.of("v:values", "t:taylor3", "z:zeros", "q:quadrature3"), reached);

        // P_3 = (5x³ − 3x)/2: five grid rows, one center with c_0..c_2, three zeros, three nodes.
        int[] rows = {5, 1, 3, 3};
        for (int i = 0; i < tables.size(); i++) {
            try (TableResult r = TableEvaluator.evaluate(tables.get(i))) {
                assertEquals(rows[i], r.rows().size(), tables.get(i).name());
            }
        }
        TableDef t = tables.get(1);
        try (TableResult taylor = TableEvaluator.evaluate(t)) {
            // c_1 = P_3'(1/2) = (15/4 − 3)/2 = 3/8
            assertEquals(Rational.of(3, 8), taylor.rows().get(0).entries().get(2).value());
        }
        // the taylor kind reaches TaylorEvaluator, whose rows' shape is the kind's: columns taylor0 … taylor2
        assertEquals(TaylorEvaluator.coefficientColumns(3), t.columns().subList(1, 4));
        TableDef mismatched = new TableDef(t.name(), t.functionName(), t.function(), new TableKind.Taylor(t.grid(), 4), t.columns(),
                t.target(), t.capBits(), t.outputs());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> TableEvaluator.evaluate(mismatched));
        assertTrue(e.getMessage().contains("a taylor table of 4 terms"), e.getMessage());
        assertTrue(tables.get(2).kind().givenPoints().isEmpty() && tables.get(3).kind().givenPoints().isEmpty(),
                "zeros and nodes are found, not given");
        assertEquals(5, tables.get(0).kind().rowsBeforeEvaluation());
    }
}
