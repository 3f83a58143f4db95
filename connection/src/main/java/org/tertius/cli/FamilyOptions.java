package org.tertius.cli;

import java.util.LinkedHashMap;
import java.util.Map;
import org.tertius.connection.family.Families;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.step.SolverSettings;
import picocli.CommandLine.Option;

/**
 * A solution given by connection data instead of start data: {@code --family NAME} with its parameters
 * (decaying: --lambda; power: --sigma --amplitude; analytic: --value-at-zero; algebraic: --background;
 * oscillating: --amplitude-infinity --phase).
 */
public final class FamilyOptions {
    @Option(names = "--family", paramLabel = "NAME",
            description = "solution by connection data: decaying (needs --lambda; alpha=0 beta=0 gamma=1 delta=-1),"
                    + " power (--sigma, --amplitude: w ~ B z^sigma at 0), analytic (--value-at-zero: w(0)),"
                    + " algebraic (--background: w ~ c + sum a_k x^-k at +infinity, gamma c^4 + delta = 0),"
                    + " oscillating (--amplitude-infinity, --phase; alpha=0 beta=0 gamma=-1 delta=1:"
                    + " log w ~ A x^(-1/2) cos(2x + (A^2/2) log x + phi))")
    String family;
    @Option(names = "--lambda", paramLabel = "L", description = "decaying family: w ~ 1 - 2 lambda K0(2x) at +infinity")
    String lambda;
    @Option(names = "--sigma", paramLabel = "S", description = "power family: exponent at 0, |Re sigma| < 1")
    String sigma;
    @Option(names = "--amplitude", paramLabel = "B", description = "power family: B in w ~ B z^sigma")
    String amplitude;
    @Option(names = "--value-at-zero", paramLabel = "W", description = "analytic family: w(0) != 0")
    String valueAtZero;
    @Option(names = "--background", paramLabel = "C",
            description = "algebraic family: the constant c at +infinity (gamma c^4 + delta = 0), a value or"
                    + " root0..root3 (the fourth roots of -delta/gamma, principal root times i^k)")
    String background;

    @Option(names = "--amplitude-infinity", paramLabel = "A",
            description = "oscillating family: A in log w ~ A x^(-1/2) cos(2x + (A^2/2) log x + phi), real, |A| <= 3")
    String amplitudeInfinity;
    @Option(names = "--phase", paramLabel = "PHI", description = "oscillating family: the phase constant phi (real)")
    String phase;

    @Option(names = "--family-x0", paramLabel = "X",
            description = "where the family's expansion hands over to the integrator (algebraic, oscillating: at"
                    + " +infinity; decaying at lambda = 1/pi: in (0, 0.2]); default: chosen from the error estimate")
    String familyX0;

    public boolean given() {
        return family != null;
    }

    /** The parameters given, keyed by the library's parameter names. */
    Map<String, String> parameters() {
        Map<String, String> m = new LinkedHashMap<>();
        put(m, "lambda", lambda);
        put(m, "sigma", sigma);
        put(m, "B", amplitude);
        put(m, "w0", valueAtZero);
        put(m, "x0", familyX0);
        put(m, "A", amplitudeInfinity);
        put(m, "phi", phase);
        if (background != null) {
            String b = background.trim().toLowerCase(java.util.Locale.ROOT);
            if (b.matches("root[0-3]")) {
                m.put("root", b.substring(4));
            } else {
                m.put("c", background);
            }
        }
        return m;
    }

    private static void put(Map<String, String> m, String k, String v) {
        if (v != null) {
            m.put(k, v);
        }
    }

    /** The family and its parameters in one line (for signatures). */
    String describe() {
        return family + parameters();
    }

    /** Fills unset options from a problem file. */
    void defaults(ProblemFile f) {
        family = f.fill(family, "family");
        lambda = f.fill(lambda, "lambda");
        sigma = f.fill(sigma, "sigma");
        amplitude = f.fill(amplitude, "b");
        valueAtZero = f.fill(valueAtZero, "w00");
        background = f.fill(background, "background");
        amplitudeInfinity = f.fill(amplitudeInfinity, "amplitude-infinity");
        phase = f.fill(phase, "phase");
        familyX0 = f.fill(familyX0, "family-x0");
    }

    public Painleve3Solution solution(Painleve3 equation, SolverSettings settings) {
        return Families.create(equation, family, parameters(), settings);
    }
}
