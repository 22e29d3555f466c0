package dev.odetab.series;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.DDBall;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;

/**
 * One Taylor step of a solution in double-double ball arithmetic ({@link DDBall}): the fast
 * tier of grid evaluation (docs/methods.md §4, dense grids).
 *
 * <p>Trust level: Rigorous. Given balls containing y(c) and y'(c) at an exact point c, a ball
 * containing c, and a ball containing the exact step t, {@link #step} returns balls containing
 * y(c + t) and y'(c + t), or null when it cannot prove them (then the caller uses the BigDecimal
 * tier). It is the computation of {@link LocalSeries#sum} with {@link Recurrence} and
 * {@link TailBound} carried out in DDBall arithmetic: the Taylor coefficients of P2, P1, P0 at c
 * are enclosed by a ball Taylor shift of the exact coefficients; c_m = Σ_j beta_j(m) c_(m−j)
 * (docs/methods.md §1) is enclosed term by term; the partial sums are balls; and the tail after N terms is
 * bounded as in {@link TailBound} (docs/methods.md §2): with r = T/q for T &gt;= |t| and q in {1/2, 3/4},
 * when Σ_j B_j(N) r^j &lt;= 1 (checked with upward-inflated arithmetic),
 * Σ_(m&gt;=N) |c_m t^m| &lt;= K q^N/(1 − q) and Σ_(m&gt;=N) m |c_m| |t|^(m−1) &lt;=
 * (K q^(N−1)/r)(N − (N−1)q)/(1 − q)², K q^(N−1) = max_(N−J&lt;=i&lt;N) |c_i t^i| q^(N−1−i).
 * B_j(N) = |a_j/a_0| + |b_(j−1)/a_0|/(N−1) + |d_(j−2)/a_0|/(N(N−1)) bounds |beta_j(m)| for
 * m &gt;= N &gt; J ({@link Recurrence#betaBound}).
 *
 * <p>Heuristic parts (never part of a bound): the number of terms (until the last term is below
 * 2^−112 of the sum), and q.
 */
public final class FastStepper {
    /** Terms beyond which a step gives up (the caller shortens steps or falls back). */
    private static final int MAX_TERMS = 240;
    private static final double STOP = 0x1p-112;
    private static final DDBall[] RECIPROCAL_PAIRS = reciprocalPairs();

    private final DDBall[] p2;
    private final DDBall[] p1;
    private final DDBall[] p0;
    private final int order;
    /** P2 is the constant 1 (the reduced form is monic): a_0 = 1 exactly, no reciprocal needed. */
    private final boolean monicConstant;
    private final double[] absA;
    private final double[] absB;
    private final double[] absD;
    private final double[] uh = new double[MAX_TERMS + 1];
    private final double[] ul = new double[MAX_TERMS + 1];
    private final double[] ur = new double[MAX_TERMS + 1];
    private final double[] scratch = new double[3];
    private final boolean[][] present;
    private final double[][] ch;
    private final double[][] cl;
    private final double[][] cr;
    private final double[] termBound = new double[MAX_TERMS + 1];

    /** The stepper for this equation (its reduced form is used). */
    public FastStepper(Equation equation) {
        Equation eq = equation.reduced();
        p2 = balls(eq.p2());
        p1 = balls(eq.p1());
        p0 = balls(eq.p0());
        order = Math.max(eq.p2().degree(), Math.max(eq.p1().degree() + 1, eq.p0().degree() + 2));
        monicConstant = eq.p2().degree() == 0 && eq.p2().coefficient(0).equals(Rational.ONE);
        absA = new double[order + 1];
        absB = new double[order + 1];
        absD = new double[order + 1];
        present = new boolean[3][order + 1];
        ch = new double[3][order + 1];
        cl = new double[3][order + 1];
        cr = new double[3][order + 1];
    }

    private static DDBall[] balls(Poly p) {
        if (p.isZero()) {
            return new DDBall[0];
        }
        DDBall[] r = new DDBall[p.degree() + 1];
        for (int i = 0; i <= p.degree(); i++) {
            Rational c = p.coefficient(i);
            r[i] = c.isZero() ? null : DDBall.of(c);
        }
        return r;
    }

    /** 1/(m(m−1)) for m = 2 … MAX_TERMS, as balls. */
    private static DDBall[] reciprocalPairs() {
        DDBall[] r = new DDBall[MAX_TERMS + 1];
        for (int m = 2; m <= MAX_TERMS; m++) {
            r[m] = DDBall.of(Rational.of(1, (long) m * (m - 1)));
        }
        return r;
    }

    /**
     * The Taylor coefficients at c of a polynomial with ball coefficients (a ball Taylor shift by
     * repeated synthetic division); null entries are exact zeros.
     */
    private static DDBall[] shift(DDBall[] p, DDBall c, int size) {
        DDBall[] q = new DDBall[size];
        int n = p.length;
        DDBall[] w = p.clone();
        for (int i = 0; i < n && i < size; i++) {
            for (int k = n - 2; k >= i; k--) {
                if (w[k + 1] != null) {
                    DDBall add = w[k + 1].multiply(c);
                    w[k] = w[k] == null ? add : w[k].add(add);
                }
            }
            q[i] = w[i];
        }
        return q;
    }

    /**
     * Balls containing y(c + t) and y'(c + t) ({value, derivative}), or null when no rigorous
     * result is available (a ball P2(c) that may be zero, no admissible tail radius, an
     * overflow, or more than {@value #MAX_TERMS} terms). Not thread-safe (scratch arrays): one
     * stepper per thread.
     *
     * <p>This method is longer than our 80-line limit on purpose: it is the hot loop of the
     * fast tier (about half of a binary64 table's time), and the shift, the recurrence, the
     * summation and the tail bound share the same scratch arrays and locals. Split into
     * methods, the per-term state would travel through fields or small arrays on every call;
     * kept whole, its error analysis (class comment) reads top to bottom beside the code.
     *
     * @param c a ball containing the exact center
     * @param y a ball containing y(center)
     * @param dy a ball containing y'(center)
     * @param t a ball containing the exact step; {@code powers[j]} contains t^j for j = 0 … J and
     *     {@code inverse} contains 1/t (see {@link #powers})
     */
    public DDBall[] step(DDBall c, DDBall y, DDBall dy, DDBall[] powers, DDBall inverse) {
        int size = order + 1;
        DDBall[] a = shift(p2, c, size);
        DDBall[] b = shift(p1, c, size);
        DDBall[] d = shift(p0, c, size);
        if (a[0] == null) {
            return null;
        }
        DDBall inv = monicConstant ? null : a[0].reciprocal();
        if (inv == null && !monicConstant) {
            return null;
        }
        // k_j(m) t^j = [A_j (m−j)(m−j−1) + B_j (m−j) + D_j] t^j with A_j = a_j/a_0,
        // B_j = b_(j−1)/a_0, D_j = d_(j−2)/a_0, so that u_m = c_m t^m = −(1/(m(m−1))) Σ_j k_j(m) t^j u_(m−j).
        for (int j = 1; j <= order; j++) {
            DDBall ra = normalized(a[j], inv);
            DDBall rb = normalized(b[j - 1], inv);
            DDBall rd = j < 2 ? null : normalized(d[j - 2], inv);
            absA[j] = ra == null ? 0 : ra.absUpper();
            absB[j] = rb == null ? 0 : rb.absUpper();
            absD[j] = rd == null ? 0 : rd.absUpper();
            // The inner loop works on (hi, lo, rad) triples with the allocation-free DDBall operations.
            load(ra == null ? null : ra.multiply(powers[j]), j, 0);
            load(rb == null ? null : rb.multiply(powers[j]), j, 1);
            load(rd == null ? null : rd.multiply(powers[j]), j, 2);
        }
        double bigT = powers[1].absUpper();
        if (!(bigT > 0) || !Double.isFinite(bigT)) {
            return null;
        }
        DDBall u1 = dy.multiply(powers[1]);
        uh[0] = y.hi();
        ul[0] = y.lo();
        ur[0] = y.rad();
        uh[1] = u1.hi();
        ul[1] = u1.lo();
        ur[1] = u1.rad();
        termBound[0] = y.absUpper();
        termBound[1] = u1.absUpper();
        double[] o = scratch;
        DDBall.add(uh[0], ul[0], ur[0], uh[1], ul[1], ur[1], o);
        double sh = o[0];
        double sl = o[1];
        double sr = o[2];
        double dh = uh[1]; // Σ m u_m; y'(c + t) = (Σ m u_m) / t
        double dl = ul[1];
        double dr = ur[1];
        for (int m = 2; m < MAX_TERMS; m++) {
            boolean any = false;
            double ah = 0;
            double al = 0;
            double ar = 0;
            for (int j = 1; j <= order && j <= m; j++) {
                boolean has = false;
                double kh = 0;
                double kl = 0;
                double kr = 0;
                if (present[0][j]) {
                    DDBall.multiply(ch[0][j], cl[0][j], cr[0][j], (double) (m - j) * (m - j - 1), o);
                    kh = o[0];
                    kl = o[1];
                    kr = o[2];
                    has = true;
                }
                if (present[1][j]) {
                    DDBall.multiply(ch[1][j], cl[1][j], cr[1][j], m - j, o);
                    if (has) {
                        DDBall.add(kh, kl, kr, o[0], o[1], o[2], o);
                    }
                    kh = o[0];
                    kl = o[1];
                    kr = o[2];
                    has = true;
                }
                if (present[2][j]) {
                    if (has) {
                        DDBall.add(kh, kl, kr, ch[2][j], cl[2][j], cr[2][j], o);
                        kh = o[0];
                        kl = o[1];
                        kr = o[2];
                    } else {
                        kh = ch[2][j];
                        kl = cl[2][j];
                        kr = cr[2][j];
                    }
                    has = true;
                }
                if (!has) {
                    continue;
                }
                DDBall.multiply(kh, kl, kr, uh[m - j], ul[m - j], ur[m - j], o);
                if (any) {
                    DDBall.add(ah, al, ar, o[0], o[1], o[2], o);
                }
                ah = o[0];
                al = o[1];
                ar = o[2];
                any = true;
            }
            DDBall rm = RECIPROCAL_PAIRS[m];
            if (any) {
                DDBall.multiply(ah, al, ar, rm.hi(), rm.lo(), rm.rad(), o);
                uh[m] = -o[0];
                ul[m] = -o[1];
                ur[m] = o[2];
            } else {
                uh[m] = 0;
                ul[m] = 0;
                ur[m] = 0;
            }
            DDBall.add(sh, sl, sr, uh[m], ul[m], ur[m], o);
            sh = o[0];
            sl = o[1];
            sr = o[2];
            DDBall.multiply(uh[m], ul[m], ur[m], m, o);
            DDBall.add(dh, dl, dr, o[0], o[1], o[2], o);
            dh = o[0];
            dl = o[1];
            dr = o[2];
            termBound[m] = DDBall.absUpper(uh[m], ul[m], ur[m]);
            int bigN = m + 1;
            if (bigN > order + 1 && lastTermsSmall(termBound, m, STOP * Math.min(Math.abs(sh), Math.abs(dh)))) {
                double[] tail = tail(bigN, bigT, termBound, absA, absB, absD);
                if (tail != null) {
                    DDBall value = DDBall.of(sh, sl, sr).addError(tail[0]);
                    DDBall derivative = DDBall.of(dh, dl, dr).multiply(inverse).addError(tail[1]);
                    if (!value.isFinite() || !derivative.isFinite()) {
                        return null;
                    }
                    return new DDBall[] {value, derivative};
                }
            }
            if (!Double.isFinite(sh) || !Double.isFinite(sr)) {
                return null;
            }
        }
        return null;
    }

    /** Copies a normalized coefficient ball into the triple arrays (absent when null). */
    private void load(DDBall b, int j, int which) {
        present[which][j] = b != null;
        if (b != null) {
            ch[which][j] = b.hi();
            cl[which][j] = b.lo();
            cr[which][j] = b.rad();
        }
    }

    /** x · inv, or null for an exact zero x; inv null means 1. */
    private static DDBall normalized(DDBall x, DDBall inv) {
        return x == null ? null : inv == null ? x : x.multiply(inv);
    }

    /** Balls containing t^0 … t^J for a ball containing t (J = {@link #order()}). */
    public DDBall[] powers(DDBall t) {
        DDBall[] p = new DDBall[order + 1];
        p[0] = DDBall.of(1.0);
        for (int j = 1; j <= order; j++) {
            p[j] = j == 1 ? t : p[j - 1].multiply(t);
        }
        return p;
    }

    /** J, the order of the coefficient recurrence. */
    public int order() {
        return order;
    }

    /** Heuristic stop: the last J term bounds are all at most {@code limit}. */
    private boolean lastTermsSmall(double[] termBound, int m, double limit) {
        for (int i = Math.max(0, m - order + 1); i <= m; i++) {
            if (!(termBound[i] <= limit)) {
                return false;
            }
        }
        return true;
    }

    /** The value and derivative tail bounds after N terms (class comment), or null. */
    private double[] tail(int bigN, double bigT, double[] termBound, double[] absA, double[] absB, double[] absD) {
        double[] bj = new double[order + 1];
        for (int j = 1; j <= order; j++) {
            bj[j] = (absA[j] + absB[j] / (bigN - 1) + absD[j] / ((double) bigN * (bigN - 1))) * UP3;
        }
        for (double q : new double[] {0.5, 0.75}) {
            double r = bigT / q * UP3;
            double s = 0;
            double rp = 1;
            for (int j = 1; j <= order; j++) {
                rp *= r;
                s += bj[j] * rp;
            }
            s *= UP3;
            if (!(s <= 1)) {
                continue;
            }
            // q' = T/r <= q (r was rounded up from T/q), so q bounds the true ratio.
            double kq = 0;
            for (int k = 0; k < order; k++) {
                int i = bigN - order + k;
                if (i < 0) {
                    continue;
                }
                kq = Math.max(kq, termBound[i] * Math.pow(q, bigN - 1 - i) * UP3);
            }
            double value = kq * q / (1 - q) * UP3;
            double derivative = kq / r * (bigN - (bigN - 1) * q) / ((1 - q) * (1 - q)) * UP3;
            return new double[] {value, derivative};
        }
        return null;
    }

    /** Inflation for short chains of nearest-rounded operations on non-negative doubles (below 2^−40 relative). */
    private static final double UP3 = 1 + 0x1p-40;
}
