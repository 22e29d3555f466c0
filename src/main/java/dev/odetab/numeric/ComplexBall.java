package dev.odetab.numeric;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * A complex rectangle re + i·im with real and imaginary parts given as {@link Ball}s.
 *
 * <p>Trust level: Rigorous. Invariant: every operation returns a rectangle that contains
 * every exact result of the operation applied to any points of its inputs, because each
 * part is formed from real {@link Ball} operations, which are rigorous. The dependency
 * between the two parts is ignored, so the result may be wider than the true image, never
 * narrower. Technique: Johansson, "Arb: efficient arbitrary-precision midpoint-radius
 * interval arithmetic", IEEE Trans. Computers 66(8), 2017 (the acb type is the same pair of
 * real balls).
 *
 * @param re the real part
 * @param im the imaginary part
 */
public record ComplexBall(Ball re, Ball im) {
    public static final ComplexBall ZERO = new ComplexBall(Ball.ZERO, Ball.ZERO);
    public static final ComplexBall ONE = new ComplexBall(Ball.ONE, Ball.ZERO);

    /** Exact: the point re + i·im (both radii zero). */
    public static ComplexBall exact(BigDecimal re, BigDecimal im) {
        return new ComplexBall(Ball.exact(re), Ball.exact(im));
    }

    /** Rigorous: contains the rational point re + i·im; midpoints at {@code precBits}, see {@link Ball#of(Rational, int)}. */
    public static ComplexBall of(Rational re, Rational im, int precBits) {
        return new ComplexBall(Ball.of(re, precBits), Ball.of(im, precBits));
    }

    /** Rigorous: contains every sum of points of the two rectangles. */
    public ComplexBall add(ComplexBall o, int precBits) {
        return new ComplexBall(re.add(o.re, precBits), im.add(o.im, precBits));
    }

    /** Rigorous: contains every difference of points of the two rectangles. */
    public ComplexBall subtract(ComplexBall o, int precBits) {
        return new ComplexBall(re.subtract(o.re, precBits), im.subtract(o.im, precBits));
    }

    /** Rigorous: (a + bi)(c + di) = (ac − bd) + (ad + bc)i, each product a rigorous real ball. */
    public ComplexBall multiply(ComplexBall o, int precBits) {
        Ball r = re.multiply(o.re, precBits).subtract(im.multiply(o.im, precBits), precBits);
        Ball i = re.multiply(o.im, precBits).add(im.multiply(o.re, precBits), precBits);
        return new ComplexBall(r, i);
    }

    /**
     * Rigorous: (a + bi)/(c + di) = (a + bi)(c − di)/(c² + d²), each part a rigorous real ball.
     *
     * @throws ArithmeticException when the ball c² + d² contains zero (the divisor may vanish)
     */
    public ComplexBall divide(ComplexBall o, int precBits) {
        Ball den = o.re.square(precBits).add(o.im.square(precBits), precBits);
        ComplexBall num = multiply(new ComplexBall(o.re, o.im.negate()), precBits);
        return new ComplexBall(num.re.divide(den, precBits), num.im.divide(den, precBits));
    }

    /** Rigorous: false only when the rectangle surely excludes zero (true when both parts contain zero). */
    public boolean containsZero() {
        return re.containsZero() && im.containsZero();
    }

    /**
     * Rigorous: an upper bound of |z| over the rectangle: sqrt(A² + B²) rounded up, with A, B the
     * upper bounds of |re| and |im| (|z|² = re² + im² &lt;= A² + B²).
     */
    public BigDecimal absUpper() {
        BigDecimal a = re.absUpper();
        BigDecimal b = im.absUpper();
        return sqrtUp(a.multiply(a).add(b.multiply(b)), Precision.RADIUS_DIGITS);
    }

    /**
     * Trust level: Rigorous. A number s &gt;= sqrt(x) with {@code digits} significant digits,
     * for x &gt;= 0; checked exactly: s·s &gt;= x holds for the returned s (BigDecimal products are
     * exact), whatever the rounding of {@link BigDecimal#sqrt(MathContext)}.
     */
    public static BigDecimal sqrtUp(BigDecimal x, int digits) {
        if (x.signum() == 0) {
            return BigDecimal.ZERO;
        }
        BigDecimal s = x.sqrt(new MathContext(digits, RoundingMode.CEILING));
        while (s.multiply(s).compareTo(x) < 0) {
            s = s.add(s.ulp());
        }
        return s;
    }

    /**
     * Trust level: Rigorous. A number s &lt;= sqrt(x), s &gt;= 0, with {@code digits} significant
     * digits, for x &gt;= 0; checked exactly: s·s &lt;= x holds for the returned s.
     */
    public static BigDecimal sqrtDown(BigDecimal x, int digits) {
        if (x.signum() == 0) {
            return BigDecimal.ZERO;
        }
        BigDecimal s = x.sqrt(new MathContext(digits, RoundingMode.FLOOR));
        while (s.signum() > 0 && s.multiply(s).compareTo(x) > 0) {
            s = s.subtract(s.ulp());
        }
        return s.max(BigDecimal.ZERO);
    }

    @Override
    public String toString() {
        return re + " + i*" + im;
    }
}
