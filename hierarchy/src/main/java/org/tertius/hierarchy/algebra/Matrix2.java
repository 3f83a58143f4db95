package org.tertius.hierarchy.algebra;

/**
 * A 2x2 matrix of {@link Polynomial}s. Immutable.
 */
public final class Matrix2 {
    private final Polynomial[] e;

    private Matrix2(Polynomial e11, Polynomial e12, Polynomial e21, Polynomial e22) {
        this.e = new Polynomial[] {e11, e12, e21, e22};
    }

    public static Matrix2 of(Polynomial e11, Polynomial e12, Polynomial e21, Polynomial e22) {
        return new Matrix2(e11, e12, e21, e22);
    }

    public static Matrix2 zero(int variables) {
        Polynomial z = Polynomial.zero(variables);
        return new Matrix2(z, z, z, z);
    }

    /** c * sigma3 with sigma3 = diag(1, -1). */
    public static Matrix2 sigma3(Polynomial c) {
        Polynomial z = Polynomial.zero(c.variables());
        return new Matrix2(c, z, z, c.negate());
    }

    /** Entry (row, column), 1-based as in the usual notation. */
    public Polynomial entry(int row, int column) {
        return e[2 * (row - 1) + (column - 1)];
    }

    public Matrix2 add(Matrix2 o) {
        return new Matrix2(e[0].add(o.e[0]), e[1].add(o.e[1]), e[2].add(o.e[2]), e[3].add(o.e[3]));
    }

    public Matrix2 subtract(Matrix2 o) {
        return add(o.scale(GaussianRational.ONE.negate()));
    }

    public Matrix2 scale(GaussianRational c) {
        return new Matrix2(e[0].scale(c), e[1].scale(c), e[2].scale(c), e[3].scale(c));
    }

    public Matrix2 scale(Polynomial c) {
        return new Matrix2(e[0].multiply(c), e[1].multiply(c), e[2].multiply(c), e[3].multiply(c));
    }

    public Matrix2 multiply(Matrix2 o) {
        return new Matrix2(e[0].multiply(o.e[0]).add(e[1].multiply(o.e[2])),
                e[0].multiply(o.e[1]).add(e[1].multiply(o.e[3])),
                e[2].multiply(o.e[0]).add(e[3].multiply(o.e[2])),
                e[2].multiply(o.e[1]).add(e[3].multiply(o.e[3])));
    }

    /** [this, o] = this o - o this. */
    public Matrix2 commutator(Matrix2 o) {
        return multiply(o).subtract(o.multiply(this));
    }

    public Polynomial trace() {
        return e[0].add(e[3]);
    }

    public Polynomial determinant() {
        return e[0].multiply(e[3]).subtract(e[1].multiply(e[2]));
    }

    public boolean isZero() {
        return e[0].isZero() && e[1].isZero() && e[2].isZero() && e[3].isZero();
    }
}
