package org.tertius.connection.scan;

import org.hipparchus.analysis.solvers.BrentSolver;
import org.tertius.connection.match.DecayingConnection;
import org.tertius.core.TertiusException;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.core.step.SolverSettings;

/**
 * Classifies members of the decaying family of PIII(0, 0, 1, -1) by integration along the positive axis with
 * the core engine from the hand-over point of {@link DecayingConnection} down to {@link #X_MIN}:
 * sign changes of w on a grid (40 points per decade) mark zeros and poles, located by Brent's method
 * (Hipparchus) on w or 1/w.
 *
 * <p>Below X_MIN the behaviour follows from an invariant (derived here): with u = log w, t = log x and
 * u = t + L, the equation is L'' = delta e^(-2L) + x^4 e^(2L) (alpha = beta = 0, gamma = 1, delta = -1), and
 * without the x^4 term E = (L')^2/2 + delta e^(-2L)/2 = ((q - 1)^2 - x^2/w^2)/2, q = x w'/w, is conserved.
 * E > 0: w ~ B x^sigma with sigma = 1 - sqrt(2E); E = 0: logarithmic; E &lt; 0: e^L oscillates, zeros of w
 * accumulate at 0. For q &lt; 0 the same holds for 1/w with E = ((q + 1)^2 - x^2 w^2)/2 (poles accumulate).
 * At X_MIN = 1e-5 the neglected term changes E by about x^4 log^2 x, below 1e-18. Immutable, thread-safe.
 */
public final class DecayingClassifier {
    /** Lower end of the integrated window. */
    public static final double X_MIN = 1e-5;
    private static final int PER_DECADE = 40;
    private final SolverSettings settings;

    public DecayingClassifier(SolverSettings settings) {
        this.settings = settings;
    }

    /** The invariant E at X_MIN for the member lambda (continuous in lambda; zero at the edge 1/pi). */
    public double invariant(double lambda) {
        Painleve3Solution s = DecayingConnection.solution(lambda, settings);
        return invariant(s.evaluate(SurfacePoint.of(X_MIN, 0)));
    }

    static double invariant(Painleve3Value v) {
        double x = v.point().re();
        double w = v.w().getReal();
        double q = x * v.dw().getReal() / w;
        if (q >= 0) {
            return ((q - 1) * (q - 1) - x * x / (w * w)) / 2;
        }
        return ((q + 1) * (q + 1) - x * x * w * w) / 2;
    }

    public Classification classify(int index, double lambda) {
        Painleve3Value hand = DecayingConnection.middleValue(lambda);
        Painleve3Solution s = Painleve3Solution.builder(DecayingConnection.equation())
                .start(hand.point().z(), hand.w(), hand.dw()).settings(settings).build();
        double xHand = hand.point().re();
        double first = Double.NaN;
        String kind = "none";
        double prevX = xHand;
        double prevW = value(s, prevX);
        int n = (int) Math.ceil(PER_DECADE * Math.log10(xHand / X_MIN));
        for (int i = 1; i <= n; i++) {
            double x = xHand * Math.pow(X_MIN / xHand, (double) i / n);
            double w = value(s, x);
            if (Math.signum(w) != Math.signum(prevW)) {
                double[] loc = locate(s, x, prevX);
                first = loc[0];
                kind = loc[1] > 0 ? "pole" : "zero";
                break;
            }
            prevX = x;
            prevW = w;
        }
        Painleve3Value end = s.evaluate(SurfacePoint.of(X_MIN, 0));
        double e = invariant(end);
        double q = X_MIN * end.dw().getReal() / end.w().getReal();
        double tol = 1e-12;
        String atZero;
        double sigma = Double.NaN;
        if (e > tol) {
            atZero = "power";
            sigma = Math.signum(q) * (1 - Math.sqrt(2 * e));
        } else if (e >= -tol) {
            atZero = "logarithmic";
            sigma = Math.signum(q);
        } else {
            atZero = "accumulating";
        }
        boolean poleFree = Double.isNaN(first) && !"accumulating".equals(atZero);
        return new Classification(index, lambda, poleFree, first, kind, atZero, sigma, e);
    }

    private static double value(Painleve3Solution s, double x) {
        return s.evaluate(SurfacePoint.of(x, 0)).w().getReal();
    }

    /** {position, 1 for a pole or 0 for a zero} of the sign change of w in [a, b]. */
    private static double[] locate(Painleve3Solution s, double a, double b) {
        BrentSolver brent = new BrentSolver(1e-15, 1e-14);
        double x = brent.solve(200, y -> value(s, y), a, b);
        Painleve3Value v;
        try {
            v = s.evaluate(SurfacePoint.of(x, 0));
        } catch (TertiusException e) {
            return new double[] {x, 1};
        }
        return new double[] {x, v.w().norm() > 1 ? 1 : 0};
    }
}
