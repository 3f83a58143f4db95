package org.tertius.cli;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ComplexText;
import org.tertius.core.number.SurfacePoint;

/** Parsing of target lists, lines and grids. */
final class Targets {
    private Targets() {
    }

    /** "3+2i,-1.5,2.5e-3-4i" on one sheet. */
    static List<SurfacePoint> list(String option, String text, int sheet) {
        if (text == null || text.isBlank()) {
            throw new InvalidInputException(option, "at least one target is required, e.g. " + option + " 3+2i,-1.5");
        }
        List<SurfacePoint> out = new ArrayList<>();
        for (String part : text.split(",")) {
            Complex z = ComplexText.parse(option, part);
            if (z.getReal() == 0 && z.getImaginary() == 0) {
                throw new InvalidInputException(option, "target 0 is the branch point of the equation; choose z != 0");
            }
            out.add(SurfacePoint.of(z, sheet));
        }
        return out;
    }

    /** "A:B:N" with complex A, B and N >= 2 points (N = 1 gives A). */
    static List<SurfacePoint> line(String option, String text, int sheet) {
        String[] p = text == null ? new String[0] : text.split(":");
        if (p.length != 3) {
            throw new InvalidInputException(option, "expected A:B:N with complex end points and a count, e.g. 0.5:10:200");
        }
        Complex a = ComplexText.parse(option + " (start)", p[0]);
        Complex b = ComplexText.parse(option + " (end)", p[1]);
        int n = count(option, p[2], 1);
        if (n > 1 && a.equals(b)) {
            throw new InvalidInputException(option, "empty range: the end points are equal");
        }
        List<SurfacePoint> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            double t = n == 1 ? 0 : (double) i / (n - 1);
            Complex z = a.add(b.subtract(a).multiply(t));
            if (z.getReal() == 0 && z.getImaginary() == 0) {
                throw new InvalidInputException(option, "the line passes through z = 0, the branch point; shift it");
            }
            out.add(SurfacePoint.of(z, sheet));
        }
        return out;
    }

    static int count(String option, String text, int min) {
        int n;
        try {
            n = Integer.parseInt(text.trim());
        } catch (NumberFormatException e) {
            throw new InvalidInputException(option, "the point count must be an integer, got '" + text + "'");
        }
        if (n < min) {
            throw new InvalidInputException(option, "the point count must be at least " + min + ", got " + n);
        }
        return n;
    }
}
