package org.tertius.hierarchy.monodromy;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.number.MpArithmetic;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.SurfacePoint;
import org.tertius.hierarchy.MemberSolution;

/**
 * The direct monodromy map of member n: the monodromy data of Phi_lambda = A(lambda) Phi (hierarchy/README.md) at
 * one point of a solution, in double or arbitrary precision. The data do not change along the solution (in x and
 * in the times); that is the self-check of the whole computation.
 *
 * <p><b>Conventions (the user's contract).</b> lambda lives on the universal cover of C minus 0 (arguments are
 * real numbers, not reduced mod 2 pi); log lambda = ln|lambda| + i arg lambda.
 * <ul>
 *   <li>Formal solutions. At infinity (Poincare rank n):
 *       {@code Y^inf ~ (I + O(1/lambda)) lambda^(m sigma3) exp(-i theta_inf(lambda) sigma3)},
 *       theta_inf = x lambda + t_2 lambda^2 + ... + t_n lambda^n. At 0 (rank 1):
 *       {@code Y^0 ~ G0 (I + O(lambda)) lambda^(m0 sigma3) exp(-i s sigma3 / lambda)} with G0^-1 a_-2 G0 = i s sigma3
 *       (det a_-2 = s^2), det G0 = 1 and m0 = T / (2 i s), T = tr(a_-2 a_-1). m and m0 are the formal
 *       monodromy exponents; both are reported as computed from the equation.</li>
 *   <li>Rays. Let psi = arg t_n (member 1: arg x, continued over the sheets of x; members n &gt;= 2: the principal
 *       argument of t_n). At infinity the rays phi_j = (-pi/2 - psi + j pi) / n, j in Z, are those where
 *       exp(Lambda_1 - Lambda_2) (the ratio of the column exponentials) decays fastest for even j and grows fastest
 *       for odd j: column 1 is most recessive on even rays, column 2 on odd rays. At 0 the rays are
 *       phi0_j = arg s - pi/2 + j pi (principal arg s): column 2 is most recessive on even rays, column 1 on odd
 *       rays.</li>
 *   <li>Canonical solutions. Y^inf_k (k in Z) is the solution with the asymptotics above in the sector
 *       phi_{k-1} - pi/(2n) &lt; arg lambda &lt; phi_k + pi/(2n); its columns are the solutions recessive on the rays
 *       phi_{k-1} and phi_k. Likewise Y^0_k in phi0_{k-1} - pi/2 &lt; arg lambda &lt; phi0_k + pi/2. All have
 *       determinant 1. For x &gt; 0 (member 1), t_n &gt; 0 and s &gt; 0 the first sectors are -pi/n &lt; arg lambda &lt; pi/n
 *       and -pi &lt; arg lambda &lt; pi.</li>
 *   <li>Stokes matrices. S^inf_k = (Y^inf_k)^-1 Y^inf_{k+1}, k = 1 .. 2n: unit upper triangular for even k, unit
 *       lower triangular for odd k; the multiplier is its off-diagonal entry. S^0_k = (Y^0_k)^-1 Y^0_{k+1}, k = 1
 *       (upper), 2 (lower). Beyond one turn: Y^inf_{k+2n}(lambda e^(2 pi i)) = Y^inf_k(lambda) e^(2 pi i m sigma3)
 *       and Y^0_{k+2}(lambda e^(2 pi i)) = Y^0_k(lambda) e^(2 pi i m0 sigma3).</li>
 *   <li>Monodromy and connection. M_inf = e^(2 pi i m sigma3) (S^inf_1 ... S^inf_2n)^-1 and
 *       M_0 = e^(2 pi i m0 sigma3) (S^0_1 S^0_2)^-1 are the monodromies of Y^inf_1 and Y^0_1 along a positive turn.
 *       E = (Y^inf_1)^-1 Y^0_1 (the same point of the cover). Constraints: det S = 1 (unit triangular), det E = 1,
 *       and the cyclic relation M_inf E = E M_0.</li>
 *   <li>Normalisation of E. The state fixes G0 only up to a right diagonal factor D = diag(d, 1/d) (its isomonodromic
 *       choice would need an integral along the solution), which acts as E -> E D, s^0_1 -> s^0_1 d^-2,
 *       s^0_2 -> s^0_2 d^2. The data are reported with D chosen so that E11 = E22 with Re E11 &gt; 0 (Re = 0:
 *       Im &gt; 0); when E11 or E22 vanishes within its estimate, so that E12 = -E21 with Re E12 &gt; 0
 *       ({@link MonodromyData.ConnectionNormalization}). The gauge (q, r) -> (e^g q, e^-g r) of the member
 *       solution multiplies the upper multipliers at infinity and E12 by e^g and the lower ones and E21 by e^-g
 *       (after renormalisation): data of a solution are taken in the gauge of its state.</li>
 * </ul>
 *
 * <p><b>Numerics.</b> The formal series ({@link FormalSolution}) are cut near their smallest term on the start rays
 * ({@link AsymptoticStart}); each canonical column is carried by Taylor steps ({@link LinearIntegrator}) to a
 * meeting point on the circle where the exponents of both points balance ({@link CanonicalSolutions}); the data
 * follow from 2x2 products ({@link DataAssembly}). Every number carries a first-order error estimate: the
 * truncation of the series and of the Taylor steps, the rounding, and the error bounds of the member state, all
 * propagated through the propagators of the lambda-equation and the matrix products; the error bounds of the
 * member state are propagated through the whole map by finite differences (one more evaluation per state entry
 * with a non-zero bound). Where the data are
 * ill-conditioned (large |x| s or |t_n|, the exponents at the meeting circle large) the estimates grow accordingly;
 * more digits then help. Immutable, thread-safe.
 *
 * @param <T> number type
 */
public final class MonodromyMap<T> {
    /** Taylor order per step in double precision. */
    private static final int DOUBLE_ORDER = 30;

    private final AnalyticArithmetic<T> ar;
    private final int taylorOrder;

    private MonodromyMap(AnalyticArithmetic<T> ar) {
        this.ar = ar;
        this.taylorOrder = Math.max(DOUBLE_ORDER, (int) Math.ceil(1.2 * Math.log10(1 / ar.epsilon())));
    }

    /** The map in double precision. */
    public static MonodromyMap<Complex> doublePrecision() {
        return new MonodromyMap<>(ComplexArithmetic.INSTANCE);
    }

    /**
     * The map in {@code digits} decimal digits ({@link MpArithmetic}; 16 .. 100000, practical up to a few hundred:
     * the work grows like the square of the digits times the number of Taylor steps).
     */
    public static MonodromyMap<MpComplex> withDigits(int digits) {
        return new MonodromyMap<>(new MpArithmetic(digits));
    }

    /** The map in any arithmetic (e.g. {@code new ApcomplexArithmetic(digits)}). */
    public static <T> MonodromyMap<T> of(AnalyticArithmetic<T> ar) {
        return new MonodromyMap<>(ar);
    }

    public AnalyticArithmetic<T> arithmetic() {
        return ar;
    }

    /**
     * The monodromy data of a lambda-equation (which must be in this map's arithmetic).
     *
     * @throws InvalidInputException if the state violates the constraints on its diagonal entries
     */
    public MonodromyData<T> compute(LaxMatrix<T> lax) {
        AnalyticArithmetic<T> other = lax.arithmetic();
        if (other.getClass() != ar.getClass() || other.epsilon() != ar.epsilon()) {
            throw new InvalidInputException("lambda-equation", "is in another arithmetic (" + other.digits()
                    + " digits) than this map (" + ar.digits() + " digits)");
        }
        LaxMatrix<T> exact = lax.withState(lax.state());
        CanonicalSolutions<T> cs = CanonicalSolutions.compute(exact, taylorOrder);
        double scale = 0;
        double worstError = 0;
        for (int i = 0; i < lax.state().size(); i++) {
            scale = Math.max(scale, ar.abs(lax.state().get(i)));
            worstError = Math.max(worstError, lax.stateError(i));
        }
        double allowed = 1e-8 + 100 * worstError / (1 + scale);
        if (!(cs.constraintViolation() <= allowed)) {
            throw new InvalidInputException("state", "violates the constraints on its diagonal entries a(k)11, k >= -1"
                    + " (the exponents at lambda = infinity must be -i theta_inf' + m / lambda): relative deviation "
                    + cs.constraintViolation() + "; complete the diagonal with HierarchyMember.completeDiagonal");
        }
        MonodromyData<T> data = DataAssembly.assemble(exact, cs, null);
        if (!lax.hasStateErrors()) {
            return data;
        }
        // the error bounds of the state, propagated through the data by finite differences (first order)
        List<Estimate<T>> base = data.quantities();
        double[] extra = new double[base.size()];
        double root = Math.sqrt(ar.epsilon());
        for (int i = 0; i < lax.state().size(); i++) {
            if (lax.stateError(i) == 0) {
                continue;
            }
            double h = root * Math.max(1, ar.abs(lax.state().get(i)));
            List<T> moved = new ArrayList<>(lax.state());
            moved.set(i, ar.add(moved.get(i), ar.of(h)));
            LaxMatrix<T> perturbed = exact.withState(moved);
            List<Estimate<T>> q = DataAssembly.assemble(perturbed, CanonicalSolutions.compute(perturbed, taylorOrder),
                    data.connectionNormalization()).quantities();
            for (int j = 0; j < extra.length; j++) {
                extra[j] += ar.abs(ar.subtract(q.get(j).value(), base.get(j).value())) / h * lax.stateError(i);
            }
        }
        return data.plusErrors(extra);
    }

    /** The monodromy data of a member solution at x (member 1: x on its sheet; n &gt;= 2: sheet 0). */
    public MonodromyData<T> compute(MemberSolution solution, SurfacePoint x) {
        return compute(LaxMatrix.of(ar, solution, x));
    }
}
