package dev.odetab.audit;

import dev.odetab.numeric.Format;
import dev.odetab.numeric.Rational;
import java.math.BigInteger;

/**
 * The unit in the last place of a format at a real number x (the exact value, not the entry).
 *
 * <p>Trust level: Exact. Definitions (after Muller et al., Handbook of Floating-Point
 * Arithmetic, 2nd ed., §2.6.1, "Goldberg's definition" extended with gradual underflow):
 * <ul>
 * <li>binary with precision p and minimum exponent emin: ulp(x) = 2^(max(e(x), emin) − p + 1),
 * e(x) = floor(log2 |x|), and ulp(0) = 2^(emin − p + 1);</li>
 * <li>double-double: as binary with p = 106 and emin = −1022, never below 2^−1074;</li>
 * <li>{@code decimal:N}: ulp(x) = 10^(floor(log10 |x|) − N + 1), the weight of the N-th
 * significant digit (ulp(0) is taken as 1, an N-digit table never holds an inexact zero);</li>
 * <li>fixed point with F fraction bits: 2^−F, the least significant bit.</li>
 * </ul>
 * With this ulp, every neighbour of x in the format's binade of x is one ulp apart, so a
 * correctly rounded (nearest) entry is within 0.5 ulp and a faithful one within 1 ulp.
 *
 * <p>Derivation: docs/methods.md §15 (errors in ulps).
 */
final class Ulp {
    private Ulp() {
    }

    /** Exact: ulp of the format at x, as defined above. */
    static Rational of(Format f, Rational x) {
        return switch (f.kind()) {
            case BINARY -> binary(x, (Format.BinaryFormat) f);
            case DOUBLE_DOUBLE -> Rational.TWO.pow(x.isZero() ? -1074 : Math.max(floorLog2(x.abs()) - 105, -1074));
            case DECIMAL -> x.isZero() ? Rational.ONE
                    : Rational.of(10).pow(floorLog10(x.abs()) - ((Format.DecimalFormat) f).digits() + 1);
            case FIXED -> Rational.TWO.pow(-((Format.FixedFormat) f).fractionBits());
        };
    }

    private static Rational binary(Rational x, Format.BinaryFormat b) {
        int q = x.isZero() ? b.emin() : Math.max(floorLog2(x.abs()), b.emin());
        return Rational.TWO.pow(q - b.precisionBits() + 1);
    }

    /** Exact: floor(log2 x) for x &gt; 0. */
    static int floorLog2(Rational x) {
        int e = x.numerator().bitLength() - x.denominator().bitLength();
        while (Rational.TWO.pow(e).compareTo(x) > 0) {
            e--;
        }
        while (Rational.TWO.pow(e + 1).compareTo(x) <= 0) {
            e++;
        }
        return e;
    }

    /** Exact: floor(log10 x) for x &gt; 0. */
    static int floorLog10(Rational x) {
        int e = (int) Math.floor((x.numerator().bitLength() - x.denominator().bitLength()) * 0.30102999566398120);
        while (Rational.of(10).pow(e).compareTo(x) > 0) {
            e--;
        }
        while (Rational.of(10).pow(e + 1).compareTo(x) <= 0) {
            e++;
        }
        return e;
    }

    /**
     * Exact: the value that stands for an infinite entry in error measurements, ±2^(emax+1)
     * (IEEE 754-2019 §4.3.1: a value is rounded as though the exponent range were unbounded,
     * and overflows to ∞ exactly when it is at least 2^(emax+1) − ulp(Ω)/2, so an infinity for
     * such a value is within 0.5 ulp in this measure).
     */
    static Rational infinity(Format.BinaryFormat f, boolean negative) {
        Rational v = Rational.of(BigInteger.ONE).multiply(Rational.TWO.pow(f.emax() + 1));
        return negative ? v.negate() : v;
    }
}
