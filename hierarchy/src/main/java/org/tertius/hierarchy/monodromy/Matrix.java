package org.tertius.hierarchy.monodromy;

/**
 * A 2x2 matrix [[m11, m12], [m21, m22]] of numbers of one arithmetic; the operations are in
 * {@link MatrixArithmetic}. Immutable.
 *
 * @param m11 row 1, column 1
 * @param m12 row 1, column 2
 * @param m21 row 2, column 1
 * @param m22 row 2, column 2
 * @param <T> number type
 */
public record Matrix<T>(T m11, T m12, T m21, T m22) {
    /** Entry (row, column), 1-based. */
    public T entry(int row, int column) {
        if (row == 1) {
            return column == 1 ? m11 : m12;
        }
        return column == 1 ? m21 : m22;
    }

    /** Column 1 or 2 as {top, bottom}. */
    public Vector<T> column(int column) {
        return column == 1 ? new Vector<>(m11, m21) : new Vector<>(m12, m22);
    }

    /** The matrix with the given columns. */
    public static <T> Matrix<T> ofColumns(Vector<T> first, Vector<T> second) {
        return new Matrix<>(first.top(), second.top(), first.bottom(), second.bottom());
    }

    /**
     * A column vector (top, bottom).
     *
     * @param top entry 1
     * @param bottom entry 2
     * @param <T> number type
     */
    public record Vector<T>(T top, T bottom) {
    }
}
