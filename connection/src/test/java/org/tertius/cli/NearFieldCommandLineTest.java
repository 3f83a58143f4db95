package org.tertius.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The near-field profile of focusing NLS and the physical plane of members started at x = t_n = 0, from the
 * command line: values anywhere in (X, T), tables and pictures of the plane, the checks of a member solution.
 */
class NearFieldCommandLineTest {
    private static List<String> rows(String out) {
        return out.lines().filter(l -> !l.startsWith("#")).collect(Collectors.toList());
    }

    @Test
    void theProfileIsFourAtTheOriginAndKeepsItsSymmetriesOverThePlane() {
        CommandLineToolTest.Run r = CommandLineToolTest.run("table", "--profile", "nearfield", "--plane",
                "-2:2:5,-1:1:5");
        assertEquals(0, r.status, r.err);
        List<String> rows = rows(r.out);
        assertEquals("x,t_2,q_re,q_im,err,q_err", rows.get(0));
        assertEquals(1 + 25, rows.size());
        // Psi(0, 0) = 4 (Bilman, Ling and Miller, Duke Math. J. 169 (2020), from memory)
        CsvRows table = CsvRows.of(r.out);
        assertEquals(4.0, table.number(2 * 5 + 2, "q_re"), 1e-12);
        // Psi(-X, T) = Psi(X, T) and Psi(X, -T) = conj Psi(X, T) (derived in hierarchy/README.md): exact in the
        // table, since the rows and columns are copied by these symmetries
        for (int j = 0; j < 5; j++) {
            for (int i = 0; i < 5; i++) {
                int a = j * 5 + i;
                assertEquals(table.text(a, "q_re"), table.text(j * 5 + (4 - i), "q_re"));
                assertEquals(table.number(a, "q_im"), -table.number((4 - j) * 5 + i, "q_im"), 0.0);
            }
        }
    }

    @Test
    void theProfileIsEvaluatedAtAnyTimeIncludingXEqualZeroAndChecksNls() {
        CommandLineToolTest.Run r = CommandLineToolTest.run("eval", "--profile", "nearfield", "--times", "0.5", "--at",
                "0,1.5", "--integrals", "--nls-residual", "0.01");
        assertEquals(0, r.status, r.err);
        CsvRows rows = CsvRows.of(r.out);
        assertEquals(2, rows.size());
        for (int i = 0; i < rows.size(); i++) {
            String row = String.join(",", rows.row(i));
            // det a_-2 = s^2 = 4 within 1e-12 (first integral, hierarchy/README.md)
            assertEquals(4.0, rows.number(i, "integral1_re"), 1e-12, row);
            // i q_t + q_xx/2 + |q|^2 q = 0 up to the O(h^2) error of the differences (h = 0.01, terms of size ~10)
            assertTrue(rows.number(i, "nls_residual") < 1e-3 * rows.number(i, "nls_scale"), row);
        }
    }

    @Test
    void thePlaneIsDrawnAsAFigure(@TempDir Path dir) throws Exception {
        Path png = dir.resolve("psi.png");
        CommandLineToolTest.Run r = CommandLineToolTest.run("field", "--profile", "nearfield", "--plane",
                "-6:6:121,-2:2:41", "--out", png.toString(), "--size", "600x400");
        assertEquals(0, r.status, r.err);
        BufferedImage img = ImageIO.read(png.toFile());
        assertEquals(600, img.getWidth());
        assertTrue(r.err.contains("by symmetry"), r.err);
    }

    @Test
    void memberOneMapsToPainleveThreeColumns() {
        CommandLineToolTest.Run r = CommandLineToolTest.run("eval", "--member", "1", "--s", "2", "--m", "0",
                "--origin", "0,2i,2i", "--at", "1", "--painleve3");
        assertEquals(0, r.status, r.err);
        // z = 4 sqrt(s x) = 4 sqrt(2) at x = 1 (the map of hierarchy/README.md)
        assertEquals(4 * Math.sqrt(2), CsvRows.of(r.out).number(0, "z_re"), 1e-14);
    }

    @ParameterizedTest
    @CsvSource(delimiter = ';', value = {
        "table;--plane;-1:1:3,0:1:3;--alpha;1",
        "field;--plane;-1:1:3,0:1:3;--member;1",
        "eval;--profile;other;--at;1",
        "eval;--integrals;;--at;1"})
    void badInputIsRefusedInOneLine(String command, String option, String value, String other, String otherValue) {
        String[] base = command.equals("eval") && option.equals("--integrals")
                ? new String[] {command, "--alpha", "1", "--beta", "-1/2", "--gamma", "1", "--delta", "-1", "--z0", "1",
                    "--w0", "1/2", "--dw0", "1/3", option, other, otherValue}
                : value == null ? new String[] {command, option, other, otherValue}
                : new String[] {command, "--profile", "nearfield", option, value, other, otherValue, "--out", "/tmp/x.png"};
        if (option.equals("--profile")) {
            base = new String[] {command, option, value, other, otherValue};
        }
        CommandLineToolTest.Run r = CommandLineToolTest.run(base);
        assertEquals(Main.EXIT_BAD_INPUT, r.status, r.out + r.err);
        assertEquals(1, r.err.lines().count(), r.err);
    }
}
