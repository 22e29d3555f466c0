package dev.odetab.numeric;

import dev.odetab.numeric.Entry.Kind;
import dev.odetab.numeric.Format.BinaryFormat;
import dev.odetab.numeric.Format.DecimalFormat;
import dev.odetab.numeric.Format.DoubleDouble;
import dev.odetab.numeric.Format.FixedFormat;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.util.Objects;
import java.util.Optional;

/**
 * Correctly rounded table entries: of an exact rational ({@link #round}) and of a ball
 * whose points all round alike ({@link #decide}, Ziv's test, docs/methods.md §5).
 *
 * <p>Every rounding here is done in exact integer arithmetic: |x| = a/b is scaled by a
 * power of two (or ten) and split into an integer part and a remainder; the remainder
 * compared with half the divisor decides the rounding. Nothing goes through a double.
 */
public final class Rounding {
    private Rounding() {
    }

    /**
     * Exact: the entry of format {@code f} that is {@code exact} rounded in mode {@code m}.
     *
     * <ul>
     * <li>Binary formats (IEEE 754-2019 §4.3, §7.4): x is rounded as though the exponent range
     * were unbounded, with gradual underflow (subnormals, §3.3); when that result exceeds the
     * largest finite value Ω, NEAREST_EVEN gives ±∞ (so exactly when |x| &gt;= Ω + ulp(Ω)/2),
     * and a directed mode gives ±∞ when it rounds away from zero (UP for x &gt; 0, DOWN for
     * x &lt; 0), else ±Ω. A result of zero keeps the sign of x; exact 0 is +0 (§6.3).</li>
     * <li>{@code double-double}: hi = binary64 NEAREST_EVEN rounding of x, lo = binary64
     * rounding of the exact difference x − hi in mode m, where TOWARD_ZERO means DOWN for
     * x &gt; 0 and UP for x &lt; 0 (toward zero from x, not from x − hi, whose sign may differ);
     * the entry is the exact sum hi + lo.
     * Then |lo| &lt;= ulp(hi)/2 whenever ulp(hi) &gt;= 2^-1073 (ulp(hi)/2 is a binary64 number
     * and |x − hi| &lt;= ulp(hi)/2, rounding is monotone); when hi is below 2^-1021 its ulp is
     * 2^-1074 and a directed lo may be ±2^-1074 = ±ulp(hi). For a directed mode the entry is a
     * directed bound of x: DOWN gives lo &lt;= x − hi, so hi + lo &lt;= x; UP gives lo &gt;= x − hi,
     * so hi + lo &gt;= x; TOWARD_ZERO, for x &gt; 0, is DOWN, so hi + lo &lt;= x, and since
     * x − hi &gt; −hi, a binary64 number, monotonicity gives lo &gt;= −hi: 0 &lt;= hi + lo &lt;= x
     * (symmetrically for x &lt; 0). In NEAREST_EVEN,
     * |x − (hi + lo)| &lt;= ulp(lo)/2. When the binary64 rounding of x overflows (|x| &gt;= Ω +
     * ulp(Ω)/2), hi is the binary64 rounding of x in mode m (±∞ or ±Ω, as above) and lo = +0.
     * The pair is the "double-word" of Muller et al., Handbook of Floating-Point Arithmetic,
     * 2nd ed., 2018, §14.1, except that hi = RN(hi + lo) may fail when lo is exactly
     * ±ulp(hi)/2 after rounding.</li>
     * <li>{@code decimal:N}: N significant digits, unbounded exponent ({@link BigDecimal}
     * division, which rounds correctly in the given mode); exact 0 gives {@link Kind#ZERO}.</li>
     * <li>{@code fixed}: k = x · 2^F rounded to an integer in mode m; the range is judged on k,
     * so a value that rounds into range is in range. Outside it, {@link OutOfRange#SATURATE}
     * clamps k to the nearer end (kind SATURATED) and {@link OutOfRange#ERROR} gives kind
     * OUT_OF_RANGE with the same clamped value; for both, {@link Entry#negative()} tells
     * whether x lay below the range.</li>
     * </ul>
     *
     * <p>Format f, mode m and policy are those of {@code target}; the policy is read by
     * fixed-point formats only.
     *
     * @throws NullPointerException when exact is null
     */
    public static Entry round(Rational exact, Target target) {
        Objects.requireNonNull(exact, "exact");
        Format f = target.format();
        RoundingMode m = target.rounding();
        return switch (f.kind()) {
            case BINARY -> roundBinary(exact, (BinaryFormat) f, m);
            case DOUBLE_DOUBLE -> roundDoubleDouble(exact, m);
            case DECIMAL -> roundDecimal(exact, (DecimalFormat) f, m);
            case FIXED -> roundFixed(exact, (FixedFormat) f, m, target.outOfRange());
        };
    }

    /**
     * Rigorous: the entry that every point of {@code enclosure} rounds to, or empty when two
     * points round differently (Ziv's test, docs/methods.md §5; Ziv, ACM TOMS 17(3), 1991).
     *
     * <p>An exact ball (radius 0) rounds its midpoint exactly. Otherwise both ends are
     * rounded exactly and compared. Every rounding in {@link #round} has a value that is
     * monotone (non-decreasing) in x. For double-double: on each interval where hi is
     * constant, hi + R(x − hi) is monotone; at a binary64 midpoint M between neighbours
     * h &lt; h', points left of M give at most M (h + ulp/2 when that is representable, else
     * lo rounds to at most 0 in DOWN and NEAREST_EVEN, at most h' in UP) and points right of
     * it at least the same bound, symmetrically. Equal values at both ends therefore mean
     * equal values inside; the kind follows from the value's position against the range,
     * the hi part of double-double is monotone too (so it is shared, and with it lo), and a
     * zero entry carries the sign of x, which is shared when both ends carry it (exact 0
     * counts as +). Ends that round to zeros of different sign differ and give empty.
     *
     * <p>Preconditions: the ball contains the exact value (the caller's proof). On failure
     * (ends differ) the caller raises the working precision or reports the entry undecided.
     */
    public static Optional<Entry> decide(Ball enclosure, Target target) {
        if (enclosure.isExact()) {
            return Optional.of(round(Rational.of(enclosure.mid()), target));
        }
        Entry low = round(Rational.of(enclosure.lower()), target);
        Entry high = round(Rational.of(enclosure.upper()), target);
        return low.equals(high) ? Optional.of(low) : Optional.empty();
    }

    private static Entry roundBinary(Rational x, BinaryFormat f, RoundingMode m) {
        if (x.isZero()) {
            return new Entry(f, Kind.ZERO, false, Rational.ZERO, null, null);
        }
        boolean negative = x.signum() < 0;
        BigInteger a = x.numerator().abs();
        BigInteger b = x.denominator();
        int p = f.precisionBits();
        int q = Math.max(floorLog2(a, b) - p + 1, quantumMin(f));
        BigInteger n = roundMagnitude(q < 0 ? a.shiftLeft(-q) : a, q > 0 ? b.shiftLeft(q) : b, negative, m);
        if (n.bitLength() > p) {
            // carried to 2^p: the same value as 2^(p-1) one binade up
            n = n.shiftRight(1);
            q++;
        }
        if (q > f.emax() - p + 1) {
            boolean toInfinity = m == RoundingMode.NEAREST_EVEN || m.awayFromZero(negative);
            if (toInfinity) {
                return new Entry(f, Kind.INFINITE, negative, null, null, null);
            }
            Rational max = f.maxFinite();
            return new Entry(f, Kind.FINITE, negative, negative ? max.negate() : max, null, null);
        }
        Rational magnitude = Rational.of(n).multiply(Rational.TWO.pow(q));
        return new Entry(f, n.signum() == 0 ? Kind.ZERO : Kind.FINITE, negative,
                negative ? magnitude.negate() : magnitude, null, null);
    }

    private static Entry roundDoubleDouble(Rational x, RoundingMode m) {
        Format dd = DoubleDouble.INSTANCE;
        BinaryFormat b64 = BinaryFormat.BINARY64;
        boolean negative = x.signum() < 0;
        Entry hi = roundBinary(x, b64, RoundingMode.NEAREST_EVEN);
        if (hi.kind() == Kind.INFINITE) {
            Entry h = roundBinary(x, b64, m);
            Entry zero = roundBinary(Rational.ZERO, b64, m);
            return new Entry(dd, h.kind(), negative, h.value(), h, zero);
        }
        RoundingMode loMode = m != RoundingMode.TOWARD_ZERO ? m : negative ? RoundingMode.UP : RoundingMode.DOWN;
        Entry lo = roundBinary(x.subtract(hi.value()), b64, loMode);
        Rational sum = hi.value().add(lo.value());
        return new Entry(dd, sum.isZero() ? Kind.ZERO : Kind.FINITE, negative, sum, hi, lo);
    }

    private static Entry roundDecimal(Rational x, DecimalFormat f, RoundingMode m) {
        if (x.isZero()) {
            return new Entry(f, Kind.ZERO, false, Rational.ZERO, null, null);
        }
        BigDecimal d = x.toBigDecimal(new MathContext(f.digits(), m.toJava()));
        return new Entry(f, Kind.FINITE, x.signum() < 0, Rational.of(d), null, null);
    }

    private static Entry roundFixed(Rational x, FixedFormat f, RoundingMode m, OutOfRange policy) {
        boolean negative = x.signum() < 0;
        BigInteger n = roundMagnitude(x.numerator().abs().shiftLeft(f.fractionBits()), x.denominator(), negative, m);
        BigInteger k = negative ? n.negate() : n;
        Kind outside = policy == OutOfRange.SATURATE ? Kind.SATURATED : Kind.OUT_OF_RANGE;
        Rational lsb = Rational.TWO.pow(-f.fractionBits());
        if (k.compareTo(f.maxInteger()) > 0) {
            return new Entry(f, outside, false, Rational.of(f.maxInteger()).multiply(lsb), null, null);
        }
        if (k.compareTo(f.minInteger()) < 0) {
            return new Entry(f, outside, true, Rational.of(f.minInteger()).multiply(lsb), null, null);
        }
        return new Entry(f, k.signum() == 0 ? Kind.ZERO : Kind.FINITE, k.signum() < 0,
                Rational.of(k).multiply(lsb), null, null);
    }

    /**
     * The integer num/den (num, den &gt; 0 or num = 0) rounded in mode m, for a value of the
     * given sign: the quotient, plus one when the remainder says so.
     */
    static BigInteger roundMagnitude(BigInteger num, BigInteger den, boolean negative, RoundingMode m) {
        BigInteger[] qr = num.divideAndRemainder(den);
        BigInteger n = qr[0];
        if (qr[1].signum() == 0) {
            return n;
        }
        boolean up;
        if (m == RoundingMode.NEAREST_EVEN) {
            int c = qr[1].shiftLeft(1).compareTo(den);
            up = c > 0 || (c == 0 && n.testBit(0));
        } else {
            up = m.awayFromZero(negative);
        }
        return up ? n.add(BigInteger.ONE) : n;
    }

    /** floor(log2(a/b)) for a, b &gt; 0, exactly. */
    static int floorLog2(BigInteger a, BigInteger b) {
        int e = a.bitLength() - b.bitLength();
        boolean below = e >= 0 ? a.compareTo(b.shiftLeft(e)) < 0 : a.shiftLeft(-e).compareTo(b) < 0;
        return below ? e - 1 : e;
    }

    /** The exponent of the smallest subnormal, emin − p + 1: every finite value is an integer times 2^this. */
    static int quantumMin(BinaryFormat f) {
        return f.emin() - f.precisionBits() + 1;
    }
}
