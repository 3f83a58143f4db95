package org.tertius.cli;

import org.tertius.core.face.SolutionValue;

/** The CSV output of a line or grid table: the rows of {@link ValueRows} through a {@link TableWriter}. */
final class CsvTable implements TableSink {
    private final TableWriter writer;
    private final ValueRows rows;

    CsvTable(TableWriter writer, ValueRows rows) {
        this.writer = writer;
        this.rows = rows;
    }

    @Override
    public long existingRows() {
        return writer.existingRows();
    }

    @Override
    public void value(SolutionValue v) {
        writer.row(rows.row(v));
    }

    @Override
    public void unreached(double re, double im, int sheet) {
        writer.row(rows.unreachedRow(re, im, sheet));
    }

    @Override
    public void comment(String text) {
        writer.comment(text);
    }

    @Override
    public void flush() {
        writer.flush();
    }

    @Override
    public void flushQuietly() {
        writer.flushQuietly();
    }

    @Override
    public void finish() {
        writer.flush();
    }

    @Override
    public void close() {
        writer.close();
    }
}
