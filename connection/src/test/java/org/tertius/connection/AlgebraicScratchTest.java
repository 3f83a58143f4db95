package org.tertius.connection;

import java.util.Map;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.connection.family.Families;
import org.tertius.connection.infinity.AlgebraicExpansion;
import org.tertius.connection.zero.LocalValue;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.core.step.SolverSettings;

class AlgebraicScratchTest {
    @Test
    void scratch() {
        Painleve3 eq = Painleve3.of(new Complex(0.7, 0.3), new Complex(-0.4, 0.5), new Complex(1.1, -0.2), new Complex(-0.8, 0.35));
        for (int r = 0; r < 4; r++) {
            Complex c = AlgebraicExpansion.backgrounds(eq.gamma(), eq.delta()).get(r);
            AlgebraicExpansion e = AlgebraicExpansion.create(eq.alpha(), eq.beta(), eq.gamma(), eq.delta(), c, 160);
            System.out.println("root " + r + " c=" + c + " mu=" + e.mu());
            for (int n : new int[] {4, 8}) {
                System.out.println(" res n=" + n + " x=50 " + e.residual(new Complex(50), n).norm() + " x=100 " + e.residual(new Complex(100), n).norm()
                 + " ratio " + e.residual(new Complex(50), n).norm() / e.residual(new Complex(100), n).norm() + " expect " + Math.pow(2, n + 1));
            }
            for (int k = 10; k <= 60; k += 10) System.out.println("  a_" + k + " " + e.coefficient(k).norm());
            Painleve3Solution s = Families.create(eq, "algebraic", Map.of("root", "" + r), SolverSettings.defaults());
            LocalValue<Complex> st = e.startData(1e-15);
            System.out.println(" start " + st);
            for (double dx : new double[] {-4, 3, 6, 10}) {
                double x1 = st.z().getReal() + dx;
                LocalValue<Complex> v = e.at(new Complex(x1));
                Painleve3Value ev = s.evaluate(SurfacePoint.of(new Complex(x1), 0));
                System.out.println("  x1=" + x1 + " dw=" + v.w().subtract(ev.w()).norm() + " ddw=" + v.dw().subtract(ev.dw()).norm()
                        + " est " + v.errW() + " amp " + Math.exp(Math.abs(e.mu().getReal()) * Math.abs(dx)) + " engine err " + ev.errW());
            }
        }
    }
}
