package org.tertius.connection.scan;

import java.nio.file.Path;
import java.util.List;

/**
 * A sweep: a fixed list of independent classification tasks over a family of solutions, each a pure function
 * of its index, with the text that identifies it in its output file.
 *
 * @param <R> the row type
 */
public interface Sweep<R extends ScanRow> {
    /** One line for people: the family and the parameter ranges. */
    String title();

    /** Everything the rows depend on (kind, parameter ranges, solver settings, version); see {@link SweepSignature}. */
    SweepSignature signature();

    /** The CSV header line. */
    String csvHeader();

    /** Number of tasks. */
    int size();

    /** Runs task {@code index}; may throw a {@link org.tertius.core.TertiusException} (then see {@link #failed}). */
    R classify(int index);

    /** The row of a task whose computation failed. */
    R failed(int index);

    /**
     * Reads a row written by {@link ScanRow#csvRow()}.
     *
     * @throws org.tertius.core.InvalidInputException if the text is not such a row
     */
    R parse(String row);

    /** Draws the rows of the whole sweep (in index order) as a PNG picture. */
    void plot(List<R> rows, Path png);
}
