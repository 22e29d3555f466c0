package dev.odetab.numeric;

import java.math.BigDecimal;

/**
 * A ball with a double-double midpoint and a binary64 radius: the set of reals within
 * {@code rad} of the exact sum {@code hi + lo}. The fast tier of the table evaluator.
 *
 * <p>Trust level: Rigorous. Every operation returns a ball that contains the exact result for
 * every pair of points of its operands, provided the binary64 operations round to nearest
 * (Java guarantees it, JLS §15.4) and nothing overflows. The argument, per operation, is
 * written beside it; it uses only that a rounded operation on doubles has a relative error of at
 * most u = 2^−53 away from the subnormal range (IEEE 754-2019 §4.3.1; Muller et al., Handbook of
 * Floating-Point Arithmetic, 2nd ed., 2018, ch. 2), that Knuth's TwoSum and the FMA-based TwoProd
 * are exact (ibid. §4.3, §4.4), and absolute errors of at most 2^−1075 per operation in the
 * subnormal range. The midpoint arithmetic is the plain double-double of Dekker and Knuth; its
 * rounding errors are not taken from published bounds but measured from the computed terms, so
 * the radius is rigorous whatever the midpoint's accuracy.
 *
 * <p>Radii are computed with rounding to nearest from non-negative terms (at most 16 operations
 * each, relative error below 17u) and then multiplied by {@link #UP} = 1 + 2^−47 &gt; (1 + u)^17,
 * plus {@link #TINY} = 2^−1050, which exceeds 16 subnormal rounding errors; so each radius is an
 * upper bound. A result that is infinite or NaN anywhere is caught by {@link #isFinite()}: the
 * caller must then give up (an overflow proves nothing).
 *
 * <p>Derivation: docs/methods.md §10 (the fast tier: the error bound of each operation).
 */
public final class DDBall {
    /** u = 2^−53, the unit roundoff of binary64. */
    static final double U = 0x1p-53;
    /** Inflation factor for radii computed with rounding to nearest (class comment). */
    static final double UP = 1 + 0x1p-47;
    /** Absolute allowance for subnormal rounding errors (class comment). */
    static final double TINY = 0x1p-1050;

    public static final DDBall ZERO = new DDBall(0, 0, 0);

    private final double hi;
    private final double lo;
    private final double rad;

    private DDBall(double hi, double lo, double rad) {
        this.hi = hi;
        this.lo = lo;
        this.rad = rad;
    }

    /** The exact double d (radius 0). */
    public static DDBall of(double d) {
        return new DDBall(d, 0, 0);
    }

    /**
     * A ball containing the exact rational r. Rigorous: hi and lo are successive nearest
     * roundings of the exact remainders, and the radius bounds the last remainder from above.
     */
    public static DDBall of(Rational r) {
        BigDecimal x = r.toBigDecimalExact();
        if (x != null) {
            return of(x, BigDecimal.ZERO);
        }
        // |r − m| <= 2^−140 |m|-ish: the conversion's own error is bounded below.
        BigDecimal m = r.toBigDecimal(new java.math.MathContext(60, java.math.RoundingMode.HALF_EVEN));
        BigDecimal err = r.subtract(Rational.of(m)).abs().toBigDecimal(new java.math.MathContext(3, java.math.RoundingMode.CEILING));
        return of(m, err);
    }

    /**
     * A ball containing the ball [mid ± rad] (BigDecimal). Rigorous: hi = RN(mid),
     * lo = RN(mid − hi), and the remainder mid − hi − lo, computed exactly, is added to the radius
     * rounded up (nextUp of a nearest rounding of a non-negative value is above it).
     */
    public static DDBall of(BigDecimal mid, BigDecimal radius) {
        double h = mid.doubleValue();
        if (!Double.isFinite(h)) {
            return new DDBall(h, 0, Double.POSITIVE_INFINITY);
        }
        BigDecimal rem = mid.subtract(new BigDecimal(h));
        double l = rem.doubleValue();
        BigDecimal rem2 = rem.subtract(new BigDecimal(l)).abs();
        BigDecimal total = rem2.add(radius);
        double r = total.signum() == 0 ? 0 : Math.nextUp(total.doubleValue());
        return new DDBall(h, l, r);
    }

    /** A ball containing the BigDecimal ball b. */
    public static DDBall of(Ball b) {
        return of(b.mid(), b.rad());
    }

    /** The same ball as a BigDecimal {@link Ball} (exact conversion). */
    public Ball toBall() {
        return Ball.of(new BigDecimal(hi).add(new BigDecimal(lo)), new BigDecimal(rad));
    }

    public double hi() {
        return hi;
    }

    public double lo() {
        return lo;
    }

    public double rad() {
        return rad;
    }

    /** True when the midpoint and the radius are finite numbers (else the ball proves nothing). */
    public boolean isFinite() {
        return Double.isFinite(hi) && Double.isFinite(lo) && Double.isFinite(rad);
    }

    /** An upper bound of |x| over the ball. */
    public double absUpper() {
        return absUpper(hi, lo, rad);
    }

    /** A lower bound of |x| over the ball (0 when the ball contains 0). */
    public double absLower() {
        double m = ((Math.abs(hi) - Math.abs(lo)) * (1 - 0x1p-50) - rad * UP - TINY) * (1 - 0x1p-50);
        return m > 0 ? m : 0;
    }

    public DDBall negate() {
        return new DDBall(-hi, -lo, rad);
    }

    /** The ball widened by e &gt;= 0. */
    public DDBall addError(double e) {
        return new DDBall(hi, lo, (rad + e) * UP + TINY);
    }

    /**
     * x + y. The head sum is exact (TwoSum); t1 = RN(x.lo + y.lo) and t2 = RN(t1 + e) err by at
     * most u|t1| and u|t2|; the final renormalization is exact (TwoSum).
     */
    public DDBall add(DDBall y) {
        double[] o = new double[3];
        add(hi, lo, rad, y.hi, y.lo, y.rad, o);
        return new DDBall(o[0], o[1], o[2]);
    }

    /**
     * The sum of the balls (ah + al ± ar) and (bh + bl ± br) into {@code out} = {hi, lo, rad}:
     * {@link #add(DDBall)} without objects, for inner loops.
     */
    public static void add(double ah, double al, double ar, double bh, double bl, double br, double[] out) {
        double s = ah + bh;
        double bb = s - ah;
        double e = (ah - (s - bb)) + (bh - bb);
        double t1 = al + bl;
        double t2 = t1 + e;
        double h = s + t2;
        double b2 = h - s;
        out[0] = h;
        out[1] = (s - (h - b2)) + (t2 - b2);
        out[2] = (ar + br + U * (Math.abs(t1) + Math.abs(t2))) * UP + TINY;
    }

    public DDBall subtract(DDBall y) {
        return add(y.negate());
    }

    /**
     * x · y. The head product is exact (TwoProd with FMA); the cross terms t1, t2 and their sums
     * t3, t4 err by at most u times their computed magnitudes; the dropped x.lo·y.lo is added
     * whole. For the radii, |x·y − mx·my| &lt;= |mx| ry + |my| rx + rx ry.
     */
    public DDBall multiply(DDBall y) {
        double[] o = new double[3];
        multiply(hi, lo, rad, y.hi, y.lo, y.rad, o);
        return new DDBall(o[0], o[1], o[2]);
    }

    /** The product of two balls into {@code out}: {@link #multiply(DDBall)} without objects. */
    public static void multiply(double xh, double xl, double xr, double yh, double yl, double yr, double[] out) {
        double p = xh * yh;
        double e = Math.fma(xh, yh, -p);
        double t1 = xh * yl;
        double t2 = xl * yh;
        double t3 = t1 + t2;
        double t4 = t3 + e;
        double h = p + t4;
        double b2 = h - p;
        double ax = Math.abs(xh) + Math.abs(xl);
        double ay = Math.abs(yh) + Math.abs(yl);
        double err = U * (Math.abs(t1) + Math.abs(t2) + Math.abs(t3) + Math.abs(t4)) + Math.abs(xl * yl);
        out[0] = h;
        out[1] = (p - (h - b2)) + (t4 - b2);
        out[2] = (ax * yr + ay * xr + xr * yr + err) * UP + TINY;
    }

    /** x · k for an exact double k (the product {@link #multiply} with an exact ball). */
    public DDBall multiply(double k) {
        double[] o = new double[3];
        multiply(hi, lo, rad, k, o);
        return new DDBall(o[0], o[1], o[2]);
    }

    /** The ball times an exact double k into {@code out}: {@link #multiply(double)} without objects. */
    public static void multiply(double xh, double xl, double xr, double k, double[] out) {
        double p = xh * k;
        double e = Math.fma(xh, k, -p);
        double t2 = xl * k;
        double t4 = t2 + e;
        double h = p + t4;
        double b2 = h - p;
        out[0] = h;
        out[1] = (p - (h - b2)) + (t4 - b2);
        out[2] = (Math.abs(k) * xr + U * (Math.abs(t2) + Math.abs(t4))) * UP + TINY;
    }

    /** An upper bound of |x| over the ball (ah + al ± ar): {@link #absUpper()} without objects. */
    public static double absUpper(double h, double l, double r) {
        return (Math.abs(h) + Math.abs(l) + r) * UP + TINY;
    }

    /** The ball from its three parts (hi + lo ± rad); rad must be a non-negative upper bound. */
    public static DDBall of(double hi, double lo, double rad) {
        return new DDBall(hi, lo, rad);
    }

    /**
     * 1/x, or null when the ball may contain 0 or the residual test fails. Rigorous: q is a
     * double-double guess (one Newton step from 1/hi, plain arithmetic); e = 1 − x·q is enclosed
     * in ball arithmetic for every x of the ball; when |e| &lt;= E &lt; 1/2, 1/x = q/(1 − e) and
     * |1/x − q| = |q| |e|/|1 − e| &lt;= |q| E/(1 − E).
     */
    public DDBall reciprocal() {
        if (absLower() == 0 || !isFinite()) {
            return null;
        }
        double q0 = 1 / hi;
        double p = hi * q0;
        double pe = Math.fma(hi, q0, -p);
        double res = ((1 - p) - pe) - lo * q0;
        double q1 = q0 * res;
        double h = q0 + q1;
        double l = q1 - (h - q0);
        DDBall q = new DDBall(h, l, 0);
        DDBall e = ONE_EXACT.subtract(multiply(q));
        double bigE = e.absUpper();
        if (!(bigE < 0.5)) {
            return null;
        }
        double aq = Math.abs(h) + Math.abs(l);
        double r = (aq * bigE / (1 - bigE)) * UP + TINY;
        return new DDBall(h, l, r);
    }

    private static final DDBall ONE_EXACT = of(1.0);

    /**
     * A double that is &lt;= every point of the ball: nextDown(hi + RN(lo − rad)) style. Rigorous:
     * RN(lo − rad) is at most one ulp above lo − rad, so its nextDown is below; the sum with hi is
     * rounded once more and lowered again.
     */
    public double lowerDouble() {
        double l = Math.nextDown(lo - rad);
        return Math.nextDown(hi + l);
    }

    /** A double that is &gt;= every point of the ball (mirror of {@link #lowerDouble}). */
    public double upperDouble() {
        double u = Math.nextUp(lo + rad);
        return Math.nextUp(hi + u);
    }

    /**
     * The binary64 nearest (ties to even) to every point of the ball, when they all round to the
     * same double; NaN otherwise. Rigorous: with L = hi + nextDown(RN(lo − rad)) &lt;= every point
     * and H = hi + nextUp(RN(lo + rad)) &gt;= every point (exact sums), Java's {@code hi + l} is
     * the correctly rounded RN(L); rounding is monotone, so RN(L) = RN(H) forces every point of
     * [L, H] to round to it.
     */
    public double roundBinary64() {
        double lower = hi + Math.nextDown(lo - rad);
        double upper = hi + Math.nextUp(lo + rad);
        if (lower == upper && Double.isFinite(lower) && isFinite()) {
            return lower == 0 ? Double.NaN : lower;
        }
        return Double.NaN;
    }

    /**
     * The binary32 nearest (ties to even) to every point of the ball, when they all round to the
     * same float; NaN otherwise. Rigorous: {@link #lowerDouble} and {@link #upperDouble} bound the
     * ball; the cast of a double to float is the correctly rounded nearest-even (JLS §5.1.3), and
     * monotone.
     */
    public float roundBinary32() {
        double lower = lowerDouble();
        double upper = upperDouble();
        if (!isFinite() || !Double.isFinite(lower) || !Double.isFinite(upper)) {
            return Float.NaN;
        }
        float a = (float) lower;
        float b = (float) upper;
        if (a == b && a != 0 && Float.isFinite(a)) {
            return a;
        }
        return Float.NaN;
    }

    @Override
    public String toString() {
        return "[" + hi + " + " + lo + " ± " + rad + "]";
    }
}
