package org.tertius.core.region;

import org.hipparchus.complex.Complex;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3Value;

/**
 * Values of a solution on a {@link Grid}: w, w' and the error estimate (the larger of the absolute errors of w
 * and w') at every point, row-major (index j * nx + i); NaN values and an infinite error mark points that could
 * not be computed (or z = 0). Immutable after construction.
 */
public final class GridResult {
    private final Grid grid;
    private final double[] wRe;
    private final double[] wIm;
    private final double[] dwRe;
    private final double[] dwIm;
    private final double[] err;
    private final RegionStatistics statistics;

    GridResult(Grid grid, double[] wRe, double[] wIm, double[] dwRe, double[] dwIm, double[] err,
               RegionStatistics statistics) {
        this.grid = grid;
        this.wRe = wRe;
        this.wIm = wIm;
        this.dwRe = dwRe;
        this.dwIm = dwIm;
        this.err = err;
        this.statistics = statistics;
    }

    public Grid grid() {
        return grid;
    }

    public RegionStatistics statistics() {
        return statistics;
    }

    public boolean computed(int i, int j) {
        return Double.isFinite(err[j * grid.nx() + i]);
    }

    public Complex w(int i, int j) {
        int k = j * grid.nx() + i;
        return new Complex(wRe[k], wIm[k]);
    }

    public Complex dw(int i, int j) {
        int k = j * grid.nx() + i;
        return new Complex(dwRe[k], dwIm[k]);
    }

    public double error(int i, int j) {
        return err[j * grid.nx() + i];
    }

    /** The value at (i, j) as a value object (errors: both set to the grid error). */
    public Painleve3Value value(int i, int j) {
        SurfacePoint p = grid.point(i, j);
        return new Painleve3Value(p, w(i, j), dw(i, j), error(i, j), error(i, j));
    }

    /** The largest error estimate relative to 1 + |w| over the computed points. */
    public double maxRelativeError() {
        double m = 0;
        for (int k = 0; k < err.length; k++) {
            if (Double.isFinite(err[k])) {
                m = Math.max(m, err[k] / (1 + org.tertius.core.number.Cx.abs(wRe[k], wIm[k])));
            }
        }
        return m;
    }
}
