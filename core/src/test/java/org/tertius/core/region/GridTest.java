package org.tertius.core.region;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.math.BigDecimal;
import org.junit.jupiter.api.Test;
import org.tertius.core.InvalidInputException;

class GridTest {
    @Test
    void coordinatesAreTheDoublesNearestToTheirExactValues() {
        Grid g = Grid.parse("grid", "-10:10:401,-10:10:401", 0);
        // the row through Im z = 0 lies on the real axis, not at a rounding error beside it
        assertEquals(0.0, g.im(200), 0.0);
        assertEquals(0.0, g.re(200), 0.0);
        // -10 + 20 * 194 / 400 = -3/10 exactly: its nearest double, not -0.30000000000000071 (common practice: the
        // nearest double of a decimal is what Double.parseDouble gives)
        assertEquals(Double.parseDouble("-0.3"), g.re(194), 0.0);
        assertEquals(new BigDecimal("-0.3"), g.exactRe(194).stripTrailingZeros());
        Grid h = Grid.parse("grid", "0:1:4,0:1:4", 0);
        assertEquals(1.0 / 3, h.re(1), 0.0);
    }

    @Test
    void aBandOfRowsHasTheCoordinatesOfTheWholeGrid() {
        Grid g = Grid.parse("grid", "-4:4:41,-4:4:41", 0);
        for (int j0 : new int[] {0, 7, 32, 37}) {
            Grid band = g.rows(j0, Math.min(40, j0 + 15));
            for (int j = 0; j < band.ny(); j++) {
                assertEquals(g.im(j0 + j), band.im(j), 0.0, "row " + (j0 + j) + " of the band from " + j0);
                assertEquals(g.exactIm(j0 + j), band.exactIm(j));
            }
            assertEquals(g.re(17), band.re(17), 0.0);
        }
    }

    @Test
    void boundsThatAreNotDecimalNumbersAreRefused() {
        assertThrows(InvalidInputException.class, () -> Grid.parse("--grid", "-1:Infinity:5,0:1:5", 0));
        assertThrows(InvalidInputException.class, () -> Grid.parse("--grid", "1:-1:5,0:1:5", 0));
        assertThrows(InvalidInputException.class, () -> Grid.parse("--grid", "-1:1:0,0:1:5", 0));
    }
}
