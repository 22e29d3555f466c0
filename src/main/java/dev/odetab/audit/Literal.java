package dev.odetab.audit;

import dev.odetab.numeric.Rational;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Numeric literals of C99 (ISO/IEC 9899:1999 §6.4.4.1, §6.4.4.2) and Java (JLS 17 §3.10.1,
 * §3.10.2), read exactly.
 *
 * <p>Trust level: Exact. The value is the literal's mathematical value, before any conversion
 * to its type; {@link #type} says what type the compiler gives it, so that the caller can
 * apply that conversion.
 *
 * <p>An exponent beyond {@link Rational#MAX_DECIMAL_EXPONENT} (in powers of ten, or the same
 * range in powers of two for a hex float) is not computed with: such a literal is {@link
 * Beyond#LARGE} (it overflows every format) or {@link Beyond#SMALL} (it underflows every
 * format to zero) and has no value.
 *
 * @param value the exact value of the digits (unsigned); null when {@code beyond} is not NO
 * @param type what the compiler makes of it
 * @param beyond whether the exponent lies beyond the range odetab computes with
 */
record Literal(Rational value, Type type, Beyond beyond) {
    /** Whether a literal's magnitude lies beyond every format. */
    enum Beyond {
        NO, LARGE, SMALL
    }

    /** A literal within range. */
    Literal(Rational value, Type type) {
        this(value, type, Beyond.NO);
    }

    /** The largest binary exponent computed with: 2^MAX_BINARY_EXPONENT exceeds 10^MAX_DECIMAL_EXPONENT. */
    private static final int MAX_BINARY_EXPONENT = 332_193;

    /** The type a literal has in C or Java, which decides its first rounding. */
    enum Type {
        /** An integer constant: exact. */
        INTEGER,
        /** A floating constant with suffix f or F: rounded to binary32. */
        FLOAT,
        /** A floating constant without suffix (or with d, D): rounded to binary64. */
        DOUBLE,
        /** A C floating constant with suffix l or L: long double, taken exactly here. */
        LONG_DOUBLE,
        /** A number in a text file (CSV): exact, rounded once into the table's format. */
        TEXT
    }

    private static final Pattern DECIMAL_FLOAT = Pattern.compile(
            "((?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][+-]?\\d+)?)([fFdDlL]?)");
    private static final Pattern HEX_FLOAT = Pattern.compile(
            "0[xX]([0-9a-fA-F]*)(?:\\.([0-9a-fA-F]*))?[pP]([+-]?\\d+)([fFdDlL]?)");
    private static final Pattern INTEGER = Pattern.compile(
            "(0[xX][0-9a-fA-F]+|0[bB][01]+|0[0-7]*|[1-9]\\d*)([uU]?(?:[lL]{1,2})?[uU]?)");

    /**
     * Exact: the literal spelled {@code text} (no sign; Java underscores between digits
     * allowed), or null when the text is not a numeric literal. An integer with a leading 0
     * is octal, as in both languages.
     */
    static Literal parse(String text) {
        String s = text.replace("_", "");
        if (s.isEmpty() || s.startsWith("_") || text.endsWith("_")) {
            return null;
        }
        Matcher m = INTEGER.matcher(s);
        if (m.matches()) {
            String d = m.group(1);
            BigInteger v;
            if (d.length() > 1 && (d.charAt(1) == 'x' || d.charAt(1) == 'X')) {
                v = new BigInteger(d.substring(2), 16);
            } else if (d.length() > 1 && (d.charAt(1) == 'b' || d.charAt(1) == 'B')) {
                v = new BigInteger(d.substring(2), 2);
            } else if (d.length() > 1 && d.charAt(0) == '0') {
                v = new BigInteger(d.substring(1), 8);
            } else {
                v = new BigInteger(d);
            }
            return new Literal(Rational.of(v), Type.INTEGER);
        }
        m = HEX_FLOAT.matcher(s);
        if (m.matches()) {
            String whole = m.group(1);
            String frac = m.group(2) == null ? "" : m.group(2);
            if (whole.isEmpty() && frac.isEmpty()) {
                return null;
            }
            BigInteger digits = new BigInteger("0" + whole + frac, 16);
            BigInteger exp = new BigInteger(m.group(3)).subtract(BigInteger.valueOf(4L * frac.length()));
            Type type = type(m.group(4));
            if (digits.signum() != 0 && exp.abs().compareTo(BigInteger.valueOf(MAX_BINARY_EXPONENT)) > 0) {
                return new Literal(null, type, exp.signum() > 0 ? Beyond.LARGE : Beyond.SMALL);
            }
            return new Literal(Rational.of(digits).multiply(Rational.TWO.pow(digits.signum() == 0 ? 0 : exp.intValueExact())), type);
        }
        m = DECIMAL_FLOAT.matcher(s);
        if (m.matches() && (s.contains(".") || s.toLowerCase(Locale.ROOT).contains("e") || !m.group(2).isEmpty())) {
            String number = m.group(1);
            int e = Math.max(number.indexOf('e'), number.indexOf('E'));
            String mantissa = e < 0 ? number : number.substring(0, e);
            BigInteger exp = e < 0 ? BigInteger.ZERO : new BigInteger(number.substring(e + 1));
            // beyond the bound by a margin that the mantissa's own digits cannot make up
            BigInteger bound = BigInteger.valueOf(Rational.MAX_DECIMAL_EXPONENT + (long) mantissa.length());
            if (mantissa.chars().anyMatch(ch -> ch >= '1' && ch <= '9') && exp.abs().compareTo(bound) > 0) {
                return new Literal(null, type(m.group(2)), exp.signum() > 0 ? Beyond.LARGE : Beyond.SMALL);
            }
            BigDecimal value = exp.abs().compareTo(bound) > 0 ? BigDecimal.ZERO : new BigDecimal(number);
            return new Literal(Rational.of(value), type(m.group(2)));
        }
        return null;
    }

    private static Type type(String suffix) {
        return switch (suffix) {
            case "f", "F" -> Type.FLOAT;
            case "l", "L" -> Type.LONG_DOUBLE;
            default -> Type.DOUBLE;
        };
    }
}
