package org.tertius.cli;

import java.math.RoundingMode;
import java.util.List;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.tertius.connection.match.PreciseZeroFit;
import org.tertius.connection.match.ZeroBehaviourFit;
import org.tertius.connection.zero.LocalValue;
import org.tertius.connection.zero.ZeroBehaviour;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ApcomplexArithmetic;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;

/**
 * {@code connect --digits D} at 0: the power behaviour of a solution with exact start data fitted in arbitrary
 * precision, and start data from exact (sigma, B) ({@link PreciseZeroFit}). Typed numbers are read exactly.
 */
final class PreciseConnection {
    /** Rows of the series at 0 in arbitrary precision (the default point is chosen small enough for them). */
    static final int ROWS = 16;

    private PreciseConnection() {
    }

    /** The rows of the fit at 0 in D digits, after the double-precision rows (which decide the kind). */
    static void atZero(Painleve3Solution s, double angle, int sheet, int digits, ConnectionRows rows) {
        ZeroBehaviour estimate = ZeroBehaviourFit.analyse(s, angle, sheet);
        try (Progress progress = new Progress("connect")) {
            PreciseZeroFit.Result r = PreciseZeroFit.fit(s, estimate, angle, sheet, digits,
                    f -> progress.update(Math.round(f * 1000), 1000));
            rows.comment(digits + " digits: the solution replayed in arbitrary precision to z0 = " + r.point()
                    + ", the series at 0 of degree " + r.degree() + " solved there for sigma and B");
            rows.add("sigma", digits + " digits", complex(r.sigma(), digits), ConnectionRows.error(r.sigmaError()), "",
                    "");
            rows.add("B", digits + " digits", complex(r.amplitude(), digits), ConnectionRows.error(r.amplitudeError()),
                    "", "");
        }
    }

    /** Start data in D digits from exact (sigma, B) typed as the two parts of --from-zero. */
    static void fromZero(Painleve3 eq, List<String> parts, String startAt, double angle, int sheet, int digits,
                         ConnectionRows rows) {
        ApcomplexArithmetic ar = new ApcomplexArithmetic(digits + 10);
        Apcomplex sigma = PreciseZeroFit.exact(ar, ExactText.parse("--from-zero", parts.get(0)), digits);
        Apcomplex b = PreciseZeroFit.exact(ar, ExactText.parse("--from-zero", parts.get(1)), digits);
        List<Apcomplex> p = PreciseZeroFit.parameters(ar, eq, digits);
        Apcomplex twoPi = ar.multiply(ar.ratio(2, 1), ar.pi());
        Apcomplex turn = new Apcomplex(Apfloat.ZERO, ar.multiply(twoPi, ar.ratio(sheet, 1)).real());
        LocalValue<Apcomplex> v;
        if (startAt != null) {
            ExactNumber z = ExactText.parse("--start-at", startAt);
            if (z.isZero()) {
                throw new InvalidInputException("--start-at", "must be a point z != 0, got " + startAt);
            }
            Apcomplex tau = ar.add(ar.log(PreciseZeroFit.exact(ar, z, digits)), turn);
            v = PreciseZeroFit.expansion(ar, p, sigma, b, ROWS).at(tau);
            double target = Math.pow(10, -digits);
            if (!(v.errW() <= target * (1 + ar.abs(v.w())) && v.errDw() <= target * (1 + ar.abs(v.dw())))) {
                // once more with twice the rows (several times the cost); the errors say what was reached
                v = PreciseZeroFit.expansion(ar, p, sigma, b, 2 * ROWS).at(tau);
            }
        } else {
            Apcomplex phase = ar.add(new Apcomplex(Apfloat.ZERO, new Apfloat(Double.toString(angle), digits + 10)),
                    turn);
            v = PreciseZeroFit.startData(ar, PreciseZeroFit.expansion(ar, p, sigma, b, ROWS), phase, digits);
        }
        rows.comment("start data in " + digits + " digits from sigma = " + parts.get(0) + ", B = " + parts.get(1)
                + " (read exactly), from the series at 0; z on sheet " + sheet);
        rows.add("z", digits + " digits", complex(v.z(), digits), "0", "", "");
        rows.add("sheet", "exact", Integer.toString(sheet), "0", "", "");
        rows.add("w", digits + " digits", complex(v.w(), digits), ConnectionRows.error(v.errW()), "", "");
        rows.add("dw", digits + " digits", complex(v.dw(), digits), ConnectionRows.error(v.errDw()), "", "");
    }

    /** a+bi with D significant digits relative to the modulus. */
    static String complex(Apcomplex c, int digits) {
        Apfloat re = c.real();
        Apfloat im = c.imag();
        long top = Math.max(re.signum() == 0 ? Long.MIN_VALUE : re.scale(), im.signum() == 0 ? Long.MIN_VALUE
                : im.scale());
        String r = part(re, digits, top);
        String i = part(ApfloatMath.abs(im), digits, top);
        return r + (im.signum() < 0 ? "-" : "+") + i + "i";
    }

    private static String part(Apfloat x, int digits, long top) {
        if (x.signum() == 0 || top == Long.MIN_VALUE) {
            return "0";
        }
        long keep = digits - (top - x.scale());
        if (keep <= 0) {
            return "0";
        }
        return ApfloatMath.round(x, keep, RoundingMode.HALF_EVEN).toString(true);
    }
}
