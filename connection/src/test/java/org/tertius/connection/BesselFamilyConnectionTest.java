package org.tertius.connection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.tertius.connection.closed.BesselFamily;
import org.tertius.connection.infinity.InfinityBehaviour;
import org.tertius.connection.match.InfinityBehaviourFit;
import org.tertius.connection.match.ZeroBehaviourFit;
import org.tertius.connection.zero.ZeroBehaviour;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;

/**
 * The closed-form connection of the Bessel-function solutions of D6 (BesselFamily: the Riccati reduction derived
 * here; DLMF &sect;32.10(iii) for their existence; DLMF 10.25.2, 10.2.2, 10.40.5, 10.4.4-6, 10.17.5-6 for the Bessel
 * asymptotics used) against the numerical connection: the solution is started from its Apfloat values at |z| = 3 on
 * a ray near an anti-Stokes ray (one start for each side, since crossing the half-plane between them costs the
 * engine's accuracy), and its behaviour at 0 and at infinity along those rays is read off by the fits.
 */
class BesselFamilyConnectionTest {

    /** A random member: signs, sigma with |Re sigma| &lt;= 0.7, t in a box avoiding 0 and -1 (fixed seed). */
    private static BesselFamily random(Random r) {
        int e1 = r.nextBoolean() ? 1 : -1;
        int e2 = r.nextBoolean() ? 1 : -1;
        Complex sigma = new Complex(1.4 * r.nextDouble() - 0.7, 1.2 * r.nextDouble() - 0.6);
        Complex t = new Complex(0.4 + 1.6 * r.nextDouble(), 2 * r.nextDouble() - 1).multiply(r.nextBoolean() ? 1 : -1);
        return BesselFamily.of(e1, e2, sigma, t);
    }

    /**
     * A ray just inside the anti-Stokes ray of the background, where the amplitude is best resolved (the deviation
     * decays slowly there, the truncated series are most accurate): offset 0.08, more for large amplitudes so that
     * the deviation |q| e^(-2 |z| sin(offset)) / sqrt|z| is below 0.2 from |z| = 8 on.
     */
    private static double ray(BesselFamily f, int side) {
        double probe = side * (f.modified() ? Math.PI / 2 - 0.3 : 0.3);
        Complex[] pq = f.amplitudesAtInfinity(probe);
        double amplitude = pq[0].norm() + pq[1].norm();
        double offset = Math.max(0.08, Math.asin(Math.min(1, Math.log(amplitude / 0.57) / 16)));
        return side * (f.modified() ? Math.PI / 2 - offset : offset);
    }

    /** The member started from its closed-form values at |z| = 3 on the ray of the given side. */
    private static Painleve3Solution solution(BesselFamily f, int side) {
        double a = ray(f, side);
        Complex z0 = new Complex(3 * Math.cos(a), 3 * Math.sin(a));
        Complex[] v = f.value(z0, 20);
        return Painleve3Solution.builder(f.equation()).start(z0, v[0], v[1]).build();
    }

    /**
     * One member: the closed form against the fits, sigma and B to 1e-10 (measured difference) and within 3
     * reported errors; the background and the amplitude at infinity on both sides to 1e-9 and within 3 reported
     * errors.
     */
    private static void check(BesselFamily f) {
        Painleve3Solution s = solution(f, 1);
        ZeroBehaviour z = ZeroBehaviourFit.analyse(s, ray(f, 1), 0);
        assertEquals(ZeroBehaviour.Kind.POWER, z.kind(), f + ": " + z);
        double ds = z.sigma().subtract(f.sigma()).norm();
        double db = z.secondParameter().subtract(f.amplitudeAtZero()).norm();
        assertTrue(ds < 1e-10 && ds <= 3 * z.sigmaError(), f + ": sigma off by " + ds + ", " + z);
        assertTrue(db < 1e-10 * (1 + f.amplitudeAtZero().norm()) && db <= 3 * z.secondParameterError(),
                f + ": B off by " + db + ", " + z);
        for (int side : new int[] {1, -1}) {
            double a = ray(f, side);
            InfinityBehaviour i = InfinityBehaviourFit.analyse(solution(f, side), a, 0, 8, 25);
            assertEquals(InfinityBehaviour.Kind.EXPONENTIALLY_SMALL, i.kind(), f + ": " + i);
            assertEquals(0, i.background().subtract(f.background(a)).norm(), 1e-15, f + ": " + i);
            Complex[] pq = f.amplitudesAtInfinity(a);
            double dp = i.p().subtract(pq[0]).norm();
            double dq = i.q().subtract(pq[1]).norm();
            double scale = 1 + pq[0].norm() + pq[1].norm();
            assertTrue(dp + dq < 1e-9 * scale && dp <= 3 * i.errP() + 1e-300 && dq <= 3 * i.errQ() + 1e-300,
                    f + " on arg z = " + a + ": p off by " + dp + ", q by " + dq + ", " + i);
        }
    }

    /** The closed-form values (Apfloat Bessel functions) solve the equation: engine agrees at other points. */
    @Test
    void closedFormValuesAgreeWithEngine() {
        BesselFamily f = BesselFamily.of(1, -1, new Complex(0.3, 0.4), new Complex(0.7, -0.5));
        Painleve3Solution s = solution(f, 1);
        for (Complex z : new Complex[] {new Complex(0.5, 0.2), new Complex(0.4, 9), new Complex(0.05, 0.3)}) {
            Painleve3Value v = s.evaluate(SurfacePoint.of(z, 0));
            Complex[] e = f.value(z, 20);
            assertEquals(0, v.w().subtract(e[0]).norm(), v.errW() + 1e-15 * (1 + e[0].norm()), "w at " + z);
        }
    }

    /** Three random members (fast). */
    @Test
    void randomMembersAgreeWithClosedForm() {
        Random r = new Random(31);
        for (int k = 0; k < 3; k++) {
            check(random(r));
        }
    }

    /** 24 random members (all four sign choices occur). */
    @Tag("slow")
    @Test
    void twentyFourRandomMembersAgreeWithClosedForm() {
        Random r = new Random(32);
        for (int k = 0; k < 24; k++) {
            check(random(r));
        }
    }

    /** Rays where the closed form does not hold are refused with the reason. */
    @Test
    void stokesAndAntiStokesRaysAreRefused() {
        BesselFamily f = BesselFamily.of(1, 1, new Complex(0.2), new Complex(0.5));
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> f.amplitudesAtInfinity(0));
        assertEquals("angle", e.argument());
        assertThrows(InvalidInputException.class, () -> BesselFamily.of(1, 1, new Complex(1), Complex.ONE));
    }
}
