package org.tertius.core.number;

/**
 * A point given exactly: a complex number as an {@link ExactNumber} (decimal or rational parts) and a sheet number
 * (0 for single-valued solutions). High-precision evaluations take the point itself, not its double rounding.
 * Immutable.
 */
public final class ExactPoint {
    private final ExactNumber z;
    private final int sheet;

    private ExactPoint(ExactNumber z, int sheet) {
        this.z = z;
        this.sheet = sheet;
    }

    public static ExactPoint of(ExactNumber z, int sheet) {
        return new ExactPoint(z, sheet);
    }

    /** The point of a double-precision surface point, taken exactly (binary value, vouched for to 15 digits). */
    public static ExactPoint of(SurfacePoint p) {
        return new ExactPoint(ExactNumber.ofDouble("point", p.z()), p.sheet());
    }

    public ExactNumber z() {
        return z;
    }

    public int sheet() {
        return sheet;
    }

    /** Whether this is the origin. */
    public boolean isOrigin() {
        return z.isZero();
    }

    /** The nearest double-precision point (on a logarithmic surface; the origin maps to a planar point). */
    public SurfacePoint toSurfacePoint() {
        double re = z.toComplex().getReal();
        double im = z.toComplex().getImaginary();
        return re == 0 && im == 0 ? SurfacePoint.planar(0, 0) : SurfacePoint.of(re, im, sheet);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ExactPoint && ((ExactPoint) o).z.equals(z) && ((ExactPoint) o).sheet == sheet;
    }

    @Override
    public int hashCode() {
        return z.hashCode() * 31 + sheet;
    }

    @Override
    public String toString() {
        return z + (sheet == 0 ? "" : " (sheet " + sheet + ")");
    }
}
