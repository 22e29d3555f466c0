package dev.odetab.numeric;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Containment of the double-double ball operations, checked in exact rational arithmetic: for
 * random balls, the exact result at the ends and the middle of the operands lies in the result
 * ball; the fast binary64/binary32 roundings agree with IEEE 754-2019 round-to-nearest-even as
 * computed exactly by {@link Rounding#round} (itself checked against Java's correctly rounded
 * conversions in RoundingTest) at every point checked.
 */
class DDBallTest {
    private static final long SEED = Long.getLong("test.seed", 20261202L);

    private static Rational exact(double d) {
        return Rational.of(new BigDecimal(d));
    }

    private static Rational mid(DDBall b) {
        return exact(b.hi()).add(exact(b.lo()));
    }

    /** The two ends and the middle of the ball, exactly. */
    private static Rational[] points(DDBall b) {
        Rational m = mid(b);
        Rational r = exact(b.rad());
        return new Rational[] {m.subtract(r), m, m.add(r)};
    }

    private static boolean contains(DDBall b, Rational x) {
        return x.subtract(mid(b)).abs().compareTo(exact(b.rad())) <= 0;
    }

    private static DDBall random(Random rnd) {
        double hi = (rnd.nextDouble() - 0.5) * Math.scalb(1.0, rnd.nextInt(80) - 40);
        double lo = hi * (rnd.nextDouble() - 0.5) * 0x1p-53;
        double rad = rnd.nextInt(4) == 0 ? 0 : Math.abs(hi) * Math.scalb(rnd.nextDouble(), -60 - rnd.nextInt(50));
        return DDBall.of(new BigDecimal(hi).add(new BigDecimal(lo)), new BigDecimal(rad));
    }

    @Test
    void sumsProductsAndReciprocalsContainTheExactResults() {
        Random rnd = new Random(SEED);
        for (int k = 0; k < 1000; k++) {
            DDBall x = random(rnd);
            DDBall y = random(rnd);
            double kd = Math.rint((rnd.nextDouble() - 0.5) * 1e6);
            DDBall sum = x.add(y);
            DDBall product = x.multiply(y);
            DDBall scaled = x.multiply(kd);
            DDBall inverse = x.reciprocal();
            for (Rational a : points(x)) {
                for (Rational b : points(y)) {
                    assertTrue(contains(sum, a.add(b)), "seed " + SEED + ": " + x + " + " + y + " = " + sum);
                    assertTrue(contains(product, a.multiply(b)), "seed " + SEED + ": " + x + " * " + y + " = " + product);
                }
                assertTrue(contains(scaled, a.multiply(exact(kd))), "seed " + SEED + ": " + x + " * " + kd);
                if (inverse != null) {
                    assertTrue(contains(inverse, a.reciprocal()), "seed " + SEED + ": 1/" + x + " = " + inverse);
                }
            }
            // The radius stays near the operands' (the bounds are not vacuous).
            assertTrue(product.rad() <= (x.absUpper() * y.rad() + y.absUpper() * x.rad() + x.rad() * y.rad())
                    * 1.01 + Math.abs(product.hi()) * 0x1p-100 + 1e-300, "product radius too wide: " + product);
        }
    }

    @Test
    void aBallAroundZeroHasNoReciprocal() {
        assertNull(DDBall.of(new BigDecimal("1e-30"), new BigDecimal("2e-30")).reciprocal());
        assertNotNull(DDBall.of(new BigDecimal("3"), new BigDecimal("1e-30")).reciprocal());
    }

    @Test
    void fastRoundingsAgreeWithExactRoundingAtEveryPointOfTheBall() {
        Random rnd = new Random(SEED + 1);
        int decided64 = 0;
        int decided32 = 0;
        for (int k = 0; k < 6000; k++) {
            double d = (rnd.nextDouble() - 0.5) * Math.scalb(1.0, rnd.nextInt(200) - 100);
            // Points near a binary64 (or binary32) rounding boundary, and generic ones.
            double near = rnd.nextBoolean() ? d : (float) d;
            Rational boundary = exact(near).add(exact(Math.ulp(near)).multiply(Rational.of(rnd.nextInt(3) - 1, 2)));
            Rational center = rnd.nextBoolean() ? boundary : exact(d);
            double rad = rnd.nextInt(3) == 0 ? 0 : Math.abs(d) * Math.scalb(1.0, -50 - rnd.nextInt(70));
            DDBall b = DDBall.of(center.toBigDecimal(new java.math.MathContext(60)), new BigDecimal(rad));
            double r64 = b.roundBinary64();
            float r32 = b.roundBinary32();
            for (Rational p : points(b)) {
                if (!Double.isNaN(r64)) {
                    Entry e = Rounding.round(p, Target.nearest(Format.BinaryFormat.BINARY64));
                    assertEquals(exact(r64), e.value(), "binary64 of " + b + " at " + p);
                }
                if (!Float.isNaN(r32)) {
                    Entry e = Rounding.round(p, Target.nearest(Format.BinaryFormat.BINARY32));
                    assertEquals(exact(r32), e.value(), "binary32 of " + b + " at " + p);
                }
            }
            decided64 += Double.isNaN(r64) ? 0 : 1;
            decided32 += Float.isNaN(r32) ? 0 : 1;
        }
        // Most balls are narrow enough to decide: the fast path is not vacuous.
        assertTrue(decided64 > 1500 && decided32 > 1500, decided64 + " / " + decided32);
    }

    @Test
    void exactDoublesAndSmallFractionsAreTheSameRationalsAsTheGeneralPath() {
        Random rnd = new Random(SEED + 2);
        for (int k = 0; k < 20000; k++) {
            long bits = rnd.nextLong();
            double d = Double.longBitsToDouble(bits);
            if (k < 10) {
                d = new double[] {Double.MIN_VALUE, -Double.MIN_VALUE, Double.MAX_VALUE, Double.MIN_NORMAL, 1, -0.5, 0x1p-1074 * 3, 3e-310, 0.1, -0.0}[k];
            }
            if (!Double.isFinite(d)) {
                continue;
            }
            // BigDecimal(double) is exact (Java SE API), so Rational.of(BigDecimal) is an independent path.
            assertEquals(Rational.of(new BigDecimal(d)), Rational.ofDouble(d), "ofDouble(" + d + ")");
            long num = rnd.nextLong() >> rnd.nextInt(63);
            long den = (rnd.nextLong() >> rnd.nextInt(63)) | 1;
            assertEquals(Rational.of(java.math.BigInteger.valueOf(num), java.math.BigInteger.valueOf(den)), Rational.of(num, den));
        }
    }
}
