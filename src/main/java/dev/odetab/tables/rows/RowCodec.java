package dev.odetab.tables.rows;

import dev.odetab.tables.TableResult;

import dev.odetab.numeric.Entry;
import dev.odetab.numeric.Format;
import dev.odetab.numeric.Rational;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The byte form of a table row in a {@link RowStore}.
 *
 * <p>Trust level: Exact. Decoding an encoded row gives a row equal to it: every rational is
 * written exactly (numerator, and denominator as a power-of-two exponent or as bytes), every
 * entry with its format, kind, sign and, for double-double, its head and tail entries.
 *
 * <p>Layout (integers as unsigned LEB128 varints unless noted): row = flags (bit 0: x
 * present), [x: rational], entry count, entries. Entry = format index (into this codec's
 * dictionary), a byte kind ordinal | negative &lt;&lt; 3 | has-head-and-tail &lt;&lt; 4,
 * [value: rational unless the kind is INFINITE], [head entry, tail entry]. Rational = a tag
 * byte (bit 0: numerator written as a zigzag varint, else as a length and two's-complement
 * bytes; bit 1: denominator is 2^k, written as k, else as a length and bytes), numerator,
 * denominator.
 */
final class RowCodec {
    private static final Entry.Kind[] KINDS = Entry.Kind.values();
    private final List<Format> formats = new ArrayList<>();

    /** Appends the encoding of a row to {@code out}. */
    void encode(TableResult.Row row, Bytes out) {
        out.writeVarLong(row.x() == null ? 0 : 1);
        if (row.x() != null) {
            rational(row.x(), out);
        }
        out.writeVarLong(row.entries().size());
        for (Entry e : row.entries()) {
            entry(e, out);
        }
    }

    /** Reads the row that starts at the reader's position. */
    TableResult.Row decode(Reader in) {
        Rational x = in.readVarLong() == 1 ? rational(in) : null;
        int n = (int) in.readVarLong();
        Entry[] entries = new Entry[n];
        for (int i = 0; i < n; i++) {
            entries[i] = entry(in);
        }
        return new TableResult.Row(x, Arrays.asList(entries));
    }

    private void entry(Entry e, Bytes out) {
        int f = formats.indexOf(e.format());
        if (f < 0) {
            f = formats.size();
            formats.add(e.format());
        }
        out.writeVarLong(f);
        out.writeByte(e.kind().ordinal() | (e.negative() ? 8 : 0) | (e.hi() != null ? 16 : 0));
        if (e.value() != null) {
            rational(e.value(), out);
        }
        if (e.hi() != null) {
            entry(e.hi(), out);
            entry(e.lo(), out);
        }
    }

    private Entry entry(Reader in) {
        Format f = formats.get((int) in.readVarLong());
        int b = in.readByte();
        Entry.Kind kind = KINDS[b & 7];
        Rational value = kind == Entry.Kind.INFINITE ? null : rational(in);
        Entry hi = null;
        Entry lo = null;
        if ((b & 16) != 0) {
            hi = entry(in);
            lo = entry(in);
        }
        return new Entry(f, kind, (b & 8) != 0, value, hi, lo);
    }

    private static void rational(Rational r, Bytes out) {
        BigInteger num = r.numerator();
        BigInteger den = r.denominator();
        boolean smallNum = num.bitLength() < 63;
        boolean powerOfTwo = den.bitCount() == 1;
        out.writeByte((smallNum ? 1 : 0) | (powerOfTwo ? 2 : 0));
        if (smallNum) {
            long v = num.longValue();
            out.writeVarLong((v << 1) ^ (v >> 63));
        } else {
            bigInteger(num, out);
        }
        if (powerOfTwo) {
            out.writeVarLong(den.bitLength() - 1);
        } else {
            bigInteger(den, out);
        }
    }

    private static Rational rational(Reader in) {
        int tag = in.readByte();
        BigInteger num;
        if ((tag & 1) != 0) {
            long z = in.readVarLong();
            num = BigInteger.valueOf((z >>> 1) ^ -(z & 1));
        } else {
            num = new BigInteger(in.readBytes((int) in.readVarLong()));
        }
        BigInteger den = (tag & 2) != 0 ? BigInteger.ONE.shiftLeft((int) in.readVarLong()) : new BigInteger(in.readBytes((int) in.readVarLong()));
        return Rational.of(num, den);
    }

    private static void bigInteger(BigInteger v, Bytes out) {
        byte[] b = v.toByteArray();
        out.writeVarLong(b.length);
        out.write(b, 0, b.length);
    }

    /** A growable byte array. */
    static final class Bytes {
        private byte[] data = new byte[256];
        private int size;

        int size() {
            return size;
        }

        byte[] array() {
            return data;
        }

        void clear() {
            size = 0;
        }

        void writeByte(int b) {
            ensure(1);
            data[size++] = (byte) b;
        }

        void write(byte[] b, int off, int len) {
            ensure(len);
            System.arraycopy(b, off, data, size, len);
            size += len;
        }

        void writeVarLong(long v) {
            ensure(10);
            while ((v & ~0x7FL) != 0) {
                data[size++] = (byte) ((v & 0x7F) | 0x80);
                v >>>= 7;
            }
            data[size++] = (byte) v;
        }

        private void ensure(int more) {
            if (size + more > data.length) {
                data = Arrays.copyOf(data, Math.max(2 * data.length, size + more));
            }
        }
    }

    /** Sequential reading from some byte source. */
    interface Reader {
        int readByte();

        byte[] readBytes(int n);

        default long readVarLong() {
            long v = 0;
            for (int shift = 0;; shift += 7) {
                int b = readByte();
                v |= (long) (b & 0x7F) << shift;
                if ((b & 0x80) == 0) {
                    return v;
                }
            }
        }
    }
}
