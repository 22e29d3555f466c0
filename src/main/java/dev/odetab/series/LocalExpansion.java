package dev.odetab.series;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.Ball;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import dev.odetab.series.CarriedState;
import dev.odetab.series.Jet;
import dev.odetab.series.LocalSeries;
import dev.odetab.series.Recurrence;

/**
 * A solution near an exact rational center c: its values at c + t for rational t, and
 * enclosures of y, y', y'' over every point c + t with t in a ball. The zero search
 * ({@link ZeroFinder}) walks with one of these per cell and refines each zero with the one
 * nearest to it.
 *
 * <p>Trust level: Rigorous. Every returned ball contains the exact quantity: the series form
 * sums the Taylor series at c from balls containing y(c), y'(c) with the proven tail of
 * docs/methods.md §2 ({@link LocalSeries}); the polynomial form evaluates the exactly shifted
 * polynomial p(c + t). y'' comes from the equation, y'' = −(P1 y' + P0 y)/P2 (reduced
 * equation), evaluated in ball arithmetic over the same ball of x; it is null where that ball
 * of P2 contains 0 (the cell reaches a singular point), which callers treat as "not proven".
 */
public abstract sealed class LocalExpansion {
    private final Rational center;
    private final int precBits;

    private LocalExpansion(Rational center, int precBits) {
        this.center = center;
        this.precBits = precBits;
    }

    /** Enclosures of y, y' and y'' (y'' null when the equation cannot give it there) over a set of points. */
    public record Range(Ball value, Ball derivative, Ball second) {
        /** The enclosure of y^(k), k = 0, 1, 2. */
        public Ball order(int k) {
            return k == 0 ? value : k == 1 ? derivative : second;
        }
    }

    /** The series of a non-polynomial solution at {@code center}, whose y(c), y'(c) lie in {@code state}. */
    public static LocalExpansion series(Equation reduced, Rational center, Jet state, int precBits) {
        return new Series(reduced, center, state, precBits);
    }

    /** The series of a non-polynomial solution at the state's point, summed from the state's balls. */
    public static LocalExpansion series(Equation reduced, CarriedState state, int precBits) {
        return new Series(reduced, state.jet(), state, precBits);
    }

    /** The exact polynomial solution {@code p}, expanded at {@code center}. */
    public static LocalExpansion polynomial(Poly p, Rational center, int precBits) {
        return new Polynomial(p, center, precBits);
    }

    public Rational center() {
        return center;
    }

    public int precBits() {
        return precBits;
    }

    /**
     * Rigorous: balls containing y(c + t) and y'(c + t).
     *
     * @throws LocalSeries.StepTooLongException when t lies outside the disk where the series
     *     tail can be bounded (the caller takes a shorter step)
     */
    public abstract Jet at(Rational t);

    /**
     * Rigorous: enclosures of y, y', y'' at every point c + t, t in {@code t} (Horner's rule
     * in ball arithmetic plus the tail bound; an overestimate that shrinks with the ball).
     *
     * @throws LocalSeries.StepTooLongException as for {@link #at}
     */
    public abstract Range over(Ball t);

    /** The same solution expanded at c + t, from this expansion's value there. */
    public abstract LocalExpansion shift(Rational t);

    /**
     * Heuristic: a cell width on which one series enclosure is likely to decide the sign of g
     * or of g': the {@link StepChooser.Use#ZERO_CELL} length at c; +∞ for a polynomial, whose
     * width the caller chooses. Never part of a bound.
     */
    public abstract double cellWidthEstimate();

    /** The ball from c + lo to c + hi as a step from this center: lo − c and hi − c, both ends included. */
    public Ball steps(Rational lo, Rational hi) {
        Ball a = Ball.of(lo.subtract(center), precBits + 20);
        Ball b = Ball.of(hi.subtract(center), precBits + 20);
        return a.union(b);
    }

    /** y'' = −(P1 y' + P0 y)/P2 over the ball x (null when P2 may vanish there). */
    public static Ball second(Equation reduced, Ball x, Ball y, Ball dy, int precBits) {
        Ball p2 = reduced.p2().evaluate(x, precBits);
        if (p2.containsZero()) {
            return null;
        }
        return reduced.p1().evaluate(x, precBits).multiply(dy, precBits)
                .add(reduced.p0().evaluate(x, precBits).multiply(y, precBits), precBits).divide(p2, precBits).negate();
    }

    /**
     * The series form: sums from balls containing y(c), y'(c), and shifts by carrying the state
     * as midpoints and one error in a weighted norm ({@link CarriedState}, whose comment has the
     * argument), so that a long walk does not suffer the wrapping effect of componentwise balls.
     */
    private static final class Series extends LocalExpansion {
        private final Equation reduced;
        private final Recurrence rec;
        /** The balls the series is summed from: as given, or m ± E/w, m ± E after a shift. */
        private final Jet state;
        /** The same state as midpoints and one weighted error, carried by {@link #shift}. */
        private final CarriedState carried;
        private final int maxTerms;

        Series(Equation reduced, Rational center, Jet state, int precBits) {
            this(reduced, state, CarriedState.of(reduced, center, state), precBits);
        }

        private Series(Equation reduced, Jet state, CarriedState carried, int precBits) {
            super(carried.x(), precBits);
            this.reduced = reduced;
            this.rec = new Recurrence(reduced, carried.x());
            this.state = state;
            this.carried = carried;
            this.maxTerms = StepChooser.chooseMaxTerms(precBits);
        }

        @Override
        public Jet at(Rational t) {
            return LocalSeries.sum(rec, state.value(), state.derivative(), t, maxTerms, precBits()).jet();
        }

        @Override
        public Range over(Ball t) {
            Jet j = LocalSeries.sum(rec, state.value(), state.derivative(), t, maxTerms, precBits()).jet();
            Ball x = Ball.of(center(), precBits() + 20).add(t, precBits());
            return new Range(j.value(), j.derivative(), second(reduced, x, j.value(), j.derivative(), precBits()));
        }

        @Override
        public double cellWidthEstimate() {
            return StepChooser.lengthEstimate(reduced, rec, StepChooser.Use.ZERO_CELL);
        }

        @Override
        public LocalExpansion shift(Rational t) {
            CarriedState next = carried.step(reduced, rec, t, maxTerms, precBits()).state();
            return new Series(reduced, next.jet(), next, precBits());
        }
    }

    private static final class Polynomial extends LocalExpansion {
        private final Poly p;
        private final Poly q0;
        private final Poly q1;
        /** The coefficients of q0, q1, q2 = p, p', p'' shifted to c, as balls at this precision (rounded once). */
        private final Ball[][] balls;

        Polynomial(Poly p, Rational center, int precBits) {
            super(center, precBits);
            this.p = p;
            this.q0 = p.taylorShift(center);
            this.q1 = q0.derivative();
            Poly q2 = q1.derivative();
            this.balls = new Ball[][] {balls(q0, precBits), balls(q1, precBits), balls(q2, precBits)};
        }

        private static Ball[] balls(Poly q, int precBits) {
            Ball[] b = new Ball[q.degree() + 1];
            for (int i = 0; i < b.length; i++) {
                b[i] = Ball.of(q.coefficient(i), precBits);
            }
            return b;
        }

        /** Horner's rule in ball arithmetic: encloses Σ c_i t^i for every t in the ball. */
        private Ball horner(Ball[] c, Ball t) {
            Ball r = Ball.ZERO;
            for (int i = c.length - 1; i >= 0; i--) {
                r = r.multiply(t, precBits()).add(c[i], precBits());
            }
            return r;
        }

        @Override
        public Jet at(Rational t) {
            return new Jet(Ball.of(q0.evaluate(t), precBits()), Ball.of(q1.evaluate(t), precBits()));
        }

        @Override
        public Range over(Ball t) {
            return new Range(horner(balls[0], t), horner(balls[1], t), horner(balls[2], t));
        }

        @Override
        public double cellWidthEstimate() {
            return Double.POSITIVE_INFINITY;
        }

        @Override
        public LocalExpansion shift(Rational t) {
            return new Polynomial(p, center().add(t), precBits());
        }
    }
}
