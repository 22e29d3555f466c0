package dev.odetab.emit;

import dev.odetab.base.Progress;
import dev.odetab.tables.TableResult;
import java.util.AbstractList;
import java.util.AbstractSequentialList;
import java.util.Iterator;
import java.util.List;
import java.util.ListIterator;
import java.util.function.Function;

/**
 * The literals of one emitted array, formatted from the rows as they are read and never held,
 * so a template's model does not grow with the table.
 *
 * <p>FreeMarker 2.3.34's object wrapper gives a template an {@link AbstractSequentialList}
 * through its iterator ({@code DefaultListAdapterWithCollectionSupport}); any other list it
 * reads by {@code size()} and {@code get(i)}, and a bare {@link Iterable} our locked-down
 * wrapper refuses. So each {@code <#list>} (with or without {@code <#sep>}) is one streaming
 * pass over the rows, and a template may list the same array any number of times;
 * {@code col.c[i]} reads row i through the rows' own {@code get}.
 */
final class LiteralList extends AbstractSequentialList<String> {
    private final List<TableResult.Row> rows;
    private final Function<TableResult.Row, String> literal;
    private final Progress progress;

    /** The literals {@code literal} makes of the rows; each one a pass of the iterator gives is reported to {@code progress}. */
    LiteralList(List<TableResult.Row> rows, Function<TableResult.Row, String> literal, Progress progress) {
        this.rows = rows;
        this.literal = literal;
        this.progress = progress;
    }

    @Override
    public int size() {
        return rows.size();
    }

    @Override
    public String get(int i) {
        return literal.apply(rows.get(i));
    }

    @Override
    public Iterator<String> iterator() {
        Iterator<TableResult.Row> it = rows.iterator();
        return new Iterator<>() {
            @Override
            public boolean hasNext() {
                return it.hasNext();
            }

            @Override
            public String next() {
                String s = literal.apply(it.next());
                progress.advance(1);
                return s;
            }
        };
    }

    /** Reads through {@link #get} (so backwards too); the streaming pass is {@link #iterator()}. */
    @Override
    public ListIterator<String> listIterator(int start) {
        return new AbstractList<String>() {
            @Override
            public String get(int i) {
                return LiteralList.this.get(i);
            }

            @Override
            public int size() {
                return rows.size();
            }
        }.listIterator(start);
    }
}
