package org.tertius.cli;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.face.Coordinate;
import org.tertius.core.number.ComplexText;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.ExactPoint;
import org.tertius.core.number.SurfacePoint;

/**
 * Parsing of target lists and lines on the surface of a solution (its coordinate decides whether 0 is a point and
 * whether sheets exist), in double precision or, for --digits, exactly.
 */
final class Targets {
    private Targets() {
    }

    /** "3+2i,-1.5,2.5e-3-4i" on one sheet. */
    static List<SurfacePoint> list(String option, String text, int sheet, Coordinate coordinate) {
        List<SurfacePoint> out = new ArrayList<>();
        for (String part : parts(option, text)) {
            Complex z = ComplexText.parse(option, part);
            out.add(point(option, z, sheet, coordinate, "target 0 is the branch point of the equation; choose z != 0"));
        }
        WorkLimits.checkTargets(option, out);
        return out;
    }

    /** The same list with every target kept exact (decimals and rationals as typed). */
    static List<ExactPoint> exactList(String option, String text, int sheet, Coordinate coordinate) {
        List<ExactPoint> out = new ArrayList<>();
        for (String part : parts(option, text)) {
            ExactNumber z = ExactText.parse(option, part);
            point(option, z.toComplex(), sheet, coordinate, "target 0 is the branch point of the equation; choose"
                    + " z != 0");
            out.add(ExactPoint.of(z, sheet));
        }
        return out;
    }

    private static String[] parts(String option, String text) {
        if (text == null || text.isBlank()) {
            throw new InvalidInputException(option, "at least one target is required, e.g. " + option + " 3+2i,-1.5");
        }
        return text.split(",");
    }

    /** "A:B:N" with complex A, B and N &gt;= 2 points (N = 1 gives A). */
    static List<SurfacePoint> line(String option, String text, int sheet, Coordinate coordinate) {
        String[] p = lineParts(option, text);
        Complex a = ComplexText.parse(option + " (start)", p[0]);
        Complex b = ComplexText.parse(option + " (end)", p[1]);
        int n = count(option, p[2], 1);
        if (n > 1 && a.equals(b)) {
            throw new InvalidInputException(option, "empty range: the end points are equal");
        }
        WorkLimits.checkLine(option, n, a.getReal(), a.getImaginary(), b.getReal(), b.getImaginary());
        List<SurfacePoint> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            double t = n == 1 ? 0 : (double) i / (n - 1);
            Complex z = a.add(b.subtract(a).multiply(t));
            out.add(point(option, z, sheet, coordinate, "the line passes through z = 0, the branch point; shift it"));
        }
        return out;
    }

    /** The same line with exact abscissae: A + (B - A) i / (N - 1), exactly. */
    static List<ExactPoint> exactLine(String option, String text, int sheet, Coordinate coordinate) {
        String[] p = lineParts(option, text);
        ExactNumber a = ExactText.parse(option + " (start)", p[0]);
        ExactNumber b = ExactText.parse(option + " (end)", p[1]);
        int n = count(option, p[2], 1);
        if (n > 1 && a.equals(b)) {
            throw new InvalidInputException(option, "empty range: the end points are equal");
        }
        WorkLimits.checkLine(option, n, a.toComplex().getReal(), a.toComplex().getImaginary(), b.toComplex().getReal(),
                b.toComplex().getImaginary());
        List<ExactPoint> out = new ArrayList<>();
        ExactNumber step = b.subtract(a);
        for (int i = 0; i < n; i++) {
            ExactNumber z = i == 0 ? a : i == n - 1 ? b : a.add(step.scale(i, n - 1));
            point(option, z.toComplex(), sheet, coordinate, "the line passes through z = 0, the branch point; shift"
                    + " it");
            out.add(ExactPoint.of(z, sheet));
        }
        return out;
    }

    private static String[] lineParts(String option, String text) {
        String[] p = text == null ? new String[0] : text.split(":");
        if (p.length != 3) {
            throw new InvalidInputException(option, "expected A:B:N with complex end points and a count, e.g. 0.5:10:200");
        }
        return p;
    }

    private static SurfacePoint point(String option, Complex z, int sheet, Coordinate coordinate, String atBranch) {
        if (coordinate.hasSheets() && z.getReal() == 0 && z.getImaginary() == 0) {
            throw new InvalidInputException(option, atBranch);
        }
        return coordinate.point(option, z.getReal(), z.getImaginary(), sheet);
    }

    static int count(String option, String text, int min) {
        int n;
        try {
            n = Integer.parseInt(text.trim());
        } catch (NumberFormatException e) {
            throw new InvalidInputException(option, "the point count must be an integer in [" + min + ", "
                    + WorkLimits.MAX_LINE_POINTS + "], got '" + text + "'");
        }
        if (n < min) {
            throw new InvalidInputException(option, "the point count must be at least " + min + ", got " + n);
        }
        return n;
    }
}
