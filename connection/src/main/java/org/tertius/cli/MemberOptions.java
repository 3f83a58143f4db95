package org.tertius.cli;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.cli.Options;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.step.SolverSettings;
import org.tertius.hierarchy.HierarchyMember;
import org.tertius.hierarchy.MemberParameters;
import org.tertius.hierarchy.MemberSolution;

/** A member of the Painleve III hierarchy and its start data (see hierarchy/README.md for the convention). */
public final class MemberOptions implements OptionGroup {
    /** The options of this group (for the refusal of options that do not apply). */
    static final List<String> OPTIONS = List.of("--times", "--s", "--m", "--x0", "--state", "--origin");

    Integer member;
    String times;
    String s;
    String m;
    String x0;
    String state;
    String origin;

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.value("--member", "N", "integrate member N of the hierarchy instead of PIII"));
        o.addOption(OptionKinds.value("--times", "T2,..,TN", "the times t_2..t_N (complex, t_N != 0)"));
        o.addOption(OptionKinds.value("--s", "S", "the constant s of the phase (det a_{-2} = s^2)"));
        o.addOption(OptionKinds.value("--m", "M", "the constant m of a_{-1}"));
        o.addOption(OptionKinds.value("--x0", "X", "start point x0 (x0 != 0 for member 1)"));
        o.addOption(OptionKinds.value("--state", "V,..", "start state: the unknowns in the order of"
                + " 'tertius describe --member N'"));
        o.addOption(OptionKinds.value("--origin", "A11,A12,A21",
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

    /** The options of this group that were given (without --member). */
    List<String> optionsGiven() {
        List<String> out = new ArrayList<>();
        String[] values = {times, s, m, x0, state, origin};
        for (int i = 0; i < values.length; i++) {
            if (values[i] != null) {
                out.add(OPTIONS.get(i));
            }
        }
        return out;
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
        origin = f.fill(origin, "origin");
    }

    MemberParameters parameters() {
        if (member < 1 || member > HierarchyMember.MAX_ORDER) {
            throw new InvalidInputException("--member", "must be in [1, " + HierarchyMember.MAX_ORDER + "], got " + member);
        }
        MemberParameters.Builder b = MemberParameters.builder(member)
                .times(ExactText.list("--times", times).toArray(new ExactNumber[0]));
        if (s != null) {
            b.s(ExactText.parse("--s", s).toComplex());
        }
        if (m != null) {
            b.m(ExactText.parse("--m", m));
        }
        return b.build();
    }

    MemberSolution solution(SolverSettings settings) {
        MemberSolution.Builder b = MemberSolution.builder(parameters()).settings(settings);
        if (origin != null) {
            List<ExactNumber> a = ExactText.list("--origin", origin);
            if (a.size() != 3) {
                throw new InvalidInputException("--origin", "expected three complex numbers A11,A12,A21");
            }
            b.startAtOrigin(a.get(0), a.get(1), a.get(2));
        } else {
            if (x0 == null || state == null) {
                throw new InvalidInputException("--state", "start data are required: --x0 X --state V1,..,Vk (or --origin"
                        + " for member 1)");
            }
            b.start(ExactText.parse("--x0", x0), ExactText.list("--state", state));
        }
        return b.build();
    }

    /** The member problem in one line (for table signatures). */
    String describe() {
        return "member=" + member + " times=" + times + " s=" + s + " m=" + m + " x0=" + x0 + " state=" + state
                + " origin=" + origin;
    }
}
