package org.tertius.core.region;

import java.util.Locale;
import org.tertius.core.InvalidInputException;
import org.tertius.core.face.Coordinate;
import org.tertius.core.number.SurfacePoint;

/**
 * A rectangular grid of points: either of one sheet (nx points of Re z from re0 to re1 and ny points of Im z from
 * im0 to im1, both ends included), or a strip in log z covering several sheets ({@link #logStrip}: the
 * coordinates are log|z| and the continuous argument of z). Immutable.
 */
public final class Grid {
    /** Bytes per value and grid point held by a {@link GridResult} (real and imaginary part, error). */
    public static final long BYTES_PER_VALUE = 3 * 8;

    private final double re0;
    private final double re1;
    private final int nx;
    private final double im0;
    private final double im1;
    private final int ny;
    private final int sheet;
    private final boolean logarithmic;

    private Grid(String arg, double re0, double re1, int nx, double im0, double im1, int ny, int sheet) {
        this(arg, re0, re1, nx, im0, im1, ny, sheet, false);
    }

    private Grid(String arg, double re0, double re1, int nx, double im0, double im1, int ny, int sheet,
                 boolean logarithmic) {
        for (double v : new double[] {re0, re1, im0, im1}) {
            InvalidInputException.requireFinite(arg, v);
        }
        if (nx < 1 || ny < 1) {
            throw new InvalidInputException(arg, "point counts must be at least 1, got " + nx + " x " + ny);
        }
        if ((nx > 1 && !(re1 > re0)) || (ny > 1 && !(im1 > im0))) {
            throw new InvalidInputException(arg, "empty or inverted range: need RE0 < RE1 and IM0 < IM1 (got "
                    + re0 + ":" + re1 + ", " + im0 + ":" + im1 + ")");
        }
        if ((long) nx * ny > 50_000_000L) {
            throw new InvalidInputException(arg, nx + " x " + ny + " points is more than the 5e7 allowed");
        }
        this.re0 = re0;
        this.re1 = re1;
        this.nx = nx;
        this.im0 = im0;
        this.im1 = im1;
        this.ny = ny;
        this.sheet = sheet;
        this.logarithmic = logarithmic;
    }

    /**
     * A strip in log z: nx values of log|z| from logR0 to logR1 and ny values of the argument from arg0 to arg1
     * (the argument is continuous, so the strip may cover several sheets).
     */
    public static Grid logStrip(double logR0, double logR1, int nx, double arg0, double arg1, int ny) {
        return new Grid("log strip", logR0, logR1, nx, arg0, arg1, ny, 0, true);
    }

    /** Parses "LOGR0:LOGR1:NX,ARG0:ARG1:NY" as a strip in log z. */
    public static Grid parseLogStrip(String argument, String text) {
        Grid g = parse(argument, text, 0);
        return new Grid(argument, g.re0, g.re1, g.nx, g.im0, g.im1, g.ny, 0, true);
    }

    /** Whether this is a strip in log z (coordinates log|z| and arg z) rather than a rectangle of one sheet. */
    public boolean logarithmic() {
        return logarithmic;
    }

    /** Rows j0..j1 of this grid, as a grid of the same kind. */
    public Grid rows(int j0, int j1) {
        return new Grid("grid", re0, re1, nx, im(j0), im(j1), j1 - j0 + 1, sheet, logarithmic);
    }

    /** Whether a point of the surface lies in the grid's region. */
    public boolean contains(SurfacePoint p) {
        if (logarithmic) {
            return p.logRe() >= re0 && p.logRe() <= re1 && p.logIm() >= im0 && p.logIm() <= im1;
        }
        return p.sheet() == sheet && contains(p.re(), p.im());
    }

    /**
     * The spacing of the grid in |z|: the coordinate spacing, times the largest |z| of a log strip.
     */
    public double zSpacing() {
        return logarithmic ? spacing() * Math.exp(re1) : spacing();
    }

    public static Grid of(double re0, double re1, int nx, double im0, double im1, int ny, int sheet) {
        return new Grid("grid", re0, re1, nx, im0, im1, ny, sheet);
    }

    /**
     * Parses "RE0:RE1:NX,IM0:IM1:NY".
     *
     * @param argument the option name for messages
     */
    public static Grid parse(String argument, String text, int sheet) {
        String[] parts = text == null ? new String[0] : text.split(",");
        if (parts.length != 2) {
            throw new InvalidInputException(argument, "expected RE0:RE1:NX,IM0:IM1:NY, e.g. -10:10:401,-10:10:401");
        }
        String[] a = parts[0].split(":");
        String[] b = parts[1].split(":");
        if (a.length != 3 || b.length != 3) {
            throw new InvalidInputException(argument, "expected RE0:RE1:NX,IM0:IM1:NY, e.g. -10:10:401,-10:10:401");
        }
        try {
            return new Grid(argument, Double.parseDouble(a[0]), Double.parseDouble(a[1]), Integer.parseInt(a[2].trim()),
                    Double.parseDouble(b[0]), Double.parseDouble(b[1]), Integer.parseInt(b[2].trim()), sheet);
        } catch (NumberFormatException e) {
            throw new InvalidInputException(argument, "cannot read '" + text + "': " + e.getMessage());
        }
    }

    public int nx() {
        return nx;
    }

    public int ny() {
        return ny;
    }

    public int sheet() {
        return sheet;
    }

    public double re0() {
        return re0;
    }

    public double re1() {
        return re1;
    }

    public double im0() {
        return im0;
    }

    public double im1() {
        return im1;
    }

    public int size() {
        return nx * ny;
    }

    public double re(int i) {
        return nx == 1 ? re0 : re0 + (re1 - re0) * i / (nx - 1);
    }

    public double im(int j) {
        return ny == 1 ? im0 : im0 + (im1 - im0) * j / (ny - 1);
    }

    /** Spacing of the grid (the larger of the two), or the extent if a single point. */
    public double spacing() {
        double dx = nx > 1 ? (re1 - re0) / (nx - 1) : 0;
        double dy = ny > 1 ? (im1 - im0) / (ny - 1) : 0;
        return Math.max(dx, dy);
    }

    /** Whether z lies in the closed rectangle (any sheet). */
    public boolean contains(double re, double im) {
        return re >= re0 && re <= re1 && im >= im0 && im <= im1;
    }

    /** The point (i, j), row-major index j * nx + i; null when it is z = 0 (the branch point). */
    public SurfacePoint point(int i, int j) {
        double x = re(i);
        double y = im(j);
        if (logarithmic) {
            return SurfacePoint.fromLog(x, y);
        }
        if (x == 0 && y == 0) {
            return null;
        }
        return SurfacePoint.of(x, y, sheet);
    }

    /**
     * The point (i, j) on the surface of a solution with that coordinate: in the plane any point (the origin
     * included, sheet 0), on a logarithmic surface as {@link #point(int, int)}.
     */
    public SurfacePoint point(int i, int j, Coordinate coordinate) {
        if (!logarithmic && !coordinate.hasSheets()) {
            return SurfacePoint.planar(re(i), im(j));
        }
        return point(i, j);
    }

    /**
     * Checks that the values of the grid (that many per point) fit in memory with room for the path tree, else
     * refuses with the estimate.
     */
    public void checkMemory(String argument, int valuesPerPoint) {
        long need = BYTES_PER_VALUE * valuesPerPoint * size();
        long max = Runtime.getRuntime().maxMemory();
        if (need > max / 2) {
            throw new InvalidInputException(argument, String.format(Locale.ROOT,
                    "a %d x %d grid needs about %d MB for its values, more than half of the %d MB this JVM may"
                            + " use; choose fewer points or raise -Xmx", nx, ny, need >> 20, max >> 20));
        }
    }
}
