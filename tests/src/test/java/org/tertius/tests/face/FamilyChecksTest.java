package org.tertius.tests.face;

import java.util.Map;
import org.tertius.connection.family.Families;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.region.Grid;
import org.tertius.core.step.SolverSettings;

/**
 * The suite on a family from connection data: the power family w ~ B z^sigma at 0 (sigma = 3/10, B = 6/5) of the
 * demo equation. Its start data are computed from a series in double precision, so the replay to many digits is
 * refused.
 */
class FamilyChecksTest extends ComputedSolutionChecks {
    @Override
    ComputedSolution fresh() {
        return Families.create(Painleve3.of(1, -0.5, 1, -1), "power", Map.of("sigma", "0.3", "B", "1.2"),
                SolverSettings.defaults());
    }

    @Override
    SurfacePoint target() {
        return SurfacePoint.of(1.5, 1);
    }

    @Override
    SurfacePoint detour() {
        return SurfacePoint.of(-0.8, 1.2);
    }

    @Override
    Grid region() {
        return Grid.of(1, 3, 31, -1, 1, 31, 0);
    }

    @Override
    int digits() {
        return 0;
    }
}
