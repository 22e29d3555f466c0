package dev.odetab.numeric;

import dev.odetab.numeric.Format.BinaryFormat;
import dev.odetab.oracle.IeeeOracle;
import dev.odetab.oracle.IeeeOracle.Direction;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;

/** Helpers shared by the rounding tests: the oracle's view of a mode, exact text of inputs. */
final class RoundingCases {
    static final RoundingMode[] MODES = RoundingMode.values();

    private RoundingCases() {
    }

    static Direction direction(RoundingMode m) {
        return switch (m) {
            case NEAREST_EVEN -> Direction.TIES_TO_EVEN;
            case DOWN -> Direction.TOWARD_NEGATIVE;
            case UP -> Direction.TOWARD_POSITIVE;
            case TOWARD_ZERO -> Direction.TOWARD_ZERO;
        };
    }

    /** The exponent field width w of a binary format (IEEE 754-2019 table 3.5). */
    static int w(BinaryFormat f) {
        return f.encodingBits() - f.precisionBits();
    }

    static IeeeOracle.Decoded decode(BigInteger bits, BinaryFormat f) {
        return IeeeOracle.decode(bits, f.precisionBits(), w(f));
    }

    static boolean oracleAgrees(Rational x, Entry e, RoundingMode m) {
        BinaryFormat f = (BinaryFormat) e.format();
        return IeeeOracle.isCorrectRounding(x, e.bits(), f.precisionBits(), w(f), direction(m));
    }

    /** The input at full precision: the exact decimal when it terminates (dyadic values do), else p/q. */
    static String full(Rational x) {
        BigDecimal d = x.toBigDecimalExact();
        return d == null ? x.toString() : d.toString();
    }

    /** An exact decimal string of a dyadic or decimal rational (fails for other rationals). */
    static String decimal(Rational x) {
        BigDecimal d = x.toBigDecimalExact();
        if (d == null) {
            throw new IllegalArgumentException("not a terminating decimal: " + x);
        }
        return d.round(MathContext.UNLIMITED).toString();
    }

    static long seed() {
        return Long.getLong("test.seed", 20260215L);
    }

    /**
     * Brute force over digit counts: the rounding interval of v is convex, so some n-digit
     * decimal lies in it exactly when v rounded down or up to n significant digits does.
     */
    static void assertNoShorterAndNearest(Rational v, BigInteger bits, BinaryFormat f, String shortest) {
        BigDecimal s = new BigDecimal(shortest);
        int n = s.stripTrailingZeros().precision();
        for (int digits = 1; digits <= n; digits++) {
            for (java.math.RoundingMode jm : new java.math.RoundingMode[] {java.math.RoundingMode.FLOOR, java.math.RoundingMode.CEILING}) {
                Rational c = Rational.of(v.toBigDecimal(new MathContext(digits, jm)));
                boolean back = IeeeOracle.isCorrectRounding(c, bits, f.precisionBits(), w(f),
                        IeeeOracle.Direction.TIES_TO_EVEN);
                if (digits < n && back) {
                    org.junit.jupiter.api.Assertions.fail(shortest + " is not shortest: " + full(c) + " also reads back");
                }
                if (digits == n && back && c.subtract(v).abs().compareTo(Rational.of(s).subtract(v).abs()) < 0) {
                    org.junit.jupiter.api.Assertions.fail(shortest + " is not the nearest shortest: " + full(c));
                }
            }
        }
    }

}
