package org.tertius.connection.scan;

/** One row of a sweep: the classification of one task, written as one CSV line. Implementations are immutable. */
public interface ScanRow {
    /** The task index (0-based position in the sweep). */
    int index();

    /** The CSV line (no line break); read back by the sweep's {@link Sweep#parse}. */
    String csvRow();

    /** The kind of a row whose task could not be computed to the accuracy. */
    String FAILED = "failed";

    /** What the classification found (e.g. "pole", "zero", "none"), or {@link #FAILED}. */
    String kind();

    /** A few words for the progress line, e.g. {@code lambda=0.2 none}. */
    String summary();
}
