package org.tertius.hierarchy.algebra;

import java.util.function.Function;
import org.hipparchus.complex.Complex;
import org.tertius.core.number.Arithmetic;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.MagnitudeArithmetic;
import org.tertius.core.number.MpArithmetic;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;

/**
 * What {@link Polynomial#evaluate} needs of a number type: its arithmetic and the value of an exact coefficient
 * in it.
 *
 * @param arithmetic the field operations
 * @param coefficient the value of an exact coefficient
 * @param <T> the number type
 */
public record Evaluation<T>(Arithmetic<T> arithmetic, Function<GaussianRational, T> coefficient) {
    /** Exact, for checks. */
    public static final Evaluation<GaussianRational> EXACT = new Evaluation<>(GaussianArithmetic.INSTANCE, c -> c);
    /** Double complex numbers, for integration. */
    public static final Evaluation<Complex> COMPLEX =
            new Evaluation<>(ComplexArithmetic.INSTANCE, GaussianRational::toComplex);
    /** Moduli (values given as moduli): sum |c| prod |v|^e, the scale of the rounding error of COMPLEX. */
    public static final Evaluation<Double> MAGNITUDE =
            new Evaluation<>(MagnitudeArithmetic.INSTANCE, c -> c.toComplex().norm());

    /** The high-precision engine's numbers at one working precision (coefficients rounded once to it). */
    public static Evaluation<MpComplex> precise(MpContext ctx) {
        return new Evaluation<>(new MpArithmetic(ctx), c -> ctx.fromExact(ExactNumber.ofComplexRational(
                c.re().getNumerator(), c.re().getDenominator(), c.im().getNumerator(), c.im().getDenominator())));
    }
}
