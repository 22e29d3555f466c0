package dev.odetab.numeric;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.numeric.Entry.Kind;
import dev.odetab.numeric.Format.BinaryFormat;
import java.math.BigDecimal;
import java.math.BigInteger;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Binary64 and binary32 rounding of random exact values against the JDK.
 *
 * <p>Source of the expected bits: the Java SE 17 API. {@code BigDecimal.doubleValue()} and
 * {@code floatValue()} are specified as "similar to the narrowing primitive conversion"
 * (JLS §5.1.3: IEEE 754 round to nearest) and, beyond the fast exact paths, convert through
 * {@code Double.parseDouble}/{@code Float.parseFloat}, which {@code Double.valueOf(String)}
 * specifies as "rounded to type double by the usual round-to-nearest rule of IEEE 754". The
 * spec-level oracle ({@link dev.odetab.oracle.IeeeOracle}) judges a sample too (every value in the slow run), in
 * all four modes. {@code Math.nextUp} (Java SE API: the adjacent value toward +infinity)
 * checks that DOWN and UP are neighbours; {@code Double.parseDouble} reads hex literals
 * (Java SE API {@code Double.valueOf}: HexFloatingPointLiteral).
 */
class RoundingTest {
    private static final int COUNT = 100_000;

    /** The default run: every value against the JDK; a sample against the oracle and for shortest decimals. */
    @Test
    void binary64AndBinary32AgreeWithTheJdkAndTheOracle() {
        run(4, 100, 25, 1000);
    }

    /** Every value against the oracle in all modes and for its shortest decimal. */
    @Test
    @Tag("slow")
    void everyValueAgreesWithTheOracleAndHasAShortestDecimal() {
        run(1, 1, 1, 20);
    }

    private static void run(int directedEvery, int oracleEvery, int shortestEvery, int bruteForceEvery) {
        long seed = RoundingCases.seed();
        ExactValues values = new ExactValues(seed);
        int ties = 0;
        for (int i = 0; i < COUNT; i++) {
            Rational x = values.next();
            String text = RoundingCases.decimal(x);
            String what = "[test.seed=" + seed + ", case " + i + "] x = " + text;
            BigDecimal bd = new BigDecimal(text);

            Entry d = Rounding.round(x, Target.nearest(BinaryFormat.BINARY64));
            double jdkDouble = bd.doubleValue();
            assertEquals(Double.doubleToRawLongBits(jdkDouble), d.bits().longValue(), what);
            Entry f = Rounding.round(x, Target.nearest(BinaryFormat.BINARY32));
            float jdkFloat = bd.floatValue();
            assertEquals(Float.floatToRawIntBits(jdkFloat), f.bits().intValue(), what);

            if (i % directedEvery == 0) {
                checkDirected64(x, what);
                checkDirected32(x, what);
                checkHex(d, f, jdkDouble, jdkFloat, what);
            }
            if (i % oracleEvery == 0) {
                for (RoundingMode m : RoundingCases.MODES) {
                    for (BinaryFormat b : new BinaryFormat[] {BinaryFormat.BINARY64, BinaryFormat.BINARY32}) {
                        Entry e = Rounding.round(x, Target.of(b, m));
                        assertTrue(RoundingCases.oracleAgrees(x, e, m), () -> what + " " + b.name() + " " + m);
                    }
                }
            }
            if (i % shortestEvery == 0) {
                checkShortest(d, jdkDouble, i % bruteForceEvery == 0, what);
            }
            if (d.kind() == Kind.FINITE
                    && x.subtract(d.value()).abs().multiply(Rational.TWO).equals(ExactValues.exact(Math.ulp(jdkDouble)))) {
                ties++;
            }
        }
        assertTrue(ties > COUNT / 50, "too few exact binary64 ties: " + ties);
    }

    private static void checkDirected64(Rational x, String what) {
        double down = bitsToDouble(Rounding.round(x, Target.of(BinaryFormat.BINARY64, RoundingMode.DOWN)));
        double up = bitsToDouble(Rounding.round(x, Target.of(BinaryFormat.BINARY64, RoundingMode.UP)));
        double zero = bitsToDouble(Rounding.round(x, Target.of(BinaryFormat.BINARY64, RoundingMode.TOWARD_ZERO)));
        double nearest = bitsToDouble(Rounding.round(x, Target.nearest(BinaryFormat.BINARY64)));
        boolean exact = Double.doubleToRawLongBits(down) == Double.doubleToRawLongBits(up);
        if (!exact) {
            assertEquals(Double.doubleToRawLongBits(Math.nextUp(down)), Double.doubleToRawLongBits(up), what);
        }
        assertEquals(x.signum() >= 0 ? down : up, zero, what);
        assertTrue(nearest == down || nearest == up, what);
    }

    private static void checkDirected32(Rational x, String what) {
        float down = Float.intBitsToFloat(Rounding.round(x, Target.of(BinaryFormat.BINARY32, RoundingMode.DOWN)).bits().intValue());
        float up = Float.intBitsToFloat(Rounding.round(x, Target.of(BinaryFormat.BINARY32, RoundingMode.UP)).bits().intValue());
        if (Float.floatToRawIntBits(down) != Float.floatToRawIntBits(up)) {
            assertEquals(Float.floatToRawIntBits(Math.nextUp(down)), Float.floatToRawIntBits(up), what);
        }
    }

    private static void checkHex(Entry d, Entry f, double jdkDouble, float jdkFloat, String what) {
        if (d.kind() != Kind.INFINITE) {
            String hex = d.hexLiteral();
            assertEquals(Double.doubleToRawLongBits(jdkDouble), Double.doubleToRawLongBits(Double.parseDouble(hex)), what + " " + hex);
            // Java SE API Double.toHexString writes the same digits (subnormals as 0x0.…p-1022), exponent without '+'
            String jdk = Double.toHexString(jdkDouble).replace(".0p", "p").replaceFirst("p(?=[0-9])", "p+");
            assertEquals(jdk, hex, what);
        }
        if (f.kind() != Kind.INFINITE) {
            String hex = f.hexLiteral();
            assertEquals(Float.floatToRawIntBits(jdkFloat), Float.floatToRawIntBits(Float.parseFloat(hex)), what + " " + hex);
        }
    }

    private static void checkShortest(Entry d, double jdkDouble, boolean bruteForce, String what) {
        String s = d.shortestDecimal();
        assertEquals(Double.doubleToRawLongBits(jdkDouble), Double.doubleToRawLongBits(Double.parseDouble(s)), what + " " + s);
        if (d.kind() == Kind.INFINITE) {
            return;
        }
        Entry back = Rounding.round(Rational.of(new BigDecimal(s)), Target.nearest(BinaryFormat.BINARY64));
        if (d.kind() == Kind.FINITE) {
            assertEquals(d.bits(), back.bits(), what + " " + s);
            // Double.toString reads back to the same double (Java SE API), so it is never shorter than the shortest
            int jdkDigits = new BigDecimal(Double.toString(jdkDouble)).stripTrailingZeros().precision();
            assertTrue(new BigDecimal(s).stripTrailingZeros().precision() <= jdkDigits, what + " " + s);
            if (bruteForce) {
                RoundingCases.assertNoShorterAndNearest(d.value(), d.bits(), BinaryFormat.BINARY64, s);
            }
        }
    }

    private static double bitsToDouble(Entry e) {
        BigInteger bits = e.bits();
        return Double.longBitsToDouble(bits.longValue());
    }
}
