package dev.odetab.numeric;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.numeric.Entry.Kind;
import dev.odetab.numeric.Format.BinaryFormat;
import dev.odetab.numeric.Format.DoubleDouble;
import dev.odetab.oracle.HexFloatReader;
import org.junit.jupiter.api.Test;

/**
 * IEEE 754-2019 §4.3.2: roundTowardNegative never exceeds x and roundTowardPositive is never
 * below it; the same contract for every format here (DESIGN: enclosure tables). Binary128
 * entries are also judged by the spec-level oracle, and double-double parts by it as binary64.
 */
class DirectedBoundsTest {
    private static final Format[] FORMATS = {BinaryFormat.BINARY16, BinaryFormat.BINARY32, BinaryFormat.BINARY64,
        BinaryFormat.BINARY128, DoubleDouble.INSTANCE, Format.parse("decimal:1"), Format.parse("decimal:17"),
        Format.parse("fixed:s16.15"), Format.parse("fixed:u32.24"), Format.parse("fixed:s64.0")};

    @Test
    void downIsBelowAndUpIsAboveInEveryFormat() {
        long seed = RoundingCases.seed();
        ExactValues values = new ExactValues(seed + 1);
        for (int i = 0; i < 3000; i++) {
            Rational x = values.next();
            String what = "[test.seed=" + seed + ", case " + i + "] x = " + RoundingCases.full(x);
            for (Format f : FORMATS) {
                Entry down = Rounding.round(x, Target.of(f, RoundingMode.DOWN));
                Entry up = Rounding.round(x, Target.of(f, RoundingMode.UP));
                Entry zero = Rounding.round(x, Target.of(f, RoundingMode.TOWARD_ZERO));
                Entry nearest = Rounding.round(x, Target.nearest(f));
                String w = what + " " + f.name();
                assertTrue(atMost(down, x), w);
                assertTrue(atLeast(up, x), w);
                assertTrue(x.signum() >= 0 ? atMost(zero, x) : atLeast(zero, x), w);
                if (nearest.kind() != Kind.INFINITE && nearest.kind() != Kind.OUT_OF_RANGE) {
                    assertTrue(atLeast(nearest, down.value() == null ? x : down.value())
                            && atMost(nearest, up.value() == null ? x : up.value()), w);
                }
                if (f == BinaryFormat.BINARY128 && nearest.kind() != Kind.INFINITE) {
                    // C99 §6.4.4.2 read by the oracle's own reader; bits decoded by IEEE 754-2019 §3.4
                    assertTrue(HexFloatReader.read(nearest.hexLiteral()).value().equals(nearest.value()), w);
                    assertTrue(RoundingCases.decode(nearest.bits(), BinaryFormat.BINARY128).value().equals(nearest.value()), w);
                }
                if (f == BinaryFormat.BINARY128) {
                    for (RoundingMode m : RoundingCases.MODES) {
                        Entry e = Rounding.round(x, Target.of(f, m));
                        assertTrue(RoundingCases.oracleAgrees(x, e, m), w + " " + m);
                    }
                }
                if (f instanceof DoubleDouble) {
                    assertTrue(RoundingCases.oracleAgrees(x, nearest.hi(), RoundingMode.NEAREST_EVEN), w);
                    if (down.kind() != Kind.INFINITE && nearest.kind() != Kind.INFINITE) {
                        assertTrue(RoundingCases.oracleAgrees(x.subtract(down.hi().value()), down.lo(), RoundingMode.DOWN), w);
                    }
                }
            }
        }
    }

    /** entry <= x, with -infinity below everything; an out-of-range entry bounds nothing and passes. */
    private static boolean atMost(Entry e, Rational x) {
        if (e.kind() == Kind.OUT_OF_RANGE) {
            return true;
        }
        return e.value() == null ? e.negative() : e.value().compareTo(x) <= 0;
    }

    private static boolean atLeast(Entry e, Rational x) {
        if (e.kind() == Kind.OUT_OF_RANGE) {
            return true;
        }
        return e.value() == null ? !e.negative() : e.value().compareTo(x) >= 0;
    }
}
