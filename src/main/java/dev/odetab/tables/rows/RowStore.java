package dev.odetab.tables.rows;

import dev.odetab.tables.TableResult;
import dev.odetab.tables.TableDef;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.Arrays;

/**
 * Where the rows of a table go while it is evaluated, in grid order, in memory bounded
 * independently of the table's length.
 *
 * <p>Each row is encoded exactly ({@link RowCodec}) into a buffer. Up to {@link #MEMORY_BYTES}
 * of encoded rows stay in memory; beyond that every row goes to a temporary file in
 * {@code java.io.tmpdir}, opened with {@link StandardOpenOption#DELETE_ON_CLOSE} (on POSIX
 * systems the JDK unlinks it at once, so even a killed process leaves no file behind; elsewhere
 * it is deleted on {@link TableResult#close()}). Both ways are read through the same decoder, so
 * what a reader sees, and so every output byte, does not depend on where the rows were kept.
 *
 * <p>{@link #finish} gives the rows as a {@link StoredRows} list. Appends must come in grid
 * order; they may come from several threads, one at a time.
 */
public final class RowStore {
    /** Encoded rows kept in memory before they spill to a file. */
    static final int MEMORY_BYTES = 1 << 20;
    /** A row's offset is remembered every this many rows, for random access. */
    static final int INDEX_EVERY = 4096;
    private static final int FLUSH_BYTES = 1 << 16;

    private final int memoryBytes;
    private final int columns;
    private final RowCodec codec = new RowCodec();
    private final RowCodec.Bytes buffer = new RowCodec.Bytes();
    private FileChannel file;
    private long fileBytes;
    private long[] index = new long[16];
    private int rows;
    private boolean finished;

    private RowStore(int columns, int memoryBytes) {
        this.columns = columns;
        this.memoryBytes = memoryBytes;
    }

    /** A store for the rows of this table. */
    public static RowStore forTable(TableDef table) {
        return new RowStore(table.columns().size(), MEMORY_BYTES);
    }

    /** A store that spills to a file once more than {@code memoryBytes} are encoded (tests use small ones). */
    static RowStore forTable(TableDef table, int memoryBytes) {
        return new RowStore(table.columns().size(), memoryBytes);
    }

    /**
     * Appends the next row.
     *
     * @throws IllegalArgumentException when the row does not have one entry per column
     * @throws UncheckedIOException when the temporary file cannot be written
     */
    public synchronized void append(TableResult.Row row) {
        if (finished) {
            throw new IllegalStateException("rows appended after finish()");
        }
        if (row.entries().size() != columns) {
            throw new IllegalArgumentException("a row of " + row.entries().size() + " entries in a table of " + columns + " columns");
        }
        if (rows % INDEX_EVERY == 0) {
            if (rows / INDEX_EVERY == index.length) {
                index = Arrays.copyOf(index, 2 * index.length);
            }
            index[rows / INDEX_EVERY] = fileBytes + buffer.size();
        }
        codec.encode(row, buffer);
        rows++;
        if (file == null ? buffer.size() > memoryBytes : buffer.size() > FLUSH_BYTES) {
            flush();
        }
    }

    /** The rows appended, in order; the store takes no more rows after this. */
    public synchronized StoredRows finish() {
        finished = true;
        if (file == null) {
            byte[] bytes = Arrays.copyOf(buffer.array(), buffer.size());
            return new StoredRows(codec, rows, index, (position, dst) -> {
                int n = (int) Math.min(dst.remaining(), bytes.length - position);
                dst.put(bytes, (int) position, n);
                return n;
            }, () -> { });
        }
        flush();
        FileChannel f = file;
        return new StoredRows(codec, rows, index, (position, dst) -> {
            int total = 0;
            while (dst.hasRemaining()) {
                int n = f.read(dst, position + total);
                if (n < 0) {
                    break;
                }
                total += n;
            }
            return total;
        }, f::close);
    }

    private void flush() {
        try {
            if (file == null) {
                Path p = Files.createTempFile("odetab-rows-", ".bin");
                file = FileChannel.open(p, StandardOpenOption.READ, StandardOpenOption.WRITE, StandardOpenOption.DELETE_ON_CLOSE);
            }
            ByteBuffer b = ByteBuffer.wrap(buffer.array(), 0, buffer.size());
            while (b.hasRemaining()) {
                fileBytes += file.write(b, fileBytes);
            }
            buffer.clear();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write the rows of a table to a temporary file: " + e.getMessage(), e);
        }
    }
}
