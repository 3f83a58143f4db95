package org.tertius.connection.closed;

import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;
import org.apfloat.FixedPrecisionApcomplexHelper;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ComplexText;

/**
 * The monodromy data of the solution {@code w ~ B z^sigma} (|Re sigma| &lt; 1) at 0 of a D6 equation, in closed form
 * (the reverse of {@link ZeroMonodromyBridge}; derived here, connection/README.md, "Monodromy data at z = 0"): the
 * limit z -> 0 of the lambda-equation is an outer Whittaker system in mu = x lambda with residue C (eigenvalues +-nu,
 * nu = (1 - sigma)/4, diagonal m) and an inner one in tau = s / lambda; with {@link WhittakerConnection}'s N,
 * <pre>
 *   E ~ N_out^-1 N_in,   N_out = N(m, nu, c12 = 1),
 *   N_in = s^(-nu sigma3) [[P11, -2 nu rho P12], [-P21 / rho, 2 nu P22]]   (P = N(-m0, -nu, 1)),
 *   rho = 2i s (m0 - nu) / (2 nu k21),   k21 = 2 nu B / (K c^(1 - sigma)),
 *   M_inf = N_out^-1 e^(2 pi i nu sigma3) N_out,   M_0 = N_in^-1 e^(2 pi i nu sigma3) N_in,
 * </pre>
 * and the Stokes multipliers from {@code S^inf_1 S^inf_2 = M_inf^-1 e^(2 pi i m sigma3)}, {@code S^0_1 S^0_2 = M_0^-1
 * e^(2 pi i m0 sigma3)}. The data are those of member 1 in the gauge where x^(m sigma3) a_-1 x^(-m sigma3) -> C with
 * C12 = 1 as x -> 0; E is scaled to det E = 1 and normalised as the monodromy map does (E11 = E22 with Re E11 &gt; 0,
 * or E12 = -E21 with Re E12 &gt; 0 when E11 E22 = 0). The gauge-free parts (the products s_inf_1 s_inf_2, s_0_1 s_0_2,
 * E11 E22 and chi) are those of the data of the solution at any point. Immutable.
 */
public final class MonodromyFromZero {
    private final Complex[] stokesInfinity;
    private final Complex[] stokesZero;
    private final Complex[][] connection;

    private MonodromyFromZero(Complex[] stokesInfinity, Complex[] stokesZero, Complex[][] connection) {
        this.stokesInfinity = stokesInfinity;
        this.stokesZero = stokesZero;
        this.connection = connection;
    }

    /**
     * The data of the solution with exponent sigma and amplitude B at 0.
     *
     * @throws InvalidInputException outside |Re sigma| &lt; 1, for B = 0, or where the formulas degenerate
     */
    public static MonodromyFromZero of(ZeroMonodromyBridge bridge, Complex sigma, Complex b) {
        if (!(Math.abs(sigma.getReal()) < 1)) {
            throw new InvalidInputException("sigma", "the bridge needs |Re sigma| < 1, got "
                    + ComplexText.brief(sigma));
        }
        if (!(b.norm() > 0) || !Double.isFinite(b.norm())) {
            throw new InvalidInputException("B", "must be finite and non-zero, got " + ComplexText.brief(b));
        }
        Complex[][] out = new Complex[3][];
        Complex[][] e = new Complex[2][2];
        ZeroMonodromyBridge.evaluate("sigma", () -> {
            compute(bridge, sigma, b, out, e);
            return Apcomplex.ZERO;
        });
        return new MonodromyFromZero(out[0], out[1], e);
    }

    private static void compute(ZeroMonodromyBridge bridge, Complex sigma, Complex b, Complex[][] out,
                                Complex[][] connection) {
        FixedPrecisionApcomplexHelper h = ZeroMonodromyBridge.helper();
        Apcomplex one = h.valueOf(Apcomplex.ONE);
        Apcomplex sg = ZeroMonodromyBridge.ap(sigma);
        Apcomplex nu = h.divide(h.subtract(one, sg), new Apcomplex(new Apfloat(4, ZeroMonodromyBridge.PRECISION)));
        Apcomplex twoNu = h.add(nu, nu);
        Apcomplex m = ZeroMonodromyBridge.ap(bridge.m());
        Apcomplex m0 = ZeroMonodromyBridge.ap(bridge.m0());
        Apcomplex s = ZeroMonodromyBridge.ap(bridge.s());
        Apcomplex k = h.divide(ZeroMonodromyBridge.ap(bridge.ks()), s);
        Apcomplex cPower = h.exp(h.multiply(h.subtract(one, sg), h.divide(h.log(ZeroMonodromyBridge.ap(
                bridge.cSquared())), new Apcomplex(new Apfloat(2, ZeroMonodromyBridge.PRECISION)))));
        Apcomplex k21 = h.divide(h.multiply(twoNu, ZeroMonodromyBridge.ap(b)), h.multiply(k, cPower));
        Apcomplex twoIs = h.multiply(new Apcomplex(Apfloat.ZERO, new Apfloat(2, ZeroMonodromyBridge.PRECISION)), s);
        Apcomplex rho = h.divide(h.multiply(twoIs, h.subtract(m0, nu)), h.multiply(twoNu, k21));
        Apcomplex[][] outer = WhittakerConnection.matrix(h, m, nu, one);
        Apcomplex[][] p = WhittakerConnection.matrix(h, h.negate(m0), h.negate(nu), one);
        Apcomplex sNu = h.exp(h.multiply(nu, h.log(s)));
        Apcomplex[][] inner = {
            {h.divide(p[0][0], sNu), h.negate(h.divide(h.multiply(h.multiply(twoNu, rho), p[0][1]), sNu))},
            {h.negate(h.divide(h.multiply(p[1][0], sNu), rho)), h.multiply(h.multiply(twoNu, p[1][1]), sNu)}};
        Apcomplex[][] e = WhittakerConnection.multiply(h, WhittakerConnection.inverse(h, outer), inner);
        Apcomplex scale = h.sqrt(WhittakerConnection.determinant(h, e));
        Apcomplex e11 = h.divide(e[0][0], scale);
        Apcomplex e12 = h.divide(e[0][1], scale);
        Apcomplex e21 = h.divide(e[1][0], scale);
        Apcomplex e22 = h.divide(e[1][1], scale);
        // the diagonal normalisation of the monodromy map: E -> E diag(d, 1/d)
        double product = ZeroMonodromyBridge.toComplex(h.multiply(e11, e22)).norm();
        boolean diagonal = product > 1e-12 * (1 + ZeroMonodromyBridge.toComplex(h.multiply(e12, e21)).norm());
        Apcomplex d = h.sqrt(diagonal ? h.divide(e22, e11) : h.negate(h.divide(e12, e21)));
        Apcomplex lead = diagonal ? h.multiply(e11, d) : h.divide(e12, d);
        if (lead.real().signum() < 0 || lead.real().signum() == 0 && lead.imag().signum() < 0) {
            d = h.negate(d);
        }
        Apcomplex[][] en = {{h.multiply(e11, d), h.divide(e12, d)}, {h.multiply(e21, d), h.divide(e22, d)}};
        Apcomplex[][] innerNormalised = WhittakerConnection.multiply(h, outer, en);
        Apcomplex[] nuTurn = WhittakerConnection.turn(h, nu);
        Apcomplex[][] sInf = stokesProduct(h, outer, nuTurn, WhittakerConnection.turn(h, m));
        Apcomplex[][] sZero = stokesProduct(h, innerNormalised, nuTurn, WhittakerConnection.turn(h, m0));
        out[0] = new Complex[] {ZeroMonodromyBridge.toComplex(sInf[1][0]), ZeroMonodromyBridge.toComplex(sInf[0][1])};
        out[1] = new Complex[] {ZeroMonodromyBridge.toComplex(sZero[0][1]), ZeroMonodromyBridge.toComplex(sZero[1][0])};
        for (int i = 0; i < 2; i++) {
            for (int j = 0; j < 2; j++) {
                connection[i][j] = ZeroMonodromyBridge.toComplex(en[i][j]);
            }
        }
    }

    /** (N^-1 e^(2 pi i nu sigma3) N)^-1 e^(2 pi i p sigma3) = N^-1 e^(-2 pi i nu sigma3) N e^(2 pi i p sigma3). */
    private static Apcomplex[][] stokesProduct(FixedPrecisionApcomplexHelper h, Apcomplex[][] n, Apcomplex[] nuTurn,
                                               Apcomplex[] formal) {
        Apcomplex[][] left = {{h.multiply(nuTurn[1], n[0][0]), h.multiply(nuTurn[1], n[0][1])},
            {h.multiply(nuTurn[0], n[1][0]), h.multiply(nuTurn[0], n[1][1])}};
        Apcomplex[][] c = WhittakerConnection.multiply(h, WhittakerConnection.inverse(h, n), left);
        return new Apcomplex[][] {{h.multiply(c[0][0], formal[0]), h.multiply(c[0][1], formal[1])},
            {h.multiply(c[1][0], formal[0]), h.multiply(c[1][1], formal[1])}};
    }

    /** s_inf_k, k = 1 (lower) or 2 (upper). */
    public Complex stokesAtInfinity(int k) {
        return stokesInfinity[index(k)];
    }

    /** s_0_k, k = 1 (upper) or 2 (lower). */
    public Complex stokesAtZero(int k) {
        return stokesZero[index(k)];
    }

    /** E (row, column), rows and columns 1 or 2. */
    public Complex connection(int row, int column) {
        return connection[index(row)][index(column)];
    }

    /** E11 E22 (free of the gauges). */
    public Complex connectionProduct() {
        return connection[0][0].multiply(connection[1][1]);
    }

    /** chi = 1 - s_inf_1 E11 / E21. */
    public Complex chi() {
        return ZeroMonodromyBridge.chi(stokesInfinity[0], connection[0][0], connection[1][0]);
    }

    private static int index(int k) {
        if (k != 1 && k != 2) {
            throw new InvalidInputException("k", "must be 1 or 2, got " + k);
        }
        return k - 1;
    }
}
