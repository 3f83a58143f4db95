package org.tertius.connection;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.connection.closed.McCoyTracyWu;
import org.tertius.connection.family.Families;
import org.tertius.connection.match.DecayingConnection;
import org.tertius.connection.zero.PowerSeriesAtZero;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.step.SolverSettings;

/** Parameters outside a family's range get a message that names the argument and what happens there. */
class BadInputTest {
    private static final Painleve3 MTW = DecayingConnection.equation();

    @Test
    void lambdaAtOrBeyondOneOverPiIsRejectedByTheClosedFormWithTheBehaviourThere() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> McCoyTracyWu.sigma(0.4));
        assertTrue(e.getMessage().startsWith("lambda: must be in (-1/pi, 1/pi)"), e.getMessage());
        assertTrue(e.getMessage().contains("logarithmic"), e.getMessage());
        assertTrue(e.getMessage().contains("accumulate at 0"), e.getMessage());
        assertThrows(InvalidInputException.class, () -> McCoyTracyWu.sigma(1 / Math.PI));
        assertThrows(InvalidInputException.class, () -> McCoyTracyWu.zeroData("-0.5", 20));
    }

    @Test
    void resonantExponentIsRejectedWithPointerToLogarithmicBehaviour() {
        ComplexArithmetic ar = ComplexArithmetic.INSTANCE;
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> PowerSeriesAtZero.create(ar,
                List.of(Complex.ZERO, Complex.ZERO, Complex.ONE, new Complex(-1)), Complex.ONE, Complex.ONE, 10));
        assertTrue(e.getMessage().contains("logarithmic"), e.getMessage());
        assertThrows(InvalidInputException.class, () -> DecayingConnection.lambdaForSigma(1.2, 1e-3,
                SolverSettings.defaults()));
    }

    @Test
    void familiesRejectUnknownNamesMissingParametersAndWrongEquations() {
        SolverSettings s = SolverSettings.defaults();
        assertThrows(InvalidInputException.class, () -> Families.create(MTW, "nonesuch", Map.of(), s));
        InvalidInputException missing = assertThrows(InvalidInputException.class,
                () -> Families.create(MTW, "decaying", Map.of(), s));
        assertTrue(missing.getMessage().startsWith("lambda:"), missing.getMessage());
        assertThrows(InvalidInputException.class,
                () -> Families.create(MTW, "decaying", Map.of("lambda", "0.1", "sigma", "0.2"), s));
        InvalidInputException eq = assertThrows(InvalidInputException.class,
                () -> Families.create(Painleve3.of(1, 0, 1, -1), "decaying", Map.of("lambda", "0.1"), s));
        assertTrue(eq.getMessage().contains("delta = -1"), eq.getMessage());
        assertThrows(InvalidInputException.class, () -> Families.create(MTW, "analytic", Map.of("w0", "0"), s));
        assertThrows(InvalidInputException.class,
                () -> Families.create(MTW, "power", Map.of("sigma", "1.5", "B", "1"), s));
    }
}
