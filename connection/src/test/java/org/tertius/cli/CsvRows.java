package org.tertius.cli;

import java.util.Arrays;
import java.util.List;
import java.util.stream.Collectors;

/**
 * The rows of the CSV output of a command read by column name: the first line that is not a comment names the
 * columns, every further one is a row. Tests find columns by name, so that a new column does not shift them.
 */
public final class CsvRows {
    private final List<String> columns;
    private final List<String[]> rows;

    private CsvRows(List<String> columns, List<String[]> rows) {
        this.columns = columns;
        this.rows = rows;
    }

    /** The column line and the rows of a command's output (comment lines dropped). */
    public static CsvRows of(String output) {
        List<String> lines = output.lines().filter(l -> !l.startsWith("#")).collect(Collectors.toList());
        if (lines.isEmpty()) {
            throw new AssertionError("no column line in: " + output);
        }
        List<String[]> rows = lines.subList(1, lines.size()).stream().map(l -> l.split(",", -1))
                .collect(Collectors.toList());
        return new CsvRows(Arrays.asList(lines.get(0).split(",", -1)), rows);
    }

    public List<String> columns() {
        return columns;
    }

    public int size() {
        return rows.size();
    }

    /** The position of a column; fails when there is none of that name. */
    public int index(String column) {
        int k = columns.indexOf(column);
        if (k < 0) {
            throw new AssertionError("no column " + column + " in " + columns);
        }
        return k;
    }

    /** The text of a column in row i (0 is the first row after the column line). */
    public String text(int i, String column) {
        return rows.get(i)[index(column)];
    }

    /** The number in a column of row i ({@code inf} and {@code nan} as the tool writes them). */
    public double number(int i, String column) {
        String t = text(i, column);
        return t.equals("inf") ? Double.POSITIVE_INFINITY : t.equals("nan") ? Double.NaN : Double.parseDouble(t);
    }

    /** The whole row i. */
    public String[] row(int i) {
        return rows.get(i);
    }
}
