package org.tertius.connection.scan;

import java.util.List;
import java.util.Map;
import org.tertius.connection.family.Families;
import org.tertius.core.InvalidInputException;
import org.tertius.core.TertiusException;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.core.region.Grid;
import org.tertius.core.region.PoleFinder;
import org.tertius.core.region.RegionTree;
import org.tertius.core.region.Singularity;
import org.tertius.core.step.SolverSettings;

/**
 * Classifies the members w ~ B x^sigma (x -&gt; 0+, |sigma| &lt; 1, B &gt; 0) of PIII(0, 0, 1, -1) by their first
 * zero or pole on the positive axis, the question behind the critical curve of solution selection: the members
 * that stay pole-free and tend to 1 at +infinity lie on the curve B = B(sigma) of McCoy, Tracy and Wu
 * (J. Math. Phys. 18 (1977) 1058; {@link org.tertius.connection.closed.McCoyTracyWu}); above it (larger B) the
 * first singularity is a pole, below it a zero, and it moves out to +infinity as the curve is approached (the
 * deviation grows like e^(2x)). Members with B &lt; 0 are the images w -&gt; -w of these.
 *
 * <p>Method: the member is built by {@link Families} (its series at 0) and integrated by the core engine. Its
 * value at {@link #WINDOW_START} is compared with B x^sigma (a relative deviation above
 * {@link #POWER_LAW_DEVIATION} means that a zero, a pole or a correction of order one lies below: kind "below").
 * Then w is sampled outwards, 40 points per decade up to x = 1 and every 0.025 up to {@link #WINDOW_END}; w is
 * real and changes sign at its zeros (simple, w' = +-1) and poles (simple, residue +-1), so the first sign change
 * brackets the first singularity, whose kind, position and position error are read from the Pade approximants
 * of the path tree ({@link PoleFinder}; if it finds none there, the kind follows from |w| at the bracket's ends and
 * the position is the bracket's midpoint with half its width as error). Immutable, thread-safe.
 */
public final class PowerFamilyClassifier {
    /** The equation of the family. */
    public static final Painleve3 EQUATION = Painleve3.of(0, 0, 1, -1);
    /** Start of the classified window. */
    public static final double WINDOW_START = 1e-4;
    /** End of the classified window. */
    public static final double WINDOW_END = 10;
    /** Largest |w / (B x^sigma) - 1| at WINDOW_START for which the power behaviour is taken to hold below it. */
    public static final double POWER_LAW_DEVIATION = 0.5;
    private static final int PER_DECADE = 40;
    private static final int LINEAR_SAMPLES = 360;
    private final SolverSettings settings;

    public PowerFamilyClassifier(SolverSettings settings) {
        this.settings = settings;
    }

    /**
     * @throws InvalidInputException unless |sigma| &lt; 1 and 0 &lt; B &lt; infinity
     * @throws TertiusException if the member cannot be integrated to the accuracy
     */
    public PowerFamilyClassification classify(int index, double sigma, double b) {
        if (!(Math.abs(sigma) < 1)) {
            throw new InvalidInputException("sigma", "must lie in (-1, 1) for the power family, got " + sigma);
        }
        if (!(b > 0 && b < Double.POSITIVE_INFINITY)) {
            throw new InvalidInputException("B", "must be positive and finite (B < 0 is the image w -> -w), got " + b);
        }
        Painleve3Solution s = Families.create(EQUATION, "power",
                Map.of("sigma", Double.toString(sigma), "B", Double.toString(b)), settings);
        double prevX = WINDOW_START;
        double prevW = value(s, prevX, prevX).w().getReal();
        if (!(Math.abs(prevW / (b * Math.pow(prevX, sigma)) - 1) <= POWER_LAW_DEVIATION)) {
            return new PowerFamilyClassification(index, sigma, b, "below", Double.NaN, Double.NaN, Double.NaN,
                    Double.NaN);
        }
        Painleve3Value v = null;
        int decades = (int) Math.round(-Math.log10(WINDOW_START));
        int n = decades * PER_DECADE + LINEAR_SAMPLES;
        for (int i = 1; i <= n; i++) {
            double x = i <= decades * PER_DECADE ? Math.pow(10, -decades + (double) i / PER_DECADE)
                    : 1 + (WINDOW_END - 1) * (i - decades * PER_DECADE) / LINEAR_SAMPLES;
            v = value(s, x, x - prevX);
            double w = v.w().getReal();
            if (Math.signum(w) != Math.signum(prevW)) {
                return singularity(index, sigma, b, s, prevX, prevW, v.point().re(), w);
            }
            prevX = v.point().re();
            prevW = w;
        }
        return new PowerFamilyClassification(index, sigma, b, "none", Double.NaN, Double.NaN, v.w().getReal(),
                v.errW());
    }

    /**
     * The value at x, or, if x cannot be reached to the accuracy (a point next to a pole), at x + 0.3 spacing.
     * The window's end is never moved.
     */
    private static Painleve3Value value(Painleve3Solution s, double x, double spacing) {
        try {
            return s.evaluate(SurfacePoint.of(x, 0));
        } catch (TertiusException e) {
            if (x >= WINDOW_END) {
                throw e;
            }
            return s.evaluate(SurfacePoint.of(Math.min(x + 0.3 * spacing, WINDOW_END), 0));
        }
    }

    private static PowerFamilyClassification singularity(int index, double sigma, double b, Painleve3Solution s,
                                                         double xa, double wa, double xb, double wb) {
        double width = xb - xa;
        List<Singularity> found = PoleFinder.find(RegionTree.current(s), Grid.of(xa, xb, 2, -width, width, 2, 0));
        Singularity first = null;
        for (Singularity c : found) {
            double re = c.point().re();
            boolean real = Math.abs(c.point().im()) <= 0.1 * width;
            boolean inside = re >= xa - c.error() && re <= xb + c.error();
            if (real && inside && (first == null || re < first.point().re())) {
                first = c;
            }
        }
        if (first == null) {
            String kind = Math.max(Math.abs(wa), Math.abs(wb)) > 1 ? "pole" : "zero";
            return new PowerFamilyClassification(index, sigma, b, kind, 0.5 * (xa + xb), 0.5 * width, Double.NaN,
                    Double.NaN);
        }
        double error = Math.max(first.error(), Math.abs(first.point().im()));
        return new PowerFamilyClassification(index, sigma, b, first.kind().label(), first.point().re(), error,
                Double.NaN, Double.NaN);
    }
}
