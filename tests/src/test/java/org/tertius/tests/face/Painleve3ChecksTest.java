package org.tertius.tests.face;

import org.tertius.core.face.ComputedSolution;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.region.Grid;

/** The suite on a generic D6 Painleve III solution (the demo scenario, data given exactly). */
class Painleve3ChecksTest extends ComputedSolutionChecks {
    static Painleve3Solution demo() {
        return Painleve3Solution.builder(Painleve3.exact("1", "-1/2", "1", "-1")).start("1", "1/2", "1/3").build();
    }

    @Override
    ComputedSolution fresh() {
        return demo();
    }

    @Override
    SurfacePoint target() {
        return SurfacePoint.of(2.5, 1.5);
    }

    @Override
    SurfacePoint detour() {
        return SurfacePoint.of(-1, 2.5);
    }

    @Override
    Grid region() {
        return Grid.of(-3, 0, 31, -2, 1, 31, 0);
    }

    @Override
    int digits() {
        return 25;
    }
}
