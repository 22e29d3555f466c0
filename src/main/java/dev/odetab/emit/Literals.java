package dev.odetab.emit;

import dev.odetab.numeric.Entry;
import dev.odetab.numeric.Format;
import java.math.BigInteger;
import java.util.List;

/**
 * How one format's entries appear in C, Java and CSV. Java formats every literal; templates
 * only lay them out (STYLE.md). A double-double column becomes two binary64 arrays
 * ({@code _hi}, {@code _lo}); a binary128 column two arrays of the 64-bit halves of its IEEE
 * encoding ({@code _bits_hi}, {@code _bits_lo}); binary16 entries are stored as their 16-bit
 * encoding, since C99 and Java have no binary16 type.
 */
final class Literals {
    private Literals() {
    }

    /** One array of a column as emitted: a name suffix, its element types and literals. */
    record Part(String suffix, String cType, String javaType, String description) {
    }

    static List<Part> parts(Format f) {
        return switch (f.kind()) {
            case BINARY -> binaryParts((Format.BinaryFormat) f);
            case DOUBLE_DOUBLE -> List.of(new Part("_hi", "double", "double", "double-double head (binary64)"),
                    new Part("_lo", "double", "double", "double-double tail (binary64)"));
            case DECIMAL -> List.of(new Part("", "char *const", "String",
                    "decimal, " + ((Format.DecimalFormat) f).digits() + " significant digits"));
            case FIXED -> fixedParts((Format.FixedFormat) f);
        };
    }

    private static List<Part> binaryParts(Format.BinaryFormat b) {
        return switch (standard(b)) {
            case BINARY16 -> List.of(new Part("", "uint16_t", "short", "binary16 encodings (IEEE 754-2019 3.4)"));
            case BINARY32 -> List.of(new Part("", "float", "float", "binary32"));
            case BINARY64 -> List.of(new Part("", "double", "double", "binary64"));
            case BINARY128 -> List.of(new Part("_bits_hi", "uint64_t", "long", "binary128 encoding, high 64 bits"),
                    new Part("_bits_lo", "uint64_t", "long", "binary128 encoding, low 64 bits"));
        };
    }

    private static List<Part> fixedParts(Format.FixedFormat x) {
        return List.of(new Part("", fixedCType(x), fixedJavaType(x), x.name() + ": value = integer / 2^" + x.fractionBits()));
    }

    /** The binary formats that C and Java outputs spell, one type each. */
    private enum Standard {
        BINARY16(Format.BinaryFormat.BINARY16), BINARY32(Format.BinaryFormat.BINARY32),
        BINARY64(Format.BinaryFormat.BINARY64), BINARY128(Format.BinaryFormat.BINARY128);

        private final Format.BinaryFormat format;

        Standard(Format.BinaryFormat format) {
            this.format = format;
        }
    }

    /**
     * Which standard binary format {@code b} is. Any other binary format is a programming
     * error, named here rather than written with another format's spelling.
     */
    private static Standard standard(Format.BinaryFormat b) {
        for (Standard s : Standard.values()) {
            if (s.format.equals(b)) {
                return s;
            }
        }
        throw new IllegalArgumentException("no C or Java spelling for the binary format " + b.name());
    }

    /** The C99 literal of part {@code part} of an entry. */
    static String c(Entry e, int part) {
        return switch (e.format().kind()) {
            case BINARY -> switch (standard((Format.BinaryFormat) e.format())) {
                case BINARY16 -> String.format("0x%04x", e.bits().intValue());
                case BINARY32 -> e.hexLiteral() + "f";
                case BINARY64 -> e.hexLiteral();
                case BINARY128 -> hex64(part == 0 ? e.bits().shiftRight(64) : e.bits()) + "u";
            };
            case DOUBLE_DOUBLE -> (part == 0 ? e.hi() : e.lo()).hexLiteral();
            case DECIMAL -> "\"" + e.decimalText() + "\"";
            case FIXED -> cFixed(e, (Format.FixedFormat) e.format());
        };
    }

    private static String cFixed(Entry e, Format.FixedFormat x) {
        BigInteger k = e.fixedInteger();
        String suffix = (x.signed() ? "" : "u") + (x.totalBits() > 32 ? "LL" : "");
        if (x.signed() && x.totalBits() >= 32 && k.equals(BigInteger.ONE.shiftLeft(x.totalBits() - 1).negate())) {
            // C has no literal for the most negative value of int32/int64: write it as (−max − 1)
            return "(" + k.add(BigInteger.ONE) + suffix + " - 1)";
        }
        return k + suffix;
    }

    /** The Java literal of part {@code part} of an entry. */
    static String java(Entry e, int part) {
        return switch (e.format().kind()) {
            case BINARY -> switch (standard((Format.BinaryFormat) e.format())) {
                case BINARY16 -> "(short) " + String.format("0x%04x", e.bits().intValue());
                case BINARY32 -> javaFloat(e.hexLiteral(), "f");
                case BINARY64 -> javaFloat(e.hexLiteral(), "");
                case BINARY128 -> hex64(part == 0 ? e.bits().shiftRight(64) : e.bits()) + "L";
            };
            case DOUBLE_DOUBLE -> javaFloat((part == 0 ? e.hi() : e.lo()).hexLiteral(), "");
            case DECIMAL -> "\"" + e.decimalText() + "\"";
            case FIXED -> javaFixed(e, (Format.FixedFormat) e.format());
        };
    }

    private static String javaFixed(Entry e, Format.FixedFormat x) {
        BigInteger k = e.fixedInteger();
        String type = fixedJavaType(x);
        if (type.equals("long")) {
            // an unsigned 64-bit value above Long.MAX_VALUE is stored as its two's-complement long
            return k.longValue() + "L";
        }
        return (type.equals("int") ? "" : "(" + type + ") ") + k;
    }

    private static String javaFloat(String hex, String suffix) {
        if (hex.endsWith("INFINITY")) {
            String type = suffix.isEmpty() ? "Double" : "Float";
            return (hex.startsWith("-") ? type + ".NEGATIVE_INFINITY" : type + ".POSITIVE_INFINITY");
        }
        return hex + suffix;
    }

    private static String hex64(BigInteger v) {
        String s = v.and(BigInteger.ONE.shiftLeft(64).subtract(BigInteger.ONE)).toString(16);
        return "0x" + "0".repeat(16 - s.length()) + s;
    }

    private static String fixedCType(Format.FixedFormat x) {
        int w = x.totalBits() <= 8 ? 8 : x.totalBits() <= 16 ? 16 : x.totalBits() <= 32 ? 32 : 64;
        return (x.signed() ? "int" : "uint") + w + "_t";
    }

    /** Java has signed types only: an unsigned format takes the next wider type (u64 wraps into long). */
    private static String fixedJavaType(Format.FixedFormat x) {
        int bits = x.signed() ? x.totalBits() : x.totalBits() + 1;
        return bits <= 8 ? "byte" : bits <= 16 ? "short" : bits <= 32 ? "int" : "long";
    }

    /**
     * The CSV cells of an entry: the value and its companion cell (hex or decoded), per
     * DESIGN.md "Outputs"; in a fixed-point table whose policy is to saturate, a third cell
     * {@code NAME_flag} says {@code saturated} for a clamped entry and is empty otherwise.
     */
    static List<String> csv(Entry e, boolean flagColumn) {
        if (flagColumn) {
            return List.of(e.fixedInteger().toString(), e.decimalText(), e.kind() == Entry.Kind.SATURATED ? "saturated" : "");
        }
        return csv(e);
    }

    /** The CSV cells of an entry: the value and its companion cell (hex or decoded), per DESIGN.md "Outputs". */
    static List<String> csv(Entry e) {
        return switch (e.format().kind()) {
            case BINARY -> List.of(e.shortestDecimal(), e.hexLiteral());
            case DOUBLE_DOUBLE -> List.of(e.kind() == Entry.Kind.INFINITE ? e.hi().shortestDecimal() : e.value().toDecimalOrFraction(),
                    e.hi().hexLiteral(), e.lo().hexLiteral());
            case DECIMAL -> List.of(e.decimalText());
            case FIXED -> List.of(e.fixedInteger().toString(), e.decimalText());
        };
    }

    /** The CSV header cells of a column, with the saturation flag column when asked. */
    static List<String> csvHeader(String name, Format f, boolean flagColumn) {
        return flagColumn ? List.of(name, name + "_decoded", name + "_flag") : csvHeader(name, f);
    }

    /** The CSV header cells of a column. */
    static List<String> csvHeader(String name, Format f) {
        return switch (f.kind()) {
            case BINARY -> List.of(name, name + "_hex");
            case DOUBLE_DOUBLE -> List.of(name, name + "_hi_hex", name + "_lo_hex");
            case DECIMAL -> List.of(name);
            case FIXED -> List.of(name, name + "_decoded");
        };
    }
}
