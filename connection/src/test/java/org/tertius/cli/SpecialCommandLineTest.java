package org.tertius.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;
import javax.imageio.ImageIO;
import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.Apfloat;
import org.apfloat.FixedPrecisionApcomplexHelper;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.tertius.connection.special.ExactParameters;
import org.tertius.connection.special.PreciseValue;
import org.tertius.connection.special.RationalSolution;
import org.tertius.connection.special.SpecialPolynomial;
import org.tertius.connection.special.SpecialPolynomials;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.ExactPoint;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3Value;

/**
 * Special solutions and Backlund transformations through the command line: against the library, against the
 * engine started from their values (a second route), Bessel-type values against Apfloat's 0F1, the roots of a
 * special polynomial against an independent root finder, and bad input.
 */
class SpecialCommandLineTest {
    /** PIII(11, -1, 1, -1): rational, n = 3 (alpha - beta = 12, DLMF 32.8(iii)); a c = -1 exercises the branch of sqrt. */
    private static final String[] RATIONAL = {"--alpha", "11", "--beta", "-1", "--gamma", "1", "--delta", "-1"};
    /** The demo solution of the README. */
    private static final String[] DEMO = {"--alpha", "1", "--beta", "-1/2", "--gamma", "1", "--delta", "-1", "--z0", "1",
        "--w0", "1/2", "--dw0", "1/3"};

    private static CommandLineToolTest.Run run(String... args) {
        return CommandLineToolTest.run(args);
    }

    private static String[] args(String command, String[] base, String... more) {
        return CommandLineToolTest.with(CommandLineToolTest.with(new String[] {command}, base), more);
    }

    private static List<String> rows(String out) {
        return out.lines().filter(l -> !l.startsWith("#")).collect(Collectors.toList());
    }

    /** The data rows of a successful run, split at commas (the column line dropped). */
    private static List<String[]> values(String... command) {
        CommandLineToolTest.Run r = run(command);
        assertEquals(0, r.status, r.err);
        List<String> rows = rows(r.out);
        List<String[]> out = new ArrayList<>();
        for (String row : rows.subList(1, rows.size())) {
            out.add(row.split(","));
        }
        return out;
    }

    private static Complex complex(String[] row, int k) {
        return new Complex(Double.parseDouble(row[k]), Double.parseDouble(row[k + 1]));
    }

    @Test
    void theRationalSolutionOnTheCommandLineIsTheLibrarysBitForBit() {
        // CLI against the library (Clarkson, J. Phys. A 36 (2003) 9507, Thm 2.1; DLMF 32.8(iii))
        RationalSolution s = RationalSolution.of(ExactParameters.parse("11", "-1", "1", "-1"), 0);
        String[] at = {"2+i", "-1.5+0.25i", "3i"};
        List<String[]> rows = values(args("eval", RATIONAL, "--special", "rational", "--at", String.join(",", at)));
        for (int k = 0; k < at.length; k++) {
            Complex z = ExactNumber.parse("z", at[k]).toComplex();
            Painleve3Value v = s.evaluate(SurfacePoint.of(z.getReal(), z.getImaginary()));
            assertEquals(v.w(), complex(rows.get(k), 3), at[k]);
            assertEquals(v.dw(), complex(rows.get(k), 5), at[k]);
        }
        String[] precise = values(args("eval", RATIONAL, "--special", "rational", "--at", "1/3+i", "--digits", "40"))
                .get(0);
        PreciseValue p = s.evaluate(ExactPoint.of(ExactNumber.parse("z", "1/3+i"), 0), 40);
        assertEquals(PreciseValue.parts(p.w(), 40)[0], precise[3]);
        assertEquals(PreciseValue.parts(p.dw(), 40)[1], precise[6]);
        assertEquals("40", precise[7]);
    }

    @Test
    void doubleAndManyDigitValuesOfARationalSolutionAgreeWithinTheEstimate() {
        // internal consistency (common practice); a c = -1 here, where a signed zero once picked the other member
        for (String z : new String[] {"1", "-0.74i", "2-3i"}) {
            String[] d = values(args("eval", RATIONAL, "--special", "rational", "--at", z)).get(0);
            String[] p = values(args("eval", RATIONAL, "--special", "rational", "--at", z, "--digits", "30")).get(0);
            double err = Double.parseDouble(d[7]);
            for (int k = 3; k <= 6; k++) {
                double gap = Math.abs(Double.parseDouble(d[k]) - new BigDecimal(p[k]).doubleValue());
                assertTrue(gap <= err, z + " column " + k + ": " + gap + " > " + err);
            }
        }
    }

    @ParameterizedTest
    @CsvSource({"rational,0", "rational,1"})
    void aRationalSolutionAgreesWithTheEngineStartedFromItsValues(String kind, String index) {
        // two routes (Clarkson 2003, Thm 2.1; DLMF 32.8(iii)): the closed form, and the engine integrating PIII from
        // the closed form's w, w' at z = 1 (both with their error estimates)
        String[] start = values(args("eval", RATIONAL, "--special", kind, "--special-index", index, "--at", "1"))
                .get(0);
        String w0 = start[3] + (start[4].startsWith("-") ? "" : "+") + start[4] + "i";
        String dw0 = start[5] + (start[6].startsWith("-") ? "" : "+") + start[6] + "i";
        String targets = "3+2i,-2-0.5i,0.5+4i,-4";
        List<String[]> closed = values(args("eval", RATIONAL, "--special", kind, "--special-index", index, "--at",
                targets));
        List<String[]> engine = values(args("eval", RATIONAL, "--z0", "1", "--w0=" + w0, "--dw0=" + dw0, "--at",
                targets));
        for (int k = 0; k < closed.size(); k++) {
            double allowed = Double.parseDouble(closed.get(k)[7]) + Double.parseDouble(engine.get(k)[7]) + 1e-13;
            assertTrue(complex(closed.get(k), 3).subtract(complex(engine.get(k), 3)).norm() <= allowed, targets);
            assertTrue(complex(closed.get(k), 5).subtract(complex(engine.get(k), 5)).norm() <= allowed, targets);
        }
    }

    @Test
    void polesOfTheRationalSolutionFromTheEngineAreItsCertifiedRoots() {
        // two routes: the poles read off the engine's path tree, and the roots of S_n(mu) S_{n-1}(mu-1) (DLMF 32.8)
        List<String[]> certified = values(args("roots", RATIONAL, "--digits", "16"));
        List<String[]> engine = values(args("poles", RATIONAL, "--special", "rational", "--grid",
                "-5:5:101,-5:5:101"));
        int matched = 0;
        for (String[] e : engine) {
            Complex p = new Complex(Double.parseDouble(e[1]), Double.parseDouble(e[2]));
            double best = Double.POSITIVE_INFINITY;
            for (String[] c : certified) {
                if (c[0].equals(e[0])) {
                    best = Math.min(best, p.subtract(new Complex(Double.parseDouble(c[1]), Double.parseDouble(c[2])))
                            .norm());
                }
            }
            assertTrue(best <= Double.parseDouble(e[6]) + 1e-12, e[0] + " at " + p + ": nearest certified " + best);
            matched++;
        }
        assertEquals(17, matched, "9 poles and 8 zeros away from z = 0 in [-5,5]^2");
    }

    @Test
    void aBacklundImageAgreesWithTheEngineOnTheNewParameters() {
        // DLMF 32.7.11 (T1): the image of the demo solution solves PIII(3, 3/2, 1, -1); the engine integrating that
        // equation from the image's values at z = 1 must give the image's values elsewhere
        CommandLineToolTest.Run image = run(args("eval", DEMO, "--backlund", "T1", "--at", "1"));
        assertEquals(0, image.status, image.err);
        assertTrue(image.out.startsWith("# PIII(alpha = 3, beta = 3/2, gamma = 1, delta = -1)"), image.out);
        assertTrue(image.out.contains("(alpha = 1, beta = -1/2, gamma = 1, delta = -1) -T(+a,+c)-> (alpha = 3"), image.out);
        String[] s = rows(image.out).get(1).split(",");
        String w0 = s[3] + (s[4].startsWith("-") ? "" : "+") + s[4] + "i";
        String dw0 = s[5] + (s[6].startsWith("-") ? "" : "+") + s[6] + "i";
        String targets = "3+2i,1.5,2-i";
        List<String[]> mapped = values(args("eval", DEMO, "--backlund", "T1", "--at", targets));
        List<String[]> engine = values("eval", "--alpha", "3", "--beta", "3/2", "--gamma", "1", "--delta", "-1",
                "--z0", "1", "--w0=" + w0, "--dw0=" + dw0, "--at", targets);
        for (int k = 0; k < mapped.size(); k++) {
            // the start data carry the image's error at z = 1 into the engine's run (amplified along the path)
            double allowed = 100 * (Double.parseDouble(mapped.get(k)[7]) + Double.parseDouble(engine.get(k)[7])
                    + Double.parseDouble(s[7]));
            assertTrue(complex(mapped.get(k), 3).subtract(complex(engine.get(k), 3)).norm() <= allowed, targets);
        }
    }

    @Test
    void aBacklundChainToManyDigitsAgreesWithItsDoubleValue() {
        // internal consistency (common practice): T1 then 1/w (DLMF 32.7.11, 32.7.7) in double and to 30 digits
        String[] d = values(args("eval", DEMO, "--backlund", "T1 S2", "--at", "3+2i")).get(0);
        String[] p = values(args("eval", DEMO, "--backlund", "T1 S2", "--at", "3+2i", "--digits", "30")).get(0);
        assertTrue(Integer.parseInt(p[7]) >= 25, p[7]);
        for (int k = 3; k <= 6; k++) {
            double gap = Math.abs(Double.parseDouble(d[k]) - new BigDecimal(p[k]).doubleValue());
            assertTrue(gap <= Double.parseDouble(d[7]), "column " + k + ": " + gap);
        }
    }

    @Test
    void aManyDigitTableOfAnImageIsItsEvaluationRowByRowWithTheBookkeepingInTheHeader() {
        // internal consistency (common practice): table --line --digits and eval --digits give the same rows
        String[] image = CommandLineToolTest.with(RATIONAL, "--special", "rational", "--backlund", "T2 S1");
        CommandLineToolTest.Run t = run(args("table", image, "--line", "1:2:3", "--digits", "25"));
        CommandLineToolTest.Run e = run(args("eval", image, "--at", "1,1.5,2", "--digits", "25"));
        assertEquals(0, t.status, t.err);
        assertEquals(rows(e.out), rows(t.out));
        assertTrue(t.out.contains("-T(-a,+c)-> (alpha = 9, beta = 1, gamma = 1, delta = -1) --w-> (alpha = -9, beta = -1"),
                t.out);
    }

    @Test
    void aProblemFileGivesTheSameRowsAsTheCommandLine(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("special.txt");
        Files.writeString(file, "alpha = 11\nbeta = -1\ngamma = 1\ndelta = -1\nspecial = rational\nspecial-index = 1\n"
                + "backlund = T1\nat = 2+i\n");
        CommandLineToolTest.Run p = run("eval", "--problem", file.toString());
        CommandLineToolTest.Run c = run(args("eval", RATIONAL, "--special", "rational", "--special-index", "1",
                "--backlund", "T1", "--at", "2+i"));
        assertEquals(0, p.status, p.err);
        assertEquals(c.out, p.out);
    }

    @Test
    void aBesselTypeSolutionAgreesWithApfloat0F1() {
        // DLMF 32.10(iv): PIII(5/3, 1/3, 1, -1), a = c = 1, b = 2/3, nu = 5/6; u = z^(2nu) 0F1(;1+nu;-z^2/4) (A = 1,
        // B = 0), w = -u'/u; 0F1 and its derivative 0F1(;b+1;x)/b (DLMF 16.3.1) from Apfloat at 60 digits
        String[] eq = {"--alpha", "5/3", "--beta", "1/3", "--gamma", "1", "--delta", "-1", "--special", "bessel"};
        String[] p = values(args("eval", eq, "--at", "3/2+1/2i", "--digits", "40")).get(0);
        String[] d = values(args("eval", eq, "--at", "1.5+0.5i")).get(0);
        FixedPrecisionApcomplexHelper h = new FixedPrecisionApcomplexHelper(60);
        Apcomplex z = new Apcomplex(new Apfloat(3, 60).divide(new Apfloat(2, 60)), new Apfloat(1, 60).divide(
                new Apfloat(2, 60)));
        Apfloat nu = new Apfloat(5, 60).divide(new Apfloat(6, 60));
        Apcomplex b = h.add(nu, new Apfloat(1, 60));
        Apcomplex x = h.negate(h.divide(h.multiply(z, z), new Apfloat(4, 60)));
        Apcomplex f = ApcomplexMath.hypergeometric0F1(b, x);
        Apcomplex fPrime = h.divide(ApcomplexMath.hypergeometric0F1(h.add(b, new Apfloat(1, 60)), x), b);
        // u'/u = 2 nu / z + (dx/dz) F'/F, dx/dz = -z/2
        Apcomplex w = h.negate(h.add(h.divide(h.multiply(new Apfloat(2, 60), nu), z),
                h.divide(h.multiply(h.negate(h.divide(z, new Apfloat(2, 60))), fPrime), f)));
        assertEquals("40", p[7]);
        Apcomplex cli = new Apcomplex(new Apfloat(p[3], 60), new Apfloat(p[4], 60));
        double relative = h.abs(h.subtract(cli, w)).doubleValue() / h.abs(w).doubleValue();
        assertTrue(relative < 1e-39, "40 digits claimed, relative error " + relative);
        double gap = new Complex(w.real().doubleValue(), w.imag().doubleValue()).subtract(complex(d, 3)).norm();
        assertTrue(gap <= Double.parseDouble(d[7]), "double value off by " + gap + " > " + d[7]);
    }

    @Test
    void aDegree66PolynomialsRootsAreCertifiedAndCheckedIndependently(@TempDir Path dir) throws Exception {
        // S_11(z; 1/3), degree 66 (Clarkson 2003, Thm 2.1). Independent check: at each reported root the Newton
        // correction S(r)/S'(r), computed with the exact coefficients at 60 digits (Apfloat as reference
        // arithmetic), is below 1e-29 (the distance to a simple root, common practice), and the 66 reported roots
        // are pairwise far apart: so they are all 66 roots. (Hipparchus's LaguerreSolver in double was tried as the
        // independent finder: on these coefficients it is good to about 1e-3 only.)
        Path png = dir.resolve("roots.png");
        CommandLineToolTest.Run r = run("roots", "--n", "11", "--mu", "1/3", "--digits", "30", "--plot",
                png.toString());
        assertEquals(0, r.status, r.err);
        assertTrue(r.out.contains("66 roots certified: 66 inclusion disks of one root each, all simple (proved)"),
                r.out);
        List<String> rows = rows(r.out);
        assertEquals(67, rows.size());
        SpecialPolynomial s = SpecialPolynomials.of(11, SpecialPolynomials.mu(1, 3));
        Apfloat[] coefficients = new Apfloat[s.degree() + 1];
        for (int k = 0; k <= s.degree(); k++) {
            coefficients[k] = new Apfloat(s.coefficient(k).re().getNumerator(), 60).divide(
                    new Apfloat(s.coefficient(k).re().getDenominator(), 60));
            assertEquals(0, s.coefficient(k).im().signum());
        }
        List<Complex> roots = new ArrayList<>();
        for (String row : rows.subList(1, rows.size())) {
            String[] c = row.split(",");
            assertEquals("30", c[5], row);
            Apcomplex x = new Apcomplex(new Apfloat(c[1], 60), new Apfloat(c[2], 60));
            Apcomplex value = Apcomplex.ZERO;
            Apcomplex slope = Apcomplex.ZERO;
            for (int k = s.degree(); k >= 0; k--) {
                slope = slope.multiply(x).add(value);
                value = value.multiply(x).add(coefficients[k]);
            }
            Complex root = new Complex(Double.parseDouble(c[1]), Double.parseDouble(c[2]));
            double step = ApcomplexMath.abs(value.divide(slope)).doubleValue();
            assertTrue(step < 1e-29 * (1 + root.norm()), row + ": Newton correction " + step);
            roots.add(root);
        }
        for (int i = 0; i < roots.size(); i++) {
            for (int j = i + 1; j < roots.size(); j++) {
                assertTrue(roots.get(i).subtract(roots.get(j)).norm() > 1e-3, roots.get(i) + " " + roots.get(j));
            }
        }
        BufferedImage img = ImageIO.read(png.toFile());
        assertEquals(900, img.getWidth());
    }

    @Test
    void theListOfSpecialSolutionsNamesConditionsAndIndices() {
        CommandLineToolTest.Run r = run("special", "--alpha", "1", "--beta", "1", "--gamma", "1", "--delta", "-1");
        assertEquals(0, r.status, r.err);
        // alpha + beta = 2: Bessel-type (DLMF 32.10(iv)); alpha c^2 + beta = 0 with c^2 = -1, c^4 = 1: constants
        assertTrue(r.out.contains("rational: no"), r.out);
        assertTrue(r.out.contains("bessel: yes"), r.out);
        assertTrue(r.out.contains("constant: yes"), r.out);
        assertTrue(r.out.contains("use: --special constant --special-index K, K in [0, 1]"), r.out);
        assertTrue(r.out.contains("algebraic: no"), r.out);
    }

    @Test
    void hostileValuesOfTheNewOptionsEndCleanly(@TempDir Path dir) {
        // every value of a small hostile set in every new option: status 0, 2 or 3, one line when refused, never an
        // internal error (the contract of Main; common practice for command-line tools)
        String[] hostile = {"", " ", "x", "-1", "0", "1e400", "nan", "1/0", "99999999999", "3+2i", "1,", ",", "T1;;T1",
            "T(+a,+x)", "--", "rational"};
        String[][] lines = {
            {"eval", "--alpha", "3", "--beta", "1", "--gamma", "1", "--delta", "-1", "--special", null, "--at", "2"},
            {"eval", "--alpha", "3", "--beta", "1", "--gamma", "1", "--delta", "-1", "--special", "rational",
                "--special-index", null, "--at", "2"},
            {"eval", "--alpha", "1", "--beta", "1", "--gamma", "1", "--delta", "-1", "--special", "bessel",
                "--bessel-coefficients", null, "--at", "2"},
            {"eval", "--alpha", "1", "--beta", "1", "--gamma", "1", "--delta", "-1", "--z0", "1", "--w0", "1", "--dw0",
                "0", "--backlund", null, "--at", "2"},
            {"roots", "--n", null, "--mu", "0"},
            {"roots", "--n", "2", "--mu", null},
            {"roots", "--n", "2", "--mu", "1/2", "--digits", null},
            {"roots", "--alpha", "3", "--beta", "1", "--gamma", "1", "--delta", null},
            {"special", "--alpha", "3", "--beta", "1", "--gamma", null, "--delta", "-1"}};
        for (String[] line : lines) {
            for (String h : hostile) {
                String[] args = line.clone();
                for (int k = 0; k < args.length; k++) {
                    if (args[k] == null) {
                        args[k] = h;
                    }
                }
                CommandLineToolTest.Run r = run(args);
                String shown = String.join(" ", args);
                assertTrue(r.status == 0 || r.status == 2 || r.status == 3, r.status + " for " + shown + ": " + r.err);
                assertTrue(!r.err.contains("internal error") && !r.err.contains("\tat "), shown + ": " + r.err);
                if (r.status == 2) {
                    assertEquals(1, r.err.lines().count(), shown + ": " + r.err);
                }
            }
        }
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "eval --alpha 1 --beta 1/2 --gamma 1 --delta -1 --special rational --at 1|--special: no rational solution",
        "eval --alpha 1 --beta 1/2 --gamma 1 --delta -1 --special bessel --at 1|4n + 2 (n >= 0) fails",
        "eval --alpha 1 --beta 1/2 --gamma 1 --delta -1 --special constant --at 1|gamma beta^2 + delta alpha^2 = 0",
        "eval --alpha 1 --beta 1/2 --gamma 1 --delta -1 --special algebraic --at 1|belongs to type D7",
        "eval --alpha 1 --beta 1/2 --gamma 1 --delta -1 --special cubic --at 1|--special: must be rational or",
        "eval --alpha 3 --beta 1 --gamma 1 --delta -1 --special rational --special-index 5 --at 1|--special-index: must be in [0, 1]",
        "eval --alpha 3 --beta 1 --gamma 1 --delta -1 --special rational --bessel-coefficients 1,0 --at 1|applies to --special bessel only",
        "eval --alpha 1 --beta 1 --gamma 1 --delta -1 --special bessel --bessel-coefficients 0,0 --at 1|must not both be zero",
        "eval --alpha 3 --beta 1 --gamma 1 --delta -1 --special rational --z0 1 --at 1|--z0: does not apply with --special",
        "eval --alpha 1 --beta 1 --gamma 0 --delta -1 --z0 1 --w0 1 --dw0 0 --backlund T1 --at 1|needs gamma delta != 0",
        "eval --alpha 1 --beta 1 --gamma 1 --delta -1 --z0 1 --w0 1 --dw0 0 --backlund T8 --at 1|--backlund: unknown transformation",
        "eval --member 1 --s 1 --m 0.3 --origin 0,i,i --backlund T1 --at 1|--backlund: does not apply with --member",
        "roots --n 3|--mu: a special polynomial needs both --n and --mu",
        "roots --n 3 --mu 0 --alpha 3|give either --n N --mu MU",
        "roots --n 3 --mu 1/2 --digits 0|--digits: must be in [1, 10000]",
        "roots --n -1 --mu 0|--n: must be in [0, 1000]",
        "roots --alpha 1 --beta 1 --gamma 1 --delta -1|--alpha: (with --beta, --gamma, --delta) no rational solution",
        "roots --alpha 3 --beta 1 --gamma 1 --delta -1 --special-index 5|--special-index: must be in [0, 1]"})
    void badInputIsOneLineNamingTheConditionAndExitTwo(String line, String message) {
        CommandLineToolTest.Run r = run(line.split(" "));
        assertEquals(2, r.status, r.err);
        assertEquals("", r.out);
        assertEquals(1, r.err.lines().count(), r.err);
        assertTrue(r.err.contains(message), r.err);
    }
}
