package org.tertius.hierarchy.nls;

import org.hipparchus.complex.Complex;

/**
 * The logarithm of the Gamma function at complex z (Re z &gt; -10, not a pole): Stirling's series at z + 10 with
 * terms up to B_14 (NIST DLMF 5.11.1) and the recurrence Gamma(z + 1) = z Gamma(z) (DLMF 5.5.1); absolute error
 * near 1e-15 for |z| &lt;= 10. Stateless.
 */
final class LogGamma {
    /** B_2k / (2k (2k - 1)), k = 1 .. 7 (DLMF 24.2; B_2 = 1/6, B_4 = -1/30, ..., B_14 = 7/6). */
    private static final double[] STIRLING = {1.0 / 12, -1.0 / 360, 1.0 / 1260, -1.0 / 1680, 1.0 / 1188,
        -691.0 / 360360, 1.0 / 156};
    private static final int SHIFT = 10;

    private LogGamma() {
    }

    /** log Gamma(z), the branch continuous from the positive axis along z + t, t from large down to 0. */
    static Complex of(Complex z) {
        Complex w = z.add(SHIFT);
        Complex s = w.subtract(0.5).multiply(w.log()).subtract(w).add(0.5 * Math.log(2 * Math.PI));
        Complex inv = w.reciprocal();
        Complex inv2 = inv.multiply(inv);
        Complex p = inv;
        for (double c : STIRLING) {
            s = s.add(p.multiply(c));
            p = p.multiply(inv2);
        }
        for (int j = 0; j < SHIFT; j++) {
            s = s.subtract(z.add(j).log());
        }
        return s;
    }

    /** arg Gamma(z) in (-pi, pi]. */
    static double argument(Complex z) {
        double a = of(z).getImaginary();
        return a - 2 * Math.PI * Math.rint(a / (2 * Math.PI));
    }
}
