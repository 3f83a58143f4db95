package org.tertius.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.cli.Options;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.number.ComplexText;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.step.SolverSettings;
import org.tertius.hierarchy.MemberParameters;
import org.tertius.hierarchy.MemberSolution;
import org.tertius.hierarchy.monodromy.Estimate;
import org.tertius.hierarchy.monodromy.InverseMonodromy;
import org.tertius.hierarchy.monodromy.InverseMonodromyBuilder;
import org.tertius.hierarchy.monodromy.Matrix;
import org.tertius.hierarchy.monodromy.MonodromyCondition;
import org.tertius.hierarchy.monodromy.MonodromyMap;
import org.tertius.hierarchy.monodromy.MonodromySolution;

/**
 * A member solution selected by its monodromy data (conventions of MonodromyMap, README.md 'Monodromy data'): the
 * inverse monodromy map finds the state at --x0 whose data satisfy the conditions given, from --guess or from
 * generated first guesses; the member's --times, --s, --m and the exponent --m0 at 0 are constants of the problem.
 * The start data found, their error estimate and the residuals are kept as notes for the output. A problem the
 * iteration cannot solve is reported (exit 3), never answered with another solution.
 */
final class MonodromyOptions implements OptionGroup {
    /** Allowed violation of det E = 1 and of the cyclic relation by data given in full (relative). */
    static final double DATA_TOLERANCE = 1e-9;
    private static final ComplexArithmetic AR = ComplexArithmetic.INSTANCE;
    private static final List<String> OPTIONS = List.of("--m0", "--stokes-infinity", "--stokes-zero", "--connection",
            "--connection-product", "--trivial-stokes-zero", "--real", "--guess");

    String m0;
    String stokesInfinity;
    String stokesZero;
    String connection;
    String connectionProduct;
    boolean trivialStokesZero;
    boolean real;
    String guess;
    private final List<String> notes = new ArrayList<>();

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.value("--m0", "M0", "select a member solution by monodromy data: the formal exponent"
                + " at lambda = 0 (with --member, --times, --s, --m; the start state is found at --x0)"));
        o.addOption(OptionKinds.value("--stokes-infinity", "S1,..,S2N", "the 2N Stokes multipliers at infinity"));
        o.addOption(OptionKinds.value("--stokes-zero", "S1,S2", "the two Stokes multipliers at 0"));
        o.addOption(OptionKinds.value("--connection", "E11,E12,E21,E22", "the connection matrix (any normalisation of"
                + " the canonical solutions at 0; with both Stokes lists: all data, checked for det E = 1 and the"
                + " cyclic relation)"));
        o.addOption(OptionKinds.value("--connection-product", "P", "the condition E11 E22 = P (free of gauges)"));
        o.addOption(OptionKinds.flag("--trivial-stokes-zero", "the condition s_0_1 = s_0_2 = 0"));
        o.addOption(OptionKinds.flag("--real", "the reality symmetry r = -conj(q) (real x0, times and s; imaginary m"
                + " and m0)"));
        o.addOption(OptionKinds.value("--guess", "V,..", "first guess of the state at --x0 (else generated ones)"));
    }

    @Override
    public void read(Arguments a) {
        m0 = a.text("--m0");
        stokesInfinity = a.text("--stokes-infinity");
        stokesZero = a.text("--stokes-zero");
        connection = a.text("--connection");
        connectionProduct = a.text("--connection-product");
        trivialStokesZero = a.has("--trivial-stokes-zero");
        real = a.has("--real");
        guess = a.text("--guess");
    }

    /** Whether a solution is selected by monodromy data. */
    boolean given() {
        return !optionsGiven().isEmpty();
    }

    List<String> optionsGiven() {
        List<String> out = new ArrayList<>();
        Object[] values = {m0, stokesInfinity, stokesZero, connection, connectionProduct,
            trivialStokesZero ? "" : null, real ? "" : null, guess};
        for (int i = 0; i < values.length; i++) {
            if (values[i] != null) {
                out.add(OPTIONS.get(i));
            }
        }
        return out;
    }

    /** Refuses --digits for a selection by monodromy data (its start data are found in double precision). */
    void refuseDigits(boolean digits) {
        if (digits && given()) {
            throw new InvalidInputException("--digits", "does not apply to a solution selected by monodromy data: the"
                    + " inverse monodromy map finds its start data in double precision");
        }
    }

    /** The selection in one line (for table signatures; empty without one). */
    String describe() {
        if (!given()) {
            return "";
        }
        return " m0=" + m0 + " stokes_inf=" + stokesInfinity + " stokes_0=" + stokesZero + " connection=" + connection
                + " product=" + connectionProduct + " trivial_0=" + trivialStokesZero + " real=" + real + " guess="
                + guess;
    }

    /** What the selection found (start data, errors, residuals), one line each; empty before {@link #solution}. */
    List<String> notes() {
        return List.copyOf(notes);
    }

    /** The member solution with the data given, started from the state the inverse map finds at --x0. */
    MemberSolution solution(MemberOptions member, SolverSettings settings) {
        for (String[] given : new String[][] {{"--state", member.state}, {"--origin", member.origin},
            {"--profile", member.profile}, {"--profile-phase", member.profilePhase}}) {
            if (given[1] != null) {
                throw new InvalidInputException(given[0], "does not apply with monodromy data (they select the"
                        + " solution; --x0 is where its start data are found)");
            }
        }
        if (member.x0 == null) {
            throw new InvalidInputException("--x0", "the point where the start data are found is required with"
                    + " monodromy data");
        }
        if (m0 == null) {
            throw new InvalidInputException("--m0", "the formal exponent at lambda = 0 is required with monodromy"
                    + " data (m0 = tr(a_-2 a_-1) / (2 i s))");
        }
        MemberParameters p = member.parameters();
        int n = p.order();
        Complex x = ExactText.parse("--x0", member.x0).toComplex();
        Complex top = n == 1 ? x : p.time(n);
        InverseMonodromyBuilder<Complex> b = InverseMonodromy.builder(MonodromyMap.doublePrecision(), n)
                .point(x, top.getArgument()).times(p.times()).constants(p.s(), p.m(), number("--m0", m0))
                .reality(real);
        List<MonodromyCondition<Complex>> conditions = conditions(n, p.m(), number("--m0", m0));
        if (conditions.isEmpty()) {
            throw new InvalidInputException("--stokes-infinity", "monodromy data select the solution: give"
                    + " --stokes-infinity, --stokes-zero, --connection, --connection-product or --trivial-stokes-zero");
        }
        conditions.forEach(b::condition);
        if (guess != null) {
            b.firstGuess(numbers("--guess", guess, 3 * (n + 1)));
        }
        MonodromySolution<Complex> found = b.build().solve();
        report(found, x, conditions);
        return found.solution(settings);
    }

    /** The exponent --m0 given (null when not given). */
    Complex m0Value() {
        return m0 == null ? null : number("--m0", m0);
    }

    /** The Stokes multipliers at infinity given for member n (null when not given). */
    List<Complex> stokesInfinityValues(int n) {
        return stokesInfinity == null ? null : numbers("--stokes-infinity", stokesInfinity, 2 * n);
    }

    /** The Stokes multipliers at 0 given (null when not given). */
    List<Complex> stokesZeroValues() {
        return stokesZero == null ? null : numbers("--stokes-zero", stokesZero, 2);
    }

    /** The connection matrix given, E11, E12, E21, E22 (null when not given). */
    List<Complex> connectionValues() {
        return connection == null ? null : numbers("--connection", connection, 4);
    }

    private List<MonodromyCondition<Complex>> conditions(int n, Complex m, Complex m0Value) {
        List<MonodromyCondition<Complex>> c = new ArrayList<>();
        List<Complex> inf = stokesInfinity == null ? null : numbers("--stokes-infinity", stokesInfinity, 2 * n);
        List<Complex> zero = stokesZero == null ? null : numbers("--stokes-zero", stokesZero, 2);
        List<Complex> e = connection == null ? null : numbers("--connection", connection, 4);
        if (trivialStokesZero && zero != null) {
            throw new InvalidInputException("--trivial-stokes-zero", "does not go with --stokes-zero (give one of"
                    + " them)");
        }
        if (inf != null && zero != null && e != null) {
            c.add(MonodromyCondition.allData(AR, inf, zero, new Matrix<>(e.get(0), e.get(1), e.get(2), e.get(3)), m,
                    m0Value, DATA_TOLERANCE));
        } else {
            for (int k = 0; inf != null && k < inf.size(); k++) {
                c.add(MonodromyCondition.stokesAtInfinity(k + 1, inf.get(k)));
            }
            for (int k = 0; zero != null && k < 2; k++) {
                c.add(MonodromyCondition.stokesAtZero(k + 1, zero.get(k)));
            }
            if (e != null) {
                unitDeterminant(e);
            }
            for (int k = 0; e != null && k < 4; k++) {
                c.add(MonodromyCondition.connection(k / 2 + 1, k % 2 + 1, e.get(k)));
            }
        }
        if (trivialStokesZero) {
            c.add(MonodromyCondition.trivialStokesAtZero());
        }
        if (connectionProduct != null) {
            c.add(MonodromyCondition.connectionProduct(number("--connection-product", connectionProduct)));
        }
        return c;
    }

    /**
     * Refuses a connection matrix given alone whose determinant is not 1 (the constraint det E = 1 of MonodromyMap's
     * contract: no solution has another).
     */
    private static void unitDeterminant(List<Complex> e) {
        Complex det = e.get(0).multiply(e.get(3)).subtract(e.get(1).multiply(e.get(2)));
        double size = 1;
        for (Complex v : e) {
            size = Math.max(size, v.norm());
        }
        if (!(det.subtract(1).norm() <= DATA_TOLERANCE * size * size)) {
            throw new InvalidInputException("--connection", "violates det E = 1 (E11 E22 - E12 E21 must be 1 within "
                    + DATA_TOLERANCE + " relative), got det E = " + ComplexText.format(det));
        }
    }

    private void report(MonodromySolution<Complex> found, Complex x, List<MonodromyCondition<Complex>> conditions) {
        List<String> d = new ArrayList<>();
        for (MonodromyCondition<Complex> c : conditions) {
            d.add(c.description());
        }
        notes.add("selected by monodromy data (" + String.join("; ", d) + (real ? "; reality r = -conj(q)" : "")
                + ") with the inverse monodromy map: " + found.iterations() + " iterations, " + found.stages()
                + " homotopy stage(s)");
        StringBuilder state = new StringBuilder("start data found at x0 = " + x + ": state =");
        double worstRelative = 0;
        for (int i = 0; i < found.state().size(); i++) {
            Complex v = found.state().get(i);
            state.append(String.format(Locale.ROOT, "%s%.17g%+.17gi +- %.2e", i == 0 ? " " : ", ", v.getReal(),
                    v.getImaginary(), found.stateError(i)));
            worstRelative = Math.max(worstRelative, found.stateError(i) / Math.max(1, v.norm()));
        }
        notes.add(state.toString());
        double worst = 0;
        double estimate = 0;
        for (Estimate<Complex> r : found.residuals()) {
            if (r.value().norm() > worst) {
                worst = r.value().norm();
                estimate = r.error();
            }
        }
        notes.add(String.format(Locale.ROOT, "residual of the conditions: largest %.2e (error estimate of its quantity"
                + " %.2e); free real directions %d (gauge)", worst, estimate, found.freeDirections()));
        notes.add(String.format(Locale.ROOT, "the error of these start data (largest relative %.1e) is carried into the"
                + " error estimates of the values", worstRelative));
    }

    private static Complex number(String option, String text) {
        return finite(option, ExactText.parse(option, text).toComplex());
    }

    private static Complex finite(String option, Complex c) {
        if (!Double.isFinite(c.getReal()) || !Double.isFinite(c.getImaginary())) {
            throw new InvalidInputException(option, "must be finite complex numbers (within the range of doubles), got "
                    + c);
        }
        return c;
    }

    private static List<Complex> numbers(String option, String text, int count) {
        List<ExactNumber> list = ExactText.list(option, text);
        if (list.size() != count) {
            throw new InvalidInputException(option, "expected " + count + " complex numbers, got " + list.size());
        }
        List<Complex> out = new ArrayList<>();
        for (ExactNumber e : list) {
            out.add(finite(option, e.toComplex()));
        }
        return out;
    }
}
