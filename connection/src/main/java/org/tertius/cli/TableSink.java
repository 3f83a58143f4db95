package org.tertius.cli;

import org.tertius.core.face.SolutionValue;

/** Where the rows of a line or grid table go, in the table's order: CSV ({@link CsvTable}) or NumPy ({@link NpyTable}). */
interface TableSink extends AutoCloseable {
    /** Rows already present (a resumed CSV file); 0 for a new output. */
    long existingRows();

    /** The row of a computed point. */
    void value(SolutionValue v);

    /** The row of a point that could not be computed: values nan, errors inf. */
    void unreached(double re, double im, int sheet);

    /** A note after the rows (a pole met along a line); outputs without comments leave it to standard error. */
    void comment(String text);

    /** Makes the rows so far durable (CSV: flushed to the file). */
    void flush();

    /** Flushes what can be flushed without reporting errors (for shutdown hooks). */
    void flushQuietly();

    /** Ends a complete output (NumPy: the file is moved into place). */
    void finish();

    @Override
    void close();
}
