package org.tertius.connection.scan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.connection.closed.McCoyTracyWu;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.core.step.SolverSettings;

/**
 * The classification at 0 cannot claim an impossible exponent. Reference: McCoy, Tracy and Wu, J. Math. Phys.
 * 18 (1977): for |lambda| &lt; 1/pi, w ~ B x^sigma with sigma = (2/pi) arcsin(pi lambda); beyond 1/pi the
 * exponent is complex and zeros of w accumulate at 0.
 */
class DecayingClassifierTest {
    private static final DecayingClassifier CLASSIFIER = new DecayingClassifier(SolverSettings.defaults());

    @Test
    void membersBeyondOneOverPiAreNeverLabelledPower() {
        // 0.43, 0.44, 0.58, 0.59 and 0.60 were labelled "power" with sigma 1.18, -0.32, 5.50, 0.03 and -0.83
        for (double lambda : new double[] {0.33, 0.43, 0.44, 0.5, 0.58, 0.59, 0.6, 0.9, 1.3}) {
            Classification c = CLASSIFIER.classify(0, lambda);
            assertEquals("accumulating", c.atZero(), "lambda " + lambda + ": " + c);
            assertFalse(c.poleFree());
            assertTrue(c.invariant() < 0, "lambda " + lambda + ": " + c);
        }
    }

    @Test
    void membersBelowOneOverPiArePowerLawsWithTheClosedFormExponent() {
        // budget 1e-6: the invariant at x = 1e-5 carries the neglected term of the autonomous limit
        for (double lambda : new double[] {-0.3, -0.1, 0.05, 0.2, 0.31}) {
            Classification c = CLASSIFIER.classify(0, lambda);
            assertEquals("power", c.atZero(), "lambda " + lambda + ": " + c);
            assertEquals(McCoyTracyWu.sigma(lambda), c.sigma(), 1e-6, "lambda " + lambda);
            assertTrue(c.poleFree());
        }
    }

    /** A value at x with w, w' and small errors (a synthetic point for the decision rules). */
    private static Painleve3Value value(double x, double w, double dw) {
        return new Painleve3Value(SurfacePoint.of(x, 0), new Complex(w), new Complex(dw), 1e-14 * Math.abs(w),
                1e-14 * Math.abs(dw));
    }

    @Test
    void anExponentOutsideTheStripIsUndecidedNotPower() {
        // x/w = 1e-9: the x^2/w^2 term of the invariant is below the decision floor
        double x = 1e-12;
        // q = x w'/w = -3 in the form of w: E = 8 - x^2/(2 w^2) > 0, whose power law would have sigma = -3
        Painleve3Value v = value(x, 1e-3, -3 * 1e-3 / x);
        Invariant e = Invariant.at(v, Invariant.reciprocalFormAt(v));
        assertFalse(e.reciprocal());
        DecayingClassifier.Behaviour b = DecayingClassifier.Behaviour.of(e, true);
        assertEquals("undecided", b.label);
        assertTrue(Double.isNaN(b.sigma));
        // q = 0.5: sigma = 0.5 is a power law
        Painleve3Value u = value(x, 1e-3, 0.5 * 1e-3 / x);
        DecayingClassifier.Behaviour p = DecayingClassifier.Behaviour.of(Invariant.at(u, false), true);
        assertEquals("power", p.label);
        assertEquals(0.5, p.sigma, 1e-6);
    }

    @Test
    void anInvariantThatIsNotConservedLeavesTheMemberUndecided() {
        // points where x/w is small enough for the x^2/w^2 term to stay below the decision floor
        Invariant a = Invariant.at(value(1e-12, 1e-3, 0.5 * 1e-3 / 1e-12), false);
        Invariant b = Invariant.at(value(1e-11, 1e-2, 0.7 * 1e-2 / 1e-11), false);
        assertFalse(a.agreesWith(b));
        assertEquals("undecided", DecayingClassifier.Behaviour.of(a, a.agreesWith(b)).label);
        // the same power law at both points: conserved
        Invariant c = Invariant.at(value(1e-11, 1e-3 * Math.pow(10, 0.5), 0.5 * 1e-3 * Math.pow(10, 0.5) / 1e-11),
                false);
        assertTrue(a.agreesWith(c));
    }
}
