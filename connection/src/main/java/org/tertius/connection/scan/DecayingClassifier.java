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
 * E &gt; 0: w ~ B x^sigma with sigma = 1 - sqrt(2E); E = 0: logarithmic; E &lt; 0: e^L oscillates, zeros of w
 * accumulate at 0. 1/w solves the same equation, so the same holds for 1/w with E = ((q + 1)^2 - x^2 w^2)/2
 * (poles accumulate). Each form neglects a term, x^2 w^2 for w and x^2 / w^2 for 1/w; the one used is the one
 * whose neglected term is the smaller at the point (|w| &lt;= 1: w), see {@link Invariant}. (The sign of q chose
 * the form before: just past a zero of w, q &lt; 0 picked the 1/w form, which is not conserved there, and
 * labelled members with accumulating zeros "power" with sigma 23.3, 6.84 or -0.92.) Immutable, thread-safe.
 */
public final class DecayingClassifier {
    /** Lower end of the integrated window. */
    public static final double X_MIN = 1e-5;
    private static final int PER_DECADE = 40;
    /** Further points where the invariant must have the value it has at X_MIN (the second criterion). */
    static final double[] CHECK_POINTS = {X_MIN * Math.sqrt(10), 10 * X_MIN};
    /** The band of the invariant about 0 labelled logarithmic (as before the cross-checks). */
    static final double DECISION_FLOOR = 1e-12;
    private final SolverSettings settings;

    public DecayingClassifier(SolverSettings settings) {
        this.settings = settings;
    }

    /** The invariant E at X_MIN for the member lambda (continuous in lambda; zero at the edge 1/pi). */
    public double invariant(double lambda) {
        Painleve3Solution s = DecayingConnection.solution(lambda, settings);
        Painleve3Value v = s.evaluate(SurfacePoint.of(X_MIN, 0));
        return Invariant.at(v, Invariant.reciprocalFormAt(v)).value();
    }

    /**
     * The classification of the member lambda. The behaviour at 0 is read from the invariant at X_MIN, in the
     * form (w or 1/w) whose neglected term is the smaller there, and cross-checked: the invariant must be
     * conserved at {@link #CHECK_POINTS} further points within their error estimates, and a power law must have
     * |sigma| &lt; 1 (necessary: w ~ B x^sigma with |sigma| &gt;= 1 is not a solution of this equation at 0). A member
     * that fails a check is "undecided" (sigma NaN) rather than given a label it cannot have.
     */
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
        boolean reciprocal = Invariant.reciprocalFormAt(end);
        Invariant e = Invariant.at(end, reciprocal);
        boolean conserved = e.isFinite();
        for (double x : CHECK_POINTS) {
            conserved &= e.agreesWith(Invariant.at(s.evaluate(SurfacePoint.of(x, 0)), reciprocal));
        }
        Behaviour b = Behaviour.of(e, conserved);
        boolean poleFree = Double.isNaN(first) && ("power".equals(b.label) || "logarithmic".equals(b.label));
        return new Classification(index, lambda, poleFree, first, kind, b.label, b.sigma, e.value());
    }

    /** A label at 0 and its exponent. */
    static final class Behaviour {
        final String label;
        final double sigma;

        private Behaviour(String label, double sigma) {
            this.label = label;
            this.sigma = sigma;
        }

        /**
         * From the invariant: E &gt; 0 a power law, sigma = 1 - sqrt(2E) (form w) or sqrt(2E) - 1 (form 1/w), kept
         * only if |sigma| &lt; 1; |E| &lt;= {@link #DECISION_FLOOR} logarithmic (sigma = +-1); E &lt; 0 accumulating
         * zeros (form w) or poles (form 1/w); not conserved: undecided.
         */
        static Behaviour of(Invariant e, boolean conserved) {
            if (!conserved) {
                return new Behaviour("undecided", Double.NaN);
            }
            // the sign is decided at the floor, not at the (conservative) error of E: the edge lambda = 1/pi,
            // where E changes sign, is then found to about 1e-12 (measured 2e-14)
            double margin = DECISION_FLOOR;
            if (e.value() > margin) {
                double root = Math.sqrt(2 * e.value());
                double sigma = e.reciprocal() ? root - 1 : 1 - root;
                return Math.abs(sigma) < 1 ? new Behaviour("power", sigma) : new Behaviour("undecided", Double.NaN);
            }
            if (e.value() >= -margin) {
                return new Behaviour("logarithmic", e.reciprocal() ? -1 : 1);
            }
            return new Behaviour("accumulating", Double.NaN);
        }
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
