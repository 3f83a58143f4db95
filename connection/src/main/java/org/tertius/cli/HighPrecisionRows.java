package org.tertius.cli;

import java.util.List;
import org.tertius.core.piii.HighPrecisionSolution;
import org.tertius.core.piii.HighPrecisionValue;
import org.tertius.core.number.SurfacePoint;

/** Rows of the high-precision output: values as decimal strings and the estimated correct digits. */
final class HighPrecisionRows {
    static final String HEADER = "z_re,z_im,sheet,w_re,w_im,dw_re,dw_im,digits";

    private HighPrecisionRows() {
    }

    static HighPrecisionSolution solution(SolutionOptions o, int digits, Progress progress) {
        o.file();
        String[] eq = o.equation.texts();
        for (int i = 0; i < 4; i++) {
            EquationOptions.value(new String[] {"--alpha", "--beta", "--gamma", "--delta"}[i], eq[i]);
        }
        return HighPrecisionSolution.builder(eq[0], eq[1], eq[2], eq[3]).start(o.start.z0, o.start.w0, o.start.dw0)
                .digits(digits).progress(f -> progress.update(Math.round(f * 1000), 1000))
                .planning(o.solver.settings()).build();
    }

    static String row(HighPrecisionValue v) {
        SurfacePoint p = v.point();
        String[] w = split(v.wText());
        String[] dw = split(v.dwText());
        return p.re() + "," + p.im() + "," + p.sheet() + "," + w[0] + "," + w[1] + "," + dw[0] + "," + dw[1] + ","
                + v.correctDigits();
    }

    /** "a+bi" to {a, b}; the sign that starts the imaginary part is the last one not inside an exponent. */
    static String[] split(String text) {
        String t = text.endsWith("i") ? text.substring(0, text.length() - 1) : text;
        for (int k = t.length() - 1; k > 0; k--) {
            char c = t.charAt(k);
            char before = t.charAt(k - 1);
            if ((c == '+' || c == '-') && before != 'e' && before != 'E') {
                String im = t.substring(k);
                return new String[] {t.substring(0, k), im.startsWith("+") ? im.substring(1) : im};
            }
        }
        return new String[] {t, "0"};
    }

    static void write(List<HighPrecisionValue> values, TableWriter w) {
        for (HighPrecisionValue v : values) {
            w.row(row(v));
        }
        w.flush();
    }
}
