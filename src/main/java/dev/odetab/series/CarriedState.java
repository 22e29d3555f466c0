package dev.odetab.series;

import dev.odetab.numeric.Ball;
import dev.odetab.numeric.ComplexBall;
import dev.odetab.numeric.Directed;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;

/**
 * The state of a solution at an exact point x as exact midpoints (m0, m1) and one error bound E
 * in the weighted norm |(e0, e1)|_w = sqrt(w² e0² + e1²): the exact (y(x), y'(x)) lies within E
 * of (m0, m1), so y(x) ∈ m0 ± E/w and y'(x) ∈ m1 ± E.
 *
 * <p>Trust level: Rigorous. A step to x + t ({@link #step}) sums the series of the canonical
 * solutions (y(x) = 1, y'(x) = 0 and y(x) = 0, y'(x) = 1) at x + t, T = [[A, B], [A', B']], as balls
 * (rounding and tail included, docs/methods.md §2); the exact midpoints go to T·m = m0·(A, A') +
 * m1·(B, B') in ball arithmetic, whose radii δ the new error takes in; and the old error is
 * carried by linearity: the exact new state is T·(exact old state), so
 * E' &lt;= ‖D' T D⁻¹‖₂ E + w' δ0 + δ1 with D = diag(w, 1), D' = diag(w', 1). ‖M‖₂ of a 2×2
 * matrix is bounded exactly from its Frobenius norm F and determinant:
 * ‖M‖₂² = (F² + sqrt(F⁴ − 4 det²))/2, evaluated on balls of the entries and rounded up.
 * Where the solution oscillates (w ≈ sqrt|P0/P2|) D' T D⁻¹ is nearly a rotation, so the error
 * stays nearly constant along a long walk, where componentwise balls grow by about e^(ω t) per
 * step (the wrapping effect of interval methods, Moore 1966). The weights are a heuristic choice;
 * any positive w gives a bound.
 *
 * @param x the exact point
 * @param m0 midpoint of y(x)
 * @param m1 midpoint of y'(x)
 * @param error E, an upper bound of the weighted error
 * @param weight w &gt; 0
 *
 * <p>Derivation: docs/methods.md §11 (the carried state).
 */
public record CarriedState(Rational x, BigDecimal m0, BigDecimal m1, BigDecimal error, BigDecimal weight) {
    /** Precision of the norm bound: it only scales an error bound (a heuristic choice). */
    private static final int NORM_BITS = 64;

    /** The state whose balls are {@code jet} at x: E = w r0 + r1, which bounds the weighted 2-norm. */
    public static CarriedState of(Equation reduced, Rational x, Jet jet) {
        BigDecimal w = weight(reduced, x);
        return new CarriedState(x, jet.value().mid(), jet.derivative().mid(),
                Directed.addUp(Directed.mulUp(w, jet.value().rad()), jet.derivative().rad()), w);
    }

    /** Balls containing y(x) and y'(x): m0 ± E/w and m1 ± E. */
    public Jet jet() {
        return new Jet(Ball.of(m0, Directed.divUp(error, weight)), Ball.of(m1, error));
    }

    /** Heuristic: sqrt|P0/P2| at x to two digits, at least 1/4: the local frequency or growth rate. */
    static BigDecimal weight(Equation reduced, Rational x) {
        double d = Math.abs(reduced.p0().evaluate(x).doubleEstimate() / reduced.p2().evaluate(x).doubleEstimate());
        return new BigDecimal(Math.max(0.25, Math.sqrt(d)), new MathContext(2));
    }

    /**
     * Rigorous (class comment): the state at x + t; {@code rec} is the recurrence at x.
     *
     * @throws LocalSeries.StepTooLongException when t is too long for a tail bound
     */
    public Stepped step(Equation reduced, Recurrence rec, Rational t, int maxTerms, int precBits) {
        // The canonical solutions at x + t, at full precision: they give both the new midpoints
        // (T·m = m0·A + m1·B, by linearity, in ball arithmetic) and the norm that carries E.
        LocalSeries.Result sa = LocalSeries.sum(rec, Ball.ONE, Ball.ZERO, t, maxTerms, precBits);
        LocalSeries.Result sb = LocalSeries.sum(rec, Ball.ZERO, Ball.ONE, t, maxTerms, precBits);
        Jet a = sa.jet();
        Jet b = sb.jet();
        Ball e0 = Ball.exact(m0);
        Ball e1 = Ball.exact(m1);
        Ball value = a.value().multiply(e0, precBits).add(b.value().multiply(e1, precBits), precBits);
        Ball derivative = a.derivative().multiply(e0, precBits).add(b.derivative().multiply(e1, precBits), precBits);
        Rational to = x.add(t);
        BigDecimal w1 = weight(reduced, to);
        BigDecimal local = Directed.addUp(Directed.mulUp(w1, value.rad()), derivative.rad());
        BigDecimal carried = BigDecimal.ZERO;
        if (error.signum() != 0) {
            Ball scale = Ball.exact(w1).divide(Ball.exact(weight), NORM_BITS);
            carried = Directed.mulUp(spectralNormBound(a.value().multiply(scale, NORM_BITS), b.value().multiply(Ball.exact(w1), NORM_BITS),
                    a.derivative().divide(Ball.exact(weight), NORM_BITS), b.derivative()), error);
        }
        return new Stepped(new CarriedState(to, value.mid(), derivative.mid(), Directed.addUp(carried, local), w1),
                Math.max(sa.terms(), sb.terms()));
    }

    /** A step's result and the terms its main sum took. */
    public record Stepped(CarriedState state, int terms) {
    }

    /**
     * Rigorous: an upper bound of ‖M‖₂ for every matrix M = [[p, q], [r, s]] with entries in the
     * balls: ‖M‖₂² = (F² + sqrt(F⁴ − 4 det²))/2 (the larger eigenvalue of MᵀM, whose trace is F²
     * and determinant det²), increasing in F² and in F⁴ − 4 det².
     */
    public static BigDecimal spectralNormBound(Ball p, Ball q, Ball r, Ball s) {
        int bits = NORM_BITS;
        Ball f2 = p.square(bits).add(q.square(bits), bits).add(r.square(bits), bits).add(s.square(bits), bits);
        Ball det = p.multiply(s, bits).subtract(q.multiply(r, bits), bits);
        Ball disc = f2.square(bits).subtract(det.square(bits).multiplyExact(BigInteger.valueOf(4)), bits);
        BigDecimal discUp = disc.upper().max(BigDecimal.ZERO);
        BigDecimal sigma2 = Directed.divUp(Directed.addUp(f2.upper(), ComplexBall.sqrtUp(discUp, 20)), BigDecimal.valueOf(2));
        return Directed.up(ComplexBall.sqrtUp(sigma2, 20));
    }
}
