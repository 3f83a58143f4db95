package org.tertius.cli;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.imageio.ImageIO;
import org.apache.commons.cli.Options;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ComplexText;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.core.region.Grid;
import org.tertius.core.region.GridResult;
import org.tertius.core.region.PoleFinder;
import org.tertius.core.region.RegionSettings;
import org.tertius.core.region.RegionSolver;
import org.tertius.core.region.RegionTree;
import org.tertius.core.region.Singularity;
import org.tertius.hierarchy.PlaneGrid;
import org.tertius.hierarchy.nls.NearFieldProfile;
import org.tertius.hierarchy.nls.ProfileValue;

/**
 * The built-in demo scenario: a generic D6 solution (alpha = 1, beta = -1/2, gamma = 1, delta = -1,
 * w(1) = 1/2, w'(1) = 1/3): values at points of three sheets, a table and a plot along the positive real axis
 * with its poles, and the pole field of the principal sheet as a picture and a pole list.
 */
public final class DemoCommand implements Command {
    static final Painleve3 EQUATION = Painleve3.of(1, -0.5, 1, -1);
    static final Complex Z0 = Complex.ONE;
    static final Complex W0 = new Complex(0.5);
    static final Complex DW0 = new Complex(1.0 / 3.0);

    Path out;

    static Painleve3Solution solution() {
        return Painleve3Solution.builder(EQUATION).start(Z0, W0, DW0).build();
    }

    @Override
    public String name() {
        return "demo";
    }

    private static void header(PrintWriter w, String equation, String what, String columns) {
        w.println("# " + equation);
        w.println("# " + what);
        w.println(columns);
    }

    @Override
    public String description() {
        return "Run the built-in scenario (a generic D6 solution) and write its results into a folder.";
    }

    /**
     * |Psi(X, T)| of the near-field profile of focusing NLS over X in [-8, 8], T in [-2, 2] (rows in parallel, the
     * others by symmetry), drawn; its value at the origin, Psi(0, 0) = 4, printed with its error.
     */
    private Path nearFieldProfile(PrintWriter console) throws IOException {
        NearFieldProfile psi = NearFieldProfile.standard();
        double[] x = new double[401];
        double[] t = new double[161];
        for (int i = 0; i < x.length; i++) {
            x[i] = -8 + 16.0 * i / (x.length - 1);
        }
        for (int j = 0; j < t.length; j++) {
            t[j] = -2 + 4.0 * j / (t.length - 1);
        }
        PlaneGrid.Result r = psi.grid(x, t).compute(Runtime.getRuntime().availableProcessors(), null, null);
        double[] modulus = new double[x.length * t.length];
        for (int j = 0; j < t.length; j++) {
            for (int i = 0; i < x.length; i++) {
                modulus[j * x.length + i] = Double.isFinite(r.error(j, i)) ? r.q(j, i).norm() : Double.NaN;
            }
        }
        BufferedImage img = PlanePainter.paint(modulus, x.length, t.length, -8, 8, -2, 2, PlanePainter.Scale.MODULUS,
                "near-field profile of focusing NLS: |Psi(X, T)|", "X", "T", "|Psi|", 900, 420);
        Path picture = out.resolve("nls-profile.png");
        OutputFile.writeWhole("--out", picture, p -> ImageIO.write(img, "png", p.toFile()));
        ProfileValue origin = psi.value(0, 0);
        console.printf(Locale.ROOT, "  near-field NLS profile: Psi(0, 0) = %s (err %.1e); |Psi| over [-8,8] x [-2,2],"
                + " largest error estimate %.1e%n", ComplexText.format(origin.psi()), origin.error(), r.maxError());
        return picture;
    }

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.value("--out", "DIR", "output folder (default tertius-demo)"));
    }

    @Override
    public void read(Arguments a) {
        out = a.has("--out") ? a.path("--out") : Path.of("tertius-demo");
    }

    @Override
    public int run(PrintWriter console, PrintWriter err) throws IOException {
        try {
            Files.createDirectories(out);
        } catch (IOException e) {
            throw new InvalidInputException("--out", "cannot create folder " + out + ": " + e.getMessage());
        }
        long t0 = System.nanoTime();
        Painleve3Solution s = solution();
        console.println("tertius demo: " + EQUATION + ", w(1) = 1/2, w'(1) = 1/3 [" + EQUATION.type().describe() + "]");
        // values at a few points of three sheets
        List<SurfacePoint> pts = List.of(SurfacePoint.of(3, 2), SurfacePoint.of(1, 10), SurfacePoint.of(-8, 6),
                SurfacePoint.of(-3, 0.5, 1), SurfacePoint.of(-3, -0.5, -1), SurfacePoint.of(1e-6, 1e-6));
        Path values = out.resolve("values.csv");
        ValueRows rows = new ValueRows(s);
        try (PrintWriter w = new PrintWriter(Files.newBufferedWriter(values, StandardCharsets.UTF_8))) {
            header(w, s.equation().toString(), s.methodDescription(), rows.columns());
            for (SurfacePoint p : pts) {
                Painleve3Value v = Painleve3Value.of(s.valueAt(p));
                w.println(rows.row(v.toSolutionValue()));
                console.printf("  w(%s) = %s  (err %.1e)%n", p, ComplexText.format(v.w()),
                        Math.max(v.errW(), v.errDw()));
            }
        }
        // a table along the positive real axis, with the poles met
        List<SurfacePoint> line = Targets.line("line", "0.25:10:400", 0, s.coordinate());
        Path table = out.resolve("real-axis.csv");
        List<Singularity> onLine;
        List<Painleve3Value> lineValues = new ArrayList<>();
        try (PrintWriter w = new PrintWriter(Files.newBufferedWriter(table, StandardCharsets.UTF_8))) {
            header(w, s.equation().toString(), "the positive real axis, 400 points from 0.25 to 10", rows.columns());
            RegionTree tree = RegionTree.growAlong(s, line, RegionSettings.defaults());
            for (SurfacePoint p : line) {
                Painleve3Value v = Painleve3Value.of(tree.value(p));
                lineValues.add(v);
                w.println(rows.row(v.toSolutionValue()));
            }
            onLine = PoleFinder.alongLine(tree, line);
            for (Singularity p : onLine) {
                w.println("# pole on the line at " + p.point() + ", residue " + ComplexText.format(p.lead()));
            }
        }
        // the pole field of the principal sheet, its picture and its pole list
        Grid g = Grid.of(-8, 8, 321, -8, 8, 321, 0);
        GridResult r = RegionSolver.solve(s, g, RegionSettings.defaults());
        List<Singularity> found = PoleFinder.find(r);
        Path picture = out.resolve("pole-field.png");
        BufferedImage img = FieldPainter.paint(r, found, s.equation().toString(), "w", "z", 900, 720);
        OutputFile.writeWhole("--out", picture, p -> ImageIO.write(img, "png", p.toFile()));
        Path poles = out.resolve("poles.csv");
        Files.writeString(poles, SingularityRows.csv("z", found), StandardCharsets.UTF_8);
        Path plot = out.resolve("real-axis.png");
        double[] x = new double[line.size()];
        double[] re = new double[line.size()];
        double[] im = new double[line.size()];
        for (int i = 0; i < x.length; i++) {
            Painleve3Value v = lineValues.get(i);
            x[i] = line.get(i).re();
            re[i] = v.w().getReal();
            im[i] = v.w().getImaginary();
        }
        double[] px = onLine.stream().mapToDouble(p -> p.point().re()).toArray();
        BufferedImage lp = LinePlot.draw(s.equation().toString(), "z (real axis)", "w", x, re, im, px, 900, 500);
        OutputFile.writeWhole("--out", plot, p -> ImageIO.write(lp, "png", p.toFile()));
        Path profile = nearFieldProfile(console);
        long poleCount = found.stream().filter(p -> p.kind() == Singularity.Kind.POLE).count();
        console.printf(Locale.ROOT, "  %d poles and %d zeros in [-8,8]^2 (sheet 0); %d pole(s) on the real"
                + " segment [0.25, 10]%n", poleCount, found.size() - poleCount, onLine.size());
        console.printf(Locale.ROOT, "  grid 321 x 321: %s%n", r.statistics());
        console.println("wrote:");
        for (Path p : List.of(values, table, plot, picture, poles, profile)) {
            console.println("  " + p.toAbsolutePath());
        }
        console.printf(Locale.ROOT, "done in %.1f s%n", (System.nanoTime() - t0) / 1e9);
        return 0;
    }
}
