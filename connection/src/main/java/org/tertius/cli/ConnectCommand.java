package org.tertius.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.cli.Options;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;
import org.hipparchus.complex.Complex;
import org.tertius.connection.closed.McCoyTracyWu;
import org.tertius.connection.infinity.InfinityBehaviour;
import org.tertius.connection.infinity.TransseriesAtInfinity;
import org.tertius.connection.match.DecayingConnection;
import org.tertius.connection.match.InfinityBehaviourFit;
import org.tertius.connection.match.ZeroFit;
import org.tertius.connection.zero.ZeroBehaviour;
import org.tertius.core.InvalidInputException;
import org.tertius.core.highprecision.HighPrecisionSolution;
import org.tertius.core.number.ApcomplexArithmetic;
import org.tertius.core.number.ComplexText;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.hierarchy.Member1Map;
import org.tertius.hierarchy.MemberSolution;

/**
 * The connection problem: the behaviour at 0 or along a ray at infinity of any Painleve III solution (start data or
 * a family), start data from the data at 0 or at infinity, and the decaying family of PIII(0, 0, 1, -1) between
 * +infinity and 0 with its closed form (--lambda or --sigma alone).
 */
public final class ConnectCommand implements Command {
    final SolutionOptions solution = new SolutionOptions();
    final ConnectionOptions connection = new ConnectionOptions();

    @Override
    public String name() {
        return "connect";
    }

    @Override
    public String description() {
        return "The connection problem of a Painleve III solution: its behaviour at 0 (--at-zero) or along a ray at"
                + " infinity (--at-infinity --ray ARG), or start data from the data at 0 (--from-zero) or at infinity"
                + " (--from-infinity), each with an error estimate and the closed form beside it where one is known;"
                + " with --lambda or --sigma alone, the decaying family w ~ 1 - 2 lambda K0(2x) of PIII(0,0,1,-1)"
                + " between lambda and (sigma, B) of w ~ B x^sigma at 0.";
    }

    @Override
    public List<OptionGroup> groups() {
        return List.of(solution, connection);
    }

    @Override
    public void declare(Options o) {
    }

    @Override
    public void read(Arguments a) {
    }

    @Override
    public int run(PrintWriter out, PrintWriter err) {
        solution.file();
        int direction = connection.direction();
        ConnectionRows rows = new ConnectionRows();
        boolean decided = true;
        try {
            switch (direction) {
                case 0:
                    decided = atZero(rows);
                    break;
                case 1:
                    decided = atInfinity(rows);
                    break;
                case 2:
                    fromZero(rows);
                    break;
                case 3:
                    fromInfinity(rows);
                    break;
                default:
                    decaying(rows);
            }
        } catch (InvalidInputException e) {
            throw optionNamed(e, direction);
        }
        rows.write(out, connection.format);
        if (!decided) {
            err.println("tertius: the behaviour is undecided (see the comment lines for the reason)");
            return Main.EXIT_UNREACHED;
        }
        return 0;
    }

    /** Solutions started from the member's image moved by its errors (empty for start data given as such). */
    private List<Painleve3Solution> moved = List.of();


    private boolean atZero(ConnectionRows rows) {
        Painleve3Solution s = painleve3(rows);
        Double lambda = decayingLambda();
        if (connection.digits != null) {
            HighPrecisionSolution.checkDigits(connection.digits);
            s.highPrecisionForm().requireDigits(connection.digits);
        }
        BridgeRows.ClosedAtZero bridge = solution.isMember() && solution.monodromy.given()
                ? BridgeRows.fromSelection(solution.member.parameters(), solution.monodromy) : null;
        if (connection.monodromyData) {
            if (bridge != null) {
                throw new InvalidInputException("--monodromy-data", "the solution is selected by its monodromy data,"
                        + " whose closed forms are printed anyway; remove it");
            }
            if (connection.digits != null) {
                throw new InvalidInputException("--monodromy-data", "the monodromy data are computed in double"
                        + " precision; drop --digits or --monodromy-data");
            }
            bridge = BridgeRows.fromSolution(s, connection.rayAngle(), connection.sheetIndex());
        }
        boolean decided = ConnectionReport.atZero(s, moved, connection.rayAngle(), connection.sheetIndex(), lambda,
                bridge, rows);
        if (connection.digits != null && decided) {
            PreciseConnection.atZero(s, connection.rayAngle(), connection.sheetIndex(), connection.digits, rows);
        }
        return decided;
    }

    private boolean atInfinity(ConnectionRows rows) {
        Painleve3Solution s = painleve3(rows);
        Integer digits = connection.digits;
        if (connection.monodromyData && connection.sheetIndex() != 0) {
            throw new InvalidInputException("--monodromy-data", "the bridge at infinity is derived on the"
                    + " principal sheet; use --sheet 0");
        }
        if (connection.monodromyData && digits != null) {
            throw new InvalidInputException("--monodromy-data", "the bridge to the monodromy data is double"
                    + " precision; drop --digits or --monodromy-data");
        }
        if (digits != null) {
            PreciseConnection.checkAtInfinity(s, digits);
        }
        boolean decided = ConnectionReport.atInfinity(s, moved, connection.rayAngle(), connection.sheetIndex(),
                connection.sampleRadii(InfinityBehaviourFit.R_MIN, InfinityBehaviourFit.R_MAX), rows,
                b -> {
                    if (digits != null) {
                        PreciseConnection.atInfinity(s, b, digits, rows);
                    }
                });
        if (connection.monodromyData) {
            BridgeRows.infinityFromSolution(s, connection.rayAngle(), rows);
        }
        return decided;
    }

    /**
     * The Painleve III solution the options give; for member 1 of the hierarchy its image w(z) under the map z = c
     * sqrt(x) (Member1Map, canonical: gamma = 1, delta = -1), started from the image of the member's value at its
     * start point (at x = 1 when it was started at x = 0), with a comment saying so.
     */
    private Painleve3Solution painleve3(ConnectionRows rows) {
        if (!solution.isMember()) {
            return solution.painleve3();
        }
        MemberSolution member = solution.memberSolution();
        if (member.member().order() != 1) {
            throw new InvalidInputException("--member", "connect maps member 1 to Painleve III; member "
                    + member.member().order() + " has no such map");
        }
        Member1Map map = Member1Map.canonical(member.parameters().s());
        Painleve3 eq = map.equation(member.parameters().m(), member.traceIntegral());
        Complex x0 = member.startPoint().norm() > 0 ? member.startPoint() : Complex.ONE;
        Painleve3Value v = map.toPainleve3(member.evaluate(x0));
        rows.comment("member 1 as Painleve III: w(z) of " + eq + " under z = c sqrt(x), c^2 = 16 s, started at z0 = "
                + ComplexText.format(v.point().z()) + " (the image of x = " + ComplexText.format(x0) + ") from w, w'"
                + " with errors " + ConnectionRows.error(v.errW()) + ", " + ConnectionRows.error(v.errDw())
                + " (propagated into the fits by refitting the solutions started from w + err w and w' + err w');"
                + " sheets and rays below are those of z");
        moved = new ArrayList<>();
        String source = "member 1 of the hierarchy through Member1Map";
        if (v.errW() > 0) {
            moved.add(Painleve3Solution.builder(eq).settings(solution.solver.settings())
                    .start(v.point().z(), v.w().add(v.errW()), v.dw()).startComputedBy(source).build());
        }
        if (v.errDw() > 0) {
            moved.add(Painleve3Solution.builder(eq).settings(solution.solver.settings())
                    .start(v.point().z(), v.w(), v.dw().add(v.errDw())).startComputedBy(source).build());
        }
        return Painleve3Solution.builder(eq).settings(solution.solver.settings()).start(v.point().z(), v.w(), v.dw())
                .startComputedBy(source).build();
    }

    /** lambda when the solution is the decaying family with real lambda, else null. */
    private Double decayingLambda() {
        FamilyOptions f = solution.family;
        if (!f.given() || !"decaying".equals(f.family.trim().toLowerCase(Locale.ROOT)) || f.lambda == null) {
            return null;
        }
        Complex l = ComplexText.parse("--lambda", f.lambda);
        return l.getImaginary() == 0 ? l.getReal() : null;
    }

    /** The equation alone: the reverse directions take no solution, only its data. */
    private Painleve3 equationOnly(String direction) {
        List<String> other = new ArrayList<>(solution.optionsGiven());
        other.removeAll(List.of("--alpha", "--beta", "--gamma", "--delta"));
        if (!other.isEmpty()) {
            throw new InvalidInputException(other.get(0), "does not apply with " + direction + " (it gives the"
                    + " solution by its data; only the equation --alpha --beta --gamma --delta is needed); remove "
                    + String.join(", ", other));
        }
        return solution.equationValue();
    }

    private void fromZero(ConnectionRows rows) {
        Painleve3 eq = equationOnly("--from-zero");
        List<String> p = ConnectionOptions.parts("--from-zero", connection.fromZero, 2, connection.logarithmic
                ? "SIDE,T0 with SIDE = 1 or -1" : "SIGMA,B");
        ZeroBehaviour data;
        if (connection.logarithmic) {
            int side;
            try {
                side = Integer.parseInt(p.get(0).replace("+", ""));
            } catch (NumberFormatException e) {
                side = 0;
            }
            if (side != 1 && side != -1) {
                throw new InvalidInputException("--from-zero", "with --logarithmic the first value is the side, 1 or"
                        + " -1, got " + p.get(0));
            }
            int branch = connection.branch == null ? 0 : connection.branch;
            data = ZeroBehaviour.logarithmic(side, ExactText.parse("--from-zero", p.get(1)).toComplex(), branch);
        } else {
            try {
                data = ZeroBehaviour.power(ExactText.parse("--from-zero", p.get(0)).toComplex(),
                        ExactText.parse("--from-zero", p.get(1)).toComplex());
            } catch (InvalidInputException e) {
                String m = e.reason();
                throw new InvalidInputException("--from-zero", m + (m.contains("resonance")
                        ? "; on the command line: --from-zero SIDE,T0 --logarithmic [--branch K]" : ""));
            }
        }
        if (connection.monodromyData && (connection.logarithmic || connection.digits != null)) {
            throw new InvalidInputException("--monodromy-data", "applies to the power behaviour in double precision"
                    + " only (not with " + (connection.logarithmic ? "--logarithmic" : "--digits") + ")");
        }
        if (connection.monodromyData) {
            // refused before anything is written: the bridge needs D6 and |Re sigma| < 1
            BridgeRows.monodromyRows(eq, data.sigma(), data.secondParameter(), new ConnectionRows());
        }
        if (connection.digits != null) {
            HighPrecisionSolution.checkDigits(connection.digits);
            if (connection.logarithmic) {
                throw new InvalidInputException("--digits", "not available with --logarithmic (the logarithmic series"
                        + " is summed in double precision only)");
            }
            PreciseConnection.fromZero(eq, p, connection.startAt, connection.rayAngle(), connection.sheetIndex(),
                    connection.digits, rows);
            return;
        }
        ConnectionReport.fromZero(eq, data, connection.startAt, connection.rayAngle(), connection.sheetIndex(), rows);
        if (connection.monodromyData) {
            BridgeRows.infinityRows(eq, data.sigma(), data.secondParameter(), connection.rayAngle(),
                    connection.sheetIndex(), rows);
            BridgeRows.monodromyRows(eq, data.sigma(), data.secondParameter(), rows);
        }
    }

    private void fromInfinity(ConnectionRows rows) {
        Painleve3 eq = equationOnly("--from-infinity");
        List<String> p = ConnectionOptions.parts("--from-infinity", connection.fromInfinity, 3, "C,P,Q");
        List<Complex> roots = TransseriesAtInfinity.backgrounds(eq);
        Complex c;
        String ct = p.get(0).toLowerCase(Locale.ROOT);
        if (ct.matches("root[0-9]+")) {
            int k = Integer.parseInt(ct.substring(4));
            if (k >= roots.size()) {
                throw new InvalidInputException("--from-infinity", "the background index must be root0..root"
                        + (roots.size() - 1) + " for this equation, got " + p.get(0));
            }
            c = roots.get(k);
        } else {
            c = ComplexText.parse("--from-infinity", p.get(0));
        }
        InfinityBehaviour data = InfinityBehaviour.of(eq, c, ComplexText.parse("--from-infinity", p.get(1)),
                ComplexText.parse("--from-infinity", p.get(2)), connection.rayAngle(), connection.sheetIndex());
        if (connection.digits != null) {
            HighPrecisionSolution.checkDigits(connection.digits);
            PreciseConnection.fromInfinity(eq, data, roots.indexOf(data.background()), p, connection, rows);
            return;
        }
        Double radius = null;
        if (connection.startAt != null) {
            Complex r = ComplexText.parse("--start-at", connection.startAt);
            if (r.getImaginary() != 0) {
                throw new InvalidInputException("--start-at", "for --from-infinity it is the radius |z| on the ray"
                        + " --ray (a real number in [1, 1e4]), got " + connection.startAt);
            }
            radius = r.getReal();
        }
        ConnectionReport.fromInfinity(eq, data, radius, rows);
    }

    /** The decaying family's own mode: --lambda or --sigma alone. */
    private void decaying(ConnectionRows rows) {
        FamilyOptions f = solution.family;
        List<String> other = new ArrayList<>(solution.optionsGiven());
        other.removeAll(List.of("--lambda", "--sigma"));
        if (other.equals(List.of("--x0")) && f.lambda != null != (f.sigma != null)) {
            throw new InvalidInputException("--x0", "the decaying family's fit point is given by --fit-at X (--x0 is the"
                    + " start point of a hierarchy member)");
        }
        if ((f.lambda == null) == (f.sigma == null) || !other.isEmpty()) {
            throw new InvalidInputException(other.isEmpty() ? "--lambda" : other.get(0), "give one of --at-zero,"
                    + " --at-infinity, --from-zero or --from-infinity with a solution or an equation, or, for the"
                    + " decaying family of PIII(0,0,1,-1), exactly one of --lambda (data at infinity) or --sigma"
                    + " (data at 0) alone");
        }
        double x0 = connection.fitAt == null ? 1e-3 : connection.fitAt;
        if (!(x0 > 0 && x0 <= 0.1)) {
            throw new InvalidInputException("--fit-at", "must be in (0, 0.1], got " + x0);
        }
        rows.comment("decaying family of PIII(0,0,1,-1): w ~ 1 - 2 lambda K0(2x) at infinity, w ~ B x^sigma at 0;"
                + " closed form of McCoy, Tracy and Wu (1977)");
        if (f.sigma != null) {
            if (connection.digits != null) {
                throw new InvalidInputException("--digits", "not available with --sigma (lambda is found by a"
                        + " shooting in double precision); give --lambda for digits");
            }
            double sigma = ComplexText.parse("--sigma", f.sigma).getReal();
            double[] l = DecayingConnection.lambdaForSigma(sigma, x0, solution.solver.settings());
            double closed = Math.sin(Math.PI * sigma / 2) / Math.PI;
            rows.add("lambda", "double", ConnectionRows.real(l[0]), ConnectionRows.error(l[1]),
                    ConnectionRows.real(closed), ConnectionRows.error(1e-16));
            return;
        }
        double lam = EquationOptions.value("--lambda", f.lambda).getReal();
        McCoyTracyWu.requirePowerRange(lam, !(Math.abs(lam) < McCoyTracyWu.EDGE));
        ZeroFit.Result<Complex> r = DecayingConnection.zeroDataByEngine(lam, x0, solution.solver.settings());
        double cs = McCoyTracyWu.sigma(lam);
        double cb = McCoyTracyWu.amplitude(lam);
        rows.add("sigma", "double", ConnectionRows.real(r.sigma().getReal()), ConnectionRows.error(r.errSigma()),
                ConnectionRows.real(cs), ConnectionRows.error(2e-16 * Math.abs(cs)));
        rows.add("B", "double", ConnectionRows.real(r.amplitude().getReal()), ConnectionRows.error(r.errAmplitude()),
                ConnectionRows.real(cb), ConnectionRows.error(2e-16 * Math.abs(cb)));
        Integer digits = connection.digits;
        if (digits != null) {
            HighPrecisionSolution.checkDigits(digits);
            ApcomplexArithmetic ar = new ApcomplexArithmetic(digits + 6);
            ZeroFit.Result<Apcomplex> hp = DecayingConnection.zeroData(ar, ar.parse(f.lambda), Math.min(x0, 1e-4), 14);
            Apcomplex[] c = McCoyTracyWu.zeroData(f.lambda, digits);
            rows.add("sigma", digits + " digits", text(hp.sigma().real().precision(digits)),
                    ConnectionRows.error(hp.errSigma()), text(c[0].real()), "1e-" + digits);
            rows.add("B", digits + " digits", text(hp.amplitude().real().precision(digits)),
                    ConnectionRows.error(hp.errAmplitude()), text(c[1].real()), "1e-" + digits);
        }
    }

    private static String text(Apfloat a) {
        return a.toString(true);
    }

    /**
     * A refusal of the library, named by the option the user typed: the library names its own parameters (ray, p,
     * sigma, ..); a refusal that already names an option is passed on.
     */
    private static InvalidInputException optionNamed(InvalidInputException e, int direction) {
        String argument = e.argument();
        if (argument.startsWith("--")) {
            return e;
        }
        String option;
        switch (argument) {
            case "ray":
            case "angle":
                option = "--ray";
                break;
            case "sheet":
                option = "--sheet";
                break;
            case "radius":
                option = direction == 1 ? "--radii" : "--start-at";
                break;
            case "lambda":
                option = "--lambda";
                break;
            case "branch":
                option = "--branch";
                break;
            case "digits":
                option = "--digits";
                break;
            default:
                option = direction == 2 ? "--from-zero" : direction == 3 ? "--from-infinity"
                        : direction < 0 ? (argument.equals("sigma") ? "--sigma" : "--lambda") : null;
        }
        if (option == null) {
            return e;
        }
        return option.equals("--" + argument) ? e.renamed(option)
                : new InvalidInputException(option, "(" + argument + ") " + e.reason());
    }
}
