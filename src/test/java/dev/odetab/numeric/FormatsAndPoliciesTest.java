package dev.odetab.numeric;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.numeric.Entry.Kind;
import dev.odetab.numeric.Format.BinaryFormat;
import dev.odetab.numeric.Format.DecimalFormat;
import dev.odetab.numeric.Format.DoubleDouble;
import dev.odetab.numeric.Format.FixedFormat;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/** Spellings, fixed point at its range ends, decimal:N, double-double and Ziv's test. */
class FormatsAndPoliciesTest {
    private static final FixedFormat S16_15 = new FixedFormat(true, 16, 15);
    private static final Rational LSB15 = Rational.of(1, 1 << 15);

    @Test
    void eachFormatStatesItsKindBitsNormalRangeAndPolicy() {
        // p of IEEE 754-2019 table 3.5; 107 bits of double-double (53 + 53 and the sign of lo);
        // emin = 1 - emax (§3.3), binary64's for double-double; decimal and fixed point never underflow
        assertEquals(Format.Kind.BINARY, BinaryFormat.BINARY16.kind());
        assertEquals(11, BinaryFormat.BINARY16.significantBits());
        assertEquals(-14, BinaryFormat.BINARY16.normalEmin().getAsInt());
        assertEquals(113, BinaryFormat.BINARY128.significantBits());
        assertEquals(-16382, BinaryFormat.BINARY128.normalEmin().getAsInt());
        assertEquals(Format.Kind.DOUBLE_DOUBLE, DoubleDouble.INSTANCE.kind());
        assertEquals(107, DoubleDouble.INSTANCE.significantBits());
        assertEquals(-1022, DoubleDouble.INSTANCE.normalEmin().getAsInt());
        DecimalFormat d40 = new DecimalFormat(40);
        assertEquals(Format.Kind.DECIMAL, d40.kind());
        assertTrue(d40.significantBits() >= 133, "2^133 > 10^40, so 40 digits need at least 133 bits");
        assertTrue(d40.normalEmin().isEmpty());
        assertEquals(Format.Kind.FIXED, S16_15.kind());
        assertEquals(16, S16_15.significantBits());
        assertTrue(S16_15.normalEmin().isEmpty());
        assertTrue(S16_15.hasOutOfRangePolicy());
        assertFalse(BinaryFormat.BINARY64.hasOutOfRangePolicy() || DoubleDouble.INSTANCE.hasOutOfRangePolicy()
                || d40.hasOutOfRangePolicy());
    }

    @Test
    void spellingsRoundTripAndBadOnesNameTheFormats() {
        for (String s : new String[] {"binary16", "binary32", "binary64", "binary128", "double-double",
                "decimal:1", "decimal:10000", "fixed:s16.15", "fixed:u32.24", "fixed:s2.0", "fixed:u1.0", "fixed:s64.128"}) {
            assertEquals(s, Format.parse(s).name());
        }
        for (String s : new String[] {"binary8", "decimal:0", "decimal:10001", "decimal:07", "fixed:s1.0",
                "fixed:s65.3", "fixed:u16.129", "fixed:x16.15", "fixed:s16", ""}) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Format.parse(s));
            assertTrue(e.getMessage().contains("binary128") && e.getMessage().contains("fixed:sT.F"), e.getMessage());
        }
        for (RoundingMode m : RoundingMode.values()) {
            assertEquals(m, RoundingMode.parse(m.spelling()));
        }
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> RoundingMode.parse("nearest"));
        assertTrue(e.getMessage().contains("nearest-even, toward-negative, toward-positive, toward-zero"), e.getMessage());
        // IEEE 754-2019's directed attributes by name; down and up stay accepted as aliases
        assertEquals(RoundingMode.DOWN, RoundingMode.parse("toward-negative"));
        assertEquals(RoundingMode.DOWN, RoundingMode.parse("down"));
        assertEquals(RoundingMode.UP, RoundingMode.parse("toward-positive"));
        assertEquals(RoundingMode.UP, RoundingMode.parse("up"));
        assertEquals("toward-negative", RoundingMode.DOWN.spelling());
    }

    @Test
    void fixedPointRangeIsJudgedOnTheRoundedValue() {
        // two's complement s16.15: k in [-2^15, 2^15 - 1], value k * 2^-15 (DESIGN "Formats and rounding")
        Rational max = Rational.of(32767).multiply(LSB15);
        assertEquals(BigInteger.valueOf(32767), fixed(max, RoundingMode.NEAREST_EVEN, OutOfRange.ERROR).fixedInteger());
        assertEquals(BigInteger.valueOf(-32768), fixed(Rational.of(-1), RoundingMode.UP, OutOfRange.ERROR).fixedInteger());
        assertEquals("-1", fixed(Rational.of(-1), RoundingMode.UP, OutOfRange.ERROR).decimalText());
        assertEquals("0.999969482421875", fixed(max, RoundingMode.DOWN, OutOfRange.ERROR).decimalText());
        Rational halfLsb = LSB15.divide(Rational.TWO);
        // max + LSB/2 is a tie between 32767 and 32768: the even one is out of range
        assertEquals(Kind.OUT_OF_RANGE, fixed(max.add(halfLsb), RoundingMode.NEAREST_EVEN, OutOfRange.ERROR).kind());
        Entry sat = fixed(max.add(halfLsb), RoundingMode.NEAREST_EVEN, OutOfRange.SATURATE);
        assertEquals(Kind.SATURATED, sat.kind());
        assertEquals(BigInteger.valueOf(32767), sat.fixedInteger());
        assertFalse(sat.negative());
        // just below that tie, and DOWN from nearly one LSB above, both round into range
        assertEquals(Kind.FINITE, fixed(max.add(halfLsb).subtract(Rational.of(1, 1 << 30)), RoundingMode.NEAREST_EVEN, OutOfRange.ERROR).kind());
        assertEquals(Kind.FINITE, fixed(max.add(LSB15.multiply(Rational.of(9, 10))), RoundingMode.DOWN, OutOfRange.ERROR).kind());
        assertEquals(Kind.OUT_OF_RANGE, fixed(max.add(Rational.of(1, 1 << 30)), RoundingMode.UP, OutOfRange.ERROR).kind());
        assertEquals(Kind.OUT_OF_RANGE, fixed(max.add(LSB15), RoundingMode.TOWARD_ZERO, OutOfRange.ERROR).kind());
        // -1 - LSB/2 is a tie between -32768 (even, in range) and -32769
        assertEquals(BigInteger.valueOf(-32768), fixed(Rational.of(-1).subtract(halfLsb), RoundingMode.NEAREST_EVEN, OutOfRange.ERROR).fixedInteger());
        Entry below = fixed(Rational.of(-1).subtract(LSB15), RoundingMode.NEAREST_EVEN, OutOfRange.SATURATE);
        assertEquals(Kind.SATURATED, below.kind());
        assertTrue(below.negative());
        assertEquals(BigInteger.valueOf(-32768), below.fixedInteger());
        // unsigned u32.24: a small negative value rounds to 0 in nearest and toward zero, out of range DOWN
        FixedFormat u = new FixedFormat(false, 32, 24);
        Rational tinyNegative = Rational.of(-1, 1 << 26);
        assertEquals(Kind.ZERO, Rounding.round(tinyNegative, Target.nearest(u)).kind());
        assertEquals(Kind.ZERO, Rounding.round(tinyNegative, Target.of(u, RoundingMode.UP)).kind());
        Entry under = Rounding.round(tinyNegative, Target.of(u, RoundingMode.DOWN));
        assertEquals(Kind.OUT_OF_RANGE, under.kind());
        assertTrue(under.negative());
        assertEquals(Kind.SATURATED, Rounding.round(Rational.of(-5), new Target(u, RoundingMode.NEAREST_EVEN, OutOfRange.SATURATE)).kind());
        Entry top = Rounding.round(Rational.of(256), new Target(u, RoundingMode.NEAREST_EVEN, OutOfRange.SATURATE));
        assertEquals(BigInteger.ONE.shiftLeft(32).subtract(BigInteger.ONE), top.fixedInteger());
        // u8.0: 254.5 -> 254 (even), 255.5 -> 256 (even) is out of range
        FixedFormat u8 = new FixedFormat(false, 8, 0);
        assertEquals(BigInteger.valueOf(254), Rounding.round(Rational.of(509, 2), Target.nearest(u8)).fixedInteger());
        assertEquals(Kind.OUT_OF_RANGE, Rounding.round(Rational.of(511, 2), Target.nearest(u8)).kind());
    }

    @Test
    void decimalDigitsInEachMode() {
        // 2/3 = 0.666666..., by hand
        DecimalFormat five = new DecimalFormat(5);
        Rational twoThirds = Rational.of(2, 3);
        assertEquals("0.66667", Rounding.round(twoThirds, Target.nearest(five)).decimalText());
        assertEquals("0.66666", Rounding.round(twoThirds, Target.of(five, RoundingMode.DOWN)).decimalText());
        assertEquals("-0.66667", Rounding.round(twoThirds.negate(), Target.of(five, RoundingMode.DOWN)).decimalText());
        assertEquals("-0.66666", Rounding.round(twoThirds.negate(), Target.of(five, RoundingMode.TOWARD_ZERO)).decimalText());
        assertEquals("1.24e+4", Rounding.round(Rational.of(12350), Target.nearest(new DecimalFormat(3))).decimalText());
        assertEquals("1.000", Rounding.round(Rational.ONE, Target.of(new DecimalFormat(4), RoundingMode.UP)).decimalText());
    }

    @Test
    void doubleDoubleOfOneThird() {
        Rational third = Rational.of(1, 3);
        Entry dd = Rounding.round(third, Target.nearest(DoubleDouble.INSTANCE));
        // JLS §15.17.2: double division is IEEE 754 round to nearest, so 1.0 / 3.0 is RN(1/3)
        assertEquals(Double.doubleToRawLongBits(1.0 / 3.0), dd.hi().bits().longValue());
        Rational ulpHi = ExactValues.exact(Math.ulp(1.0 / 3.0));
        assertTrue(dd.lo().value().abs().compareTo(ulpHi.divide(Rational.TWO)) <= 0);
        assertEquals(dd.hi().value().add(dd.lo().value()), dd.value());
        Entry down = Rounding.round(third, Target.of(DoubleDouble.INSTANCE, RoundingMode.DOWN));
        Entry up = Rounding.round(third, Target.of(DoubleDouble.INSTANCE, RoundingMode.UP));
        assertTrue(down.value().compareTo(third) < 0 && third.compareTo(up.value()) < 0);
        // 1 + 2^-60 is exactly hi = 1, lo = 2^-60
        Entry exact = Rounding.round(Rational.ONE.add(Rational.TWO.pow(-60)), Target.of(DoubleDouble.INSTANCE, RoundingMode.UP));
        assertEquals("0x1p+0", exact.hi().hexLiteral());
        assertEquals("0x1p-60", exact.lo().hexLiteral());
        // overflow follows binary64 (IEEE 754-2019 §7.4): nearest to infinity, DOWN to the largest finite value
        Rational huge = Rational.TWO.pow(1024);
        assertEquals(Kind.INFINITE, Rounding.round(huge, Target.nearest(DoubleDouble.INSTANCE)).kind());
        Entry capped = Rounding.round(huge, Target.of(DoubleDouble.INSTANCE, RoundingMode.DOWN));
        assertEquals(ExactValues.exact(Double.MAX_VALUE), capped.value());
        assertEquals(Kind.ZERO, capped.lo().kind());
    }

    @Test
    void decideAgreesOnlyWhenTheWholeBallRoundsAlike() {
        BinaryFormat b64 = BinaryFormat.BINARY64;
        // 1 + 2^-53 is the tie between 1 and 1 + 2^-52 (exact decimal)
        BigDecimal tie = new BigDecimal(ExactValues.exact(1.0).add(Rational.TWO.pow(-53)).toBigDecimalExact().toString());
        Optional<Entry> straddle = Rounding.decide(Ball.of(tie, new BigDecimal("1e-30")), Target.nearest(b64));
        assertTrue(straddle.isEmpty());
        Optional<Entry> exactTie = Rounding.decide(Ball.exact(tie), Target.nearest(b64));
        assertEquals(Double.doubleToRawLongBits(1.0), exactTie.orElseThrow().bits().longValue()); // even neighbour
        assertEquals(Double.doubleToRawLongBits(Math.nextUp(1.0)),
                Rounding.decide(Ball.exact(tie), Target.of(b64, RoundingMode.UP)).orElseThrow().bits().longValue());
        Ball third = Ball.ONE.divide(Ball.exact(3), 200);
        assertEquals(Double.doubleToRawLongBits(1.0 / 3.0), // JLS §15.17.2
                Rounding.decide(third, Target.nearest(b64)).orElseThrow().bits().longValue());
        assertEquals(Rounding.round(Rational.of(1, 3), Target.nearest(DoubleDouble.INSTANCE)),
                Rounding.decide(third, Target.nearest(DoubleDouble.INSTANCE)).orElseThrow());
        assertTrue(Rounding.decide(Ball.ONE.divide(Ball.exact(3), 60), Target.nearest(DoubleDouble.INSTANCE)).isEmpty());
        // a ball around zero: -0 and +0 differ in binary64; fixed point has one zero
        Ball aroundZero = Ball.of(BigDecimal.ZERO, new BigDecimal("1e-400"));
        assertTrue(Rounding.decide(aroundZero, Target.nearest(b64)).isEmpty());
        assertEquals(BigInteger.ZERO, Rounding.decide(aroundZero, Target.nearest(S16_15)).orElseThrow().fixedInteger());
        // wholly above the fixed-point range: decided, and flagged
        Ball above = Ball.of(new BigDecimal("3"), new BigDecimal("0.5"));
        assertEquals(Kind.SATURATED, Rounding.decide(above, new Target(S16_15, RoundingMode.NEAREST_EVEN, OutOfRange.SATURATE)).orElseThrow().kind());
    }

    private static Entry fixed(Rational x, RoundingMode m, OutOfRange policy) {
        return Rounding.round(x, new Target(S16_15, m, policy));
    }
}
