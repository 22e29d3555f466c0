package dev.odetab.numeric;

import java.math.BigInteger;
import java.util.Locale;
import java.util.OptionalInt;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A target format of table entries (DESIGN "Formats and rounding").
 *
 * <p>Every format has one canonical spelling, {@link #name()}, which {@link #parse} accepts
 * and which round-trips: {@code Format.parse(f.name()).equals(f)}.
 *
 * <p>A format owns its behaviour. Properties every caller needs are methods of this interface,
 * which each record must implement; code outside {@code numeric} that treats the formats
 * differently switches over {@link #kind()} in a switch <em>expression</em> without
 * {@code default}, so that a new format is one new record and one new {@link Kind} constant,
 * and the compiler lists every place that must handle it (STYLE.md, habit 8).
 */
public sealed interface Format {
    /** One constant per record of this interface. */
    enum Kind {
        /** {@link BinaryFormat}. */
        BINARY,
        /** {@link DoubleDouble}. */
        DOUBLE_DOUBLE,
        /** {@link DecimalFormat}. */
        DECIMAL,
        /** {@link FixedFormat}. */
        FIXED
    }

    /** All spellings {@link #parse} accepts, for messages. */
    String SPELLINGS = "binary16, binary32, binary64, binary128, double-double, "
            + "decimal:N (1 <= N <= " + 10_000 + "), fixed:sT.F or fixed:uT.F "
            + "(T bits in all, the sign included, 2..64 signed or 1..64 unsigned; F of them fraction bits, 0..128: "
            + "fixed:s16.15 is 16 bits with 15 fraction bits, the Q-format Q0.15 or Q15; fixed:u32.24 is UQ8.24)";

    /** The canonical spelling, exactly as {@link #parse} accepts it. */
    String name();

    /** Which record this is, for exhaustive switches outside {@code numeric}. */
    Kind kind();

    /**
     * Exact: the significant bits an entry holds (p for binary formats, 107 for double-double,
     * the bits of N decimal digits for {@code decimal:N}, T for fixed point). Precision loops
     * start from it (a heuristic choice); it never sets a radius.
     */
    int significantBits();

    /**
     * Exact: the exponent of the smallest positive normal number, 2^emin (IEEE 754-2019 §3.3),
     * binary64's for double-double; empty for decimal and fixed point, which have no normal
     * range to leave (no underflow).
     */
    OptionalInt normalEmin();

    /**
     * Exact: whether values beyond the format's range follow an {@link OutOfRange} policy:
     * true for fixed point (a bounded integer range); false for binary formats and
     * double-double, which overflow to infinity or the largest finite value by IEEE 754-2019
     * §7.4, and for decimal, whose exponent is unbounded.
     */
    boolean hasOutOfRangePolicy();

    /**
     * Exact: the format spelled {@code text} (surrounding blanks ignored, otherwise exact:
     * lower case, no leading zeros in numbers).
     *
     * <p>Accepts {@code binary16}, {@code binary32}, {@code binary64}, {@code binary128}
     * (IEEE 754-2019 §3.6), {@code double-double}, {@code decimal:N} with 1 &lt;= N &lt;= 10000
     * significant digits, and two's-complement fixed point {@code fixed:sT.F} (signed,
     * 2 &lt;= T &lt;= 64) or {@code fixed:uT.F} (unsigned, 1 &lt;= T &lt;= 64) with T stored bits
     * of which F are fraction bits, 0 &lt;= F &lt;= 128. F may exceed T: the stored integer k
     * then means k · 2^-F, all of whose bits lie below the binary point.
     *
     * @throws IllegalArgumentException naming the text, what was expected and all formats
     */
    static Format parse(String text) {
        String s = text == null ? "" : text.strip();
        for (BinaryFormat b : BinaryFormat.STANDARD) {
            if (b.name().equals(s)) {
                return b;
            }
        }
        if (s.equals(DoubleDouble.NAME)) {
            return DoubleDouble.INSTANCE;
        }
        if (s.startsWith("decimal:")) {
            Matcher dec = Pattern.compile("decimal:(0|[1-9][0-9]*)").matcher(s);
            if (!dec.matches()) {
                throw bad(text, "decimal:N with N a number of significant digits from 1 to 10000");
            }
            int n = boundedInt(dec.group(1), DecimalFormat.MAX_DIGITS + 1);
            if (n < 1 || n > DecimalFormat.MAX_DIGITS) {
                throw bad(text, "decimal:N with 1 <= N <= 10000");
            }
            return new DecimalFormat(n);
        }
        if (s.startsWith("fixed:")) {
            Matcher fx = Pattern.compile("fixed:([su])(0|[1-9][0-9]*)\\.(0|[1-9][0-9]*)").matcher(s);
            if (!fx.matches()) {
                throw bad(text, "fixed:sT.F or fixed:uT.F (like fixed:s16.15 or fixed:u32.24)");
            }
            boolean signed = fx.group(1).equals("s");
            int total = boundedInt(fx.group(2), 1000);
            int fraction = boundedInt(fx.group(3), 1000);
            try {
                return new FixedFormat(signed, total, fraction);
            } catch (IllegalArgumentException e) {
                throw bad(text, e.getMessage());
            }
        }
        throw bad(text, "a format name");
    }

    private static int boundedInt(String digits, int cap) {
        return digits.length() > 6 ? cap : Math.min(Integer.parseInt(digits), cap);
    }

    private static IllegalArgumentException bad(String text, String expected) {
        return new IllegalArgumentException(String.format(Locale.ROOT,
                "unknown format '%s': expected %s; formats: %s", text, expected, SPELLINGS));
    }

    /**
     * An IEEE 754 binary interchange format (IEEE 754-2019 §3.6, table 3.5).
     *
     * @param name the spelling
     * @param precisionBits p, significand bits including the hidden bit
     * @param emax the largest exponent; emin = 1 − emax; it must be 2^(w−1) − 1 for the
     *             exponent field width w, so that {@link #encodingBits()} is defined
     */
    record BinaryFormat(String name, int precisionBits, int emax) implements Format {
        public static final BinaryFormat BINARY16 = new BinaryFormat("binary16", 11, 15);
        public static final BinaryFormat BINARY32 = new BinaryFormat("binary32", 24, 127);
        public static final BinaryFormat BINARY64 = new BinaryFormat("binary64", 53, 1023);
        public static final BinaryFormat BINARY128 = new BinaryFormat("binary128", 113, 16383);
        static final BinaryFormat[] STANDARD = {BINARY16, BINARY32, BINARY64, BINARY128};

        public BinaryFormat {
            if (precisionBits < 2 || emax < 1 || Integer.bitCount(emax + 1) != 1) {
                throw new IllegalArgumentException("binary format needs p >= 2 and emax = 2^(w-1) - 1, got p = "
                        + precisionBits + ", emax = " + emax);
            }
        }

        /** emin = 1 − emax (IEEE 754-2019 §3.3). */
        public int emin() {
            return 1 - emax;
        }

        @Override
        public Kind kind() {
            return Kind.BINARY;
        }

        @Override
        public int significantBits() {
            return precisionBits;
        }

        @Override
        public OptionalInt normalEmin() {
            return OptionalInt.of(emin());
        }

        @Override
        public boolean hasOutOfRangePolicy() {
            return false;
        }

        /** The exponent field width w: emax = 2^(w−1) − 1. */
        public int exponentFieldBits() {
            return Integer.numberOfTrailingZeros(emax + 1) + 1;
        }

        /** k = 1 + w + (p − 1), the width of the interchange encoding. */
        public int encodingBits() {
            return exponentFieldBits() + precisionBits;
        }

        /** The largest finite value (2 − 2^(1−p)) · 2^emax, exactly. */
        public Rational maxFinite() {
            BigInteger m = BigInteger.ONE.shiftLeft(precisionBits).subtract(BigInteger.ONE);
            return Rational.of(m).multiply(Rational.TWO.pow(emax - precisionBits + 1));
        }

        /** The smallest positive subnormal 2^(emin − p + 1), exactly. */
        public Rational minSubnormal() {
            return Rational.TWO.pow(emin() - precisionBits + 1);
        }
    }

    /**
     * Double-double: an unevaluated sum hi + lo of two binary64 numbers (Muller et al.,
     * Handbook of Floating-Point Arithmetic, 2nd ed., 2018, §14.1, "double-word"). The
     * rounding that produces it is defined in {@link Rounding#round}.
     */
    record DoubleDouble() implements Format {
        static final String NAME = "double-double";
        public static final DoubleDouble INSTANCE = new DoubleDouble();

        @Override
        public String name() {
            return NAME;
        }

        @Override
        public Kind kind() {
            return Kind.DOUBLE_DOUBLE;
        }

        /** 53 + 53 + 1: the sign of lo gives one more bit. */
        @Override
        public int significantBits() {
            return 107;
        }

        @Override
        public OptionalInt normalEmin() {
            return BinaryFormat.BINARY64.normalEmin();
        }

        @Override
        public boolean hasOutOfRangePolicy() {
            return false;
        }
    }

    /**
     * N significant decimal digits, unbounded exponent.
     *
     * @param digits N, 1 &lt;= N &lt;= {@link #MAX_DIGITS}
     */
    record DecimalFormat(int digits) implements Format {
        public static final int MAX_DIGITS = 10_000;

        public DecimalFormat {
            if (digits < 1 || digits > MAX_DIGITS) {
                throw new IllegalArgumentException("decimal digits must be 1.." + MAX_DIGITS + ", got " + digits);
            }
        }

        @Override
        public String name() {
            return "decimal:" + digits;
        }

        @Override
        public Kind kind() {
            return Kind.DECIMAL;
        }

        @Override
        public int significantBits() {
            return Precision.bitsForDigits(digits);
        }

        @Override
        public OptionalInt normalEmin() {
            return OptionalInt.empty();
        }

        @Override
        public boolean hasOutOfRangePolicy() {
            return false;
        }
    }

    /**
     * Two's-complement (signed) or unsigned binary fixed point: a stored integer k of
     * {@code totalBits} bits meaning k · 2^-fractionBits.
     *
     * @param signed      whether k is two's complement, range [−2^(T−1), 2^(T−1) − 1]; else [0, 2^T − 1]
     * @param totalBits   T: 2..64 when signed, 1..64 when unsigned
     * @param fractionBits F: 0..128
     */
    record FixedFormat(boolean signed, int totalBits, int fractionBits) implements Format {
        public static final int MAX_TOTAL_BITS = 64;
        public static final int MAX_FRACTION_BITS = 128;

        public FixedFormat {
            int minTotal = signed ? 2 : 1;
            if (totalBits < minTotal || totalBits > MAX_TOTAL_BITS) {
                throw new IllegalArgumentException((signed ? "signed" : "unsigned") + " fixed point needs "
                        + minTotal + " to " + MAX_TOTAL_BITS + " total bits, got " + totalBits);
            }
            if (fractionBits < 0 || fractionBits > MAX_FRACTION_BITS) {
                throw new IllegalArgumentException("fixed point needs 0 to " + MAX_FRACTION_BITS
                        + " fraction bits, got " + fractionBits);
            }
        }

        @Override
        public String name() {
            return "fixed:" + (signed ? "s" : "u") + totalBits + "." + fractionBits;
        }

        @Override
        public Kind kind() {
            return Kind.FIXED;
        }

        @Override
        public int significantBits() {
            return totalBits;
        }

        @Override
        public OptionalInt normalEmin() {
            return OptionalInt.empty();
        }

        @Override
        public boolean hasOutOfRangePolicy() {
            return true;
        }

        /** The smallest stored integer: −2^(T−1) signed, 0 unsigned. */
        public BigInteger minInteger() {
            return signed ? BigInteger.ONE.shiftLeft(totalBits - 1).negate() : BigInteger.ZERO;
        }

        /** The largest stored integer: 2^(T−1) − 1 signed, 2^T − 1 unsigned. */
        public BigInteger maxInteger() {
            return BigInteger.ONE.shiftLeft(signed ? totalBits - 1 : totalBits).subtract(BigInteger.ONE);
        }
    }
}
