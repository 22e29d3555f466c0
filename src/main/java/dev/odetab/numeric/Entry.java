package dev.odetab.numeric;

import dev.odetab.numeric.Format.BinaryFormat;
import dev.odetab.numeric.Format.DecimalFormat;
import dev.odetab.numeric.Format.FixedFormat;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.util.Objects;

/**
 * One correctly rounded table entry, as made by {@link Rounding#round}.
 *
 * <p>Trust level: Exact. The entry is its exact value plus what the value alone cannot say:
 * the sign of a zero or an infinity, and whether a fixed-point value was clamped.
 *
 * @param format   the format the entry belongs to
 * @param kind     what sort of entry it is
 * @param negative the sign bit: the sign of the value, or of the zero or infinity; for
 *                 SATURATED and OUT_OF_RANGE fixed-point entries, whether the exact value
 *                 lay below the range
 * @param value    the exact value; null exactly when kind is INFINITE; for SATURATED and
 *                 OUT_OF_RANGE the end of the range that was exceeded
 * @param hi       double-double only: the binary64 head, else null
 * @param lo       double-double only: the binary64 tail, else null
 *
 * <p>Derivation: docs/methods.md §14 (shortest decimals and hex literals).
 */
public record Entry(Format format, Kind kind, boolean negative, Rational value, Entry hi, Entry lo) {
    /** What sort of entry it is. */
    public enum Kind {
        /** A finite non-zero value of the format. */
        FINITE,
        /** Zero (signed in binary formats and double-double). */
        ZERO,
        /** ±infinity (binary formats and double-double). */
        INFINITE,
        /** Fixed point: the rounded value lay outside the range and was clamped to its end. */
        SATURATED,
        /** Fixed point: the rounded value lay outside the range; the caller reports an error. */
        OUT_OF_RANGE
    }

    public Entry {
        Objects.requireNonNull(format, "format");
        Objects.requireNonNull(kind, "kind");
        if ((value == null) != (kind == Kind.INFINITE)) {
            throw new IllegalArgumentException("value must be null exactly for an infinite entry: " + kind);
        }
        if ((hi != null || lo != null) != (format.kind() == Format.Kind.DOUBLE_DOUBLE) || (hi == null) != (lo == null)) {
            throw new IllegalArgumentException("hi and lo belong to double-double entries only");
        }
    }

    /**
     * Exact: the IEEE 754 interchange encoding sign | biased exponent | trailing significand
     * (IEEE 754-2019 §3.4), as a non-negative integer of {@link BinaryFormat#encodingBits()}
     * bits (binary128 included).
     *
     * @throws IllegalStateException when the format is not binary
     */
    public BigInteger bits() {
        BinaryFormat f = binary("bits()");
        int p = f.precisionBits();
        BigInteger sign = negative ? BigInteger.ONE.shiftLeft(f.encodingBits() - 1) : BigInteger.ZERO;
        if (kind == Kind.INFINITE) {
            BigInteger allOnes = BigInteger.ONE.shiftLeft(f.exponentFieldBits()).subtract(BigInteger.ONE);
            return sign.or(allOnes.shiftLeft(p - 1));
        }
        BigInteger[] nq = significandAndQuantum(f);
        BigInteger n = nq[0];
        int q = nq[1].intValueExact();
        if (n.bitLength() < p) {
            return sign.or(n); // zero or subnormal: biased exponent 0
        }
        BigInteger biased = BigInteger.valueOf(q + p - 1 + f.emax());
        return sign.or(biased.shiftLeft(p - 1)).or(n.clearBit(p - 1));
    }

    /**
     * Exact: a C99 hexadecimal floating constant (ISO/IEC 9899:1999 §6.4.4.2) whose value is
     * exactly this entry, without a suffix. Normal values are written {@code 0x1.8p+1} (hidden
     * bit 1, trailing hex zeros dropped, {@code 0x1p+0} when the fraction is zero); subnormals
     * keep the encoding's leading 0 and the exponent emin, {@code 0x0.0000000000001p-1022},
     * as C99 §7.19.6.1 {@code %a} output of glibc and {@link Double#toHexString} write them.
     * The fraction has ceil((p − 1)/4) hex digits before trailing zeros are dropped. Zeros
     * are {@code 0x0p+0} and {@code -0x0p+0}; infinities {@code INFINITY} and
     * {@code -INFINITY}, the C99 §7.12 macro, which a template maps for other languages.
     *
     * @throws IllegalStateException when the format is not binary
     */
    public String hexLiteral() {
        BinaryFormat f = binary("hexLiteral()");
        String sign = negative ? "-" : "";
        if (kind == Kind.INFINITE) {
            return sign + "INFINITY";
        }
        if (kind == Kind.ZERO) {
            return sign + "0x0p+0";
        }
        int p = f.precisionBits();
        BigInteger[] nq = significandAndQuantum(f);
        BigInteger n = nq[0];
        boolean normal = n.bitLength() == p;
        int exponent = normal ? nq[1].intValueExact() + p - 1 : f.emin();
        int hexDigits = (p - 1 + 3) / 4;
        // For p <= 53 the fraction field fits in a long (the common binary16/32/64 case).
        String hex = p <= 53
                ? Long.toHexString((n.longValue() & ~(1L << (p - 1))) << (4 * hexDigits - (p - 1)))
                : n.clearBit(p - 1).shiftLeft(4 * hexDigits - (p - 1)).toString(16);
        StringBuilder digits = new StringBuilder(hex);
        while (digits.length() < hexDigits) {
            digits.insert(0, '0');
        }
        int end = digits.length();
        while (end > 0 && digits.charAt(end - 1) == '0') {
            end--;
        }
        digits.setLength(end);
        return sign + "0x" + (normal ? "1" : "0") + (end > 0 ? "." + digits : "")
                + "p" + (exponent < 0 ? "-" : "+") + Math.abs(exponent);
    }

    /**
     * Exact: the shortest decimal that rounds (NEAREST_EVEN, IEEE 754-2019 §4.3.1) back to
     * exactly this entry; among equally short ones, the one nearest the entry (ties between
     * two such: the even last digit). Derived by exact rational arithmetic from the rounding
     * interval of the entry: the points halfway to its neighbours (half the gap to the lower
     * neighbour is a quarter ulp at a power of two above the smallest normal), included
     * exactly when the significand is even, since ties go to even (§4.3.1); for the largest
     * finite value the upper end Ω + ulp/2 rounds to infinity and is excluded. The largest
     * decimal exponent k for which an integer multiple of 10^k lies in the interval gives the
     * fewest digits (a candidate with a trailing zero would be one at k + 1).
     *
     * <p>Written like ECMA-262 Number::toString: plain when the leading digit's exponent E
     * satisfies −6 &lt;= E &lt;= 20 ({@code 0.000001}, {@code 100}; {@code 1e-7} is not plain),
     * else {@code d.ddde±E}. Zeros are {@code 0} and {@code -0}; infinities {@code Infinity}
     * and {@code -Infinity}, as {@link Double#parseDouble} reads them.
     *
     * @throws IllegalStateException when the format is not binary
     */
    public String shortestDecimal() {
        BinaryFormat f = binary("shortestDecimal()");
        String sign = negative ? "-" : "";
        if (kind == Kind.INFINITE) {
            return sign + "Infinity";
        }
        if (kind == Kind.ZERO) {
            return sign + "0";
        }
        BigInteger[] nq = significandAndQuantum(f);
        BigInteger n = nq[0];
        int q = nq[1].intValueExact();
        boolean powerOfTwoStep = n.bitCount() == 1 && n.bitLength() == f.precisionBits()
                && q > Rounding.quantumMin(f);
        // In units of 2^(q−2): v = 4n, the interval ends 4n − 2 (4n − 1 below a power of two) and 4n + 2.
        BigInteger four = n.shiftLeft(2);
        Fraction low = new Fraction(four.subtract(BigInteger.valueOf(powerOfTwoStep ? 1 : 2)), q - 2);
        Fraction high = new Fraction(four.add(BigInteger.TWO), q - 2);
        Fraction v = new Fraction(four, q - 2);
        boolean closed = !n.testBit(0);
        // The largest k with a multiple of 10^k in the interval: feasible(k + 1) implies feasible(k),
        // so start near log10 of the width, then climb while feasible and descend while not.
        int k = (int) Math.floor((q - 2 + Math.log10(powerOfTwoStep ? 3 : 4) / Math.log10(2)) * 0.30102999566398120);
        BigInteger[] range = multiples(low, high, k, closed);
        if (range != null) {
            BigInteger[] up;
            while ((up = multiples(low, high, k + 1, closed)) != null) {
                k++;
                range = up;
            }
        } else {
            while ((range = multiples(low, high, --k, closed)) == null) {
                // descend
            }
        }
        BigInteger nearest = v.roundedOver(k);
        BigInteger m = nearest.max(range[0]).min(range[1]);
        return sign + scientificOrPlain(m, k);
    }

    /** The exact value a · 2^e (a &gt; 0), for the interval arithmetic of {@link #shortestDecimal}. */
    private record Fraction(BigInteger a, int e) {
        /** num/den of x / 10^k with integer num and positive den. */
        BigInteger[] over(int k) {
            BigInteger num = a;
            BigInteger den = BigInteger.ONE;
            if (e >= 0) {
                num = num.shiftLeft(e);
            } else {
                den = den.shiftLeft(-e);
            }
            if (k >= 0) {
                den = den.multiply(tenTo(k));
            } else {
                num = num.multiply(tenTo(-k));
            }
            return new BigInteger[] {num, den};
        }

        /** As {@link #over}, in longs; null when a number would not fit (then {@link #over} is used). */
        long[] overLong(int k) {
            if (a.bitLength() > 62 || Math.abs(k) > 18 || e <= -63) {
                return null;
            }
            long num = a.longValue();
            long den = 1;
            if (e >= 0) {
                if (e >= 62 || (num >>> (62 - e)) != 0) {
                    return null;
                }
                num <<= e;
            } else {
                den = 1L << -e;
            }
            // The overflow test of a signed 64-bit product, without an exception (this runs once
            // per entry; a throw per entry sent the JIT back to the interpreter every time):
            // x·y fits in a long exactly when the high half of the 128-bit product is the sign
            // extension of the low half.
            long x = k >= 0 ? den : num;
            long y = POWERS_OF_TEN[Math.abs(k)];
            long low = x * y;
            if (Math.multiplyHigh(x, y) != low >> 63) {
                return null;
            }
            if (k >= 0) {
                den = low;
            } else {
                num = low;
            }
            return new long[] {num, den};
        }

        /** x / 10^k rounded to the nearest integer, ties to even. */
        BigInteger roundedOver(int k) {
            long[] small = overLong(k);
            if (small != null) {
                long quotient = small[0] / small[1];
                long twice = 2 * (small[0] % small[1]); // den < 2^63 and rem < den: 2·rem may wrap only when den > 2^62
                if (small[1] <= 1L << 62) {
                    int c = Long.compare(twice, small[1]);
                    return BigInteger.valueOf(c > 0 || (c == 0 && (quotient & 1) == 1) ? quotient + 1 : quotient);
                }
            }
            BigInteger[] nd = over(k);
            return Rounding.roundMagnitude(nd[0], nd[1], false, RoundingMode.NEAREST_EVEN);
        }
    }

    private static final long[] POWERS_OF_TEN = new long[19];

    static {
        POWERS_OF_TEN[0] = 1;
        for (int i = 1; i < POWERS_OF_TEN.length; i++) {
            POWERS_OF_TEN[i] = 10 * POWERS_OF_TEN[i - 1];
        }
    }

    private static final BigInteger[] TENS = new BigInteger[5000];

    /** 10^k for k &gt;= 0, cached (the shortest decimals of binary128 need k up to about 4966). */
    private static BigInteger tenTo(int k) {
        if (k >= TENS.length) {
            return BigInteger.TEN.pow(k);
        }
        BigInteger t = TENS[k];
        if (t == null) {
            t = BigInteger.TEN.pow(k);
            TENS[k] = t;
        }
        return t;
    }

    /**
     * The integers m with m · 10^k in the interval from low to high (ends included when
     * {@code closed}) as {first, last}, or null when there is none.
     */
    private static BigInteger[] multiples(Fraction low, Fraction high, int k, boolean closed) {
        long[] ls = low.overLong(k);
        long[] hs = high.overLong(k);
        if (ls != null && hs != null) {
            long ln = ls[0];
            long ld = ls[1];
            long hn = hs[0];
            long hd = hs[1];
            long lq = ln / ld;
            long hq = hn / hd;
            long first = ln % ld == 0 && closed ? lq : lq + 1;
            long last = hn % hd == 0 && !closed ? hq - 1 : hq;
            return first <= last ? new BigInteger[] {BigInteger.valueOf(first), BigInteger.valueOf(last)} : null;
        }
        BigInteger[] l = low.over(k);
        BigInteger[] h = high.over(k);
        BigInteger[] lq = l[0].divideAndRemainder(l[1]);
        BigInteger[] hq = h[0].divideAndRemainder(h[1]);
        // ceil(low/10^k), or the next integer when low is excluded and is itself a multiple
        BigInteger first = lq[1].signum() == 0 ? (closed ? lq[0] : lq[0].add(BigInteger.ONE)) : lq[0].add(BigInteger.ONE);
        BigInteger last = hq[1].signum() == 0 && !closed ? hq[0].subtract(BigInteger.ONE) : hq[0];
        return first.compareTo(last) <= 0 ? new BigInteger[] {first, last} : null;
    }

    /**
     * Exact: the stored integer k of a fixed-point entry (two's-complement value, so
     * {@code -32768} for the smallest {@code fixed:s16.15}); the entry's value is k · 2^-F.
     * For SATURATED and OUT_OF_RANGE entries, the end of the range.
     *
     * @throws IllegalStateException when the format is not fixed point
     */
    public BigInteger fixedInteger() {
        if (format.kind() != Format.Kind.FIXED) {
            throw wrongFormat("fixedInteger()");
        }
        return value.multiply(Rational.TWO.pow(((FixedFormat) format).fractionBits())).numerator();
    }

    /**
     * Exact: for {@code decimal:N}, the entry with exactly N significant digits as
     * {@link DecimalDigits#format} writes it ({@code 0} for zero); for fixed point, the exact
     * decoded value k · 2^-F as a plain decimal without trailing zeros (always finite: 2^-F
     * is a terminating decimal).
     *
     * @throws IllegalStateException for binary and double-double formats
     */
    public String decimalText() {
        return switch (format.kind()) {
            case DECIMAL -> DecimalDigits.format(value.toBigDecimal(MathContext.UNLIMITED), ((DecimalFormat) format).digits());
            case FIXED -> value.toDecimalOrFraction();
            case BINARY, DOUBLE_DOUBLE -> throw wrongFormat("decimalText()");
        };
    }

    private BinaryFormat binary(String what) {
        if (format.kind() != Format.Kind.BINARY) {
            throw wrongFormat(what);
        }
        return (BinaryFormat) format;
    }

    private IllegalStateException wrongFormat(String what) {
        return new IllegalStateException(what + " is not defined for format " + format.name());
    }

    /** n and q with |value| = n · 2^q, q &gt;= emin − p + 1, and n &gt;= 2^(p−1) unless q is that minimum. */
    private BigInteger[] significandAndQuantum(BinaryFormat f) {
        if (value.isZero()) {
            return new BigInteger[] {BigInteger.ZERO, BigInteger.valueOf(Rounding.quantumMin(f))};
        }
        Rational v = value.abs();
        BigInteger den = v.denominator();
        int d = den.bitLength() - 1;
        if (den.bitCount() != 1) {
            throw new IllegalStateException("not a value of " + f.name() + ": " + value);
        }
        // |value| = num / 2^d, so floor(log2 |value|) = bitLength(num) − 1 − d, and n = num · 2^(−q−d).
        BigInteger num = v.numerator();
        int q = Math.max(num.bitLength() - 1 - d - f.precisionBits() + 1, Rounding.quantumMin(f));
        int shift = -q - d;
        BigInteger n;
        if (shift >= 0) {
            n = num.shiftLeft(shift);
        } else {
            if (num.getLowestSetBit() < -shift) {
                throw new IllegalStateException("not a value of " + f.name() + ": " + value);
            }
            n = num.shiftRight(-shift);
        }
        return new BigInteger[] {n, BigInteger.valueOf(q)};
    }




    private static String scientificOrPlain(BigInteger m, int k) {
        String digits = m.bitLength() < 63 ? Long.toString(m.longValue()) : m.toString();
        int exponent = k + digits.length() - 1;
        if (exponent >= -6 && exponent <= 20) {
            // m · 10^k written out in full (what BigDecimal(m, −k).toPlainString() gives)
            int len = digits.length();
            if (k >= 0) {
                return digits + "0".repeat(k);
            }
            if (len > -k) {
                return digits.substring(0, len + k) + "." + digits.substring(len + k);
            }
            return "0." + "0".repeat(-k - len) + digits;
        }
        StringBuilder sb = new StringBuilder().append(digits.charAt(0));
        if (digits.length() > 1) {
            sb.append('.').append(digits, 1, digits.length());
        }
        return sb.append('e').append(exponent < 0 ? '-' : '+').append(Math.abs(exponent)).toString();
    }
}
