package dev.odetab.numeric;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.SplittableRandom;

/**
 * Random exact values for rounding tests, all terminating decimals (so every one has an
 * exact decimal string): binary64 and binary32 values, exact midpoints between neighbours
 * built exactly, points just beside midpoints, subnormals, values near MIN_VALUE/2 and near
 * the overflow thresholds, and random decimal strings of every magnitude.
 */
final class ExactValues {
    private final SplittableRandom random;

    ExactValues(long seed) {
        this.random = new SplittableRandom(seed);
    }

    Rational next() {
        Rational x = switch (random.nextInt(9)) {
            case 0 -> aroundDouble(Double.longBitsToDouble(random.nextLong() & 0x7FEF_FFFF_FFFF_FFFFL));
            case 1 -> aroundFloat(Float.intBitsToFloat(random.nextInt() & 0x7F7F_FFFF));
            case 2 -> aroundDouble(Double.longBitsToDouble(random.nextLong(1L << 52)));
            case 3 -> aroundDouble(Double.MIN_VALUE * random.nextInt(4));
            case 4 -> random.nextBoolean() ? aroundDouble(Double.MAX_VALUE) : aroundFloat(Float.MAX_VALUE);
            case 5 -> aroundFloat(Float.intBitsToFloat(random.nextInt(1 << 23)));
            case 6 -> aroundDouble(Double.longBitsToDouble((random.nextLong(1000, 1050) << 52) | random.nextLong(1L << 52)));
            case 7 -> aroundFloat(Float.intBitsToFloat((random.nextInt(110, 140) << 23) | random.nextInt(1 << 23)));
            default -> randomDecimal();
        };
        return random.nextBoolean() ? x.negate() : x;
    }

    private Rational aroundDouble(double d) {
        return around(exact(d), exact(Math.ulp(d)));
    }

    private Rational aroundFloat(float f) {
        return around(exact(f), exact(Math.ulp(f)));
    }

    /** v, the midpoint v + ulp/2, a point 2^-j ulp beside it, or a random point within an ulp. */
    private Rational around(Rational v, Rational ulp) {
        Rational half = ulp.divide(Rational.TWO);
        Rational beside = ulp.multiply(Rational.TWO.pow(-random.nextInt(1, 70)));
        Rational x = switch (random.nextInt(5)) {
            case 0 -> v;
            case 1 -> v.add(half);
            case 2 -> v.add(half).add(beside);
            case 3 -> v.add(half).subtract(beside);
            default -> v.add(ulp.multiply(Rational.of(random.nextLong(-(1L << 40), 1L << 40), 1L << 40)));
        };
        return x.signum() < 0 ? x.negate() : x;
    }

    private Rational randomDecimal() {
        int digits = random.nextInt(1, 30);
        BigInteger unscaled = new BigInteger(digits * 4, new java.util.Random(random.nextLong()));
        return Rational.of(new BigDecimal(unscaled, random.nextInt(-330, 360)));
    }

    /** The exact value of a double: new BigDecimal(double) is exact (Java SE API). */
    static Rational exact(double d) {
        return Rational.of(new BigDecimal(d));
    }
}
