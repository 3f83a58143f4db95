package org.tertius.connection;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import java.util.Random;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.tertius.connection.closed.BesselFamily;
import org.tertius.connection.closed.ContinuedMcCoyTracyWu;
import org.tertius.connection.family.Families;
import org.tertius.connection.infinity.InfinityBehaviour;
import org.tertius.connection.match.DecayingConnection;
import org.tertius.connection.match.InfinityBehaviourFit;
import org.tertius.connection.match.ZeroBehaviourFit;
import org.tertius.connection.zero.LocalValue;
import org.tertius.connection.zero.ZeroBehaviour;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.step.SolverSettings;

/**
 * Measured agreement of the numerical connection with the closed forms, printed as a table (the figures of
 * connection/README.md): 24 random Bessel members of D6 (BesselFamily: Riccati reduction derived here, DLMF
 * &sect;32.10(iii), DLMF ch. 10 asymptotics), the decaying family at complex lambda and beyond |lambda| = 1/pi (McCoy,
 * Tracy and Wu, continued here). Run: {@code mvn -B -o test -pl connection -am -Pslow -Dtest=ConnectionAgreementTest
 * -Dsurefire.failIfNoSpecifiedTests=false}; the table is in the test output.
 */
class ConnectionAgreementTest {

    private static double ray(BesselFamily f, int side) {
        double probe = side * (f.modified() ? Math.PI / 2 - 0.3 : 0.3);
        Complex[] pq = f.amplitudesAtInfinity(probe);
        double amplitude = pq[0].norm() + pq[1].norm();
        double offset = Math.max(0.08, Math.asin(Math.min(1, Math.log(amplitude / 0.57) / 16)));
        return side * (f.modified() ? Math.PI / 2 - offset : offset);
    }

    private static Painleve3Solution start(BesselFamily f, double a) {
        Complex z0 = new Complex(3 * Math.cos(a), 3 * Math.sin(a));
        Complex[] v = f.value(z0, 20);
        return Painleve3Solution.builder(f.equation()).start(z0, v[0], v[1]).build();
    }

    @Tag("slow")
    @Test
    void printAgreementTable() {
        double ds = 0;
        double db = 0;
        double da = 0;
        double es = 0;
        double eb = 0;
        double ea = 0;
        Random r = new Random(32);
        for (int k = 0; k < 24; k++) {
            int e1 = r.nextBoolean() ? 1 : -1;
            int e2 = r.nextBoolean() ? 1 : -1;
            Complex sigma = new Complex(1.4 * r.nextDouble() - 0.7, 1.2 * r.nextDouble() - 0.6);
            Complex t = new Complex(0.4 + 1.6 * r.nextDouble(), 2 * r.nextDouble() - 1).multiply(r.nextBoolean() ? 1 : -1);
            BesselFamily f = BesselFamily.of(e1, e2, sigma, t);
            ZeroBehaviour z = ZeroBehaviourFit.analyse(start(f, ray(f, 1)), ray(f, 1), 0);
            ds = Math.max(ds, z.sigma().subtract(f.sigma()).norm());
            db = Math.max(db, z.secondParameter().subtract(f.amplitudeAtZero()).norm() / (1 + f.amplitudeAtZero().norm()));
            es = Math.max(es, z.sigmaError());
            eb = Math.max(eb, z.secondParameterError() / (1 + f.amplitudeAtZero().norm()));
            for (int side : new int[] {1, -1}) {
                double a = ray(f, side);
                InfinityBehaviour i = InfinityBehaviourFit.analyse(start(f, a), a, 0, 8, 25);
                Complex[] pq = f.amplitudesAtInfinity(a);
                double scale = 1 + pq[0].norm() + pq[1].norm();
                da = Math.max(da, (i.p().subtract(pq[0]).norm() + i.q().subtract(pq[1]).norm()) / scale);
                ea = Math.max(ea, (i.errP() + i.errQ()) / scale);
            }
        }
        System.out.printf("Bessel family, 24 random members: max |d sigma| %.1e (max estimate %.1e), max |dB|/(1+|B|)"
                + " %.1e (%.1e), max |d amplitude|/(1+|amplitude|) at infinity %.1e (%.1e)%n", ds, es, db, eb, da, ea);
        assertTrue(ds < 1e-10 && db < 1e-10 && da < 1e-9);

        Painleve3 eq = Painleve3.of(0, 0, 1, -1);
        ds = 0;
        db = 0;
        Random r2 = new Random(20);
        for (int k = 0; k < 8; k++) {
            Complex lambda = new Complex(0.25 * (2 * r2.nextDouble() - 1), 0.25 * (2 * r2.nextDouble() - 1));
            LocalValue<Complex> v = DecayingConnection.middleDeviation(ComplexArithmetic.INSTANCE, lambda, 1e-16);
            Painleve3Solution s = Painleve3Solution.builder(eq).start(v.z(), v.w().add(1), v.dw()).build();
            Complex[] closed = ContinuedMcCoyTracyWu.zeroData(lambda);
            ZeroBehaviour z = ZeroBehaviourFit.analyse(s, 0, 0);
            ds = Math.max(ds, z.sigma().subtract(closed[0]).norm());
            db = Math.max(db, z.secondParameter().subtract(closed[1]).norm() / closed[1].norm());
        }
        System.out.printf("Decaying family, 8 random complex lambda: max |d sigma| %.1e, max |dB|/|B| %.1e%n", ds, db);
        ds = 0;
        db = 0;
        for (double lambda : new double[] {0.4, 0.5, -0.4, -0.6}) {
            Painleve3Solution s = Families.create(eq, "decaying", Map.of("lambda", Double.toString(lambda)),
                    SolverSettings.defaults());
            Complex[] closed = ContinuedMcCoyTracyWu.zeroData(new Complex(lambda));
            ZeroBehaviour z = ZeroBehaviourFit.analyse(s, 0.3, 0);
            ds = Math.max(ds, z.sigma().subtract(closed[0]).norm());
            db = Math.max(db, z.secondParameter().subtract(closed[1]).norm() / closed[1].norm());
        }
        System.out.printf("Decaying family beyond the edge (lambda = 0.4, 0.5, -0.4, -0.6): max |d sigma| %.1e,"
                + " max |dB|/|B| %.1e%n", ds, db);
    }
}
