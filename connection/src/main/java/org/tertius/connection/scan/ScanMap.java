package org.tertius.connection.scan;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Path2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import javax.imageio.ImageIO;
import org.tertius.connection.closed.McCoyTracyWu;

/**
 * A PNG map of a 2-D sweep of the power family (Java2D and ImageIO): one cell per member over sigma
 * (horizontal) and B (vertical, logarithmic), coloured by the kind of the first singularity (poles blue, zeros
 * red, shaded from dark to light as its position moves from {@link PowerFamilyClassifier#WINDOW_START} to
 * {@link PowerFamilyClassifier#WINDOW_END} on a logarithmic scale; none in the window pale yellow; "below" grey,
 * failed black), with the critical curve B(sigma) of McCoy, Tracy and Wu (the pole-free members) drawn over it.
 */
public final class ScanMap {
    private static final int W = 960;
    private static final int H = 720;
    private static final int L = 100;
    private static final int R = 250;
    private static final int T = 60;
    private static final int B = 70;
    private static final Color NONE = new Color(255, 248, 200);
    private static final Color BELOW = new Color(150, 150, 150);
    private static final Color FAILED = Color.BLACK;
    private static final int CURVE_POINTS = 121;

    private ScanMap() {
    }

    /** Draws the rows (in task order, sigma fastest) of the sweep over {@code sigma} x {@code b}. */
    public static void write(List<PowerFamilyClassification> rows, ParameterRange sigma, ParameterRange b,
                             Path file) {
        BufferedImage img = new BufferedImage(W, H, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setColor(Color.WHITE);
        g.fillRect(0, 0, W, H);
        int ns = sigma.count();
        int nb = b.count();
        double cw = (double) (W - L - R) / ns;
        double ch = (double) (H - T - B) / nb;
        for (PowerFamilyClassification c : rows) {
            int i = c.index() % ns;
            int j = c.index() / ns;
            int x0 = L + (int) Math.round(i * cw);
            int x1 = L + (int) Math.round((i + 1) * cw);
            int y0 = H - B - (int) Math.round((j + 1) * ch);
            int y1 = H - B - (int) Math.round(j * ch);
            g.setColor(color(c));
            g.fillRect(x0, y0, x1 - x0, y1 - y0);
        }
        curve(g, sigma, b, cw, ch);
        axes(g, sigma, b, cw, ch);
        legend(g);
        g.dispose();
        try {
            ImageIO.write(img, "png", file.toFile());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The colour of a cell. */
    static Color color(PowerFamilyClassification c) {
        switch (c.kind()) {
            case "pole":
                return shade(new Color(10, 30, 120), new Color(175, 205, 255), c.firstSingularity());
            case "zero":
                return shade(new Color(120, 10, 10), new Color(255, 195, 175), c.firstSingularity());
            case "none":
                return NONE;
            case "below":
                return BELOW;
            default:
                return FAILED;
        }
    }

    private static Color shade(Color dark, Color light, double x) {
        double lo = Math.log10(PowerFamilyClassifier.WINDOW_START);
        double t = (Math.log10(x) - lo) / (Math.log10(PowerFamilyClassifier.WINDOW_END) - lo);
        t = Double.isFinite(t) ? Math.max(0, Math.min(1, t)) : 0;
        return new Color(mix(dark.getRed(), light.getRed(), t), mix(dark.getGreen(), light.getGreen(), t),
                mix(dark.getBlue(), light.getBlue(), t));
    }

    private static int mix(int a, int b, double t) {
        return (int) Math.round(a + (b - a) * t);
    }

    /** Pixel column of sigma (cell centres at the sweep's values). */
    private static double px(double s, ParameterRange sigma, double cw) {
        return L + cw / 2 + (s - sigma.from()) / (sigma.to() - sigma.from()) * (W - L - R - cw);
    }

    /** Pixel row of B (logarithmic). */
    private static double py(double v, ParameterRange b, double ch) {
        double t = Math.log(v / b.from()) / Math.log(b.to() / b.from());
        return H - B - ch / 2 - t * (H - T - B - ch);
    }

    /** B(sigma) of the pole-free members, sigma = (2/pi) arcsin(pi lambda) (McCoy, Tracy and Wu 1977). */
    private static void curve(Graphics2D g, ParameterRange sigma, ParameterRange b, double cw, double ch) {
        double s0 = Math.max(-0.995, Math.min(sigma.from(), sigma.to()));
        double s1 = Math.min(0.995, Math.max(sigma.from(), sigma.to()));
        Path2D.Double path = new Path2D.Double();
        for (int k = 0; k < CURVE_POINTS; k++) {
            double s = s0 + (s1 - s0) * k / (CURVE_POINTS - 1);
            double lambda = Math.sin(Math.PI * s / 2) / Math.PI;
            double amplitude = McCoyTracyWu.amplitude(lambda);
            if (k == 0) {
                path.moveTo(px(s, sigma, cw), py(amplitude, b, ch));
            } else {
                path.lineTo(px(s, sigma, cw), py(amplitude, b, ch));
            }
        }
        g.setClip(L, T, W - L - R, H - T - B);
        g.setColor(Color.BLACK);
        g.setStroke(new BasicStroke(2f));
        g.draw(path);
        g.setClip(null);
    }

    private static void axes(Graphics2D g, ParameterRange sigma, ParameterRange b, double cw, double ch) {
        g.setColor(Color.BLACK);
        g.setStroke(new BasicStroke(1f));
        g.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 17));
        g.drawString("Power family w ~ B x^sigma of PIII(0,0,1,-1): first zero or pole on the positive axis", L,
                T - 25);
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 13));
        g.drawRect(L, T, W - L - R, H - T - B);
        for (int k = 0; k <= 4; k++) {
            double s = sigma.from() + (sigma.to() - sigma.from()) * k / 4;
            int x = (int) Math.round(px(s, sigma, cw));
            g.drawLine(x, H - B, x, H - B + 6);
            g.drawString(String.format(Locale.ROOT, "%.3g", s), x - 18, H - B + 22);
            double v = b.from() * Math.pow(b.to() / b.from(), k / 4.0);
            int y = (int) Math.round(py(v, b, ch));
            g.drawLine(L - 6, y, L, y);
            String label = String.format(Locale.ROOT, "%.3g", v);
            g.drawString(label, L - 10 - g.getFontMetrics().stringWidth(label), y + 5);
        }
        g.drawString("sigma", L + (W - L - R) / 2 - 20, H - 22);
        g.rotate(-Math.PI / 2);
        g.drawString("B (logarithmic)", -(T + (H - T - B) / 2) - 45, 22);
        g.rotate(Math.PI / 2);
    }

    private static void legend(Graphics2D g) {
        int x = W - R + 20;
        int y = T + 10;
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 13));
        String[] names = {"first a pole", "first a zero"};
        Color[][] ramps = {{new Color(10, 30, 120), new Color(175, 205, 255)},
            {new Color(120, 10, 10), new Color(255, 195, 175)}};
        for (int k = 0; k < 2; k++) {
            for (int p = 0; p < 60; p++) {
                g.setColor(shade(ramps[k][0], ramps[k][1], PowerFamilyClassifier.WINDOW_START
                        * Math.pow(PowerFamilyClassifier.WINDOW_END / PowerFamilyClassifier.WINDOW_START, p / 59.0)));
                g.fillRect(x + p, y, 1, 14);
            }
            g.setColor(Color.BLACK);
            g.drawString(names[k], x + 68, y + 12);
            y += 24;
        }
        g.drawString(String.format(Locale.ROOT, "at x from %.0e (dark)", PowerFamilyClassifier.WINDOW_START), x,
                y + 8);
        g.drawString(String.format(Locale.ROOT, "to %.0f (light), log scale", PowerFamilyClassifier.WINDOW_END), x,
                y + 24);
        y += 44;
        Color[] colors = {NONE, BELOW, FAILED};
        String[] labels = {"neither in the window",
            String.format(Locale.ROOT, "unresolved below %.0e", PowerFamilyClassifier.WINDOW_START), "not computed"};
        for (int k = 0; k < 3; k++) {
            g.setColor(colors[k]);
            g.fillRect(x, y, 60, 14);
            g.setColor(Color.BLACK);
            g.drawRect(x, y, 60, 14);
            g.drawString(labels[k], x + 68, y + 12);
            y += 24;
        }
        g.setStroke(new BasicStroke(2f));
        g.drawLine(x, y + 7, x + 60, y + 7);
        g.drawString("pole-free members", x + 68, y + 12);
        g.drawString("(McCoy, Tracy, Wu 1977)", x + 68, y + 28);
    }
}
