package dev.odetab.series;

import dev.odetab.numeric.Ball;
import dev.odetab.numeric.Directed;
import dev.odetab.numeric.Precision;
import dev.odetab.numeric.Rational;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;

/**
 * Summation of the Taylor series of one solution at an ordinary point, with its rigorous tail.
 *
 * <p>Trust level: Rigorous. Given balls containing y(alpha) and y'(alpha), {@link #sum} returns
 * balls containing y(alpha + t) and y'(alpha + t). It sums the terms u_m = c_m t^m, which obey
 * u_m = Σ_j beta_j(m) t^j u_{m−j} (from {@link Recurrence}); with t = p/q in lowest terms,
 * beta_j(m) t^j = num_j(m) p^j q^(J−j) / (den(m) q^J), so each term costs J exact integer
 * products and one rounded division. Every partial sum is a ball; the tail beyond the last
 * term is bounded by {@link TailBound} and added to the radii.
 *
 * <p>The number of terms is a heuristic choice: summing stops once the proven tail is below
 * the larger of the accumulated radius and 2^−precBits times the sum. It never affects
 * correctness, only the width of the result.
 */
public final class LocalSeries {
    private LocalSeries() {
    }

    /** The result and the work it took. */
    public record Result(Jet jet, int terms) {
    }

    /**
     * Thrown when no tail bound is available at this step length: |t| is not inside the
     * contraction disk of docs/methods.md §2 at this center. The caller shortens the step.
     */
    public static final class StepTooLongException extends RuntimeException {
        private static final long serialVersionUID = 1L;

        StepTooLongException(String message) {
            super(message);
        }
    }

    /**
     * Balls containing y(alpha+t) and y'(alpha+t) for the solution with y(alpha) in y0 and
     * y'(alpha) in y1.
     *
     * @param maxTerms a cap on the number of terms (a heuristic safeguard)
     * @throws StepTooLongException when no admissible tail radius exceeds |t| within maxTerms
     */
    public static Result sum(Recurrence rec, Ball y0, Ball y1, Rational t, int maxTerms, int precBits) {
        if (t.isZero()) {
            return new Result(new Jet(y0, y1), 0);
        }
        int order = rec.order();
        BigInteger p = t.numerator();
        BigInteger q = t.denominator();
        BigInteger[] pq = new BigInteger[order + 1];
        for (int j = 1; j <= order; j++) {
            pq[j] = p.pow(j).multiply(q.pow(order - j));
        }
        BigInteger qJ = q.pow(order);
        BigDecimal absT = Directed.absUp(t);
        BigDecimal target = BigDecimal.ONE.scaleByPowerOfTen(-Precision.digits10(precBits) + 1);

        // u[m % (order+1)] holds u_m; a ring of the last J+1 terms is enough.
        Ball[] ring = new Ball[order + 1];
        ring[0] = y0;
        Ball u1 = y1.multiply(t, precBits);
        ring[1 % (order + 1)] = u1;
        Ball s0 = y0.add(u1, precBits);
        Ball s1 = u1;
        int m = 2;
        int nextCheck = order + 2;
        while (true) {
            if (m >= nextCheck) {
                TailBound.Bounds tail = TailBound.after(rec, m, lastBounds(ring, m, order), absT);
                if (tail != null) {
                    BigDecimal tol0 = s0.rad().max(s0.mid().abs().multiply(target));
                    BigDecimal tol1 = s1.rad().max(s1.mid().abs().multiply(target)).divide(absT, MathContext.DECIMAL64);
                    boolean done = tail.valueBound().compareTo(tol0) <= 0 && tail.derivativeBound().compareTo(tol1) <= 0;
                    if (done || m >= maxTerms) {
                        Ball value = s0.addError(tail.valueBound());
                        Ball derivative = s1.divide(t, precBits).addError(tail.derivativeBound());
                        return new Result(new Jet(value, derivative), m);
                    }
                } else if (m >= maxTerms) {
                    throw new StepTooLongException("no tail bound for a step of length " + t.toDecimalOrFraction()
                            + " from x = " + rec.center().toDecimalOrFraction() + " within " + maxTerms + " terms");
                }
                nextCheck = m + Math.max(4, m / 8);
            }
            Ball acc = Ball.ZERO;
            for (int j = 1; j <= order && j <= m; j++) {
                Ball prev = ring[(m - j) % (order + 1)];
                BigInteger k = rec.numerator(j, m);
                if (k.signum() == 0 || (prev.mid().signum() == 0 && prev.rad().signum() == 0)) {
                    continue;
                }
                acc = acc.addExact(prev.multiplyExact(k.multiply(pq[j])));
            }
            Ball um = acc.divide(rec.denominator(m).multiply(qJ), precBits);
            ring[m % (order + 1)] = um;
            s0 = s0.add(um, precBits);
            s1 = s1.add(um.multiplyExact(BigInteger.valueOf(m)), precBits);
            m++;
        }
    }

    /**
     * Balls containing y(alpha+t) and y'(alpha+t) for every t in a ball (an irrational point, such
     * as a Chebyshev node, near the rational center alpha). Trust level: Rigorous. The Taylor
     * coefficients c_m at alpha are computed as balls, the partial sums are evaluated at the ball
     * t by Horner's rule in ball arithmetic, and the tail is bounded by {@link TailBound} with
     * |t| &lt;= T, T an upper bound of the ball's modulus.
     *
     * @throws StepTooLongException when no admissible tail radius exceeds T within maxTerms
     */
    public static Result sum(Recurrence rec, Ball y0, Ball y1, Ball t, int maxTerms, int precBits) {
        int order = rec.order();
        BigDecimal absT = Directed.up(t.absUpper());
        if (absT.signum() == 0) {
            return new Result(new Jet(y0, y1), 0);
        }
        BigDecimal target = BigDecimal.ONE.scaleByPowerOfTen(-Precision.digits10(precBits) + 1);
        java.util.List<Ball> c = new java.util.ArrayList<>();
        c.add(y0);
        c.add(y1);
        java.util.List<BigDecimal> uBounds = new java.util.ArrayList<>();
        uBounds.add(Directed.up(y0.absUpper()));
        uBounds.add(Directed.mulUp(Directed.up(y1.absUpper()), absT));
        BigDecimal power = absT;
        int nextCheck = order + 2;
        for (int m = 2; ; m++) {
            if (m >= nextCheck) {
                BigDecimal[] last = new BigDecimal[order];
                for (int k = 0; k < order; k++) {
                    int i = m - order + k;
                    last[k] = i < 0 ? BigDecimal.ZERO : uBounds.get(i);
                }
                TailBound.Bounds tail = TailBound.after(rec, m, last, absT);
                if (tail != null) {
                    BigDecimal lastTerm = uBounds.get(m - 1);
                    boolean small = tail.valueBound().compareTo(lastTerm.max(target).multiply(target)) <= 0
                            || lastTerm.signum() == 0;
                    if (small || m >= maxTerms) {
                        Ball value = Ball.ZERO;
                        Ball derivative = Ball.ZERO;
                        for (int k = m - 1; k >= 0; k--) {
                            value = value.multiply(t, precBits).add(c.get(k), precBits);
                            if (k >= 1) {
                                derivative = derivative.multiply(t, precBits).add(c.get(k).multiplyExact(BigInteger.valueOf(k)), precBits);
                            }
                        }
                        return new Result(new Jet(value.addError(tail.valueBound()), derivative.addError(tail.derivativeBound())), m);
                    }
                } else if (m >= maxTerms) {
                    throw new StepTooLongException("no tail bound for a step of radius " + absT + " from x = "
                            + rec.center().toDecimalOrFraction() + " within " + maxTerms + " terms");
                }
                nextCheck = m + Math.max(4, m / 8);
            }
            Ball acc = Ball.ZERO;
            for (int j = 1; j <= order && j <= m; j++) {
                acc = acc.addExact(c.get(m - j).multiplyExact(rec.numerator(j, m)));
            }
            Ball cm = acc.divide(rec.denominator(m), precBits);
            c.add(cm);
            power = Directed.mulUp(power, absT);
            uBounds.add(Directed.mulUp(Directed.up(cm.absUpper()), power));
        }
    }

    /**
     * Balls containing the first {@code count} Taylor coefficients c_0 … c_(count−1) at the
     * recurrence's center of the solution with c_0 in y0 and c_1 in y1 (docs/methods.md §1).
     */
    public static Ball[] coefficients(Recurrence rec, Ball y0, Ball y1, int count, int precBits) {
        Ball[] c = new Ball[count];
        for (int m = 0; m < count; m++) {
            if (m == 0 || m == 1) {
                c[m] = m == 0 ? y0 : y1;
                continue;
            }
            Ball acc = Ball.ZERO;
            for (int j = 1; j <= rec.order() && j <= m; j++) {
                acc = acc.addExact(c[m - j].multiplyExact(rec.numerator(j, m)));
            }
            c[m] = acc.divide(rec.denominator(m), precBits);
        }
        return c;
    }

    /** Upper bounds of |u_i| for i = m−J .. m−1, from the ring. */
    private static BigDecimal[] lastBounds(Ball[] ring, int m, int order) {
        BigDecimal[] r = new BigDecimal[order];
        for (int k = 0; k < order; k++) {
            int i = m - order + k;
            r[k] = i < 0 ? BigDecimal.ZERO : Directed.up(ring[i % (order + 1)].absUpper());
        }
        return r;
    }

    /**
     * Heuristic: the radius of the disk in which the tail bound of docs/methods.md §2 can work at this
     * center, i.e. the positive root of Σ_j |a_j/a_0| r^j = 1 (infinite when P2 is constant).
     * Used to choose step lengths; never part of a bound.
     */
    public static double contractionRadiusEstimate(Recurrence rec) {
        double[] b = new double[rec.order() + 1];
        for (int j = 1; j <= rec.order(); j++) {
            b[j] = rec.leadingRatio(j).doubleEstimate();
        }
        return TailBound.unitRadiusEstimate(b);
    }
}
