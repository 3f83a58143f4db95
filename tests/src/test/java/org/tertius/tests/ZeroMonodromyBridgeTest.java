package org.tertius.tests;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.tertius.connection.closed.MonodromyFromZero;
import org.tertius.connection.closed.ZeroMonodromyBridge;
import org.tertius.connection.zero.LocalValue;
import org.tertius.connection.zero.ZeroBehaviour;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.core.step.SolverSettings;
import org.tertius.hierarchy.monodromy.Estimate;
import org.tertius.hierarchy.monodromy.LaxMatrix;
import org.tertius.hierarchy.monodromy.MonodromyData;
import org.tertius.hierarchy.monodromy.MonodromyMap;

/**
 * The bridge between the behaviour w ~ B z^sigma at 0 and the monodromy data (derived here: connection/README.md,
 * section "Monodromy data at z = 0", by the method of Jimbo, Publ. RIMS 18 (1982) 1137, recalled from memory), on 24
 * random D6 solutions: random complex alpha, beta, sigma (|Re sigma| &lt;= 0.8) and B, half of them with gamma = 1,
 * delta = -1 and half with random complex gamma, delta. The solution is built from (sigma, B) by the series at 0
 * (PowerSeriesAtZero, ZeroExpansion) and continued by the engine, its monodromy data computed by the monodromy map at
 * two points away from 0 (z = 0.5 and 0.4 + 0.3i), and both directions of the bridge are checked: sigma and B from the
 * data, and the gauge-free data (s_0_1 s_0_2, s_inf_1 s_inf_2, E11 E22, chi) from (sigma, B). Tolerance: within twice
 * the propagated error estimates and below 1e-9.
 */
class ZeroMonodromyBridgeTest {
    private static final Complex S = new Complex(0.25);
    private static final MonodromyMap<Complex> MAP = MonodromyMap.doublePrecision();
    private static final double TOLERANCE = 1e-9;
    private static double worstSigma;
    private static double worstB;
    private static double worstData;

    static Stream<Arguments> parameterSets() {
        Random r = new Random(20_2025);
        List<Arguments> sets = new ArrayList<>();
        for (int i = 0; i < 24; i++) {
            Complex alpha = random(r, 1.5);
            Complex beta = random(r, 1.5);
            Complex gamma = i % 2 == 0 ? Complex.ONE : random(r, 2).add(new Complex(0.3, 0));
            Complex delta = i % 2 == 0 ? new Complex(-1) : random(r, 2).add(new Complex(0, 0.3));
            Complex sigma = new Complex(r.nextDouble(-0.8, 0.8), r.nextDouble(-0.5, 0.5));
            Complex b = Complex.valueOf(r.nextDouble(0.4, 1.8), 0).multiply(
                    Complex.I.multiply(r.nextDouble(-Math.PI, Math.PI)).exp());
            sets.add(Arguments.of(i, Painleve3.of(alpha, beta, gamma, delta), sigma, b));
        }
        return sets.stream();
    }

    private static Complex random(Random r, double size) {
        return new Complex(r.nextDouble(-size, size), r.nextDouble(-size, size));
    }

    static Stream<Arguments> firstSets() {
        return parameterSets().limit(3);
    }

    /** The first three sets at one point (the quick check of every build). */
    @ParameterizedTest(name = "set {0}")
    @MethodSource("firstSets")
    void sigmaAndBFromTheMonodromyDataAtOnePoint(int index, Painleve3 eq, Complex sigma, Complex b) {
        check(index, eq, sigma, b, 1);
    }

    /** All 24 sets at two points (about 3 s per set). */
    @ParameterizedTest(name = "set {0}")
    @MethodSource("parameterSets")
    @Tag("slow")
    void sigmaAndBFromTheMonodromyDataAndBack(int index, Painleve3 eq, Complex sigma, Complex b) {
        check(index, eq, sigma, b, 2);
    }

    private static void check(int index, Painleve3 eq, Complex sigma, Complex b, int points) {
        ZeroBehaviour zero = ZeroBehaviour.power(sigma, b);
        LocalValue<Complex> start = zero.expansion(eq).startData(new Complex(Math.log(0.25), 0), 1e-14);
        SurfacePoint z0 = SurfacePoint.fromLog(Math.log(start.z().norm()), start.z().getArgument());
        Painleve3Solution solution = Painleve3Solution.builder(eq).settings(SolverSettings.defaults())
                .start(z0.z(), start.w(), start.dw()).build();
        ZeroMonodromyBridge bridge = ZeroMonodromyBridge.of(eq, S);
        MonodromyFromZero closed = MonodromyFromZero.of(bridge, sigma, b);
        String at = "set " + index + " (" + eq + ", sigma " + sigma + ", B " + b + ")";
        // points away from 0, reached by the engine (near 0 the data are ill-conditioned: a_-1 grows like x^(-2 nu))
        SurfacePoint[] where = {SurfacePoint.of(0.5, 0, 0), SurfacePoint.of(0.4, 0.3, 0)};
        for (int p = 0; p < points; p++) {
            Painleve3Value v = solution.evaluate(where[p]);
            MonodromyData<Complex> d = MAP.compute(LaxMatrix.ofPainleve3(eq, v, S));
            String here = at + " at z = " + v.point().z() + ": ";
            assertTrue(d.checksHold(), here + d.checks());
            List<Estimate<Complex>> found = bridge.zeroData(d.stokesAtZero(1), d.stokesAtZero(2),
                    d.stokesAtInfinity(1), d.stokesAtInfinity(2), d.connection(1, 1), d.connection(2, 1));
            // derived here, connection/README.md section "Monodromy data at z = 0": tr M_0 = 2 sin(pi sigma / 2)
            double dSigma = found.get(0).value().subtract(sigma).norm();
            assertTrue(dSigma <= Math.min(TOLERANCE, 2 * found.get(0).error() + 1e-14), here + "sigma "
                    + found.get(0) + ", expected " + sigma);
            // derived here, same section: B = G(sigma) (e^(2 pi i (m + nu)) - chi) / (e^(2 pi i (m - nu)) - chi)
            double dB = found.get(1).value().subtract(b).norm();
            assertTrue(dB <= Math.min(TOLERANCE, 2 * found.get(1).error() + 1e-14), here + "B " + found.get(1)
                    + ", expected " + b);
            // the reverse (same section): the gauge-free data from (sigma, B)
            Complex[][] pairs = {
                {closed.stokesAtZero(1).multiply(closed.stokesAtZero(2)),
                    d.stokesAtZero(1).value().multiply(d.stokesAtZero(2).value())},
                {closed.stokesAtInfinity(1).multiply(closed.stokesAtInfinity(2)),
                    d.stokesAtInfinity(1).value().multiply(d.stokesAtInfinity(2).value())},
                {closed.connectionProduct(), d.connectionProduct().value()},
                {closed.chi(), ZeroMonodromyBridge.chi(d.stokesAtInfinity(1).value(), d.connection(1, 1).value(),
                    d.connection(2, 1).value())}};
            double[] bounds = {
                product(d.stokesAtZero(1), d.stokesAtZero(2)), product(d.stokesAtInfinity(1), d.stokesAtInfinity(2)),
                d.connectionProduct().error(), chiError(d)};
            String[] names = {"s_0_1 s_0_2", "s_inf_1 s_inf_2", "E11 E22", "chi"};
            for (int k = 0; k < pairs.length; k++) {
                double diff = pairs[k][0].subtract(pairs[k][1]).norm();
                double scale = 1 + pairs[k][1].norm();
                assertTrue(diff <= Math.min(TOLERANCE * scale, 2 * bounds[k] + 1e-14 * scale), here + names[k]
                        + " closed " + pairs[k][0] + ", data " + pairs[k][1] + " (estimate " + bounds[k] + ")");
                worstData = Math.max(worstData, diff / scale);
            }
            worstSigma = Math.max(worstSigma, dSigma);
            worstB = Math.max(worstB, dB / (1 + b.norm()));
        }
    }

    private static double product(Estimate<Complex> a, Estimate<Complex> b) {
        return a.error() * b.value().norm() + b.error() * a.value().norm();
    }

    private static double chiError(MonodromyData<Complex> d) {
        Complex s1 = d.stokesAtInfinity(1).value();
        Complex e11 = d.connection(1, 1).value();
        Complex e21 = d.connection(2, 1).value();
        Complex ratio = s1.multiply(e11).divide(e21);
        return ratio.norm() * (d.stokesAtInfinity(1).error() / s1.norm() + d.connection(1, 1).error() / e11.norm()
                + d.connection(2, 1).error() / e21.norm());
    }

    @AfterAll
    static void report() {
        System.out.printf("bridge at 0, largest over all sets and points: |d sigma| %.2e, |dB|/(1+|B|) %.2e,"
                + " gauge-free data (relative to 1 + |value|) %.2e%n", worstSigma, worstB, worstData);
    }
}
