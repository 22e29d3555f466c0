package dev.odetab.tables;

import dev.odetab.expr.ExprException;
import dev.odetab.expr.Poly;
import dev.odetab.numeric.Ball;
import dev.odetab.numeric.Entry;
import dev.odetab.numeric.Format;
import dev.odetab.numeric.Precision;
import dev.odetab.numeric.Rational;
import dev.odetab.numeric.Rounding;
import dev.odetab.ode.FunctionDef;
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

/**
 * Evaluation of a values table: every entry correctly rounded from a proven enclosure.
 *
 * <p>Trust level: Rigorous. Polynomial solutions take the exact path (exact rational values,
 * rounded once, so exactly representable values and exact rounding midpoints come out right,
 * METHODS §5). Otherwise the grid is walked point to point ({@link GridWalk}) at a working
 * precision; an entry is stored only when {@link Rounding#decide} finds that every point of its
 * enclosure rounds to it (Ziv). Rows with an undecided entry are walked again at twice the
 * precision, up to the table's cap; rows still undecided there are reported, never guessed.
 */
public final class TableEvaluator {
    private TableEvaluator() {
    }

    /** Entries that the precision cap could not decide, with their points. */
    public static final class UndecidedException extends Exception {
        private static final long serialVersionUID = 1L;

        UndecidedException(String message) {
            super(message);
        }
    }

    /** An entry outside the range of a fixed-point format whose policy is "error". */
    public static final class OutOfRangeException extends Exception {
        private static final long serialVersionUID = 1L;

        OutOfRangeException(String message) {
            super(message);
        }
    }

    /**
     * Rigorous: every entry of the table, each the correct rounding of the exact value (see the
     * class comment for how it is decided); zeros tables go to {@link ZeroFinder}, quadrature tables to {@link GaussRule}.
     *
     * @throws UndecidedException when the table's precision cap cannot decide some entries (named)
     * @throws OutOfRangeException when a fixed-point entry is out of range and the policy is "error"
     */
    public static TableResult evaluate(TableDef t) throws ExprException, UndecidedException, OutOfRangeException {
        if (t.grid() instanceof Grid.ZeroSearch z) {
            return ZeroFinder.find(t, z);
        }
        if (t.grid() instanceof Grid.Quadrature q) {
            return GaussRule.table(t, q);
        }
        List<Rational> xs = t.grid().points();
        int n = xs.size();
        List<Column> cols = t.columns();
        Entry[][] entries = new Entry[n][];
        BigDecimal maxRel = BigDecimal.ZERO;
        int maxPrec = 0;
        Optional<Poly> poly = FunctionEvaluator.polynomial(t.function());
        Grid grid = t.grid();
        List<Integer> pending = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (poly.isPresent() && grid.exactPoint(i) != null) {
                entries[i] = new Entry[cols.size()];
                for (int c = 0; c < cols.size(); c++) {
                    Column col = cols.get(c);
                    Rational v = col.isPoint() ? xs.get(i) : derivative(poly.get(), col.order()).evaluate(xs.get(i));
                    if (col.taylor()) {
                        v = v.divide(factorial(col.order()));
                    }
                    entries[i][c] = checked(t, xs.get(i), col, Rounding.round(v, t.format(), t.rounding(), t.outOfRange()));
                }
            } else {
                pending.add(i);
            }
        }
        int prec = startBits(t.format());
        while (!pending.isEmpty()) {
            List<Rational> pts = new ArrayList<>();
            for (int i : pending) {
                pts.add(xs.get(i));
            }
            List<Jet> jets = poly.isPresent() ? null : GridWalk.enclose(t.function(), pts, prec);
            List<Integer> still = new ArrayList<>();
            for (int k = 0; k < pending.size(); k++) {
                int i = pending.get(k);
                Ball node = grid.node(i, prec);
                Jet jet = poly.isPresent() ? polynomialJet(poly.get(), node, prec)
                        : grid.exactPoint(i) != null ? jets.get(k) : nodeJet(t.function(), xs.get(i), jets.get(k), node, prec);
                Entry[] row = new Entry[cols.size()];
                BigDecimal rowRel = BigDecimal.ZERO;
                boolean decided = true;
                Ball[] derivs = null;
                for (int c = 0; c < cols.size() && decided; c++) {
                    Column col = cols.get(c);
                    Optional<Entry> e;
                    Ball b;
                    if (col.isPoint()) {
                        b = node;
                    } else {
                        if (derivs == null) {
                            derivs = derivatives(t.function(), xs.get(i), jet, maxOrder(cols), prec);
                        }
                        b = col.taylor() ? derivs[col.order()].divide(factorial(col.order()), prec) : derivs[col.order()];
                    }
                    e = Rounding.decide(b, t.format(), t.rounding(), t.outOfRange());
                    if (e.isEmpty()) {
                        decided = false;
                    } else {
                        row[c] = e.get();
                        rowRel = col.isPoint() ? rowRel : rowRel.max(relative(b));
                    }
                }
                if (decided) {
                    for (int c = 0; c < cols.size(); c++) {
                        row[c] = checked(t, xs.get(i), cols.get(c), row[c]);
                    }
                    entries[i] = row;
                    maxRel = maxRel.max(rowRel);
                    maxPrec = Math.max(maxPrec, prec);
                } else {
                    still.add(i);
                }
            }
            pending = still;
            if (!pending.isEmpty()) {
                if (prec >= t.capBits()) {
                    throw new UndecidedException(undecidedMessage(t, xs, pending));
                }
                prec = Math.min(t.capBits(), 2 * prec);
            }
        }
        List<TableResult.Row> rows = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            rows.add(new TableResult.Row(grid.exactPoint(i), Arrays.asList(entries[i])));
        }
        return new TableResult(t, rows, maxRel, maxPrec);
    }

    /** Value and slope of an exact polynomial over a ball (Horner in ball arithmetic). */
    private static Jet polynomialJet(Poly p, Ball x, int precBits) {
        return new Jet(p.evaluate(x, precBits), p.derivative().evaluate(x, precBits));
    }

    /** The jet at an irrational node from the jet at the rational center near it: one series step with a ball step. */
    private static Jet nodeJet(FunctionDef f, Rational center, Jet atCenter, Ball node, int precBits) {
        Ball t = node.subtract(Ball.of(center, precBits + 20), precBits + 20);
        return LocalSeries.sum(new Recurrence(f.equation(), center), atCenter.value(), atCenter.derivative(), t,
                4 * precBits + 2000, precBits).jet();
    }

    private static Poly derivative(Poly p, int order) {
        Poly r = p;
        for (int k = 0; k < order; k++) {
            r = r.derivative();
        }
        return r;
    }

    private static Rational factorial(int k) {
        Rational f = Rational.ONE;
        for (int i = 2; i <= k; i++) {
            f = f.multiply(i);
        }
        return f;
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
     * coefficients at x given by the recurrence (METHODS §1).
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

    private static BigDecimal relative(Ball b) {
        if (b.rad().signum() == 0) {
            return BigDecimal.ZERO;
        }
        if (b.mid().abs().compareTo(b.rad().multiply(BigDecimal.valueOf(2))) <= 0) {
            return b.rad();
        }
        return b.rad().divide(b.mid().abs().subtract(b.rad()), new MathContext(3));
    }

    /** The bits the format holds, plus guard bits: where the precision loop starts. */
    static int startBits(Format f) {
        int bits;
        if (f instanceof Format.BinaryFormat b) {
            bits = b.precisionBits();
        } else if (f instanceof Format.DoubleDouble) {
            bits = 107;
        } else if (f instanceof Format.DecimalFormat d) {
            bits = Precision.bitsForDigits(d.digits());
        } else if (f instanceof Format.FixedFormat x) {
            bits = x.totalBits();
        } else {
            bits = 64;
        }
        return bits + 40;
    }

    private static Entry checked(TableDef t, Rational x, Column col, Entry e) throws OutOfRangeException {
        if (e.kind() == Entry.Kind.OUT_OF_RANGE) {
            throw new OutOfRangeException("table " + t.name() + ": the " + col.name() + " at x = " + x.toDecimalOrFraction()
                    + " lies outside the range of " + t.format().name()
                    + " (out_of_range = \"error\"; choose a wider format or out_of_range = \"saturate\")");
        }
        return e;
    }

    private static String undecidedMessage(TableDef t, List<Rational> xs, List<Integer> pending) {
        StringBuilder sb = new StringBuilder("table " + t.name() + ": the precision cap of " + t.capBits()
                + " bits cannot decide the rounding of " + pending.size() + " row(s), at x =");
        for (int k = 0; k < Math.min(10, pending.size()); k++) {
            sb.append(' ').append(xs.get(pending.get(k)).toDecimalOrFraction());
        }
        if (pending.size() > 10) {
            sb.append(" …");
        }
        return sb.append(" (raise precision_cap_bits, or the value may be an exact rounding boundary)").toString();
    }
}
