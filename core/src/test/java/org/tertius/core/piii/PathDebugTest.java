package org.tertius.core.piii;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.step.Node;

class PathDebugTest {
    @Test
    void debug() {
        RiccatiReference ref = new RiccatiReference(new Complex(1), new Complex(0.3), new Complex(1),
                new Complex(1), new Complex(0.7, 0.2));
        Painleve3 eq = ref.equation();
        SurfacePoint p0 = SurfacePoint.of(1, 0);
        Complex[] s = ref.value(p0);
        IntegratedSolution sol = (IntegratedSolution) Painleve3Solution.builder(eq).start(p0.z(), s[0], s[1]).build();
        sol.evaluate(SurfacePoint.of(1, 10));
        for (Node n : sol.engine().nodes()) {
            SurfacePoint p = SurfacePoint.fromLog(n.tauRe(), n.tauIm());
            Complex[] r = ref.value(p);
            Complex w = new Complex(n.stateRe(0), n.stateIm(0));
            System.out.printf("node %d parent %d z=%s r=%.3f sing=%d acc=%.2e  |w|=%.3e relerr=%.2e deg=%d/%d lo=%d/%d%n", n.id(), n.parent(), p,
                    n.radius(), n.singularityCount(), n.accumulatedError(), w.norm(), w.subtract(r[0]).norm() / (1 + w.norm()), n.approximant(0).numeratorDegree(), n.approximant(0).denominatorDegree(), n.lowerApproximant(0).numeratorDegree(), n.lowerApproximant(0).denominatorDegree());
        }
    }
}
