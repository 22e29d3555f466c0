package dev.odetab.tables.zeros;

import dev.odetab.tables.Column;
import dev.odetab.tables.TableKind;
import dev.odetab.tables.OutOfRangeException;
import dev.odetab.tables.TableDef;
import dev.odetab.tables.TableEvaluator;
import dev.odetab.tables.TableResult;
import dev.odetab.series.PrecisionCapException;
import dev.odetab.series.PrecisionLoop;
import dev.odetab.series.LocalExpansion;

import dev.odetab.base.ExprException;
import dev.odetab.expr.Poly;
import dev.odetab.numeric.Ball;
import dev.odetab.numeric.Directed;
import dev.odetab.numeric.Entry;
import dev.odetab.numeric.Rational;
import dev.odetab.numeric.Rounding;
import dev.odetab.ode.Equation;
import dev.odetab.ode.FunctionDef;
import dev.odetab.ode.RealPath;
import dev.odetab.series.CarriedState;
import dev.odetab.series.Continuation;
import dev.odetab.series.FunctionEvaluator;
import dev.odetab.series.Jet;
import dev.odetab.series.LocalSeries;
import dev.odetab.series.Start;
import dev.odetab.series.StepChooser;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Certified zeros of a solution g = y (or g = y', its turning points) met walking a search
 * interval, each correctly rounded, with the other columns at the zero.
 *
 * <p>Trust level: Rigorous (docs/methods.md §6). <b>Isolation.</b> One continuation state walks the
 * interval cell by cell ({@link LocalExpansion}: balls of y, y' at exact rational cell starts,
 * the next start reached by one series step). On a cell the Taylor series at its start,
 * evaluated over the whole cell (a ball step), encloses g and g' at every point of the cell
 * (g' = y'' from the equation when g = y'). A cell is kept when the enclosure of g excludes 0
 * (g has one sign there) or that of g' does (g is strictly monotone); otherwise it is halved.
 * Two neighbouring monotone cells share an end, so g' has the same sign on both: each maximal
 * stretch of monotone cells between one-sign cells is a stretch where g is strictly monotone,
 * which holds exactly one zero when g has opposite signs at its ends and none otherwise. The
 * sign at an end of a stretch is the sign of the neighbouring one-sign cell, or the sign of g at
 * the end of the search interval. So every zero on the closed search interval is counted
 * exactly once; no sign is ever needed at an inner cell boundary, and a zero lying exactly on
 * one costs nothing extra. Cell widths come from the local scale of the equation (the step
 * length heuristic of {@link Continuation}: about 1/(1 + √|P0/P2| + |P1/P2|), at most half the
 * convergence radius), so an oscillatory zero far out costs a few cells.
 *
 * <p><b>Refinement.</b> With L a lower bound of |g'| on the stretch (from its cells), every
 * rational c gives z ∈ c ± |g(c)|/L, or the side of z from the sign of g(c). Then interval
 * Newton (Moore 1966): with c inside the bracket X and G' an enclosure of g' over X,
 * z ∈ c − g(c)/G' (mean value theorem), so X ∩ (c − g(c)/G') still holds z and shrinks
 * quadratically. g(c) and G' come from the Taylor series at a cell start of the stretch (a
 * short step from the walk's own state, never a new walk from the normalization point). The
 * iteration stops when every point of X rounds to the same entry and the other columns,
 * enclosed over X, decide too (Ziv, docs/methods.md §5); when X stops shrinking the precision is
 * doubled, the state at that cell start being recomputed from the normalization point, up to
 * the table's cap (then {@link PrecisionCapException}, naming the zero).
 *
 * <p><b>Exact zeros.</b> A ball of g with radius 0 and midpoint 0 proves a zero at that
 * rational point: at the normalization point when the normalization value is exactly 0, and
 * anywhere for a polynomial solution (exact arithmetic; the simplest rational in the bracket
 * is tried). Such a row carries its exact x. A rational zero of a non-polynomial solution away
 * from its normalization point can only be enclosed: it is decided when the enclosure rounds
 * to one entry, and otherwise the build stops with exit 3 rather than guess.
 */
public final class ZeroFinder {
    /** How often one cell may be halved before the precision is blamed (a heuristic choice). */
    private static final int MAX_HALVINGS = 24;

    private final TableDef table;
    private final TableKind.Zeros search;
    private final FunctionDef f;
    private final Equation reduced;
    private final Poly poly;
    private final Poly gPoly;
    private final int order;
    private final int direction;
    private final String gName;
    private int precBits;
    private int maxPrecBits;
    private int cells;
    private int halvings;
    private int exactZeros;
    /** Set when the walk's state should be recomputed from the normalization point at the current precision. */
    private boolean stale;
    private BigDecimal maxRelative = BigDecimal.ZERO;
    private final List<TableResult.Row> rows = new ArrayList<>();

    /** A cell: g of one sign on it (sign = that of g), or g strictly monotone (sign = that of g', slope bounds |g'| below). */
    private record Cell(Rational a, Rational b, LocalExpansion local, boolean monotone, int sign, BigDecimal slope) {
    }

    private ZeroFinder(TableDef t, TableKind.Zeros z) {
        this.table = t;
        this.search = z;
        this.f = t.function();
        this.reduced = f.equation().reduced();
        this.poly = FunctionEvaluator.polynomial(f).orElse(null);
        this.order = z.ofDerivative() ? 1 : 0;
        this.gPoly = poly == null ? null : z.ofDerivative() ? poly.derivative() : poly;
        this.direction = z.to().compareTo(z.from());
        this.gName = z.ofDerivative() ? "y'" : "y";
        this.precBits = PrecisionLoop.chooseStartBits(t.format());
        this.maxPrecBits = precBits;
    }

    /**
     * Rigorous: the zeros met walking from the search's {@code from} to its {@code to} (both
     * ends included), the first {@code count} of them when a count is given, each row
     * correctly rounded (class comment).
     *
     * @throws PrecisionCapException when the precision cap cannot isolate or decide a zero
     * @throws OutOfRangeException when the search holds no zero, fewer than
     *     {@code count}, or g vanishes identically; or an entry is out of a fixed-point range
     */
    public static TableResult find(TableDef t, TableKind.Zeros z) throws ExprException, PrecisionCapException,
            OutOfRangeException {
        return new ZeroFinder(t, z).walk();
    }

    private TableResult walk() throws ExprException, PrecisionCapException, OutOfRangeException {
        Rational from = search.from();
        Rational to = search.to();
        if (gPoly != null && gPoly.isZero()) {
            throw new OutOfRangeException("table " + table.name() + ": " + gName + " of " + f.name()
                    + " vanishes identically, so every point is a zero; a zeros table needs isolated zeros");
        }
        if (poly == null) {
            RealPath.checkPath(reduced, f.equation(), from, to);
        }
        LocalExpansion here = start(from);
        int signBefore = endSign(here, "start");
        if (signBefore == 0) {
            addExact(from);
        }
        List<Cell> stretch = new ArrayList<>();
        Rational a = from;
        Rational reached = from;
        boolean fresh = true;
        while (!a.equals(to) && !done()) {
            if (stale) {
                // a refinement found the walk's state too wide here, or raised the precision
                here = start(a);
                fresh = true;
                stale = false;
            }
            Rational b = next(a, here);
            List<Cell> pieces = new ArrayList<>();
            try {
                classify(here, a, b, 0, pieces);
            } catch (NeedsPrecision e) {
                if (fresh) {
                    precBits = higher(precBits, "isolate the zeros of " + gName + " near x = " + e.near.toDecimalOrFraction()
                            + ": a multiple zero, or zeros closer than the enclosures can separate");
                }
                // first the state anew from the normalization point (a long walk widens it), then more precision
                here = start(a);
                fresh = true;
                continue;
            }
            for (Cell c : pieces) {
                cells++;
                if (c.monotone()) {
                    stretch.add(c);
                } else {
                    if (!stretch.isEmpty()) {
                        close(stretch, signBefore, c.sign());
                        stretch = new ArrayList<>();
                    }
                    signBefore = c.sign();
                }
                reached = c.b();
                if (done()) {
                    break;
                }
            }
            Cell last = pieces.get(pieces.size() - 1);
            fresh = b.equals(f.at());
            here = fresh ? start(b) : last.local().shift(b.subtract(last.local().center()));
            a = b;
        }
        if (!done() && !stretch.isEmpty()) {
            close(stretch, signBefore, endSign(here, "end"));
        }
        String where = "[" + from.min(to).toDecimalOrFraction() + ", " + from.max(to).toDecimalOrFraction() + "]";
        if (rows.isEmpty()) {
            throw new OutOfRangeException("table " + table.name() + ": " + gName + " has no zero on " + where
                    + " (proven: " + cells + " cells, each with " + gName + " of one sign or strictly monotone); widen 'search'");
        }
        if (search.count() > rows.size()) {
            throw new OutOfRangeException("table " + table.name() + ": " + gName + " has only " + rows.size()
                    + " zero(s) on " + where + " but count = " + search.count() + "; widen 'search' or lower 'count'");
        }
        return new TableResult(table, rows, maxRelative, maxPrecBits, proof(where, reached));
    }

    private boolean done() {
        return search.count() > 0 && rows.size() >= search.count();
    }

    private String proof(String where, Rational stop) {
        String found = !stop.equals(search.to())
                ? rows.size() + " found walking from " + search.from().toDecimalOrFraction() + " toward " + search.to().toDecimalOrFraction()
                        + ", the walk stopping at x = " + stop.toDecimalOrFraction() + " after the " + rows.size() + " asked"
                : rows.size() + " found on " + where + ", walking from " + search.from().toDecimalOrFraction();
        String dg = order == 0 ? "y'" : "y''";
        return "zeros: " + found + (exactZeros > 0 ? " (" + exactZeros + " exact, by exact evaluation)" : "")
                + "; isolation: " + cells + " cells (" + halvings + " halvings), on each a Taylor enclosure over the whole cell proves "
                + gName + " of one sign or " + dg + " of one sign, so each stretch of cells with " + dg
                + " of one sign holds one zero exactly when " + gName + " has opposite signs at its ends, none otherwise"
                + "; refinement: interval Newton (Moore 1966) until every point of the enclosure rounds to the entry";
    }

    // ---- isolation ------------------------------------------------------------------------

    /** The expansion at x from the normalization point (exact there; exact everywhere for polynomials). */
    private LocalExpansion start(Rational x) throws ExprException {
        return expansionAt(x, precBits);
    }

    /**
     * The expansion at x at the given precision: the normalization state, carried to x by the
     * walker in steps of the local cell width ({@link Continuation#walk} with
     * {@link StepChooser.Use#ZERO_CELL}, whose error bound does not suffer the wrapping effect);
     * exact for polynomials.
     */
    private LocalExpansion expansionAt(Rational x, int bits) throws ExprException {
        if (poly != null) {
            return LocalExpansion.polynomial(poly, x, bits);
        }
        Start start = Start.of(f);
        RealPath.checkPath(reduced, f.equation(), start.point(), x);
        if (x.equals(start.point())) {
            return LocalExpansion.series(reduced, x, start.jet(bits), bits);
        }
        CarriedState origin = Continuation.begin(start, bits);
        return LocalExpansion.series(reduced, Continuation.walk(f.equation(), origin, x, bits, StepChooser.Use.ZERO_CELL).state(), bits);
    }

    /**
     * The sign of g at an end of the search interval, 0 for a proven exact zero; raises the
     * precision (from the normalization point) while the enclosure contains 0 but is not exact.
     */
    private int endSign(LocalExpansion here, String which) throws ExprException, PrecisionCapException {
        Ball g = g(here.at(Rational.ZERO));
        int bits = here.precBits();
        boolean fresh = false;
        while (g.containsZero() && !isExactZero(g)) {
            if (fresh) {
                bits = higher(bits, "decide the sign of " + gName + " at the " + which + " of the search, x = "
                        + here.center().toDecimalOrFraction() + ": it may vanish there (an exact zero is proven only for polynomials"
                        + " and at the normalization point; move the " + which + " of 'search')");
            }
            fresh = true;
            g = g(expansionAt(here.center(), bits).at(Rational.ZERO));
        }
        return isExactZero(g) ? 0 : g.mid().signum();
    }

    /** The end of the cell that starts at a: a power of two from the local scale, cut at the normalization point and the end. */
    private Rational next(Rational a, LocalExpansion here) {
        double target = poly != null
                ? Math.abs(search.to().subtract(search.from()).doubleEstimate()) / (4.0 * (poly.degree() + 1))
                : here.cellWidthEstimate();
        Rational h = StepChooser.powerOfTwoBelow(target);
        Rational remaining = search.to().subtract(a);
        Rational b = remaining.abs().compareTo(h) <= 0 ? search.to() : a.add(direction > 0 ? h : h.negate());
        Rational at = f.at();
        if (poly == null && at.compareTo(a.min(b)) > 0 && at.compareTo(a.max(b)) < 0) {
            b = at;
        }
        return b;
    }

    /** Appends, in walking order, the cells that [a, b] splits into; {@code local} is centered at a. */
    private void classify(LocalExpansion local, Rational a, Rational b, int depth, List<Cell> out) {
        LocalExpansion.Range r;
        try {
            r = local.over(local.steps(a, b));
        } catch (LocalSeries.StepTooLongException e) {
            r = null;
        }
        if (r != null) {
            Ball g = r.order(order);
            if (!g.containsZero()) {
                out.add(new Cell(a, b, local, false, g.mid().signum(), null));
                return;
            }
            Ball dg = r.order(order + 1);
            if (dg != null && !dg.containsZero()) {
                out.add(new Cell(a, b, local, true, dg.mid().signum(), dg.absLower()));
                return;
            }
        }
        LocalExpansion.Range here = local.over(Ball.ZERO);
        Ball dgHere = here.order(order + 1);
        if (depth >= MAX_HALVINGS || here.order(order).containsZero() && (dgHere == null || dgHere.containsZero())) {
            // neither the cell nor its start can be decided: halving cannot help, precision can
            throw new NeedsPrecision(a);
        }
        halvings++;
        Rational m = a.add(b).divide(Rational.TWO);
        classify(local, a, m, depth + 1, out);
        classify(local.shift(m.subtract(a)), m, b, depth + 1, out);
    }

    /** A cell that this precision cannot decide. */
    private static final class NeedsPrecision extends RuntimeException {
        private static final long serialVersionUID = 1L;
        private final transient Rational near;

        NeedsPrecision(Rational near) {
            super(null, null, false, false);
            this.near = near;
        }
    }

    /** Twice the precision, at most the cap ({@link PrecisionLoop#raise}); at the cap, the table cannot be decided. */
    private int higher(int bits, String what) throws PrecisionCapException {
        int next = PrecisionLoop.raise(bits, table.capBits(), () -> "table " + table.name() + ": the precision cap of "
                + table.capBits() + " bits cannot " + what + " (raise precision_cap_bits)");
        maxPrecBits = Math.max(maxPrecBits, next);
        return next;
    }

    // ---- one stretch where g is monotone ----------------------------------------------------

    /** The zero of a finished stretch, if its end signs say there is one (0 marks an exact zero at an end of the search). */
    private void close(List<Cell> stretch, int signStart, int signEnd) throws ExprException, PrecisionCapException,
            OutOfRangeException {
        if (signStart == 0 || done()) {
            return;
        }
        if (signEnd == 0) {
            addExact(stretch.get(stretch.size() - 1).b());
        } else if (signStart != signEnd) {
            refine(stretch, signStart);
        }
    }

    private void refine(List<Cell> stretch, int signStart) throws ExprException, PrecisionCapException,
            OutOfRangeException {
        Rational first = stretch.get(0).a();
        Rational last = stretch.get(stretch.size() - 1).b();
        Bracket x = new Bracket(first.min(last), first.max(last), direction > 0 ? signStart : -signStart, slopeBound(stretch));
        for (int i = 1; i < stretch.size(); i++) {
            Cell c = stretch.get(i);
            Ball gc = g(c.local().at(Rational.ZERO));
            if (isExactZero(gc)) {
                addExact(c.a());
                return;
            }
            x.narrow(c.a(), gc);
        }
        Rational mid = x.lo.add(x.hi).divide(Rational.TWO);
        LocalExpansion local = stretch.get(0).local();
        for (Cell c : stretch) {
            if (mid.compareTo(c.a().min(c.b())) >= 0 && mid.compareTo(c.a().max(c.b())) <= 0) {
                local = c.local();
            }
        }
        newton(x, local);
    }

    /** The smallest of the cells' lower bounds of |g'|, all positive. */
    private static BigDecimal slopeBound(List<Cell> stretch) {
        BigDecimal s = stretch.get(0).slope();
        for (Cell c : stretch) {
            s = s.min(c.slope());
        }
        return s;
    }

    /** [lo, hi] holding the only zero z of g there, g of sign {@code below} left of z, |g'| &gt;= slope on it. */
    private static final class Bracket {
        Rational lo;
        Rational hi;
        final int below;
        final BigDecimal slope;

        Bracket(Rational lo, Rational hi, int below, BigDecimal slope) {
            this.lo = lo;
            this.hi = hi;
            this.below = below;
            this.slope = slope;
        }

        /** Uses g(c) ∋ gc: its sign tells the side of z; else |c − z| &lt;= |g(c)| / slope (mean value theorem). */
        void narrow(Rational c, Ball gc) {
            if (!gc.containsZero()) {
                if (gc.mid().signum() == below) {
                    lo = lo.max(c);
                } else {
                    hi = hi.min(c);
                }
                return;
            }
            Rational r = Rational.of(Directed.divUp(gc.absUpper(), slope));
            lo = lo.max(c.subtract(r));
            hi = hi.min(c.add(r));
        }

        /** Intersects with the ball n. */
        void intersect(Ball n) {
            lo = lo.max(Rational.of(n.lower()));
            hi = hi.min(Rational.of(n.upper()));
        }

        Rational width() {
            return hi.subtract(lo);
        }
    }

    /** Interval Newton steps on x with the series at {@code local}, raising the precision when x stops shrinking. */
    private void newton(Bracket x, LocalExpansion local) throws ExprException, PrecisionCapException,
            OutOfRangeException {
        LocalExpansion loc = local;
        boolean fresh = false;
        while (true) {
            Rational width = x.width();
            LocalExpansion.Range over = overOrNull(loc, x.lo, x.hi);
            Entry lo = round(x.lo);
            if (over != null && lo.equals(round(x.hi))) {
                Optional<List<Entry>> entries = otherColumns(lo, over, x.lo);
                if (entries.isPresent()) {
                    maxRelative = maxRelative.max(relative(x)).max(relativeOfColumns(over));
                    rows.add(new TableResult.Row(x.lo.equals(x.hi) ? x.lo : null, entries.get()));
                    return;
                }
            }
            if (gPoly != null) {
                Rational q = simplest(x.lo, x.hi);
                if (q.denominator().bitLength() <= 256 && gPoly.evaluate(q).isZero()) {
                    addExact(q);
                    return;
                }
            }
            Rational c = inside(x.lo, x.hi);
            Ball gc = g(loc.at(c.subtract(loc.center())));
            if (isExactZero(gc)) {
                addExact(c);
                return;
            }
            x.narrow(c, gc);
            Ball dg = over == null ? null : over.order(order + 1);
            if (dg != null && !dg.containsZero()) {
                int p = loc.precBits();
                x.intersect(Ball.of(c, p + 20).subtract(gc.divide(dg, p), p));
            }
            if (x.lo.compareTo(x.hi) > 0) {
                throw new IllegalStateException("interval Newton lost the zero of " + gName + " near x = " + c.toDecimalOrFraction());
            }
            if (x.width().multiply(4).compareTo(width.multiply(3)) > 0) {
                // x stopped shrinking: first the state anew from the normalization point, then more precision (Ziv)
                int bits = fresh ? higher(loc.precBits(), "decide the zero of " + gName + " near x = " + approx(x)) : loc.precBits();
                loc = expansionAt(loc.center(), bits);
                fresh = true;
                stale = true;
                precBits = Math.max(precBits, bits);
            }
        }
    }

    private static LocalExpansion.Range overOrNull(LocalExpansion loc, Rational lo, Rational hi) {
        try {
            return loc.over(loc.steps(lo, hi));
        } catch (LocalSeries.StepTooLongException e) {
            return null;
        }
    }

    /** The entries of the row whose x entry is {@code xEntry}, with the other columns enclosed in {@code over}; empty if one is undecided. */
    private Optional<List<Entry>> otherColumns(Entry xEntry, LocalExpansion.Range over, Rational near)
            throws OutOfRangeException {
        List<Entry> entries = new ArrayList<>();
        for (Column col : table.columns()) {
            Entry e;
            if (col.isPoint()) {
                e = xEntry;
            } else if (col.order() == order) {
                e = round(Rational.ZERO);
            } else {
                Optional<Entry> d = Rounding.decide(over.order(col.order()), table.target());
                if (d.isEmpty()) {
                    return Optional.empty();
                }
                e = d.get();
            }
            entries.add(checked(col, e, near));
        }
        return Optional.of(entries);
    }

    /** Records the zero at the rational q, proven exact; the other columns by the precision loop of {@link FunctionEvaluator#entry}. */
    private void addExact(Rational q) throws ExprException, PrecisionCapException,
            OutOfRangeException {
        List<Entry> entries = new ArrayList<>();
        for (Column col : table.columns()) {
            Entry e;
            if (col.isPoint()) {
                e = round(q);
            } else if (col.order() == order) {
                e = round(Rational.ZERO);
            } else {
                try {
                    FunctionEvaluator.Decided d = FunctionEvaluator.entry(f, q, col.order() == 1, table.target(), table.capBits());
                    maxPrecBits = Math.max(maxPrecBits, d.precBits());
                    e = d.entry();
                } catch (PrecisionCapException ex) {
                    throw new PrecisionCapException("table " + table.name() + ": the precision cap of " + table.capBits()
                            + " bits cannot decide the " + col.name() + " at the zero x = " + q.toDecimalOrFraction()
                            + " (raise precision_cap_bits)", table.capBits());
                }
            }
            entries.add(checked(col, e, q));
        }
        exactZeros++;
        rows.add(new TableResult.Row(q, entries));
    }

    private Entry checked(Column col, Entry e, Rational near) throws OutOfRangeException {
        if (e.kind() == Entry.Kind.OUT_OF_RANGE) {
            throw new OutOfRangeException("table " + table.name() + ": the " + col.name() + " at the zero near x = "
                    + approxOf(near) + " lies outside the range of " + table.format().name()
                    + " (out_of_range = \"error\"; choose a wider format or out_of_range = \"saturate\")");
        }
        return e;
    }

    // ---- small helpers ----------------------------------------------------------------------

    private Ball g(Jet j) {
        return order == 0 ? j.value() : j.derivative();
    }

    private Entry round(Rational v) {
        return Rounding.round(v, table.target());
    }

    private static boolean isExactZero(Ball b) {
        return b.isExact() && b.mid().signum() == 0;
    }

    /** A short decimal inside [lo, hi] within a sixteenth of the width from the midpoint (the midpoint itself when none is found). */
    static Rational inside(Rational lo, Rational hi) {
        Rational mid = lo.add(hi).divide(Rational.TWO);
        Rational w = hi.subtract(lo);
        if (w.isZero() || mid.isZero()) {
            return mid;
        }
        BigDecimal wd = w.toBigDecimal(MathContext.DECIMAL32);
        BigDecimal md = mid.toBigDecimal(MathContext.DECIMAL32);
        int digits = Math.max(1, (md.precision() - md.scale()) - (wd.precision() - wd.scale()) + 3);
        Rational c = Rational.of(mid.toBigDecimal(new MathContext(digits)));
        return c.subtract(mid).abs().multiply(16).compareTo(w) <= 0 ? c : mid;
    }

    /**
     * Exact: the rational of smallest denominator in [lo, hi] (the smallest in absolute value
     * among those), by continued fractions: an integer in the interval if there is one, else
     * floor(lo) + 1 / (the simplest in [1/(hi − floor lo), 1/(lo − floor lo)]).
     */
    static Rational simplest(Rational lo, Rational hi) {
        if (lo.signum() <= 0 && hi.signum() >= 0) {
            return Rational.ZERO;
        }
        if (hi.signum() < 0) {
            return simplest(hi.negate(), lo.negate()).negate();
        }
        Rational floor = Rational.of(lo.floor());
        if (floor.equals(lo)) {
            return lo;
        }
        Rational up = floor.add(Rational.ONE);
        if (up.compareTo(hi) <= 0) {
            return up;
        }
        return floor.add(simplest(hi.subtract(floor).reciprocal(), lo.subtract(floor).reciprocal()).reciprocal());
    }

    private static String approx(Bracket x) {
        return approxOf(x.lo.add(x.hi).divide(Rational.TWO));
    }

    private static String approxOf(Rational v) {
        BigDecimal d = v.toBigDecimalExact();
        return d != null && d.precision() <= 20 ? v.toDecimalOrFraction() : v.toBigDecimal(new MathContext(17)).toPlainString();
    }

    /** The half-width of x relative to its smallest |point| (the width when x contains 0). */
    private static BigDecimal relative(Bracket x) {
        BigDecimal half = Directed.absUp(x.width().divide(Rational.TWO));
        if (x.lo.signum() <= 0 && x.hi.signum() >= 0) {
            return half;
        }
        return Directed.divUp(half, Directed.absDown(x.lo.abs().min(x.hi.abs())));
    }

    private BigDecimal relativeOfColumns(LocalExpansion.Range over) {
        BigDecimal r = BigDecimal.ZERO;
        for (Column col : table.columns()) {
            if (!col.isPoint() && col.order() != order) {
                Ball b = over.order(col.order());
                BigDecimal low = b.absLower();
                r = r.max(low.signum() > 0 ? Directed.divUp(b.rad(), low) : b.rad());
            }
        }
        return r;
    }
}
