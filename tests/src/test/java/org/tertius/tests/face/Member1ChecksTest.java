package org.tertius.tests.face;

import org.tertius.core.face.ComputedSolution;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.region.Grid;
import org.tertius.hierarchy.MemberParameters;
import org.tertius.hierarchy.MemberSolution;

/** The suite on member 1 started at its fixed singular point x = 0 (s = 1, m = 3/10, a_{-2}(0) = (0, i, i)). */
class Member1ChecksTest extends ComputedSolutionChecks {
    @Override
    ComputedSolution fresh() {
        MemberParameters p = MemberParameters.builder(1).s(ExactNumber.parse("s", "1").toComplex())
                .m(ExactNumber.parse("m", "3/10")).build();
        return MemberSolution.builder(p).startAtOrigin(ExactNumber.parse("a11", "0"), ExactNumber.parse("a12", "i"),
                ExactNumber.parse("a21", "i")).build();
    }

    @Override
    SurfacePoint target() {
        return SurfacePoint.of(1.5, 0.8);
    }

    @Override
    SurfacePoint detour() {
        return SurfacePoint.of(-0.5, 1.2);
    }

    @Override
    Grid region() {
        return Grid.of(1, 2, 31, 1.2, 2.2, 31, 0);
    }

    @Override
    int digits() {
        return 30;
    }
}
