package dev.odetab.series;

import dev.odetab.numeric.Directed;
import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * The rigorous bound on the tail of a Taylor series whose coefficients obey a {@link Recurrence}.
 *
 * <p>Trust level: Rigorous (docs/methods.md §2). With u_i = c_i t^i, pick r &gt; |t| such that
 * Σ_j B_j(N) r^j &lt;= 1 (checked with upward rounding). For K = max_{N−J &lt;= i &lt; N} |c_i| r^i,
 * induction on m gives |c_m| &lt;= Σ_j |beta_j(m)| K r^(j−m) &lt;= K r^(−m) Σ_j B_j(N) r^j
 * &lt;= K r^(−m) for every m &gt;= N−J. With q = |t|/r &lt; 1 and K q^(N−1) = max_i |u_i| q^(N−1−i):
 * <pre>
 *   Σ_{m&gt;=N} |c_m| |t|^m       &lt;= K q^N / (1 − q)
 *   Σ_{m&gt;=N} m |c_m| |t|^(m−1) &lt;= (K q^(N−1) / r) (N − (N−1) q) / (1 − q)^2
 * </pre>
 * (the second is d/dq of the geometric series). Taking M = N and the largest admissible r keeps
 * the bound within a small factor of the true tail (docs/methods.md §2).
 */
final class TailBound {
    private static final MathContext RADIUS_CHOICE = new MathContext(10, RoundingMode.FLOOR);

    private TailBound() {
    }

    /** The bounds; {@code null} fields never occur: a failed bound is a null result. */
    record Bounds(BigDecimal valueBound, BigDecimal derivativeBound) {
    }

    /**
     * Heuristic choice, rigorous check: the largest r (to about 10 digits) with
     * Σ_{j=1..J} B_j(N) r^j &lt;= 1, verified with upward rounding; null when every B_j(N) is
     * zero (then c_m = 0 for all m &gt;= N and no radius is needed).
     */
    static BigDecimal admissibleRadius(Recurrence rec, int bigN) {
        int order = rec.order();
        BigDecimal[] bounds = new BigDecimal[order + 1];
        double[] estimates = new double[order + 1];
        boolean allZero = true;
        for (int j = 1; j <= order; j++) {
            bounds[j] = rec.betaBound(j, bigN);
            estimates[j] = bounds[j].doubleValue();
            allZero &= bounds[j].signum() == 0;
        }
        if (allZero) {
            return null;
        }
        double lo = Math.min(unitRadiusEstimate(estimates), 1e300);
        BigDecimal r = new BigDecimal(lo * (1 - 1e-9), RADIUS_CHOICE);
        for (int attempt = 0; attempt < 50 && r.signum() > 0; attempt++) {
            if (sumUp(bounds, r).compareTo(BigDecimal.ONE) <= 0) {
                return r;
            }
            r = r.multiply(new BigDecimal("0.999"), RADIUS_CHOICE);
        }
        return BigDecimal.ZERO;
    }

    /**
     * Heuristic: the largest r with Σ_{j&gt;=1} b_j r^j &lt;= 1 for non-negative b_j, by doubling
     * and bisection in doubles; +∞ when every b_j is zero. Chooses radii; never proves one.
     */
    static double unitRadiusEstimate(double[] b) {
        boolean any = false;
        for (int j = 1; j < b.length; j++) {
            any |= b[j] != 0;
        }
        if (!any) {
            return Double.POSITIVE_INFINITY;
        }
        double lo = 0;
        double hi = 1;
        while (sumEstimate(b, hi) < 1 && hi < 1e300) {
            lo = hi;
            hi *= 2;
        }
        for (int it = 0; it < 200 && hi - lo > 1e-15 * hi; it++) {
            double mid = 0.5 * (lo + hi);
            if (sumEstimate(b, mid) <= 1) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    private static double sumEstimate(double[] b, double r) {
        double s = 0;
        double p = 1;
        for (int j = 1; j < b.length; j++) {
            p *= r;
            s += b[j] * p;
        }
        return s;
    }

    private static BigDecimal sumUp(BigDecimal[] b, BigDecimal r) {
        BigDecimal s = BigDecimal.ZERO;
        for (int j = 1; j < b.length; j++) {
            if (b[j].signum() != 0) {
                s = Directed.addUp(s, Directed.mulUp(b[j], Directed.powUp(r, j)));
            }
        }
        return s;
    }

    /**
     * The tail bounds after N terms, or null when no admissible r exceeds |t| at this N (sum
     * more terms, or step shorter).
     *
     * @param lastTermBounds upper bounds of |u_i| for i = N−J .. N−1 (index 0 is i = N−J)
     * @param absT an upper bound of |t|; must be positive
     */
    static Bounds after(Recurrence rec, int bigN, BigDecimal[] lastTermBounds, BigDecimal absT) {
        BigDecimal r = admissibleRadius(rec, bigN);
        if (r == null) {
            return new Bounds(BigDecimal.ZERO, BigDecimal.ZERO);
        }
        if (r.compareTo(absT) <= 0) {
            return null;
        }
        BigDecimal q = Directed.divUp(absT, r);
        BigDecimal oneMinusQ = Directed.subDown(BigDecimal.ONE, q);
        if (q.compareTo(BigDecimal.ONE) >= 0 || oneMinusQ.signum() <= 0) {
            return null;
        }
        // kq = K q^(N−1) = max_i |u_i| q^(N−1−i): with an upper bound of q each term only grows.
        int order = rec.order();
        BigDecimal kq = BigDecimal.ZERO;
        for (int k = 0; k < order; k++) {
            int i = bigN - order + k;
            if (i < 0 || lastTermBounds[k].signum() == 0) {
                continue;
            }
            kq = kq.max(Directed.mulUp(lastTermBounds[k], Directed.powUp(q, bigN - 1 - i)));
        }
        BigDecimal valueBound = Directed.divUp(Directed.mulUp(kq, q), oneMinusQ);
        // (N − (N−1) q) / (1 − q)^2 · q^(N−1) = Σ_{m>=N} m q^(m−1) increases with q, so every
        // piece is evaluated at the same upper bound q and rounded in the direction that raises it.
        BigDecimal factor = Directed.divUp(
                Directed.up(BigDecimal.valueOf(bigN).subtract(BigDecimal.valueOf(bigN - 1).multiply(q))),
                Directed.mulDown(oneMinusQ, oneMinusQ));
        BigDecimal derivativeBound = Directed.mulUp(Directed.divUp(kq, r), factor);
        return new Bounds(valueBound, derivativeBound);
    }
}
