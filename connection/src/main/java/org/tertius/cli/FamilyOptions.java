package org.tertius.cli;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.cli.Options;
import org.tertius.connection.family.Families;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.step.SolverSettings;

/**
 * A solution given by connection data instead of start data: {@code --family NAME} with its parameters
 * (decaying: --lambda; power: --sigma --amplitude; analytic: --value-at-zero; algebraic: --background;
 * oscillating: --amplitude-infinity --phase).
 */
public final class FamilyOptions implements OptionGroup {
    String family;
    String lambda;
    String sigma;
    String amplitude;
    String valueAtZero;
    String background;
    String amplitudeInfinity;
    String phase;
    String familyX0;

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.value("--family", "NAME", "solution by connection data: decaying (needs --lambda; alpha=0"
                + " beta=0 gamma=1 delta=-1), power (--sigma, --amplitude: w ~ B z^sigma at 0), analytic"
                + " (--value-at-zero: w(0)), algebraic (--background: w ~ c + sum a_k x^-k at +infinity,"
                + " gamma c^4 + delta = 0), oscillating (--amplitude-infinity, --phase; alpha=0 beta=0 gamma=-1"
                + " delta=1: log w ~ A x^(-1/2) cos(2x + (A^2/2) log x + phi))"));
        o.addOption(OptionKinds.value("--lambda", "L", "decaying family: w ~ 1 - 2 lambda K0(2x) at +infinity"));
        o.addOption(OptionKinds.value("--sigma", "S", "power family: exponent at 0, |Re sigma| < 1"));
        o.addOption(OptionKinds.value("--amplitude", "B", "power family: B in w ~ B z^sigma"));
        o.addOption(OptionKinds.value("--value-at-zero", "W", "analytic family: w(0) != 0"));
        o.addOption(OptionKinds.value("--background", "C", "algebraic family: the constant c at +infinity"
                + " (gamma c^4 + delta = 0), a value or root0..root3 (the fourth roots of -delta/gamma, principal"
                + " root times i^k)"));
        o.addOption(OptionKinds.value("--amplitude-infinity", "A", "oscillating family: A in log w ~ A x^(-1/2)"
                + " cos(2x + (A^2/2) log x + phi), real, |A| <= 3"));
        o.addOption(OptionKinds.value("--phase", "PHI", "oscillating family: the phase constant phi (real)"));
        o.addOption(OptionKinds.value("--family-x0", "X", "where the family's expansion hands over to the integrator"
                + " (algebraic, oscillating: at +infinity; decaying at lambda = 1/pi: in (0, 0.2]); default: chosen"
                + " from the error estimate"));
    }

    @Override
    public void read(Arguments a) {
        family = a.text("--family");
        lambda = a.text("--lambda");
        sigma = a.text("--sigma");
        amplitude = a.text("--amplitude");
        valueAtZero = a.text("--value-at-zero");
        background = a.text("--background");
        amplitudeInfinity = a.text("--amplitude-infinity");
        phase = a.text("--phase");
        familyX0 = a.text("--family-x0");
    }

    public boolean given() {
        return family != null;
    }

    /** The family-parameter options that were given (without --family). */
    List<String> parametersGiven() {
        List<String> out = new ArrayList<>();
        String[] names = {"--lambda", "--sigma", "--amplitude", "--value-at-zero", "--background",
            "--amplitude-infinity", "--phase", "--family-x0"};
        String[] values = {lambda, sigma, amplitude, valueAtZero, background, amplitudeInfinity, phase, familyX0};
        for (int i = 0; i < names.length; i++) {
            if (values[i] != null) {
                out.add(names[i]);
            }
        }
        return out;
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
            String b = background.trim().toLowerCase(Locale.ROOT);
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
