package dev.odetab.tables.values;

import dev.odetab.base.ExprException;
import dev.odetab.base.Progress;
import dev.odetab.numeric.Ball;
import dev.odetab.numeric.Rational;
import dev.odetab.series.PrecisionCapException;
import dev.odetab.tables.Column;
import dev.odetab.tables.OutOfRangeException;
import dev.odetab.tables.TableDef;
import dev.odetab.tables.TableKind;
import dev.odetab.tables.TableResult;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;

/**
 * Evaluation of a taylor table: at each point of the grid, the Taylor coefficients
 * c_k = y^(k)(x)/k! for k = 0 … terms − 1 (columns taylor0 …, {@link #coefficientColumns}), each
 * correctly rounded from a proven enclosure.
 *
 * <p>Trust level: Rigorous. The rows are walked, chunked and decided by the machinery of
 * {@link ValuesEvaluator} (exact path for polynomial solutions, Ziv's loop otherwise; the fast
 * tier never applies, since its balls carry only y and y'); what is the taylor table's own is its
 * rows' shape: the exact coefficient is the exact derivative divided by k!, and its ball the
 * derivative's ball divided by the exact k! (one rounding, radius enlarged outward).
 */
public final class TaylorEvaluator {
    private TaylorEvaluator() {
    }

    /** The shape of a taylor table's rows: column taylorK holds y^(K)(x)/K!. */
    private static final ValuesEvaluator.RowShape COEFFICIENTS = new ValuesEvaluator.RowShape() {
        @Override
        public Rational exact(Column col, Rational derivative) {
            return derivative.divide(factorial(col.order()));
        }

        @Override
        public Ball enclose(Column col, Ball derivative, int precBits) {
            return derivative.divide(factorial(col.order()), precBits);
        }
    };

    /** The coefficient columns of a taylor table with {@code terms} terms: taylor0 … taylor(terms − 1). */
    public static List<Column> coefficientColumns(int terms) {
        List<Column> r = new ArrayList<>();
        for (int k = 0; k < terms; k++) {
            r.add(Column.taylor(k));
        }
        return r;
    }

    /**
     * Rigorous: every entry of the taylor table {@code t} (class comment), its chunks evaluated
     * on {@code pool} (null: in the calling thread), progress reported as rows are decided; the
     * result does not depend on the pool.
     *
     * @throws PrecisionCapException when the table's precision cap cannot decide some entries (named)
     * @throws OutOfRangeException when a fixed-point entry is out of range and the policy is "error"
     */
    public static TableResult evaluate(TableDef t, TableKind.Taylor kind, Progress progress, ExecutorService pool)
            throws ExprException, PrecisionCapException, OutOfRangeException {
        if (t.columns().stream().filter(Column::taylor).count() != kind.terms()) {
            throw new IllegalArgumentException("table " + t.name() + ": a taylor table of " + kind.terms()
                    + " terms has the columns " + coefficientColumns(kind.terms()));
        }
        return ValuesEvaluator.evaluate(t, COEFFICIENTS, progress, pool);
    }

    /** k!, exactly. */
    private static Rational factorial(int k) {
        Rational f = Rational.ONE;
        for (int i = 2; i <= k; i++) {
            f = f.multiply(i);
        }
        return f;
    }
}
