package org.tertius.core.piii;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.core.number.SurfacePoint;

class ExplorationTest {
    @Test
    void explore() {
        RiccatiReference ref = new RiccatiReference(new Complex(1), new Complex(0.3), new Complex(1),
                new Complex(1), new Complex(0.7, 0.2));
        Painleve3 eq = ref.equation();
        SurfacePoint p0 = SurfacePoint.of(1, 0);
        Complex[] s = ref.value(p0);
        System.out.println(eq + " start " + s[0] + " " + s[1]);
        Painleve3Solution sol = Painleve3Solution.builder(eq).start(p0.z(), s[0], s[1]).build();
        double[][] pts = {{1.01,0,0},{1.1,0,0},{1.3,0,0},{1.0,0.3,0},{0.9,0,0},{2,0,0},{3, 2, 0}, {1, 10, 0}, {-8, 6, 0}, {8, 6, 0}, {-3, 0.1, 0}, {-3, -0.1, -1}, {0.5, 0.5, 1}, {1e-4, 1e-4, 0}, {2, 1, 2}};
        for (double[] q : pts) {
            SurfacePoint p = SurfacePoint.of(q[0], q[1], (int) q[2]);
            long t = System.nanoTime();
            Painleve3Value v = sol.evaluate(p);
            long dt = System.nanoTime() - t;
            Complex[] r = ref.value(p);
            System.out.printf("%s nodes=%d t=%.1fms w=%s ref=%s |dw|=%.2e errEst=%.2e  dwErr=%.2e est=%.2e%n", p, sol.nodeCount(), dt / 1e6,
                    v.w(), r[0], v.w().subtract(r[0]).norm(), v.errW(), v.dw().subtract(r[1]).norm(), v.errDw());
        }
    }
}
