package org.tertius.cli;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.List;
import java.util.Locale;
import org.apfloat.Apcomplex;
import org.hipparchus.complex.Complex;
import org.tertius.connection.special.PreciseValue;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.face.SolutionValue;
import org.tertius.core.highprecision.HighPrecisionValue;
import org.tertius.core.number.ExactPoint;
import org.tertius.core.number.SurfacePoint;

/**
 * The one place that writes value rows, for any solution, keyed by its variable and value names: in double
 * precision {@code z_re,z_im,sheet,w_re,w_im,dw_re,dw_im,err,w_err,dw_err} for Painleve III and
 * {@code x_re,x_im,sheet,q_re,q_im,r_re,r_im,dq_re,dq_im,dr_re,dr_im,err,q_err,r_err,dq_err,dr_err,integrals} for a
 * hierarchy member (err the largest estimated absolute error of the values, NAME_err that of value NAME; integrals
 * ok or drift when the solution keeps invariants); with {@code --digits} the values as decimal strings and the
 * estimated numbers of correct digits in place of the errors ({@code digits}, the smallest, and NAME_digits).
 */
final class ValueRows {
    private final ComputedSolution solution;
    private final boolean invariants;

    ValueRows(ComputedSolution solution) {
        this.solution = solution;
        this.invariants = !solution.invariants().isEmpty();
    }

    /** The column line of double-precision rows. */
    String columns() {
        StringBuilder b = new StringBuilder(coordinateColumns());
        for (String v : solution.valueNames()) {
            b.append(',').append(v).append("_re,").append(v).append("_im");
        }
        b.append(",err");
        for (String v : solution.valueNames()) {
            b.append(',').append(v).append("_err");
        }
        if (invariants) {
            b.append(",integrals");
        }
        return b.toString();
    }

    /** The column line of high-precision rows. */
    String preciseColumns() {
        StringBuilder b = new StringBuilder(coordinateColumns());
        for (String v : solution.valueNames()) {
            b.append(',').append(v).append("_re,").append(v).append("_im");
        }
        b.append(",digits");
        for (String v : solution.valueNames()) {
            b.append(',').append(v).append("_digits");
        }
        return b.toString();
    }

    private String coordinateColumns() {
        String c = solution.coordinate().name();
        return c + "_re," + c + "_im,sheet";
    }

    /** The comment lines above the rows: the equation, the method, what err means. */
    List<String> comments() {
        return List.of(solution.equationDescription(), solution.methodDescription(), "err: " + errMeaning()
                + "; NAME_err: the estimated absolute error of value NAME alone" + (invariants ? "; integrals: first integrals within their estimates (ok) or drifting" : ""));
    }

    /** The comment lines above high-precision rows. */
    List<String> preciseComments(int digits) {
        return List.of(solution.equationDescription() + ", " + digits + " digits; digits: the smallest estimated"
                + " number of correct significant digits of " + labels() + "; NAME_digits: that of value NAME alone");
    }

    private String errMeaning() {
        List<String> names = solution.valueNames();
        if (names.size() == 2) {
            return "the larger of the estimated absolute errors of " + label(names.get(0)) + " and "
                    + label(names.get(1));
        }
        return "the largest of the estimated absolute errors of " + labels();
    }

    private String labels() {
        List<String> names = solution.valueNames();
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < names.size(); i++) {
            b.append(i == 0 ? "" : i == names.size() - 1 ? " and " : ", ").append(label(names.get(i)));
        }
        return b.toString();
    }

    /** The name of a value as printed in prose: dw is w'. */
    static String label(String name) {
        return name.startsWith("d") && name.length() > 1 ? name.substring(1) + "'" : name;
    }

    /** One double-precision row. */
    String row(SolutionValue v) {
        SurfacePoint p = v.point();
        StringBuilder b = new StringBuilder(String.format(Locale.ROOT, "%.17g,%.17g,%d", p.re(), p.im(), p.sheet()));
        for (int i = 0; i < v.size(); i++) {
            b.append(String.format(Locale.ROOT, ",%.17g,%.17g", v.value(i).getReal(), v.value(i).getImaginary()));
        }
        b.append(String.format(Locale.ROOT, ",%.3e", v.maxError()));
        for (int i = 0; i < v.size(); i++) {
            b.append(String.format(Locale.ROOT, ",%.3e", v.error(i)));
        }
        if (invariants) {
            b.append(v.checksWithinEstimate() ? ",ok" : ",drift");
        }
        return b.toString();
    }

    /** A row for a point that could not be computed: values nan, error inf. */
    String unreachedRow(SurfacePoint p) {
        return unreachedRow(p.re(), p.im(), p.sheet());
    }

    /** A row for a point that could not be computed, from its coordinates (the branch point included). */
    String unreachedRow(double re, double im, int sheet) {
        StringBuilder b = new StringBuilder(String.format(Locale.ROOT, "%.17g,%.17g,%d", re, im, sheet));
        for (int i = 0; i < solution.valueNames().size(); i++) {
            b.append(",nan,nan");
        }
        b.append(",inf");
        for (int i = 0; i < solution.valueNames().size(); i++) {
            b.append(",inf");
        }
        if (invariants) {
            b.append(',');
        }
        return b.toString();
    }

    /** The column line of a table over the plane of real x and real time t (one value, q). */
    static String planeColumns(String time) {
        return "x," + time + ",q_re,q_im,err,q_err";
    }

    /** One row over the plane of real x and real time t: q and its error (err and q_err alike). */
    static String planeRow(double x, double t, Complex q, double error) {
        return String.format(Locale.ROOT, "%.17g,%.17g,%.17g,%.17g,%.3e,%.3e", x, t, q.getReal(), q.getImaginary(),
                error, error);
    }

    /** One row of a value computed directly to {@code digits} digits (a closed form, a Backlund image). */
    String row(ExactPoint point, PreciseValue v, int digits) {
        StringBuilder b = new StringBuilder(exactCoordinates(point, digits));
        for (Apcomplex x : new Apcomplex[] {v.w(), v.dw()}) {
            String[] parts = PreciseValue.parts(x, digits);
            b.append(',').append(parts[0]).append(',').append(parts[1]);
        }
        b.append(',').append(Math.min(digits, v.correctDigits()));
        b.append(',').append(Math.min(digits, v.correctDigitsW()));
        return b.append(',').append(Math.min(digits, v.correctDigitsDw())).toString();
    }

    /** One high-precision row. */
    String row(HighPrecisionValue v) {
        StringBuilder b = new StringBuilder(exactCoordinates(v.point(), v.requestedDigits()));
        for (int i = 0; i < v.size(); i++) {
            String[] parts = v.parts(i);
            b.append(',').append(parts[0]).append(',').append(parts[1]);
        }
        b.append(',').append(v.correctDigits());
        for (int i = 0; i < v.size(); i++) {
            b.append(',').append(v.correctDigits(i));
        }
        return b.toString();
    }

    /**
     * The coordinates of an exactly given point as decimal text: exact when the decimal expansion ends within
     * {@code digits} significant digits (0.5, -2.25, a grid point from its index), else rounded to that many (1/3).
     */
    static String exactCoordinates(ExactPoint point, int digits) {
        MathContext mc = new MathContext(Math.max(digits, 17), RoundingMode.HALF_EVEN);
        return decimal(point.z().realPart(mc)) + ',' + decimal(point.z().imaginaryPart(mc)) + ',' + point.sheet();
    }

    private static String decimal(BigDecimal d) {
        if (d.signum() == 0) {
            return "0";
        }
        BigDecimal s = d.stripTrailingZeros();
        return Math.abs(s.scale()) > 40 ? s.toString() : s.toPlainString();
    }
}
