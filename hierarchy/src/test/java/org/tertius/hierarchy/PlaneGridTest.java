package org.tertius.hierarchy;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.atomic.AtomicBoolean;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.core.step.SolverSettings;

/** The physical-plane grid: thread-count independence, the symmetries, progress and cancellation. */
class PlaneGridTest {
    private static double[] range(double from, double to, int n) {
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = from + (to - from) * i / (n - 1);
        }
        return v;
    }

    @Test
    void valuesDoNotDependOnTheNumberOfThreads() {
        double[] x = range(-6, 6, 61);
        double[] t = range(-1.5, 1.5, 21);
        PlaneGrid.Result one = PlaneGrid.of(OriginSolutionTest.profile(), x, t).compute(1, null, null);
        PlaneGrid.Result three = PlaneGrid.of(OriginSolutionTest.profile(), x, t).compute(3, null, null);
        for (int i = 0; i < t.length; i++) {
            double[] a = new double[3 * x.length];
            double[] b = new double[3 * x.length];
            for (int j = 0; j < x.length; j++) {
                a[3 * j] = one.q(i, j).getReal();
                a[3 * j + 1] = one.q(i, j).getImaginary();
                a[3 * j + 2] = one.error(i, j);
                b[3 * j] = three.q(i, j).getReal();
                b[3 * j + 1] = three.q(i, j).getImaginary();
                b[3 * j + 2] = three.error(i, j);
            }
            assertArrayEquals(a, b, 0.0, "row " + i);
        }
        // both symmetries of the profile: a quarter of the plane (rows t >= 0, including t = 0) is computed
        assertEquals(2, one.symmetries().size(), one.symmetries().toString());
        assertEquals(11, one.computedRows());
        assertEquals(4.0, one.q(10, 30).getReal(), 1e-15);
        assertTrue(one.maxError() < 1e-10, "max error " + one.maxError());
    }

    @Test
    void theProfileIsEvenInXAndConjugatedByTimeReversal() {
        // derived in hierarchy/README.md: a11 = 0 gives q(x, t) = q(-x, t); imaginary a_-2(0) and real m give
        // q(x, t) = conj q(x, -t). Checked on values computed independently (rows started from x = 0 at +-t)
        OriginSolution o = OriginSolutionTest.profile();
        for (double t : new double[] {0.4, 1.3}) {
            RealRow plus = RealRow.of(o, new Complex(t), 5, 5, 1e-14, null);
            RealRow minus = RealRow.of(o, new Complex(-t), 5, 5, 1e-14, null);
            for (double x : new double[] {0.7, 2.3, 5}) {
                PotentialValue a = plus.potential(x);
                PotentialValue b = plus.potential(-x);
                PotentialValue c = minus.potential(x);
                assertTrue(a.q().subtract(b.q()).norm() <= a.error() + b.error(), "parity at " + x + ", " + t);
                assertTrue(a.q().subtract(c.q().conjugate()).norm() <= a.error() + c.error(), "reflection at " + x
                        + ", " + t);
                assertTrue(a.q().getImaginary() != 0, "the check is not trivial: q is not real at t != 0");
            }
        }
    }

    @Test
    void memberThreeHasThePointSymmetryAndRealValues() {
        // n = 3 (hierarchy/README.md): a11 = 0 gives q(x, t) = q(-x, -t); imaginary a_-2(0) and real m give
        // q(x, t) = conj q(x, t), i.e. q real on the real plane
        OriginSolution even = OriginSolution.create(3, Complex.ONE, new Complex(0.1), Complex.ZERO, Complex.I,
                Complex.I, SolverSettings.defaults());
        OriginSolution odd = OriginSolution.create(3, Complex.ONE, new Complex(0.1), new Complex(0, 0.6),
                new Complex(0, 0.8), new Complex(0, 0.8), SolverSettings.defaults());
        for (OriginSolution o : new OriginSolution[] {even, odd}) {
            RealRow plus = RealRow.of(o, new Complex(0.3), 2, 2, 1e-14, null);
            RealRow minus = RealRow.of(o, new Complex(-0.3), 2, 2, 1e-14, null);
            for (double x : new double[] {0.5, 1.5}) {
                PotentialValue a = plus.potential(x);
                PotentialValue b = minus.potential(-x);
                assertTrue(Math.abs(a.q().getImaginary()) <= a.error(), "q real: " + a.q());
                double gap = a.q().subtract(b.q()).norm();
                if (o == even) {
                    assertTrue(gap <= a.error() + b.error(), "x = " + x + ": " + a.q() + " vs " + b.q());
                } else {
                    assertTrue(gap > 0.1, "a11 != 0 breaks the point symmetry: " + a.q() + " vs " + b.q());
                }
            }
        }
        assertEquals(2, PlaneGrid.of(even, new double[] {-1, 1}, new double[] {-0.3, 0.3}).symmetries().size());
    }

    @Test
    void otherDataUseOnlyTheSymmetriesTheyHave() {
        // a11 = 0.6i: anti-Hermitian (the reduction holds, reflection in t applies) but not even in x
        OriginSolution o = OriginSolution.create(2, Complex.ONE, Complex.ZERO, new Complex(0, 0.6),
                new Complex(0, 0.8), new Complex(0, 0.8), SolverSettings.defaults());
        double[] x = range(-3, 3, 13);
        double[] t = range(-1, 1, 5);
        PlaneGrid grid = PlaneGrid.of(o, x, t);
        assertEquals(1, grid.symmetries().size(), grid.symmetries().toString());
        assertEquals(3, grid.rowsToCompute());
        PlaneGrid.Result r = grid.compute(2, null, null);
        // q(x, t) differs from q(-x, t) (the parity check can fail)
        assertTrue(r.q(4, 2).subtract(r.q(4, 10)).norm() > 1e-3, r.q(4, 2) + " vs " + r.q(4, 10));
        // and the reflection holds for values computed without it
        PotentialValue direct = RealRow.of(o, new Complex(-1), 3, 3, 1e-14, null).potential(-2.5);
        assertTrue(direct.q().subtract(r.q(4, 1).conjugate()).norm() <= direct.error() + r.error(4, 1),
                direct.q() + " vs " + r.q(4, 1));
    }

    @Test
    void tinyTimesAreSummedFromMemberOneAndAgreeWithTheLines() {
        // |t| = 1e-5: the x-flow would need about x^2 / (20 |t|) = 80000 steps to reach x = 4; the row is summed
        // by the small-time series from member 1 (x^2 of the order of |t|: by a short line)
        OriginSolution o = OriginSolutionTest.profile();
        double[] x = range(-4, 4, 41);
        PlaneGrid.Result r = PlaneGrid.of(o, x, new double[] {0, 1e-5, 0.5}).compute(2, null, null);
        assertEquals("small-time series", r.method(1));
        assertEquals("member 1", r.method(0));
        assertEquals("line", r.method(2));
        RealRow line = RealRow.of(o, new Complex(1e-5), 0, 0.6, 1e-14, null);
        for (int j = 20; j <= 23; j++) {
            PotentialValue v = line.potential(x[j]);
            assertTrue(v.q().subtract(r.q(1, j)).norm() <= v.error() + r.error(1, j), "x = " + x[j] + ": "
                    + v.q() + " vs " + r.q(1, j));
            assertTrue(r.q(1, j).getImaginary() != 0 && r.error(1, j) < 1e-9, r.q(1, j) + " +- " + r.error(1, j));
        }
    }

    @Test
    void progressIsReportedAndCancellationStops() {
        double[] x = range(0, 4, 9);
        double[] t = range(0.2, 1.4, 7);
        List<Integer> seen = new ArrayList<>();
        PlaneGrid grid = PlaneGrid.of(OriginSolutionTest.profile(), x, t);
        grid.compute(2, (done, total) -> {
            assertEquals(7, total);
            seen.add(done);
        }, null);
        assertEquals(List.of(1, 2, 3, 4, 5, 6, 7), seen);
        AtomicBoolean cancel = new AtomicBoolean();
        assertThrows(CancellationException.class, () -> grid.compute(1, (done, total) -> cancel.set(true),
                cancel::get));
    }
}
