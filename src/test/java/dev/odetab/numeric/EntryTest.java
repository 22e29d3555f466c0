package dev.odetab.numeric;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * {@link Entry}'s spellings and encodings against outside references.
 *
 * <p>{@link Entry#shortestDecimal} against its definition, evaluated here the slow way in exact
 * rational arithmetic: the interval of reals that round to the entry (IEEE 754-2019 §4.3.1,
 * round to nearest, ties to even), the largest k with a multiple of 10^k in it, and among those
 * multiples the one nearest the value. Also read back with Java's correctly rounded
 * Double.parseDouble / Float.parseFloat (Java SE API).
 */
class EntryTest {
    private static final long SEED = Long.getLong("test.seed", 7L);

    /** The definition: m·10^k for the largest feasible k, m nearest to v/10^k within the interval. */
    private static String definition(double d, Format.BinaryFormat f) {
        Entry e = Rounding.round(Rational.ofDouble(d), Target.nearest(f));
        Rational v = e.value().abs();
        double next = f == Format.BinaryFormat.BINARY64 ? Math.nextUp(Math.abs(d)) : Math.nextUp((float) Math.abs(d));
        // Above the largest finite value, the next step is one ulp as if the exponent range went on (§4.3.1 overflow rule).
        Rational up = Double.isInfinite(next)
                ? v.add(Rational.ofDouble(f == Format.BinaryFormat.BINARY64 ? Math.ulp(Math.abs(d)) : Math.ulp((float) Math.abs(d))))
                : Rational.ofDouble(next);
        Rational down = Rational.ofDouble(f == Format.BinaryFormat.BINARY64 ? Math.nextDown(Math.abs(d)) : Math.nextDown((float) Math.abs(d)));
        Rational low = v.add(down).divide(Rational.TWO);
        Rational high = v.add(up).divide(Rational.TWO);
        BigInteger significandBits = f == Format.BinaryFormat.BINARY64
                ? BigInteger.valueOf(Double.doubleToRawLongBits(Math.abs(d)) & 1)
                : BigInteger.valueOf(Float.floatToRawIntBits((float) Math.abs(d)) & 1);
        boolean closed = significandBits.signum() == 0;
        // No positive multiple of 10^k lies below 10^k, so k starts just above log10 of the value.
        for (int k = (int) Math.floor(Math.log10(Math.abs(d))) + 2; k > -400; k--) {
            Rational scale = Rational.of(10).pow(k);
            Rational lo = low.divide(scale);
            Rational hi = high.divide(scale);
            BigInteger first = lo.isInteger() && closed ? lo.floor() : lo.floor().add(BigInteger.ONE);
            BigInteger last = hi.isInteger() && !closed ? hi.floor().subtract(BigInteger.ONE) : hi.floor();
            if (first.compareTo(last) <= 0) {
                Rational t = v.divide(scale);
                BigInteger m = new BigDecimal(t.numerator()).divide(new BigDecimal(t.denominator()), 0, java.math.RoundingMode.HALF_EVEN)
                        .toBigIntegerExact();
                m = m.max(first).min(last);
                return (d < 0 ? "-" : "") + new BigDecimal(m, -k).stripTrailingZeros().toString();
            }
        }
        throw new AssertionError("no decimal");
    }

    @Test
    void encodingsAndHexLiteralsAgreeWithJava() {
        // Double.doubleToRawLongBits / Float.floatToRawIntBits give the IEEE 754-2019 §3.4
        // interchange encodings; Double.parseDouble and Float.parseFloat read C99 hex floats
        // exactly (Java SE API, HexFloatingPointLiteral).
        Random rnd = new Random(SEED + 1);
        for (int i = 0; i < 2000; i++) {
            double d = i < 4 ? new double[] {0x1p-1074, -Double.MAX_VALUE, -0.0, 0x1.8p+1}[i] : Double.longBitsToDouble(rnd.nextLong());
            if (Double.isNaN(d) || Double.isInfinite(d)) {
                continue;
            }
            if (d == 0 && 1 / d < 0) {
                continue; // an exact rational has no sign of zero: -0.0 is not an entry of an exact value
            }
            Entry e64 = Rounding.round(Rational.ofDouble(d), Target.nearest(Format.BinaryFormat.BINARY64));
            String what = "seed " + SEED + ", d = " + Double.toHexString(d);
            assertEquals(BigInteger.valueOf(Double.doubleToRawLongBits(d)).and(BigInteger.ONE.shiftLeft(64).subtract(BigInteger.ONE)),
                    e64.bits(), what);
            assertEquals(d, Double.parseDouble(e64.hexLiteral()), what);
            float f = (float) d;
            if (Float.isInfinite(f) || f == 0) {
                continue;
            }
            Entry e32 = Rounding.round(Rational.ofDouble(f), Target.nearest(Format.BinaryFormat.BINARY32));
            assertEquals(BigInteger.valueOf(Float.floatToRawIntBits(f) & 0xffffffffL), e32.bits(), what);
            assertEquals(f, Float.parseFloat(e32.hexLiteral()), what);
        }
        assertEquals("0x1.8p+1", Rounding.round(Rational.of(3), Target.nearest(Format.BinaryFormat.BINARY64)).hexLiteral());
        assertEquals("0x0.0000000000001p-1022",
                Rounding.round(Rational.ofDouble(0x1p-1074), Target.nearest(Format.BinaryFormat.BINARY64)).hexLiteral());
    }

    @Test
    void shortestDecimalsMatchTheDefinitionAndReadBack() {
        Random rnd = new Random(SEED);
        for (int i = 0; i < 2000; i++) {
            double d = Double.longBitsToDouble(rnd.nextLong());
            if (i < 8) {
                d = new double[] {Double.MIN_VALUE, Double.MAX_VALUE, Double.MIN_NORMAL, 1e23, 5e-324 * 7, 0.1, 100, 9.999999999999999e22}[i];
            }
            if (!Double.isFinite(d) || d == 0) {
                continue;
            }
            for (Format.BinaryFormat f : new Format.BinaryFormat[] {Format.BinaryFormat.BINARY64, Format.BinaryFormat.BINARY32}) {
                double x = f == Format.BinaryFormat.BINARY64 ? d : (float) d;
                if (x == 0 || Double.isInfinite(x)) {
                    continue;
                }
                String s = Rounding.round(Rational.ofDouble(x), Target.nearest(f)).shortestDecimal();
                double back = f == Format.BinaryFormat.BINARY64 ? Double.parseDouble(s) : Float.parseFloat(s);
                assertEquals(x, back, "read back of " + s);
                assertEquals(new BigDecimal(definition(x, f)).compareTo(new BigDecimal(s)), 0, f.name() + " " + x + ": " + s);
                assertTrue(!s.contains("E"), s);
            }
        }
    }
}
