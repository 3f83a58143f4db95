package org.tertius.core.number;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.core.InvalidInputException;

/** Reading complex numbers and points of the surface. */
class ComplexTextTest {

    @Test
    void readsTheFormsOfTheCommandLine() {
        assertEquals(new Complex(3, 2), ComplexText.parse("x", "3+2i"));
        assertEquals(new Complex(-1.5, 0), ComplexText.parse("x", "-1.5"));
        assertEquals(new Complex(2.5e-3, -4), ComplexText.parse("x", "2.5e-3-4i"));
        assertEquals(new Complex(0, 3), ComplexText.parse("x", "3i"));
        assertEquals(new Complex(0, -1), ComplexText.parse("x", "-i"));
        assertEquals(new Complex(1, 1), ComplexText.parse("x", "1+i"));
        assertEquals(new Complex(-0.5, 0), ComplexText.parse("x", "-1/2"));
        assertEquals(new Complex(1e-8, 0), ComplexText.parse("x", "1e-8"));
    }

    @Test
    void rejectsWhatIsNotANumberNamingTheArgument() {
        for (String bad : new String[] {"", "abc", "3+", "1/0", "nan", "1e999", "2ii", "+-1"}) {
            InvalidInputException e = assertThrows(InvalidInputException.class, () -> ComplexText.parse("--w0", bad),
                    "accepted '" + bad + "'");
            assertTrue(e.getMessage().startsWith("--w0"), e.getMessage());
        }
    }

    @Test
    void formatRoundTrips() {
        Complex c = new Complex(-1.160068082259176, 0.3036651472556035);
        assertEquals(c, ComplexText.parse("x", ComplexText.format(c)));
    }

    @Test
    void sheetsFollowTheArgument() {
        SurfacePoint p = SurfacePoint.of(-3, -0.1, -1);
        assertEquals(-1, SurfacePoint.fromLog(p.logRe(), p.logIm()).sheet());
        // Arg(-3 - 0.1i) = -pi + atan(0.1/3), then one turn down
        assertEquals(-Math.PI + Math.atan2(0.1, 3) - 2 * Math.PI, p.logIm(), 1e-15);
        // the negative real axis belongs to the sheet whose argument range ends at pi + 2 pi k
        assertEquals(0, SurfacePoint.fromLog(0, Math.PI).sheet());
        assertEquals(1, SurfacePoint.fromLog(0, Math.PI + 1e-12).sheet());
        assertThrows(InvalidInputException.class, () -> SurfacePoint.of(0, 0));
    }
}
