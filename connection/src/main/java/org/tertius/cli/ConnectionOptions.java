package org.tertius.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.commons.cli.Options;
import org.tertius.core.InvalidInputException;

/**
 * What {@code connect} computes for a solution of any kind: its behaviour at 0 ({@code --at-zero}) or along a ray
 * at infinity ({@code --at-infinity --ray}), or, the other way, start data from the data at 0 ({@code --from-zero})
 * or at infinity ({@code --from-infinity}); where and how the answer is written. The decaying family's own mode
 * ({@code --lambda} or {@code --sigma} alone) uses {@code --fit-at}, {@code --digits} and {@code --format} too.
 */
final class ConnectionOptions implements OptionGroup {
    /** The directions, in the order of {@link #direction()}. */
    private static final Pattern PI_MULTIPLE = Pattern.compile("([+-]?)([0-9]*)pi(?:/([0-9]+))?");

    static final String[] DIRECTIONS = {"--at-zero", "--at-infinity", "--from-zero", "--from-infinity"};

    boolean atZero;
    boolean atInfinity;
    String fromZero;
    String fromInfinity;
    boolean logarithmic;
    boolean monodromyData;
    Integer branch;
    String ray;
    Integer sheet;
    String radii;
    String startAt;
    Double fitAt;
    Integer digits;
    String format;

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.flag("--at-zero", "the behaviour of the solution at z = 0 read off its values near 0"
                + " on the ray --ray of sheet --sheet: kind, sigma and the second parameter (B of w ~ B z^sigma, or t0"
                + " of the logarithmic case), each with its error"));
        o.addOption(OptionKinds.flag("--at-infinity", "the behaviour along the ray --ray at infinity (D6, or D7 with"
                + " gamma = 0): background c, amplitudes p, q of the exponentials, oscillation amplitude, phase and"
                + " logarithmic drift, and the pole-free sector around the ray, each with its error"));
        o.addOption(OptionKinds.value("--from-zero", "SIGMA,PARAM", "start data from the data at 0: sigma and B of"
                + " w ~ B z^sigma (|Re sigma| <= 1, sigma != +-1), or with --logarithmic the side +-1 and t0"));
        o.addOption(OptionKinds.flag("--logarithmic", "--from-zero gives the logarithmic behaviour at sigma = +-1"
                + " (SIGMA is the side, PARAM is t0)"));
        o.addOption(OptionKinds.flag("--monodromy-data", "--from-zero (D6, |Re sigma| < 1): also the monodromy data"
                + " of the solution in closed form (member 1 with s = 1/4; Stokes multipliers, connection matrix and"
                + " the gauge-free products) and, on an oscillating --ray, the oscillation at infinity in closed form;"
                + " --at-zero or --at-infinity (D6, sheet 0): also sigma and B, or the background, kappa, drift,"
                + " amplitude and phase, in closed form from the solution's monodromy data, computed at a point of the"
                + " ray"));
        o.addOption(OptionKinds.value("--branch", "K", "the branch +1 or -1 of the logarithmic behaviour, needed"
                + " only where beta (side +1) or alpha (side -1) vanishes"));
        o.addOption(OptionKinds.value("--from-infinity", "C,P,Q", "start data from the data along the ray --ray at"
                + " infinity: background c (a value, or root0..root3 in the order of the library), amplitudes p of"
                + " E and q of 1/E"));
        o.addOption(OptionKinds.value("--ray", "ARG", "the argument of the ray, in (-pi, pi]: a number or a multiple"
                + " of pi such as pi/2, -3pi/4, pi (default 0)"));
        o.addOption(OptionKinds.value("--sheet", "K", "the sheet of the ray (--at-zero, --at-infinity) or of"
                + " --start-at (default 0)"));
        o.addOption(OptionKinds.value("--radii", "R0:R1", "--at-infinity: the interval of |z| sampled (default"
                + " 10:40)"));
        o.addOption(OptionKinds.value("--start-at", "Z", "--from-zero: the point z of the start data on sheet --sheet"
                + " (default: the largest |z| = 2^-k/4 on the ray where the series at 0 is accurate); --from-infinity:"
                + " the radius |z| on the ray (default: where the transseries fixes the amplitudes best; with --digits"
                + " D the smallest radius where it reaches D digits)"));
        o.addOption(OptionKinds.value("--fit-at", "X", "decaying family (--lambda or --sigma alone): where sigma and"
                + " B are fitted (default 1e-3)"));
        o.addOption(OptionKinds.value("--digits", "D", "decaying family, --from-zero, --at-zero, --from-infinity"
                + " and --at-infinity (16..60): also in arbitrary precision with D digits (slow: seconds to minutes)"));
        o.addOption(OptionKinds.value("--format", "FMT", "csv (default), json or text"));
    }

    @Override
    public void read(Arguments a) {
        atZero = a.has("--at-zero");
        atInfinity = a.has("--at-infinity");
        fromZero = a.text("--from-zero");
        fromInfinity = a.text("--from-infinity");
        logarithmic = a.has("--logarithmic");
        monodromyData = a.has("--monodromy-data");
        branch = a.integer("--branch", "+1 or -1");
        ray = a.text("--ray");
        sheet = a.integer("--sheet", "an integer");
        radii = a.text("--radii");
        startAt = a.text("--start-at");
        fitAt = a.number("--fit-at", "a number in (0, 0.1]");
        digits = a.integer("--digits", DigitsOption.RANGE);
        String f = a.choice("--format", "csv", "json", "text");
        format = f == null ? "csv" : f;
    }

    /**
     * The one direction asked for (index into {@link #DIRECTIONS}), or -1 for none.
     *
     * @throws InvalidInputException if more than one is given, or an option that belongs to another direction
     */
    int direction() {
        boolean[] given = {atZero, atInfinity, fromZero != null, fromInfinity != null};
        int chosen = -1;
        for (int i = 0; i < given.length; i++) {
            if (given[i]) {
                if (chosen >= 0) {
                    throw new InvalidInputException(DIRECTIONS[i], "give one direction at a time, not both "
                            + DIRECTIONS[chosen] + " and " + DIRECTIONS[i]);
                }
                chosen = i;
            }
        }
        refuse(chosen != 2, "--from-zero", logarithmic ? "--logarithmic" : null, branch == null ? null : "--branch");
        refuse(chosen != 0 && chosen != 1 && chosen != 2, "--from-zero, --at-zero or --at-infinity",
                monodromyData ? "--monodromy-data" : null);
        refuse(chosen != 1, "--at-infinity", radii == null ? null : "--radii");
        refuse(chosen != 2 && chosen != 3, "--from-zero or --from-infinity", startAt == null ? null : "--start-at");
        refuse(chosen >= 0, "the decaying family's own mode (--lambda or --sigma alone)",
                fitAt == null ? null : "--fit-at");
        refuse(chosen < 0, "--at-zero, --at-infinity, --from-zero or --from-infinity",
                ray == null ? null : "--ray", sheet == null ? null : "--sheet");
        return chosen;
    }

    private static void refuse(boolean refused, String belongsTo, String... given) {
        if (!refused) {
            return;
        }
        for (String g : given) {
            if (g != null) {
                throw new InvalidInputException(g, "applies only with " + belongsTo + "; remove it");
            }
        }
    }

    /** The ray's argument, checked to lie in (-pi, pi]. */
    double rayAngle() {
        double r = ray == null ? 0 : angle(ray);
        if (!(r > -Math.PI && r <= Math.PI)) {
            throw new InvalidInputException("--ray", "must be an angle in (-pi, pi] (use --sheet for other sheets),"
                    + " got " + r);
        }
        return r;
    }

    /** A number, or [-][P]pi[/Q] with integers P, Q &gt; 0. */
    static double angle(String text) {
        String t = text.trim().replace(" ", "").replace("*", "");
        Matcher m = PI_MULTIPLE.matcher(t);
        try {
            if (m.matches()) {
                double p = m.group(2).isEmpty() ? 1 : Integer.parseInt(m.group(2));
                double q = m.group(3) == null ? 1 : Integer.parseInt(m.group(3));
                if (q == 0) {
                    throw new NumberFormatException();
                }
                return ("-".equals(m.group(1)) ? -1 : 1) * p * Math.PI / q;
            }
            return Double.parseDouble(t);
        } catch (NumberFormatException e) {
            throw new InvalidInputException("--ray", "must be an angle in (-pi, pi]: a number or a multiple of pi"
                    + " such as pi/2 or -3pi/4, got '" + text + "'");
        }
    }

    /**
     * The ray exactly, for --digits: {P, Q} when it was typed as a multiple P pi/Q of pi (P signed), else null (then
     * the typed number is read exactly).
     */
    long[] rayPiMultiple() {
        if (ray == null) {
            return null;
        }
        Matcher m = PI_MULTIPLE.matcher(ray.trim().replace(" ", "").replace("*", ""));
        if (!m.matches()) {
            return null;
        }
        rayAngle();
        long p = m.group(2).isEmpty() ? 1 : Long.parseLong(m.group(2));
        long q = m.group(3) == null ? 1 : Long.parseLong(m.group(3));
        return new long[] {"-".equals(m.group(1)) ? -p : p, q};
    }

    int sheetIndex() {
        return sheet == null ? 0 : sheet;
    }

    /** The sample interval of --at-infinity: {R0, R1}. */
    double[] sampleRadii(double r0, double r1) {
        if (radii == null) {
            return new double[] {r0, r1};
        }
        String[] p = radii.split(":");
        String range = "R0:R1 with 2 <= R0, 1.5 R0 < R1 <= 1e4";
        if (p.length != 2) {
            throw new InvalidInputException("--radii", "must be " + range + ", got " + radii);
        }
        double[] r = new double[2];
        for (int i = 0; i < 2; i++) {
            try {
                r[i] = Double.parseDouble(p[i].trim());
            } catch (NumberFormatException e) {
                throw new InvalidInputException("--radii", "must be " + range + ", got " + radii);
            }
        }
        if (!(r[0] >= 2 && r[1] > 1.5 * r[0] && r[1] <= 1e4)) {
            throw new InvalidInputException("--radii", "must be " + range + ", got " + radii);
        }
        return r;
    }

    /** The comma-separated parts of a direction's value, exactly {@code count} of them. */
    static List<String> parts(String option, String text, int count, String what) {
        List<String> out = new ArrayList<>();
        for (String s : text.split(",", -1)) {
            out.add(s.trim());
        }
        if (out.size() != count || out.contains("")) {
            throw new InvalidInputException(option, "must be " + what + " (" + count + " values separated by"
                    + " commas), got '" + text + "'");
        }
        return out;
    }
}
