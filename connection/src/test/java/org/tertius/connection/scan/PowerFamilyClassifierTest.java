package org.tertius.connection.scan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tertius.connection.closed.McCoyTracyWu;
import org.tertius.core.InvalidInputException;
import org.tertius.core.step.SolverSettings;

/** The power family's classification against the closed-form critical curve and the symmetry w -> 1/w. */
class PowerFamilyClassifierTest {
    private final PowerFamilyClassifier classifier = new PowerFamilyClassifier(SolverSettings.defaults());

    /**
     * Source: McCoy, Tracy and Wu, J. Math. Phys. 18 (1977) 1058: the members w ~ B x^sigma that decay to 1 at
     * +infinity have B = B(sigma) ({@link McCoyTracyWu}). Just above that B the first singularity is a pole, just
     * below a zero, and on it (B rounded to double) w stays within its error estimate of 1 up to x = 10 (the
     * rounding of B, 1e-16 relative, grows like e^(2x) to about 1e-7 there; 2 lambda K0(20) &lt; 1e-9).
     */
    @Test
    void theCriticalCurveOfMcCoyTracyWuSeparatesPolesFromZeros() {
        for (double lambda : new double[] {-0.2, 0.1, 0.25}) {
            double sigma = McCoyTracyWu.sigma(lambda);
            double critical = McCoyTracyWu.amplitude(lambda);
            PowerFamilyClassification above = classifier.classify(0, sigma, critical * (1 + 1e-3));
            PowerFamilyClassification below = classifier.classify(1, sigma, critical * (1 - 1e-3));
            PowerFamilyClassification on = classifier.classify(2, sigma, critical);
            assertEquals("pole", above.kind(), above.toString());
            assertEquals("zero", below.kind(), below.toString());
            assertEquals("none", on.kind(), on.toString());
            assertTrue(Math.abs(on.wEnd() - 1) <= on.wEndError() + 1e-6, on.toString());
            assertTrue(on.wEndError() < 1e-3, on.toString());
            // the deviation e^(2x) delta B / B reaches order one near x = log(1000)/2 + O(1)
            assertTrue(above.firstSingularity() > 2 && above.firstSingularity() < 6, above.toString());
        }
    }

    /**
     * w -&gt; 1/w maps PIII(alpha, beta, gamma, delta) to PIII(-beta, -alpha, -delta, -gamma) (substitute into the
     * equation; common practice), so PIII(0, 0, 1, -1) to itself and its member (sigma, B) to (-sigma, 1/B),
     * exchanging poles and zeros: two independent integrations whose positions must agree within the sum of
     * their error estimates.
     */
    @Test
    void theSymmetryWToOneOverWExchangesPolesAndZerosAtTheSamePlace() {
        double[][] members = {{0.3, 3.0}, {-0.6, 0.4}, {0.7, 0.9}};
        for (double[] m : members) {
            PowerFamilyClassification a = classifier.classify(0, m[0], m[1]);
            PowerFamilyClassification b = classifier.classify(1, -m[0], 1 / m[1]);
            assertTrue(a.kind().equals("pole") || a.kind().equals("zero"), a.toString());
            assertEquals(a.kind().equals("pole") ? "zero" : "pole", b.kind(), a + " / " + b);
            double gap = Math.abs(a.firstSingularity() - b.firstSingularity());
            assertTrue(gap <= a.singularityError() + b.singularityError(), a + " / " + b + ": gap " + gap);
            assertTrue(a.singularityError() < 1e-9, a.toString());
        }
    }

    /** The position error estimate covers the difference to a run at a tolerance a hundred times smaller. */
    @Test
    void thePositionErrorCoversATighterRun() {
        PowerFamilyClassifier tight = new PowerFamilyClassifier(SolverSettings.builder().tolerance(1e-15).build());
        PowerFamilyClassification a = classifier.classify(0, 0.2, 2.5);
        PowerFamilyClassification b = tight.classify(0, 0.2, 2.5);
        assertEquals(a.kind(), b.kind());
        assertTrue(Math.abs(a.firstSingularity() - b.firstSingularity()) <= a.singularityError(), a + " / " + b);
    }

    @Test
    void outsideTheFamilyIsRefused() {
        assertThrows(InvalidInputException.class, () -> classifier.classify(0, 1.0, 1.0));
        assertThrows(InvalidInputException.class, () -> classifier.classify(0, 0.2, 0.0));
        assertThrows(InvalidInputException.class, () -> classifier.classify(0, 0.2, Double.NaN));
    }

    /** Each cell of the map takes the colour of its row's kind; the picture is drawn from rows alone. */
    @Test
    void theMapColoursEachCellByItsKind(@TempDir Path dir) throws IOException {
        ParameterRange sigma = ParameterRange.linear("sigma", -0.5, 0.5, 2);
        ParameterRange b = ParameterRange.geometric("B", 0.5, 2, 2);
        List<PowerFamilyClassification> rows = List.of(
                new PowerFamilyClassification(0, -0.5, 0.5, "zero", 0.3, 1e-13, Double.NaN, Double.NaN),
                new PowerFamilyClassification(1, 0.5, 0.5, "none", Double.NaN, Double.NaN, 1.0, 1e-6),
                new PowerFamilyClassification(2, -0.5, 2, "pole", 0.3, 1e-13, Double.NaN, Double.NaN),
                new PowerFamilyClassification(3, 0.5, 2, "failed", Double.NaN, Double.NaN, Double.NaN, Double.NaN));
        Path png = dir.resolve("map.png");
        ScanMap.write(rows, sigma, b, png);
        BufferedImage img = ImageIO.read(png.toFile());
        // cell centres: plot area x in [90, 710], y in [60, 650]; B grows upwards
        Color zero = new Color(img.getRGB(200, 500));
        Color none = new Color(img.getRGB(600, 500));
        Color pole = new Color(img.getRGB(200, 200));
        Color failed = new Color(img.getRGB(600, 200));
        assertTrue(zero.getRed() > zero.getBlue() + 50, zero.toString());
        assertTrue(pole.getBlue() > pole.getRed() + 50, pole.toString());
        assertEquals(ScanMap.color(rows.get(1)), none);
        assertEquals(Color.BLACK, failed);
    }
}
