package org.tertius.tests.face;

import java.util.List;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.region.Grid;

/** The suite on member 3 (t_2 = 0, t_3 = 1/3, s = 1, m = 0) started at x = 0. */
class Member3ChecksTest extends ComputedSolutionChecks {
    @Override
    ComputedSolution fresh() {
        return MemberAtPointChecks.member(3, List.of("0", "1/3"), List.of("0", "i", "i", "0", "1/3", "-1/5", "0", "1/2",
                "1/4", "0", "1/7", "2/7"));
    }

    @Override
    SurfacePoint target() {
        return SurfacePoint.planar(0.7, 0.2);
    }

    @Override
    SurfacePoint detour() {
        return SurfacePoint.planar(-0.4, -0.6);
    }

    @Override
    Grid region() {
        return Grid.of(0.8, 1.5, 29, 0, 0.8, 29, 0);
    }

    @Override
    int digits() {
        return 25;
    }
}
