package org.tertius.core.region;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;
import java.util.concurrent.CancellationException;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.core.piii.RiccatiReferenceAccess;
import org.tertius.core.step.Node;

/** Grids against direct evaluations, determinism, cancellation and bad regions. */
class RegionSolverTest {
    private static final Painleve3 EQ = Painleve3.of(1, -0.5, 1, -1);

    private static Painleve3Solution demo() {
        return Painleve3Solution.builder(EQ).start(Complex.ONE, new Complex(0.5), new Complex(1.0 / 3)).build();
    }

    @Test
    void gridValuesAgreeWithDirectEvaluationsWithinTheirEstimates() {
        Grid g = Grid.of(-4, 4, 81, -4, 4, 81, 0);
        GridResult r = RegionSolver.solve(demo(), g, RegionSettings.defaults());
        assertEquals(0, r.statistics().failed());
        Random rnd = new Random(7);
        for (int k = 0; k < 25; k++) {
            int i = rnd.nextInt(g.nx());
            int j = rnd.nextInt(g.ny());
            if (!r.computed(i, j)) {
                continue;
            }
            Painleve3Value direct = demo().evaluate(g.point(i, j));
            double d = r.primary(i, j).subtract(direct.w()).norm();
            assertTrue(d <= r.error(i, j) + direct.errW(), "grid and direct differ by " + d + " at " + g.point(i, j)
                    + " (estimates " + r.error(i, j) + ", " + direct.errW() + ")");
        }
    }

    @Test
    void aTreeGrownForAGridServesEveryPointFromAStoredApproximant() {
        // before the tree was extended into the holes between its disks, 361 of these points took paths of their own
        Grid g = Grid.of(-4, 4, 81, -4, 4, 81, 0);
        RegionStatistics st = RegionSolver.solve(demo(), g, RegionSettings.defaults()).statistics();
        assertEquals(0, st.integrated(), st.toString());
        assertEquals(g.size(), st.servedFromTree(), st.toString());
    }

    @Test
    void theTreeGrownForAGridDoesNotDependOnTheNumberOfThreads() {
        // the holes between the disks are listed on all threads, then filled in a fixed order
        Grid g = Grid.of(-4, 4, 81, -4, 4, 81, 0);
        List<Node> one = RegionTree.grow(demo(), g, RegionSettings.builder().threads(1).build()).nodes();
        for (int threads : new int[] {2, 4}) {
            List<Node> more = RegionTree.grow(demo(), g, RegionSettings.builder().threads(threads).build()).nodes();
            assertEquals(one.size(), more.size());
            for (int k = 0; k < one.size(); k++) {
                Node a = one.get(k);
                Node b = more.get(k);
                assertEquals(a.parent(), b.parent(), "node " + k);
                assertArrayEquals(new double[] {a.tauRe(), a.tauIm(), a.radius(), a.stateRe(0), a.stateIm(0),
                        a.accumulatedError()}, new double[] {b.tauRe(), b.tauIm(), b.radius(), b.stateRe(0),
                        b.stateIm(0), b.accumulatedError()}, 0.0, "node " + k + " with " + threads + " threads");
            }
        }
    }

    @Test
    void valuesDoNotDependOnTheNumberOfThreads() {
        Grid g = Grid.of(-3, 3, 61, -3, 3, 61, 0);
        // at the default accuracy every point is served by the tree; at 1e-14 some take detached paths (pass 3)
        for (double accuracy : new double[] {1e-10, 1e-14}) {
            GridResult one = RegionSolver.solve(demo(), g,
                    RegionSettings.builder().threads(1).maxRelativeError(accuracy).build());
            GridResult two = RegionSolver.solve(demo(), g,
                    RegionSettings.builder().threads(3).maxRelativeError(accuracy).build());
            if (accuracy < 1e-12) {
                assertTrue(one.statistics().integrated() > 0, one.statistics().toString());
            }
            assertEquals(one.statistics().integrated(), two.statistics().integrated());
            double[] a = new double[2 * g.size()];
            double[] b = new double[2 * g.size()];
            for (int j = 0; j < g.ny(); j++) {
                for (int i = 0; i < g.nx(); i++) {
                    int k = j * g.nx() + i;
                    a[2 * k] = one.primary(i, j).getReal() + one.primary(i, j).getImaginary();
                    a[2 * k + 1] = one.error(i, j);
                    b[2 * k] = two.primary(i, j).getReal() + two.primary(i, j).getImaginary();
                    b[2 * k + 1] = two.error(i, j);
                }
            }
            assertArrayEquals(a, b, 0.0);
        }
    }

    @Test
    void cancellationStopsTheComputation() {
        Grid g = Grid.of(-10, 10, 201, -10, 10, 201, 0);
        assertThrows(CancellationException.class,
                () -> RegionSolver.solve(demo(), g, RegionSettings.builder().cancelled(() -> true).build()));
    }

    @Test
    void badRegionsAreRefusedWithTheReason() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> Grid.parse("--grid", "1:-1:10,0:1:10", 0));
        assertTrue(e.getMessage().contains("inverted"), e.getMessage());
        e = assertThrows(InvalidInputException.class, () -> Grid.parse("--grid", "0:1:0,0:1:10", 0));
        assertTrue(e.getMessage().contains("at least 1"), e.getMessage());
        assertThrows(InvalidInputException.class, () -> Grid.parse("--grid", "0:1:10", 0));
        e = assertThrows(InvalidInputException.class, () -> Grid.parse("--grid", "0:1:100000,0:1:100000", 0));
        assertTrue(e.getMessage().contains("allowed"), e.getMessage());
    }

    @Test
    void polesAndZerosOfTheRationalSolutionAreFoundWithTheirLeadingCoefficients() {
        // w = (z - 1/2)/(z + 1/2) solves (2, 2, 1, -1) (see ExactSolutionsTest): pole -1/2 with residue -1, zero
        // 1/2 with w' = 1
        Complex z0 = new Complex(2, 1);
        Painleve3Solution s = Painleve3Solution.builder(Painleve3.of(2, 2, 1, -1))
                .start(z0, z0.subtract(0.5).divide(z0.add(0.5)), z0.add(0.5).pow(-2)).build();
        Grid g = Grid.of(-2, 2, 41, -2, 2, 41, 0);
        List<Singularity> found = PoleFinder.find(RegionSolver.solve(s, g, RegionSettings.defaults()));
        assertEquals(2, found.size(), found.toString());
        for (Singularity x : found) {
            Complex expect = x.kind() == Singularity.Kind.POLE ? new Complex(-0.5) : new Complex(0.5);
            Complex lead = x.kind() == Singularity.Kind.POLE ? new Complex(-1) : Complex.ONE;
            double d = x.point().z().subtract(expect).norm();
            assertTrue(d <= x.error() && x.error() < 1e-10, x + " is " + d + " from " + expect);
            assertTrue(x.lead().subtract(lead).norm() < 1e-9, x.toString());
        }
    }

    @Test
    void logStripCoversSeveralSheetsAndFindsEveryCopyOfAPole() {
        // the rational solution is single-valued, so its pole at z = -1/2 appears on every sheet: at log|z| = log 1/2
        // and arg z = pi + 2 pi k; a strip with arg in [-4, 10] holds k = -1, 0, 1
        Complex z0 = new Complex(2, 1);
        Painleve3Solution s = Painleve3Solution.builder(Painleve3.of(2, 2, 1, -1))
                .start(z0, z0.subtract(0.5).divide(z0.add(0.5)), z0.add(0.5).pow(-2)).build();
        Grid g = Grid.logStrip(-1.5, 0.5, 41, -4, 10, 141);
        GridResult r = RegionSolver.solve(s, g, RegionSettings.defaults());
        assertEquals(0, r.statistics().failed());
        int poles = 0;
        for (Singularity x : PoleFinder.find(r)) {
            if (x.kind() == Singularity.Kind.POLE) {
                poles++;
                assertTrue(x.point().z().subtract(new Complex(-0.5)).norm() <= x.error() + 1e-12, x.toString());
            }
        }
        assertEquals(3, poles);
        // a value of the strip against the closed form
        SurfacePoint p = g.point(20, 130);
        Complex w = p.z().subtract(0.5).divide(p.z().add(0.5));
        assertTrue(r.primary(20, 130).subtract(w).norm() <= r.error(20, 130), "strip value at " + p);
    }

    @Test
    void polesOfABesselTypeSolutionAreZerosOfItsBesselDenominator() {
        // w = -u'/(a u) with u built from 0F1 (DLMF 10.16.9, §32.10): poles of w are zeros of u with residue -1/a.
        // Independent check: Newton's method on 1/w evaluated with Apfloat from each reported pole must move it
        // by less than its error estimate.
        RiccatiReferenceAccess ref = new RiccatiReferenceAccess(
                new Complex(1), new Complex(0.3), new Complex(1), new Complex(1), new Complex(0.7, 0.2));
        SurfacePoint p0 = SurfacePoint.of(1, 0.2);
        Complex[] s0 = ref.value(p0);
        Painleve3Solution s = Painleve3Solution.builder(ref.equation()).start(p0.z(), s0[0], s0[1]).build();
        Grid g = Grid.of(-3, 3, 61, -3, 3, 61, 0);
        GridResult r = RegionSolver.solve(s, g, RegionSettings.defaults());
        int poles = 0;
        for (Singularity x : PoleFinder.find(r)) {
            if (x.kind() != Singularity.Kind.POLE) {
                continue;
            }
            poles++;
            Complex z = x.point().z();
            Complex[] v = ref.value(x.point());
            // Newton on 1/w: z <- z + w/w', started a little way off the reported pole, iterated to convergence
            Complex root = z.add(new Complex(1e-4, 1e-4));
            for (int it = 0; it < 6; it++) {
                Complex[] vo = ref.value(SurfacePoint.of(root, 0));
                root = root.add(vo[0].divide(vo[1]));
            }
            double moved = root.subtract(z).norm();
            assertTrue(moved <= x.error() + 1e-9, "pole " + x + ": Newton moves it by " + moved);
            assertTrue(x.lead().subtract(new Complex(-1)).norm() < 1e-8, "residue " + x.lead() + " (w value " + v[0] + ")");
        }
        assertTrue(poles >= 2, "expected poles in the region, found " + poles);
    }
}
