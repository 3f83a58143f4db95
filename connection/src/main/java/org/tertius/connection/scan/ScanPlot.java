package org.tertius.connection.scan;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import javax.imageio.ImageIO;

/**
 * A PNG plot of a scan (Java2D and ImageIO): first real singularity against the parameter (zeros and poles
 * as separate series), the exponent sigma at 0 of the pole-free members on a second series, axes with tick
 * labels, title and legend.
 */
public final class ScanPlot {
    private static final int W = 900;
    private static final int H = 600;
    private static final int L = 90;
    private static final int R = 40;
    private static final int T = 60;
    private static final int B = 70;

    private ScanPlot() {
    }

    public static void write(List<Classification> rows, String title, String parameterName, Path file) {
        BufferedImage img = new BufferedImage(W, H, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setColor(Color.WHITE);
        g.fillRect(0, 0, W, H);
        double[] xr = range(rows, true);
        double[] yr = range(rows, false);
        g.setColor(Color.BLACK);
        g.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 18));
        g.drawString(title, L, T - 25);
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 13));
        g.drawRect(L, T, W - L - R, H - T - B);
        for (int i = 0; i <= 5; i++) {
            double xv = xr[0] + (xr[1] - xr[0]) * i / 5;
            int px = px(xv, xr);
            g.drawLine(px, H - B, px, H - B + 6);
            g.drawString(String.format(Locale.ROOT, "%.4g", xv), px - 20, H - B + 22);
            double yv = yr[0] + (yr[1] - yr[0]) * i / 5;
            int py = py(yv, yr);
            g.drawLine(L - 6, py, L, py);
            g.drawString(String.format(Locale.ROOT, "%.4g", yv), 10, py + 5);
        }
        g.drawString(parameterName, W / 2, H - 20);
        g.rotate(-Math.PI / 2);
        g.drawString("x of first singularity / sigma", -H / 2 - 90, 25);
        g.rotate(Math.PI / 2);
        series(g, rows, yr, xr, "zero", new Color(200, 30, 30));
        series(g, rows, yr, xr, "pole", new Color(30, 30, 200));
        series(g, rows, yr, xr, "sigma", new Color(20, 140, 20));
        legend(g);
        g.dispose();
        try {
            ImageIO.write(img, "png", file.toFile());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void legend(Graphics2D g) {
        String[] names = {"first zero of w", "first pole of w", "sigma at 0 (pole-free)"};
        Color[] colors = {new Color(200, 30, 30), new Color(30, 30, 200), new Color(20, 140, 20)};
        int x = W - R - 210;
        g.setColor(Color.WHITE);
        g.fillRect(x - 10, T + 10, 210, 70);
        g.setColor(Color.BLACK);
        g.drawRect(x - 10, T + 10, 210, 70);
        for (int i = 0; i < 3; i++) {
            g.setColor(colors[i]);
            g.fillOval(x, T + 20 + 20 * i, 8, 8);
            g.setColor(Color.BLACK);
            g.drawString(names[i], x + 15, T + 29 + 20 * i);
        }
    }

    private static double y(Classification c, String which) {
        if ("sigma".equals(which)) {
            return c.poleFree() ? c.sigma() : Double.NaN;
        }
        return which.equals(c.kind()) ? c.firstSingularity() : Double.NaN;
    }

    private static void series(Graphics2D g, List<Classification> rows, double[] yr, double[] xr, String which,
                               Color color) {
        g.setColor(color);
        g.setStroke(new BasicStroke(1.5f));
        int lastX = -1;
        int lastY = -1;
        for (Classification c : rows) {
            double v = y(c, which);
            if (!Double.isFinite(v)) {
                lastX = -1;
                continue;
            }
            int px = px(c.parameter(), xr);
            int py = py(v, yr);
            g.fillOval(px - 3, py - 3, 6, 6);
            if (lastX >= 0) {
                g.drawLine(lastX, lastY, px, py);
            }
            lastX = px;
            lastY = py;
        }
    }

    private static double[] range(List<Classification> rows, boolean parameter) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (Classification c : rows) {
            double[] vs = parameter ? new double[] {c.parameter()}
                    : new double[] {y(c, "zero"), y(c, "pole"), y(c, "sigma")};
            for (double v : vs) {
                if (Double.isFinite(v)) {
                    lo = Math.min(lo, v);
                    hi = Math.max(hi, v);
                }
            }
        }
        if (!(lo < hi)) {
            lo = Double.isFinite(lo) ? lo - 1 : 0;
            hi = lo + 2;
        }
        return new double[] {lo, hi};
    }

    private static int px(double x, double[] r) {
        return L + (int) Math.round((x - r[0]) / (r[1] - r[0]) * (W - L - R));
    }

    private static int py(double y, double[] r) {
        return H - B - (int) Math.round((y - r[0]) / (r[1] - r[0]) * (H - T - B));
    }
}
