package org.tertius.core.piii;

import org.hipparchus.complex.Complex;
import org.tertius.core.number.SurfacePoint;

/** Public access to {@link RiccatiReference} for tests in other packages. */
public final class RiccatiReferenceAccess {
    private final RiccatiReference ref;

    public RiccatiReferenceAccess(Complex a, Complex b, Complex c, Complex ca, Complex cb) {
        this.ref = new RiccatiReference(a, b, c, ca, cb);
    }

    public Painleve3 equation() {
        return ref.equation();
    }

    public Complex[] value(SurfacePoint p) {
        return ref.value(p);
    }
}
