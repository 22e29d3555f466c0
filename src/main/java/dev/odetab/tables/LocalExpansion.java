package dev.odetab.tables;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.Ball;
import dev.odetab.numeric.ComplexBall;
import dev.odetab.numeric.Directed;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import dev.odetab.series.Jet;
import dev.odetab.series.LocalSeries;
import dev.odetab.series.Recurrence;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;

/**
 * A solution near an exact rational center c: its values at c + t for rational t, and
 * enclosures of y, y', y'' over every point c + t with t in a ball. The zero search
 * ({@link ZeroFinder}) walks with one of these per cell and refines each zero with the one
 * nearest to it.
 *
 * <p>Trust level: Rigorous. Every returned ball contains the exact quantity: the series form
 * sums the Taylor series at c from balls containing y(c), y'(c) with the proven tail of
 * METHODS §2 ({@link LocalSeries}); the polynomial form evaluates the exactly shifted
 * polynomial p(c + t). y'' comes from the equation, y'' = −(P1 y' + P0 y)/P2 (reduced
 * equation), evaluated in ball arithmetic over the same ball of x; it is null where that ball
 * of P2 contains 0 (the cell reaches a singular point), which callers treat as "not proven".
 */
abstract sealed class LocalExpansion {
    private final Rational center;
    private final int precBits;

    private LocalExpansion(Rational center, int precBits) {
        this.center = center;
        this.precBits = precBits;
    }

    /** Enclosures of y, y' and y'' (y'' null when the equation cannot give it there) over a set of points. */
    record Range(Ball value, Ball derivative, Ball second) {
        /** The enclosure of y^(k), k = 0, 1, 2. */
        Ball order(int k) {
            return k == 0 ? value : k == 1 ? derivative : second;
        }
    }

    /** The series of a non-polynomial solution at {@code center}, whose y(c), y'(c) lie in {@code state}. */
    static LocalExpansion series(Equation reduced, Rational center, Jet state, int precBits) {
        return new Series(reduced, center, state, precBits);
    }

    /** The exact polynomial solution {@code p}, expanded at {@code center}. */
    static LocalExpansion polynomial(Poly p, Rational center, int precBits) {
        return new Polynomial(p, center, precBits);
    }

    Rational center() {
        return center;
    }

    int precBits() {
        return precBits;
    }

    /**
     * Rigorous: balls containing y(c + t) and y'(c + t).
     *
     * @throws LocalSeries.StepTooLongException when t lies outside the disk where the series
     *     tail can be bounded (the caller takes a shorter step)
     */
    abstract Jet at(Rational t);

    /**
     * Rigorous: enclosures of y, y', y'' at every point c + t, t in {@code t} (Horner's rule
     * in ball arithmetic plus the tail bound; an overestimate that shrinks with the ball).
     *
     * @throws LocalSeries.StepTooLongException as for {@link #at}
     */
    abstract Range over(Ball t);

    /** The same solution expanded at c + t, from this expansion's value there. */
    abstract LocalExpansion shift(Rational t);

    /**
     * Heuristic: a cell width on which one series enclosure is likely to decide the sign of g
     * or of g': min(ρ/2, 1/(1 + √|P0/P2| + |P1/P2|)) at c, ρ the contraction radius of
     * METHODS §2 (about a sixth of a period where the solution oscillates); +∞ for a
     * polynomial, whose width the caller chooses. Never part of a bound.
     */
    abstract double cellWidthEstimate();

    /** The ball from c + lo to c + hi as a step from this center: lo − c and hi − c, both ends included. */
    Ball steps(Rational lo, Rational hi) {
        Ball a = Ball.of(lo.subtract(center), precBits + 20);
        Ball b = Ball.of(hi.subtract(center), precBits + 20);
        return a.union(b);
    }

    /** y'' = −(P1 y' + P0 y)/P2 over the ball x (null when P2 may vanish there). */
    static Ball second(Equation reduced, Ball x, Ball y, Ball dy, int precBits) {
        Ball p2 = reduced.p2().evaluate(x, precBits);
        if (p2.containsZero()) {
            return null;
        }
        return reduced.p1().evaluate(x, precBits).multiply(dy, precBits)
                .add(reduced.p0().evaluate(x, precBits).multiply(y, precBits), precBits).divide(p2, precBits).negate();
    }

    /**
     * The series form. Its state at c is a pair of midpoints (m0, m1) and one error bound E in
     * the weighted norm |(e0, e1)|_w = sqrt(w² e0² + e1²), w &gt; 0 a scale chosen at c: the
     * exact (y(c), y'(c)) lies within E of (m0, m1), so y(c) ∈ m0 ± E/w and y'(c) ∈ m1 ± E.
     *
     * <p>A step to c + t ({@link #shift}) sums the series from the exact midpoints at full
     * precision (its ball radius δ covers rounding and the tail), and carries the old error by
     * linearity: the exact state is T·(exact old state), T = [[A, B], [A', B']] the canonical
     * solutions (y(c) = 1, y'(c) = 0 and y(c) = 0, y'(c) = 1) at c + t, so
     * E' &lt;= ‖D' T D⁻¹‖₂ E + w' δ0 + δ1 with D = diag(w, 1), D' = diag(w', 1). The spectral
     * norm of a 2×2 matrix M is bounded from its Frobenius norm F and determinant exactly:
     * ‖M‖₂² = (F² + sqrt(F⁴ − 4 det²))/2, evaluated on balls of the entries and rounded up.
     * Where the solution oscillates (w ≈ sqrt(P0/P2)), D' T D⁻¹ is nearly a rotation and the
     * bound stays close to 1: the error grows slowly along a long walk, unlike componentwise
     * radii, which grow by a factor of about e^(ω t) per step (the wrapping effect of interval
     * methods, Moore 1966). The weights are a heuristic choice; any positive w gives a bound.
     */
    private static final class Series extends LocalExpansion {
        /** Precision of the canonical solutions: they only scale an error bound (a heuristic choice). */
        private static final int NORM_BITS = 64;
        private final Equation reduced;
        private final Recurrence rec;
        private final Jet state;
        private final BigDecimal error;
        private final BigDecimal weight;
        private final int maxTerms;

        Series(Equation reduced, Rational center, Jet state, int precBits) {
            this(reduced, center, state, null, precBits);
        }

        /** With {@code error} null, E is taken from the balls of {@code state}: E = w r0 + r1 &gt;= the weighted 2-norm. */
        private Series(Equation reduced, Rational center, Jet state, BigDecimal error, int precBits) {
            super(center, precBits);
            this.reduced = reduced;
            this.rec = new Recurrence(reduced, center);
            this.weight = weight(reduced, center);
            this.state = error == null ? state
                    : new Jet(Ball.of(state.value().mid(), Directed.divUp(error, weight)), Ball.of(state.derivative().mid(), error));
            this.error = error != null ? error
                    : Directed.addUp(Directed.mulUp(weight, state.value().rad()), state.derivative().rad());
            this.maxTerms = 4 * precBits + 2000;
        }

        /** Heuristic: sqrt|P0/P2| at c to two digits, at least 1/4: the local frequency or growth rate. */
        private static BigDecimal weight(Equation reduced, Rational c) {
            double d = Math.abs(reduced.p0().evaluate(c).doubleEstimate() / reduced.p2().evaluate(c).doubleEstimate());
            return new BigDecimal(Math.max(0.25, Math.sqrt(d)), new MathContext(2));
        }

        @Override
        Jet at(Rational t) {
            return LocalSeries.sum(rec, state.value(), state.derivative(), t, maxTerms, precBits()).jet();
        }

        @Override
        Range over(Ball t) {
            Jet j = LocalSeries.sum(rec, state.value(), state.derivative(), t, maxTerms, precBits()).jet();
            Ball x = Ball.of(center(), precBits() + 20).add(t, precBits());
            return new Range(j.value(), j.derivative(), second(reduced, x, j.value(), j.derivative(), precBits()));
        }

        @Override
        double cellWidthEstimate() {
            double a0 = Math.abs(reduced.p2().evaluate(center()).doubleEstimate());
            double b0 = Math.abs(reduced.p1().evaluate(center()).doubleEstimate()) / a0;
            double d0 = Math.abs(reduced.p0().evaluate(center()).doubleEstimate()) / a0;
            return Math.min(0.5 * LocalSeries.contractionRadiusEstimate(rec), 1.0 / (1.0 + Math.sqrt(d0) + b0));
        }

        @Override
        LocalExpansion shift(Rational t) {
            Jet mid = LocalSeries.sum(rec, Ball.exact(state.value().mid()), Ball.exact(state.derivative().mid()), t, maxTerms,
                    precBits()).jet();
            Rational to = center().add(t);
            BigDecimal w1 = weight(reduced, to);
            BigDecimal local = Directed.addUp(Directed.mulUp(w1, mid.value().rad()), mid.derivative().rad());
            BigDecimal carried = BigDecimal.ZERO;
            if (error.signum() != 0) {
                Jet a = LocalSeries.sum(rec, Ball.ONE, Ball.ZERO, t, maxTerms, NORM_BITS).jet();
                Jet b = LocalSeries.sum(rec, Ball.ZERO, Ball.ONE, t, maxTerms, NORM_BITS).jet();
                Ball scale = Ball.exact(w1).divide(Ball.exact(weight), NORM_BITS);
                carried = Directed.mulUp(spectralNormBound(a.value().multiply(scale, NORM_BITS), b.value().multiply(Ball.exact(w1), NORM_BITS),
                        a.derivative().divide(Ball.exact(weight), NORM_BITS), b.derivative()), error);
            }
            return new Series(reduced, to, mid, Directed.addUp(carried, local), precBits());
        }

        /**
         * Rigorous: an upper bound of ‖M‖₂ for every matrix M = [[p, q], [r, s]] with entries in
         * the balls: ‖M‖₂² = (F² + sqrt(F⁴ − 4 det²))/2 (the larger eigenvalue of MᵀM, whose
         * trace is F² and determinant det²), increasing in F² and in F⁴ − 4 det².
         */
        static BigDecimal spectralNormBound(Ball p, Ball q, Ball r, Ball s) {
            int bits = NORM_BITS;
            Ball f2 = p.square(bits).add(q.square(bits), bits).add(r.square(bits), bits).add(s.square(bits), bits);
            Ball det = p.multiply(s, bits).subtract(q.multiply(r, bits), bits);
            Ball disc = f2.square(bits).subtract(det.square(bits).multiplyExact(BigInteger.valueOf(4)), bits);
            BigDecimal discUp = disc.upper().max(BigDecimal.ZERO);
            BigDecimal sigma2 = Directed.divUp(Directed.addUp(f2.upper(), ComplexBall.sqrtUp(discUp, 20)), BigDecimal.valueOf(2));
            return Directed.up(ComplexBall.sqrtUp(sigma2, 20));
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
        Jet at(Rational t) {
            return new Jet(Ball.of(q0.evaluate(t), precBits()), Ball.of(q1.evaluate(t), precBits()));
        }

        @Override
        Range over(Ball t) {
            return new Range(horner(balls[0], t), horner(balls[1], t), horner(balls[2], t));
        }

        @Override
        double cellWidthEstimate() {
            return Double.POSITIVE_INFINITY;
        }

        @Override
        LocalExpansion shift(Rational t) {
            return new Polynomial(p, center().add(t), precBits());
        }
    }
}
