package org.tertius.hierarchy;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.core.InvalidInputException;

/**
 * Member 2 against focusing NLS, i q_t + q_xx/2 + |q|^2 q = 0 in t = t_2 (the AKNS reduction r = -conj(q);
 * the equation follows from the Lax pair, see hierarchy/README.md).
 */
class NlsTest {

    private static NlsCheck.Residual residual(MemberSolution base, double x, double step) {
        Complex t = base.parameters().time(2);
        return NlsCheck.residual(base.withTopTime(t.subtract(step)), base, base.withTopTime(t.add(step)), x, step);
    }

    @Test
    void nlsResidualOfMember2IsAtTheSecondOrderFiniteDifferenceLevel() {
        MemberSolution base = MemberSolutionTest.focusingMember2();
        for (double x : new double[] {0.3, 0.9}) {
            NlsCheck.Residual coarse = residual(base, x, 0.02);
            NlsCheck.Residual fine = residual(base, x, 0.01);
            // central differences: error ~ C h^2, so halving h divides the residual by 4 (3 to 5 allows the
            // next order and rounding of eps/h^2 ~ 1e-12)
            double ratio = coarse.value().norm() / fine.value().norm();
            assertTrue(ratio > 3 && ratio < 5, "x = " + x + ": residuals " + coarse.value().norm() + ", "
                    + fine.value().norm());
            // and it is small against the size of the terms (h = 0.01: h^2 = 1e-4)
            assertTrue(fine.value().norm() < 1e-3 * fine.scale(), "x = " + x + ": residual " + fine.value().norm()
                    + " against terms of size " + fine.scale());
        }
    }

    @Test
    void defocusingSignLeavesAResidualOfTheSizeOfTheCubicTerm() {
        // the check can fail: with + |q|^2 q replaced by - |q|^2 q the residual is 2 |q|^3, far above the
        // finite-difference level
        MemberSolution base = MemberSolutionTest.focusingMember2();
        NlsCheck.Residual fine = residual(base, 0.3, 0.01);
        Complex q = base.evaluate(new Complex(0.3)).q();
        double cubic = Math.pow(q.norm(), 3);
        Complex defocusing = fine.value().subtract(q.multiply(2 * q.norm() * q.norm()));
        assertTrue(defocusing.norm() > 100 * fine.value().norm() && defocusing.norm() > cubic,
                "defocusing residual " + defocusing.norm());
    }

    @Test
    void massOnAnIntervalChangesInT2ExactlyByTheBoundaryFlux() {
        // d/dt int_a^b |q|^2 dx = J(a) - J(b), J = Im(conj(q) q_x): the finite-interval form of the conservation
        // of the L2 norm (a decaying solution would need the boundary terms to vanish at infinity; here the
        // balance is checked on [a, b] for the solution of focusingMember2, which is not known to decay).
        MemberSolution base = MemberSolutionTest.focusingMember2();
        double a = -0.5;
        double b = 1.0;
        double t0 = 0.5;
        double t1 = 0.6;
        GaussIntegratorFactory factory = new GaussIntegratorFactory();
        GaussIntegrator inX = factory.legendre(24, a, b);
        GaussIntegrator inT = factory.legendre(12, t0, t1);
        MemberSolution later = base.withTopTime(new Complex(t1));
        double mass0 = inX.integrate(x -> NlsCheck.density(base.evaluate(new Complex(x))));
        double mass1 = inX.integrate(x -> NlsCheck.density(later.evaluate(new Complex(x))));
        double inflow = inT.integrate(t -> {
            MemberSolution at = base.withTopTime(new Complex(t));
            return NlsCheck.flux(at.evaluate(new Complex(a))) - NlsCheck.flux(at.evaluate(new Complex(b)));
        });
        // Gauss-Legendre with 24 and 12 nodes on smooth integrands: quadrature error far below 1e-10;
        // the values carry errors of about 1e-12
        double change = mass1 - mass0;
        assertTrue(Math.abs(change - inflow) < 1e-10 * (1 + Math.abs(mass0)), "mass change " + change
                + ", boundary inflow " + inflow);
        assertTrue(Math.abs(change) > 1e-4, "the check is not trivial: the mass changes by " + change);
    }

    @Test
    void nlsCheckRejectsUnequalTimeSpacing() {
        MemberSolution base = MemberSolutionTest.focusingMember2();
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> NlsCheck.residual(
                base.withTopTime(new Complex(0.45)), base, base.withTopTime(new Complex(0.6)), 0.3, 0.01));
        assertTrue(e.argument().equals("t_2"), e.getMessage());
    }
}
