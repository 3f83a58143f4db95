package org.tertius.bench;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.region.Grid;
import org.tertius.core.region.RegionSettings;

/**
 * The benchmark scenario shared by every figure: the generic D6 solution of Painleve III with alpha = 1,
 * beta = -1/2, gamma = 1, delta = -1 and w(1) = 1/2, w'(1) = 1/3 (default solver settings).
 */
public final class Scenario {
    public static final Painleve3 EQUATION = Painleve3.of(1, -0.5, 1, -1);
    public static final Complex Z0 = new Complex(1);
    public static final Complex W0 = new Complex(0.5);
    public static final Complex DW0 = new Complex(1.0 / 3.0);

    /** A target at distance 10 from z0 through the pole field (sheet 0). */
    public static final SurfacePoint FAR_TARGET = SurfacePoint.of(7, 8);
    /** w and w' at {@link #FAR_TARGET}, 36 digits, from the project's independent reference data. */
    public static final Complex FAR_W = new Complex(0.7717261223100424831483539, -0.4241171853003267699544849);
    public static final Complex FAR_DW = new Complex(0.1698811990298146938656134, -0.6275109846950608977925675);

    /** End of the real pole-free segment [1, 2] used for the side-by-side comparison. */
    public static final double SEGMENT_END = 2.0;

    private Scenario() {
    }

    /** A fresh solution (its path tree holds only the start node). */
    public static Painleve3Solution fresh() {
        return Painleve3Solution.builder(EQUATION).start(Z0, W0, DW0).build();
    }

    /**
     * The 100-point path through the pole field: z_k = 1 + (6 + 8i) (k + 1) / 100, k = 0..99, sheet 0 (the
     * segment from near z0 to 7 + 8i, through the poles between).
     */
    public static List<SurfacePoint> path() {
        List<SurfacePoint> out = new ArrayList<>(100);
        for (int k = 0; k < 100; k++) {
            double t = (k + 1) / 100.0;
            out.add(SurfacePoint.of(1 + 6 * t, 8 * t, 0));
        }
        return out;
    }

    /** The 401 x 401 grid over [-10, 10]^2 of sheet 0. */
    public static Grid grid() {
        return Grid.of(-10, 10, 401, -10, 10, 401, 0);
    }

    /** Region settings: estimated error at most 1e-10, the given number of threads. */
    public static RegionSettings regionSettings(int threads) {
        return RegionSettings.builder().maxRelativeError(1e-10).threads(threads).build();
    }
}
