package org.tertius.hierarchy;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.BooleanSupplier;
import org.hipparchus.complex.Complex;
import org.tertius.core.UnreachableTargetException;

/**
 * The rows of a {@link PlaneGrid}: the shared data (states on x = 0, member 1 along the real axis) made once,
 * in a fixed order, by {@link #prepare}; then each row independently (thread-safe). Package-private.
 */
final class GridRows {
    /** A small-time series value is kept when its error estimate is below this times 1 + |q|. */
    private static final double SERIES_ACCEPT = 1e-10;
    private final OriginSolution solution;
    private final HierarchyMember member;
    private final double[] x;
    private final double[] t;
    private final double tolerance;
    private final double stepLimit;
    private final BooleanSupplier halt;
    private final Map<Integer, Complex[]> axisState = new HashMap<>();
    private final Map<Integer, double[]> axisError = new HashMap<>();
    private final Map<Integer, Boolean> smallTime = new HashMap<>();
    private MemberLine memberOne;

    GridRows(OriginSolution solution, double[] x, double[] t, double tolerance, double stepLimit, BooleanSupplier halt) {
        this.solution = solution;
        this.member = solution.member();
        this.x = x;
        this.t = t;
        this.tolerance = tolerance;
        this.stepLimit = stepLimit;
        this.halt = halt;
    }

    /** States on x = 0 for every row t != 0 (in increasing |t|), and member 1 along the axis if needed. */
    void prepare(List<Integer> rows) {
        List<Integer> sorted = new ArrayList<>(rows);
        sorted.sort(Comparator.comparingDouble(i -> Math.abs(t[i])));
        double reach = 0;
        for (double v : x) {
            reach = Math.max(reach, Math.abs(v));
        }
        boolean needMemberOne = false;
        for (int i : sorted) {
            if (t[i] == 0) {
                needMemberOne = true;
                continue;
            }
            // the x-flow of member 2 oscillates like exp(i x^2 / (2 t)): about x^2 / (20 |t|) Taylor steps
            boolean small = member.order() == 2 && reach * reach / (20 * Math.abs(t[i])) > stepLimit;
            smallTime.put(i, small);
            needMemberOne |= small;
            List<Complex> state = new ArrayList<>();
            double[] err = solution.stateOnTheAxis(new Complex(t[i]), state);
            axisState.put(i, state.toArray(new Complex[0]));
            axisError.put(i, err);
        }
        if (needMemberOne) {
            memberOne = new MemberLine(solution.memberOne(), x, tolerance, halt);
        }
    }

    /** Computes the given columns of row i; returns how. */
    String row(int i, int[] cols, double[] re, double[] im, double[] err) {
        if (t[i] == 0) {
            for (int j : cols) {
                put(memberOne.potential(x[j]), j, re, im, err);
            }
            return "member 1";
        }
        if (smallTime.get(i)) {
            NlsTimeSeries series = new NlsTimeSeries(solution.memberOne().parameters());
            Complex time = new Complex(t[i]);
            List<Integer> close = new ArrayList<>();
            for (int j : cols) {
                PotentialValue v;
                if (x[j] == 0) {
                    v = solution.axisPotential(time);
                } else {
                    MemberLine.StateAt m1 = memberOne.value(x[j]);
                    v = series.at(new Complex(x[j]), m1.state(), m1.errors(), time, 0.5 * Math.abs(x[j]));
                }
                put(v, j, re, im, err);
                if (!(v.error() <= SERIES_ACCEPT * (1 + v.q().norm()))) {
                    close.add(j);
                }
            }
            // near x = 0 (x^2 of the order of |t|) the series converges slowly; there the line is short
            if (!close.isEmpty()) {
                lines(i, close.stream().mapToInt(Integer::intValue).toArray(), re, im, err);
            }
            return "small-time series";
        }
        try {
            lines(i, cols, re, im, err);
            return "line";
        } catch (UnreachableTargetException e) {
            MemberSolution tree = solution.atTime(new Complex(t[i]));
            for (int j : cols) {
                put(tree.potential(new Complex(x[j])), j, re, im, err);
            }
            return "path tree";
        }
    }

    private void lines(int i, int[] cols, double[] re, double[] im, double[] err) {
        double right = 0;
        double left = 0;
        for (int j : cols) {
            right = Math.max(right, x[j]);
            left = Math.max(left, -x[j]);
        }
        RealRow row = RealRow.of(solution, new Complex(t[i]), axisState.get(i), axisError.get(i), left, right,
                tolerance, halt, false);
        for (int j : cols) {
            put(row.potential(x[j]), j, re, im, err);
        }
    }

    private static void put(PotentialValue v, int j, double[] re, double[] im, double[] err) {
        re[j] = v.q().getReal();
        im[j] = v.q().getImaginary();
        err[j] = v.error();
    }
}
