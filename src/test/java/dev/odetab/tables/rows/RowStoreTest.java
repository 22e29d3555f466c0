package dev.odetab.tables.rows;

import dev.odetab.tables.TableResult;

import dev.odetab.tables.TableDef;
import dev.odetab.tables.TableKind;

import dev.odetab.tables.Grid;

import dev.odetab.tables.Column;

import dev.odetab.tables.rows.StoredRows;

import dev.odetab.tables.rows.RowStore;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.odetab.numeric.Entry;
import dev.odetab.numeric.Format;
import dev.odetab.numeric.OutOfRange;
import dev.odetab.numeric.Rational;
import dev.odetab.numeric.Rounding;
import dev.odetab.numeric.RoundingMode;
import dev.odetab.numeric.Target;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Rows kept by a {@link RowStore} come back exactly as they were appended, whether they stayed
 * in memory or went to a temporary file, however they are read. The entries cover every kind
 * and format; binary64 ones are also checked against the IEEE 754-2019 §3.4 encodings that
 * Java SE gives for the same doubles ({@link Double#doubleToRawLongBits}).
 */
class RowStoreTest {
    private static final Format.FixedFormat S16_15 = new Format.FixedFormat(true, 16, 15);

    private static Entry round(Rational v, Format f, OutOfRange policy) {
        return Rounding.round(v, new Target(f, RoundingMode.NEAREST_EVEN, policy));
    }

    private static Entry b64(double d) {
        return round(Rational.of(new BigDecimal(d)), Format.BinaryFormat.BINARY64, OutOfRange.ERROR);
    }

    /** Doubles whose binary64 entries the pool holds first, in order. */
    private static final double[] DOUBLES = {Double.MIN_VALUE, Double.MIN_NORMAL, Double.MAX_VALUE, -0.1, 1.0, 0x1.fffffffffffffp-1};

    /** One entry of every kind, in every format. */
    private static List<Entry> pool() {
        List<Entry> p = new ArrayList<>();
        for (double d : DOUBLES) {
            p.add(b64(d));
        }
        Rational third = Rational.of(1, 3);
        Rational huge = Rational.of(BigInteger.TWO.pow(20_000));
        p.add(round(Rational.TWO.pow(-2000).negate(), Format.BinaryFormat.BINARY64, OutOfRange.ERROR)); // -0
        p.add(round(huge, Format.BinaryFormat.BINARY64, OutOfRange.ERROR));
        p.add(round(huge.negate(), Format.BinaryFormat.BINARY32, OutOfRange.ERROR));
        for (Format f : List.of(Format.BinaryFormat.BINARY16, Format.BinaryFormat.BINARY32, Format.BinaryFormat.BINARY128,
                Format.DoubleDouble.INSTANCE, new Format.DecimalFormat(3), new Format.DecimalFormat(200), S16_15,
                new Format.FixedFormat(false, 8, 4))) {
            p.add(round(third, f, OutOfRange.ERROR));
            p.add(round(third.negate().multiply(Rational.of(7, 1000)), f, OutOfRange.ERROR));
        }
        p.add(round(Rational.of(BigInteger.TEN.pow(400)), new Format.DecimalFormat(5), OutOfRange.ERROR));
        p.add(round(Rational.of(2), S16_15, OutOfRange.SATURATE));
        p.add(round(Rational.of(-2), S16_15, OutOfRange.SATURATE));
        p.add(round(Rational.of(2), S16_15, OutOfRange.ERROR));
        return p;
    }

    /** Row k: three entries from the pool and an x (none for every fifth row, some with a large numerator). */
    private static List<TableResult.Row> rows(int n) {
        List<Entry> pool = pool();
        List<TableResult.Row> r = new ArrayList<>(n);
        for (int k = 0; k < n; k++) {
            Rational x = k % 5 == 0 ? null
                    : k % 5 == 1 ? Rational.of(BigInteger.valueOf(k).pow(7).negate(), BigInteger.valueOf(3 + k % 7))
                    : Rational.of(k, 1 + k % 4);
            r.add(new TableResult.Row(x, List.of(pool.get(k % pool.size()), pool.get((7 * k + 1) % pool.size()),
                    pool.get((13 * k + 2) % pool.size()))));
        }
        return r;
    }

    private static TableDef table() {
        return new TableDef("t", "f", null, new TableKind.Values(new Grid.Points(List.of(Rational.ZERO))),
                List.of(Column.parse("x"), Column.parse("value"), Column.parse("derivative")), Target.nearest(Format.BinaryFormat.BINARY64), 128, List.of("csv"));
    }

    private static StoredRows store(List<TableResult.Row> rows, int memoryBytes) {
        RowStore s = RowStore.forTable(table(), memoryBytes);
        rows.forEach(s::append);
        return s.finish();
    }

    @Test
    void everyKindOfEntryComesBackExactlyFromMemoryAndFromAFile() {
        List<TableResult.Row> rows = rows(3 * RowStore.INDEX_EVERY + 17);
        for (int memoryBytes : new int[] {RowStore.MEMORY_BYTES * 64, 0}) {
            try (StoredRows stored = store(rows, memoryBytes)) {
                assertEquals(rows.size(), stored.size());
                Iterator<TableResult.Row> it = stored.iterator();
                for (int k = 0; k < rows.size(); k++) {
                    assertEquals(rows.get(k), it.next(), "row " + k + ", memory limit " + memoryBytes);
                }
                for (int k = 0; k < DOUBLES.length; k++) {
                    assertEquals(Double.doubleToRawLongBits(DOUBLES[k]), stored.get(k).entries().get(0).bits().longValue(),
                            "binary64 bits of " + DOUBLES[k]);
                }
            }
        }
    }

    @Test
    void everyOrderOfReadingGivesTheSameRows() {
        List<TableResult.Row> rows = rows(4 * RowStore.INDEX_EVERY + 5);
        try (StoredRows stored = store(rows, 1000)) {
            // two passes interleaved by index, one backwards, and random access
            for (int k = 0; k < rows.size(); k++) {
                assertEquals(rows.get(k), stored.get(k));
                int j = (k + rows.size() / 2) % rows.size();
                assertEquals(rows.get(j), stored.get(j));
                assertEquals(rows.get(k), stored.get(k), "the same row twice");
            }
            for (int k = rows.size() - 1; k >= 0; k -= 997) {
                assertEquals(rows.get(k), stored.get(k));
            }
            long seed = Long.getLong("test.seed", 20260101L);
            Random random = new Random(seed);
            for (int n = 0; n < 200; n++) {
                int k = random.nextInt(rows.size());
                assertEquals(rows.get(k), stored.get(k), "row " + k + ", seed " + seed);
            }
            // two iterators at once
            Iterator<TableResult.Row> a = stored.iterator();
            Iterator<TableResult.Row> b = stored.iterator();
            for (TableResult.Row expected : rows) {
                assertEquals(expected, a.next());
                assertEquals(expected, b.next());
            }
            assertEquals(false, a.hasNext());
            assertThrows(IndexOutOfBoundsException.class, () -> stored.get(rows.size()));
        }
    }

    @Test
    void rowsCannotBeReadAfterTheirFileIsReleasedNorAppendedAfterFinish() {
        List<TableResult.Row> rows = rows(RowStore.INDEX_EVERY + 1);
        StoredRows stored = store(rows, 0);
        stored.close();
        assertThrows(IllegalStateException.class, () -> stored.get(RowStore.INDEX_EVERY));
        RowStore s = RowStore.forTable(table());
        s.finish();
        assertThrows(IllegalStateException.class, () -> s.append(rows.get(0)));
        RowStore t = RowStore.forTable(table());
        assertThrows(IllegalArgumentException.class, () -> t.append(new TableResult.Row(null, rows.get(0).entries().subList(0, 2))));
    }
}
