package org.tertius.core.number;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import java.math.BigInteger;
import org.junit.jupiter.api.Test;
import org.tertius.core.InvalidInputException;

class ExactNumberTest {
    @Test
    void readsRationalsDecimalsAndComplexNumbersExactly() {
        assertEquals(ExactNumber.ofRational(BigInteger.ONE, BigInteger.valueOf(3)), ExactNumber.parse("x", "1/3"));
        assertEquals(ExactNumber.ofRational(BigInteger.valueOf(-1), BigInteger.TWO), ExactNumber.parse("x", "-0.5"));
        assertEquals(ExactNumber.ofRational(BigInteger.ONE, BigInteger.valueOf(400)), ExactNumber.parse("x", "2.5e-3"));
        assertEquals("1/2+1/3i", ExactNumber.parse("x", "1/2+1/3i").toString());
        assertEquals("-1i", ExactNumber.parse("x", "-i").toString());
        assertEquals("3/4-2i", ExactNumber.parse("x", " 0.75 - 2 i ").toString());
        assertEquals("5/2i", ExactNumber.parse("x", "2.5i").toString());
        assertTrue(ExactNumber.parse("x", "0").isZero());
        assertEquals(ExactNumber.EXACT, ExactNumber.parse("x", "1/7").significantDigits());
    }

    @Test
    void refusesMalformedTextNamingTheArgument() {
        for (String bad : new String[] {"", "abc", "1/0", "1//2", "1+", "2i3", "--1", "1e"}) {
            InvalidInputException e = assertThrows(InvalidInputException.class, () -> ExactNumber.parse("beta", bad));
            assertEquals("beta", e.argument());
        }
    }

    @Test
    void everyFractionOfIntegersReadsBackAsItsReducedValue() {
        qt().forAll(longs().between(-1_000_000_000L, 1_000_000_000L), longs().between(1, 1_000_000_000L))
                .checkAssert((p, q) -> {
                    ExactNumber x = ExactNumber.parse("x", p + "/" + q);
                    BigInteger g = BigInteger.valueOf(p).gcd(BigInteger.valueOf(q));
                    assertEquals(BigInteger.valueOf(p).divide(g), x.realNumerator());
                    assertEquals(BigInteger.valueOf(q).divide(g), x.realDenominator());
                    assertEquals(x, ExactNumber.parse("x", x.toString()));
                });
    }
}
