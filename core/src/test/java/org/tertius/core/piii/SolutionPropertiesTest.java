package org.tertius.core.piii;

import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.integers;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.core.number.SurfacePoint;

/**
 * Properties of computed solutions (QuickTheories, fixed seeds, a handful of examples each since every
 * example integrates a solution). Each check compares two computations through their error estimates: the
 * difference of two values must not exceed the sum of their estimates (with the factor 1 of an honest
 * estimate), and the estimates must stay small (1e-9 relative) so that the check has teeth.
 */
class SolutionPropertiesTest {
    private static final long SEED = 20261202L;
    private static final Painleve3 EQ = Painleve3.of(1, -0.5, 1, -1);

    private static Painleve3Solution generic(double w0, double dw0) {
        return Painleve3Solution.builder(EQ).start(Complex.ONE, new Complex(w0, 0.1), new Complex(dw0, -0.2)).build();
    }

    private static void agree(Painleve3Value a, Painleve3Value b, String what) {
        double d = a.w().subtract(b.w()).norm();
        double tol = a.errW() + b.errW();
        if (!(d <= tol) || !(tol <= 1e-9 * (1 + a.w().norm()))) {
            throw new AssertionError(what + ": |w1 - w2| = " + d + ", estimates " + a.errW() + " + " + b.errW()
                    + " at " + a.point());
        }
        double dd = a.dw().subtract(b.dw()).norm();
        if (!(dd <= a.errDw() + b.errDw())) {
            throw new AssertionError(what + ": |w1' - w2'| = " + dd + " above estimates at " + a.point());
        }
    }

    @Test
    void reciprocalSymmetryMapsSolutionsToSolutions() {
        // 1/w solves the equation with (-beta, -alpha, -delta, -gamma): integrate that equation directly
        qt().withFixedSeed(SEED).withExamples(6)
                .forAll(doubles().between(0.3, 1.5), doubles().between(-0.5, 0.5), doubles().between(-2.5, 2.5),
                        doubles().between(-2.5, 2.5))
                .checkAssert((w0, dw0, x, y) -> {
                    Painleve3Solution s = generic(w0, dw0);
                    Complex w = new Complex(w0, 0.1);
                    Complex dw = new Complex(dw0, -0.2);
                    Painleve3Solution r = Painleve3Solution.builder(EQ.reciprocal()).start(Complex.ONE, w.reciprocal(),
                            dw.negate().divide(w.multiply(w))).build();
                    SurfacePoint p = SurfacePoint.of(x + 0.05, y);
                    agree(s.reciprocal().evaluate(p), r.evaluate(p), "1/w");
                });
    }

    @Test
    void negationAndScalingSymmetriesHold() {
        qt().withFixedSeed(SEED).withExamples(5)
                .forAll(doubles().between(0.3, 1.5), doubles().between(-2, 2), doubles().between(-2, 2),
                        doubles().between(-0.6, 0.6))
                .checkAssert((w0, x, y, phase) -> {
                    Painleve3Solution s = generic(w0, 0.2);
                    Complex w = new Complex(w0, 0.1);
                    Complex dw = new Complex(0.2, -0.2);
                    SurfacePoint p = SurfacePoint.of(x + 0.05, y);
                    Painleve3Solution neg = Painleve3Solution.builder(EQ.negated()).start(Complex.ONE, w.negate(),
                            dw.negate()).build();
                    agree(s.negated().evaluate(p), neg.evaluate(p), "-w");
                    // W(z) = w(lambda z) with lambda = 1.3 e^{i phase}: W(z0/lambda) = w0, W'(z0/lambda) = lambda w0'
                    Complex lambda = Complex.valueOf(1.3 * Math.cos(phase), 1.3 * Math.sin(phase));
                    Painleve3Solution sc = Painleve3Solution.builder(EQ.scaledArgument(lambda))
                            .start(Complex.ONE.divide(lambda), w, dw.multiply(lambda)).build();
                    agree(s.scaledArgument(lambda).evaluate(p), sc.evaluate(p), "w(lambda z)");
                });
    }

    @Test
    void twoPathsToTheSamePointAgree() {
        // a fresh solution reaches the target directly; another first visits a detour point, and its path tree
        // then reaches the target from there
        qt().withFixedSeed(SEED).withExamples(6)
                .forAll(doubles().between(-4, 4), doubles().between(-4, 4), doubles().between(-4, 4),
                        doubles().between(-4, 4))
                .checkAssert((x, y, u, v) -> {
                    SurfacePoint target = SurfacePoint.of(x + 0.03, y);
                    Painleve3Solution direct = generic(0.5, 0.3);
                    Painleve3Solution detour = generic(0.5, 0.3);
                    SurfacePoint via = SurfacePoint.of(u + 0.02, v, target.sheet());
                    detour.evaluate(via);
                    agree(direct.evaluate(target), detour.evaluate(target), "two paths");
                });
    }

    @Test
    void outAndBackReturnsTheStartData() {
        qt().withFixedSeed(SEED).withExamples(5)
                .forAll(doubles().between(-4, 4), doubles().between(-4, 4), integers().between(-1, 1))
                .checkAssert((x, y, sheet) -> {
                    Painleve3Solution s = generic(0.7, -0.1);
                    SurfacePoint far = SurfacePoint.of(x + 0.04, y, sheet);
                    Painleve3Value v = s.evaluate(far);
                    // a new solution started at the far point with the computed data must come back to the start
                    // data at z0 = 1 on the sheet that undoes the winding
                    Painleve3Solution back = Painleve3Solution.builder(EQ).start(far.z(), v.w(), v.dw()).build();
                    // the new start point is on its own principal sheet, so undoing k windings ends on sheet -k
                    Painleve3Value home = back.evaluate(SurfacePoint.of(1, 0, -sheet));
                    double d = home.w().subtract(new Complex(0.7, 0.1)).norm();
                    // budget: the two estimates summed, with a factor 10 for the growth of the way-out error on the
                    // way back (the estimate of the way back covers its own steps, not the error of its data)
                    double budget = 10 * (home.errW() + v.errW());
                    if (!(d <= budget) || !(budget < 1e-8)) {
                        throw new AssertionError("out to " + far + " and back: |w - w0| = " + d + ", budget " + budget);
                    }
                });
    }

    @Test
    void loopThatDoesNotEncloseTheOriginReturnsTheStartValue() {
        // waypoints on a circle of radius 1.5 round 3+0i force the tree round a loop not enclosing 0; the value
        // at z0 = 1 reached from the last waypoint (the root is not used: the evaluation starts at the nearest
        // node of the loop) must agree with the start data
        qt().withFixedSeed(SEED).withExamples(3)
                .forAll(doubles().between(0, 2 * Math.PI))
                .checkAssert(phase -> {
                    Painleve3Solution s = generic(0.9, 0.1);
                    int m = 12;
                    Painleve3Value last = null;
                    for (int k = 0; k <= m; k++) {
                        double t = phase + 2 * Math.PI * k / m;
                        last = s.evaluate(SurfacePoint.of(3 - 2 * Math.cos(t), 2 * Math.sin(t)));
                    }
                    Painleve3Solution again = Painleve3Solution.builder(EQ).start(last.point().z(), last.w(), last.dw())
                            .build();
                    for (int k = m; k >= 0; k--) {
                        double t = phase + 2 * Math.PI * k / m;
                        last = again.evaluate(SurfacePoint.of(3 - 2 * Math.cos(t), 2 * Math.sin(t)));
                    }
                    Painleve3Value home = again.evaluate(SurfacePoint.of(1, 0));
                    double d = home.w().subtract(new Complex(0.9, 0.1)).norm();
                    if (!(d <= 1e-10)) {
                        throw new AssertionError("loop: |w - w0| = " + d + " (estimate " + home.errW() + ")");
                    }
                });
    }

    @Test
    void oneSolutionSharedByThreadsGivesValuesWithinTheEstimates() throws Exception {
        // four threads evaluate one solution at the same 40 points in different orders (the tree grows under a
        // lock); every value must agree with a sequential evaluation within the two estimates
        Painleve3Solution shared = generic(0.5, 0.3);
        Painleve3Solution alone = generic(0.5, 0.3);
        List<SurfacePoint> pts = new ArrayList<>();
        Random rnd = new Random(SEED);
        for (int k = 0; k < 40; k++) {
            pts.add(SurfacePoint.of(rnd.nextDouble() * 12 - 6 + 0.01, rnd.nextDouble() * 12 - 6, rnd.nextInt(3) - 1));
        }
        ExecutorService pool = Executors.newFixedThreadPool(4);
        List<Future<List<Painleve3Value>>> futures = new ArrayList<>();
        for (int t = 0; t < 4; t++) {
            List<SurfacePoint> order = new ArrayList<>(pts);
            Collections.shuffle(order, new Random(t));
            futures.add(pool.submit(() -> shared.evaluate(order)));
        }
        for (Future<List<Painleve3Value>> f : futures) {
            for (Painleve3Value v : f.get()) {
                // which thread grows which part of the tree varies from run to run, so only the honesty of the
                // two estimates is asserted here (their size depends on the path taken)
                Painleve3Value w = alone.evaluate(v.point());
                double d = v.w().subtract(w.w()).norm();
                if (!(d <= v.errW() + w.errW()) || !(v.errW() < 1e-6)) {
                    throw new AssertionError("threads: |w1 - w2| = " + d + ", estimates " + v.errW() + " + " + w.errW()
                            + " at " + v.point());
                }
            }
        }
        pool.shutdown();
    }

    @Test
    void residualOfTheEquationIsSmallAtRandomPoints() {
        // w'' by a 4th-order central difference of w' from the dense output (h = 1e-3: truncation about
        // h^4 |w^(5)| ~ 1e-12 away from poles, rounding about 1e-13/h): the residual z w w'' - z w'^2 + w w' -
        // alpha w^3 - beta w - gamma z w^4 - delta z must vanish to 1e-8 relative to the size of its terms
        qt().withFixedSeed(SEED).withExamples(12)
                .forAll(doubles().between(-5, 5), doubles().between(-5, 5))
                .checkAssert((x, y) -> {
                    Painleve3Solution s = generic(0.6, 0.4);
                    Complex z = new Complex(x + 0.02, y);
                    double h = 1e-3;
                    Complex[] d = new Complex[4];
                    double[] off = {-2, -1, 1, 2};
                    for (int k = 0; k < 4; k++) {
                        d[k] = s.evaluate(SurfacePoint.of(z.add(off[k] * h), 0)).dw();
                    }
                    Complex d2 = d[0].subtract(d[1].multiply(8)).add(d[2].multiply(8)).subtract(d[3]).divide(12 * h);
                    Painleve3Value v = s.evaluate(SurfacePoint.of(z, 0));
                    if (v.w().norm() > 20 || v.w().norm() < 0.05) {
                        return; // next to a pole or a zero the finite difference is meaningless
                    }
                    Complex res = EQ.residual(z, v.w(), v.dw(), d2);
                    double scale = z.multiply(v.w()).multiply(d2).norm() + z.multiply(v.dw()).multiply(v.dw()).norm()
                            + z.multiply(v.w().pow(4)).norm() + z.norm() + 1;
                    if (!(res.norm() <= 1e-8 * scale)) {
                        throw new AssertionError("residual " + res.norm() + " at " + z + " (scale " + scale + ")");
                    }
                });
    }

    /**
     * Start errors are carried by the flow: a solution started from w0, w'(z0) with stated errors e reports, at
     * points across the pole field, an estimate that covers the distance to the solutions started from w0 + e and
     * from w'(z0) + e, and is not far above it (within a factor 100 of the larger distance plus the step errors).
     */
    @Test
    void startErrorsAreCarriedIntoTheEstimates() {
        double e = 1e-8;
        Complex w0 = new Complex(0.5, 0.1);
        Complex dw0 = new Complex(1.0 / 3, -0.2);
        Painleve3Solution exact = Painleve3Solution.builder(EQ).start(Complex.ONE, w0, dw0).build();
        Painleve3Solution uncertain = Painleve3Solution.builder(EQ).start(Complex.ONE, w0, dw0).startErrors(e, e)
                .build();
        Painleve3Solution movedW = Painleve3Solution.builder(EQ).start(Complex.ONE, w0.add(e), dw0).build();
        Painleve3Solution movedDw = Painleve3Solution.builder(EQ).start(Complex.ONE, w0, dw0.add(e)).build();
        for (Complex z : new Complex[] {new Complex(3, 2), new Complex(-2, 4), new Complex(0.2, 0.1)}) {
            SurfacePoint p = SurfacePoint.of(z, 0);
            Painleve3Value u = uncertain.evaluate(p);
            Painleve3Value x = exact.evaluate(p);
            double moved = Math.max(movedW.evaluate(p).w().subtract(x.w()).norm(),
                    movedDw.evaluate(p).w().subtract(x.w()).norm());
            if (!(u.errW() >= moved) || !(u.errW() <= 100 * moved + 10 * x.errW())) {
                throw new AssertionError("at " + z + ": estimate " + u.errW() + " against a moved start's distance "
                        + moved + " (step errors alone " + x.errW() + ")");
            }
        }
    }
}
