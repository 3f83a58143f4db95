package org.tertius.connection;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.connection.match.DecayingConnection;
import org.tertius.connection.zero.LocalValue;
import org.tertius.connection.zero.LogarithmicAtZero;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.core.step.SolverSettings;

class LogScratchTest {
    @Test
    void scratch() {
        Painleve3Solution s = DecayingConnection.solution(1 / Math.PI, SolverSettings.defaults());
        LocalValue<Complex> st = LogarithmicAtZero.at(1e-3);
        Painleve3Solution z = Painleve3Solution.builder(DecayingConnection.equation()).start(st.z(), st.w(), st.dw()).settings(SolverSettings.defaults()).build();
        for (double x : new double[] {1e-4, 1e-3, 1e-2, 0.05, 0.1, 0.2, 0.5, 1, 2, 3}) {
            Painleve3Value e = s.evaluate(SurfacePoint.of(new Complex(x), 0));
            Painleve3Value e2 = z.evaluate(SurfacePoint.of(new Complex(x), 0));
            String ser = "";
            if (x <= 0.2) {
                LocalValue<Complex> v = LogarithmicAtZero.at(x);
                ser = " series-inf " + v.w().subtract(e.w()).norm() / e.w().norm() + " d " + v.dw().subtract(e.dw()).norm() / e.dw().norm()
                        + " est " + v.errW() / v.w().norm() + " series-zeroEngine " + v.w().subtract(e2.w()).norm() / e2.w().norm();
            }
            System.out.println("x=" + x + " w=" + e.w() + " engErr " + e.errW() + " zeroEng-inf " + e2.w().subtract(e.w()).norm() + " zeroEngErr " + e2.errW() + ser);
        }
    }
}
