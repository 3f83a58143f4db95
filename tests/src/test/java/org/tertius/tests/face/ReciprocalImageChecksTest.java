package org.tertius.tests.face;

import org.tertius.core.face.ComputedSolution;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.region.Grid;

/** The suite on an image under a symmetry: 1/w of the demo solution, a solution of the reciprocal equation. */
class ReciprocalImageChecksTest extends ComputedSolutionChecks {
    @Override
    ComputedSolution fresh() {
        return Painleve3ChecksTest.demo().reciprocal();
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
