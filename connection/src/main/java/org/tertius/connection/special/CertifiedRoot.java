package org.tertius.connection.special;

import java.util.Locale;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;
import org.hipparchus.complex.Complex;

/**
 * A root of a polynomial (or a cluster of roots) with a disk proved to contain it: for multiplicity 1 the disk of
 * radius {@code radius} about {@code value} contains exactly one root; for a cluster of m overlapping inclusion
 * disks, their union contains exactly m roots counted with multiplicity, and the disk reported encloses that
 * union. Immutable.
 *
 * @param value the center, an approximation of the root
 * @param log10Radius log10 of the radius of the inclusion disk (-infinity when the root is exact)
 * @param multiplicity the number of roots in the disk; 1 with {@code simpleProved} means a simple root
 * @param simpleProved true if the polynomial was proved square-free, so that every root is simple
 */
public record CertifiedRoot(Apcomplex value, double log10Radius, int multiplicity, boolean simpleProved) {

    /** The radius as a double (0 when exact; it may underflow to 0 for very small radii). */
    public double radius() {
        return Math.pow(10, log10Radius);
    }

    public Complex toComplex() {
        return new Complex(value.real().doubleValue(), value.imag().doubleValue());
    }

    /**
     * The number of correct significant digits the disk vouches for: floor(log10 |value| - log10 radius),
     * capped at the precision of the value; for the root 0 found exactly, the precision of the value.
     */
    public long correctDigits() {
        long precision = value.precision() == Apfloat.INFINITE ? 1000000 : value.precision();
        if (log10Radius == Double.NEGATIVE_INFINITY) {
            return precision;
        }
        if (value.real().signum() == 0 && value.imag().signum() == 0) {
            return 0;
        }
        double lg = PreciseValue.log10Abs(value);
        long d = (long) Math.floor(lg - log10Radius);
        return Math.max(0, Math.min(precision, d));
    }

    /** The value written with {@code digits} significant digits, as re+imi. */
    public String text(long digits) {
        return PreciseValue.text(value, Math.max(1, digits));
    }

    @Override
    public String toString() {
        String r = log10Radius == Double.NEGATIVE_INFINITY ? "exact"
                : String.format(Locale.ROOT, "radius 1e%.1f", log10Radius);
        return text(Math.max(1, Math.min(40, correctDigits()))) + " (" + r + (multiplicity > 1 ? ", multiplicity "
                + multiplicity : "") + ")";
    }
}
