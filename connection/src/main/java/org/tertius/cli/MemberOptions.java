package org.tertius.cli;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.cli.Options;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.step.SolverSettings;
import org.tertius.hierarchy.HierarchyMember;
import org.tertius.hierarchy.MemberParameters;
import org.tertius.hierarchy.MemberSolution;
import org.tertius.hierarchy.MemberSolutionBuilder;
import org.tertius.hierarchy.OriginSolution;
import org.tertius.hierarchy.nls.NearFieldProfile;

/** A member of the Painleve III hierarchy and its start data (see hierarchy/README.md for the convention). */
public final class MemberOptions implements OptionGroup {
    /** The options of this group (for the refusal of options that do not apply). */
    static final List<String> OPTIONS = List.of("--times", "--s", "--m", "--x0", "--state", "--origin", "--profile",
            "--profile-phase");

    Integer member;
    String times;
    String s;
    String m;
    String x0;
    String state;
    String origin;
    String profile;
    String profilePhase;

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
                "start at x = 0 on the solution analytic there, with a_{-2}(0) = this (member 1; members N >= 2 at"
                        + " x = t_N = 0 with t_2..t_{N-1} = 0, carried to the given t_N)"));
        o.addOption(OptionKinds.value("--profile", "NAME", "a named solution: 'nearfield', the near-field profile of"
                + " focusing NLS (member 2, s = 2, m = 0, a_{-2}(0) = (0, 2i, 2i), Psi(0,0) = 4; --s S and"
                + " --profile-phase P give its relatives); --times T sets t_2 = T (default 0)"));
        o.addOption(OptionKinds.value("--profile-phase", "P", "the phase of a relative of the profile (real)"));
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
        profile = a.text("--profile");
        profilePhase = a.text("--profile-phase");
    }

    boolean given() {
        return member != null || profile != null;
    }

    /** The options of this group that were given (without --member). */
    List<String> optionsGiven() {
        List<String> out = new ArrayList<>();
        String[] values = {times, s, m, x0, state, origin, profile, profilePhase};
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
        profile = f.fill(profile, "profile");
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

    /**
     * The solution started at x = 0 of a member n &gt;= 2 (from --origin with the lower times zero, or --profile), over
     * the whole plane of (x, t_n); null for any other start.
     */
    OriginSolution originSolution(SolverSettings settings) {
        if (profile != null) {
            return profile(settings).solution();
        }
        if (origin == null || member == null || member < 2) {
            return null;
        }
        List<ExactNumber> a = originData();
        List<ExactNumber> t = ExactText.list("--times", times);
        for (int j = 0; j < t.size() - 1; j++) {
            if (!t.get(j).isZero()) {
                return null;
            }
        }
        return OriginSolution.create(member, parseS(), m == null ? ExactNumber.ofInteger(0) : ExactText.parse("--m", m),
                a.get(0), a.get(1), a.get(2), settings);
    }

    private NearFieldProfile profile(SolverSettings settings) {
        if (!NearFieldProfile.NAME.equals(profile)) {
            throw new InvalidInputException("--profile", "unknown profile '" + profile + "'; known: "
                    + NearFieldProfile.NAME);
        }
        for (String[] given : new String[][] {{"--origin", origin}, {"--state", state}, {"--x0", x0}, {"--m", m}}) {
            if (given[1] != null) {
                throw new InvalidInputException(given[0], "does not apply with --profile (the profile fixes its start"
                        + " data)");
            }
        }
        if (member != null && member != 2) {
            throw new InvalidInputException("--member", "the near-field profile is a solution of member 2, got "
                    + member);
        }
        ExactNumber scale = s == null ? ExactNumber.ofInteger(2) : ExactText.parse("--s", s);
        real("--s", scale);
        double phase = profilePhase == null ? 0 : real("--profile-phase", ExactText.parse("--profile-phase",
                profilePhase));
        return NearFieldProfile.of(scale, phase, settings);
    }

    private static double real(String option, ExactNumber x) {
        Complex c = x.toComplex();
        if (c.getImaginary() != 0) {
            throw new InvalidInputException(option, "must be real, got " + x);
        }
        return c.getReal();
    }

    private Complex parseS() {
        if (s == null) {
            throw new InvalidInputException("--s", "is required (det a_{-2} = s^2)");
        }
        return ExactText.parse("--s", s).toComplex();
    }

    private List<ExactNumber> originData() {
        List<ExactNumber> a = ExactText.list("--origin", origin);
        if (a.size() != 3) {
            throw new InvalidInputException("--origin", "expected three complex numbers A11,A12,A21");
        }
        return a;
    }

    /** The top time t_n given, exactly (0 when --times is absent for a profile). */
    private ExactNumber topTime() {
        List<ExactNumber> t = ExactText.list("--times", times);
        return t.isEmpty() ? ExactNumber.ofInteger(0) : t.get(t.size() - 1);
    }

    MemberSolution solution(SolverSettings settings) {
        OriginSolution plane = originSolution(settings);
        if (plane != null) {
            ExactNumber tn = topTime();
            // at t_n = 0 the member degenerates: there its solution is member 1's (same q, r)
            return tn.isZero() ? plane.memberOne() : plane.atTime(tn);
        }
        MemberSolutionBuilder b = MemberSolution.builder(parameters()).settings(settings);
        if (origin != null) {
            List<ExactNumber> a = originData();
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
                + " origin=" + origin + (profile == null ? "" : " profile=" + profile + " phase=" + profilePhase);
    }
}
