package org.tertius.cli;

import java.awt.image.BufferedImage;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import javax.imageio.ImageIO;
import org.apache.commons.cli.Options;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.TertiusException;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.region.Grid;
import org.tertius.core.region.GridResult;
import org.tertius.core.region.PoleFinder;
import org.tertius.core.region.RegionSettings;
import org.tertius.core.region.RegionSolver;
import org.tertius.core.region.Singularity;

/** A PNG picture of a solution over a region, or a line plot of w along a segment. */
public final class FieldCommand implements Command {
    final SolutionOptions solution = new SolutionOptions();
    final MemberOptions member = new MemberOptions();
    String grid;
    String line;
    String logStrip;
    Integer sheet;
    Path out;
    String size;
    boolean noMarks;

    @Override
    public String name() {
        return "field";
    }

    @Override
    public String description() {
        return "Draw the solution over a region of one sheet (--grid) or a strip in log z (--log-strip) as a PNG:"
                + " colour shows the phase, lightness the modulus (zeros black, poles white), located poles and zeros"
                + " ringed; or plot Re w and Im w along a segment (--line) with its poles marked.";
    }

    @Override
    public List<OptionGroup> groups() {
        return List.of(solution, member);
    }

    @Override
    public void declare(Options o) {
        o.addOption(Opts.value("--grid", "RE0:RE1:NX,IM0:IM1:NY", "the region (one sheet)"));
        o.addOption(Opts.value("--line", "A:B:N", "plot w along this segment instead"));
        o.addOption(Opts.value("--log-strip", "LOGR0:LOGR1:NX,ARG0:ARG1:NY", Regions.LOG_STRIP_HELP));
        o.addOption(Opts.value("--sheet", "K", "sheet (default 0)"));
        o.addOption(Opts.required("--out", "FILE.png", "the PNG file"));
        o.addOption(Opts.value("--size", "WxH", "picture size in pixels (default 900x720)"));
        o.addOption(Opts.flag("--no-marks", "do not locate and mark poles and zeros"));
    }

    @Override
    public void read(Arguments a) {
        grid = a.text("--grid");
        line = a.text("--line");
        logStrip = a.text("--log-strip");
        sheet = a.integer("--sheet", null);
        out = a.path("--out");
        size = a.has("--size") ? a.text("--size") : "900x720";
        noMarks = a.has("--no-marks");
    }

    @Override
    public int run(PrintWriter stdout, PrintWriter err) {
        ProblemFile f = solution.file();
        String gridSpec = grid != null ? grid : (line == null && logStrip == null ? f.get("grid") : null);
        String lineSpec = line != null ? line : (grid == null && logStrip == null ? f.get("line") : null);
        if ((gridSpec == null && logStrip == null) == (lineSpec == null)) {
            throw new InvalidInputException("--grid", "give exactly one of --grid RE0:RE1:NX,IM0:IM1:NY,"
                    + " --log-strip LOGR0:LOGR1:NX,ARG0:ARG1:NY and --line A:B:N");
        }
        int[] wh = parseSize(size);
        OutputFile.checkWritable("--out", out);
        int k = solution.sheet(sheet);
        member.defaults(f);
        if (member.given()) {
            if (lineSpec == null) {
                throw new InvalidInputException("--member", "pictures of hierarchy members are line plots of q: use"
                        + " --line A:B:N");
            }
            return memberPlot(Targets.line("--line", lineSpec, k), wh, err);
        }
        Painleve3Solution s = solution.solution();
        String title = s.equation().toString();
        if (lineSpec != null) {
            return linePlot(s, Targets.line("--line", lineSpec, k), title, wh, err);
        }
        Grid g = Regions.region(gridSpec, logStrip, k);
        if (g.nx() < 2 || g.ny() < 2) {
            throw new InvalidInputException("--grid", "a picture needs at least 2 x 2 points");
        }
        GridResult r;
        try (Progress progress = new Progress("field")) {
            r = RegionSolver.solve(s, g, RegionSettings.builder().progress(progress::update).build());
        }
        List<Singularity> marks = noMarks ? List.of() : PoleFinder.find(s, g);
        BufferedImage img = FieldPainter.paint(r, marks, title, wh[0], wh[1]);
        OutputFile.writeWhole("--out", out, p -> ImageIO.write(img, "png", p.toFile()));
        err.println(String.format(Locale.ROOT, "tertius: wrote %s (%dx%d); %s; largest error estimate %.1e relative to"
                + " 1+|w|", out, wh[0], wh[1], r.statistics(), r.maxRelativeError()));
        return r.statistics().failed() == 0 ? 0 : Main.EXIT_UNREACHED;
    }

    private int linePlot(Painleve3Solution s, List<SurfacePoint> points, String title, int[] wh, PrintWriter err) {
        Curve c = new Curve(points, p -> s.evaluate(p).w());
        SurfacePoint a = points.get(0);
        SurfacePoint b = points.get(points.size() - 1);
        double len = Math.hypot(b.re() - a.re(), b.im() - a.im());
        boolean realSegment = c.realSegment;
        List<Singularity> poles = TableCommand.polesAlong(s, points);
        double[] poleX = new double[poles.size()];
        for (int i = 0; i < poleX.length; i++) {
            SurfacePoint p = poles.get(i).point();
            poleX[i] = realSegment ? p.re() : Math.hypot(p.re() - a.re(), p.im() - a.im());
        }
        String xLabel = realSegment ? "z (real axis, sheet " + a.sheet() + ")"
                : String.format(Locale.ROOT, "distance along the segment from %s (length %.4g)", a, len);
        BufferedImage img = LinePlot.draw(title, xLabel, c.x, c.re, c.im, poleX, wh[0], wh[1]);
        OutputFile.writeWhole("--out", out, p -> ImageIO.write(img, "png", p.toFile()));
        err.println("tertius: wrote " + out + " with " + poles.size() + " pole(s) marked");
        return c.failed == 0 ? 0 : Main.EXIT_UNREACHED;
    }

    /**
     * Values along the points of a segment: the abscissa (z itself on a real segment, else the distance from the
     * first point), real and imaginary parts, NaN where a value could not be computed.
     */
    private static final class Curve {
        final double[] x;
        final double[] re;
        final double[] im;
        final boolean realSegment;
        int failed;

        Curve(List<SurfacePoint> points, java.util.function.Function<SurfacePoint, Complex> f) {
            x = new double[points.size()];
            re = new double[points.size()];
            im = new double[points.size()];
            SurfacePoint a = points.get(0);
            realSegment = a.im() == 0 && points.get(points.size() - 1).im() == 0;
            for (int i = 0; i < points.size(); i++) {
                SurfacePoint p = points.get(i);
                x[i] = realSegment ? p.re() : Math.hypot(p.re() - a.re(), p.im() - a.im());
                try {
                    Complex v = f.apply(p);
                    re[i] = v.getReal();
                    im[i] = v.getImaginary();
                } catch (TertiusException e) {
                    re[i] = Double.NaN;
                    im[i] = Double.NaN;
                    failed++;
                }
            }
        }
    }

    private int memberPlot(List<SurfacePoint> points, int[] wh, PrintWriter err) {
        org.tertius.hierarchy.MemberSolution ms = member.solution(solution.solver.settings());
        Curve c = new Curve(points, p -> ms.evaluate(p).q());
        BufferedImage img = LinePlot.draw("member " + member.member + ": q(x), " + ms.parameters(), "x", c.x, c.re,
                c.im, new double[0], wh[0], wh[1]);
        OutputFile.writeWhole("--out", out, p -> ImageIO.write(img, "png", p.toFile()));
        err.println("tertius: wrote " + out);
        return c.failed == 0 ? 0 : Main.EXIT_UNREACHED;
    }

    static int[] parseSize(String text) {
        String[] p = text.toLowerCase(Locale.ROOT).split("x");
        try {
            int w = Integer.parseInt(p[0].trim());
            int h = Integer.parseInt(p[1].trim());
            if (p.length != 2 || w < 320 || h < 240 || w > 8000 || h > 8000) {
                throw new NumberFormatException();
            }
            return new int[] {w, h};
        } catch (RuntimeException e) {
            throw new InvalidInputException("--size", "expected WxH with 320 <= W <= 8000 and 240 <= H <= 8000, got '"
                    + text + "'");
        }
    }
}
