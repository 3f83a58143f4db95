package org.tertius.core.piii;

import org.hipparchus.complex.Complex;
import org.tertius.core.equation.PolynomialSystem;
import org.tertius.core.equation.StateProjection;
import org.tertius.core.number.MpComplex;

/**
 * A polynomial first-order form of Painleve III handed to the engine, with the maps between (z, w, w') and
 * its state. All forms use the log variable tau = log z.
 */
interface Painleve3Form {
    PolynomialSystem system();

    StateProjection projection();

    /** Writes the state for (z, w, w') at a point. */
    void toState(Complex z, Complex w, Complex dw, double[] re, double[] im);

    /**
     * Reads {w, w', err w, err w'} from a state and its per-component absolute errors.
     *
     * @return {w, dw} as Complex and the two errors in {@code errOut[0..1]}
     */
    Complex[] fromState(Complex z, double[] re, double[] im, double[] err, double[] errOut);

    /** The state component that carries w (or 1/w, see {@link #wComponentIsReciprocal()}). */
    default int wComponent() {
        return 0;
    }

    /** Whether {@link #wComponent()} carries 1/w rather than w. */
    default boolean wComponentIsReciprocal() {
        return false;
    }

    /** One line that says which form is used (for output headers). */
    String describe();

    /**
     * The coefficient values of {@link #system()} (same order) computed in arbitrary precision from
     * high-precision parameters, for kernels that run the same recurrence plan at higher precision.
     */
    MpComplex[] coefficients(HighPrecisionParameters p);

    /**
     * The state for (z, w, w') in arbitrary precision (same layout as {@link #toState}); w != 0.
     */
    MpComplex[] toState(HighPrecisionParameters p, MpComplex z,
                                            MpComplex w, MpComplex dw);

    /** {w, w'} from a high-precision state. */
    MpComplex[] fromState(HighPrecisionParameters p, MpComplex z,
                                              MpComplex[] y);
}
