package org.tertius.hierarchy;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.core.step.SolverSettings;

class Member1PainleveTest {
    private static final Complex S = new Complex(1.0);
    private static final Complex M = new Complex(0.1);
    private static final Complex T = new Complex(0, -0.25);

    @Test
    void member1AgreesWithCorePainleve3ThroughTheMapOnThreeSheets() {
        Member1Map map = Member1Map.canonical(S);
        Painleve3 eq = map.equation(M, T);
        Complex w0 = new Complex(1.0);
        Complex dw0 = new Complex(0.2);
        SurfacePoint z0 = SurfacePoint.of(1, 0);
        SolverSettings st = SolverSettings.builder().tolerance(1e-14).build();
        Painleve3Solution core = Painleve3Solution.builder(eq).settings(st).start(z0.z(), w0, dw0).build();
        MemberSolution member = map.solution(eq, new Painleve3Value(z0, w0, dw0, 0, 0), st);
        {
            for (double[] p : new double[][] {{1.5, 0.4, 0}, {0.3, -0.2, 0}, {-1.2, 0.5, 0}, {-1.2, -0.5, 1}, {-0.6, -0.9, 1}, {-1.2, 0.5, -1}, {-0.6, 0.9, -1}, {-2, 0.1, -1}, {-2, -0.1, 1}}) {
                SurfacePoint z = SurfacePoint.of(p[0], p[1], (int) p[2]);
                long t0 = System.nanoTime();
                Painleve3Value a = core.evaluate(z);
                long t1 = System.nanoTime();
                Painleve3Value b = map.evaluate(member, z);
                System.out.printf("time core %.1f ms member %.1f ms nodes %d %d%n", (t1 - t0) / 1e6, (System.nanoTime() - t1) / 1e6, core.nodeCount(), member.nodeCount());
                double dw = a.w().subtract(b.w()).norm() / (1 + a.w().norm());
                double dd = a.dw().subtract(b.dw()).norm() / (1 + a.dw().norm());
                System.out.printf("%s core %s member %s rel %.2e %.2e est %.2e %.2e %.2e%n", z, a.w(), b.w(), dw, dd,
                        a.errW(), b.errW(), a.errDw() + b.errDw());
            }
        }
    }
}
