package org.tertius.hierarchy.monodromy;

import java.util.function.UnaryOperator;
import org.apfloat.Apcomplex;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.core.number.ApcomplexArithmetic;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.number.MpArithmetic;
import org.tertius.core.number.MpComplex;

/**
 * Complex conjugation in the arithmetics of the project ({@link AnalyticArithmetic} has none): needed by the
 * least-squares steps and the reality symmetry of {@link InverseMonodromy}. Stateless.
 */
final class Conjugation {
    private Conjugation() {
    }

    @SuppressWarnings("unchecked")
    static <T> UnaryOperator<T> of(AnalyticArithmetic<T> ar) {
        if (ar instanceof ComplexArithmetic) {
            return t -> (T) ((Complex) t).conjugate();
        }
        if (ar instanceof MpArithmetic) {
            return t -> (T) ((MpComplex) t).conjugate();
        }
        if (ar instanceof ApcomplexArithmetic) {
            return t -> (T) ((Apcomplex) t).conj();
        }
        throw new InvalidInputException("arithmetic", "the inverse monodromy map runs in double precision,"
                + " MpArithmetic or ApcomplexArithmetic, not in " + ar.getClass().getSimpleName());
    }
}
