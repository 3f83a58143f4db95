package org.tertius.cli;

import java.util.List;
import java.util.Locale;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ExactPoint;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.region.Grid;

/**
 * The bounds on every quantity that sets the work of a command, checked before anything is computed or written, with
 * an estimate of the time the refused request would have taken. The estimates come from measured rates on a 2-core
 * machine (README, Benchmarks): about 3.5 path-tree nodes per unit area of a Painleve III pole field at 0.4 ms per
 * node, 2 nodes per unit length of a line, and about 0.1 s per point at 100 digits growing like the square of the
 * digits. They are orders of magnitude, not promises.
 */
final class WorkLimits {
    /** The largest |z| (or |x|) of a target, line or region. */
    static final double MAX_MODULUS = 1e4;
    /** The most points of a double-precision line. */
    static final int MAX_LINE_POINTS = 10_000_000;
    /** The most points computed to many digits in one command. */
    static final int MAX_PRECISE_POINTS = 100_000;
    /** The widest range of the argument in a strip in log z (100 sheets). */
    static final double MAX_ARGUMENT_RANGE = 200 * Math.PI;
    private static final double NODES_PER_AREA = 3.5;
    private static final double NODES_PER_LENGTH = 2;
    private static final double SECONDS_PER_NODE = 4e-4;
    /** Requests estimated to take longer than this are refused. */
    static final double MAX_SECONDS = 6 * 3600;

    private WorkLimits() {
    }

    /** Targets: each within {@link #MAX_MODULUS}. */
    static void checkTargets(String option, List<SurfacePoint> points) {
        for (SurfacePoint p : points) {
            checkModulus(option, p.re(), p.im(), 0);
        }
    }

    /** A line of points: count and extent. */
    static void checkLine(String option, int count, double reA, double imA, double reB, double imB) {
        if (count > MAX_LINE_POINTS) {
            throw new InvalidInputException(option, count + " points is more than the " + MAX_LINE_POINTS + " allowed ("
                    + String.format(Locale.ROOT, "about %.0f MB of output", count * 250e-6)
                    + "); split the line into several tables");
        }
        double length = Math.hypot(reB - reA, imB - imA);
        checkModulus(option, reA, imA, NODES_PER_LENGTH * length);
        checkModulus(option, reB, imB, NODES_PER_LENGTH * length);
    }

    /** A region: the rectangle's corners, or a strip's radius and argument range. */
    static void checkRegion(String option, Grid g) {
        if (g.logarithmic()) {
            double r = Math.exp(g.re1());
            double range = g.im1() - g.im0();
            if (range > MAX_ARGUMENT_RANGE) {
                throw new InvalidInputException(option, String.format(Locale.ROOT, "the strip spans %.0f sheets; at most"
                        + " %.0f are allowed (an argument range up to %.0f): each sheet is a pole field of its own",
                        range / (2 * Math.PI), MAX_ARGUMENT_RANGE / (2 * Math.PI), MAX_ARGUMENT_RANGE));
            }
            double area = 0.5 * range * (r * r - Math.exp(2 * g.re0()));
            checkModulus(option, r, 0, NODES_PER_AREA * area);
            return;
        }
        double area = (g.re1() - g.re0()) * (g.im1() - g.im0());
        for (double re : new double[] {g.re0(), g.re1()}) {
            for (double im : new double[] {g.im0(), g.im1()}) {
                checkModulus(option, re, im, NODES_PER_AREA * area);
            }
        }
    }

    /** Points to many digits: count and extent. */
    static void checkPrecise(String option, List<ExactPoint> points, int digits) {
        if (points.size() > MAX_PRECISE_POINTS) {
            double seconds = points.size() * 0.1 * Math.pow(digits / 100.0, 2);
            throw new InvalidInputException(option, points.size() + " points to " + digits + " digits is more than the "
                    + MAX_PRECISE_POINTS + " allowed in one command (" + duration(seconds) + " estimated); split the"
                    + " table");
        }
        for (ExactPoint p : points) {
            SurfacePoint q = p.toSurfacePoint();
            checkModulus(option, q.re(), q.im(), 0);
        }
    }

    private static void checkModulus(String option, double re, double im, double nodes) {
        if (nodes * SECONDS_PER_NODE > MAX_SECONDS) {
            throw new InvalidInputException(option, String.format(Locale.ROOT, "covers a pole field too large for one"
                    + " run: about %.1e path-tree nodes, %s estimated (at most %s); choose a smaller region", nodes,
                    duration(nodes * SECONDS_PER_NODE), duration(MAX_SECONDS)));
        }
        double m = Math.hypot(re, im);
        if (!(m <= MAX_MODULUS)) {
            String work = nodes > 0 ? String.format(Locale.ROOT, " (about %.1e path-tree nodes, %s, estimated)", nodes,
                    duration(nodes * SECONDS_PER_NODE)) : "";
            throw new InvalidInputException(option, String.format(Locale.ROOT, "reaches |z| = %.3g; at most %.0e is"
                    + " allowed, since the work grows with the area of the pole field crossed%s", m, MAX_MODULUS, work));
        }
    }

    /** A duration in words. */
    static String duration(double seconds) {
        if (seconds < 120) {
            return String.format(Locale.ROOT, "%.0f s", seconds);
        }
        if (seconds < 7200) {
            return String.format(Locale.ROOT, "%.0f min", seconds / 60);
        }
        if (seconds < 172800) {
            return String.format(Locale.ROOT, "%.0f h", seconds / 3600);
        }
        return String.format(Locale.ROOT, "%.0f days", seconds / 86400);
    }
}
