package org.tertius.tests.face;

import java.util.ArrayList;
import java.util.List;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.number.ExactNumber;
import org.tertius.hierarchy.HierarchyMember;
import org.tertius.hierarchy.MemberParameters;
import org.tertius.hierarchy.MemberSolution;

/** Members n >= 2 started at x = 0 (a regular point for them) from exact data with the diagonal completed exactly. */
final class MemberAtPointChecks {
    private MemberAtPointChecks() {
    }

    /** Member n with times t_2..t_n, s = 1, m = 0 and the off-diagonal entries given (diagonals completed). */
    static ComputedSolution member(int n, List<String> times, List<String> offDiagonal) {
        List<ExactNumber> t = new ArrayList<>();
        for (String s : times) {
            t.add(ExactNumber.parse("t", s));
        }
        MemberParameters p = MemberParameters.builder(n).times(t.toArray(new ExactNumber[0]))
                .s(ExactNumber.parse("s", "1").toComplex()).m(ExactNumber.parse("m", "0")).build();
        List<ExactNumber> state = new ArrayList<>();
        for (String s : offDiagonal) {
            state.add(ExactNumber.parse("a", s));
        }
        ExactNumber x0 = ExactNumber.parse("x0", "0");
        List<ExactNumber> full = HierarchyMember.of(n).completeDiagonalExactly(p, x0, state);
        return MemberSolution.builder(p).start(x0, full).build();
    }
}
