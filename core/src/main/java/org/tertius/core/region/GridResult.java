package org.tertius.core.region;

import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.face.Coordinate;
import org.tertius.core.face.SolutionValue;
import org.tertius.core.number.ComplexPairs;
import org.tertius.core.number.SurfacePoint;

/**
 * Values of a solution on a {@link Grid}: every value of the solution (in the order of its value names) with its
 * error estimate at every point, row-major (index j * nx + i); NaN values and infinite errors mark points that could
 * not be computed. Immutable after construction.
 */
public final class GridResult {
    private final Grid grid;
    private final RegionTree tree;
    private final Coordinate coordinate;
    private final List<String> names;
    private final double[][] re;
    private final double[][] im;
    private final double[][] err;
    private final RegionStatistics statistics;

    GridResult(Grid grid, RegionTree tree, double[][] re, double[][] im, double[][] err, RegionStatistics statistics) {
        this.grid = grid;
        this.tree = tree;
        this.coordinate = tree.solution().coordinate();
        this.names = tree.solution().valueNames();
        this.re = re;
        this.im = im;
        this.err = err;
        this.statistics = statistics;
    }

    public Grid grid() {
        return grid;
    }

    /** The tree the values were read from (for the poles and zeros of the same region). */
    public RegionTree tree() {
        return tree;
    }

    /** The names of the values (those of the solution). */
    public List<String> names() {
        return names;
    }

    public RegionStatistics statistics() {
        return statistics;
    }

    public boolean computed(int i, int j) {
        return Double.isFinite(err[0][j * grid.nx() + i]);
    }

    /** Value v at (i, j). */
    public Complex value(int v, int i, int j) {
        int k = j * grid.nx() + i;
        return new Complex(re[v][k], im[v][k]);
    }

    /** The first value (drawn in pictures) at (i, j). */
    public Complex primary(int i, int j) {
        return value(0, i, j);
    }

    /** The largest error estimate of the values at (i, j). */
    public double error(int i, int j) {
        int k = j * grid.nx() + i;
        double m = 0;
        for (double[] e : err) {
            m = Math.max(m, e[k]);
        }
        return m;
    }

    /** The point (i, j) of the solution's surface. */
    public SurfacePoint point(int i, int j) {
        return grid.point(i, j, coordinate);
    }

    /** The values at (i, j) as a value object. */
    public SolutionValue value(int i, int j) {
        int k = j * grid.nx() + i;
        Complex[] v = new Complex[names.size()];
        double[] e = new double[names.size()];
        for (int n = 0; n < v.length; n++) {
            v[n] = new Complex(re[n][k], im[n][k]);
            e[n] = err[n][k];
        }
        return SolutionValue.of(point(i, j), v, e);
    }

    /** The largest error estimate (of any value) relative to 1 + |first value| over the computed points. */
    public double maxRelativeError() {
        double m = 0;
        for (int j = 0; j < grid.ny(); j++) {
            for (int i = 0; i < grid.nx(); i++) {
                int k = j * grid.nx() + i;
                if (computed(i, j)) {
                    m = Math.max(m, error(i, j) / (1 + ComplexPairs.abs(re[0][k], im[0][k])));
                }
            }
        }
        return m;
    }
}
