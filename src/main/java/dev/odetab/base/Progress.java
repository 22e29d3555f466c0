package dev.odetab.base;

/**
 * Receives the progress of table evaluations: how many rows each table has and how many are
 * decided (the writing of outputs reports entries written the same way). Calls may come from
 * several threads at once; implementations must be thread-safe. Progress never influences
 * what is computed.
 */
public interface Progress {
    /** Reports nothing. */
    Progress NONE = new Progress() {
        @Override
        public void start(String table, long rows) {
        }

        @Override
        public void advance(long rows) {
        }
    };

    /** A table with this many rows is about to be evaluated. */
    void start(String table, long rows);

    /** This many more rows (of any table) are decided. */
    void advance(long rows);
}
