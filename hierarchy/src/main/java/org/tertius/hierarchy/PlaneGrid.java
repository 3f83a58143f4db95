package org.tertius.hierarchy;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.CompletionService;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorCompletionService;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.function.BooleanSupplier;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.TertiusException;

/**
 * q of an {@link OriginSolution} over a grid of real x and real t_n (the physical plane of member 2: X and T of
 * focusing NLS), rows of fixed t_n computed in parallel. Each row starts from the state on x = 0 at its t_n (all
 * computed first, one after the other, so that the result does not depend on the number of threads) and runs
 * the x-flow outwards along the real axis by {@link TaylorLine}; the row t_n = 0 is member 1's; rows where the
 * x-flow would need too many steps (|t_2| tiny: its fast modes exp(i x^2 / (2 t_2))) use {@link NlsTimeSeries}
 * from member 1; a row whose line meets a singularity falls back to the core engine's path tree.
 *
 * <p>Symmetries (derived in hierarchy/README.md; used only when the data satisfy them exactly): a11 = 0 gives
 * q(x, t) = q(-x, (-1)^n t); a_-2(0) purely imaginary and m real give q(x, t) = conj q(x, (-1)^(n+1) t). A point
 * whose image under them is another grid point of a larger (t, x) is copied from it. Immutable; {@link #compute}
 * may run several times.
 */
public final class PlaneGrid {
    /** Receives the number of rows done after each row (called from the thread that runs compute). */
    public interface Progress {
        void rowsDone(int done, int total);
    }

    /** Steps of one row's line beyond which a member-2 row is summed by the small-time series instead. */
    private static final double LINE_STEP_LIMIT = 4000;

    private final OriginSolution solution;
    private final double[] x;
    private final double[] t;
    private final GridSymmetry symmetry;
    private final double tolerance;

    private PlaneGrid(OriginSolution solution, double[] x, double[] t, double tolerance) {
        this.solution = solution;
        this.x = x.clone();
        this.t = t.clone();
        this.symmetry = GridSymmetry.of(solution, this.x, this.t);
        this.tolerance = tolerance;
    }

    /**
     * @param solution the solution
     * @param x the abscissae (finite)
     * @param t the times t_n (finite)
     */
    public static PlaneGrid of(OriginSolution solution, double[] x, double[] t) {
        if (solution == null) {
            throw new InvalidInputException("solution", "is required");
        }
        check("x", x);
        check("times", t);
        return new PlaneGrid(solution, x, t, 1e-14);
    }

    /** As {@link #of(OriginSolution, double[], double[])} with times given as complex numbers, which must be real. */
    public static PlaneGrid of(OriginSolution solution, double[] x, Complex[] t) {
        double[] real = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            if (t[i] == null || t[i].getImaginary() != 0) {
                throw new InvalidInputException("times", "the physical-plane grid takes real times t_n only (got "
                        + t[i] + "); for complex t_n evaluate OriginSolution.atTime point by point");
            }
            real[i] = t[i].getReal();
        }
        return of(solution, x, real);
    }

    private static void check(String name, double[] v) {
        if (v == null || v.length == 0) {
            throw new InvalidInputException(name, "at least one value is required");
        }
        for (double d : v) {
            if (!Double.isFinite(d)) {
                throw new InvalidInputException(name, "values must be finite real numbers, got " + d);
            }
        }
    }

    /** The same grid with another accepted truncation error per Taylor step (relative; default 1e-14). */
    public PlaneGrid tolerance(double tol) {
        if (!(tol >= 1e-16 && tol <= 1e-6)) {
            throw new InvalidInputException("tolerance", "must lie in [1e-16, 1e-6], got " + tol);
        }
        return new PlaneGrid(solution, x, t, tol);
    }

    /** The symmetries the data allow (empty if none). */
    public List<String> symmetries() {
        return symmetry.names();
    }

    /** How many rows are integrated (the others are copied by symmetry). */
    public int rowsToCompute() {
        return symmetry.computedRows().size();
    }

    /**
     * Computes the grid.
     *
     * @param threads worker threads (&gt;= 1); the values do not depend on it
     * @param progress called after each row, or null
     * @param cancelled polled between and within rows, or null; when it turns true (or the calling thread is
     *     interrupted) the computation stops with a {@link CancellationException}
     */
    public Result compute(int threads, Progress progress, BooleanSupplier cancelled) {
        if (threads < 1 || threads > 1024) {
            throw new InvalidInputException("threads", "must lie in [1, 1024], got " + threads);
        }
        AtomicBoolean stop = new AtomicBoolean();
        BooleanSupplier halt = () -> stop.get() || (cancelled != null && cancelled.getAsBoolean());
        List<Integer> rows = symmetry.computedRows();
        GridRows work = new GridRows(solution, x, t, tolerance, LINE_STEP_LIMIT, halt);
        work.prepare(rows);
        double[][] re = new double[t.length][x.length];
        double[][] im = new double[t.length][x.length];
        double[][] err = new double[t.length][x.length];
        String[] method = new String[t.length];
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread th = new Thread(r, "plane-grid");
            th.setDaemon(true);
            return th;
        });
        try {
            CompletionService<Integer> done = new ExecutorCompletionService<>(pool);
            List<Future<Integer>> futures = new ArrayList<>();
            for (int i : rows) {
                futures.add(done.submit(() -> {
                    method[i] = work.row(i, symmetry.columns(i), re[i], im[i], err[i]);
                    return i;
                }));
            }
            for (int k = 0; k < rows.size(); k++) {
                if (halt.getAsBoolean()) {
                    throw new CancellationException("grid cancelled");
                }
                done.take().get();
                if (progress != null) {
                    progress.rowsDone(k + 1, rows.size());
                }
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new CancellationException("grid interrupted");
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException) {
                throw (RuntimeException) e.getCause();
            }
            throw new TertiusException("grid row failed: " + e.getCause());
        } finally {
            stop.set(true);
            pool.shutdownNow();
        }
        symmetry.fill(re, im, err, method);
        return new Result(x, t, re, im, err, method, symmetry.names(), rows.size());
    }

    /** The computed grid: rows are times, columns abscissae. Immutable. */
    public static final class Result {
        private final double[] x;
        private final double[] t;
        private final double[][] re;
        private final double[][] im;
        private final double[][] error;
        private final String[] method;
        private final List<String> symmetries;
        private final int computedRows;

        Result(double[] x, double[] t, double[][] re, double[][] im, double[][] error, String[] method,
               List<String> symmetries, int computedRows) {
            this.x = x.clone();
            this.t = t.clone();
            this.re = re;
            this.im = im;
            this.error = error;
            this.method = method.clone();
            this.symmetries = List.copyOf(symmetries);
            this.computedRows = computedRows;
        }

        public double[] x() {
            return x.clone();
        }

        public double[] t() {
            return t.clone();
        }

        /** q at (x[col], t[row]). */
        public Complex q(int row, int col) {
            return new Complex(re[row][col], im[row][col]);
        }

        /** Its estimated absolute error. */
        public double error(int row, int col) {
            return error[row][col];
        }

        /** |q| as a new array [row][col]. */
        public double[][] modulus() {
            double[][] m = new double[t.length][x.length];
            for (int i = 0; i < t.length; i++) {
                for (int j = 0; j < x.length; j++) {
                    m[i][j] = Math.hypot(re[i][j], im[i][j]);
                }
            }
            return m;
        }

        /** How row i was obtained: "line", "member 1", "small-time series", "path tree" or "symmetry". */
        public String method(int row) {
            return method[row];
        }

        public List<String> symmetries() {
            return symmetries;
        }

        public int computedRows() {
            return computedRows;
        }

        /** The largest error estimate over the grid. */
        public double maxError() {
            double m = 0;
            for (double[] row : error) {
                for (double e : row) {
                    m = Math.max(m, e);
                }
            }
            return m;
        }
    }
}
