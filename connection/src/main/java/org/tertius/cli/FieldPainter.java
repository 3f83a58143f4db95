package org.tertius.cli;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
import java.io.IOException;
import java.io.OutputStream;
import java.util.List;
import java.util.Locale;
import java.util.stream.IntStream;
import javax.imageio.ImageIO;
import org.hipparchus.complex.Complex;
import org.tertius.core.region.Grid;
import org.tertius.core.region.GridResult;
import org.tertius.core.region.Singularity;

/**
 * Draws a solution over a region (Java2D): hue shows the phase of w (red at arg w = 0, then yellow, green,
 * cyan, blue, magenta as the argument grows), lightness shows the modulus (black at a zero, mid-tone at |w| = 1,
 * white at a pole: L = 2 atan(|w|)/pi), with faint bands at every doubling of |w| that fade out towards
 * the two extremes. Located poles are ringed in
 * black and zeros in white; axes with tick labels, a title and a legend. Points that could not be computed are
 * grey. Also draws point patterns in the plane on the same axes ({@link #points}: the roots of a polynomial, the
 * zeros and poles of a closed form).
 */
final class FieldPainter {
    static final int LEFT = 80;
    static final int RIGHT = 190;
    static final int TOP = 56;
    static final int BOTTOM = 56;
    static final Color MISSING = new Color(128, 128, 128);
    /** A value without a known digit but larger than this in modulus is drawn as a pole (white). */
    static final double NEXT_TO_POLE = 1e6;

    private FieldPainter() {
    }

    /** The colour of a value, as the legend describes. */
    static int rgb(double re, double im) {
        if (!Double.isFinite(re) || !Double.isFinite(im)) {
            return MISSING.getRGB();
        }
        double mod = Math.hypot(re, im);
        double hue = (Math.atan2(im, re) / (2 * Math.PI) + 1) % 1.0;
        double light = 2 * Math.atan(mod) / Math.PI;
        if (mod > 0 && Double.isFinite(mod)) {
            double band = Math.log(mod) / Math.log(2);
            double frac = band - Math.floor(band);
            // bands fade out towards black (zeros) and white (poles), so the extremes keep the legend's colours
            light = light * (1 - 0.08 * (1 - frac) * 4 * light * (1 - light));
        }
        return hsl(hue, 1.0, light);
    }

    static int hsl(double h, double s, double l) {
        double c = (1 - Math.abs(2 * l - 1)) * s;
        double hp = h * 6;
        double x = c * (1 - Math.abs(hp % 2 - 1));
        double r = 0;
        double g = 0;
        double b = 0;
        if (hp < 1) {
            r = c;
            g = x;
        } else if (hp < 2) {
            r = x;
            g = c;
        } else if (hp < 3) {
            g = c;
            b = x;
        } else if (hp < 4) {
            g = x;
            b = c;
        } else if (hp < 5) {
            r = x;
            b = c;
        } else {
            r = c;
            b = x;
        }
        double m = l - c / 2;
        int ri = (int) Math.round(255 * Math.min(1, Math.max(0, r + m)));
        int gi = (int) Math.round(255 * Math.min(1, Math.max(0, g + m)));
        int bi = (int) Math.round(255 * Math.min(1, Math.max(0, b + m)));
        return (0xff << 24) | (ri << 16) | (gi << 8) | bi;
    }

    /** Pixel column of Re z in an image of the given width. */
    static int px(Grid g, double re, int width) {
        int w = width - LEFT - RIGHT;
        return LEFT + (int) Math.floor((re - g.re0()) / (g.re1() - g.re0()) * (w - 1) + 0.5);
    }

    /** Pixel row of Im z. */
    static int py(Grid g, double im, int height) {
        int h = height - TOP - BOTTOM;
        return TOP + (h - 1) - (int) Math.floor((im - g.im0()) / (g.im1() - g.im0()) * (h - 1) + 0.5);
    }

    /**
     * The picture of the first value of a grid result (named {@code value}, of the variable {@code variable}) with
     * the located poles and zeros ringed.
     */
    static BufferedImage paint(GridResult r, List<Singularity> marks, String title, String value, String variable,
                               int width, int height) {
        Grid g = r.grid();
        BufferedImage img = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        Graphics2D gr = img.createGraphics();
        gr.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        gr.setColor(Color.WHITE);
        gr.fillRect(0, 0, width, height);
        int pw = width - LEFT - RIGHT;
        int ph = height - TOP - BOTTOM;
        // each pixel shows the grid point nearest to it: the colours of the grid points (a pure function of the
        // values, so computed on all processors) are spread over the pixels' rows of the raster
        int[] colour = gridColours(r);
        int[] column = new int[pw];
        for (int x = 0; x < pw; x++) {
            column[x] = g.nx() == 1 ? 0 : (int) Math.round((double) x / Math.max(1, pw - 1) * (g.nx() - 1));
        }
        int[] raster = ((DataBufferInt) img.getRaster().getDataBuffer()).getData();
        for (int y = 0; y < ph; y++) {
            int j = g.ny() == 1 ? 0 : (int) Math.round((double) (ph - 1 - y) / Math.max(1, ph - 1) * (g.ny() - 1));
            int offset = (TOP + y) * width + LEFT;
            for (int x = 0; x < pw; x++) {
                raster[offset + x] = colour[j * g.nx() + column[x]] & 0xffffff;
            }
        }
        gr.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        for (Singularity s : marks) {
            int x = px(g, g.logarithmic() ? s.point().logRe() : s.point().re(), width);
            int y = py(g, g.logarithmic() ? s.point().logIm() : s.point().im(), height);
            gr.setStroke(new BasicStroke(1.5f));
            gr.setColor(s.kind() == Singularity.Kind.POLE ? Color.BLACK : Color.WHITE);
            gr.drawOval(x - 5, y - 5, 10, 10);
        }
        axes(gr, g, variable, width, height);
        gr.setColor(Color.BLACK);
        gr.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 14));
        gr.drawString(title, LEFT, 22);
        gr.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 12));
        String where = g.logarithmic() ? "strip in log z (several sheets)"
                : String.format(Locale.ROOT, "sheet %d: arg z in (-pi, pi] + 2 pi (%d)", g.sheet(), g.sheet());
        gr.drawString(String.format(Locale.ROOT, "%s;  %d poles, %d zeros marked", where, marks.stream().filter(m -> m.kind() == Singularity.Kind.POLE).count(),
                marks.stream().filter(m -> m.kind() == Singularity.Kind.ZERO).count()), LEFT, 40);
        legend(gr, value, width, height);
        gr.dispose();
        return img;
    }

    /** The colour of every grid point (row-major), as {@link #rgb} and the legend say. */
    static int[] gridColours(GridResult r) {
        Grid g = r.grid();
        int nx = g.nx();
        int[] colour = new int[nx * g.ny()];
        IntStream.range(0, g.ny()).parallel().forEach(j -> {
            for (int i = 0; i < nx; i++) {
                Complex w = r.primary(i, j);
                int c;
                if (r.computed(i, j)) {
                    c = rgb(w.getReal(), w.getImaginary());
                } else if (w.isInfinite() || w.norm() > NEXT_TO_POLE) {
                    // closer to a pole than its position is known: no digit, but certainly next to a pole
                    c = Color.WHITE.getRGB();
                } else {
                    c = MISSING.getRGB();
                }
                colour[j * nx + i] = c;
            }
        });
        return colour;
    }

    /**
     * Loads and initialises what drawing and writing a picture use (the imaging classes, the fonts of the labels,
     * the PNG writer) by drawing a small picture that is thrown away: run on another thread while the values are
     * computed, it takes that start-up cost off the path of a {@code field} run.
     */
    static void warmUp() {
        try {
            BufferedImage img = new BufferedImage(64, 32, BufferedImage.TYPE_INT_RGB);
            Graphics2D gr = img.createGraphics();
            gr.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            gr.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            for (int style : new int[] {Font.BOLD, Font.PLAIN}) {
                gr.setFont(new Font(Font.SANS_SERIF, style, 12));
                gr.drawString("0.5 Re z", 2, 12);
                gr.getFontMetrics().stringWidth("-10");
            }
            gr.setStroke(new BasicStroke(1.5f));
            gr.drawOval(20, 10, 10, 10);
            gr.dispose();
            ImageIO.write(img, "png", OutputStream.nullOutputStream());
        } catch (IOException | RuntimeException | LinkageError e) {
            // only a warm-up: drawing the real picture meets the same failure and reports it
        }
    }

    /**
     * A pattern of points in the plane of one sheet (the roots of a polynomial; the zeros and poles of a closed
     * form): {@code filled} points as black dots, {@code ringed} ones as red rings, over the axes of {@code g}.
     */
    static BufferedImage points(Grid g, List<Complex> filled, String filledName, List<Complex> ringed,
                                String ringedName, String title, String subtitle, int width, int height) {
        BufferedImage img = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        Graphics2D gr = img.createGraphics();
        gr.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        gr.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        gr.setColor(Color.WHITE);
        gr.fillRect(0, 0, width, height);
        gr.setStroke(new BasicStroke(1.5f));
        gr.setColor(Color.BLACK);
        for (Complex c : filled) {
            gr.fillOval(px(g, c.getReal(), width) - 3, py(g, c.getImaginary(), height) - 3, 7, 7);
        }
        gr.setColor(Color.RED);
        for (Complex c : ringed) {
            gr.drawOval(px(g, c.getReal(), width) - 5, py(g, c.getImaginary(), height) - 5, 10, 10);
        }
        axes(gr, g, "z", width, height);
        gr.setColor(Color.BLACK);
        gr.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 14));
        gr.drawString(title, LEFT, 22);
        gr.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 12));
        gr.drawString(subtitle, LEFT, 40);
        int x0 = width - RIGHT + 24;
        gr.fillOval(x0 + 7, TOP + 4, 7, 7);
        gr.drawString(filled.size() + " " + filledName, x0 + 24, TOP + 12);
        if (!ringed.isEmpty()) {
            gr.setColor(Color.RED);
            gr.drawOval(x0 + 5, TOP + 22, 10, 10);
            gr.setColor(Color.BLACK);
            gr.drawString(ringed.size() + " " + ringedName, x0 + 24, TOP + 32);
        }
        gr.dispose();
        return img;
    }

    private static void axes(Graphics2D gr, Grid g, String z, int width, int height) {
        gr.setColor(Color.BLACK);
        gr.setStroke(new BasicStroke(1f));
        int pw = width - LEFT - RIGHT;
        int ph = height - TOP - BOTTOM;
        gr.drawRect(LEFT - 1, TOP - 1, pw + 1, ph + 1);
        gr.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        FontMetrics fm = gr.getFontMetrics();
        for (double t : ticks(g.re0(), g.re1())) {
            int x = px(g, t, width);
            gr.drawLine(x, TOP + ph, x, TOP + ph + 5);
            String s = tickLabel(t);
            gr.drawString(s, x - fm.stringWidth(s) / 2, TOP + ph + 18);
        }
        for (double t : ticks(g.im0(), g.im1())) {
            int y = py(g, t, height);
            gr.drawLine(LEFT - 6, y, LEFT - 1, y);
            String s = tickLabel(t);
            gr.drawString(s, LEFT - 9 - fm.stringWidth(s), y + 4);
        }
        gr.drawString(g.logarithmic() ? "log |" + z + "|" : "Re " + z, LEFT + pw / 2 - 12, height - 14);
        gr.drawString(g.logarithmic() ? "arg " + z : "Im " + z, 8, TOP + ph / 2);
    }

    static double[] ticks(double lo, double hi) {
        double span = hi - lo;
        double step = Math.pow(10, Math.floor(Math.log10(span / 5)));
        for (double m : new double[] {1, 2, 5, 10}) {
            if (span / (step * m) <= 8) {
                step *= m;
                break;
            }
        }
        double first = Math.ceil(lo / step) * step;
        int n = (int) Math.floor((hi - first) / step + 1e-9) + 1;
        double[] t = new double[Math.max(0, n)];
        for (int k = 0; k < t.length; k++) {
            t[k] = first + k * step;
        }
        return t;
    }

    /** A tick label: 0 for |t| below 1e-12, else four significant digits without trailing zeros. */
    static String tickLabel(double t) {
        if (Math.abs(t) < 1e-12) {
            return "0";
        }
        String s = String.format(Locale.ROOT, "%.4g", t);
        if (s.contains(".") && !s.contains("e")) {
            s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return s;
    }

    private static void legend(Graphics2D gr, String w, int width, int height) {
        int x0 = width - RIGHT + 24;
        int y0 = TOP;
        gr.setColor(Color.BLACK);
        gr.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 12));
        gr.drawString("Legend", x0, y0 + 4);
        gr.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        // phase bar at |w| = 1
        int bh = 120;
        gr.drawString("arg " + w + " (at |" + w + "| = 1)", x0, y0 + 24);
        for (int k = 0; k < bh; k++) {
            double arg = Math.PI - 2 * Math.PI * k / (bh - 1);
            gr.setColor(new Color(rgb(Math.cos(arg), Math.sin(arg))));
            gr.fillRect(x0, y0 + 30 + k, 22, 1);
        }
        gr.setColor(Color.BLACK);
        gr.drawString("pi", x0 + 28, y0 + 40);
        gr.drawString("0", x0 + 28, y0 + 30 + bh / 2 + 4);
        gr.drawString("-pi", x0 + 28, y0 + 30 + bh);
        // modulus bar at arg w = 0
        int my = y0 + 30 + bh + 30;
        gr.drawString("|" + w + "| (at arg " + w + " = 0)", x0, my - 6);
        double[] mods = {0, 0.25, 1, 4, 1e300};
        String[] labels = {"0: zero (black)", "1/4", "1", "4", "pole (white)"};
        for (int k = 0; k < bh; k++) {
            double l = (double) k / (bh - 1);
            double mod = l >= 1 ? Double.POSITIVE_INFINITY : Math.tan(Math.PI * l / 2);
            gr.setColor(new Color(mod == Double.POSITIVE_INFINITY ? 0xffffff : rgb(mod, 0)));
            gr.fillRect(x0, my + (bh - 1 - k), 22, 1);
        }
        gr.setColor(Color.BLACK);
        gr.drawRect(x0, my, 22, bh);
        for (int k = 0; k < mods.length; k++) {
            double l = mods[k] >= 1e300 ? 1 : 2 * Math.atan(mods[k]) / Math.PI;
            int y = my + (int) Math.round((bh - 1) * (1 - l));
            gr.drawString(labels[k], x0 + 28, y + 4);
        }
        // markers
        int ky = my + bh + 28;
        gr.setColor(Color.BLACK);
        gr.drawOval(x0 + 6, ky - 9, 10, 10);
        gr.drawString("located pole", x0 + 28, ky);
        gr.setColor(Color.GRAY);
        gr.fillRect(x0 + 2, ky + 8, 18, 16);
        gr.setColor(Color.WHITE);
        gr.drawOval(x0 + 6, ky + 11, 10, 10);
        gr.setColor(Color.BLACK);
        gr.drawString("located zero", x0 + 28, ky + 20);
        gr.setColor(MISSING);
        gr.fillRect(x0 + 2, ky + 32, 18, 12);
        gr.setColor(Color.BLACK);
        gr.drawString("not computed", x0 + 28, ky + 42);
    }
}
