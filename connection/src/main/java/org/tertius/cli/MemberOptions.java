package org.tertius.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.cli.Options;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ComplexText;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.step.SolverSettings;
import org.tertius.hierarchy.HierarchyMember;
import org.tertius.hierarchy.MemberParameters;
import org.tertius.hierarchy.MemberSolution;
import org.tertius.hierarchy.MemberValue;

/** A member of the Painleve III hierarchy and its start data (see hierarchy/README.md for the convention). */
public final class MemberOptions implements OptionGroup {
    static final String HEADER = "x_re,x_im,sheet,q_re,q_im,r_re,r_im,dq_re,dq_im,dr_re,dr_im,err,integrals";

    Integer member;
    String times;
    String s;
    String m;
    String x0;
    String state;
    String origin;

    @Override
    public void declare(Options o) {
        o.addOption(Opts.value("--member", "N", "integrate member N of the hierarchy instead of PIII"));
        o.addOption(Opts.value("--times", "T2,..,TN", "the times t_2..t_N (complex, t_N != 0)"));
        o.addOption(Opts.value("--s", "S", "the constant s of the phase (det a_{-2} = s^2)"));
        o.addOption(Opts.value("--m", "M", "the constant m of a_{-1}"));
        o.addOption(Opts.value("--x0", "X", "start point x0 (x0 != 0 for member 1)"));
        o.addOption(Opts.value("--state", "V,..", "start state: the unknowns in the order of"
                + " 'tertius describe --member N'"));
        o.addOption(Opts.value("--origin", "A11,A12,A21",
                "member 1 only: start at x = 0 on the solution analytic there, with a_{-2} = this"));
    }

    @Override
    public void read(Arguments a) {
        member = a.integer("--member", "an integer in [1, " + HierarchyMember.MAX_ORDER + "]");
        times = a.text("--times");
        s = a.text("--s");
        m = a.text("--m");
        x0 = a.text("--x0");
        state = a.text("--state");
        origin = a.text("--origin");
    }

    boolean given() {
        return member != null;
    }

    void defaults(ProblemFile f) {
        if (member == null && f.has("member")) {
            member = f.intValue("member");
        }
        times = f.fill(times, "times");
        s = f.fill(s, "s");
        m = f.fill(m, "m");
        x0 = f.fill(x0, "x0");
        state = f.fill(state, "state");
    }

    static List<Complex> list(String option, String text) {
        List<Complex> out = new ArrayList<>();
        if (text == null || text.isBlank()) {
            return out;
        }
        for (String part : text.split(",")) {
            out.add(ComplexText.parse(option, part));
        }
        return out;
    }

    MemberParameters parameters() {
        if (member < 1 || member > HierarchyMember.MAX_ORDER) {
            throw new InvalidInputException("--member", "must be in [1, " + HierarchyMember.MAX_ORDER + "], got " + member);
        }
        MemberParameters.Builder b = MemberParameters.builder(member)
                .times(list("--times", times).toArray(new Complex[0]));
        if (s != null) {
            b.s(ComplexText.parse("--s", s));
        }
        if (m != null) {
            b.m(ComplexText.parse("--m", m));
        }
        return b.build();
    }

    MemberSolution solution(SolverSettings settings) {
        MemberSolution.Builder b = MemberSolution.builder(parameters()).settings(settings);
        if (origin != null) {
            List<Complex> a = list("--origin", origin);
            if (a.size() != 3) {
                throw new InvalidInputException("--origin", "expected three complex numbers A11,A12,A21");
            }
            b.startAtOrigin(a.get(0), a.get(1), a.get(2));
        } else {
            if (x0 == null || state == null) {
                throw new InvalidInputException("--state", "start data are required: --x0 X --state V1,..,Vk (or --origin"
                        + " for member 1)");
            }
            b.start(ComplexText.parse("--x0", x0), list("--state", state));
        }
        return b.build();
    }

    static String row(MemberValue v) {
        double err = Math.max(Math.max(v.errorQ(), v.errorR()), Math.max(v.errorDq(), v.errorDr()));
        return String.format(Locale.ROOT, "%.17g,%.17g,%d,%.17g,%.17g,%.17g,%.17g,%.17g,%.17g,%.17g,%.17g,%.3e,%s",
                v.x().getReal(), v.x().getImaginary(), v.sheet(), v.q().getReal(), v.q().getImaginary(),
                v.r().getReal(), v.r().getImaginary(), v.dq().getReal(), v.dq().getImaginary(), v.dr().getReal(),
                v.dr().getImaginary(), err, v.integralsWithinEstimate() ? "ok" : "drift");
    }

    static String unreachedRow(SurfacePoint p) {
        return String.format(Locale.ROOT, "%.17g,%.17g,%d,nan,nan,nan,nan,nan,nan,nan,nan,inf,", p.re(), p.im(), p.sheet());
    }
}
