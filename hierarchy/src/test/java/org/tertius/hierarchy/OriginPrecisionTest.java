package org.tertius.hierarchy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.core.InvalidInputException;
import org.tertius.core.face.SolutionValue;
import org.tertius.core.highprecision.HighPrecisionSolution;
import org.tertius.core.highprecision.HighPrecisionValue;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.ExactPoint;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.step.SolverSettings;

/**
 * Member n &gt;= 2 started at x = t_n = 0 to many digits: the state on x = 0 from the t_n-series (small t_n) or
 * carried along the t_n-flow in arbitrary precision (larger t_n), then the x-flow. Checked against the double
 * run within its estimates, against a run with more digits, and against the symmetries of the near-field profile
 * (derived in NearFieldProfile's comment: Psi(-X, T) = Psi(X, T), Psi(X, -T) = conj Psi(X, T)), which the two
 * routes reach through different rays and paths.
 */
class OriginPrecisionTest {
    private static final int DIGITS = 30;

    private static OriginSolution profile() {
        ExactNumber zero = ExactNumber.ofInteger(0);
        ExactNumber twoI = ExactNumber.parse("a", "2i");
        return OriginSolution.create(2, new Complex(2), zero, zero, twoI, twoI, SolverSettings.defaults());
    }

    private static HighPrecisionValue at(OriginSolution o, String t, String x, int digits) {
        MemberSolution s = o.atTime(ExactNumber.parse("t_2", t));
        return HighPrecisionSolution.of(s, digits).evaluate(ExactPoint.of(ExactNumber.parse("x", x), 0));
    }

    private static double relative(Apcomplex a, Apcomplex b) {
        Apcomplex d = a.subtract(b);
        double size = Math.max(ApcomplexMath.abs(b).doubleValue(), 1e-300);
        return ApcomplexMath.abs(d).doubleValue() / size;
    }

    @Test
    void bothRoutesOnTheAxisAgreeWithTheDoubleRunAndWithMoreDigits() {
        OriginSolution o = profile();
        assertTrue(0.01 < o.handover() && o.handover() < 0.5, "handover " + o.handover());
        for (String t : new String[] {"1/100", "1/2"}) {
            HighPrecisionValue v = at(o, t, "3/4", DIGITS);
            HighPrecisionValue w = at(o, t, "3/4", DIGITS + 12);
            assertTrue(v.correctDigits() >= DIGITS, "t = " + t + ": " + v.correctDigits() + " digits");
            SolutionValue d = o.atTime(ExactNumber.parse("t_2", t)).valueAt(SurfacePoint.planar(0.75, 0));
            for (int i = 0; i < v.size(); i++) {
                double r = relative(v.value(i), w.value(i));
                assertTrue(r < 1e-29, "t = " + t + ", value " + i + ": 30 and 42 digits differ by " + r);
                Apcomplex a = v.value(i);
                Complex precise = new Complex(a.real().doubleValue(), a.imag().doubleValue());
                double gap = precise.subtract(d.value(i)).norm();
                assertTrue(gap <= d.error(i) + 1e-15 * precise.norm(), "t = " + t + ", value " + i + ": double "
                        + "differs by " + gap + ", estimate " + d.error(i));
            }
        }
    }

    @Test
    void theProfileSymmetriesHoldToThirtyDigits() {
        OriginSolution o = profile();
        HighPrecisionValue base = at(o, "1/2", "6/5", DIGITS);
        HighPrecisionValue mirrorX = at(o, "1/2", "-6/5", DIGITS);
        HighPrecisionValue mirrorT = at(o, "-1/2", "6/5", DIGITS);
        Apcomplex q = base.value(0);
        assertTrue(relative(mirrorX.value(0), q) < 1e-29, "Psi(-X, T) = Psi(X, T)");
        assertTrue(relative(mirrorT.value(0), q.conj()) < 1e-29, "Psi(X, -T) = conj Psi(X, T)");
    }

    @Test
    void dataGivenAsDoublesAreRefusedForManyDigits() {
        OriginSolution o = OriginSolution.create(2, new Complex(2), Complex.ZERO, Complex.ZERO, new Complex(0, 2),
                new Complex(0, 2), SolverSettings.defaults());
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> HighPrecisionSolution.of(o.atTime(ExactNumber.parse("t_2", "1/2")), DIGITS));
        assertEquals("digits", e.argument());
        MemberSolution viaBuilder = MemberSolution.builder(MemberParameters.builder(2)
                        .times(ExactNumber.parse("t_2", "1/2")).s(new Complex(2)).m(ExactNumber.ofInteger(0)).build())
                .startAtOrigin(Complex.ZERO, new Complex(0, 2), new Complex(0, 2)).build();
        e = assertThrows(InvalidInputException.class, () -> HighPrecisionSolution.of(viaBuilder, DIGITS));
        assertTrue(e.getMessage().contains("binary double"), e.getMessage());
    }
}
