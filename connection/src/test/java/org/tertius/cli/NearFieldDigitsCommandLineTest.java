package org.tertius.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.List;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

/**
 * The near-field profile and members started at x = t_n = 0 to many digits from the command line: exact abscissae,
 * the digit column, agreement with the double run and with the profile's symmetries, refusals with the reason.
 */
class NearFieldDigitsCommandLineTest {
    private static List<String> rows(String out) {
        return out.lines().filter(l -> !l.startsWith("#")).collect(Collectors.toList());
    }

    @Test
    void theProfileAtNonZeroTimeGivesThirtyDigitsThatKeepItsSymmetries() {
        CommandLineToolTest.Run r = CommandLineToolTest.run("eval", "--profile", "nearfield", "--times", "1/2", "--at",
                "6/5,-6/5", "--digits", "30");
        assertEquals(0, r.status, r.err);
        List<String> rows = rows(r.out);
        assertEquals(3, rows.size(), r.out);
        String[] a = rows.get(1).split(",");
        String[] b = rows.get(2).split(",");
        assertEquals("30", a[a.length - 1]);
        // Psi(-X, T) = Psi(X, T) (derived in hierarchy/README.md), reached by paths in opposite directions
        assertTrue(new BigDecimal(a[3]).subtract(new BigDecimal(b[3])).abs().compareTo(new BigDecimal("1e-28")) < 0);
        assertTrue(new BigDecimal(a[4]).subtract(new BigDecimal(b[4])).abs().compareTo(new BigDecimal("1e-28")) < 0);
        CommandLineToolTest.Run mirrored = CommandLineToolTest.run("eval", "--profile", "nearfield", "--times",
                "-1/2", "--at", "6/5", "--digits", "30");
        assertEquals(0, mirrored.status, mirrored.err);
        String[] c = rows(mirrored.out).get(1).split(",");
        // Psi(X, -T) = conj Psi(X, T) (same source), through the other ray of the T-flow
        assertTrue(new BigDecimal(a[3]).subtract(new BigDecimal(c[3])).abs().compareTo(new BigDecimal("1e-28")) < 0);
        assertTrue(new BigDecimal(a[4]).add(new BigDecimal(c[4])).abs().compareTo(new BigDecimal("1e-28")) < 0);
        CommandLineToolTest.Run plain = CommandLineToolTest.run("eval", "--profile", "nearfield", "--times", "1/2",
                "--at", "6/5");
        String[] d = rows(plain.out).get(1).split(",");
        double err = Double.parseDouble(d[11]);
        assertEquals(new BigDecimal(a[3]).doubleValue(), Double.parseDouble(d[3]), err + 1e-15);
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
