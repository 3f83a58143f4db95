package org.tertius.core.region;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.number.Cx;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.pade.PadeApproximant;
import org.tertius.core.pade.PolynomialRoots;
import org.tertius.core.piii.EngineView;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.step.Node;

/**
 * Poles and zeros of w in a rectangle of one sheet, read off the Pade approximants stored in the path tree:
 * the roots of the denominator (poles) and numerator (zeros) of the approximant of w at each node, in and
 * around its disk. A root is kept only if the lower-order approximant of the same node has a root next to it (a spurious
 * pole-zero pair of one approximant does not survive this), and the distance between the two roots is the
 * position error estimate. Roots found by several overlapping nodes are merged, keeping the copy with the
 * smallest position error, whose error is raised to the distance of any copy that disagrees beyond both
 * estimates. The leading coefficient is computed from the approximant: at a pole of w(tau) the
 * residue in tau is r p(s0)/q'(s0), so that w ~ c/(z - z0) with c = z0 r p(s0)/q'(s0); at a zero,
 * w' = (p'(s0)/q(s0)) / (r z0). When the form carries 1/w, the roles of numerator and denominator swap.
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

    /**
     * Finds the poles and zeros of w in the region of {@code grid} (a rectangle of one sheet or a strip in log z). Grow the tree over the
     * rectangle first (for example with {@link RegionSolver}); only singularities inside stored disks are seen.
     */
    public static List<Singularity> find(Painleve3Solution solution, Grid grid) {
        EngineView view = EngineView.of(solution);
        int comp = view.wComponent();
        boolean reciprocal = view.wComponentIsReciprocal();
        List<Candidate> all = new ArrayList<>();
        for (Node n : view.engine().nodes()) {
            if (!near(n, grid)) {
                continue;
            }
            PadeApproximant hi = n.approximant(comp);
            PadeApproximant lo = n.lowerApproximant(comp);
            collect(all, n, hi, lo, true, reciprocal ? Singularity.Kind.ZERO : Singularity.Kind.POLE, reciprocal, grid);
            collect(all, n, hi, lo, false, reciprocal ? Singularity.Kind.POLE : Singularity.Kind.ZERO, reciprocal, grid);
        }
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
            double d = Cx.abs(s.point().re() - c.s.point().re(), s.point().im() - c.s.point().im());
            if (d > s.error() + c.s.error()) {
                found.set(k, new Singularity(s.kind(), s.point(), s.lead(), d));
            }
        }
        found.sort(Comparator.comparing((Singularity s) -> s.kind()).thenComparingDouble(s -> s.point().re())
                .thenComparingDouble(s -> s.point().im()));
        return found;
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
    private static boolean near(Node n, Grid g) {
        if (g.logarithmic()) {
            double dx = Math.max(0, Math.max(g.re0() - n.tauRe(), n.tauRe() - g.re1()));
            double dy = Math.max(0, Math.max(g.im0() - n.tauIm(), n.tauIm() - g.im1()));
            return Math.hypot(dx, dy) <= INSIDE * n.radius();
        }
        SurfacePoint c = SurfacePoint.fromLog(n.tauRe(), n.tauIm());
        double reach = Cx.abs(c.re(), c.im()) * (Math.exp(INSIDE * n.radius()) - 1) + 1e-12;
        if (Math.abs(c.sheet() - g.sheet()) > 1 || n.radius() * INSIDE > Math.PI) {
            return Math.abs(c.sheet() - g.sheet()) <= 1 || n.radius() * INSIDE > Math.PI;
        }
        double dx = Math.max(0, Math.max(g.re0() - c.re(), c.re() - g.re1()));
        double dy = Math.max(0, Math.max(g.im0() - c.im(), c.im() - g.im1()));
        return Math.hypot(dx, dy) <= reach;
    }

    private static void collect(List<Candidate> out, Node n, PadeApproximant hi, PadeApproximant lo, boolean den,
                                Singularity.Kind kind, boolean reciprocal, Grid grid) {
        double[][] roots = den ? PolynomialRoots.roots(hi.denominatorRe(), hi.denominatorIm())
                : PolynomialRoots.roots(hi.numeratorRe(), hi.numeratorIm());
        boolean any = false;
        for (int j = 0; j < roots[0].length && !any; j++) {
            any = Cx.abs(roots[0][j], roots[1][j]) < INSIDE;
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
            double rad = Cx.abs(sr, si);
            if (!(rad < INSIDE)) {
                continue;
            }
            double near = Double.POSITIVE_INFINITY;
            for (int k = 0; k < check[0].length; k++) {
                near = Math.min(near, Cx.abs(check[0][k] - sr, check[1][k] - si));
            }
            if (!(near <= CONFIRM)) {
                continue;
            }
            // a root of the numerator next to one of the denominator is a spurious pair, not a pole or zero
            double pair = Double.POSITIVE_INFINITY;
            for (int k = 0; k < other[0].length; k++) {
                pair = Math.min(pair, Cx.abs(other[0][k] - sr, other[1][k] - si));
            }
            if (pair < DOUBLET) {
                continue;
            }
            double tr = n.tauRe() + n.radius() * sr;
            double ti = n.tauIm() + n.radius() * si;
            SurfacePoint p = SurfacePoint.fromLog(tr, ti);
            if (!grid.contains(p)) {
                continue;
            }
            Complex z0 = p.z();
            Complex lead = lead(hi, sr, si, den, reciprocal, n.radius(), z0);
            if (lead == null) {
                continue;
            }
            double err = (near + positionError(n, sr, si, den != reciprocal, lead, z0)) * n.radius() * z0.norm();
            out.add(new Candidate(new Singularity(kind, p, lead, err), rad));
        }
    }

    /**
     * The leading coefficient from the approximant f = P/Q of the carried component at the root s0 (of Q when
     * {@code den}, of P otherwise).
     */
    private static Complex lead(PadeApproximant a, double sr, double si, boolean den, boolean reciprocal,
                                double r, Complex z0) {
        Complex s0 = new Complex(sr, si);
        Complex p = horner(a.numeratorRe(), a.numeratorIm(), s0);
        Complex dp = derivative(a.numeratorRe(), a.numeratorIm(), s0);
        Complex q = horner(a.denominatorRe(), a.denominatorIm(), s0);
        Complex dq = derivative(a.denominatorRe(), a.denominatorIm(), s0);
        Complex zr = z0.multiply(r);
        Complex out;
        if (!reciprocal) {
            // w = P/Q: pole residue z0 r P/Q', zero slope (P'/Q) / (r z0)
            out = den ? zr.multiply(p).divide(dq) : dp.divide(q).divide(zr);
        } else {
            // w = Q/P: a root of Q is a zero of w with slope (Q'/P)/(r z0); a root of P is a pole with residue
            // z0 r Q/P'
            out = den ? dq.divide(p).divide(zr) : zr.multiply(q).divide(dp);
        }
        return Double.isFinite(out.getReal()) && Double.isFinite(out.getImaginary()) ? out : null;
    }

    /**
     * Error of the root position in units of the radius, from the error of the values: at a zero err(s0)/|f'|;
     * at a pole, the value error at distance d is err(s0 + d) and the pole moves by err d^2 / |c_s|, with
     * c_s = residue in s (c = z0 r c_s).
     */
    private static double positionError(Node n, double sr, double si, boolean pole, Complex lead, Complex z0) {
        int dim = n.dimension();
        double[] out = new double[2 * dim];
        double[] err = new double[dim];
        double scale = n.radius() * z0.norm();
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
                double d = Cx.abs(s.point().re() - c.point().re(), s.point().im() - c.point().im());
                if (d <= Math.max(1e-6 * (1 + c.point().z().norm()), 100 * (s.error() + c.error()))) {
                    return k;
                }
            }
        }
        return -1;
    }
}
