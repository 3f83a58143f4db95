package org.tertius.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Hierarchy members through the whole command line, as Painleve III: pictures, pole lists, grid tables and digits;
 * options that do not apply to the chosen solution are refused, never ignored.
 */
class MemberCommandLineTest {
    /** Member 1 analytic at x = 0 with s = 1, m = 0.3, a_{-2}(0) = (0, i, i). */
    private static final String[] MEMBER1 = {"--member", "1", "--s", "1", "--m", "0.3", "--origin", "0,i,i"};

    private static CommandLineToolTest.Run run(String... args) {
        return CommandLineToolTest.run(args);
    }

    private static String[] with(String[] base, String... more) {
        return CommandLineToolTest.with(base, more);
    }

    private static List<String> rows(String out) {
        return out.lines().filter(l -> !l.startsWith("#")).collect(Collectors.toList());
    }

    @Test
    void aMemberPoleFieldIsDrawn(@TempDir Path dir) throws Exception {
        Path png = dir.resolve("q.png");
        CommandLineToolTest.Run r = run(with(with(new String[] {"field"}, MEMBER1), "--grid", "-2:2:41,-2:2:41",
                "--out", png.toString(), "--size", "400x300"));
        assertEquals(0, r.status, r.err);
        BufferedImage img = ImageIO.read(png.toFile());
        assertEquals(400, img.getWidth());
        assertTrue(r.err.contains("relative to 1+|q|"), r.err);
    }

    @Test
    void memberPolesAreListedWithResiduesAndPositionErrors() {
        CommandLineToolTest.Run r = run(with(with(new String[] {"poles"}, MEMBER1), "--grid", "-3:3:61,-3:3:61"));
        assertEquals(0, r.status, r.err);
        List<String> rows = rows(r.out);
        assertEquals("kind,x_re,x_im,sheet,lead_re,lead_im,err", rows.get(0));
        assertTrue(rows.stream().anyMatch(l -> l.startsWith("pole,")), r.out);
        assertTrue(rows.stream().anyMatch(l -> l.startsWith("zero,")), r.out);
    }

    @Test
    void aMemberGridTableHasOneRowPerPoint() {
        CommandLineToolTest.Run r = run(with(with(new String[] {"table"}, MEMBER1), "--grid", "0.5:1.5:5,-0.5:0.5:3"));
        assertEquals(0, r.status, r.err);
        List<String> rows = rows(r.out);
        assertEquals("x_re,x_im,sheet,q_re,q_im,r_re,r_im,dq_re,dq_im,dr_re,dr_im,err,q_err,r_err,dq_err,dr_err,"
                + "integrals", rows.get(0));
        assertEquals(1 + 15, rows.size());
    }

    @Test
    void memberDigitsAgreeWithALongerRunToTheClaimedDigits() {
        // the 60-digit run serves as the reference for the 50-digit one (internal consistency, common practice)
        CsvRows a = CsvRows.of(run(with(with(new String[] {"eval"}, MEMBER1), "--at", "1.5+0.5i", "--digits", "50"))
                .out);
        CsvRows b = CsvRows.of(run(with(with(new String[] {"eval"}, MEMBER1), "--at", "1.5+0.5i", "--digits", "60"))
                .out);
        assertEquals(50, (int) a.number(0, "digits"));
        for (String name : List.of("q", "r", "dq", "dr")) {
            assertEquals(50, (int) a.number(0, name + "_digits"), name);
            for (String part : List.of("_re", "_im")) {
                BigDecimal x = new BigDecimal(a.text(0, name + part));
                BigDecimal y = new BigDecimal(b.text(0, name + part));
                double scale = Math.max(1e-300, y.abs().doubleValue());
                double rel = x.subtract(y).abs().doubleValue() / Math.max(scale, 1e-3);
                assertTrue(rel <= 1e-49, name + part + ": " + x + " vs " + y);
            }
        }
    }

    @ParameterizedTest
    @CsvSource({"--alpha,1", "--z0,1", "--family,power", "--lambda,0.2"})
    void painleveOptionsAreRefusedWithAMember(String option, String value) {
        CommandLineToolTest.Run r = run(with(with(new String[] {"eval"}, MEMBER1), "--at", "1", option, value));
        assertEquals(Main.EXIT_BAD_INPUT, r.status, r.out);
        assertTrue(r.err.startsWith("tertius: " + option + ": does not apply with --member"), r.err);
        assertEquals(1, r.err.lines().count(), r.err);
        assertEquals("", r.out);
    }

    @Test
    void memberOptionsAndFamilyParametersAreRefusedWhereTheyDoNotApply() {
        String[] demo = {"--alpha", "1", "--beta", "-1/2", "--gamma", "1", "--delta", "-1", "--z0", "1", "--w0", "1/2",
            "--dw0", "1/3", "--at", "2"};
        CommandLineToolTest.Run r = run(with(with(new String[] {"eval"}, demo), "--s", "1"));
        assertEquals(Main.EXIT_BAD_INPUT, r.status);
        assertTrue(r.err.startsWith("tertius: --s: does not apply without --member"), r.err);
        r = run(with(with(new String[] {"eval"}, demo), "--lambda", "0.2"));
        assertEquals(Main.EXIT_BAD_INPUT, r.status);
        assertTrue(r.err.startsWith("tertius: --lambda: does not apply without --family"), r.err);
    }

    @Test
    void familiesRefuseDigitsNamingWhereTheirStartDataComeFrom() {
        CommandLineToolTest.Run r = run("eval", "--alpha", "0", "--beta", "0", "--gamma", "1", "--delta", "-1",
                "--family", "decaying", "--lambda", "0.2", "--at", "0.5", "--digits", "30");
        assertEquals(Main.EXIT_BAD_INPUT, r.status);
        assertTrue(r.err.startsWith("tertius: --digits: the start data of this solution come from"), r.err);
    }

    @Test
    void memberTwoIsDrawnOverAGridIncludingTheOrigin(@TempDir Path dir) throws Exception {
        Path png = dir.resolve("q2.png");
        CommandLineToolTest.Run r = run("field", "--member", "2", "--times", "0.5", "--s", "1", "--m", "0", "--x0", "0",
                "--state", "0,i,i,-1/16i,1/3,-1/5,0,1/2,1/4", "--grid", "-1:1:21,-1:1:21", "--out", png.toString(),
                "--size", "400x300");
        assertEquals(0, r.status, r.err);
        assertTrue(Files.size(png) > 0);
    }
}
