package dev.odetab.tables.values;

import dev.odetab.tables.Column;
import dev.odetab.tables.Grid;
import dev.odetab.tables.OutOfRangeException;
import dev.odetab.tables.TableDef;
import dev.odetab.tables.TableEvaluator;
import dev.odetab.base.ExprException;
import dev.odetab.numeric.DDBall;
import dev.odetab.numeric.Entry;
import dev.odetab.numeric.Format;
import dev.odetab.numeric.Rational;
import dev.odetab.numeric.Rounding;
import dev.odetab.numeric.RoundingMode;
import dev.odetab.series.CarriedState;
import dev.odetab.series.Continuation;
import dev.odetab.series.FastWalk;
import dev.odetab.series.GridWalk;
import dev.odetab.series.Jet;
import dev.odetab.series.PrecisionCapException;
import dev.odetab.series.PrecisionLoop;
import dev.odetab.ode.SingularCrossingException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CancellationException;
import java.util.concurrent.CompletableFuture;

/**
 * The fast tier of a values table: a chunk of a uniform grid walked in double-double balls
 * ({@link FastWalk}), each entry decided from its ball when every point of the ball rounds to the
 * same entry; the entries it cannot decide go to the BigDecimal tier.
 *
 * <p>Trust level: Rigorous. The balls contain the exact values (FastWalk); binary64 and binary32
 * entries in round-to-nearest-even are decided in double arithmetic ({@link DDBall#roundBinary64},
 * {@link DDBall#roundBinary32}), every other format by {@link Rounding#decide} on the same ball
 * converted exactly to a BigDecimal ball. An entry is stored only when decided.
 *
 * <p>Derivation: docs/methods.md §10 (the fast tier and its rounding decisions).
 */
final class FastTier {
    /** The working precision reported for entries decided here (double-double midpoints). */
    static final int PRECISION_BITS = 106;
    private static final MathContext REL = new MathContext(3, java.math.RoundingMode.CEILING);

    private FastTier() {
    }

    /** What the fast tier did with a chunk. */
    record Outcome(List<Integer> undecided, BigDecimal maxRel, int precBits) {
    }

    /**
     * Heuristic: whether the fast tier can help this table — a uniform grid (exact points, a
     * constant step), columns x, value and derivative only, and a format whose entries a 106-bit
     * ball can decide (at most 64 significant bits).
     */
    static boolean applies(TableDef t) {
        if (!(t.grid() instanceof Grid.Uniform)) {
            return false;
        }
        for (Column c : t.columns()) {
            if (c.taylor() || c.order() > 1) {
                return false;
            }
        }
        return t.format().significantBits() <= 64;
    }

    /**
     * Decides what it can of rows s … e−1 into {@code entries} (indexed from s); returns the rows
     * left undecided (in order) and the largest relative radius of a deciding ball.
     */
    static Outcome run(TableDef t, int s, int e, Jet start, Entry[][] entries) throws OutOfRangeException {
        Grid.Uniform grid = (Grid.Uniform) t.grid();
        Rational x0 = grid.exactPoint(s);
        DDBall[][] jets = FastWalk.walk(t.function().equation(), x0, start, grid.step(), e - s);
        List<Integer> undecided = new ArrayList<>();
        if (jets == null) {
            for (int i = s; i < e; i++) {
                undecided.add(i);
            }
            return new Outcome(undecided, BigDecimal.ZERO, 0);
        }
        List<Column> cols = t.columns();
        double maxRel = 0;
        for (int i = s; i < e; i++) {
            DDBall[] jet = jets[i - s];
            if (jet == null) {
                undecided.add(i);
                continue;
            }
            Entry[] row = new Entry[cols.size()];
            double rowRel = 0;
            boolean decided = true;
            for (int c = 0; c < cols.size() && decided; c++) {
                Column col = cols.get(c);
                Entry en;
                if (col.isPoint()) {
                    en = Rounding.round(grid.exactPoint(i), t.target());
                } else {
                    DDBall b = jet[col.order()];
                    en = decide(b, t);
                    rowRel = Math.max(rowRel, relative(b));
                }
                if (en == null) {
                    decided = false;
                } else {
                    row[c] = en;
                }
            }
            if (decided) {
                for (int c = 0; c < cols.size(); c++) {
                    if (row[c].kind() == Entry.Kind.OUT_OF_RANGE) {
                        ValuesEvaluator.checked(t, grid.exactPoint(i), cols.get(c), row[c]);
                    }
                }
                entries[i - s] = row;
                maxRel = Math.max(maxRel, rowRel);
            } else {
                undecided.add(i);
            }
        }
        BigDecimal rel = maxRel == 0 ? BigDecimal.ZERO : new BigDecimal(maxRel).round(REL);
        return new Outcome(undecided, rel, undecided.size() == e - s ? 0 : PRECISION_BITS);
    }

    /**
     * Balls containing y and y' at the first point of every chunk, by a walk from the
     * normalization point to the first start and then from start to start in grid order
     * ({@link GridWalk}, {@link Continuation}; sequential and deterministic), at
     * {@link FastWalk#START_BITS} bits and again at doubled precision for the starts whose balls
     * are wider than 2^−115 of the jet's size (long walks on oscillating solutions lose bits to
     * the wrapping effect, docs/methods.md §4), up to the table's cap ({@link PrecisionLoop#runBatch}). Each future is completed as soon as
     * its start is final, so chunks can run while the walk goes on; all complete with null when a
     * walk would cross a singular point (the BigDecimal tier then reports it with the table's own
     * points), and exceptionally when a normalization constant fails.
     */
    static void chunkStarts(TableDef t, int size, List<CompletableFuture<Jet>> starts) {
        int chunks = starts.size();
        List<Rational> xs = new ArrayList<>(chunks);
        for (int c = 0; c < chunks; c++) {
            xs.add(t.grid().exactPoint(c * size));
        }
        List<Integer> wanted = new ArrayList<>();
        for (int c = 0; c < chunks; c++) {
            wanted.add(c);
        }
        if (wanted.isEmpty()) {
            return;
        }
        try {
            PrecisionLoop.<Integer, ExprException, RuntimeException>runBatch(wanted,
                    (pending, prec) -> walkStarts(t, xs, pending, starts, prec), FastWalk.START_BITS, t.capBits(),
                    still -> "table " + t.name() + ": " + still.size() + " chunk start(s) still wide at the precision cap");
        } catch (SingularCrossingException ex) {
            starts.forEach(f -> f.complete(null));
        } catch (ExprException | PrecisionCapException | RuntimeException ex) {
            starts.forEach(f -> f.completeExceptionally(ex));
        }
    }

    /**
     * One round of {@link #chunkStarts} at {@code prec} over the chunks {@code pending}: completes
     * the starts that are narrow, and all of them when doubling would pass the cap (the last
     * round: a wide start only costs the fast tier some entries); returns the others.
     */
    private static List<Integer> walkStarts(TableDef t, List<Rational> xs, List<Integer> pending, List<CompletableFuture<Jet>> starts,
            int prec) throws ExprException {
        List<Rational> pts = new ArrayList<>();
        for (int c : pending) {
            pts.add(xs.get(c));
        }
        List<Integer> wider = new ArrayList<>();
        boolean last = 2 * prec > t.capBits();
        // In grid order, so that chunk k waits only for the walk up to its own start: a long
        // jump to the first start, then from each start to the next.
        Jet first = GridWalk.enclose(t.function(), List.of(pts.get(0)), prec).get(0);
        CarriedState state = CarriedState.of(t.function().equation().reduced(), pts.get(0), first);
        for (int k = 0; k < pts.size(); k++) {
            if (Thread.currentThread().isInterrupted()) {
                throw new CancellationException("table evaluation stopped");
            }
            if (k > 0) {
                state = Continuation.walk(t.function().equation(), state, pts.get(k), prec).state();
            }
            Jet jet = k == 0 ? first : state.jet();
            int c = pending.get(k);
            if (narrow(jet) || last) {
                starts.get(c).complete(jet);
            } else {
                wider.add(c);
            }
        }
        return wider;
    }

    /** Heuristic: both radii below 2^−115 of max(|y|, |y'|). */
    private static boolean narrow(Jet j) {
        BigDecimal size = j.value().mid().abs().max(j.derivative().mid().abs());
        BigDecimal limit = size.multiply(new BigDecimal(0x1p-115));
        return j.value().rad().compareTo(limit) <= 0 && j.derivative().rad().compareTo(limit) <= 0;
    }

    /** The entry every point of b rounds to, or null. */
    private static Entry decide(DDBall b, TableDef t) {
        Format f = t.format();
        if (t.rounding() == RoundingMode.NEAREST_EVEN && f == Format.BinaryFormat.BINARY64) {
            double d = b.roundBinary64();
            return Double.isNaN(d) ? null : binaryEntry(f, d);
        }
        if (t.rounding() == RoundingMode.NEAREST_EVEN && f == Format.BinaryFormat.BINARY32) {
            float x = b.roundBinary32();
            return Float.isNaN(x) ? null : binaryEntry(f, x);
        }
        if (!b.isFinite()) {
            return null;
        }
        Optional<Entry> en = Rounding.decide(b.toBall(), t.target());
        return en.orElse(null);
    }

    /**
     * Exact: the entry of a finite non-zero value d of format f (d is a value of f), equal to
     * what {@link Rounding#round} gives for it.
     */
    static Entry binaryEntry(Format f, double d) {
        return new Entry(f, Entry.Kind.FINITE, d < 0, Rational.ofDouble(d), null, null);
    }

    /** An upper bound of rad/|value| (the same quantity as TableEvaluator's), in doubles; 1 when the ball nears 0. */
    private static double relative(DDBall b) {
        double low = b.absLower();
        if (b.rad() == 0) {
            return 0;
        }
        if (low <= b.rad()) {
            return Math.max(b.rad(), 0);
        }
        return b.rad() / low * (1 + 0x1p-50);
    }
}
