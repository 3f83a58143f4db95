package org.tertius.tests.face;

import java.util.List;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.region.Grid;

/** The suite on member 2 (t_2 = 1/2, s = 1, m = 0) started at x = 0. */
class Member2ChecksTest extends ComputedSolutionChecks {
    @Override
    ComputedSolution fresh() {
        return MemberAtPointChecks.member(2, List.of("1/2"), List.of("0", "i", "i", "0", "1/3", "-1/5", "0", "1/2",
                "1/4"));
    }

    @Override
    SurfacePoint target() {
        return SurfacePoint.planar(0.6, -0.3);
    }

    @Override
    SurfacePoint detour() {
        return SurfacePoint.planar(-0.5, 0.4);
    }

    @Override
    Grid region() {
        return Grid.of(-1.6, -0.8, 31, 0.3, 1.1, 31, 0);
    }

    @Override
    int digits() {
        return 25;
    }
}
