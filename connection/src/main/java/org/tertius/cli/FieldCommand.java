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
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.region.Grid;
import org.tertius.core.region.GridResult;
import org.tertius.core.region.PoleFinder;
import org.tertius.core.region.RegionSettings;
import org.tertius.core.region.RegionSolver;
import org.tertius.core.region.RegionTree;
import org.tertius.core.region.Singularity;
import org.tertius.hierarchy.OriginSolution;
import org.tertius.hierarchy.PlaneGrid;

/** A PNG picture of a solution's first value over a region, or a line plot of it along a segment. */
public final class FieldCommand implements Command {
    final SolutionOptions solution = new SolutionOptions();
    final RegionOptions region = new RegionOptions("the region (one sheet)");
    final PlaneOptions plane = new PlaneOptions();
    String line;
    Path out;
    String size;
    boolean noMarks;
    boolean phase;

    @Override
    public String name() {
        return "field";
    }

    @Override
    public String description() {
        return "Draw the solution (w, or q for a hierarchy member) over a region of one sheet (--grid) or a strip in"
                + " log z (--log-strip) as a PNG: colour shows the phase, lightness the modulus (zeros black, poles"
                + " white), located poles and zeros ringed; or plot its real and imaginary parts along a segment"
                + " (--line) with its poles marked.";
    }

    @Override
    public List<OptionGroup> groups() {
        return List.of(solution, region, plane);
    }

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.value("--line", "A:B:N", "plot along this segment instead"));
        o.addOption(OptionKinds.required("--out", "FILE.png", "the PNG file"));
        o.addOption(OptionKinds.value("--size", "WxH", "picture size in pixels (default 900x720)"));
        o.addOption(OptionKinds.flag("--no-marks", "do not locate and mark poles and zeros"));
        o.addOption(OptionKinds.flag("--phase", "with --plane: draw the phase of q instead of its modulus"));
    }

    @Override
    public void read(Arguments a) {
        line = a.text("--line");
        out = a.path("--out");
        size = a.has("--size") ? a.text("--size") : "900x720";
        noMarks = a.has("--no-marks");
        phase = a.has("--phase");
    }

    @Override
    public int run(PrintWriter stdout, PrintWriter err) {
        ProblemFile f = solution.file();
        if (plane.given()) {
            if (line != null || region.given()) {
                throw new InvalidInputException("--plane", "give one of --line, --grid, --log-strip and --plane");
            }
            return planePicture(err);
        }
        if (phase) {
            throw new InvalidInputException("--phase", "applies to --plane pictures only");
        }
        String lineSpec = line != null ? line : (region.given() ? null : f.get("line"));
        String gridSpec = region.gridSpec(f, line != null);
        if ((gridSpec == null && region.logStrip == null) == (lineSpec == null)) {
            throw new InvalidInputException("--grid", "give exactly one of --grid RE0:RE1:NX,IM0:IM1:NY,"
                    + " --log-strip LOGR0:LOGR1:NX,ARG0:ARG1:NY and --line A:B:N");
        }
        int[] wh = parseSize(size);
        OutputFile.checkPicture("--out", out);
        int k = solution.sheet(region.sheet);
        ComputedSolution s = solution.solution();
        solution.notes().forEach(n -> err.println("tertius: " + n));
        if (lineSpec != null) {
            return linePlot(s, Targets.line("--line", lineSpec, k, s.coordinate()), wh, err);
        }
        Grid g = region.grid(gridSpec, k, s.coordinate());
        if (g.nx() < 2 || g.ny() < 2) {
            throw new InvalidInputException("--grid", "a picture needs at least 2 x 2 points");
        }
        String note = RegionOptions.branchPointNote(g, s.coordinate());
        if (note != null) {
            err.println("tertius: " + note);
        }
        // the drawing's start-up on another thread while the tree grows (that pass runs on one processor)
        Thread warmUp = new Thread(FieldPainter::warmUp, "tertius-draw-warm-up");
        warmUp.setDaemon(true);
        warmUp.start();
        GridResult r;
        try (Progress progress = new Progress("field")) {
            r = RegionSolver.solve(s, g, RegionSettings.builder().progress(progress::update).build());
        }
        List<Singularity> marks = noMarks || s.engineReading().isEmpty() ? List.of() : PoleFinder.find(r);
        if (!noMarks && solution.special.built() != null) {
            // a closed form or a Backlund image: its poles and zeros from the engine started from its values
            marks = PoleFinder.find(RegionTree.grow(solution.special.built().integrated(solution.solver.settings()), g,
                    RegionSettings.defaults()), g);
        }
        String value = s.valueNames().get(0);
        BufferedImage img = FieldPainter.paint(r, marks, title(s), value, s.coordinate().name(), wh[0], wh[1]);
        OutputFile.writeWhole("--out", out, p -> ImageIO.write(img, "png", p.toFile()));
        err.println(String.format(Locale.ROOT, "tertius: wrote %s (%dx%d); %s; largest error estimate %.1e relative to"
                + " 1+|%s|", out, wh[0], wh[1], r.statistics(), r.maxRelativeError(), value));
        return r.statistics().failed() == 0 ? 0 : Main.EXIT_UNREACHED;
    }

    /** |q| (or its phase) over the physical plane of a member started at x = t_n = 0, as a figure. */
    private int planePicture(PrintWriter err) {
        int[] wh = parseSize(size);
        OutputFile.checkPicture("--out", out);
        Grid g = plane.grid();
        OriginSolution o = PlaneOptions.solution(solution);
        PlaneGrid.Result r;
        try (Progress progress = new Progress("field")) {
            r = PlaneOptions.compute(o, g, 0, progress, err);
        }
        double[] v = new double[g.size()];
        for (int j = 0; j < g.ny(); j++) {
            for (int i = 0; i < g.nx(); i++) {
                Complex q = r.q(j, i);
                v[j * g.nx() + i] = Double.isFinite(r.error(j, i)) ? (phase ? q.getArgument() : q.norm()) : Double.NaN;
            }
        }
        String t = "t_" + o.member().order();
        boolean profile = solution.member.profile != null;
        String name = profile ? "Psi" : "q";
        String x = profile ? "X" : "x";
        String y = profile ? "T" : t;
        String title = (profile ? "near-field profile of focusing NLS (member 2, s = " + o.s().getReal() + "): "
                : "member " + o.member().order() + ", s = " + o.s() + ", m = " + o.m() + ": ")
                + (phase ? "arg " : "|") + name + "(" + x + ", " + y + ")" + (phase ? "" : "|");
        BufferedImage img = PlanePainter.paint(v, g.nx(), g.ny(), g.re0(), g.re1(), g.im0(), g.im1(),
                phase ? PlanePainter.Scale.PHASE : PlanePainter.Scale.MODULUS, title, x, y,
                phase ? "arg " + name : "|" + name + "|", wh[0], wh[1]);
        OutputFile.writeWhole("--out", out, p -> ImageIO.write(img, "png", p.toFile()));
        err.println("tertius: wrote " + out);
        return 0;
    }

    /** The picture's title: the equation, and for anything but w which value is drawn. */
    private static String title(ComputedSolution s) {
        String value = s.valueNames().get(0);
        String eq = s.equationDescription();
        int bracket = eq.indexOf(" [");
        String shortEq = bracket > 0 ? eq.substring(0, bracket) : eq;
        return value.equals("w") ? shortEq : shortEq + ": " + value + "(" + s.coordinate().name() + ")";
    }

    private int linePlot(ComputedSolution s, List<SurfacePoint> points, int[] wh, PrintWriter err) {
        double[] x = new double[points.size()];
        double[] re = new double[points.size()];
        double[] im = new double[points.size()];
        SurfacePoint a = points.get(0);
        SurfacePoint b = points.get(points.size() - 1);
        boolean realSegment = a.im() == 0 && b.im() == 0;
        RegionTree tree = RegionTree.growAlong(s, points, RegionSettings.defaults());
        int failed = 0;
        for (int i = 0; i < points.size(); i++) {
            SurfacePoint p = points.get(i);
            x[i] = realSegment ? p.re() : Math.hypot(p.re() - a.re(), p.im() - a.im());
            try {
                Complex v = tree.value(p).value(0);
                re[i] = v.getReal();
                im[i] = v.getImaginary();
            } catch (TertiusException e) {
                re[i] = Double.NaN;
                im[i] = Double.NaN;
                failed++;
            }
        }
        double len = Math.hypot(b.re() - a.re(), b.im() - a.im());
        List<Singularity> poles = tree.integrated() ? PoleFinder.alongLine(tree, points) : List.of();
        double[] poleX = new double[poles.size()];
        for (int i = 0; i < poleX.length; i++) {
            SurfacePoint p = poles.get(i).point();
            poleX[i] = realSegment ? p.re() : Math.hypot(p.re() - a.re(), p.im() - a.im());
        }
        String z = s.coordinate().name();
        String xLabel = realSegment ? z + " (real axis" + (s.coordinate().hasSheets() ? ", sheet " + a.sheet() : "")
                + ")" : String.format(Locale.ROOT, "distance along the segment from %s (length %.4g)", a, len);
        BufferedImage img = LinePlot.draw(title(s), xLabel, s.valueNames().get(0), x, re, im, poleX, wh[0], wh[1]);
        OutputFile.writeWhole("--out", out, p -> ImageIO.write(img, "png", p.toFile()));
        err.println("tertius: wrote " + out + " with " + poles.size() + " pole(s) marked");
        return failed == 0 ? 0 : Main.EXIT_UNREACHED;
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
