package dev.odetab.numeric;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.Random;
import org.junit.jupiter.api.Test;

class ComplexBallTest {
    private static final int PREC = 128;

    @Test
    void squareRootBoundsBracketTheRadicand() {
        // identity: down^2 <= x <= up^2, checked exactly, and the two differ by about one unit
        for (String x : new String[] {"2", "5", "0.0003", "1e-40", "123456789.123456789", "4"}) {
            BigDecimal v = new BigDecimal(x);
            BigDecimal up = ComplexBall.sqrtUp(v, 30);
            BigDecimal down = ComplexBall.sqrtDown(v, 30);
            assertTrue(up.multiply(up).compareTo(v) >= 0, x);
            assertTrue(down.multiply(down).compareTo(v) <= 0, x);
            assertTrue(up.subtract(down).compareTo(up.ulp().multiply(BigDecimal.valueOf(2))) <= 0, x);
        }
        assertEquals(0, ComplexBall.sqrtUp(new BigDecimal("4"), 30).compareTo(BigDecimal.valueOf(2)));
    }

    @Test
    void divisionContainsTheExactQuotient() {
        // (1 + 2i) / (3 - 4i) = (1 + 2i)(3 + 4i) / 25 = (-5 + 10i) / 25 = -1/5 + 2/5 i
        ComplexBall q = ComplexBall.exact(BigDecimal.ONE, BigDecimal.valueOf(2))
                .divide(ComplexBall.exact(BigDecimal.valueOf(3), BigDecimal.valueOf(-4)), PREC);
        assertTrue(q.re().contains(Rational.of(-1, 5)));
        assertTrue(q.im().contains(Rational.of(2, 5)));
        assertThrows(ArithmeticException.class, () -> ComplexBall.ONE.divide(ComplexBall.ZERO, PREC));
    }

    @Test
    void productAndQuotientContainPointsOfTheInputs() {
        long seed = Long.getLong("test.seed", 20240611L);
        Random rnd = new Random(seed);
        for (int t = 0; t < 200; t++) {
            BigDecimal ar = BigDecimal.valueOf(rnd.nextGaussian());
            BigDecimal ai = BigDecimal.valueOf(rnd.nextGaussian());
            BigDecimal br = BigDecimal.valueOf(rnd.nextGaussian() + 3);
            BigDecimal bi = BigDecimal.valueOf(rnd.nextGaussian());
            BigDecimal r = new BigDecimal("1e-10");
            ComplexBall a = new ComplexBall(Ball.of(ar, r), Ball.of(ai, r));
            ComplexBall b = new ComplexBall(Ball.of(br, r), Ball.of(bi, r));
            // a point inside both input rectangles: shift the midpoints by half the radius
            Rational xr = Rational.of(ar).add(Rational.of(r).divide(Rational.TWO));
            Rational xi = Rational.of(ai).subtract(Rational.of(r).divide(Rational.TWO));
            Rational yr = Rational.of(br).subtract(Rational.of(r).divide(Rational.TWO));
            Rational yi = Rational.of(bi);
            Rational pr = xr.multiply(yr).subtract(xi.multiply(yi));
            Rational pi = xr.multiply(yi).add(xi.multiply(yr));
            ComplexBall p = a.multiply(b, PREC);
            String ctx = "seed " + seed + " a = " + a + " b = " + b;
            assertTrue(p.re().contains(pr) && p.im().contains(pi), ctx);
            Rational den = yr.multiply(yr).add(yi.multiply(yi));
            Rational qr = xr.multiply(yr).add(xi.multiply(yi)).divide(den);
            Rational qi = xi.multiply(yr).subtract(xr.multiply(yi)).divide(den);
            ComplexBall q = a.divide(b, PREC);
            assertTrue(q.re().contains(qr) && q.im().contains(qi), ctx);
            assertTrue(q.absUpper().multiply(q.absUpper()).compareTo(qr.multiply(qr).add(qi.multiply(qi)).toBigDecimal(java.math.MathContext.DECIMAL128)) >= 0, ctx);
        }
    }
}
