package org.tertius.cli;

import java.util.List;
import java.util.Locale;
import org.apfloat.Apcomplex;
import org.tertius.connection.special.PreciseValue;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.face.SolutionValue;
import org.tertius.core.highprecision.HighPrecisionValue;
import org.tertius.core.number.SurfacePoint;

/**
 * The one place that writes value rows, for any solution, keyed by its variable and value names: in double
 * precision {@code z_re,z_im,sheet,w_re,w_im,dw_re,dw_im,err} for Painleve III and
 * {@code x_re,x_im,sheet,q_re,q_im,r_re,r_im,dq_re,dq_im,dr_re,dr_im,err,integrals} for a hierarchy member (err the
 * largest estimated absolute error of the values; integrals ok or drift when the solution keeps invariants); with
 * {@code --digits} the values as decimal strings and the estimated number of correct digits in place of err.
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
        return b.append(",digits").toString();
    }

    private String coordinateColumns() {
        String c = solution.coordinate().name();
        return c + "_re," + c + "_im,sheet";
    }

    /** The comment lines above the rows: the equation, the method, what err means. */
    List<String> comments() {
        return List.of(solution.equationDescription(), solution.methodDescription(), "err: " + errMeaning()
                + (invariants ? "; integrals: first integrals within their estimates (ok) or drifting" : ""));
    }

    /** The comment lines above high-precision rows. */
    List<String> preciseComments(int digits) {
        return List.of(solution.equationDescription() + ", " + digits + " digits; digits: estimated correct"
                + " significant digits of " + labels());
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
        if (invariants) {
            b.append(',');
        }
        return b.toString();
    }

    /** One row of a value computed directly to {@code digits} digits (a closed form, a Backlund image). */
    String row(PreciseValue v, int digits) {
        SurfacePoint p = v.point();
        StringBuilder b = new StringBuilder();
        b.append(p.re()).append(',').append(p.im()).append(',').append(p.sheet());
        for (Apcomplex x : new Apcomplex[] {v.w(), v.dw()}) {
            String[] parts = PreciseValue.parts(x, digits);
            b.append(',').append(parts[0]).append(',').append(parts[1]);
        }
        return b.append(',').append(Math.min(digits, v.correctDigits())).toString();
    }

    /** One high-precision row. */
    String row(HighPrecisionValue v) {
        SurfacePoint p = v.point().toSurfacePoint();
        StringBuilder b = new StringBuilder();
        b.append(p.re()).append(',').append(p.im()).append(',').append(p.sheet());
        for (int i = 0; i < v.size(); i++) {
            String[] parts = v.parts(i);
            b.append(',').append(parts[0]).append(',').append(parts[1]);
        }
        return b.append(',').append(v.correctDigits()).toString();
    }
}
