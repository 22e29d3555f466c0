package dev.odetab.numeric;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;

/**
 * A real ball [mid − rad, mid + rad]: midpoint at working precision, radius rounded upward.
 *
 * <p>Trust level: Rigorous. Invariant: every operation returns a ball that contains every
 * exact result of its operation applied to any points of its input balls. The midpoint is
 * rounded half-even to {@link Precision#digits10(int)} digits; that rounding error (computed
 * exactly for +, −, ×, bounded by one unit in the last place for ÷) is added to the radius,
 * and radii are combined with upward rounding ({@link Directed}). Technique: Johansson,
 * "Arb: efficient arbitrary-precision midpoint-radius interval arithmetic", IEEE Trans.
 * Computers 66(8), 2017, section 2.
 *
 * @param mid the midpoint
 * @param rad the radius, non-negative
 */
public record Ball(BigDecimal mid, BigDecimal rad) {
    public static final Ball ZERO = new Ball(BigDecimal.ZERO, BigDecimal.ZERO);
    public static final Ball ONE = new Ball(BigDecimal.ONE, BigDecimal.ZERO);

    public Ball {
        if (rad.signum() < 0) {
            throw new IllegalArgumentException("negative radius " + rad);
        }
    }

    /** The exact point {@code value} (radius zero). */
    public static Ball exact(BigDecimal value) {
        return new Ball(value, BigDecimal.ZERO);
    }

    public static Ball exact(long value) {
        return new Ball(BigDecimal.valueOf(value), BigDecimal.ZERO);
    }

    /** A ball around {@code mid} of radius at least {@code rad} (the radius is rounded up). */
    public static Ball of(BigDecimal mid, BigDecimal rad) {
        return new Ball(mid, Directed.up(rad.abs()));
    }

    /** The rational {@code r} at {@code precBits}: the midpoint is r rounded, the radius the exact rounding error rounded up. */
    public static Ball of(Rational r, int precBits) {
        BigDecimal exact = r.toBigDecimalExact();
        if (exact != null && exact.precision() <= Precision.digits10(precBits)) {
            return exact(exact);
        }
        BigDecimal m = r.toBigDecimal(Precision.midpoint(precBits));
        Rational err = r.subtract(Rational.of(m)).abs();
        return new Ball(m, Directed.absUp(err));
    }

    public BigDecimal lower() {
        return mid.subtract(rad);
    }

    public BigDecimal upper() {
        return mid.add(rad);
    }

    /** An upper bound of |x| over the ball (exact: |mid| + rad). */
    public BigDecimal absUpper() {
        return mid.abs().add(rad);
    }

    /** A lower bound of |x| over the ball, zero when the ball contains zero. */
    public BigDecimal absLower() {
        BigDecimal v = mid.abs().subtract(rad);
        return v.signum() > 0 ? v : BigDecimal.ZERO;
    }

    public boolean isExact() {
        return rad.signum() == 0;
    }

    public boolean containsZero() {
        return mid.abs().compareTo(rad) <= 0;
    }

    public boolean contains(BigDecimal x) {
        return x.subtract(mid).abs().compareTo(rad) <= 0;
    }

    public boolean contains(Rational x) {
        return x.subtract(Rational.of(mid)).abs().compareTo(Rational.of(rad)) <= 0;
    }

    public boolean contains(Ball inner) {
        return inner.mid.subtract(mid).abs().add(inner.rad).compareTo(rad) <= 0;
    }

    public boolean overlaps(Ball o) {
        return mid.subtract(o.mid).abs().compareTo(rad.add(o.rad)) <= 0;
    }

    /** The same ball with its radius widened by {@code extra} (an error bound from outside). */
    public Ball addError(BigDecimal extra) {
        return new Ball(mid, Directed.addUp(rad, extra.abs()));
    }

    public Ball negate() {
        return new Ball(mid.negate(), rad);
    }

    /** Rigorous: the sum; the midpoint's rounding error is computed exactly and joins the radius. */
    public Ball add(Ball o, int precBits) {
        return rounded(mid.add(o.mid), rad.add(o.rad), precBits);
    }

    /** Rigorous: the difference; the midpoint's rounding error is computed exactly and joins the radius. */
    public Ball subtract(Ball o, int precBits) {
        return rounded(mid.subtract(o.mid), rad.add(o.rad), precBits);
    }

    /** Product: |xy − m1 m2| &lt;= |m1| r2 + |m2| r1 + r1 r2 for |x − m1| &lt;= r1, |y − m2| &lt;= r2. */
    public Ball multiply(Ball o, int precBits) {
        BigDecimal r = mid.abs().multiply(o.rad).add(o.mid.abs().multiply(rad)).add(rad.multiply(o.rad));
        return rounded(mid.multiply(o.mid), r, precBits);
    }

    /** Product with an exact rational: one exact integer product, then one rounded division. */
    public Ball multiply(Rational q, int precBits) {
        Ball p = multiplyExact(q.numerator());
        return q.isInteger() ? p.round(precBits) : p.divide(q.denominator(), precBits);
    }

    /** Product with an integer, midpoint not rounded (exact), radius rounded up. */
    public Ball multiplyExact(BigInteger k) {
        BigDecimal kd = new BigDecimal(k);
        return new Ball(mid.multiply(kd), rad.signum() == 0 ? BigDecimal.ZERO : Directed.mulUp(rad, kd.abs()));
    }

    /** Sum with the midpoint not rounded (exact), radius rounded up. */
    public Ball addExact(Ball o) {
        BigDecimal r = rad.add(o.rad);
        return new Ball(mid.add(o.mid), r.signum() == 0 ? BigDecimal.ZERO : Directed.up(r));
    }

    /**
     * Quotient by a non-zero integer. The midpoint is rounded half-even, so its error is at
     * most half a unit in its last place, bounded here by one unit ({@link BigDecimal#ulp()});
     * the radius scales by 1/|k| rounded up.
     */
    public Ball divide(BigInteger k, int precBits) {
        if (k.signum() == 0) {
            throw new ArithmeticException("division by zero");
        }
        BigDecimal kd = new BigDecimal(k);
        BigDecimal m = mid.divide(kd, Precision.midpoint(precBits));
        boolean exactQuotient = m.multiply(kd).compareTo(mid) == 0;
        BigDecimal roundErr = exactQuotient ? BigDecimal.ZERO : m.ulp();
        BigDecimal r = rad.signum() == 0 ? BigDecimal.ZERO : Directed.divUp(rad, kd.abs());
        BigDecimal total = r.add(roundErr);
        return new Ball(m, total.signum() == 0 ? BigDecimal.ZERO : Directed.up(total));
    }

    /**
     * Quotient. Needs a divisor ball free of zero. For |x − m1| &lt;= r1, |y − m2| &lt;= r2 &lt; |m2|:
     * |x/y − m1/m2| = |x m2 − m1 y| / (|y| |m2|) &lt;= (r1 |m2| + |m1| r2) / ((|m2| − r2) |m2|).
     *
     * @throws ArithmeticException when the divisor contains zero
     */
    public Ball divide(Ball o, int precBits) {
        if (o.containsZero()) {
            throw new ArithmeticException("division by a ball that contains zero: " + o);
        }
        MathContext mc = Precision.midpoint(precBits);
        BigDecimal m = mid.divide(o.mid, mc);
        // An exact quotient may come back with few digits (1/5 = 0.2), so its own ulp would be a
        // needlessly large bound; an inexact one is rounded to the context's digits, so its
        // error is below one unit in digit mc.getPrecision() of m: 10^(e − digits), m < 10^e.
        BigDecimal roundErr = m.multiply(o.mid).compareTo(mid) == 0
                ? BigDecimal.ZERO
                : BigDecimal.ONE.scaleByPowerOfTen(m.precision() - m.scale() - mc.getPrecision());
        BigDecimal r = BigDecimal.ZERO;
        if (rad.signum() != 0 || o.rad.signum() != 0) {
            BigDecimal num = Directed.up(rad.multiply(o.mid.abs()).add(mid.abs().multiply(o.rad)));
            BigDecimal den = Directed.mulDown(Directed.subDown(o.mid.abs(), o.rad), o.mid.abs());
            r = Directed.divUp(num, den);
        }
        return new Ball(m, Directed.addUp(r, roundErr));
    }

    /** Quotient by an exact non-zero rational. */
    public Ball divide(Rational q, int precBits) {
        if (q.isInteger()) {
            return divide(exact(new BigDecimal(q.numerator())), precBits);
        }
        return divide(of(q, precBits), precBits);
    }

    /** Rigorous: the square, as the product of the ball with itself (an overestimate when the ball contains 0). */
    public Ball square(int precBits) {
        return multiply(this, precBits);
    }

    /** this^k for k &gt;= 0 by repeated squaring in ball arithmetic. */
    public Ball pow(int k, int precBits) {
        if (k < 0) {
            return ONE.divide(pow(-k, precBits), precBits);
        }
        Ball r = ONE;
        Ball base = this;
        int e = k;
        while (e > 0) {
            if ((e & 1) != 0) {
                r = r.multiply(base, precBits);
            }
            e >>= 1;
            if (e > 0) {
                base = base.square(precBits);
            }
        }
        return r;
    }

    /** The smallest ball (up to radius rounding) containing both balls. */
    public Ball union(Ball o) {
        BigDecimal lo = lower().min(o.lower());
        BigDecimal hi = upper().max(o.upper());
        BigDecimal m = lo.add(hi).divide(BigDecimal.valueOf(2));
        return new Ball(m, Directed.up(hi.subtract(m)));
    }

    /** The ball [lo, hi] for exact endpoints lo &lt;= hi. */
    public static Ball fromEndpoints(BigDecimal lo, BigDecimal hi) {
        BigDecimal m = lo.add(hi).divide(BigDecimal.valueOf(2));
        return new Ball(m, Directed.up(hi.subtract(m).abs()));
    }

    /** The same ball with its midpoint rounded to {@code precBits} (the rounding error joins the radius). */
    public Ball round(int precBits) {
        return rounded(mid, rad, precBits);
    }

    /** Relative accuracy in bits: about −log2(rad / |mid|); Integer.MAX_VALUE for exact balls. A heuristic measure. */
    public int accuracyBitsEstimate() {
        if (rad.signum() == 0) {
            return Integer.MAX_VALUE;
        }
        if (mid.signum() == 0) {
            return Integer.MIN_VALUE;
        }
        double log10 = (mid.precision() - mid.scale()) - (rad.precision() - rad.scale());
        return (int) Math.floor(log10 * 3.32192809488736) - 4;
    }

    private static Ball rounded(BigDecimal exactMid, BigDecimal radius, int precBits) {
        BigDecimal m = exactMid.round(Precision.midpoint(precBits));
        BigDecimal err = exactMid.subtract(m).abs();
        BigDecimal r = radius.add(err);
        return new Ball(m, r.signum() == 0 ? BigDecimal.ZERO : Directed.up(r));
    }

    @Override
    public String toString() {
        return "[" + mid.toString() + " +/- " + rad.toString() + "]";
    }
}
