package org.tertius.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import org.junit.jupiter.api.Test;

/**
 * The near-field profile and members started at x = t_n = 0 to many digits from the command line: exact abscissae,
 * the digit column, agreement with the double run and with the profile's symmetries, refusals with the reason.
 */
class NearFieldDigitsCommandLineTest {
    @Test
    void theProfileAtNonZeroTimeGivesThirtyDigitsThatKeepItsSymmetries() {
        CommandLineToolTest.Run r = CommandLineToolTest.run("eval", "--profile", "nearfield", "--times", "1/2", "--at",
                "6/5,-6/5", "--digits", "30");
        assertEquals(0, r.status, r.err);
        CsvRows rows = CsvRows.of(r.out);
        assertEquals(2, rows.size(), r.out);
        assertEquals("30", rows.text(0, "digits"));
        assertEquals("30", rows.text(0, "q_digits"));
        BigDecimal aRe = new BigDecimal(rows.text(0, "q_re"));
        BigDecimal aIm = new BigDecimal(rows.text(0, "q_im"));
        // Psi(-X, T) = Psi(X, T) (derived in hierarchy/README.md), reached by paths in opposite directions
        assertTrue(aRe.subtract(new BigDecimal(rows.text(1, "q_re"))).abs().compareTo(new BigDecimal("1e-28")) < 0);
        assertTrue(aIm.subtract(new BigDecimal(rows.text(1, "q_im"))).abs().compareTo(new BigDecimal("1e-28")) < 0);
        CommandLineToolTest.Run mirrored = CommandLineToolTest.run("eval", "--profile", "nearfield", "--times",
                "-1/2", "--at", "6/5", "--digits", "30");
        assertEquals(0, mirrored.status, mirrored.err);
        CsvRows c = CsvRows.of(mirrored.out);
        // Psi(X, -T) = conj Psi(X, T) (same source), through the other ray of the T-flow
        assertTrue(aRe.subtract(new BigDecimal(c.text(0, "q_re"))).abs().compareTo(new BigDecimal("1e-28")) < 0);
        assertTrue(aIm.add(new BigDecimal(c.text(0, "q_im"))).abs().compareTo(new BigDecimal("1e-28")) < 0);
        CommandLineToolTest.Run plain = CommandLineToolTest.run("eval", "--profile", "nearfield", "--times", "1/2",
                "--at", "6/5");
        CsvRows d = CsvRows.of(plain.out);
        assertEquals(aRe.doubleValue(), d.number(0, "q_re"), d.number(0, "q_err") + 1e-15);
    }

    @Test
    void inexactDataAreRefusedWithTheReason() {
        CommandLineToolTest.Run r = CommandLineToolTest.run("eval", "--profile", "nearfield", "--profile-phase", "0.3",
                "--times", "1/2", "--at", "1", "--digits", "30");
        assertEquals(2, r.status);
        assertTrue(r.err.startsWith("tertius: --digits: this solution's start is not known exactly"), r.err);
        assertEquals("", r.out);
        CommandLineToolTest.Run plane = CommandLineToolTest.run("table", "--profile", "nearfield", "--plane",
                "-1:1:3,-1:1:3", "--digits", "20");
        assertEquals(2, plane.status);
        assertTrue(plane.err.startsWith("tertius: --digits: the (x, t_n) plane is tabulated in double precision"),
                plane.err);
        assertEquals("", plane.out);
    }
}
