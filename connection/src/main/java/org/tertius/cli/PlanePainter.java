package org.tertius.cli;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.util.Locale;

/**
 * Draws a real quantity over a rectangle of a real plane (for instance |Psi| or arg Psi over (X, T)) as a figure:
 * a colour scale (a perceptually ordered dark-blue to yellow ramp for moduli, a cyclic hue wheel for phases) with its
 * bar and ticks, axes with tick labels and names, and a title. Values that could not be computed are grey. The data
 * are row-major: value[j * nx + i] at abscissa x_i (columns) and ordinate y_j (rows, drawn upwards).
 */
final class PlanePainter {
    private static final int LEFT = 80;
    private static final int RIGHT = 120;
    private static final int TOP = 56;
    private static final int BOTTOM = 56;
    private static final Color MISSING = new Color(128, 128, 128);
    /** Anchors of the modulus ramp (dark blue, teal, green, yellow), interpolated linearly (common practice). */
    private static final int[][] RAMP = {{48, 18, 59}, {50, 100, 180}, {32, 160, 160}, {90, 200, 100},
        {190, 220, 60}, {250, 235, 40}};

    private PlanePainter() {
    }

    /** What the colour shows. */
    enum Scale {
        /** A non-negative quantity, from 0 to its largest value. */
        MODULUS,
        /** An angle in (-pi, pi], on a cyclic wheel. */
        PHASE
    }

    /**
     * The figure.
     *
     * @param value row-major values (NaN where not computed)
     * @param nx number of columns (abscissae x0 .. x1)
     * @param ny number of rows (ordinates y0 .. y1)
     */
    static BufferedImage paint(double[] value, int nx, int ny, double x0, double x1, double y0, double y1, Scale scale,
                               String title, String xName, String yName, String valueName, int width, int height) {
        double top = 0;
        for (double v : value) {
            if (Double.isFinite(v)) {
                top = Math.max(top, Math.abs(v));
            }
        }
        double max = scale == Scale.PHASE ? Math.PI : (top > 0 ? top : 1);
        BufferedImage img = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setColor(Color.WHITE);
        g.fillRect(0, 0, width, height);
        int pw = width - LEFT - RIGHT;
        int ph = height - TOP - BOTTOM;
        for (int py = 0; py < ph; py++) {
            int j = ny == 1 ? 0 : (int) Math.round((double) (ph - 1 - py) / Math.max(1, ph - 1) * (ny - 1));
            for (int px = 0; px < pw; px++) {
                int i = nx == 1 ? 0 : (int) Math.round((double) px / Math.max(1, pw - 1) * (nx - 1));
                double v = value[j * nx + i];
                img.setRGB(LEFT + px, TOP + py, Double.isFinite(v) ? colour(v, max, scale) : MISSING.getRGB());
            }
        }
        g.setColor(Color.BLACK);
        g.setStroke(new BasicStroke(1f));
        g.drawRect(LEFT - 1, TOP - 1, pw + 1, ph + 1);
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        FontMetrics fm = g.getFontMetrics();
        for (double t : FieldPainter.ticks(x0, x1)) {
            int x = LEFT + (int) Math.round((t - x0) / (x1 - x0) * (pw - 1));
            g.drawLine(x, TOP + ph, x, TOP + ph + 5);
            String s = FieldPainter.tickLabel(t);
            g.drawString(s, x - fm.stringWidth(s) / 2, TOP + ph + 18);
        }
        for (double t : FieldPainter.ticks(y0, y1)) {
            int y = TOP + (ph - 1) - (int) Math.round((t - y0) / (y1 - y0) * (ph - 1));
            g.drawLine(LEFT - 6, y, LEFT - 1, y);
            String s = FieldPainter.tickLabel(t);
            g.drawString(s, LEFT - 9 - fm.stringWidth(s), y + 4);
        }
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 13));
        g.drawString(xName, LEFT + pw / 2 - 4, height - 14);
        g.drawString(yName, 20, TOP + ph / 2);
        bar(g, width, ph, max, scale, valueName);
        g.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 14));
        g.drawString(title, LEFT, 30);
        g.dispose();
        return img;
    }

    private static void bar(Graphics2D g, int width, int ph, double max, Scale scale, String valueName) {
        int x0 = width - RIGHT + 30;
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        g.setColor(Color.BLACK);
        g.drawString(valueName, x0 - 6, TOP - 8);
        for (int k = 0; k < ph; k++) {
            double v = scale == Scale.PHASE ? Math.PI - 2 * Math.PI * k / (ph - 1) : max * (ph - 1 - k) / (ph - 1);
            g.setColor(new Color(colour(v, max, scale)));
            g.fillRect(x0, TOP + k, 18, 1);
        }
        g.setColor(Color.BLACK);
        g.drawRect(x0, TOP, 18, ph);
        double lo = scale == Scale.PHASE ? -Math.PI : 0;
        for (double t : FieldPainter.ticks(lo, max)) {
            int y = TOP + (int) Math.round((max - t) / (max - lo) * (ph - 1));
            g.drawLine(x0 + 18, y, x0 + 22, y);
            g.drawString(FieldPainter.tickLabel(t), x0 + 25, y + 4);
        }
    }

    /** The colour of a value: the modulus ramp from 0 to max, or the phase wheel. */
    static int colour(double v, double max, Scale scale) {
        if (scale == Scale.PHASE) {
            double hue = (v / (2 * Math.PI) + 1) % 1.0;
            return FieldPainter.hsl(hue, 0.85, 0.5);
        }
        double t = Math.max(0, Math.min(1, v / max)) * (RAMP.length - 1);
        int k = Math.min(RAMP.length - 2, (int) Math.floor(t));
        double f = t - k;
        int r = (int) Math.round(RAMP[k][0] + f * (RAMP[k + 1][0] - RAMP[k][0]));
        int gr = (int) Math.round(RAMP[k][1] + f * (RAMP[k + 1][1] - RAMP[k][1]));
        int b = (int) Math.round(RAMP[k][2] + f * (RAMP[k + 1][2] - RAMP[k][2]));
        return (r << 16) | (gr << 8) | b;
    }
}
