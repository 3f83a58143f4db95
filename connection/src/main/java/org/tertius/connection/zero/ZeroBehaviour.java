package org.tertius.connection.zero;

import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.step.SolverSettings;

/**
 * The behaviour of a Painleve III solution at z = 0 (DLMF eq. 32.2.3), with error estimates: the exponent sigma and
 * the second parameter of the expansion at 0 ({@link ZeroExpansion}). Kinds:
 * <ul>
 *   <li>{@link Kind#POWER}: w ~ B z^sigma, |Re sigma| &lt; 1 (parameters sigma, B);</li>
 *   <li>{@link Kind#ZEROS_ACCUMULATE}: Re sigma = 1, Im sigma != 0: w ~ z (B z^(-k) + beta/k^2 + B' z^k), k = 1 -
 *       sigma imaginary, whose zeros accumulate at 0 along one ray of the universal cover (parameters sigma, B);</li>
 *   <li>{@link Kind#POLES_ACCUMULATE}: Re sigma = -1, the same for 1/w: poles accumulate at 0;</li>
 *   <li>{@link Kind#LOGARITHMIC}: sigma = +-1 (side), w ~ z P(log z - t0) (or its reciprocal), parameters t0 and,
 *       where the relevant beta vanishes, the branch +-1 ({@link LogSeriesAtZero});</li>
 *   <li>{@link Kind#UNDECIDED}: the computed solution does not decide between the kinds to the accuracy reached
 *       (the reason is given).</li>
 * </ul>
 * The same data describe the solution on every sheet (the expansions converge on sectors of the universal cover).
 * Instances made by {@link #power} and {@link #logarithmic} are exact data (zero errors) for building solutions.
 * Immutable.
 */
public final class ZeroBehaviour {
    /** The kinds of behaviour at 0. */
    public enum Kind { POWER, ZEROS_ACCUMULATE, POLES_ACCUMULATE, LOGARITHMIC, UNDECIDED }

    /** Rows of the expansion used for start data and fits in double precision. */
    public static final int ROWS = 16;

    private final Kind kind;
    private final Complex sigma;
    private final double sigmaError;
    private final Complex amplitude;
    private final double amplitudeError;
    private final int branch;
    private final String note;

    private ZeroBehaviour(Kind kind, Complex sigma, double sigmaError, Complex amplitude, double amplitudeError,
                          int branch, String note) {
        this.kind = kind;
        this.sigma = sigma;
        this.sigmaError = sigmaError;
        this.amplitude = amplitude;
        this.amplitudeError = amplitudeError;
        this.branch = branch;
        this.note = note;
    }

    /**
     * Exact power data w ~ B z^sigma, |Re sigma| &lt;= 1, sigma != +-1; the kind follows from Re sigma.
     *
     * @throws InvalidInputException as {@link ZeroExpansion#power}
     */
    public static ZeroBehaviour power(Complex sigma, Complex b) {
        ZeroExpansion.requirePowerData(sigma, b);
        return measuredPower(sigma, 0, b, 0, "");
    }

    /**
     * Power data from a measurement; the kind follows from Re sigma and its error (3 sigma-error band). An edge kind
     * sets Re sigma to exactly +-1 (the edge is a condition on the solution, the measured real part agrees with it
     * within the error).
     */
    public static ZeroBehaviour measuredPower(Complex sigma, double sigmaError, Complex b, double bError,
                                              String note) {
        double re = sigma.getReal();
        Kind k;
        Complex s = sigma;
        if (Math.abs(re - 1) <= 3 * sigmaError || re == 1) {
            k = Kind.ZEROS_ACCUMULATE;
            s = new Complex(1, sigma.getImaginary());
        } else if (Math.abs(re + 1) <= 3 * sigmaError || re == -1) {
            k = Kind.POLES_ACCUMULATE;
            s = new Complex(-1, sigma.getImaginary());
        } else {
            k = Kind.POWER;
        }
        return new ZeroBehaviour(k, s, sigmaError, b, bError, 0, note);
    }

    /**
     * Exact logarithmic data: sigma = side (+1 or -1), parameter t0 and branch (0 unless the beta of w, for side
     * +1, or of 1/w, i.e. -alpha, for side -1, vanishes; then +-1).
     */
    public static ZeroBehaviour logarithmic(int side, Complex t0, int branch) {
        return measuredLogarithmic(side, t0, 0, branch, "");
    }

    /** Logarithmic data from a measurement. */
    public static ZeroBehaviour measuredLogarithmic(int side, Complex t0, double t0Error, int branch, String note) {
        if (side != 1 && side != -1) {
            throw new InvalidInputException("sigma", "the logarithmic behaviour sits at sigma = +1 or -1, got " + side);
        }
        return new ZeroBehaviour(Kind.LOGARITHMIC, new Complex(side), 0, t0, t0Error, branch, note);
    }

    /** A measurement that decides nothing; sigma is the best estimate (may be NaN). */
    public static ZeroBehaviour undecided(Complex sigma, double sigmaError, String reason) {
        return new ZeroBehaviour(Kind.UNDECIDED, sigma, sigmaError, Complex.NaN, Double.NaN, 0, reason);
    }

    public Kind kind() {
        return kind;
    }

    /** The exponent sigma (+-1 for the logarithmic kind). */
    public Complex sigma() {
        return sigma;
    }

    public double sigmaError() {
        return sigmaError;
    }

    /** B for the power kinds, t0 for the logarithmic kind, NaN when undecided. */
    public Complex secondParameter() {
        return amplitude;
    }

    public double secondParameterError() {
        return amplitudeError;
    }

    /** The branch of the logarithmic kind (0 when there is no choice). */
    public int branch() {
        return branch;
    }

    /** How the data were obtained, or why the kind is undecided. */
    public String note() {
        return note;
    }

    /**
     * The expansion of these data for the given equation.
     *
     * @throws InvalidInputException for the undecided kind, or data the equation does not admit
     */
    public ZeroExpansion<Complex> expansion(Painleve3 equation) {
        ComplexArithmetic ar = ComplexArithmetic.INSTANCE;
        List<Complex> p = List.of(equation.alpha(), equation.beta(), equation.gamma(), equation.delta());
        switch (kind) {
            case LOGARITHMIC:
                return ZeroExpansion.logarithmic(ar, p, (int) sigma.getReal(), amplitude, branch, 24);
            case UNDECIDED:
                throw new InvalidInputException("behaviour", "the behaviour at 0 is undecided (" + note + ");"
                        + " no expansion can be built from it");
            default:
                return ZeroExpansion.power(ar, p, sigma, amplitude, ROWS);
        }
    }

    /**
     * The solution with these data, started from the expansion on the principal sheet at the angle {@code angle}
     * (in (-pi, pi]), at the largest |z| &lt;= 0.25 (halving) where the estimated error of the start data relative to
     * 1 + |value| is at most {@code tolerance}.
     *
     * @throws InvalidInputException for an angle outside (-pi, pi], a tolerance the expansion does not reach, or
     *     data the equation does not admit
     */
    public Painleve3Solution solution(Painleve3 equation, double angle, double tolerance, SolverSettings settings) {
        if (!(angle > -Math.PI && angle <= Math.PI)) {
            throw new InvalidInputException("angle", "the start ray must be on the principal sheet, angle in (-pi, pi],"
                    + " got " + angle);
        }
        LocalValue<Complex> v = expansion(equation).startData(new Complex(Math.log(0.25), angle), tolerance);
        return Painleve3Solution.builder(equation).start(v.z(), v.w(), v.dw()).settings(settings).build();
    }

    @Override
    public String toString() {
        String second = kind == Kind.LOGARITHMIC ? "t0" : "B";
        return kind + ": sigma = " + sigma + " +- " + sigmaError + ", " + second + " = " + amplitude + " +- "
                + amplitudeError + (kind == Kind.LOGARITHMIC ? ", branch " + branch : "")
                + (note.isEmpty() ? "" : " (" + note + ")");
    }
}
