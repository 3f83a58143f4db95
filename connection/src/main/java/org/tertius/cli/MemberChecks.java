package org.tertius.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.cli.Options;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.face.InvariantCheck;
import org.tertius.core.face.SolutionValue;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.hierarchy.Member1Map;
import org.tertius.hierarchy.MemberSolution;
import org.tertius.hierarchy.NlsCheck;
import org.tertius.hierarchy.OriginSolution;

/**
 * What the library can check of a member solution, as extra columns of {@code eval}: the first integrals' values and
 * deviations (a value whose integrals drift beyond their estimates is an error, exit 3, unless --accept-drift), the
 * residual of focusing NLS of member 2 by central differences (NlsCheck), and the Painleve III solution of member 1
 * through its map (Member1Map: z = 4 sqrt(s x), hierarchy/README.md).
 */
final class MemberChecks implements OptionGroup {
    boolean integrals;
    boolean acceptDrift;
    Double residualStep;
    boolean painleve3;

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.flag("--integrals", "members: add the first integrals' values and deviations from"
                + " their start values as columns"));
        o.addOption(OptionKinds.flag("--accept-drift", "members: report first integrals that drift beyond their"
                + " estimates without exit status 3"));
        o.addOption(OptionKinds.value("--nls-residual", "H", "member 2 started at x = t_2 = 0: add the residual of"
                + " i q_t + q_xx/2 + |q|^2 q = 0 by central differences of step H in x and t_2 (0 < H <= 0.1)"));
        o.addOption(OptionKinds.flag("--painleve3", "member 1: add the Painleve III solution w(z) of its map,"
                + " z = 4 sqrt(s x), as columns z_re,z_im,zsheet,w_re,w_im,dw_re,dw_im,w_err"));
    }

    @Override
    public void read(Arguments a) {
        integrals = a.has("--integrals");
        acceptDrift = a.has("--accept-drift");
        residualStep = a.number("--nls-residual", "a step in (0, 0.1]");
        painleve3 = a.has("--painleve3");
    }

    /** Whether any check was asked for. */
    boolean given() {
        return integrals || acceptDrift || residualStep != null || painleve3;
    }

    /** Refuses the checks for a solution that is not a member, and those that do not apply to its member. */
    void check(SolutionOptions options) {
        if (!given()) {
            return;
        }
        if (!options.isMember()) {
            throw new InvalidInputException(first(), "applies to hierarchy members only (--member or --profile)");
        }
        if (residualStep != null && !(residualStep > 0 && residualStep <= 0.1)) {
            throw new InvalidInputException("--nls-residual", "the step must lie in (0, 0.1], got " + residualStep);
        }
    }

    private String first() {
        return integrals ? "--integrals" : acceptDrift ? "--accept-drift" : residualStep != null ? "--nls-residual"
                : "--painleve3";
    }

    /** The extra column names (after the value columns). */
    String columns(MemberSolution s) {
        StringBuilder b = new StringBuilder();
        if (integrals) {
            for (int k = 0; k < s.invariants().size(); k++) {
                b.append(",integral").append(k + 1).append("_re,integral").append(k + 1).append("_im,integral")
                        .append(k + 1).append("_deviation");
            }
        }
        if (residualStep != null) {
            b.append(",nls_residual,nls_scale");
        }
        if (painleve3) {
            b.append(",z_re,z_im,zsheet,w_re,w_im,dw_re,dw_im,w_err");
        }
        return b.toString();
    }

    /** Comment lines naming the integrals and the checks. */
    List<String> comments(MemberSolution s) {
        List<String> out = new ArrayList<>();
        if (integrals) {
            for (int k = 0; k < s.invariants().size(); k++) {
                out.add("integral" + (k + 1) + ": " + s.invariants().get(k));
            }
        }
        if (residualStep != null) {
            out.add("nls_residual: |i q_t + q_xx/2 + |q|^2 q| by central differences of step " + residualStep
                    + " (its size is O(step^2) times the derivatives); nls_scale: the size of its terms");
        }
        if (painleve3) {
            out.add("w(z): the Painleve III solution " + Member1Map.canonical(s.parameters().s())
                    .equation(s.parameters().m(), s.traceIntegral()) + " of the map z = 4 sqrt(s x)");
        }
        return out;
    }

    /** The extra columns at a point. */
    String row(MemberSolution s, OriginSolution plane, SurfacePoint p, SolutionValue v) {
        StringBuilder b = new StringBuilder();
        if (integrals) {
            for (InvariantCheck c : v.checks()) {
                b.append(String.format(Locale.ROOT, ",%.17g,%.17g,%.3e", c.value().getReal(), c.value().getImaginary(),
                        c.deviation()));
            }
        }
        if (residualStep != null) {
            b.append(residual(s, plane, p));
        }
        if (painleve3) {
            b.append(painleve3(s, p));
        }
        return b.toString();
    }

    private String residual(MemberSolution s, OriginSolution plane, SurfacePoint p) {
        if (plane == null || s.member().order() != 2 || p.im() != 0) {
            throw new InvalidInputException("--nls-residual", "needs member 2 started at x = t_2 = 0 (--origin or"
                    + " --profile) and real targets");
        }
        Complex t = s.member().order() == 2 ? s.parameters().time(2) : Complex.ZERO;
        NlsCheck.Residual r = NlsCheck.residual((x, tn) -> plane.evaluate(new Complex(x), new Complex(tn)).q(),
                p.re(), t.getReal(), residualStep, residualStep);
        return String.format(Locale.ROOT, ",%.3e,%.3e", r.value().norm(), r.scale());
    }

    private static String painleve3(MemberSolution s, SurfacePoint p) {
        if (s.member().order() != 1) {
            throw new InvalidInputException("--painleve3", "maps member 1 to Painleve III; this is member "
                    + s.member().order());
        }
        Member1Map map = Member1Map.canonical(s.parameters().s());
        Painleve3Value w = map.toPainleve3(s.evaluate(p));
        SurfacePoint z = w.point();
        return String.format(Locale.ROOT, ",%.17g,%.17g,%d,%.17g,%.17g,%.17g,%.17g,%.3e", z.re(), z.im(), z.sheet(),
                w.w().getReal(), w.w().getImaginary(), w.dw().getReal(), w.dw().getImaginary(),
                Math.max(w.errW(), w.errDw()));
    }
}
