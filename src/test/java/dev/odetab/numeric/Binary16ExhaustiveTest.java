package dev.odetab.numeric;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.numeric.Entry.Kind;
import dev.odetab.numeric.Format.BinaryFormat;
import dev.odetab.oracle.HexFloatReader;
import dev.odetab.oracle.IeeeOracle;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Every one of the 65,536 binary16 bit patterns (IEEE 754-2019 §3.6: p = 11, emax = 15),
 * judged by the decoding formula of §3.4 in {@link IeeeOracle}, not by the rounding code.
 */
class Binary16ExhaustiveTest {
    private static final BinaryFormat H = BinaryFormat.BINARY16;

    /** Finite non-negative values in increasing order, from the oracle's decoding. */
    private static List<Rational> positiveValues() {
        List<Rational> values = new ArrayList<>();
        for (int b = 0; b < 0x10000; b++) {
            IeeeOracle.Decoded d = RoundingCases.decode(BigInteger.valueOf(b), H);
            if (!d.negative() && d.value() != null) {
                values.add(d.value());
            }
        }
        values.sort(null);
        return values;
    }

    @Test
    void everyFiniteValueRoundsToItselfAndEncodesToItsBits() {
        int finite = 0;
        for (int b = 0; b < 0x10000; b++) {
            BigInteger bits = BigInteger.valueOf(b);
            IeeeOracle.Decoded d = RoundingCases.decode(bits, H);
            if (d.value() == null || (d.negative() && d.value().isZero())) {
                continue; // infinities, NaNs and -0 (no exact value is -0) are checked elsewhere
            }
            finite++;
            for (RoundingMode m : RoundingCases.MODES) {
                Entry e = Rounding.round(d.value(), Target.of(H, m));
                // IEEE 754-2019 §4.3: a representable value is its own rounding in every direction
                assertEquals(bits, e.bits(), () -> "0x" + Integer.toHexString(bits.intValue()) + " " + m);
                assertEquals(d.value(), e.value());
            }
        }
        // 2 * (31 exponents * 1024 significands) finite patterns, minus -0
        assertEquals(2 * 31 * 1024 - 1, finite);
    }

    @Test
    void midpointsGoToTheEvenNeighbourAndDirectedModesToTheirSide() {
        List<Rational> v = positiveValues();
        assertEquals(31 * 1024, v.size());
        Rational maxFinite = v.get(v.size() - 1);
        for (int i = 0; i + 1 < v.size(); i++) {
            Rational a = v.get(i);
            Rational b = v.get(i + 1);
            Rational mid = a.add(b).divide(Rational.TWO);
            Rational nudge = b.subtract(a).divide(Rational.of(1 << 20));
            // the even neighbour: consecutive non-negative encodings are consecutive values (§3.4), so index i has bits i
            Rational even = (i % 2 == 0) ? a : b;
            for (int s : new int[] {1, -1}) {
                Rational sa = a.multiply(s);
                Rational sb = b.multiply(s);
                Rational x = mid.multiply(s);
                assertEquals(even.multiply(s), value(x, RoundingMode.NEAREST_EVEN), () -> "tie " + x);
                assertEquals(s > 0 ? sa : sb, value(x, RoundingMode.DOWN), () -> "down " + x);
                assertEquals(s > 0 ? sb : sa, value(x, RoundingMode.UP), () -> "up " + x);
                assertEquals(sa, value(x, RoundingMode.TOWARD_ZERO), () -> "toward zero " + x);
                assertEquals(sb, value(mid.add(nudge).multiply(s), RoundingMode.NEAREST_EVEN), () -> "above " + x);
                assertEquals(sa, value(mid.subtract(nudge).multiply(s), RoundingMode.NEAREST_EVEN), () -> "below " + x);
            }
        }
        // the smallest tie, MIN/2, goes to zero, keeping the sign (§4.3.1, §6.3)
        Rational halfMin = v.get(1).divide(Rational.TWO);
        Entry minusZero = Rounding.round(halfMin.negate(), Target.nearest(H));
        assertEquals(Kind.ZERO, minusZero.kind());
        assertEquals(BigInteger.valueOf(0x8000), minusZero.bits());
        assertEquals("-0x0p+0", minusZero.hexLiteral());
        assertEquals(BigInteger.ZERO, Rounding.round(Rational.ZERO, Target.of(H, RoundingMode.DOWN)).bits());
        assertEquals(Rational.of(65504), maxFinite); // IEEE 754-2019 table 3.5 binary16: (2 − 2^-10) · 2^15
    }

    /** The same points judged by the neighbour-based oracle in every mode (slow: about 8 s). */
    @Test
    @Tag("slow")
    void midpointsAndNudgedPointsAgreeWithTheOracleInEveryMode() {
        List<Rational> v = positiveValues();
        for (int i = 0; i + 1 < v.size(); i++) {
            Rational mid = v.get(i).add(v.get(i + 1)).divide(Rational.TWO);
            Rational nudge = v.get(i + 1).subtract(v.get(i)).divide(Rational.of(1 << 20));
            for (Rational y : new Rational[] {mid, mid.add(nudge), mid.subtract(nudge)}) {
                for (Rational x : new Rational[] {y, y.negate()}) {
                    for (RoundingMode m : RoundingCases.MODES) {
                        Entry e = Rounding.round(x, Target.of(H, m));
                        assertTrue(RoundingCases.oracleAgrees(x, e, m), () -> m + " " + RoundingCases.full(x));
                    }
                }
            }
        }
    }

    @Test
    void overflowThresholds() {
        // IEEE 754-2019 §4.3.1: |x| >= 2^emax (2 − 2^-p) = 65520 rounds to infinity; §7.4 for directed modes
        Rational threshold = Rational.of(65520);
        Rational tiny = Rational.of(1, 1 << 30);
        BigInteger inf = BigInteger.valueOf(0x7C00);
        BigInteger max = BigInteger.valueOf(0x7BFF);
        BigInteger sign = BigInteger.valueOf(0x8000);
        assertEquals(inf, bits(threshold, RoundingMode.NEAREST_EVEN));
        assertEquals(max, bits(threshold.subtract(tiny), RoundingMode.NEAREST_EVEN));
        assertEquals(inf.or(sign), bits(threshold.negate(), RoundingMode.NEAREST_EVEN));
        assertEquals(max, bits(Rational.of(1_000_000), RoundingMode.DOWN));
        assertEquals(max, bits(Rational.of(1_000_000), RoundingMode.TOWARD_ZERO));
        assertEquals(inf, bits(Rational.of(65504).add(tiny), RoundingMode.UP));
        assertEquals(max, bits(Rational.of(65504), RoundingMode.UP));
        assertEquals(inf.or(sign), bits(Rational.of(-65504).subtract(tiny), RoundingMode.DOWN));
        assertEquals(max.or(sign), bits(Rational.of(-1_000_000), RoundingMode.UP));
        assertEquals(max.or(sign), bits(Rational.of(-1_000_000), RoundingMode.TOWARD_ZERO));
        Entry e = Rounding.round(threshold, Target.nearest(H));
        assertEquals(Kind.INFINITE, e.kind());
        assertEquals(null, e.value());
        assertEquals("INFINITY", e.hexLiteral());
        assertEquals("Infinity", e.shortestDecimal());
    }

    @Test
    void hexLiteralAndShortestDecimalReadBack() {
        for (int b = 0; b < 0x10000; b++) {
            BigInteger bits = BigInteger.valueOf(b);
            IeeeOracle.Decoded d = RoundingCases.decode(bits, H);
            if (d.value() == null) {
                continue;
            }
            Entry e = entryOfBits(d);
            assertEquals(bits, e.bits());
            String hex = e.hexLiteral();
            HexFloatReader.Read read = HexFloatReader.read(hex);
            assertEquals(d.value(), read.value(), hex);
            assertEquals(d.negative(), read.negative(), hex);
            String shortest = e.shortestDecimal();
            assertEquals(d.negative(), shortest.startsWith("-"), shortest);
            Rational back = Rational.of(new BigDecimal(shortest));
            assertTrue(IeeeOracle.isCorrectRounding(back, d.value().isZero() ? BigInteger.ZERO : bits,
                    H.precisionBits(), RoundingCases.w(H), IeeeOracle.Direction.TIES_TO_EVEN), shortest);
            if (!d.value().isZero()) {
                RoundingCases.assertNoShorterAndNearest(d.value(), bits, H, shortest);
            }
        }
    }

    private static Entry entryOfBits(IeeeOracle.Decoded d) {
        if (d.value().isZero() && d.negative()) {
            return Rounding.round(Rational.of(-1, 1 << 30), Target.nearest(H));
        }
        return Rounding.round(d.value(), Target.nearest(H));
    }

    private static Rational value(Rational x, RoundingMode m) {
        Entry e = Rounding.round(x, Target.of(H, m));
        assertFalse(e.kind() == Kind.INFINITE, () -> "unexpected infinity for " + x);
        return e.value();
    }

    private static BigInteger bits(Rational x, RoundingMode m) {
        return Rounding.round(x, Target.of(H, m)).bits();
    }
}
