package dev.odetab.tables;

import dev.odetab.expr.ExprException;
import dev.odetab.numeric.Ball;
import dev.odetab.numeric.Entry;
import dev.odetab.numeric.Rational;
import dev.odetab.numeric.Rounding;
import dev.odetab.ode.Equation;
import dev.odetab.ode.FunctionDef;
import dev.odetab.series.Continuation;
import dev.odetab.series.FunctionEvaluator;
import dev.odetab.series.Jet;
import dev.odetab.series.LocalSeries;
import dev.odetab.series.Recurrence;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Certified zeros of a solution (or of its derivative) and their correctly rounded values.
 *
 * <p>Trust level: Rigorous (METHODS §6). Isolation: the search interval is cut into cells
 * (width 1/16, halved where needed). On a cell [a, b] with center m and half-width r, the
 * Taylor series at m evaluated over the ball [m − r, m + r] (ball Horner plus the tail bound
 * of METHODS §2) encloses g and g' over the whole cell (g = y, or g = y' with
 * g' = y'' = −(P1 y' + P0 y)/P2 from the equation). If the enclosure of g excludes 0 the cell has
 * no zero; if that of g' excludes 0, g is strictly monotone there and has a zero exactly when
 * its signs at a and b (proven from enclosures) differ; otherwise the cell is halved. So every
 * zero is found exactly once, and a double zero or a pair closer than the smallest cell is
 * reported, never passed over. Refinement: bisection at exact rational points keeps a
 * bracket with proven opposite signs until every point of the bracket rounds to the same
 * entry (so the zero's entry is decided, METHODS §5); the other columns are enclosed over the
 * bracket and rounded the same way.
 */
final class ZeroFinder {
    private static final Rational CELL = Rational.of(1, 16);
    private static final int MAX_DEPTH = 16;

    private ZeroFinder() {
    }

    /** A zero: exactly known, or bracketed by a &lt; b with g(a) g(b) &lt; 0 and g monotone on [a, b]. */
    private record Bracket(Rational a, Rational b, Rational exact) {
    }

    /** Rigorous: the zeros met walking the search interval, each row correctly rounded (class comment). */
    static TableResult find(TableDef t, Grid.ZeroSearch z) throws ExprException, TableEvaluator.UndecidedException,
            TableEvaluator.OutOfRangeException {
        FunctionDef f = t.function();
        int prec = TableEvaluator.startBits(t.format()) + 24;
        List<Bracket> zeros = isolate(f, z, prec, t);
        List<TableResult.Row> rows = new ArrayList<>();
        BigDecimal maxRel = BigDecimal.ZERO;
        int maxPrec = 0;
        for (Bracket br : zeros) {
            Refined r = refine(f, z, br, t, prec);
            rows.add(new TableResult.Row(br.exact(), r.entries()));
            maxRel = maxRel.max(r.maxRelative());
            maxPrec = Math.max(maxPrec, r.precBits());
        }
        return new TableResult(t, rows, maxRel, maxPrec);
    }

    private static Ball g(Jet jet, boolean ofDerivative) {
        return ofDerivative ? jet.derivative() : jet.value();
    }

    /** Enclosures of g and g' over the whole cell with center m and half-width r. */
    private static Ball[] cellRange(FunctionDef f, Rational m, Jet atM, Rational r, boolean ofDerivative, int prec) {
        Equation eq = f.equation().reduced();
        Ball cell = Ball.of(BigDecimal.ZERO, Rational.of(r.numerator(), r.denominator()).toBigDecimal(new java.math.MathContext(20, java.math.RoundingMode.CEILING)));
        Jet range = LocalSeries.sum(new Recurrence(eq, m), atM.value(), atM.derivative(), cell, 4 * prec + 2000, prec).jet();
        if (!ofDerivative) {
            return new Ball[] {range.value(), range.derivative()};
        }
        Ball x = cell.add(Ball.of(m, prec), prec);
        Ball p2 = eq.p2().evaluate(x, prec);
        if (p2.containsZero()) {
            return new Ball[] {range.derivative(), Ball.of(BigDecimal.ZERO, BigDecimal.valueOf(Long.MAX_VALUE))};
        }
        Ball second = eq.p1().evaluate(x, prec).multiply(range.derivative(), prec)
                .add(eq.p0().evaluate(x, prec).multiply(range.value(), prec), prec).divide(p2, prec).negate();
        return new Ball[] {range.derivative(), second};
    }

    private static List<Bracket> isolate(FunctionDef f, Grid.ZeroSearch z, int prec, TableDef t)
            throws ExprException, TableEvaluator.UndecidedException {
        Equation eq = f.equation();
        int dir = z.to().compareTo(z.from());
        List<Bracket> found = new ArrayList<>();
        Rational a = z.from();
        Jet ja = FunctionEvaluator.enclose(f, a, prec).jet();
        if (isExactZero(g(ja, z.ofDerivative()))) {
            found.add(new Bracket(a, a, a));
        }
        while (!a.equals(z.to()) && (z.count() == 0 || found.size() < z.count())) {
            Rational step = CELL.multiply(Rational.of(dir));
            Rational b = (z.to().subtract(a)).abs().compareTo(CELL) <= 0 ? z.to() : a.add(step);
            if (strictlyBetween(f.at(), a, b)) {
                // the normalization point is a cell boundary: its values are known exactly there
                b = f.at();
            }
            Jet jb = b.equals(f.at()) ? FunctionEvaluator.enclose(f, b, prec).jet() : Continuation.evaluate(eq, a, ja, b, prec).jet();
            List<Bracket> inCell = new ArrayList<>();
            try {
                cell(f, z, a, ja, b, jb, 0, prec, inCell, t);
            } catch (NeedsPrecision e) {
                // the enclosures are too wide to decide this cell: start again from the
                // normalization point at twice the precision (radii grow along a long walk)
                if (2 * prec > t.capBits()) {
                    throw new TableEvaluator.UndecidedException("table " + t.name() + ": the precision cap of " + t.capBits()
                            + " bits cannot isolate the zeros near x = " + e.near.toDecimalOrFraction()
                            + ": a multiple zero, or zeros closer than the enclosures can separate (raise precision_cap_bits)");
                }
                prec *= 2;
                ja = FunctionEvaluator.enclose(f, a, prec).jet();
                continue;
            }
            found.addAll(inCell);
            a = b;
            ja = jb;
        }
        return z.count() > 0 && found.size() > z.count() ? found.subList(0, z.count()) : found;
    }

    private static boolean strictlyBetween(Rational x, Rational a, Rational b) {
        return x.compareTo(a.min(b)) > 0 && x.compareTo(a.max(b)) < 0;
    }

    private static boolean isExactZero(Ball b) {
        return b.isExact() && b.mid().signum() == 0;
    }

    /** Appends, in walking order, the zeros in the half-open cell (a, b] (a's own zero was recorded before). */
    private static void cell(FunctionDef f, Grid.ZeroSearch z, Rational a, Jet ja, Rational b, Jet jb, int depth, int prec,
            List<Bracket> found, TableDef t) {
        Ball ga = g(ja, z.ofDerivative());
        Ball gb = g(jb, z.ofDerivative());
        Rational m = a.add(b).divide(Rational.TWO);
        Jet jm = Continuation.evaluate(f.equation(), a, ja, m, prec).jet();
        Ball[] range = cellRange(f, m, jm, b.subtract(a).abs().divide(Rational.TWO), z.ofDerivative(), prec);
        if (!range[0].containsZero()) {
            return;
        }
        boolean endsDecided = (!ga.containsZero() || isExactZero(ga)) && (!gb.containsZero() || isExactZero(gb));
        if (!range[1].containsZero() && endsDecided) {
            if (isExactZero(gb)) {
                found.add(new Bracket(b, b, b));
            } else if (!isExactZero(ga) && ga.mid().signum() != gb.mid().signum()) {
                found.add(a.compareTo(b) < 0 ? new Bracket(a, b, null) : new Bracket(b, a, null));
            }
            return;
        }
        if (depth >= MAX_DEPTH) {
            throw new NeedsPrecision(m);
        }
        cell(f, z, a, ja, m, jm, depth + 1, prec, found, t);
        cell(f, z, m, jm, b, jb, depth + 1, prec, found, t);
    }

    /** A cell that cannot be decided at this precision (halving it further does not help). */
    private static final class NeedsPrecision extends RuntimeException {
        private static final long serialVersionUID = 1L;
        private final transient Rational near;

        NeedsPrecision(Rational near) {
            super(null, null, false, false);
            this.near = near;
        }
    }

    private record Refined(List<Entry> entries, BigDecimal maxRelative, int precBits) {
    }

    private static Refined refine(FunctionDef f, Grid.ZeroSearch z, Bracket br, TableDef t, int startPrec)
            throws ExprException, TableEvaluator.UndecidedException, TableEvaluator.OutOfRangeException {
        Rational a = br.a();
        Rational b = br.b();
        int prec = startPrec;
        Jet ja = FunctionEvaluator.enclose(f, a, prec).jet();
        int sa = g(ja, z.ofDerivative()).mid().signum();
        while (true) {
            // the cheap exact test first: only once the bracket's ends round alike are the other columns enclosed
            boolean xDecided = br.exact() != null || Rounding.round(a, t.format(), t.rounding(), t.outOfRange())
                    .equals(Rounding.round(b, t.format(), t.rounding(), t.outOfRange()));
            Optional<List<Entry>> done = xDecided ? decide(f, z, br.exact(), a, ja, b, t, prec) : Optional.empty();
            if (done.isPresent()) {
                return new Refined(done.get(), BigDecimal.ZERO, prec);
            }
            if (br.exact() != null) {
                prec *= 2;
                if (prec > t.capBits()) {
                    throw undecided(t, a);
                }
                ja = FunctionEvaluator.enclose(f, a, prec).jet();
                continue;
            }
            Rational m = a.add(b).divide(Rational.TWO);
            Ball gm = g(Continuation.evaluate(f.equation(), a, ja, m, prec).jet(), z.ofDerivative());
            while (gm.containsZero()) {
                prec *= 2;
                if (prec > t.capBits()) {
                    throw undecided(t, m);
                }
                ja = FunctionEvaluator.enclose(f, a, prec).jet();
                gm = g(Continuation.evaluate(f.equation(), a, ja, m, prec).jet(), z.ofDerivative());
            }
            if (gm.mid().signum() == sa) {
                ja = Continuation.evaluate(f.equation(), a, ja, m, prec).jet();
                a = m;
            } else {
                b = m;
            }
        }
    }

    private static TableEvaluator.UndecidedException undecided(TableDef t, Rational near) {
        return new TableEvaluator.UndecidedException("table " + t.name() + ": the precision cap of " + t.capBits()
                + " bits cannot decide the zero near x = " + near.toDecimalOrFraction() + " (raise precision_cap_bits)");
    }

    /** The row's entries when every point of [a, b] gives the same entries, else empty. */
    private static Optional<List<Entry>> decide(FunctionDef f, Grid.ZeroSearch z, Rational exact, Rational a, Jet ja,
            Rational b, TableDef t, int prec) throws TableEvaluator.OutOfRangeException {
        Ball xBall = exact != null ? Ball.of(exact, prec) : Ball.fromEndpoints(a.toBigDecimal(new java.math.MathContext(60)), b.toBigDecimal(new java.math.MathContext(60)));
        Jet over;
        if (exact != null) {
            over = ja;
        } else {
            Rational half = b.subtract(a).divide(Rational.TWO);
            Rational m = a.add(half);
            Jet jm = Continuation.evaluate(f.equation(), a, ja, m, prec).jet();
            Ball cell = Ball.of(BigDecimal.ZERO, half.toBigDecimal(new java.math.MathContext(20, java.math.RoundingMode.CEILING)));
            over = LocalSeries.sum(new Recurrence(f.equation().reduced(), m), jm.value(), jm.derivative(), cell, 4 * prec + 2000, prec).jet();
        }
        List<Entry> entries = new ArrayList<>();
        for (Column c : t.columns()) {
            Optional<Entry> e;
            if (c.isPoint()) {
                if (exact != null) {
                    e = Optional.of(Rounding.round(exact, t.format(), t.rounding(), t.outOfRange()));
                } else {
                    Entry lo = Rounding.round(a, t.format(), t.rounding(), t.outOfRange());
                    Entry hi = Rounding.round(b, t.format(), t.rounding(), t.outOfRange());
                    e = lo.equals(hi) ? Optional.of(lo) : Optional.empty();
                }
            } else {
                Ball v = c.order() == 0 ? over.value() : over.derivative();
                if (c.order() == (z.ofDerivative() ? 1 : 0)) {
                    // the searched quantity is zero at the zero itself
                    v = Ball.ZERO;
                }
                e = Rounding.decide(v, t.format(), t.rounding(), t.outOfRange());
            }
            if (e.isEmpty()) {
                return Optional.empty();
            }
            if (e.get().kind() == Entry.Kind.OUT_OF_RANGE) {
                throw new TableEvaluator.OutOfRangeException("table " + t.name() + ": the " + c.name() + " at the zero near x = "
                        + a.toDecimalOrFraction() + " lies outside the range of " + t.format().name());
            }
            entries.add(e.get());
        }
        return Optional.of(entries);
    }
}
