package org.tertius.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.cli.Options;
import org.apfloat.Apcomplex;
import org.hipparchus.complex.Complex;
import org.tertius.connection.closed.McCoyTracyWu;
import org.tertius.connection.match.DecayingConnection;
import org.tertius.connection.match.ZeroFit;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ApcomplexArithmetic;

/** Connection data of the decaying family of PIII(0, 0, 1, -1) between +infinity and 0. */
public final class ConnectCommand implements Command {
    final SolverOptions solver = new SolverOptions();
    String lambda;
    Double sigma;
    double x0;
    Integer digits;
    String format;

    @Override
    public String name() {
        return "connect";
    }

    @Override
    public String description() {
        return "Decaying family w ~ 1 - 2 lambda K0(2x) of PIII(0,0,1,-1): from lambda (at infinity) to sigma and B"
                + " of w ~ B x^sigma at 0, or from sigma back to lambda; numerically and from the closed form, each"
                + " with an error estimate.";
    }

    @Override
    public List<OptionGroup> groups() {
        return List.of(solver);
    }

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.value("--lambda", "L", "parameter at infinity, |lambda| < 1/pi"));
        o.addOption(OptionKinds.value("--sigma", "S", "exponent at 0, |sigma| < 1 (the other direction)"));
        o.addOption(OptionKinds.value("--x0", "X", "where (sigma, B) are fitted (default 1e-3)"));
        o.addOption(OptionKinds.value("--digits", "D",
                "also match in arbitrary precision with this many digits (slow: tens of seconds)"));
        o.addOption(OptionKinds.value("--format", "FMT", "csv (default) or text"));
    }

    @Override
    public void read(Arguments a) {
        lambda = a.text("--lambda");
        sigma = a.number("--sigma", "a number in (-1, 1)");
        x0 = a.has("--x0") ? a.number("--x0", null) : 1e-3;
        digits = a.integer("--digits", "an integer in [16, 100000]");
        format = a.choice("--format", "csv", "text");
    }

    @Override
    public int run(PrintWriter out, PrintWriter err) {
        if ((lambda == null) == (sigma == null)) {
            throw new InvalidInputException("--lambda", "give exactly one of --lambda (data at infinity) or --sigma"
                    + " (data at 0)");
        }
        List<String[]> rows = new ArrayList<>();
        if (lambda != null) {
            fromInfinity(rows);
        } else {
            double[] l = DecayingConnection.lambdaForSigma(sigma, x0, solver.settings());
            double closed = Math.sin(Math.PI * sigma / 2) / Math.PI;
            rows.add(row("lambda", "double", l[0], l[1], closed, 1e-16));
        }
        print(out, rows);
        return 0;
    }

    private void fromInfinity(List<String[]> rows) {
        double lam = EquationOptions.value("--lambda", lambda).getReal();
        McCoyTracyWu.requirePowerRange(lam, !(Math.abs(lam) < McCoyTracyWu.EDGE));
        ZeroFit.Result<Complex> r = DecayingConnection.zeroDataByEngine(lam, x0, solver.settings());
        double cs = McCoyTracyWu.sigma(lam);
        double cb = McCoyTracyWu.amplitude(lam);
        rows.add(row("sigma", "double", r.sigma().getReal(), r.errSigma(), cs, 2e-16 * Math.abs(cs)));
        rows.add(row("B", "double", r.amplitude().getReal(), r.errAmplitude(), cb, 2e-16 * Math.abs(cb)));
        if (digits != null) {
            if (digits < 16 || digits > 100000) {
                throw new InvalidInputException("digits", "must be in [16, 100000], got " + digits);
            }
            ApcomplexArithmetic ar = new ApcomplexArithmetic(digits + 6);
            ZeroFit.Result<Apcomplex> hp = DecayingConnection.zeroData(ar, ar.parse(lambda), Math.min(x0, 1e-4), 14);
            Apcomplex[] c = McCoyTracyWu.zeroData(lambda, digits);
            rows.add(new String[] {"sigma", digits + " digits", text(hp.sigma().real().precision(digits)),
                    String.format(Locale.ROOT, "%.2e", hp.errSigma()), text(c[0].real()), "1e-" + digits});
            rows.add(new String[] {"B", digits + " digits", text(hp.amplitude().real().precision(digits)),
                    String.format(Locale.ROOT, "%.2e", hp.errAmplitude()), text(c[1].real()), "1e-" + digits});
        }
    }

    private static String text(org.apfloat.Apfloat a) {
        return a.toString(true);
    }

    private static String[] row(String q, String prec, double num, double numErr, double closed, double closedErr) {
        return new String[] {q, prec, String.format(Locale.ROOT, "%.17g", num),
                String.format(Locale.ROOT, "%.2e", numErr), String.format(Locale.ROOT, "%.17g", closed),
                String.format(Locale.ROOT, "%.2e", closedErr)};
    }

    private void print(PrintWriter out, List<String[]> rows) {
        String[] head = {"quantity", "precision", "numerical", "numerical_err", "closed_form", "closed_form_err"};
        rows.add(0, head);
        if ("csv".equals(format)) {
            out.println("# decaying family of PIII(0,0,1,-1): w ~ 1 - 2 lambda K0(2x) at infinity, w ~ B x^sigma at 0;"
                    + " closed form of McCoy, Tracy and Wu (1977)");
            for (String[] r : rows) {
                out.println(String.join(",", r));
            }
        } else {
            int[] width = new int[head.length];
            for (String[] r : rows) {
                for (int i = 0; i < r.length; i++) {
                    width[i] = Math.max(width[i], r[i].length());
                }
            }
            for (String[] r : rows) {
                StringBuilder sb = new StringBuilder();
                for (int i = 0; i < r.length; i++) {
                    sb.append(String.format(Locale.ROOT, "%-" + (width[i] + 2) + "s", r[i]));
                }
                out.println(sb.toString().stripTrailing());
            }
        }
        out.flush();
    }
}
