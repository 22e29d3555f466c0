package dev.odetab.audit;

import dev.odetab.base.ExprException;
import dev.odetab.numeric.Ball;
import dev.odetab.numeric.DecimalDigits;
import dev.odetab.numeric.Format;
import dev.odetab.numeric.Rational;
import dev.odetab.series.GridWalk;
import dev.odetab.series.Jet;
import dev.odetab.series.PrecisionCapException;
import dev.odetab.series.PrecisionLoop;
import dev.odetab.base.InputError;
import dev.odetab.tables.Column;
import dev.odetab.tables.TableDef;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;

/**
 * Measures every entry of a foreign table against the exact value.
 *
 * <p>Trust level: Rigorous for every decision, Heuristic for the printed digits. The exact
 * value at each grid point is enclosed by a {@link GridWalk} (docs/methods.md §4); an entry is
 * settled when (1) its enclosure lies in one binade, so ulp(exact) is known exactly
 * ({@link Ulp}), (2) the enclosure is narrower than 2^−10 ulp, so the printed error is good to
 * about 1e-3 ulp, and (3) the whole error interval is on one side of the tolerance. Unsettled
 * entries are walked again at twice the precision, up to the table's precision cap; beyond it
 * the audit stops with {@link PrecisionCapException}, never a guess ({@link PrecisionLoop#runBatch}). The reported error is the
 * error at the enclosure's midpoint, with the enclosure radius in ulps as its bound.
 *
 * <p>Derivation: docs/methods.md §15 (audit).
 */
public final class Auditor {
    /** The most significant digits the report's exact column shows (fewer when the enclosure decides fewer). */
    public static final int EXACT_DIGITS = 20;

    /** The enclosure radius, in ulps, below which the printed error is settled: 2^−10. */
    static final Rational SETTLED_ULPS = Rational.TWO.pow(-10);

    /**
     * Guard bits of the audit's first walk (a heuristic, below {@link PrecisionLoop#GUARD_BITS}
     * since its printed errors are taken at the midpoints of the precision reached: the committed
     * reports stay as they are).
     */
    private static final int START_GUARD_BITS = 30;

    private Auditor() {
    }

    /**
     * Rigorous: the audit of {@code e} as the column {@code column} of table {@code t}.
     *
     * @throws InputError when the table and the file do not fit (lengths, kind of grid or column)
     * @throws ExprException when a normalization constant cannot be evaluated
     * @throws PrecisionCapException when the precision cap cannot settle some entries
     */
    public static AuditResult audit(TableDef t, Column column, Entries e, double tolerance)
            throws InputError, ExprException, PrecisionCapException {
        if (t.kind().givenPoints().isEmpty()) {
            throw new InputError(e.source(), "table " + t.name() + " is a zeros or quadrature table, whose points are found, not given;"
                    + " audit compares entries at exact grid points (a values table)");
        }
        if (t.grid().hasIrrationalPoints()) {
            throw new InputError(e.source(), "table " + t.name() + " has irrational grid points (Chebyshev nodes); audit needs exact grid points");
        }
        if (column.isPoint() || column.order() > 1 || column.taylor()) {
            throw new InputError(e.source(), "audit measures value and derivative columns, not '" + column.name() + "'");
        }
        List<Rational> grid = t.grid().points();
        if (e.entries().size() != grid.size()) {
            throw new InputError(e.source(), "length mismatch: the file's " + e.name() + " has " + e.entries().size()
                    + " entries, table " + t.name() + " has " + grid.size() + " grid points");
        }
        Rational tol = Rational.of(new BigDecimal(Double.toString(tolerance)));
        int n = grid.size();
        AuditResult.Row[] rows = new AuditResult.Row[n];
        List<Integer> pending = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            pending.add(i);
        }
        int[] maxPrec = {0};
        PrecisionLoop.runBatch(pending, (undecided, prec) -> {
            List<Rational> pts = new ArrayList<>();
            for (int i : undecided) {
                pts.add(grid.get(gridIndex(e, i)));
            }
            List<Jet> jets = GridWalk.enclose(t.function(), pts, prec);
            List<Integer> still = new ArrayList<>();
            for (int k = 0; k < undecided.size(); k++) {
                int i = undecided.get(k);
                Ball b = column.order() == 0 ? jets.get(k).value() : jets.get(k).derivative();
                AuditResult.Row r = measure(t.format(), i, pts.get(k), e.entries().get(i), b, tol);
                if (r == null) {
                    still.add(i);
                } else {
                    rows[i] = r;
                    maxPrec[0] = prec;
                }
            }
            return still;
        }, t.format().significantBits() + START_GUARD_BITS, t.capBits(), still -> {
            StringBuilder sb = new StringBuilder("the precision cap of " + t.capBits() + " bits cannot settle the error of "
                    + still.size() + " entr" + (still.size() == 1 ? "y" : "ies") + ", at x =");
            for (int k = 0; k < Math.min(10, still.size()); k++) {
                sb.append(' ').append(grid.get(gridIndex(e, still.get(k))).toDecimalOrFraction());
            }
            return sb.append(" (the error may be exactly the tolerance)").toString();
        });
        return new AuditResult(t, column.name(), e, List.of(rows), tolerance, maxPrec[0]);
    }

    /** Exact: the grid index entry i stands for. */
    private static int gridIndex(Entries e, int i) {
        return e.xs() == null ? i : e.xs().get(i);
    }

    /**
     * Rigorous: the row for one entry, or null when the enclosure does not settle it (see the
     * class comment for the three conditions).
     */
    static AuditResult.Row measure(Format f, int index, Rational x, Entries.Item item, Ball b, Rational tol) {
        Rational lo = Rational.of(b.lower());
        Rational hi = Rational.of(b.upper());
        Rational ulp = Ulp.of(f, lo);
        if (!ulp.equals(Ulp.of(f, hi)) || (b.containsZero() && !b.isExact())) {
            return null;
        }
        Rational radUlps = hi.subtract(lo).divide(Rational.TWO).divide(ulp);
        if (radUlps.compareTo(SETTLED_ULPS) > 0) {
            return null;
        }
        Rational v = item.infinite() ? Ulp.infinity((Format.BinaryFormat) f, item.negative()) : item.value();
        Rational errLo = v.subtract(hi).divide(ulp).abs();
        Rational errHi = v.subtract(lo).divide(ulp).abs();
        boolean above = errLo.compareTo(tol) > 0 && errHi.compareTo(tol) > 0;
        boolean within = errLo.compareTo(tol) <= 0 && errHi.compareTo(tol) <= 0;
        if (!above && !within) {
            return null;
        }
        Rational mid = Rational.of(b.mid());
        double ulps = v.subtract(mid).divide(ulp).doubleEstimate();
        double radius = Math.nextUp(radUlps.doubleEstimate());
        double abs = v.subtract(mid).doubleEstimate();
        double rel = mid.isZero() ? (abs == 0 ? 0 : Double.POSITIVE_INFINITY) : v.subtract(mid).divide(mid.abs()).doubleEstimate();
        boolean exactNegative = mid.signum() < 0;
        boolean entryZero = !item.infinite() && item.value().isZero();
        boolean wrongSign = !mid.isZero() && !entryZero && item.negative() != exactNegative;
        int digits = DecimalDigits.decided(b, EXACT_DIGITS);
        String exact = digits == 0 ? "" : DecimalDigits.format(DecimalDigits.round(b, digits).orElseThrow(), digits);
        return new AuditResult.Row(index, x, item, exact, digits, ulps, radius, abs, rel, above,
                wrongSign, wrongExponent(f, v, mid, item, entryZero));
    }

    /**
     * Heuristic (decided at the enclosure's midpoint, which is within 2^−10 ulp of the exact
     * value): the entry lies outside [β^e, β^(e+1)], e the exponent of the exact value in base
     * β = 2 (binary, double-double) or 10 (decimal); both below the smallest normal count as
     * the same exponent. Not defined for fixed point (false), zeros or infinities.
     */
    private static boolean wrongExponent(Format f, Rational v, Rational mid, Entries.Item item, boolean entryZero) {
        if (entryZero || item.infinite() || mid.isZero()) {
            return false;
        }
        return switch (f.kind()) {
            case FIXED -> false;
            case DECIMAL -> wrongDecimalExponent(v, mid);
            case BINARY, DOUBLE_DOUBLE -> wrongBinaryExponent(v, mid, f.normalEmin().getAsInt());
        };
    }

    private static boolean wrongDecimalExponent(Rational v, Rational mid) {
        int e = Ulp.floorLog10(mid.abs());
        int ev = Ulp.floorLog10(v.abs());
        return ev != e && !(ev == e + 1 && v.abs().equals(Rational.of(10).pow(e + 1)));
    }

    private static boolean wrongBinaryExponent(Rational v, Rational mid, int emin) {
        int e = Math.max(Ulp.floorLog2(mid.abs()), emin);
        int ev = Math.max(Ulp.floorLog2(v.abs()), emin);
        return ev != e && !(ev == e + 1 && v.abs().equals(Rational.TWO.pow(e + 1)));
    }
}
