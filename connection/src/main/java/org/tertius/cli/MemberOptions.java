package org.tertius.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ComplexText;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.step.SolverSettings;
import org.tertius.hierarchy.HierarchyMember;
import org.tertius.hierarchy.MemberParameters;
import org.tertius.hierarchy.MemberSolution;
import org.tertius.hierarchy.MemberValue;
import picocli.CommandLine.Option;

/** A member of the Painleve III hierarchy and its start data (see hierarchy/README.md for the convention). */
public final class MemberOptions {
    static final String HEADER = "x_re,x_im,sheet,q_re,q_im,r_re,r_im,dq_re,dq_im,dr_re,dr_im,err,integrals";

    @Option(names = "--member", paramLabel = "N", description = "integrate member N of the hierarchy instead of PIII")
    Integer member;
    @Option(names = "--times", paramLabel = "T2,..,TN", description = "the times t_2..t_N (complex, t_N != 0)")
    String times;
    @Option(names = "--s", paramLabel = "S", description = "the constant s of the phase (det a_{-2} = s^2)")
    String s;
    @Option(names = "--m", paramLabel = "M", description = "the constant m of a_{-1}")
    String m;
    @Option(names = "--x0", paramLabel = "X", description = "start point x0 (x0 != 0 for member 1)")
    String x0;
    @Option(names = "--state", paramLabel = "V,..", description = "start state: the unknowns in the order of"
            + " 'tertius describe --member N'")
    String state;
    @Option(names = "--origin", paramLabel = "A11,A12,A21",
            description = "member 1 only: start at x = 0 on the solution analytic there, with a_{-2} = this")
    String origin;

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
