package org.tertius.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.cli.Options;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.UnreachableTargetException;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.number.MpArithmetic;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.hierarchy.MemberSolution;
import org.tertius.hierarchy.monodromy.Estimate;
import org.tertius.hierarchy.monodromy.LaxMatrix;
import org.tertius.hierarchy.monodromy.MonodromyData;
import org.tertius.hierarchy.monodromy.MonodromyMap;

/**
 * The monodromy data of a solution (a hierarchy member given by any of its starts, the near-field profile, a
 * solution selected by its monodromy data, or a Painleve III D6 solution through member 1) at one or more points:
 * the formal exponents, the Stokes multipliers at 0 and infinity and the connection matrix, each with its error
 * estimate, the self-checks at each point and, for several points, the invariance check.
 */
public final class MonodromyCommand implements Command {
    /** Digits the command accepts (the work grows like the square of the digits times the Taylor steps). */
    static final int MIN_DIGITS = 16;
    static final int MAX_DIGITS = 125;
    /** Points per command: the data of all points are computed before the first row is written. */
    static final int MAX_POINTS = 10_000;
    /** Measured seconds per point in double precision (member 1 and Painleve III, 200 points, 2-core machine). */
    private static final double SECONDS_PER_POINT = 0.07;
    /** The default s of member 1 onto which a Painleve III solution is mapped. */
    private static final Complex DEFAULT_MEMBER1_S = new Complex(0.25);

    final SolutionOptions solution = new SolutionOptions();
    String at;
    Integer sheet;
    Integer digits;
    String format;
    String member1S;

    @Override
    public String name() {
        return "monodromy";
    }

    @Override
    public String description() {
        return "Monodromy data of a solution at points x (members; Painleve III D6 solutions at z through member 1):"
                + " the formal exponents m (infinity) and m0 (0), the Stokes multipliers s_inf_1..s_inf_2n (odd k"
                + " lower, even k upper triangular) and s_0_1 (upper), s_0_2 (lower), and the connection matrix E"
                + " = (Y^inf_1)^-1 Y^0_1 normalised so that E11 = E22 (or E12 = -E21 when E11 E22 = 0), each with its"
                + " error estimate; for several points the largest disagreement in units of the estimates (the data"
                + " do not change along a solution). Sectors and branches as in README.md, section 'Monodromy"
                + " data'.";
    }

    @Override
    public List<OptionGroup> groups() {
        return List.of(solution);
    }

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.value("--at", "X[,X...]", "points of the solution (complex a+bi, commas between)"));
        o.addOption(OptionKinds.value("--sheet", "K", "sheet of the points (argument in (-pi,pi] + 2 pi K)"));
        o.addOption(OptionKinds.value("--digits", "D", "integrate the lambda-equation with D digits (" + MIN_DIGITS
                + ".." + MAX_DIGITS + "); the state at each point stays the solution's, with its error estimate"));
        o.addOption(OptionKinds.value("--format", "csv|json", "output format (default csv)"));
        o.addOption(OptionKinds.value("--member1-s", "S", "Painleve III only: the constant s of member 1 onto which"
                + " the solution is mapped (default 1/4)"));
    }

    @Override
    public void read(Arguments a) {
        at = a.text("--at");
        sheet = a.integer("--sheet", null);
        digits = a.integer("--digits", "an integer in [" + MIN_DIGITS + ", " + MAX_DIGITS + "]");
        format = a.choice("--format", "csv", "json");
        member1S = a.text("--member1-s");
    }

    @Override
    public int run(PrintWriter out, PrintWriter err) {
        ProblemFile f = solution.file();
        String targets = at != null ? at : f.get("at");
        if (targets == null) {
            throw new InvalidInputException("--at", "points are required: --at X[,X...]");
        }
        if (digits == null && f.has("digits")) {
            digits = f.intValue("digits");
        }
        if (digits != null && (digits < MIN_DIGITS || digits > MAX_DIGITS)) {
            throw new InvalidInputException("--digits", "must be an integer in [" + MIN_DIGITS + ", " + MAX_DIGITS
                    + "], got " + digits);
        }
        boolean member = solution.isMember();
        if (member && member1S != null) {
            throw new InvalidInputException("--member1-s", "applies to Painleve III solutions only (a member has"
                    + " its own s)");
        }
        Complex mapS = member1S == null ? DEFAULT_MEMBER1_S : ExactText.parse("--member1-s", member1S).toComplex();
        if (!(mapS.norm() > 0) || !Double.isFinite(mapS.norm())) {
            throw new InvalidInputException("--member1-s", "must be a finite non-zero complex number, got " + mapS);
        }
        ComputedSolution s = solution.solution();
        List<SurfacePoint> points = Targets.list("--at", targets, solution.sheet(sheet), s.coordinate());
        if (points.isEmpty()) {
            throw new InvalidInputException("--at", "at least one point is required: --at X[,X...]");
        }
        if (points.size() > MAX_POINTS) {
            throw new InvalidInputException("--at", String.format(Locale.ROOT, "at most %d points per command (each"
                    + " takes about %.2f s in double precision, more with --digits; these %d would take about %.0f"
                    + " minutes before the first row), got %d; split them over several runs", MAX_POINTS,
                    SECONDS_PER_POINT, points.size(), points.size() * SECONDS_PER_POINT / 60, points.size()));
        }
        if (digits == null) {
            return report(MonodromyMap.doublePrecision(), s, mapS, points, out, err);
        }
        return report(MonodromyMap.withDigits(digits), s, mapS, points, out, err);
    }

    private <T> int report(MonodromyMap<T> map, ComputedSolution s, Complex mapS, List<SurfacePoint> points,
                           PrintWriter out, PrintWriter err) {
        List<MonodromyData<T>> data = new ArrayList<>();
        for (SurfacePoint p : points) {
            data.add(map.compute(laxMatrix(map.arithmetic(), s, mapS, p)));
        }
        boolean gaugeFixed = s instanceof MemberSolution;
        Double invariance = null;
        if (data.size() > 1) {
            double worst = 0;
            for (MonodromyData<T> d : data.subList(1, data.size())) {
                worst = Math.max(worst, gaugeFixed ? d.deviationRatio(data.get(0)) : gaugeFreeRatio(d, data.get(0)));
            }
            invariance = worst;
        }
        List<String> notes = notes(s, mapS, gaugeFixed, data.size(), invariance);
        notes.addAll(solution.notes());
        MonodromyRows rows = new MonodromyRows(s.coordinate().name(), digits == null ? 0 : digits);
        if (format.equals("json")) {
            out.print(rows.json(s.equationDescription(), points, data, notes, invariance));
        } else {
            for (String n : notes) {
                out.println("# " + n);
            }
            for (int i = 0; i < points.size(); i++) {
                out.println("# self-checks at " + points.get(i) + ": worst " + String.format(Locale.ROOT, "%.2g",
                        data.get(i).worstCheck()) + " of its bound, " + data.get(i).connectionNormalization()
                        .name().toLowerCase(Locale.ROOT) + " normalisation of E");
            }
            out.println(rows.columns());
            for (int i = 0; i < points.size(); i++) {
                rows.rows(points.get(i), data.get(i)).forEach(out::println);
            }
        }
        out.flush();
        int status = 0;
        for (int i = 0; i < points.size(); i++) {
            if (!data.get(i).checksHold()) {
                err.println("tertius: at " + points.get(i) + " the self-checks of the monodromy data fail (worst "
                        + data.get(i).worstCheck() + " times its bound): " + String.join("; ", data.get(i).checks()));
                status = Main.EXIT_UNREACHED;
            }
        }
        if (invariance != null && invariance > 1) {
            err.println("tertius: the data at the points disagree by " + String.format(Locale.ROOT, "%.3g", invariance)
                    + " times their estimates: they cannot be vouched for (points across a branch cut of the"
                    + " solution, or estimates too small)");
            status = Main.EXIT_UNREACHED;
        }
        return status;
    }

    private List<String> notes(ComputedSolution s, Complex mapS, boolean gaugeFixed, int count, Double invariance) {
        List<String> notes = new ArrayList<>();
        notes.add("monodromy data of " + s.equationDescription());
        if (!gaugeFixed) {
            notes.add("Painleve III mapped to member 1 (Member1Map.forEquation) with s = " + mapS + ": the state in the"
                    + " gauge a(-1)12 = 1 at each point, so that the multipliers and E12, E21 depend on the point;"
                    + " invariance compared on m, m0, E11 E22, s_0_1 s_0_2 and s_inf_1 s_inf_2");
        }
        if (digits != null) {
            notes.add(digits + " digits in the lambda-integration; the state at each point is the solution's"
                    + " double-precision state, its error estimate carried into err");
        }
        if (invariance != null) {
            notes.add(String.format(Locale.ROOT, "invariance over %d points: largest disagreement %.3g times the"
                    + " estimates (<= 1: the data agree)", count, invariance));
        }
        return notes;
    }

    /** The lambda-equation at a point of the solution, in the map's arithmetic. */
    private static <T> LaxMatrix<T> laxMatrix(AnalyticArithmetic<T> ar, ComputedSolution s, Complex mapS,
                                              SurfacePoint p) {
        if (s instanceof MemberSolution) {
            return LaxMatrix.of(ar, (MemberSolution) s, p);
        }
        Painleve3Solution piii = (Painleve3Solution) s;
        Painleve3Value v;
        try {
            v = piii.evaluate(p);
        } catch (UnreachableTargetException e) {
            // the engine's message says what stopped it; a target at a pole ends in a grown error estimate
            throw new InvalidInputException("--at", "the solution cannot be evaluated at " + p + " (the point is at or"
                    + " next to a pole, or the way to it is blocked): " + e.getMessage());
        }
        if (!Double.isFinite(v.w().norm()) || !Double.isFinite(v.dw().norm()) || v.errW() > 1e-4 * (1 + v.w().norm())) {
            throw new InvalidInputException("--at", "the solution is not known to 1e-4 relative at " + p + " (w = "
                    + v.w() + " +- " + v.errW() + "): the point is at or next to a pole, or the errors grew along the"
                    + " path to it; choose another point");
        }
        LaxMatrix<Complex> lax = LaxMatrix.ofPainleve3(piii.equation(), v, mapS);
        if (ar instanceof ComplexArithmetic) {
            @SuppressWarnings("unchecked")
            LaxMatrix<T> same = (LaxMatrix<T>) lax;
            return same;
        }
        List<T> state = new ArrayList<>();
        double[] errors = new double[lax.state().size()];
        for (int i = 0; i < errors.length; i++) {
            state.add(exact(ar, lax.state().get(i)));
            errors[i] = lax.stateError(i);
        }
        return LaxMatrix.of(ar, 1, exact(ar, lax.x()), List.of(), exact(ar, lax.s()), exact(ar, lax.m()), state, errors,
                lax.topArgument());
    }

    private static <T> T exact(AnalyticArithmetic<T> ar, Complex c) {
        return ar.of(c.getReal(), c.getImaginary());
    }

    /**
     * |a - b| / (sum of estimates), largest over the quantities that the gauge of the state does not change: m, m0,
     * E11 E22, s_0_1 s_0_2 and s_inf_(2k-1) s_inf_(2k).
     */
    private static <T> double gaugeFreeRatio(MonodromyData<T> a, MonodromyData<T> b) {
        List<Estimate<T>> qa = gaugeFree(a);
        List<Estimate<T>> qb = gaugeFree(b);
        AnalyticArithmetic<T> ar = a.arithmetic();
        double worst = 0;
        for (int i = 0; i < qa.size(); i++) {
            double d = ar.abs(ar.subtract(qa.get(i).value(), qb.get(i).value()));
            worst = Math.max(worst, d / Math.max(qa.get(i).error() + qb.get(i).error(), Double.MIN_NORMAL));
        }
        return worst;
    }

    private static <T> List<Estimate<T>> gaugeFree(MonodromyData<T> d) {
        List<Estimate<T>> q = new ArrayList<>(List.of(d.exponentAtInfinity(), d.exponentAtZero(),
                d.connectionProduct(), product(d.arithmetic(), d.stokesAtZero(1), d.stokesAtZero(2))));
        for (int k = 1; k <= d.order(); k++) {
            q.add(product(d.arithmetic(), d.stokesAtInfinity(2 * k - 1), d.stokesAtInfinity(2 * k)));
        }
        return q;
    }

    private static <T> Estimate<T> product(AnalyticArithmetic<T> ar, Estimate<T> a, Estimate<T> b) {
        T p = ar.multiply(a.value(), b.value());
        double e = a.error() * ar.abs(b.value()) + b.error() * ar.abs(a.value()) + a.error() * b.error()
                + 2 * ar.epsilon() * ar.abs(p);
        return new Estimate<>(p, e);
    }
}
