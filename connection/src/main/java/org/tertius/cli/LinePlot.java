package org.tertius.cli;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.image.BufferedImage;
import java.util.Arrays;
import java.util.Locale;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/** Line plot of the real and imaginary parts of a value along a segment, poles as dashed vertical lines (JFreeChart). */
final class LinePlot {
    private LinePlot() {
    }

    /** The plot of value {@code value} (its name, e.g. w or q) at abscissae x. */
    static BufferedImage draw(String title, String xLabel, String value, double[] x, double[] re, double[] im,
                              double[] poles, int width, int height) {
        // values are cut at a few times their typical size so that poles do not flatten the curves
        double[] mags = new double[re.length];
        for (int i = 0; i < re.length; i++) {
            mags[i] = Double.isFinite(re[i]) ? Math.hypot(re[i], im[i]) : 0;
        }
        double[] sorted = mags.clone();
        Arrays.sort(sorted);
        double clip = Math.max(1, 4 * sorted[(int) (0.75 * (sorted.length - 1))]);
        XYSeries sRe = new XYSeries("Re " + value, false);
        XYSeries sIm = new XYSeries("Im " + value, false);
        for (int i = 0; i < x.length; i++) {
            sRe.add(x[i], Math.abs(re[i]) <= clip ? re[i] : Double.NaN);
            sIm.add(x[i], Math.abs(im[i]) <= clip ? im[i] : Double.NaN);
        }
        XYSeriesCollection data = new XYSeriesCollection();
        data.addSeries(sRe);
        data.addSeries(sIm);
        JFreeChart chart = ChartFactory.createXYLineChart(title, xLabel, value + " (cut at |" + value + "| = "
                + String.format(Locale.ROOT, "%.3g", clip) + ")", data, PlotOrientation.VERTICAL, true, false, false);
        XYPlot plot = chart.getXYPlot();
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(Color.LIGHT_GRAY);
        plot.setRangeGridlinePaint(Color.LIGHT_GRAY);
        for (double p : poles) {
            ValueMarker m = new ValueMarker(p, Color.RED, new BasicStroke(1f, BasicStroke.CAP_BUTT,
                    BasicStroke.JOIN_MITER, 1f, new float[] {4f, 4f}, 0f));
            m.setLabel("pole");
            plot.addDomainMarker(m);
        }
        return chart.createBufferedImage(width, height);
    }
}
