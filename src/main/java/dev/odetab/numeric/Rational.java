package dev.odetab.numeric;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Exact rational number p/q with q &gt; 0 and gcd(p, q) = 1.
 *
 * <p>Trust level: Exact. Every operation returns the exact result; nothing is ever rounded
 * except by {@link #toBigDecimal(MathContext)}, whose rounding is the one of
 * {@link BigDecimal#divide(BigDecimal, MathContext)} (correct rounding in the given mode).
 */
public final class Rational implements Comparable<Rational> {
    public static final Rational ZERO = new Rational(BigInteger.ZERO, BigInteger.ONE);
    public static final Rational ONE = new Rational(BigInteger.ONE, BigInteger.ONE);
    public static final Rational TWO = new Rational(BigInteger.TWO, BigInteger.ONE);

    private final BigInteger num;
    private final BigInteger den;

    private Rational(BigInteger num, BigInteger den) {
        this.num = num;
        this.den = den;
    }

    public static Rational of(long value) {
        return new Rational(BigInteger.valueOf(value), BigInteger.ONE);
    }

    public static Rational of(BigInteger value) {
        return new Rational(value, BigInteger.ONE);
    }

    public static Rational of(long num, long den) {
        if (den == 0) {
            throw new ArithmeticException("division by zero");
        }
        if (num == Long.MIN_VALUE || den == Long.MIN_VALUE) {
            return of(BigInteger.valueOf(num), BigInteger.valueOf(den));
        }
        if (den < 0) {
            num = -num;
            den = -den;
        }
        long a = Math.abs(num);
        long b = den;
        while (b != 0) {
            long r = a % b;
            a = b;
            b = r;
        }
        if (num == 0) {
            return ZERO;
        }
        return new Rational(BigInteger.valueOf(num / a), BigInteger.valueOf(den / a));
    }

    /**
     * Exact: the value of a finite double (IEEE 754-2019 §3.4: significand times a power of
     * two), in lowest terms.
     *
     * @throws IllegalArgumentException for an infinity or NaN
     */
    public static Rational ofDouble(double d) {
        if (!Double.isFinite(d)) {
            throw new IllegalArgumentException("not a finite double: " + d);
        }
        if (d == 0) {
            return ZERO;
        }
        long bits = Double.doubleToRawLongBits(d);
        int biased = (int) ((bits >>> 52) & 0x7ff);
        long significand = bits & ((1L << 52) - 1);
        if (biased == 0) {
            biased = 1;
        } else {
            significand |= 1L << 52;
        }
        int e2 = biased - 1075;
        int tz = Long.numberOfTrailingZeros(significand);
        significand >>= tz;
        e2 += tz;
        BigInteger num = BigInteger.valueOf(d < 0 ? -significand : significand);
        return e2 >= 0 ? new Rational(num.shiftLeft(e2), BigInteger.ONE) : new Rational(num, BigInteger.ONE.shiftLeft(-e2));
    }

    /** p/q reduced to lowest terms; q must not be zero. */
    public static Rational of(BigInteger num, BigInteger den) {
        if (den.signum() == 0) {
            throw new ArithmeticException("division by zero");
        }
        if (den.signum() < 0) {
            num = num.negate();
            den = den.negate();
        }
        if (den.bitCount() == 1 && num.signum() != 0) {
            // A dyadic rational (every binary entry): the gcd is a power of two, found by shifts.
            int shift = Math.min(num.getLowestSetBit(), den.getLowestSetBit());
            return shift == 0 ? new Rational(num, den) : new Rational(num.shiftRight(shift), den.shiftRight(shift));
        }
        BigInteger g = num.gcd(den);
        if (!g.equals(BigInteger.ONE) && g.signum() != 0) {
            num = num.divide(g);
            den = den.divide(g);
        }
        if (num.signum() == 0) {
            den = BigInteger.ONE;
        }
        return new Rational(num, den);
    }

    /** The exact value of a BigDecimal (every finite decimal is a rational). */
    public static Rational of(BigDecimal value) {
        if (value.scale() <= 0) {
            return of(value.toBigIntegerExact());
        }
        return of(value.unscaledValue(), BigInteger.TEN.pow(value.scale()));
    }

    /**
     * The largest power of ten (or, in a hex float, of two, counted in decimal digits) a parsed
     * point may carry: 10^±100000 is far beyond every format (binary128 ends near 10^±4966),
     * and larger exponents would make numbers too long to compute with.
     */
    public static final int MAX_DECIMAL_EXPONENT = 100_000;

    /**
     * Parses an exact decimal ({@code -7.25}, {@code 1e-3}, {@code .5}), a C99 hexadecimal
     * floating literal ({@code 0x1p-2}, {@code -0x1.8p+1}: the exact value that every CSV's
     * {@code _hex} column carries) or a rational of two of them ({@code 1/3}, {@code -2/7}).
     * Never goes through a binary double.
     *
     * @throws NumberFormatException with a message naming what is wrong (also for an exponent
     *     beyond {@link #MAX_DECIMAL_EXPONENT})
     */
    public static Rational parse(String text) {
        String s = text.strip();
        int slash = s.indexOf('/');
        if (slash >= 0) {
            Rational p = parseNumber(s.substring(0, slash), text);
            Rational q = parseNumber(s.substring(slash + 1), text);
            if (q.signum() == 0) {
                throw new NumberFormatException("'" + text + "' divides by zero");
            }
            return p.divide(q);
        }
        return parseNumber(s, text);
    }

    private static Rational parseNumber(String s, String whole) {
        Matcher hex = HEX_FLOAT.matcher(s);
        if (hex.matches()) {
            return parseHex(hex, whole);
        }
        if (s.isEmpty() || !s.matches("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?")) {
            throw new NumberFormatException("'" + whole + "' is not an exact decimal, hex float or rational (like -7.25, 1e-3, 0x1p-2 or 1/3)");
        }
        BigDecimal d;
        try {
            d = new BigDecimal(s);
        } catch (NumberFormatException e) {
            throw exponentTooLarge(whole);
        }
        if (Math.abs((long) d.scale()) > MAX_DECIMAL_EXPONENT) {
            throw exponentTooLarge(whole);
        }
        return of(d);
    }

    /** C99 6.4.4.2: sign, 0x, hex digits with an optional point, and a binary exponent (required). */
    private static final Pattern HEX_FLOAT =
            Pattern.compile("([+-]?)0[xX]([0-9a-fA-F]*)(?:\\.([0-9a-fA-F]*))?[pP]([+-]?\\d+)");

    /** Exact: digits·16^-f·2^e, the value C99 gives the literal before it rounds it to a type. */
    private static Rational parseHex(Matcher m, String whole) {
        String intDigits = m.group(2);
        String fracDigits = m.group(3) == null ? "" : m.group(3);
        if (intDigits.isEmpty() && fracDigits.isEmpty()) {
            throw new NumberFormatException("'" + whole + "' has no hex digits");
        }
        String exp = m.group(4);
        // |e| at most MAX_DECIMAL_EXPONENT·log2(10) < 4·MAX_DECIMAL_EXPONENT, checked before parsing as an int
        long maxBinary = 4L * MAX_DECIMAL_EXPONENT;
        String expDigits = exp.replaceFirst("^[+-]", "").replaceFirst("^0+(?=\\d)", "");
        if (expDigits.length() > 9 || Long.parseLong(expDigits) + 4L * fracDigits.length() > maxBinary) {
            throw exponentTooLarge(whole);
        }
        BigInteger significand = new BigInteger(intDigits + fracDigits, 16);
        if (m.group(1).equals("-")) {
            significand = significand.negate();
        }
        long e2 = Long.parseLong(exp) - 4L * fracDigits.length();
        return e2 >= 0 ? of(significand.shiftLeft((int) e2), BigInteger.ONE) : of(significand, BigInteger.ONE.shiftLeft((int) -e2));
    }

    private static NumberFormatException exponentTooLarge(String whole) {
        return new NumberFormatException("'" + whole + "' has an exponent beyond what odetab computes with (at most 10^±"
                + MAX_DECIMAL_EXPONENT + ", or the same range in a hex float)");
    }

    public BigInteger numerator() {
        return num;
    }

    public BigInteger denominator() {
        return den;
    }

    public int signum() {
        return num.signum();
    }

    public boolean isZero() {
        return num.signum() == 0;
    }

    public boolean isInteger() {
        return den.equals(BigInteger.ONE);
    }

    public Rational add(Rational o) {
        if (den.equals(o.den)) {
            return of(num.add(o.num), den);
        }
        return of(num.multiply(o.den).add(o.num.multiply(den)), den.multiply(o.den));
    }

    public Rational subtract(Rational o) {
        return add(o.negate());
    }

    public Rational multiply(Rational o) {
        return of(num.multiply(o.num), den.multiply(o.den));
    }

    public Rational multiply(long k) {
        return of(num.multiply(BigInteger.valueOf(k)), den);
    }

    public Rational divide(Rational o) {
        if (o.num.signum() == 0) {
            throw new ArithmeticException("division by zero");
        }
        return of(num.multiply(o.den), den.multiply(o.num));
    }

    public Rational negate() {
        return new Rational(num.negate(), den);
    }

    public Rational abs() {
        return num.signum() < 0 ? negate() : this;
    }

    public Rational reciprocal() {
        return ONE.divide(this);
    }

    /** this^k for any integer k (k &lt; 0 needs a non-zero base). */
    public Rational pow(int k) {
        if (k < 0) {
            return reciprocal().pow(-k);
        }
        return new Rational(num.pow(k), den.pow(k));
    }

    /** Correctly rounded to {@code mc} (precision and rounding mode of the context). */
    public BigDecimal toBigDecimal(MathContext mc) {
        if (isInteger()) {
            return new BigDecimal(num).round(mc);
        }
        return new BigDecimal(num).divide(new BigDecimal(den), mc);
    }

    /** The exact decimal expansion when the denominator is 2^a 5^b, else null. */
    public BigDecimal toBigDecimalExact() {
        BigInteger d = den;
        int twos = d.getLowestSetBit();
        d = d.shiftRight(twos);
        int fives = 0;
        BigInteger five = BigInteger.valueOf(5);
        while (d.mod(five).signum() == 0) {
            d = d.divide(five);
            fives++;
        }
        if (!d.equals(BigInteger.ONE)) {
            return null;
        }
        int scale = Math.max(twos, fives);
        BigInteger scaled = num.multiply(BigInteger.TEN.pow(scale)).divide(den);
        return new BigDecimal(scaled, scale);
    }

    /** Largest integer not above this value. */
    public BigInteger floor() {
        BigInteger[] qr = num.divideAndRemainder(den);
        return (qr[1].signum() < 0) ? qr[0].subtract(BigInteger.ONE) : qr[0];
    }

    /** A double near this value: for heuristics only (choosing a parameter), never for a bound. */
    public double doubleEstimate() {
        return toBigDecimal(MathContext.DECIMAL64).doubleValue();
    }

    public Rational min(Rational o) {
        return compareTo(o) <= 0 ? this : o;
    }

    public Rational max(Rational o) {
        return compareTo(o) >= 0 ? this : o;
    }

    @Override
    public int compareTo(Rational o) {
        return num.multiply(o.den).compareTo(o.num.multiply(den));
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Rational r && num.equals(r.num) && den.equals(r.den);
    }

    @Override
    public int hashCode() {
        return num.hashCode() * 31 + den.hashCode();
    }

    /** {@code p} or {@code p/q}. */
    @Override
    public String toString() {
        return isInteger() ? num.toString() : num + "/" + den;
    }

    /** The exact decimal when there is one ({@code -7.25}), else {@code p/q}. */
    public String toDecimalOrFraction() {
        BigDecimal d = toBigDecimalExact();
        return d == null ? toString() : d.stripTrailingZeros().toPlainString().replaceFirst("^-0$", "0");
    }
}
