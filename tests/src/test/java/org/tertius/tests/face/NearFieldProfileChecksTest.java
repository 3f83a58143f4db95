package org.tertius.tests.face;

import org.tertius.core.face.ComputedSolution;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.region.Grid;
import org.tertius.hierarchy.nls.NearFieldProfile;

/**
 * The suite on member 2 started at x = t_2 = 0 (the near-field profile, s = 2, m = 0, a_{-2}(0) = (0, 2i, 2i)) and
 * carried along the t_2-flow to t_2 = 1/2, beyond the disk of its t_2-series: the high-precision run carries the
 * state on x = 0 in arbitrary precision too.
 */
class NearFieldProfileChecksTest extends ComputedSolutionChecks {
    @Override
    ComputedSolution fresh() {
        return NearFieldProfile.standard().solution().atTime(ExactNumber.parse("t_2", "1/2"));
    }

    @Override
    SurfacePoint target() {
        return SurfacePoint.planar(0.9, 0.2);
    }

    @Override
    SurfacePoint detour() {
        return SurfacePoint.planar(-0.4, 0.7);
    }

    @Override
    Grid region() {
        return Grid.of(-1.3, -0.3, 31, 0.3, 1.3, 31, 0);
    }

    @Override
    int digits() {
        return 30;
    }
}
