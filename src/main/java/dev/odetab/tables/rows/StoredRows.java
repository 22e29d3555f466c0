package dev.odetab.tables.rows;

import dev.odetab.tables.TableResult;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.util.AbstractList;
import java.util.Iterator;
import java.util.NoSuchElementException;

/**
 * The rows of a finished {@link RowStore}: an unmodifiable list that decodes rows as they are
 * read and holds none of them. {@link #iterator()} streams from the first row with a buffer of
 * its own, so any number of passes, one after another or at once, cost one decoding per row.
 * {@link #get(int)} is cheap for sequential access: a few cursors remember where they stopped,
 * and an index of every {@link RowStore#INDEX_EVERY}-th row's offset takes a jump to within
 * that many rows of its target. Not {@link java.util.RandomAccess}: loop with an iterator.
 */
public final class StoredRows extends AbstractList<TableResult.Row> implements AutoCloseable {
    private static final int WINDOW_BYTES = 1 << 16;
    private static final int CURSORS = 4;

    /** Reads the bytes at a position of the store (fewer only at the end). */
    interface Source {
        int read(long position, ByteBuffer dst) throws IOException;
    }

    /** Releases the storage. */
    interface Release {
        void run() throws IOException;
    }

    private final RowCodec codec;
    private final int size;
    private final long[] index;
    private final Source source;
    private final Release release;
    private final Cursor[] cursors = new Cursor[CURSORS];
    private long uses;
    private volatile boolean closed;

    StoredRows(RowCodec codec, int size, long[] index, Source source, Release release) {
        this.codec = codec;
        this.size = size;
        this.index = index;
        this.source = source;
        this.release = release;
    }

    @Override
    public int size() {
        return size;
    }

    @Override
    public synchronized TableResult.Row get(int i) {
        if (i < 0 || i >= size) {
            throw new IndexOutOfBoundsException("row " + i + " of " + size);
        }
        Cursor best = null;
        for (Cursor c : cursors) {
            if (c != null && c.next <= i + 1 && c.next > i - RowStore.INDEX_EVERY && (best == null || c.next > best.next)) {
                best = c;
            }
        }
        if (best != null && best.next == i + 1) {
            best.used = ++uses;
            return best.last;
        }
        if (best == null || best.next > i || i / RowStore.INDEX_EVERY * RowStore.INDEX_EVERY > best.next) {
            best = leastRecentlyUsed();
            best.seek(i / RowStore.INDEX_EVERY);
        }
        while (best.next <= i) {
            best.advance();
        }
        best.used = ++uses;
        return best.last;
    }

    private Cursor leastRecentlyUsed() {
        int k = 0;
        for (int j = 0; j < CURSORS; j++) {
            if (cursors[j] == null) {
                cursors[j] = new Cursor();
                return cursors[j];
            }
            if (cursors[j].used < cursors[k].used) {
                k = j;
            }
        }
        return cursors[k];
    }

    @Override
    public Iterator<TableResult.Row> iterator() {
        return new Iterator<>() {
            private final Cursor c = new Cursor();

            @Override
            public boolean hasNext() {
                return c.next < size;
            }

            @Override
            public TableResult.Row next() {
                if (c.next >= size) {
                    throw new NoSuchElementException();
                }
                c.advance();
                return c.last;
            }
        };
    }

    /** Releases the storage (the temporary file); reading afterwards fails. */
    @Override
    public void close() {
        if (!closed) {
            closed = true;
            try {
                release.run();
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
    }

    /** A position in the rows: the next row to decode and the one decoded last. */
    private final class Cursor implements RowCodec.Reader {
        private final ByteBuffer window = ByteBuffer.allocate(WINDOW_BYTES).limit(0);
        private long windowStart;
        private int next;
        private TableResult.Row last;
        private long used;

        void seek(int block) {
            next = block * RowStore.INDEX_EVERY;
            windowStart = index[block];
            window.limit(0);
            last = null;
        }

        void advance() {
            last = codec.decode(this);
            next++;
        }

        @Override
        public int readByte() {
            if (!window.hasRemaining()) {
                refill();
            }
            return window.get() & 0xFF;
        }

        @Override
        public byte[] readBytes(int n) {
            byte[] b = new byte[n];
            int done = 0;
            while (done < n) {
                if (!window.hasRemaining()) {
                    refill();
                }
                int k = Math.min(n - done, window.remaining());
                window.get(b, done, k);
                done += k;
            }
            return b;
        }

        private void refill() {
            if (closed) {
                throw new IllegalStateException("the rows of this table were released");
            }
            windowStart += window.limit();
            window.clear();
            try {
                source.read(windowStart, window);
            } catch (IOException e) {
                throw new UncheckedIOException("cannot read the rows of a table back from a temporary file: " + e.getMessage(), e);
            }
            window.flip();
            if (!window.hasRemaining()) {
                throw new IllegalStateException("the rows of a table end early");
            }
        }
    }
}
