package org.tertius.connection.closed;

import java.util.List;
import java.util.Map;
import org.hipparchus.complex.Complex;
import org.tertius.core.number.ComplexGamma;

/**
 * The second constant of the oscillation about a background on an oscillating ray: the ratio p/q of
 * u ~ z^(-1/2) (p E + q/E), E = e^(mu z) z^kappa, from the monodromy data (the drift mu p q is
 * {@link InfinityMonodromyBridge}'s). connection/README.md, section "Monodromy data at infinity", has the derivation
 * sketch and the measurements. With X1 = X(j, k) and X2 = X(j + 1, k + 1) the saddle connection matrices of the two
 * saddle points (same notation as the bridge), nu1 = -(kappa - kappa0)/(2 sigma eps) the exponent of the first saddle
 * and nu2 = nu1 + a2 m + b2 m0 + n2 that of the second (its branch fixed by the table), for the canonical image
 * (variable Z = c0 z / c_map, amplitudes P = p rho^(kappa - 1/2), Q = q rho^(-kappa - 1/2), rho = c_map / c0):
 * <pre>
 *   P/Q = K R^r [Gamma(1 + nu1) Gamma(nu2) / (Gamma(1 - nu1) Gamma(1 - nu2))]^e 2^(-4 e (2 nu1 + a2 m + b2 m0))
 *         e^(2 pi i e (j - k) nu1 + i pi (B3 m + B4 m0)),
 *   R = (X1_12 / X1_21)(X2_21 / X2_12) (C = +-i; times X1_22 / X2_22 for (j, k) = (1, 1)),
 *   R = (X1_11 / X1_22)(X2_22 / X2_11) (C = +-1),
 *   K = 4^r i (C = +-i),  4^r r (C = +-1),   r = +1 for C = i, 1 and -1 for C = -i, -1.
 * </pre>
 * The Gamma functions and the powers of 2 are those of the parabolic-cylinder (Weber) local problem at each saddle
 * (its connection formulas, DLMF §12.2(v), recalled from memory, give off-diagonal entries sqrt(2 pi)/Gamma(-nu)
 * and the like, and the local scale brings 2^nu); the integers (r, e, a2, b2, n2, B3, B4) of each configuration
 * (j, k) were identified numerically (robust least squares on log|P/Q|, then the constant K, on 300 solutions given
 * at infinity), not derived.
 * All ten configurations of the principal sheet are covered with eps = 1; where eps = -1 (the ray's E is the image's
 * 1/E, so P is the ray's q: p/q = (Q/P) rho^(-2 kappa)) the four configurations met, (0, 0), (1, -1), (1, 1), (2, 0),
 * are covered and checked, the others refused ({@link #covers}). The common sign of (p, q) is not fixed by p q and
 * p/q and is not given here.
 */
final class OscillationPhase {
    /** The identified integers of one configuration (j, k). */
    private record Row(int r, int e, int a2, int b2, int n2, int b3, int b4, boolean lowerRight) {
        Row(int r, int e, int a2, int b2, int n2, int b3, int b4) {
            this(r, e, a2, b2, n2, b3, b4, false);
        }
    }

    private static final Map<List<Integer>, Row> ROWS = Map.of(
            List.of(0, 0), new Row(1, 1, -1, 1, 0, -2, -2),
            List.of(-1, 1), new Row(1, -1, 1, -1, 1, 0, -4),
            List.of(1, -1), new Row(1, -1, 1, -1, 1, -4, 0),
            List.of(0, 2), new Row(-1, -1, -1, 1, 0, 0, 4),
            List.of(2, 0), new Row(-1, -1, -1, 1, 0, 4, 0),
            List.of(0, 1), new Row(-1, -1, -1, -1, 0, 1, -3),
            List.of(1, 0), new Row(-1, 1, 1, 1, 1, 3, -1),
            List.of(1, 2), new Row(1, -1, 1, 1, 1, -1, 3),
            List.of(2, 1), new Row(1, 1, -1, -1, 0, -3, 1),
            List.of(1, 1), new Row(-1, 1, 1, -1, 1, 0, 4, true));

    /** The configurations where eps = -1 (E of the ray is 1/E of the canonical image) was met and checked. */
    private static final List<List<Integer>> REVERSED = List.of(List.of(0, 0), List.of(1, -1), List.of(1, 1),
            List.of(2, 0));

    private OscillationPhase() {
    }

    /** Whether the ratio is identified for this saddle configuration. */
    static boolean covers(int j, int k, int eps) {
        return ROWS.containsKey(List.of(j, k)) && (eps == 1 || REVERSED.contains(List.of(j, k)));
    }

    /** Why a configuration is not covered (for the comments of the commands). */
    static String reason(int j, int k, int eps) {
        return eps != 1 ? "the ray has E of the data as 1/E of the canonical image (eps = -1) in the saddle"
                + " configuration (j, k) = (" + j + ", " + k + "), never met in the measurements" : "the saddle"
                + " configuration (j, k) = (" + j + ", " + k + ") was never met in the measurements";
    }

    /**
     * p/q from the saddle matrices x1 = X(j, k), x2 = X(j + 1, k + 1), the exponent kappa (with the branch of the
     * drift), m, m0 and ell = log(c_map / c0).
     */
    static Complex ratio(int j, int k, int eps, boolean antiDiagonal, Complex[][] x1, Complex[][] x2, Complex nu1,
                         Complex kappa, Complex m, Complex m0, Complex ell) {
        Row row = ROWS.get(List.of(j, k));
        Complex r = antiDiagonal
                ? x1[0][0].divide(x1[1][1]).multiply(x2[1][1].divide(x2[0][0]))
                : x1[0][1].divide(x1[1][0]).multiply(x2[1][0].divide(x2[0][1]));
        if (row.lowerRight()) {
            r = r.multiply(x1[1][1].divide(x2[1][1]));
        }
        Complex shift = m.multiply(row.a2()).add(m0.multiply(row.b2()));
        Complex nu2 = nu1.add(shift).add(row.n2());
        Complex gammas = ComplexGamma.gamma(nu1.add(1)).multiply(ComplexGamma.gamma(nu2))
                .divide(ComplexGamma.gamma(Complex.ONE.subtract(nu1)).multiply(ComplexGamma.gamma(Complex.ONE
                        .subtract(nu2))));
        Complex exponent = nu1.multiply(2).add(shift).multiply(-4.0 * row.e() * Math.log(2))
                .add(Complex.I.multiply(Math.PI).multiply(nu1.multiply(2.0 * row.e() * (j - k))
                        .add(m.multiply(row.b3())).add(m0.multiply(row.b4()))));
        double size = Math.pow(4, row.r());
        Complex constant = antiDiagonal ? new Complex(size * row.r()) : new Complex(0, size);
        Complex canonical = constant.multiply(row.r() == 1 ? r : r.reciprocal())
                .multiply(row.e() == 1 ? gammas : gammas.reciprocal()).multiply(exponent.exp());
        // back from the canonical image: p/q = (P/Q) rho^(-2 kappa), or (Q/P) rho^(-2 kappa) where eps = -1 (the
        // image's E is the ray's 1/E, so its P is the ray's q)
        Complex scale = kappa.multiply(ell).multiply(-2).exp();
        return eps == 1 ? canonical.multiply(scale) : scale.divide(canonical);
    }
}
