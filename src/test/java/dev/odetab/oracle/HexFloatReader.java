package dev.odetab.oracle;

import dev.odetab.numeric.Rational;
import java.math.BigInteger;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Exact reader of C99 hexadecimal floating constants (ISO/IEC 9899:1999 §6.4.4.2): the
 * value is the hexadecimal significand (digits before and after the point) times 2 to the
 * binary exponent. Written independently of the code that writes them.
 */
public final class HexFloatReader {
    private static final Pattern HEX = Pattern.compile("(-?)0[xX]([0-9a-fA-F]*)(?:\\.([0-9a-fA-F]*))?[pP]([+-]?[0-9]+)");

    /**
     * The sign and exact value of a literal.
     *
     * @param negative whether it starts with '-'
     * @param value    the exact value with its sign
     */
    public record Read(boolean negative, Rational value) {
    }

    private HexFloatReader() {
    }

    public static Read read(String text) {
        Matcher m = HEX.matcher(text);
        if (!m.matches() || (m.group(2).isEmpty() && (m.group(3) == null || m.group(3).isEmpty()))) {
            throw new IllegalArgumentException("not a C99 hexadecimal floating constant: " + text);
        }
        String frac = m.group(3) == null ? "" : m.group(3);
        BigInteger digits = new BigInteger(m.group(2) + frac + "0", 16).shiftRight(4);
        int exponent = Integer.parseInt(m.group(4)) - 4 * frac.length();
        Rational magnitude = Rational.of(digits).multiply(Rational.TWO.pow(exponent));
        boolean negative = m.group(1).equals("-");
        return new Read(negative, negative ? magnitude.negate() : magnitude);
    }
}
