package dev.odetab.numeric;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Arithmetic on non-negative error terms with directed rounding.
 *
 * <p>Trust level: Rigorous. {@code …Up} returns a number &gt;= the exact result, {@code …Down}
 * a number &lt;= it; the exact result is formed first (BigDecimal add, subtract and multiply
 * are exact) and then rounded with {@link RoundingMode#CEILING} or {@link RoundingMode#FLOOR}
 * to {@link Precision#RADIUS_DIGITS} digits. Division rounds the quotient itself in the
 * named direction (BigDecimal's division rounds correctly in the given mode).
 */
public final class Directed {
    private Directed() {
    }

    public static BigDecimal up(BigDecimal exact) {
        return exact.round(Precision.RADIUS_UP);
    }

    public static BigDecimal down(BigDecimal exact) {
        return exact.round(Precision.RADIUS_DOWN);
    }

    public static BigDecimal addUp(BigDecimal a, BigDecimal b) {
        return up(a.add(b));
    }

    public static BigDecimal subDown(BigDecimal a, BigDecimal b) {
        return down(a.subtract(b));
    }

    public static BigDecimal mulUp(BigDecimal a, BigDecimal b) {
        return up(a.multiply(b));
    }

    public static BigDecimal mulDown(BigDecimal a, BigDecimal b) {
        return down(a.multiply(b));
    }

    public static BigDecimal divUp(BigDecimal a, BigDecimal b) {
        return a.divide(b, Precision.RADIUS_UP);
    }

    /** a^k rounded up, for a &gt;= 0 (each factor is rounded up, so the product only grows). */
    public static BigDecimal powUp(BigDecimal a, int k) {
        BigDecimal r = BigDecimal.ONE;
        BigDecimal base = a;
        int e = k;
        while (e > 0) {
            if ((e & 1) != 0) {
                r = mulUp(r, base);
            }
            e >>= 1;
            if (e > 0) {
                base = mulUp(base, base);
            }
        }
        return r;
    }

    /** Upper bound of |r| for an exact rational. */
    public static BigDecimal absUp(Rational r) {
        return r.abs().toBigDecimal(new MathContext(Precision.RADIUS_DIGITS, RoundingMode.CEILING));
    }

    /** Lower bound of |r| for an exact rational. */
    public static BigDecimal absDown(Rational r) {
        return r.abs().toBigDecimal(new MathContext(Precision.RADIUS_DIGITS, RoundingMode.FLOOR));
    }
}
