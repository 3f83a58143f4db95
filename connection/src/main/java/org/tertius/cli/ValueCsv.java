package org.tertius.cli;

import java.io.PrintWriter;
import java.util.Locale;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3Value;

/** The CSV layout shared by eval and table. */
final class ValueCsv {
    static final String HEADER = "z_re,z_im,sheet,w_re,w_im,dw_re,dw_im,err";

    private ValueCsv() {
    }

    static String row(Painleve3Value v) {
        SurfacePoint p = v.point();
        return String.format(Locale.ROOT, "%.17g,%.17g,%d,%.17g,%.17g,%.17g,%.17g,%.3e", p.re(), p.im(), p.sheet(),
                v.w().getReal(), v.w().getImaginary(), v.dw().getReal(), v.dw().getImaginary(),
                Math.max(v.errW(), v.errDw()));
    }

    /** A row for a point that could not be computed: values nan, error inf. */
    static String unreachedRow(SurfacePoint p) {
        return String.format(Locale.ROOT, "%.17g,%.17g,%d,nan,nan,nan,nan,inf", p.re(), p.im(), p.sheet());
    }

    static void header(PrintWriter out, String... comments) {
        for (String c : comments) {
            out.println("# " + c);
        }
        out.println(HEADER);
    }
}
