package dev.odetab.tables;

import dev.odetab.base.ExprException;
import dev.odetab.base.Progress;
import dev.odetab.numeric.Rational;
import dev.odetab.series.FunctionEvaluator;
import dev.odetab.series.PrecisionCapException;
import dev.odetab.series.PrecisionLoop;
import dev.odetab.series.Start;
import dev.odetab.series.WalkCost;
import dev.odetab.tables.quadrature.GaussRule;
import dev.odetab.tables.values.TaylorEvaluator;
import dev.odetab.tables.values.ValuesEvaluator;
import dev.odetab.tables.zeros.ZeroFinder;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Future;

/**
 * Evaluation of a table of any kind: each kind goes to its evaluator ({@link TableKind#evaluate}):
 * values tables to {@link ValuesEvaluator}, taylor tables to {@link TaylorEvaluator}, zeros tables to {@link ZeroFinder},
 * quadrature tables to {@link GaussRule}.
 */
public final class TableEvaluator {
    private TableEvaluator() {
    }

    /**
     * Rigorous: every entry of the table, each the correct rounding of the exact value (see the
     * class comment for how it is decided); zeros tables go to {@link ZeroFinder}, quadrature
     * tables to {@link GaussRule}. Evaluated in the calling thread.
     *
     * @throws PrecisionCapException when the table's precision cap cannot decide some entries (named)
     * @throws OutOfRangeException when a fixed-point entry is out of range and the policy is "error"
     */
    public static TableResult evaluate(TableDef t) throws ExprException, PrecisionCapException, OutOfRangeException {
        return evaluate(t, Progress.NONE, null);
    }

    /** As {@link #evaluate(TableDef)}, reporting rows to {@code progress} as they are decided. */
    public static TableResult evaluate(TableDef t, Progress progress) throws ExprException, PrecisionCapException, OutOfRangeException {
        return evaluate(t, progress, null);
    }

    /**
     * As {@link #evaluate(TableDef)}, with the chunks of a values table evaluated on {@code pool}
     * (null: in the calling thread) and progress reported as rows are decided; the result does
     * not depend on the pool ({@link ValuesEvaluator#evaluate}).
     */
    public static TableResult evaluate(TableDef t, Progress progress, ExecutorService pool)
            throws ExprException, PrecisionCapException, OutOfRangeException {
        checkCost(t);
        return t.kind().evaluate(t, new TableKind.Evaluators() {
            @Override
            public TableResult values(TableDef table, TableKind.Values kind) throws ExprException, PrecisionCapException, OutOfRangeException {
                return ValuesEvaluator.evaluate(table, progress, pool);
            }

            @Override
            public TableResult taylor(TableDef table, TableKind.Taylor kind) throws ExprException, PrecisionCapException, OutOfRangeException {
                return TaylorEvaluator.evaluate(table, kind, progress, pool);
            }

            @Override
            public TableResult zeros(TableDef table, TableKind.Zeros kind) throws ExprException, PrecisionCapException, OutOfRangeException {
                // The number of zeros is not known before the search: they are reported when it ends.
                return reported(ZeroFinder.find(table, kind), progress);
            }

            @Override
            public TableResult quadrature(TableDef table, TableKind.Quadrature kind) throws PrecisionCapException, OutOfRangeException {
                return reported(GaussRule.table(table, kind), progress);
            }
        });
    }

    /**
     * Heuristic: refuses, before any work, a table whose walks the estimate ({@link WalkCost#check})
     * puts above its precision cap or the walk limit: the walks from the normalization to the ends
     * of its grid, or of a zeros search without a count (with a count the search may stop early).
     * Polynomial solutions are exact and walk nowhere; quadrature rules take their nodes from the
     * family, not from a walk.
     *
     * @throws PrecisionCapException naming the table and the estimate
     */
    static void checkCost(TableDef t) throws ExprException, PrecisionCapException {
        if (FunctionEvaluator.polynomial(t.function()).isPresent()) {
            return;
        }
        List<Rational> ends = new ArrayList<>();
        if (t.kind().givenPoints().isPresent()) {
            Grid g = t.kind().givenPoints().get();
            if (g.size() == 0) {
                return;
            }
            ends.add(g.center(0));
            ends.add(g.center(g.size() - 1));
            if (g instanceof Grid.Points p) {
                ends.clear();
                ends.add(p.points().stream().min(Rational::compareTo).orElseThrow());
                ends.add(p.points().stream().max(Rational::compareTo).orElseThrow());
            }
        } else if (t.kind() instanceof TableKind.Zeros z && z.count() == 0) {
            ends.add(z.from());
            ends.add(z.to());
        }
        if (ends.isEmpty()) {
            return;
        }
        try {
            WalkCost.check(Start.of(t.function()), ends, PrecisionLoop.chooseStartBits(t.format()), t.capBits());
        } catch (PrecisionCapException e) {
            throw new PrecisionCapException("table " + t.name() + ": " + e.getMessage(), e.capBits());
        }
    }

    /** A table whose rows were all found at once, reported to {@code progress} as such. */
    private static TableResult reported(TableResult r, Progress progress) {
        progress.start(r.table().name(), r.rows().size());
        progress.advance(r.rows().size());
        return r;
    }

    /**
     * The result of a task of table evaluation, with the evaluation's own exceptions unwrapped
     * from the ExecutionException.
     */
    public static <T> T await(Future<T> f) throws ExprException, PrecisionCapException, OutOfRangeException {
        try {
            return f.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted", e);
        } catch (ExecutionException e) {
            Throwable c = e.getCause();
            if (c instanceof ExprException x) {
                throw x;
            }
            if (c instanceof PrecisionCapException x) {
                throw x;
            }
            if (c instanceof OutOfRangeException x) {
                throw x;
            }
            if (c instanceof RuntimeException x) {
                throw x;
            }
            if (c instanceof Error x) {
                throw x;
            }
            throw new IllegalStateException(c);
        }
    }
}
