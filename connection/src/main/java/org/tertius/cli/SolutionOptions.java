package org.tertius.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.cli.Options;
import org.tertius.core.InvalidInputException;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.hierarchy.MemberSolution;
import org.tertius.hierarchy.OriginSolution;

/**
 * Everything that fixes one solution: a Painleve III equation with start data or a family, or a member of the
 * hierarchy with its data (or a problem file), and the solver settings. Options that do not apply to the solution
 * chosen are refused, never ignored.
 */
public final class SolutionOptions implements OptionGroup {
    Path problem;
    final EquationOptions equation = new EquationOptions();
    final StartOptions start = new StartOptions();
    final SolverOptions solver = new SolverOptions();
    final FamilyOptions family = new FamilyOptions();
    final MemberOptions member = new MemberOptions();
    final MonodromyOptions monodromy = new MonodromyOptions();
    final SpecialOptions special = new SpecialOptions();
    private final List<OptionGroup> parts = List.of(equation, start, solver, family, member, monodromy, special);

    private ProblemFile file;

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.value("--problem", "FILE", "problem file (key = value lines); options win"));
        for (OptionGroup g : parts) {
            g.declare(o);
        }
    }

    @Override
    public void read(Arguments a) {
        problem = a.path("--problem");
        for (OptionGroup g : parts) {
            g.read(a);
        }
    }

    /** The problem file (read once). */
    ProblemFile file() {
        if (file == null) {
            file = ProblemFile.read(problem);
            equation.defaults(file);
            start.defaults(file);
            solver.defaults(file);
            family.defaults(file);
            member.defaults(file);
            special.defaults(file);
        }
        return file;
    }

    /** Whether the solution is a member of the hierarchy. */
    boolean isMember() {
        file();
        return member.given();
    }

    /** The solution the options describe, as the command line sees every solution. */
    ComputedSolution solution() {
        file();
        if (member.given()) {
            return memberSolution();
        }
        refuse("without --member (they set a hierarchy member)", member.optionsGiven());
        refuse("without --member (monodromy data select a hierarchy member)", monodromy.optionsGiven());
        if (special.given()) {
            List<String> given = painleveOptionsGiven();
            given.removeAll(List.of("--alpha", "--beta", "--gamma", "--delta"));
            refuse("with --special (the special solution is fixed by it and the equation)", given);
            return special.solution(equation.texts());
        }
        refuse("without --special (they choose a special solution)", special.parametersGiven());
        return special.transform(painleve3(), equation.texts());
    }

    /** The hierarchy member the options describe (refused for a Painleve III solution). */
    MemberSolution memberSolution() {
        file();
        if (!member.given()) {
            throw new InvalidInputException("--member", "a hierarchy member is required here");
        }
        refuseForMember();
        return monodromy.given() ? monodromy.solution(member, solver.settings()) : member.solution(solver.settings());
    }

    private void refuseForMember() {
        refuse("with --member (a hierarchy member is fixed by --times --s --m and --x0 --state or --origin)",
                painleveOptionsGiven());
        refuse("with --member (special solutions and Backlund maps are Painleve III's)", special.optionsGiven());
    }

    /** The member's solution over the plane of (x, t_n) when it was started at x = t_n = 0, else null. */
    OriginSolution memberPlane() {
        file();
        if (!member.given()) {
            return null;
        }
        refuseForMember();
        return member.originSolution(solver.settings());
    }

    /** The Painleve III solution the options describe (refused for a hierarchy member). */
    Painleve3Solution painleve3() {
        file();
        if (member.given()) {
            throw new InvalidInputException("--member", "this command works on Painleve III solutions only");
        }
        Painleve3 eq = equationValue();
        if (family.given()) {
            if (start.given()) {
                throw new InvalidInputException("--family", "give either --family with its parameters or start data"
                        + " --z0 --w0 --dw0, not both");
            }
            return family.solution(eq, solver.settings());
        }
        refuse("without --family (they are parameters of a family)", family.parametersGiven());
        if (!start.given()) {
            throw new InvalidInputException("--z0", "start data are required: give --z0, --w0 and --dw0"
                    + " (or a --problem file with z0, w0, dw0)");
        }
        Painleve3Solution.Builder b = Painleve3Solution.builder(eq).settings(solver.settings())
                .start(ExactText.parse("--z0", start.z0), ExactText.parse("--w0", start.w0),
                        ExactText.parse("--dw0", start.dw0));
        return b.thirdDerivativeAtZero(start.d3w0()).build();
    }

    /** The equation from the four parameters, kept exact. */
    Painleve3 equationValue() {
        file();
        String[] t = equation.texts();
        String[] names = {"--alpha", "--beta", "--gamma", "--delta"};
        ExactNumber[] p = new ExactNumber[4];
        for (int i = 0; i < 4; i++) {
            p[i] = ExactText.parse(names[i], t[i]);
        }
        return Painleve3.of(p[0], p[1], p[2], p[3]);
    }

    /** Every option of the solution given (equation, start data, family, member), for commands that need fewer. */
    List<String> optionsGiven() {
        List<String> out = painleveOptionsGiven();
        out.addAll(member.given() ? List.of("--member") : List.of());
        out.addAll(member.optionsGiven());
        return out;
    }

    private List<String> painleveOptionsGiven() {
        List<String> out = new ArrayList<>();
        String[] names = {"--alpha", "--beta", "--gamma", "--delta", "--z0", "--w0", "--dw0", "--d3w0", "--family"};
        String[] texts = equation.texts();
        String[] values = {texts[0], texts[1], texts[2], texts[3], start.z0, start.w0, start.dw0, start.d3w0,
            family.family};
        for (int i = 0; i < names.length; i++) {
            if (values[i] != null) {
                out.add(names[i]);
            }
        }
        out.addAll(family.parametersGiven());
        return out;
    }

    private static void refuse(String why, List<String> given) {
        if (!given.isEmpty()) {
            throw new InvalidInputException(given.get(0), "does not apply " + why + "; remove "
                    + String.join(", ", given));
        }
    }

    /** What building the solution found out (a selection by monodromy data), one line each. */
    List<String> notes() {
        return monodromy.notes();
    }

    /** The comment lines followed by the notes. */
    List<String> withNotes(List<String> comments) {
        List<String> all = new ArrayList<>(comments);
        all.addAll(notes());
        return all;
    }

    /** A canonical one-line description of the problem (for table signatures). */
    String describe() {
        file();
        if (member.given()) {
            return member.describe() + monodromy.describe() + " tol=" + solver.settings().tolerance() + " order="
                    + solver.settings().order();
        }
        String[] eq = equation.texts();
        return "alpha=" + eq[0] + " beta=" + eq[1] + " gamma=" + eq[2] + " delta=" + eq[3]
                + (family.given() ? " family=" + family.describe() : "") + " z0=" + start.z0
                + " w0=" + start.w0 + " dw0=" + start.dw0 + (start.d3w0 == null ? "" : " d3w0=" + start.d3w0)
                + special.describe() + " tol=" + solver.settings().tolerance() + " order=" + solver.settings().order();
    }

    /** --sheet from the option or the problem file (default 0). */
    int sheet(Integer option) {
        if (option != null) {
            return option;
        }
        ProblemFile f = file();
        return f.has("sheet") ? f.intValue("sheet") : 0;
    }
}
