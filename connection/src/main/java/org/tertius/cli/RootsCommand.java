package org.tertius.cli;

import java.awt.image.BufferedImage;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.imageio.ImageIO;
import org.apache.commons.cli.Options;
import org.hipparchus.complex.Complex;
import org.hipparchus.fraction.BigFraction;
import org.tertius.connection.special.CertifiedRoot;
import org.tertius.connection.special.PreciseValue;
import org.tertius.connection.special.RationalSolution;
import org.tertius.connection.special.RootIsolation;
import org.tertius.connection.special.SpecialPolynomial;
import org.tertius.connection.special.SpecialPolynomials;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.region.Grid;
import org.tertius.hierarchy.algebra.GaussianRational;

/**
 * The roots of a special polynomial S_n(z; mu) of Painleve III, or the zeros and poles of a rational solution, to D
 * digits with a certified count; CSV and, optionally, a picture of the pattern.
 */
public final class RootsCommand implements Command {
    /** Default number of digits. */
    static final int DEFAULT_DIGITS = 20;
    private static final int WIDTH = 900;
    private static final int HEIGHT = 720;

    final EquationOptions equation = new EquationOptions();
    Integer n;
    String mu;
    Integer digits;
    Integer index;
    Path out;
    Path plot;

    @Override
    public String name() {
        return "roots";
    }

    @Override
    public String description() {
        return "The roots of the special polynomial S_n(z; mu) of Painleve III (--n N --mu MU; generated exactly by"
                + " the recurrence of Clarkson, J. Phys. A 36 (2003) 9507, DLMF 32.8(iii)), or with --alpha .. --delta the"
                + " zeros and poles of a rational solution (--special-index K), to D digits: each root in a disk"
                + " proved to hold exactly the number of roots given as its multiplicity, the multiplicities adding up"
                + " to the degree. CSV columns kind,re,im,radius,multiplicity,digits,simple (digits: correct"
                + " significant digits the disk vouches for; simple: yes when the polynomial is proved square-free);"
                + " --plot draws the pattern.";
    }

    @Override
    public List<OptionGroup> groups() {
        return List.of(equation);
    }

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.value("--n", "N", "index of the special polynomial S_n (degree n(n+1)/2), 0.."
                + SpecialPolynomials.MAX_INDEX));
        o.addOption(OptionKinds.value("--mu", "MU", "the parameter mu of S_n(z; mu), exact (p/q, decimal, a+bi)"));
        o.addOption(OptionKinds.value("--digits", "D", "significant digits of the roots (1.." + RootIsolation.MAX_DIGITS
                + ", default " + DEFAULT_DIGITS + ")"));
        o.addOption(OptionKinds.value("--special-index", "K", "with --alpha .. --delta: which rational solution"
                + " (as 'tertius special' lists them; default 0)"));
        o.addOption(OptionKinds.value("--out", "FILE", "CSV file (default standard output)"));
        o.addOption(OptionKinds.value("--plot", "FILE", "PNG picture of the roots in the plane"));
    }

    @Override
    public void read(Arguments a) {
        n = a.integer("--n", "an integer in [0, " + SpecialPolynomials.MAX_INDEX + "]");
        mu = a.text("--mu");
        digits = a.integer("--digits", "an integer in [1, " + RootIsolation.MAX_DIGITS + "]");
        index = a.integer("--special-index", "an integer >= 0");
        out = a.path("--out");
        plot = a.path("--plot");
    }

    @Override
    public int run(PrintWriter stdout, PrintWriter err) {
        int d = digits == null ? DEFAULT_DIGITS : digits;
        if (d < 1 || d > RootIsolation.MAX_DIGITS) {
            throw new InvalidInputException("--digits", "must be in [1, " + RootIsolation.MAX_DIGITS + "], got " + d);
        }
        boolean polynomial = n != null || mu != null;
        boolean rational = equation.texts()[0] != null || equation.texts()[1] != null || equation.texts()[2] != null
                || equation.texts()[3] != null;
        if (polynomial == rational) {
            throw new InvalidInputException("--n", "give either --n N --mu MU (a special polynomial) or --alpha .."
                    + " --delta (the zeros and poles of a rational solution)");
        }
        if (polynomial && (n == null || mu == null)) {
            throw new InvalidInputException(n == null ? "--n" : "--mu", "a special polynomial needs both --n and --mu");
        }
        if (polynomial && index != null) {
            throw new InvalidInputException("--special-index", "applies to rational solutions (--alpha .. --delta), not"
                    + " to --n --mu");
        }
        if (n != null && (n < 0 || n > SpecialPolynomials.MAX_INDEX)) {
            throw new InvalidInputException("--n", "must be in [0, " + SpecialPolynomials.MAX_INDEX + "], got " + n);
        }
        if (index != null && index < 0) {
            throw new InvalidInputException("--special-index", "must be >= 0, got " + index);
        }
        if (out != null) {
            OutputFile.checkWritable("--out", out);
        }
        if (plot != null) {
            OutputFile.checkPicture("--plot", plot);
        }
        List<String> comments = new ArrayList<>();
        List<CertifiedRoot> first;
        List<CertifiedRoot> second = List.of();
        String firstKind;
        String title;
        if (polynomial) {
            ExactNumber m = ExactNumber.parse("--mu", mu);
            GaussianRational muExact = GaussianRational.of(new BigFraction(m.realNumerator(), m.realDenominator()),
                    new BigFraction(m.imaginaryNumerator(), m.imaginaryDenominator()));
            SpecialPolynomial s = SpecialPolynomials.of(n, muExact);
            first = s.degree() == 0 ? List.of() : RootIsolation.roots(s.scaled(), s.scale(), d);
            firstKind = "root";
            title = "roots of S_" + n + "(z; " + muExact + "), degree " + s.degree();
            comments.add("S_" + n + "(z; " + muExact + "), degree " + s.degree() + ", generated exactly (recurrence of"
                    + " Clarkson, J. Phys. A 36 (2003) 9507, Thm 2.1; DLMF 32.8(iii))");
            comments.add(count(first, s.degree(), "roots"));
        } else {
            RationalSolution r = rational(index == null ? 0 : index);
            first = r.zeros(d);
            second = r.poles(d);
            firstKind = "zero";
            title = "zeros and poles of the rational solution, n = " + r.index() + ", mu = " + r.mu();
            comments.add(r.description());
            comments.add(count(first, multiplicities(first), "zeros") + "; " + count(second, multiplicities(second),
                    "poles") + "; zeros and poles proved distinct (apart from z = 0): "
                    + (r.zerosAndPolesProvedDistinct() ? "yes" : "no"));
        }
        comments.add("radius: of a disk proved to contain exactly 'multiplicity' roots (Gerschgorin inclusion after"
                + " Braess and Hadeler, Numer. Math. 21 (1973) 161); digits: the correct significant digits it vouches"
                + " for; the disks of one polynomial are disjoint; simple: the polynomial proved square-free");
        StringWriter text = new StringWriter();
        PrintWriter w = new PrintWriter(text);
        for (String c : comments) {
            w.println("# " + c);
        }
        w.println("kind,re,im,radius,multiplicity,digits,simple");
        for (CertifiedRoot r : first) {
            w.println(row(firstKind, r, d));
        }
        for (CertifiedRoot r : second) {
            w.println(row("pole", r, d));
        }
        w.flush();
        if (out == null) {
            stdout.print(text);
            stdout.flush();
        } else {
            OutputFile.writeWhole("--out", out, p -> Files.writeString(p, text.toString(), StandardCharsets.UTF_8));
            err.println("tertius: wrote " + out);
        }
        if (plot != null) {
            draw(first, second, polynomial, title, comments.get(1));
            err.println("tertius: wrote " + plot);
        }
        return 0;
    }

    private static int multiplicities(List<CertifiedRoot> roots) {
        int m = 0;
        for (CertifiedRoot r : roots) {
            m += r.multiplicity();
        }
        return m;
    }

    /** The certified count: disks, their multiplicities, the degree they must add up to. */
    private static String count(List<CertifiedRoot> roots, int degree, String what) {
        int m = multiplicities(roots);
        if (m != degree) {
            throw new IllegalStateException("the certified multiplicities add up to " + m + ", not the degree " + degree);
        }
        List<CertifiedRoot> disks = new ArrayList<>();
        int exact = 0;
        for (CertifiedRoot r : roots) {
            if (r.log10Radius() == Double.NEGATIVE_INFINITY) {
                exact += r.multiplicity();
            } else {
                disks.add(r);
            }
        }
        long simple = disks.stream().filter(r -> r.multiplicity() == 1).count();
        boolean proved = !roots.isEmpty() && roots.stream().allMatch(CertifiedRoot::simpleProved);
        String text = simple == disks.size() ? disks.size() + " inclusion disks of one root each"
                : disks.size() + " inclusion disks (" + simple + " of one root, the others clusters)";
        if (exact > 0) {
            text = "z = 0 of multiplicity " + exact + " exactly, " + text;
        }
        return degree + " " + what + " certified: " + text + (proved ? ", all simple (proved)" : "")
                + (exact > 0 || simple < disks.size() ? "; multiplicities add up to " + degree : "");
    }

    /** The rational solution of the equation given; a library refusal names the option that sets its argument. */
    private RationalSolution rational(int which) {
        try {
            return RationalSolution.of(SpecialOptions.parameters(equation.texts()), which);
        } catch (InvalidInputException e) {
            if ("family".equals(e.argument())) {
                throw new InvalidInputException("--alpha", "(with --beta, --gamma, --delta) " + e.reason());
            }
            if ("index".equals(e.argument()) || "root".equals(e.argument())) {
                throw e.renamed("--special-index");
            }
            throw e;
        }
    }

    private static String row(String kind, CertifiedRoot r, int digits) {
        String[] parts = PreciseValue.parts(r.value(), digits);
        String radius = r.log10Radius() == Double.NEGATIVE_INFINITY ? "0"
                : String.format(Locale.ROOT, "%.3e", r.radius());
        return kind + "," + parts[0] + "," + parts[1] + "," + radius + "," + r.multiplicity() + ","
                + Math.min(digits, r.correctDigits()) + "," + (r.simpleProved() ? "yes" : "no");
    }

    private void draw(List<CertifiedRoot> first, List<CertifiedRoot> second, boolean polynomial, String title,
                      String subtitle) {
        List<Complex> a = new ArrayList<>();
        List<Complex> b = new ArrayList<>();
        double extent = 0;
        for (CertifiedRoot r : first) {
            a.add(r.toComplex());
        }
        for (CertifiedRoot r : second) {
            b.add(r.toComplex());
        }
        for (List<Complex> list : List.of(a, b)) {
            for (Complex c : list) {
                extent = Math.max(extent, Math.max(Math.abs(c.getReal()), Math.abs(c.getImaginary())));
            }
        }
        double r = extent > 0 ? 1.1 * extent : 1;
        Grid g = Grid.of(-r, r, 2, -r, r, 2, 0);
        String shortSubtitle = subtitle.length() > 110 ? subtitle.substring(0, 107) + "..." : subtitle;
        BufferedImage img = FieldPainter.points(g, a, polynomial ? "roots" : "zeros", b, "poles", title, shortSubtitle,
                WIDTH, HEIGHT);
        OutputFile.writeWhole("--plot", plot, p -> ImageIO.write(img, "png", p.toFile()));
    }
}
