package dev.odetab.oracle;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Exact oracle for IEEE 754 binary interchange formats, independent of the code under test:
 * the encoding of a hex float literal (IEEE 754-2019 3.4, the fields S, E, T of a binary
 * interchange format; literal syntax of ISO/IEC 9899:1999 6.4.4.2) and the roundTiesToEven
 * rounding of a decimal (IEEE 754-2019 4.3.1, 5.12.2), in BigInteger arithmetic only.
 * Cross-checked against Double.parseDouble and Float.parseFloat where those apply.
 */
public final class BinaryInterchange {
    public static final BinaryInterchange BINARY16 = new BinaryInterchange(11, 15);
    public static final BinaryInterchange BINARY32 = new BinaryInterchange(24, 127);
    public static final BinaryInterchange BINARY64 = new BinaryInterchange(53, 1023);
    public static final BinaryInterchange BINARY128 = new BinaryInterchange(113, 16383);

    private static final Pattern HEX = Pattern.compile("([+-]?)0[xX]([0-9a-fA-F]*)(?:\\.([0-9a-fA-F]*))?[pP]([+-]?[0-9]+)");

    private final int precisionBits;
    private final int emax;
    private final int exponentBits;

    /** p significand bits (hidden bit included), emax = 2^(w-1) - 1 (IEEE 754-2019 table 3.5). */
    private BinaryInterchange(int precisionBits, int emax) {
        this.precisionBits = precisionBits;
        this.emax = emax;
        this.exponentBits = BigInteger.valueOf(emax).bitLength() + 1;
    }

    /** The encoding of an exact hex float literal; fails when the literal is not a finite value of this format. */
    public BigInteger encodeHex(String literal) {
        Matcher m = HEX.matcher(literal);
        if (!m.matches()) {
            throw new IllegalArgumentException("not a hex float literal: " + literal);
        }
        String frac = m.group(3) == null ? "" : m.group(3);
        String digits = m.group(2) + frac;
        BigInteger significand = new BigInteger(digits.isEmpty() ? "0" : digits, 16);
        int exponent = Integer.parseInt(m.group(4)) - 4 * frac.length();
        return encode(m.group(1).equals("-"), significand, exponent, literal);
    }

    /** The exact value of a finite hex float literal. */
    public static BigDecimal hexValue(String literal) {
        Matcher m = HEX.matcher(literal);
        if (!m.matches()) {
            throw new IllegalArgumentException("not a hex float literal: " + literal);
        }
        String frac = m.group(3) == null ? "" : m.group(3);
        String digits = m.group(2) + frac;
        BigDecimal significand = new BigDecimal(new BigInteger(digits.isEmpty() ? "0" : digits, 16));
        int exponent = Integer.parseInt(m.group(4)) - 4 * frac.length();
        BigDecimal v = exponent >= 0 ? significand.multiply(new BigDecimal(BigInteger.TWO.pow(exponent)))
                : significand.divide(new BigDecimal(BigInteger.TWO.pow(-exponent)));
        return m.group(1).equals("-") ? v.negate() : v;
    }

    /** The roundTiesToEven encoding of an exact decimal ("-0.1", "1e-3"); no overflow expected. */
    public BigInteger roundDecimal(String decimal) {
        BigDecimal d = new BigDecimal(decimal);
        boolean negative = decimal.strip().startsWith("-");
        if (d.signum() == 0) {
            return encode(negative, BigInteger.ZERO, 0, decimal);
        }
        BigInteger num = d.abs().unscaledValue();
        BigInteger den = BigInteger.ONE;
        if (d.scale() > 0) {
            den = BigInteger.TEN.pow(d.scale());
        } else {
            num = num.multiply(BigInteger.TEN.pow(-d.scale()));
        }
        // e = floor(log2(num/den))
        int e = num.bitLength() - den.bitLength();
        if (compareScaled(num, den, e) < 0) {
            e--;
        }
        int emin = 1 - emax;
        int q = Math.max(e, emin) - (precisionBits - 1);
        // n = num / (den * 2^q), with remainder
        BigInteger a = q >= 0 ? num : num.shiftLeft(-q);
        BigInteger b = q >= 0 ? den.shiftLeft(q) : den;
        BigInteger[] qr = a.divideAndRemainder(b);
        BigInteger n = qr[0];
        int c = qr[1].shiftLeft(1).compareTo(b);
        if (c > 0 || (c == 0 && n.testBit(0))) {
            n = n.add(BigInteger.ONE);
        }
        return encode(negative, n, q, decimal);
    }

    /** The 64-bit halves of an encoding, for binary128. */
    public static BigInteger high64(BigInteger bits) {
        return bits.shiftRight(64);
    }

    public static BigInteger low64(BigInteger bits) {
        return bits.and(BigInteger.ONE.shiftLeft(64).subtract(BigInteger.ONE));
    }

    /** sign(num/den - 2^e) */
    private static int compareScaled(BigInteger num, BigInteger den, int e) {
        return e >= 0 ? num.compareTo(den.shiftLeft(e)) : num.shiftLeft(-e).compareTo(den);
    }

    /** The encoding of (-1)^s * m * 2^q, which must be exact and finite in this format. */
    private BigInteger encode(boolean negative, BigInteger m, int q, String what) {
        int t = precisionBits - 1;
        BigInteger sign = negative ? BigInteger.ONE.shiftLeft(exponentBits + t) : BigInteger.ZERO;
        if (m.signum() == 0) {
            return sign;
        }
        int e = q + m.bitLength() - 1;
        int emin = 1 - emax;
        if (e > emax) {
            throw new IllegalArgumentException(what + " overflows the format");
        }
        int lsbExponent = Math.max(e, emin) - t;
        BigInteger field = exactShift(m, q - lsbExponent, what);
        BigInteger biased = BigInteger.valueOf(e >= emin ? e + emax : 0);
        if (e >= emin) {
            field = field.clearBit(t);
        }
        return sign.or(biased.shiftLeft(t)).or(field);
    }

    private static BigInteger exactShift(BigInteger m, int shift, String what) {
        if (shift >= 0) {
            return m.shiftLeft(shift);
        }
        if (m.getLowestSetBit() < -shift) {
            throw new IllegalArgumentException(what + " is not exact in the format");
        }
        return m.shiftRight(-shift);
    }
}
