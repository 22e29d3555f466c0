package dev.odetab.tables.values;

import dev.odetab.tables.Column;
import dev.odetab.tables.Grid;
import dev.odetab.tables.OutOfRangeException;
import dev.odetab.tables.TableDef;
import dev.odetab.tables.TableEvaluator;
import dev.odetab.tables.TableResult;
import dev.odetab.series.PrecisionCapException;
import dev.odetab.series.PrecisionLoop;
import dev.odetab.tables.rows.RowStore;

import dev.odetab.base.Progress;

import dev.odetab.base.ExprException;
import dev.odetab.expr.Poly;
import dev.odetab.numeric.Ball;
import dev.odetab.numeric.Entry;
import dev.odetab.numeric.Rational;
import dev.odetab.numeric.Rounding;
import dev.odetab.ode.FunctionDef;
import dev.odetab.series.Continuation;
import dev.odetab.series.FunctionEvaluator;
import dev.odetab.series.GridWalk;
import dev.odetab.series.Jet;
import dev.odetab.series.LocalSeries;
import dev.odetab.series.Recurrence;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Future;
import java.util.ArrayDeque;
import java.util.Deque;

/**
 * Evaluation of a values table: every entry correctly rounded from a proven enclosure. The chunk
 * machinery here (chunks, exact path, fast tier, precision loop) is shared with
 * {@link TaylorEvaluator}: the two kinds differ only in their rows' shape ({@link RowShape}).
 *
 * <p>Trust level: Rigorous. Polynomial solutions take the exact path (exact rational values,
 * rounded once, so exactly representable values and exact rounding midpoints come out right,
 * docs/methods.md §5). Otherwise the grid is walked point to point ({@link GridWalk}) at a working
 * precision; an entry is stored only when {@link Rounding#decide} finds that every point of its
 * enclosure rounds to it (Ziv). Rows with an undecided entry are walked again at twice the
 * precision, up to the table's cap; rows still undecided there are reported, never guessed.
 */
public final class ValuesEvaluator {
    private ValuesEvaluator() {
    }

    /**
     * What a row's entry is for a column that is not the point, from the derivative y^(k)(x) of
     * the column's order k: the derivative itself (values tables, {@link #DERIVATIVES}) or the
     * Taylor coefficient y^(k)(x)/k! ({@link TaylorEvaluator}).
     */
    interface RowShape {
        /** Exact: the entry's value from the exact derivative y^(k)(x), k = {@code col.order()}. */
        Rational exact(Column col, Rational derivative);

        /** Rigorous: a ball containing the entry's value from a ball containing y^(k)(x). */
        Ball enclose(Column col, Ball derivative, int precBits);
    }

    /** The rows of a values table: y, y', … y^(9) as they are. */
    private static final RowShape DERIVATIVES = new RowShape() {
        @Override
        public Rational exact(Column col, Rational derivative) {
            return derivative;
        }

        @Override
        public Ball enclose(Column col, Ball derivative, int precBits) {
            return derivative;
        }
    };

    /**
     * Rigorous: every entry of a values table (see the class comment for how it is decided), with
     * the chunks of the grid evaluated on {@code pool} (null: in the calling thread) and progress
     * reported as rows are decided. The chunks are fixed by the table alone ({@link #chunkSize}),
     * and each chunk is a deterministic computation, so the result does not depend on the pool.
     *
     * @throws PrecisionCapException when the table's precision cap cannot decide some entries (named)
     * @throws OutOfRangeException when a fixed-point entry is out of range and the policy is "error"
     */
    public static TableResult evaluate(TableDef t, Progress progress, ExecutorService pool)
            throws ExprException, PrecisionCapException, OutOfRangeException {
        return evaluate(t, DERIVATIVES, progress, pool);
    }

    /** As {@link #evaluate(TableDef, Progress, ExecutorService)}, each entry of the rows' {@code shape}. */
    static TableResult evaluate(TableDef t, RowShape shape, Progress progress, ExecutorService pool)
            throws ExprException, PrecisionCapException, OutOfRangeException {
        int n = t.grid().size();
        progress.start(t.name(), n);
        int size = chunkSize(t);
        int chunks = (n + size - 1) / size;
        List<CompletableFuture<Jet>> starts = null;
        Thread walker = null;
        if (FastTier.applies(t) && FunctionEvaluator.polynomial(t.function()).isEmpty()) {
            List<CompletableFuture<Jet>> futures = new ArrayList<>();
            for (int c = 0; c < chunks; c++) {
                futures.add(new CompletableFuture<>());
            }
            starts = futures;
            if (pool == null || chunks == 1) {
                FastTier.chunkStarts(t, size, futures);
            } else {
                // The walk to the chunk starts is sequential: it runs beside the chunks, which wait only for their own start.
                walker = new Thread(() -> FastTier.chunkStarts(t, size, futures), "odetab-chunk-starts");
                walker.setDaemon(true);
                walker.start();
            }
        }
        List<CompletableFuture<Jet>> startList = starts;
        RowStore store = RowStore.forTable(t);
        BigDecimal maxRel = BigDecimal.ZERO;
        int maxPrec = 0;
        Deque<Future<Chunk>> window = new ArrayDeque<>();
        int next = 0;
        int inFlight = pool == null ? 1 : Math.max(2, Math.min(2 * Runtime.getRuntime().availableProcessors(), ROWS_IN_FLIGHT / size));
        try {
            while (next < chunks || !window.isEmpty()) {
                while (next < chunks && window.size() < inFlight) {
                    int s = next * size;
                    int e = Math.min(n, s + size);
                    CompletableFuture<Jet> start = startList == null ? null : startList.get(next);
                    Callable<Chunk> task = () -> chunk(t, shape, s, e, start == null ? null : TableEvaluator.await(start));
                    window.add(pool == null || chunks == 1 ? completed(task) : pool.submit(task));
                    next++;
                }
                Chunk c = TableEvaluator.await(window.poll());
                for (TableResult.Row row : c.rows()) {
                    store.append(row);
                }
                maxRel = maxRel.max(c.maxRel());
                maxPrec = Math.max(maxPrec, c.maxPrec());
                progress.advance(c.rows().length);
            }
        } finally {
            for (Future<Chunk> f : window) {
                f.cancel(true);
            }
            if (walker != null) {
                walker.interrupt();
            }
        }
        return new TableResult(t, store.finish(), maxRel, maxPrec);
    }

    /**
     * Heuristic: rows per chunk, a function of the table alone (never of the number of threads),
     * so that every build walks the same chunks. For the fast tier on a uniform grid, as many rows
     * as span about one unit of x (its balls widen with the distance walked), at least 32 and at
     * most 8192 (each chunk start costs a BigDecimal leg, so dense grids want long chunks);
     * otherwise 2048 rows.
     */
    static int chunkSize(TableDef t) {
        if (t.grid() instanceof Grid.Uniform u && FastTier.applies(t) && FunctionEvaluator.polynomial(t.function()).isEmpty()) {
            double perUnit = 1 / Math.abs(u.step().doubleEstimate());
            return (int) Math.max(32, Math.min(8192, Math.ceil(perUnit)));
        }
        return 2048;
    }

    /** At most this many rows are held by chunks in flight (memory does not grow with the table). */
    private static final int ROWS_IN_FLIGHT = 16384;

    /** The rows of one chunk and its statistics. */
    private record Chunk(TableResult.Row[] rows, BigDecimal maxRel, int maxPrec) {
    }

    private static Future<Chunk> completed(Callable<Chunk> task) {
        CompletableFuture<Chunk> f = new CompletableFuture<>();
        try {
            f.complete(task.call());
        } catch (Exception | Error e) {
            f.completeExceptionally(e);
        }
        return f;
    }

    /**
     * Rigorous: rows s … e−1. Exact rows for polynomials at exact points; then the fast tier
     * ({@link FastTier}) from the chunk's start when there is one; then BigDecimal walks at doubling precision for the
     * rows still undecided, up to the cap ({@link PrecisionLoop#runBatch}).
     */
    private static Chunk chunk(TableDef t, RowShape shape, int s, int e, Jet start) throws ExprException, PrecisionCapException, OutOfRangeException {
        int len = e - s;
        List<Column> cols = t.columns();
        Entry[][] entries = new Entry[len][];
        BigDecimal maxRel = BigDecimal.ZERO;
        int maxPrec = 0;
        Optional<Poly> poly = FunctionEvaluator.polynomial(t.function());
        Grid grid = t.grid();
        List<Integer> pending = new ArrayList<>();
        List<Poly> derivatives = new ArrayList<>();
        for (Poly p = poly.orElse(null); p != null && derivatives.size() <= Column.MAX_DERIVATIVE; p = p.derivative()) {
            derivatives.add(p);
        }
        for (int i = s; i < e; i++) {
            Rational x = poly.isPresent() ? grid.exactPoint(i) : null;
            if (x != null) {
                entries[i - s] = new Entry[cols.size()];
                for (int c = 0; c < cols.size(); c++) {
                    Column col = cols.get(c);
                    Rational v = col.isPoint() ? x : shape.exact(col, derivatives.get(col.order()).evaluate(x));
                    entries[i - s][c] = checked(t, x, col, Rounding.round(v, t.target()));
                }
            } else {
                pending.add(i);
            }
        }
        if (!pending.isEmpty() && start != null) {
            FastTier.Outcome fast = FastTier.run(t, s, e, start, entries);
            maxRel = maxRel.max(fast.maxRel());
            maxPrec = Math.max(maxPrec, fast.precBits());
            pending = fast.undecided();
        }
        Stats stats = new Stats(maxRel, maxPrec);
        if (!pending.isEmpty()) {
            PrecisionLoop.<Integer, ExprException, OutOfRangeException>runBatch(pending,
                    (undecided, prec) -> decide(t, shape, s, undecided, poly, entries, stats, prec),
                    PrecisionLoop.chooseStartBits(t.format()), t.capBits(), still -> undecidedMessage(t, still));
        }
        TableResult.Row[] rows = new TableResult.Row[len];
        for (int i = s; i < e; i++) {
            rows[i - s] = new TableResult.Row(grid.exactPoint(i), Arrays.asList(entries[i - s]));
        }
        return new Chunk(rows, stats.maxRel, stats.maxPrec);
    }

    /** The largest relative radius and working precision of the rows decided so far. */
    private static final class Stats {
        private BigDecimal maxRel;
        private int maxPrec;

        Stats(BigDecimal maxRel, int maxPrec) {
            this.maxRel = maxRel;
            this.maxPrec = maxPrec;
        }
    }

    /**
     * Rigorous: one round of the precision loop over the rows {@code pending} (indices from the
     * table's start; {@code entries} from the chunk's start {@code s}): walks to their points at
     * {@code prec}, keeps the rows whose every entry is decided and returns the others.
     */
    private static List<Integer> decide(TableDef t, RowShape shape, int s, List<Integer> pending, Optional<Poly> poly, Entry[][] entries,
            Stats stats, int prec) throws ExprException, OutOfRangeException {
        List<Column> cols = t.columns();
        Grid grid = t.grid();
        List<Rational> pts = new ArrayList<>();
        for (int i : pending) {
            pts.add(grid.center(i));
        }
        List<Jet> jets = poly.isPresent() ? null : GridWalk.enclose(t.function(), pts, prec);
        List<Integer> still = new ArrayList<>();
        for (int k = 0; k < pending.size(); k++) {
            int i = pending.get(k);
            Ball node = grid.node(i, prec);
            Jet jet = poly.isPresent() ? polynomialJet(poly.get(), node, prec)
                    : grid.exactPoint(i) != null ? jets.get(k) : nodeJet(t.function(), pts.get(k), jets.get(k), node, prec);
            Entry[] row = new Entry[cols.size()];
            BigDecimal rowRel = BigDecimal.ZERO;
            boolean decided = true;
            Ball[] derivs = null;
            for (int c = 0; c < cols.size() && decided; c++) {
                Column col = cols.get(c);
                Rational exact = col.isPoint() ? grid.exactPoint(i) : null;
                if (exact != null) {
                    // an exact point is rounded once, as on the exact path and in the fast tier
                    row[c] = Rounding.round(exact, t.target());
                    continue;
                }
                Ball b;
                if (col.isPoint()) {
                    b = node;
                } else {
                    if (derivs == null) {
                        derivs = derivatives(t.function(), pts.get(k), jet, maxOrder(cols), prec);
                    }
                    b = shape.enclose(col, derivs[col.order()], prec);
                }
                Optional<Entry> en = Rounding.decide(b, t.target());
                if (en.isEmpty()) {
                    decided = false;
                } else {
                    row[c] = en.get();
                    rowRel = col.isPoint() ? rowRel : rowRel.max(relative(b));
                }
            }
            if (decided) {
                for (int c = 0; c < cols.size(); c++) {
                    row[c] = checked(t, pts.get(k), cols.get(c), row[c]);
                }
                entries[i - s] = row;
                stats.maxRel = stats.maxRel.max(rowRel);
                stats.maxPrec = Math.max(stats.maxPrec, prec);
            } else {
                still.add(i);
            }
        }
        return still;
    }

    /** Value and slope of an exact polynomial over a ball (Horner in ball arithmetic). */
    private static Jet polynomialJet(Poly p, Ball x, int precBits) {
        return new Jet(p.evaluate(x, precBits), p.derivative().evaluate(x, precBits));
    }

    /** The jet at an irrational node from the jet at the rational center near it: one series step with a ball step. */
    private static Jet nodeJet(FunctionDef f, Rational center, Jet atCenter, Ball node, int precBits) {
        Ball t = node.subtract(Ball.of(center, precBits + 20), precBits + 20);
        return Continuation.stepOver(f.equation(), center, atCenter, t, precBits);
    }

    private static int maxOrder(List<Column> cols) {
        int m = 0;
        for (Column c : cols) {
            m = Math.max(m, c.order());
        }
        return m;
    }

    /**
     * Enclosures of y, y', …, y^(order) at x from the jet: y^(k)(x) = k! c_k with the Taylor
     * coefficients at x given by the recurrence (docs/methods.md §1).
     */
    private static Ball[] derivatives(FunctionDef f, Rational x, Jet jet, int order, int precBits) {
        Ball[] d = new Ball[Math.max(order, 1) + 1];
        d[0] = jet.value();
        d[1] = jet.derivative();
        if (order >= 2) {
            Ball[] c = LocalSeries.coefficients(new Recurrence(f.equation(), x), jet.value(), jet.derivative(), order + 1, precBits);
            Rational factorial = Rational.ONE;
            for (int k = 2; k <= order; k++) {
                factorial = factorial.multiply(k);
                d[k] = c[k].multiply(factorial, precBits);
            }
        }
        return d;
    }

    /** Three digits, rounded up: a proven bound printed in provenance must not shrink when it is shortened. */
    private static final MathContext RELATIVE_UP = new MathContext(3, java.math.RoundingMode.CEILING);

    /**
     * Rigorous: an upper bound of rad/|y| for every y in b, to three digits rounded up (the
     * radius itself when the ball reaches within a radius of 0).
     */
    static BigDecimal relative(Ball b) {
        if (b.rad().signum() == 0) {
            return BigDecimal.ZERO;
        }
        if (b.mid().abs().compareTo(b.rad().multiply(BigDecimal.valueOf(2))) <= 0) {
            return b.rad();
        }
        return b.rad().divide(b.mid().abs().subtract(b.rad()), RELATIVE_UP);
    }

    static Entry checked(TableDef t, Rational x, Column col, Entry e) throws OutOfRangeException {
        if (e.kind() == Entry.Kind.OUT_OF_RANGE) {
            throw new OutOfRangeException("table " + t.name() + ": the " + col.name() + " at x = " + x.toDecimalOrFraction()
                    + " lies outside the range of " + t.format().name()
                    + " (out_of_range = \"error\"; choose a wider format or out_of_range = \"saturate\")");
        }
        return e;
    }

    private static String undecidedMessage(TableDef t, List<Integer> pending) {
        StringBuilder sb = new StringBuilder("table " + t.name() + ": the precision cap of " + t.capBits()
                + " bits cannot decide the rounding of " + pending.size() + " row(s), at x =");
        for (int k = 0; k < Math.min(10, pending.size()); k++) {
            sb.append(k == 0 ? " " : ", ").append(t.grid().center(pending.get(k)).toDecimalOrFraction());
        }
        if (pending.size() > 10) {
            sb.append(" …");
        }
        return sb.append(" (if such a value is an exact rounding boundary, for example an exact zero of a solution that is"
                + " not a polynomial under a directed rounding, no cap decides it: change the rounding or leave the point out;"
                + " otherwise raise precision_cap_bits)").toString();
    }
}
