package org.tertius.core.region;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.IntStream;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.face.EngineReading;
import org.tertius.core.number.ComplexPairs;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.pade.PadeApproximant;
import org.tertius.core.pade.PolynomialRoots;
import org.tertius.core.step.Node;

/**
 * Poles and zeros of the first value of a solution (w, or q of a hierarchy member) in a rectangle of one sheet, read
 * off the Pade approximants stored in the path tree: the roots of the denominator (poles) and numerator (zeros) of
 * the approximant of the state component that carries that value (see {@link EngineReading}) at each node, in and
 * around its disk. A root is kept only if the lower-order approximant of the same node has a root next to it (a spurious
 * pole-zero pair of one approximant does not survive this), and the distance between the two roots is the
 * position error estimate. Roots found by several overlapping nodes are merged, keeping the copy with the
 * smallest position error, whose error is raised to the distance of any copy that disagrees beyond both
 * estimates. The leading coefficient is computed from the approximant: with the value v = f y (f the reading's
 * factor) and y = P/Q in the scaled variable s = (tau - tau_n)/r, the residue of v in tau at a root s0 of Q is
 * f r P(s0)/Q'(s0), and in the solution's variable u it is that times du/d tau (z0 times it on a logarithmic
 * surface, where du/d tau = z); at a zero v' = f (P'(s0)/Q(s0)) / r divided by du/d tau. When the value is f / y, the
 * roles of numerator and denominator swap and f enters inverted.
 */
public final class PoleFinder {
    /**
     * Roots are taken up to this multiple of a node's radius: disks stop at the nearest singularity of the
     * system, so poles lie on or just beyond their rims, where the approximants still locate them well (pole
     * vaulting relies on it); the lower-order check and the merge keep the best-placed copy.
     */
    private static final double INSIDE = 1.6;
    /** The lower-order root must lie within this distance (in units of the radius) to confirm a root. */
    private static final double CONFIRM = 1e-3;
    /** A numerator root this close (in units of the radius) to a denominator root makes a spurious pair. */
    private static final double DOUBLET = 1e-3;
    /** Distance (in units of the radius) from a pole at which its value error is read. */
    private static final double PROBE = 0.05;

    private PoleFinder() {
    }

    /** The poles and zeros of the first value in the region of a grid result, from the tree it was read from. */
    public static List<Singularity> find(GridResult result) {
        return find(result.tree(), result.grid());
    }

    /**
     * Finds the poles and zeros of the first value of a solution in the region of {@code grid} (a rectangle of one
     * sheet or a strip in log z), from a tree grown over it ({@link RegionTree}); only singularities inside stored
     * disks are seen.
     *
     * @throws InvalidInputException for a solution not integrated by the engine (it has no path tree to read)
     */
    public static List<Singularity> find(RegionTree tree, Grid grid) {
        ComputedSolution solution = tree.solution();
        EngineReading reading = tree.reading();
        if (reading == null) {
            throw new InvalidInputException("solution", "poles and zeros are read off the engine's path tree; this"
                    + " solution (" + solution.methodDescription() + ") is not integrated by the engine");
        }
        int comp = reading.primaryComponent();
        boolean reciprocal = reading.primaryReciprocal();
        boolean logarithmic = solution.coordinate().hasSheets();
        // the candidates of each node on all processors (a node's roots depend on it alone), then in node order
        List<Node> nodes = tree.nodes();
        List<List<Candidate>> perNode = IntStream.range(0, nodes.size()).parallel().mapToObj(k -> {
            Node n = nodes.get(k);
            List<Candidate> own = new ArrayList<>();
            if (near(reading, logarithmic, n, grid)) {
                PadeApproximant hi = n.approximant(comp);
                PadeApproximant lo = n.lowerApproximant(comp);
                collect(own, reading, n, hi, lo, true, reciprocal ? Singularity.Kind.ZERO : Singularity.Kind.POLE,
                        grid);
                collect(own, reading, n, hi, lo, false, reciprocal ? Singularity.Kind.POLE : Singularity.Kind.ZERO,
                        grid);
            }
            return own;
        }).collect(Collectors.toList());
        List<Candidate> all = new ArrayList<>();
        perNode.forEach(all::addAll);
        // the best-determined copy first (smallest position error, then nearest to its node's centre), then merge
        all.sort(Comparator.comparingDouble((Candidate c) -> c.s.error()).thenComparingDouble(c -> c.centrality)
                .thenComparingDouble(c -> c.s.point().re()).thenComparingDouble(c -> c.s.point().im()));
        List<Singularity> found = new ArrayList<>();
        for (Candidate c : all) {
            int k = indexOfKnown(found, c.s);
            if (k < 0) {
                found.add(c.s);
                continue;
            }
            // two copies of one singularity that disagree beyond their estimates: the kept one's error becomes
            // at least their distance, so that no position is claimed more precisely than the copies agree
            Singularity s = found.get(k);
            double d = ComplexPairs.abs(s.point().re() - c.s.point().re(), s.point().im() - c.s.point().im());
            if (d > s.error() + c.s.error()) {
                found.set(k, new Singularity(s.kind(), s.point(), s.lead(), d));
            }
        }
        found.sort(Comparator.comparing((Singularity s) -> s.kind()).thenComparingDouble(s -> s.point().re())
                .thenComparingDouble(s -> s.point().im()));
        return found;
    }

    /**
     * The poles of the first value within half a spacing of the segment through the first and last of the points
     * (equally spaced points of a line of one sheet), from the tree grown along them
     * ({@link RegionTree#growAlong}).
     */
    public static List<Singularity> alongLine(RegionTree tree, List<SurfacePoint> points) {
        List<Singularity> out = new ArrayList<>();
        if (points.size() < 2) {
            return out;
        }
        SurfacePoint a = points.get(0);
        SurfacePoint b = points.get(points.size() - 1);
        double h = Math.hypot(b.re() - a.re(), b.im() - a.im()) / (points.size() - 1);
        double m = Math.max(h, 1e-9);
        Grid box = Grid.of(Math.min(a.re(), b.re()) - m, Math.max(a.re(), b.re()) + m, 2,
                Math.min(a.im(), b.im()) - m, Math.max(a.im(), b.im()) + m, 2, a.sheet());
        for (Singularity p : find(tree, box)) {
            if (p.kind() == Singularity.Kind.POLE && distanceToSegment(p.point(), a, b) <= 0.5 * h + 1e-12) {
                out.add(p);
            }
        }
        return out;
    }

    private static double distanceToSegment(SurfacePoint p, SurfacePoint a, SurfacePoint b) {
        double dx = b.re() - a.re();
        double dy = b.im() - a.im();
        double t = ((p.re() - a.re()) * dx + (p.im() - a.im()) * dy) / (dx * dx + dy * dy);
        t = Math.max(0, Math.min(1, t));
        return Math.hypot(p.re() - (a.re() + t * dx), p.im() - (a.im() + t * dy));
    }

    private static final class Candidate {
        final Singularity s;
        final double centrality;

        Candidate(Singularity s, double centrality) {
            this.s = s;
            this.centrality = centrality;
        }
    }

    /** Whether the node's search window (INSIDE radii) can reach the rectangle on the grid's sheet. */
    private static boolean near(EngineReading reading, boolean logarithmic, Node n, Grid g) {
        SurfacePoint c = reading.point(n.tauRe(), n.tauIm());
        if (g.logarithmic()) {
            double dx = Math.max(0, Math.max(g.re0() - c.logRe(), c.logRe() - g.re1()));
            double dy = Math.max(0, Math.max(g.im0() - c.logIm(), c.logIm() - g.im1()));
            return Math.hypot(dx, dy) <= INSIDE * n.radius();
        }
        if (!logarithmic) {
            double reach = INSIDE * n.radius() / reading.coordinateDerivative(c).norm() + 1e-12;
            double dx = Math.max(0, Math.max(g.re0() - c.re(), c.re() - g.re1()));
            double dy = Math.max(0, Math.max(g.im0() - c.im(), c.im() - g.im1()));
            return Math.hypot(dx, dy) <= reach;
        }
        double reach = ComplexPairs.abs(c.re(), c.im()) * (Math.exp(INSIDE * n.radius()) - 1) + 1e-12;
        if (Math.abs(c.sheet() - g.sheet()) > 1 || n.radius() * INSIDE > Math.PI) {
            return Math.abs(c.sheet() - g.sheet()) <= 1 || n.radius() * INSIDE > Math.PI;
        }
        double dx = Math.max(0, Math.max(g.re0() - c.re(), c.re() - g.re1()));
        double dy = Math.max(0, Math.max(g.im0() - c.im(), c.im() - g.im1()));
        return Math.hypot(dx, dy) <= reach;
    }

    private static void collect(List<Candidate> out, EngineReading reading, Node n, PadeApproximant hi,
                                PadeApproximant lo, boolean den, Singularity.Kind kind, Grid grid) {
        boolean reciprocal = reading.primaryReciprocal();
        double[][] roots = den ? PolynomialRoots.roots(hi.denominatorRe(), hi.denominatorIm())
                : PolynomialRoots.roots(hi.numeratorRe(), hi.numeratorIm());
        boolean any = false;
        for (int j = 0; j < roots[0].length && !any; j++) {
            any = ComplexPairs.abs(roots[0][j], roots[1][j]) < INSIDE;
        }
        if (!any) {
            return;
        }
        double[][] check = den ? PolynomialRoots.roots(lo.denominatorRe(), lo.denominatorIm())
                : PolynomialRoots.roots(lo.numeratorRe(), lo.numeratorIm());
        double[][] other = den ? PolynomialRoots.roots(hi.numeratorRe(), hi.numeratorIm())
                : PolynomialRoots.roots(hi.denominatorRe(), hi.denominatorIm());
        for (int j = 0; j < roots[0].length; j++) {
            double sr = roots[0][j];
            double si = roots[1][j];
            double rad = ComplexPairs.abs(sr, si);
            if (!(rad < INSIDE)) {
                continue;
            }
            double near = Double.POSITIVE_INFINITY;
            for (int k = 0; k < check[0].length; k++) {
                near = Math.min(near, ComplexPairs.abs(check[0][k] - sr, check[1][k] - si));
            }
            if (!(near <= CONFIRM)) {
                continue;
            }
            // a root of the numerator next to one of the denominator is a spurious pair, not a pole or zero
            double pair = Double.POSITIVE_INFINITY;
            for (int k = 0; k < other[0].length; k++) {
                pair = Math.min(pair, ComplexPairs.abs(other[0][k] - sr, other[1][k] - si));
            }
            if (pair < DOUBLET) {
                continue;
            }
            double tr = n.tauRe() + n.radius() * sr;
            double ti = n.tauIm() + n.radius() * si;
            SurfacePoint p = reading.point(tr, ti);
            if (!grid.contains(p)) {
                continue;
            }
            Complex du = reading.coordinateDerivative(p);
            Complex lead = lead(hi, sr, si, den, reciprocal, n.radius(), du, reading.primaryFactor(p));
            if (lead == null) {
                continue;
            }
            double err = (near + positionError(n, sr, si, den != reciprocal, lead, du)) * n.radius() * du.norm();
            out.add(new Candidate(new Singularity(kind, p, lead, err), rad));
        }
    }

    /**
     * The leading coefficient from the approximant P/Q of the carried component at the root s0 (of Q when
     * {@code den}, of P otherwise), with the value's factor f and du/d tau at the root.
     */
    private static Complex lead(PadeApproximant a, double sr, double si, boolean den, boolean reciprocal,
                                double r, Complex du, Complex factor) {
        Complex s0 = new Complex(sr, si);
        Complex p = horner(a.numeratorRe(), a.numeratorIm(), s0);
        Complex dp = derivative(a.numeratorRe(), a.numeratorIm(), s0);
        Complex q = horner(a.denominatorRe(), a.denominatorIm(), s0);
        Complex dq = derivative(a.denominatorRe(), a.denominatorIm(), s0);
        // r du/d tau: the scaled variable's step in units of the solution's variable (z0 r for tau = log z)
        Complex zr = du.multiply(r);
        Complex out;
        if (!reciprocal) {
            // v = f P/Q: pole residue f zr P/Q', zero slope f (P'/Q) / zr
            out = den ? zr.multiply(p).divide(dq) : dp.divide(q).divide(zr);
        } else {
            // v = f Q/P: a root of Q is a zero of v with slope f (Q'/P)/zr; a root of P is a pole with residue
            // f zr Q/P'
            out = den ? dq.divide(p).divide(zr) : zr.multiply(q).divide(dp);
        }
        if (!factor.equals(Complex.ONE)) {
            out = out.multiply(factor);
        }
        return Double.isFinite(out.getReal()) && Double.isFinite(out.getImaginary()) ? out : null;
    }

    /**
     * Error of the root position in units of the radius, from the error of the values: at a zero err(s0)/|f'|;
     * at a pole, the value error at distance d is err(s0 + d) and the pole moves by err d^2 / |c_s|, with
     * c_s = residue in s (c = z0 r c_s).
     */
    private static double positionError(Node n, double sr, double si, boolean pole, Complex lead, Complex du) {
        int dim = n.dimension();
        double[] out = new double[2 * dim];
        double[] err = new double[dim];
        double scale = n.radius() * du.norm();
        if (pole) {
            n.evaluateScaled(sr + PROBE, si, out, null, err);
            double maxErr = 0;
            for (double e : err) {
                maxErr = Math.max(maxErr, e);
            }
            double cs = lead.norm() / scale;
            return maxErr * PROBE * PROBE / Math.max(cs, 1e-300);
        }
        n.evaluateScaled(sr, si, out, null, err);
        double slope = lead.norm() * scale;
        return err[0] / Math.max(slope, 1e-300);
    }

    private static Complex horner(double[] re, double[] im, Complex s) {
        Complex v = Complex.ZERO;
        for (int k = re.length - 1; k >= 0; k--) {
            v = v.multiply(s).add(new Complex(re[k], im[k]));
        }
        return v;
    }

    private static Complex derivative(double[] re, double[] im, Complex s) {
        Complex v = Complex.ZERO;
        for (int k = re.length - 1; k >= 1; k--) {
            v = v.multiply(s).add(new Complex(re[k] * k, im[k] * k));
        }
        return v;
    }

    private static int indexOfKnown(List<Singularity> found, Singularity c) {
        for (int k = 0; k < found.size(); k++) {
            Singularity s = found.get(k);
            if (s.kind() == c.kind() && s.point().sheet() == c.point().sheet()) {
                double d = ComplexPairs.abs(s.point().re() - c.point().re(), s.point().im() - c.point().im());
                if (d <= Math.max(1e-6 * (1 + c.point().z().norm()), 100 * (s.error() + c.error()))) {
                    return k;
                }
            }
        }
        return -1;
    }
}
