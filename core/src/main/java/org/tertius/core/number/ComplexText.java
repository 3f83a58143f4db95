package org.tertius.core.number;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;

/**
 * Reading and writing complex numbers as text: {@code 3}, {@code -1.5}, {@code 2.5e-3-4i}, {@code 3i},
 * {@code -i}, {@code 1+i}, {@code 2-0.5i}. Decimal points, exponents and a sign on each part are allowed.
 */
public final class ComplexText {
    private static final String REAL = "[0-9]*\\.?[0-9]*(?:[eE][+-]?[0-9]+)?";
    private static final Pattern FULL =
            Pattern.compile("^([+-]?" + REAL + ")?(?:([+-])(" + REAL + ")?[iIjJ])?$");
    private static final Pattern IMAG_ONLY = Pattern.compile("^([+-]?)(" + REAL + ")[iIjJ]$");

    private ComplexText() {
    }

    /**
     * Parses a complex number (a+bi form) or a real rational p/q (rounded to double).
     *
     * @param argument the argument name used in the error message
     * @param text the text
     * @return the value
     * @throws InvalidInputException if the text is not a finite complex number
     */
    public static Complex parse(String argument, String text) {
        if (text == null) {
            throw new InvalidInputException(argument, "a complex number is required (for example 3+2i)");
        }
        String s = text.trim().replace(" ", "");
        Complex c = s.contains("/") ? tryRational(s) : tryParse(s);
        if (c == null || !Double.isFinite(c.getReal()) || !Double.isFinite(c.getImaginary())) {
            throw new InvalidInputException(argument, "cannot read '" + text
                    + "' as a finite complex number; write it as a+bi, for example 3+2i, -1.5, 2.5e-3-4i or 3i");
        }
        return c;
    }

    /** A real rational p/q (integers or decimals), e.g. -1/2 or 1/3. */
    private static Complex tryRational(String s) {
        int slash = s.indexOf('/');
        if (slash != s.lastIndexOf('/')) {
            return null;
        }
        double p = parseSigned(s.substring(0, slash));
        double q = parseSigned(s.substring(slash + 1));
        if (Double.isNaN(p) || Double.isNaN(q) || q == 0) {
            return null;
        }
        return new Complex(p / q);
    }

    private static Complex tryParse(String s) {
        if (s.isEmpty()) {
            return null;
        }
        Matcher m = IMAG_ONLY.matcher(s);
        if (m.matches()) {
            double v = parseMagnitude(m.group(2));
            if (Double.isNaN(v)) {
                return null;
            }
            return new Complex(0.0, "-".equals(m.group(1)) ? -v : v);
        }
        m = FULL.matcher(s);
        if (!m.matches()) {
            return null;
        }
        String re = m.group(1);
        double real = 0.0;
        if (re != null && !re.isEmpty()) {
            real = parseSigned(re);
            if (Double.isNaN(real)) {
                return null;
            }
        } else if (m.group(2) == null) {
            return null;
        }
        double imag = 0.0;
        if (m.group(2) != null) {
            double v = parseMagnitude(m.group(3));
            if (Double.isNaN(v)) {
                return null;
            }
            imag = "-".equals(m.group(2)) ? -v : v;
        }
        return new Complex(real, imag);
    }

    private static double parseMagnitude(String s) {
        if (s == null || s.isEmpty()) {
            return 1.0;
        }
        return parseSigned(s);
    }

    private static double parseSigned(String s) {
        if (s.equals("+") || s.equals("-") || s.equals(".") || s.startsWith("e") || s.startsWith("E")) {
            return Double.NaN;
        }
        try {
            return Double.parseDouble(s);
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }

    /** Writes a complex number as a+bi with 17 significant digits (round trip). */
    public static String format(double re, double im) {
        String r = String.format(Locale.ROOT, "%.17g", re);
        String i = String.format(Locale.ROOT, "%.17g", Math.abs(im));
        return r + (im < 0 || (im == 0 && 1 / im < 0) ? "-" : "+") + i + "i";
    }

    public static String format(Complex c) {
        return format(c.getReal(), c.getImaginary());
    }

    /** Writes a complex number briefly as a+bi (each part the shortest decimal that reads back exactly), for messages. */
    public static String brief(Complex c) {
        double im = c.getImaginary();
        if (im == 0) {
            return Double.toString(c.getReal());
        }
        return c.getReal() + (im < 0 ? "-" : "+") + Math.abs(im) + "i";
    }
}
