package org.tertius.cli;

import java.io.PrintWriter;
import java.util.Locale;
import org.apache.commons.cli.Options;
import org.tertius.core.InvalidInputException;
import org.tertius.core.region.Grid;
import org.tertius.hierarchy.OriginSolution;
import org.tertius.hierarchy.PlaneGrid;

/**
 * {@code --plane X0:X1:NX,T0:T1:NT}: a grid over the physical plane of real x and real t_n of a member n &gt;= 2
 * started at x = t_n = 0 (for member 2 the (X, T) plane of focusing NLS), computed row by row in parallel, with
 * the symmetries the data allow. The coordinates are the doubles nearest to their exact values, as in a grid.
 */
final class PlaneOptions implements OptionGroup {
    String plane;

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.value("--plane", "X0:X1:NX,T0:T1:NT", "the physical plane of real x and real t_N of a"
                + " member N >= 2 started at x = t_N = 0 (--origin with t_2..t_{N-1} = 0, or --profile): NX values of x"
                + " and NT of t_N, e.g. -10:10:1000,-3:3:400"));
    }

    @Override
    public void read(Arguments a) {
        plane = a.text("--plane");
    }

    boolean given() {
        return plane != null;
    }

    /** The grid's coordinates (x along Re, t_n along Im). */
    Grid grid() {
        Grid g = Grid.parse("--plane", plane, 0);
        WorkLimits.checkRegion("--plane", g);
        return g;
    }

    /** The solution over the plane, refused for any other start. */
    static OriginSolution solution(SolutionOptions options) {
        if (!options.isMember()) {
            throw new InvalidInputException("--plane", "is the plane of a hierarchy member n >= 2 started at x = t_n ="
                    + " 0: give --member N --s S --origin A11,A12,A21 (or --profile nearfield)");
        }
        OriginSolution o = options.memberPlane();
        if (o == null) {
            throw new InvalidInputException("--plane", "needs a member n >= 2 started at x = t_n = 0 (--origin with"
                    + " t_2..t_{n-1} = 0, or --profile nearfield)");
        }
        return o;
    }

    /** Computes the plane's rows from row j0 on, with progress. */
    static PlaneGrid.Result compute(OriginSolution o, Grid g, int j0, Progress progress, PrintWriter err) {
        double[] x = new double[g.nx()];
        for (int i = 0; i < x.length; i++) {
            x[i] = g.re(i);
        }
        double[] t = new double[g.ny() - j0];
        for (int j = 0; j < t.length; j++) {
            t[j] = g.im(j0 + j);
        }
        PlaneGrid grid = PlaneGrid.of(o, x, t);
        int rows = grid.rowsToCompute();
        PlaneGrid.Result r = grid.compute(Runtime.getRuntime().availableProcessors(),
                (done, total) -> progress.update(done, total), null);
        err.println(String.format(Locale.ROOT, "tertius: %d x %d plane, %d rows integrated%s; largest error"
                + " estimate %.1e", x.length, t.length, rows, r.symmetries().isEmpty() ? ""
                : " (the others by symmetry: " + String.join("; ", r.symmetries()) + ")", r.maxError()));
        return r;
    }
}
