package dev.odetab.audit;

import dev.odetab.numeric.Entry;
import dev.odetab.numeric.Format;
import dev.odetab.numeric.Rational;
import dev.odetab.numeric.Rounding;
import dev.odetab.numeric.Target;
import java.math.BigInteger;

/**
 * The value a program holds after reading a table entry into the table's format.
 *
 * <p>Trust level: Exact. Binary formats: the literal is first converted to its own type
 * (binary32 for an {@code f} suffix, binary64 for an unsuffixed floating constant, exact for
 * integers and {@code L}), then to the format, each time rounded to nearest-even, as a C or
 * Java compiler does with the default rounding mode (so {@code float t[] = {0.1}} is rounded
 * twice, as it is in C). binary16: an integer entry of a C or Java array is the 16-bit IEEE
 * encoding (C and Java have no binary16 type; odetab writes such tables as {@code uint16_t} /
 * {@code short}). Fixed point: the entry is the stored integer k, value k · 2^-F; for a signed
 * format an integer in [2^(T−1), 2^T) is read as its two's-complement bit pattern.
 * {@code decimal:N} and double-double: the literal exactly.
 */
final class Held {
    private Held() {
    }

    /** Why an entry cannot be held in the format. */
    static final class NotHeld extends Exception {
        private static final long serialVersionUID = 1L;

        NotHeld(String message) {
            super(message);
        }
    }

    /**
     * Exact: the held value of a literal with the given sign, as an item of the table ({@code
     * arrayEntry} is true for C and Java arrays, where binary16 integers are encodings).
     */
    static Entries.Item of(String text, int line, int column, Literal lit, boolean negative, Format format,
            boolean arrayEntry) throws NotHeld {
        if (lit.beyond() != Literal.Beyond.NO) {
            return beyond(text, line, column, lit, negative, format);
        }
        Rational v = negative ? lit.value().negate() : lit.value();
        return switch (format.kind()) {
            case FIXED -> fixed(text, line, column, lit, negative, v, (Format.FixedFormat) format);
            case BINARY -> binary(text, line, column, lit, negative, v, (Format.BinaryFormat) format, arrayEntry);
            case DOUBLE_DOUBLE, DECIMAL -> new Entries.Item(text, line, column, v, negative);
        };
    }

    /**
     * Exact: a literal beyond every format's range. In a binary format it is held as the
     * compiler holds it, an infinity (overflow) or a zero of its sign (underflow), and audited
     * as such (a finding, not an error); other formats hold no such value.
     */
    private static Entries.Item beyond(String text, int line, int column, Literal lit, boolean negative, Format format)
            throws NotHeld {
        return switch (format.kind()) {
            case BINARY -> new Entries.Item(text, line, column, lit.beyond() == Literal.Beyond.LARGE ? null : Rational.ZERO, negative);
            case FIXED, DOUBLE_DOUBLE, DECIMAL -> throw new NotHeld("'" + text + "' has an exponent beyond what odetab computes with (at most 10^±"
                    + Rational.MAX_DECIMAL_EXPONENT + ") and is no value of " + format.name());
        };
    }

    private static Entries.Item fixed(String text, int line, int column, Literal lit, boolean negative, Rational v,
            Format.FixedFormat f) throws NotHeld {
        if (lit.type() != Literal.Type.INTEGER) {
            throw new NotHeld("a " + f.name() + " table holds stored integers, not '" + text + "'");
        }
        BigInteger k = v.numerator();
        if (f.signed() && k.signum() >= 0 && k.compareTo(f.maxInteger()) > 0
                && k.bitLength() <= f.totalBits()) {
            k = k.subtract(BigInteger.ONE.shiftLeft(f.totalBits()));
        }
        if (k.compareTo(f.minInteger()) < 0 || k.compareTo(f.maxInteger()) > 0) {
            throw new NotHeld("'" + text + "' does not fit in " + f.name());
        }
        return new Entries.Item(text, line, column, Rational.of(k).multiply(Rational.TWO.pow(-f.fractionBits())), negative);
    }

    private static Entries.Item binary(String text, int line, int column, Literal lit, boolean negative, Rational v,
            Format.BinaryFormat b, boolean arrayEntry) throws NotHeld {
        if (arrayEntry && b.equals(Format.BinaryFormat.BINARY16) && lit.type() == Literal.Type.INTEGER) {
            return binary16(text, line, column, v);
        }
        Rational typed = switch (lit.type()) {
            case FLOAT -> held(v, Format.BinaryFormat.BINARY32);
            case DOUBLE -> held(v, Format.BinaryFormat.BINARY64);
            case INTEGER, LONG_DOUBLE, TEXT -> v;
        };
        if (typed == null) {
            return new Entries.Item(text, line, column, null, negative);
        }
        return new Entries.Item(text, line, column, held(typed, b), negative);
    }

    /** Exact: v rounded to nearest-even in a binary format; null when that overflows to infinity. */
    static Rational held(Rational v, Format.BinaryFormat f) {
        Entry e = Rounding.round(v, Target.nearest(f));
        return e.kind() == Entry.Kind.INFINITE ? null : e.value();
    }

    /** Exact: decodes a binary16 encoding (IEEE 754-2019 §3.4); NaN encodings are refused. */
    private static Entries.Item binary16(String text, int line, int column, Rational v) throws NotHeld {
        BigInteger k = v.numerator();
        if (k.signum() < 0 && k.compareTo(BigInteger.valueOf(-0x8000)) >= 0) {
            k = k.add(BigInteger.valueOf(0x10000)); // a Java short written as a negative number
        }
        if (k.signum() < 0 || k.bitLength() > 16) {
            throw new NotHeld("'" + text + "' is not a 16-bit binary16 encoding");
        }
        int bits = k.intValue();
        boolean negative = (bits & 0x8000) != 0;
        int exp = (bits >> 10) & 0x1f;
        int frac = bits & 0x3ff;
        if (exp == 0x1f) {
            if (frac != 0) {
                throw new NotHeld("'" + text + "' encodes a NaN");
            }
            return new Entries.Item(text, line, column, null, negative);
        }
        Rational mag = exp == 0 ? Rational.of(frac).multiply(Rational.TWO.pow(-24))
                : Rational.of(1024 + frac).multiply(Rational.TWO.pow(exp - 25));
        return new Entries.Item(text, line, column, negative ? mag.negate() : mag, negative);
    }
}
