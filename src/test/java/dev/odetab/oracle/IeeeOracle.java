package dev.odetab.oracle;

import dev.odetab.numeric.Rational;
import java.math.BigInteger;

/**
 * Spec-level oracle for IEEE 754 binary interchange formats, written from the standard and
 * independently of {@code dev.odetab.numeric.Rounding}: it decodes bit patterns by the
 * formula of IEEE 754-2019 §3.4 and judges a rounding by looking at the neighbouring
 * encodings (for non-negative values, consecutive encodings are consecutive values, §3.4).
 * Slow on purpose: no shortcuts beyond exact rationals.
 */
public final class IeeeOracle {
    /** The four rounding directions of IEEE 754-2019 §4.3, named here independently. */
    public enum Direction { TIES_TO_EVEN, TOWARD_NEGATIVE, TOWARD_POSITIVE, TOWARD_ZERO }

    /**
     * A decoded datum: sign, and the exact value (null for infinity and NaN).
     *
     * @param negative the sign bit
     * @param value    the exact value with its sign, null for ±infinity and NaN
     * @param nan      whether the pattern is a NaN
     */
    public record Decoded(boolean negative, Rational value, boolean nan) {
        public boolean infinite() {
            return value == null && !nan;
        }
    }

    private IeeeOracle() {
    }

    /**
     * IEEE 754-2019 §3.4: with bias = emax = 2^(w−1) − 1, biased exponent E and trailing
     * significand T of p − 1 bits: E = 2^w − 1 is infinity (T = 0) or NaN; E = 0 is
     * (−1)^S · 2^emin · (0 + 2^(1−p) · T); otherwise (−1)^S · 2^(E − bias) · (1 + 2^(1−p) · T).
     */
    public static Decoded decode(BigInteger bits, int p, int w) {
        boolean negative = bits.testBit(w + p - 1);
        BigInteger t = bits.and(BigInteger.ONE.shiftLeft(p - 1).subtract(BigInteger.ONE));
        int e = bits.shiftRight(p - 1).and(BigInteger.ONE.shiftLeft(w).subtract(BigInteger.ONE)).intValueExact();
        int bias = (1 << (w - 1)) - 1;
        if (e == (1 << w) - 1) {
            return new Decoded(negative, null, t.signum() != 0);
        }
        Rational fraction = Rational.of(t).multiply(Rational.TWO.pow(1 - p));
        Rational magnitude = e == 0
                ? Rational.TWO.pow(1 - bias).multiply(fraction)
                : Rational.TWO.pow(e - bias).multiply(Rational.ONE.add(fraction));
        return new Decoded(negative, negative ? magnitude.negate() : magnitude, false);
    }

    /** The encoding of +infinity: E all ones, T = 0. */
    public static BigInteger infinityBits(int p, int w) {
        return BigInteger.ONE.shiftLeft(w).subtract(BigInteger.ONE).shiftLeft(p - 1);
    }

    /**
     * Whether {@code bits} is the correct rounding of the exact {@code x} in direction
     * {@code d} (IEEE 754-2019 §4.3 and §7.4 for overflow; §6.3: an exact zero is +0, a
     * rounded zero keeps the sign of x). Decides from the decoded neighbours of the
     * candidate only.
     */
    public static boolean isCorrectRounding(Rational x, BigInteger bits, int p, int w, Direction d) {
        BigInteger signBit = BigInteger.ONE.shiftLeft(w + p - 1);
        if (x.signum() == 0) {
            return bits.signum() == 0;
        }
        boolean negative = x.signum() < 0;
        if (bits.testBit(w + p - 1) != negative) {
            return false;
        }
        BigInteger mag = bits.andNot(signBit);
        BigInteger inf = infinityBits(p, w);
        if (mag.compareTo(inf) > 0) {
            return false;
        }
        Rational ax = x.abs();
        boolean larger = (d == Direction.TOWARD_POSITIVE && !negative) || (d == Direction.TOWARD_NEGATIVE && negative);
        Rational maxFinite = decode(inf.subtract(BigInteger.ONE), p, w).value();
        Rational ulpOfMax = maxFinite.subtract(decode(inf.subtract(BigInteger.TWO), p, w).value());
        if (d == Direction.TIES_TO_EVEN) {
            Rational threshold = maxFinite.add(ulpOfMax.divide(Rational.TWO));
            if (mag.equals(inf)) {
                return ax.compareTo(threshold) >= 0;
            }
            Rational v = decode(mag, p, w).value();
            Rational next = mag.add(BigInteger.ONE).equals(inf) ? maxFinite.add(ulpOfMax)
                    : decode(mag.add(BigInteger.ONE), p, w).value();
            boolean even = !mag.testBit(0);
            Rational upperMid = v.add(next).divide(Rational.TWO);
            int cu = ax.compareTo(upperMid);
            if (cu > 0 || (cu == 0 && !even)) {
                return false;
            }
            if (mag.signum() == 0) {
                return true;
            }
            Rational lowerMid = v.add(decode(mag.subtract(BigInteger.ONE), p, w).value()).divide(Rational.TWO);
            int cl = ax.compareTo(lowerMid);
            return cl > 0 || (cl == 0 && even);
        }
        if (larger) {
            if (mag.signum() == 0) {
                return false;
            }
            Rational prev = decode(mag.subtract(BigInteger.ONE), p, w).value();
            if (mag.equals(inf)) {
                return ax.compareTo(prev) > 0;
            }
            Rational v = decode(mag, p, w).value();
            return ax.compareTo(prev) > 0 && ax.compareTo(v) <= 0;
        }
        if (mag.equals(inf)) {
            return false;
        }
        Rational v = decode(mag, p, w).value();
        if (ax.compareTo(v) < 0) {
            return false;
        }
        return mag.add(BigInteger.ONE).equals(inf) || ax.compareTo(decode(mag.add(BigInteger.ONE), p, w).value()) < 0;
    }
}
