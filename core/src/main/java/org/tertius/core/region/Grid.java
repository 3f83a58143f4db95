package org.tertius.core.region;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Arrays;
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
    /** Digits of the quotients from which the coordinates are rounded to doubles (far beyond a double's). */
    private static final MathContext QUOTIENT = new MathContext(40, RoundingMode.HALF_EVEN);

    /** The bounds of the whole grid as given (exact decimals). */
    private final BigDecimal reLo;
    private final BigDecimal reHi;
    private final BigDecimal imLo;
    private final BigDecimal imHi;
    /** Points of the whole grid in each direction. */
    private final int wholeNx;
    private final int wholeNy;
    /** The first row of this grid in the whole grid (a band of rows of a larger grid) and its row count. */
    private final int rowOffset;
    private final int ny;
    private final int sheet;
    private final boolean logarithmic;
    private final double[] xs;
    private final double[] ys;

    private Grid(String arg, BigDecimal reLo, BigDecimal reHi, int nx, BigDecimal imLo, BigDecimal imHi, int ny,
                 int sheet, boolean logarithmic) {
        if (nx < 1 || ny < 1) {
            throw new InvalidInputException(arg, "point counts must be at least 1, got " + nx + " x " + ny);
        }
        if ((nx > 1 && reHi.compareTo(reLo) <= 0) || (ny > 1 && imHi.compareTo(imLo) <= 0)) {
            throw new InvalidInputException(arg, "empty or inverted range: need RE0 < RE1 and IM0 < IM1 (got "
                    + reLo + ":" + reHi + ", " + imLo + ":" + imHi + ")");
        }
        if ((long) nx * ny > 50_000_000L) {
            throw new InvalidInputException(arg, nx + " x " + ny + " points is more than the 5e7 allowed");
        }
        this.reLo = reLo;
        this.reHi = reHi;
        this.imLo = imLo;
        this.imHi = imHi;
        this.wholeNx = nx;
        this.wholeNy = ny;
        this.rowOffset = 0;
        this.ny = ny;
        this.sheet = sheet;
        this.logarithmic = logarithmic;
        this.xs = coordinates(reLo, reHi, nx, 0, nx);
        this.ys = coordinates(imLo, imHi, ny, 0, ny);
        for (double v : new double[] {xs[0], xs[nx - 1], ys[0], ys[ny - 1]}) {
            InvalidInputException.requireFinite(arg, v);
        }
    }

    /** Rows [j0, j0 + count) of a grid. */
    private Grid(Grid whole, int j0, int count) {
        this.reLo = whole.reLo;
        this.reHi = whole.reHi;
        this.imLo = whole.imLo;
        this.imHi = whole.imHi;
        this.wholeNx = whole.wholeNx;
        this.wholeNy = whole.wholeNy;
        this.rowOffset = whole.rowOffset + j0;
        this.ny = count;
        this.sheet = whole.sheet;
        this.logarithmic = whole.logarithmic;
        this.xs = whole.xs;
        this.ys = Arrays.copyOfRange(whole.ys, j0, j0 + count);
    }

    /** lo + (hi - lo) k / (n - 1) for k in [from, to), each the nearest double of the exact rational. */
    private static double[] coordinates(BigDecimal lo, BigDecimal hi, int n, int from, int to) {
        double[] out = new double[to - from];
        for (int k = from; k < to; k++) {
            out[k - from] = exact(lo, hi, n, k).doubleValue();
        }
        return out;
    }

    /** The coordinate k of n from lo to hi to 40 digits (exact when it terminates within them). */
    private static BigDecimal exact(BigDecimal lo, BigDecimal hi, int n, int k) {
        if (n == 1 || k == 0) {
            return lo;
        }
        if (k == n - 1) {
            return hi;
        }
        return lo.add(hi.subtract(lo).multiply(BigDecimal.valueOf(k)).divide(BigDecimal.valueOf(n - 1L), QUOTIENT));
    }

    /**
     * A strip in log z: nx values of log|z| from logR0 to logR1 and ny values of the argument from arg0 to arg1
     * (the argument is continuous, so the strip may cover several sheets).
     */
    public static Grid logStrip(double logR0, double logR1, int nx, double arg0, double arg1, int ny) {
        return new Grid("log strip", decimal("log strip", logR0), decimal("log strip", logR1), nx,
                decimal("log strip", arg0), decimal("log strip", arg1), ny, 0, true);
    }

    /** Parses "LOGR0:LOGR1:NX,ARG0:ARG1:NY" as a strip in log z. */
    public static Grid parseLogStrip(String argument, String text) {
        return parse(argument, text, 0, true);
    }

    /** Whether this is a strip in log z (coordinates log|z| and arg z) rather than a rectangle of one sheet. */
    public boolean logarithmic() {
        return logarithmic;
    }

    /**
     * Rows j0..j1 of this grid, as a grid of the same kind whose coordinates are those of the whole grid (each from
     * its index in the whole grid: a band gives the values of the same points).
     */
    public Grid rows(int j0, int j1) {
        if (j0 < 0 || j1 >= ny || j1 < j0) {
            throw new InvalidInputException("rows", "must lie in [0, " + (ny - 1) + "], got " + j0 + ".." + j1);
        }
        return new Grid(this, j0, j1 - j0 + 1);
    }

    /** Whether a point of the surface lies in the grid's region. */
    public boolean contains(SurfacePoint p) {
        if (logarithmic) {
            return p.logRe() >= re0() && p.logRe() <= re1() && p.logIm() >= im0() && p.logIm() <= im1();
        }
        return p.sheet() == sheet && contains(p.re(), p.im());
    }

    /**
     * The spacing of the grid in |z|: the coordinate spacing, times the largest |z| of a log strip.
     */
    public double zSpacing() {
        return logarithmic ? spacing() * Math.exp(re1()) : spacing();
    }

    public static Grid of(double re0, double re1, int nx, double im0, double im1, int ny, int sheet) {
        return new Grid("grid", decimal("grid", re0), decimal("grid", re1), nx, decimal("grid", im0),
                decimal("grid", im1), ny, sheet, false);
    }

    private static BigDecimal decimal(String argument, double v) {
        InvalidInputException.requireFinite(argument, v);
        return new BigDecimal(v);
    }

    /**
     * Parses "RE0:RE1:NX,IM0:IM1:NY"; the bounds are read as exact decimals, so that every coordinate is the double
     * nearest to its exact value (the row through Im z = 0 of a symmetric grid lies on the real axis).
     *
     * @param argument the option name for messages
     */
    public static Grid parse(String argument, String text, int sheet) {
        return parse(argument, text, sheet, false);
    }

    private static Grid parse(String argument, String text, int sheet, boolean logarithmic) {
        String[] parts = text == null ? new String[0] : text.split(",");
        String form = logarithmic ? "LOGR0:LOGR1:NX,ARG0:ARG1:NY, e.g. -3:2.3:300,-9.43:9.43:600"
                : "RE0:RE1:NX,IM0:IM1:NY, e.g. -10:10:401,-10:10:401";
        if (parts.length != 2) {
            throw new InvalidInputException(argument, "expected " + form);
        }
        String[] a = parts[0].split(":");
        String[] b = parts[1].split(":");
        if (a.length != 3 || b.length != 3) {
            throw new InvalidInputException(argument, "expected " + form);
        }
        try {
            return new Grid(argument, new BigDecimal(a[0].trim()), new BigDecimal(a[1].trim()),
                    Integer.parseInt(a[2].trim()), new BigDecimal(b[0].trim()), new BigDecimal(b[1].trim()),
                    Integer.parseInt(b[2].trim()), sheet, logarithmic);
        } catch (NumberFormatException | ArithmeticException e) {
            throw new InvalidInputException(argument, "cannot read '" + text + "': the bounds are decimal numbers and"
                    + " the counts integers (" + form + ")");
        }
    }

    public int nx() {
        return wholeNx;
    }

    public int ny() {
        return ny;
    }

    public int sheet() {
        return sheet;
    }

    public double re0() {
        return xs[0];
    }

    public double re1() {
        return xs[xs.length - 1];
    }

    public double im0() {
        return ys[0];
    }

    public double im1() {
        return ys[ny - 1];
    }

    public int size() {
        return wholeNx * ny;
    }

    /** The abscissa of column i: the double nearest to RE0 + (RE1 - RE0) i / (NX - 1). */
    public double re(int i) {
        return xs[i];
    }

    /** The ordinate of row j: the double nearest to IM0 + (IM1 - IM0) j / (NY - 1) in the whole grid. */
    public double im(int j) {
        return ys[j];
    }

    /** The abscissa of column i to 40 significant digits (exact when it terminates within them). */
    public BigDecimal exactRe(int i) {
        return exact(reLo, reHi, wholeNx, i);
    }

    /** The ordinate of row j to 40 significant digits (exact when it terminates within them). */
    public BigDecimal exactIm(int j) {
        return exact(imLo, imHi, wholeNy, rowOffset + j);
    }

    /** Spacing of the grid (the larger of the two), or the extent if a single point. */
    public double spacing() {
        double dx = wholeNx > 1 ? (xs[wholeNx - 1] - xs[0]) / (wholeNx - 1) : 0;
        double dy = wholeNy > 1 ? imHi.subtract(imLo).doubleValue() / (wholeNy - 1) : 0;
        return Math.max(dx, dy);
    }

    /** Whether z lies in the closed rectangle (any sheet). */
    public boolean contains(double re, double im) {
        return re >= re0() && re <= re1() && im >= im0() && im <= im1();
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
                            + " use; choose fewer points or raise -Xmx", wholeNx, ny, need >> 20, max >> 20));
        }
    }
}
