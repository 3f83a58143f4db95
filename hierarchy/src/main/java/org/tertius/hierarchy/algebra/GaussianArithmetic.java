package org.tertius.hierarchy.algebra;

import org.tertius.core.number.Arithmetic;

/** Exact {@link Arithmetic} on Gaussian rationals. */
public final class GaussianArithmetic implements Arithmetic<GaussianRational> {
    /** The one instance (the class has no state). */
    public static final GaussianArithmetic INSTANCE = new GaussianArithmetic();

    private GaussianArithmetic() {
    }

    @Override
    public GaussianRational zero() {
        return GaussianRational.ZERO;
    }

    @Override
    public GaussianRational one() {
        return GaussianRational.ONE;
    }

    @Override
    public GaussianRational add(GaussianRational a, GaussianRational b) {
        return a.add(b);
    }

    @Override
    public GaussianRational subtract(GaussianRational a, GaussianRational b) {
        return a.subtract(b);
    }

    @Override
    public GaussianRational multiply(GaussianRational a, GaussianRational b) {
        return a.multiply(b);
    }

    @Override
    public GaussianRational divide(GaussianRational a, GaussianRational b) {
        return a.multiply(b.reciprocal());
    }

    @Override
    public GaussianRational negate(GaussianRational a) {
        return a.negate();
    }

    @Override
    public GaussianRational reciprocal(GaussianRational a) {
        return a.reciprocal();
    }
}
