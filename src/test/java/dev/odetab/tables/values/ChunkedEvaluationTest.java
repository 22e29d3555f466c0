package dev.odetab.tables.values;

import dev.odetab.tables.Column;
import dev.odetab.tables.Grid;
import dev.odetab.tables.TableDef;
import dev.odetab.tables.TableKind;
import dev.odetab.tables.TableEvaluator;
import dev.odetab.tables.TableResult;
import dev.odetab.base.Progress;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.numeric.Entry;
import dev.odetab.numeric.Format;
import dev.odetab.numeric.OutOfRange;
import dev.odetab.numeric.Rational;
import dev.odetab.numeric.RoundingMode;
import dev.odetab.numeric.Target;
import dev.odetab.ode.FunctionDef;
import dev.odetab.ode.family.Catalog;
import dev.odetab.series.FunctionEvaluator;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import org.junit.jupiter.api.Test;

/**
 * Chunked evaluation: the same table evaluated in the calling thread, on two threads and on
 * three gives identical rows and statistics; and rows decided by the fast tier equal the
 * BigDecimal tier's entries (Ziv's loop of FunctionEvaluator, itself checked against apfloat in
 * AiryRoundingTest) at sampled points, in every format the fast tier serves.
 */
class ChunkedEvaluationTest {
    private static TableDef airy(Format format, RoundingMode mode, String from, String to, String step) throws Exception {
        FunctionDef f = Catalog.lookup("airy-ai").orElseThrow().define(Map.of());
        Grid grid = new Grid.Uniform(Rational.parse(from), Rational.parse(to), Rational.parse(step));
        return new TableDef("ai", "ai", f, new TableKind.Values(grid), List.of(Column.parse("x"), Column.parse("value"), Column.parse("derivative")), new Target(format, mode, OutOfRange.SATURATE), 4096, List.of("csv"));
    }

    @Test
    void theResultDoesNotDependOnTheNumberOfThreads() throws Exception {
        TableDef t = airy(Format.BinaryFormat.BINARY64, RoundingMode.NEAREST_EVEN, "-6", "2", "1/600");
        assertTrue(t.grid().size() > 4 * ValuesEvaluator.chunkSize(t), "several chunks");
        TableResult one = TableEvaluator.evaluate(t);
        for (int threads : new int[] {2, 3}) {
            ExecutorService pool = Executors.newFixedThreadPool(threads);
            try {
                TableResult many = TableEvaluator.evaluate(t, Progress.NONE, pool);
                assertEquals(one.rows(), many.rows(), threads + " threads");
                assertEquals(one.maxRelativeRadius(), many.maxRelativeRadius());
                assertEquals(one.maxPrecBits(), many.maxPrecBits());
            } finally {
                pool.shutdownNow();
            }
        }
    }

    @Test
    void fastEntriesEqualTheBigDecimalTierInEveryFastFormat() throws Exception {
        for (Format format : List.of(Format.BinaryFormat.BINARY64, Format.BinaryFormat.BINARY32, Format.BinaryFormat.BINARY16,
                new Format.FixedFormat(true, 16, 15))) {
            for (RoundingMode mode : RoundingMode.values()) {
                TableDef t = airy(format, mode, "-3", "1", "1/250");
                TableResult r = TableEvaluator.evaluate(t);
                for (int i = 0; i < r.rows().size(); i += 101) {
                    Rational x = t.grid().exactPoint(i);
                    for (int c = 1; c <= 2; c++) {
                        Entry expected = FunctionEvaluator.entry(t.function(), x, c == 2, new Target(format, mode, OutOfRange.SATURATE), 4096).entry();
                        assertEquals(expected, r.rows().get(i).entries().get(c), format.name() + " " + mode + " at x = " + x);
                    }
                }
            }
        }
    }
}
