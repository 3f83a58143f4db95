package org.tertius.core.solution;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.BiFunction;
import org.hipparchus.complex.Complex;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.step.SolverSettings;

/** The engine behind the demo solution of the README (a scenario of our own), and helpers of the tests. */
final class DemoSolutions {
    private DemoSolutions() {
    }

    /** A fresh engine solution of PIII(1, -1/2, 1, -1) with w(1) = 1/2, w'(1) = 1/3 (Hamiltonian form). */
    static Solution demo(SolverSettings settings) {
        Painleve3Solution s = Painleve3Solution.builder(Painleve3.of(1, -0.5, 1, -1))
                .start(Complex.ONE, new Complex(0.5), new Complex(1.0 / 3)).settings(settings).build();
        return s.engineReading().orElseThrow().tree();
    }

    static Solution demo() {
        return demo(SolverSettings.defaults());
    }

    /** Random points of the principal sheet with 0.2 <= |z| <= 8, as tau = log z (re, im). */
    static List<double[]> randomPoints(Random rnd, int count) {
        List<double[]> out = new ArrayList<>();
        for (int k = 0; k < count; k++) {
            double r = 0.2 + 7.8 * rnd.nextDouble();
            double t = Math.PI * (2 * rnd.nextDouble() - 1);
            SurfacePoint p = SurfacePoint.of(r * Math.cos(t), r * Math.sin(t), 0);
            out.add(new double[] {p.logRe(), p.logIm()});
        }
        return out;
    }

    /**
     * The outcome of each evaluation in the order of {@code points}, computed in the order {@code order} on
     * {@code threads} threads: the bits of every value and error, or the class and message of the refusal.
     */
    static List<String> outcomes(List<double[]> points, int[] order, int threads,
                                 BiFunction<Double, Double, StateEstimate> evaluation) {
        ExecutorService pool = Executors.newFixedThreadPool(threads);
        try {
            List<Future<String>> futures = new ArrayList<>();
            for (int k = 0; k < points.size(); k++) {
                futures.add(null);
            }
            for (int k : order) {
                double[] p = points.get(k);
                futures.set(k, pool.submit(() -> outcome(evaluation, p[0], p[1])));
            }
            List<String> out = new ArrayList<>();
            for (Future<String> f : futures) {
                out.add(f.get());
            }
            return out;
        } catch (InterruptedException | ExecutionException e) {
            throw new IllegalStateException(e);
        } finally {
            pool.shutdownNow();
        }
    }

    private static String outcome(BiFunction<Double, Double, StateEstimate> evaluation, double re, double im) {
        try {
            StateEstimate e = evaluation.apply(re, im);
            StringBuilder b = new StringBuilder();
            for (int i = 0; i < e.dimension(); i++) {
                b.append(Long.toHexString(Double.doubleToRawLongBits(e.re(i)))).append(' ')
                        .append(Long.toHexString(Double.doubleToRawLongBits(e.im(i)))).append(' ')
                        .append(Long.toHexString(Double.doubleToRawLongBits(e.error(i)))).append(';');
            }
            return b.toString();
        } catch (RuntimeException refused) {
            return refused.getClass().getSimpleName() + ": " + refused.getMessage();
        }
    }

    /** A random permutation of 0..n-1. */
    static int[] permutation(Random rnd, int n) {
        int[] p = new int[n];
        for (int i = 0; i < n; i++) {
            p[i] = i;
        }
        for (int i = n - 1; i > 0; i--) {
            int j = rnd.nextInt(i + 1);
            int t = p[i];
            p[i] = p[j];
            p[j] = t;
        }
        return p;
    }
}
