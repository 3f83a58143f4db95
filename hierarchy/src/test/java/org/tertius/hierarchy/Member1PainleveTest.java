package org.tertius.hierarchy;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Set;
import java.util.TreeSet;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.core.step.SolverSettings;

/** Member 1 against the core Painleve III engine through the map of {@link Member1Map}. */
class Member1PainleveTest {
    /**
     * Both engines run at tolerance 1e-14 per step and order 36; along these paths (at most about one turn around x = 0,
     * which is half a turn around z = 0) the accumulated error stays below 1e-12, the accuracy asked of the map
     * by issue 6 (at the default 1e-13 per step the two engines already differ by up to 2e-12 here).
     */
    private static final double AGREEMENT = 1e-12;
    /**
     * w' is read from the state through a cancellation (w' = (2 w^2 p + B w + C z)/z in the core form, a ratio of
     * entries of a_{-2}, a_{-1} in the member), which costs each engine a few units more: measured differences
     * up to 2.7e-12 at orders 32..40 and 1e-14 per step; the estimates of both engines cover them.
     */
    private static final double AGREEMENT_DW = 5e-12;

    @Test
    void member1AgreesWithCorePainleve3ThroughTheCanonicalMapOnSeveralSheets() {
        Member1Map map = Member1Map.canonical(new Complex(1.0));
        Painleve3 eq = map.equation(new Complex(0.1), new Complex(0, -0.25));
        assertAgreement(map, eq, new Complex(1.0), new Complex(0.2));
    }

    @Test
    void member1AgreesWithCorePainleve3ForComplexParametersAndAGeneralD6Equation() {
        // a D6 equation with gamma, delta not normalised, reached by the general map with s = 0.7 - 0.2i
        Painleve3 eq = Painleve3.of(new Complex(0.3, 0.1), new Complex(-0.4, 0.2), new Complex(2.0, 0.5),
                new Complex(-1.5, 0.3));
        Member1Map map = Member1Map.forEquation(eq, new Complex(0.7, -0.2));
        assertAgreement(map, eq, new Complex(0.8, 0.1), new Complex(-0.2, 0.3));
    }

    private static void assertAgreement(Member1Map map, Painleve3 eq, Complex w0, Complex dw0) {
        SurfacePoint z0 = SurfacePoint.of(1, 0);
        SolverSettings settings = SolverSettings.builder().tolerance(1e-14).order(36).build();
        // (measured: orders 32 and 40 at 1e-14 per step leave differences up to 1.7e-12 and 2.7e-12 in w', and up
        // to 1.3e-12 in w on the winding points, all within both estimates)
        Painleve3Solution core = Painleve3Solution.builder(eq).settings(settings).start(z0.z(), w0, dw0).build();
        MemberSolution member = map.solution(eq, new Painleve3Value(z0, w0, dw0, 0, 0), settings);
        // z-sheet 0 covers x-sheets -1, 0, 1 (x = (z/c)^2); the last two points lie on z-sheets 1 and -1
        double[][] points = {{1.5, 0.4, 0}, {0.3, -0.2, 0}, {0.2, 1.5, 0}, {-0.5, 1.0, 0}, {-1.2, 0.5, 0},
            {-1.2, -0.5, 0}, {-1.5, -0.2, 1}, {-1.5, 0.2, -1}};
        Set<Integer> xSheets = new TreeSet<>();
        for (double[] p : points) {
            SurfacePoint z = SurfacePoint.of(p[0], p[1], (int) p[2]);
            xSheets.add(map.x(z).sheet());
            Painleve3Value a = core.evaluate(z);
            Painleve3Value b = map.evaluate(member, z);
            double dw = a.w().subtract(b.w()).norm() / (1 + a.w().norm());
            double ddw = a.dw().subtract(b.dw()).norm() / (1 + a.dw().norm());
            if (z.sheet() != 0) {
                // winding round z = 0 amplifies the errors of both engines (their estimates show it, about 1e-12
                // here): the two must agree within the sum of their estimates
                assertTrue(a.w().subtract(b.w()).norm() <= a.errW() + b.errW(), "w at " + z + " beyond the estimates");
                assertTrue(a.dw().subtract(b.dw()).norm() <= a.errDw() + b.errDw(), "w' at " + z + " beyond the estimates");
                continue;
            }
            assertTrue(dw <= AGREEMENT, "w at " + z + ": core " + a.w() + ", member 1 " + b.w() + ", rel " + dw);
            assertTrue(ddw <= AGREEMENT_DW, "w' at " + z + ": core " + a.dw() + ", member 1 " + b.dw() + ", rel " + ddw);
        }
        assertTrue(xSheets.size() >= 3, "the points cover x-sheets " + xSheets);
    }
}
