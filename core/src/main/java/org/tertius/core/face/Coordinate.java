package org.tertius.core.face;

import org.tertius.core.InvalidInputException;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;
import org.tertius.core.number.SurfacePoint;

/**
 * The independent variable of a computed solution and the surface its points live on: either the Riemann surface
 * of log (the origin is a branch point, points carry a sheet number, the engine steps in tau = log of the
 * variable) or the plane (single-valued, the origin is an ordinary point, sheet 0). Immutable.
 */
public final class Coordinate {
    /** Where the points of a solution live. */
    public enum Surface {
        /** The universal cover of the punctured plane: sheets, branch point at 0. */
        LOGARITHMIC,
        /** The complex plane: one sheet, 0 allowed. */
        PLANE
    }

    private final String name;
    private final Surface surface;

    private Coordinate(String name, Surface surface) {
        this.name = name;
        this.surface = surface;
    }

    /** A variable with a logarithmic branch point at 0 (points carry sheets). */
    public static Coordinate logarithmic(String name) {
        return new Coordinate(name, Surface.LOGARITHMIC);
    }

    /** A single-valued variable in the plane. */
    public static Coordinate plane(String name) {
        return new Coordinate(name, Surface.PLANE);
    }

    /** The variable's name ("z", "x"), used for column names and axis labels. */
    public String name() {
        return name;
    }

    public Surface surface() {
        return surface;
    }

    /** Whether points carry sheet numbers (a logarithmic branch point at 0). */
    public boolean hasSheets() {
        return surface == Surface.LOGARITHMIC;
    }

    /**
     * A point of this surface from its coordinates: on the logarithmic surface z != 0 and any sheet; in the plane
     * any finite point with sheet 0.
     *
     * @param argument the argument named in an error
     */
    public SurfacePoint point(String argument, double re, double im, int sheet) {
        if (surface == Surface.PLANE) {
            if (sheet != 0) {
                throw new InvalidInputException(argument, "the solution is single-valued in " + name + " (one sheet);"
                        + " the sheet must be 0, got " + sheet);
            }
            InvalidInputException.requireFinite(argument, re);
            InvalidInputException.requireFinite(argument, im);
            return SurfacePoint.planar(re, im);
        }
        if (re == 0 && im == 0) {
            throw new InvalidInputException(argument, name + " = 0 is the branch point of the solution; choose a point"
                    + " with " + name + " != 0");
        }
        return SurfacePoint.of(re, im, sheet);
    }

    /** Checks that a point belongs to this surface (see {@link #point}). */
    public SurfacePoint check(String argument, SurfacePoint p) {
        return point(argument, p.re(), p.im(), p.sheet());
    }

    /**
     * The engine variable of the point u on the given sheet in arbitrary precision: log u + 2 pi i sheet on the
     * logarithmic surface (principal log), u in the plane.
     */
    public MpComplex tau(MpContext ctx, MpComplex u, int sheet) {
        if (surface == Surface.PLANE) {
            return ctx.round(u);
        }
        MpComplex l = ctx.log(u);
        if (sheet != 0) {
            MpComplex twoPiK = ctx.multiply(ctx.pi(), 2L * sheet);
            l = ctx.add(l, ctx.multiply(twoPiK, ctx.fromDouble(0, 1)));
        }
        return l;
    }

    /** The point of the engine variable tau in arbitrary precision (exp tau, or tau itself in the plane). */
    public MpComplex fromTau(MpContext ctx, MpComplex tau) {
        return surface == Surface.PLANE ? tau : ctx.exp(tau);
    }

    /** The engine variable of a point in double precision: {log|u|, Arg u + 2 pi k}, or {Re u, Im u} in the plane. */
    public double tauRe(SurfacePoint p) {
        return surface == Surface.PLANE ? p.re() : p.logRe();
    }

    /** See {@link #tauRe}. */
    public double tauIm(SurfacePoint p) {
        return surface == Surface.PLANE ? p.im() : p.logIm();
    }

    /** The point of the engine variable tau in double precision. */
    public SurfacePoint fromTau(double tauRe, double tauIm) {
        return surface == Surface.PLANE ? SurfacePoint.planar(tauRe, tauIm) : SurfacePoint.fromLog(tauRe, tauIm);
    }

    @Override
    public String toString() {
        return name + (hasSheets() ? " (Riemann surface of log " + name + ")" : " (plane)");
    }
}
