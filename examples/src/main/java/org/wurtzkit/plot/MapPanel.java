package org.wurtzkit.plot;

import java.awt.Color;
import java.awt.Font;
import java.util.List;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;

/**
 * A map of a quantity over a two-parameter grid drawn with ordinary XChart series: every grid
 * point is a filled cell (a rectangle centred on it, reaching halfway to its neighbours) coloured
 * by the band of levels its value falls in, and the levels are drawn as contour lines
 * ({@link Contours}) labelled with their values. The legend lists the bands, high to low.
 */
final class MapPanel {
    /** Colour anchors from low to high, light enough that black lines and labels read on all of them. */
    private static final Color[] ANCHORS = {new Color(255, 255, 217), new Color(199, 233, 180),
        new Color(127, 205, 187), new Color(65, 182, 196), new Color(44, 127, 184)};
    private static final Color MISSING = new Color(150, 150, 150);
    /** Bold font of the contour labels. */
    static final Font LABEL_FONT = new Font(Style.FAMILY, Font.BOLD, 13);

    private MapPanel() {
    }

    /** Anchors of the diverging scale of a difference: blue below zero, white at zero, red above. */
    private static final Color[] DIVERGING = {new Color(67, 120, 180), new Color(171, 204, 228),
        new Color(247, 247, 247), new Color(244, 180, 160), new Color(200, 75, 60)};

    /**
     * Equally spaced levels, a "nice" step (1, 2, 2.5 or 5 times a power of ten), and the colours of
     * the bands between them.
     *
     * @param edges   the levels, increasing; band k lies between edges[k] and edges[k + 1]
     * @param anchors colours from the lowest to the highest band, interpolated in between
     */
    record Levels(double[] edges, Color[] anchors) {
        /** @return levels that cut [min, max] into about the requested number of bands, light to dark */
        static Levels nice(double min, double max, int bands) {
            if (!(max > min)) {
                double pad = Math.max(Math.abs(min) * 0.05, 1e-12);
                min -= pad;
                max += pad;
            }
            double step = niceStep((max - min) / bands);
            double lo = Math.floor(min / step + 1e-9) * step;
            int n = (int) Math.ceil((max - lo) / step - 1e-9);
            double[] e = new double[n + 1];
            for (int k = 0; k <= n; k++) {
                e[k] = lo + k * step;
            }
            return new Levels(e, ANCHORS);
        }

        /**
         * @return levels symmetric about zero covering [-maxAbs, maxAbs] in about the requested
         *         (even) number of bands, zero always a level, on a blue-white-red scale
         */
        static Levels diverging(double maxAbs, int bands) {
            double m = maxAbs > 0 ? maxAbs : 1e-12;
            double step = niceStep(2 * m / bands);
            int half = (int) Math.ceil(m / step - 1e-9);
            double[] e = new double[2 * half + 1];
            for (int k = 0; k <= 2 * half; k++) {
                e[k] = (k - half) * step;
            }
            return new Levels(e, DIVERGING);
        }

        private static double niceStep(double raw) {
            double p = Math.pow(10, Math.floor(Math.log10(raw)));
            for (double f : new double[] {1, 2, 2.5, 5, 10}) {
                if (f * p >= raw * (1 - 1e-12)) {
                    return f * p;
                }
            }
            return 10 * p;
        }

        int bands() {
            return edges.length - 1;
        }

        double step() {
            return edges[1] - edges[0];
        }

        /** @return the band of v, or -1 for NaN */
        int band(double v) {
            if (Double.isNaN(v)) {
                return -1;
            }
            for (int k = 0; k < bands(); k++) {
                if (v < edges[k + 1]) {
                    return k;
                }
            }
            return bands() - 1;
        }

        Color color(int band) {
            double t = bands() == 1 ? 0 : (double) band / (bands() - 1);
            double pos = t * (anchors.length - 1);
            int i = Math.min((int) Math.floor(pos), anchors.length - 2);
            double f = pos - i;
            Color a = anchors[i];
            Color b = anchors[i + 1];
            return new Color((int) Math.round(a.getRed() + f * (b.getRed() - a.getRed())),
                    (int) Math.round(a.getGreen() + f * (b.getGreen() - a.getGreen())),
                    (int) Math.round(a.getBlue() + f * (b.getBlue() - a.getBlue())));
        }

        String label(int band, int decimals) {
            return Labels.fixed(edges[band], decimals) + " \u2013 " + Labels.fixed(edges[band + 1], decimals);
        }

        /** @return decimals needed to print the levels exactly enough */
        int decimals() {
            double s = step();
            int d = 0;
            while (d < 6 && Math.abs(Math.round(s * Math.pow(10, d)) - s * Math.pow(10, d)) > 1e-6) {
                d++;
            }
            return d;
        }
    }

    /**
     * Draws the map into the chart.
     *
     * @param c          the chart (axes titled by the caller)
     * @param xs         grid values of the x axis, increasing
     * @param ys         grid values of the y axis, increasing
     * @param z          z[i][j] at (xs[i], ys[j]), NaN where the point failed
     * @param levels     levels shared by every map that is to be compared
     * @param contourUnit text after the contour spacing in the legend, e.g. "10^13 cm^-2"
     * @return the contour labels, for {@link #label} once every series is in
     */
    static List<ContourLabel> draw(XYChart c, double[] xs, double[] ys, double[][] z, Levels levels,
            String contourUnit) {
        int nx = xs.length;
        int ny = ys.length;
        double[] xe = cellEdges(xs);
        double[] ye = cellEdges(ys);
        c.getStyler().setXAxisMin(xe[0]);
        c.getStyler().setXAxisMax(xe[nx]);
        c.getStyler().setYAxisMin(ye[0]);
        c.getStyler().setYAxisMax(ye[ny]);
        c.getStyler().setPlotContentSize(0.9999);
        c.getStyler().setAnnotationTextFont(LABEL_FONT);
        int dec = levels.decimals();
        // cells, band by band from high to low so that the legend reads like a colour bar
        for (int band = levels.bands() - 1; band >= -1; band--) {
            boolean first = true;
            for (int i = 0; i < nx; i++) {
                for (int j = 0; j < ny; j++) {
                    if (levels.band(z[i][j]) != band) {
                        continue;
                    }
                    String name = first ? (band < 0 ? "not computed (failed)" : levels.label(band, dec))
                            : "cell " + i + "," + j;
                    Color fill = band < 0 ? MISSING : levels.color(band);
                    Style.rectangle(c, name, xe[i], xe[i + 1], ye[j], ye[j + 1], fill, first);
                    first = false;
                }
            }
        }
        // contour lines at the inner levels, each labelled once, on its longest piece
        double xSpan = xe[nx] - xe[0];
        double ySpan = ye[ny] - ye[0];
        boolean legend = true;
        int count = 0;
        List<ContourLabel> labels = new java.util.ArrayList<>();
        for (int k = 1; k < levels.edges().length - 1; k++) {
            double level = levels.edges()[k];
            List<Contours.Polyline> lines = Contours.at(xs, ys, z, level);
            Contours.Polyline longest = null;
            for (Contours.Polyline line : lines) {
                if (line.size() < 2) {
                    continue;
                }
                String name = legend ? "contours, step " + Labels.fixed(levels.step(), dec) + contourUnit
                        : "contour " + (count++);
                XYSeries s = Style.line(c, name, line.x(), line.y(), Style.INK, Style.THIN);
                s.setShowInLegend(legend);
                legend = false;
                if (longest == null || line.length(xSpan, ySpan) > longest.length(xSpan, ySpan)) {
                    longest = line;
                }
            }
            if (longest != null && longest.length(xSpan, ySpan) > 0.12) {
                labels.add(new ContourLabel(longest.x(), longest.y(), Labels.fixed(level, dec)));
            }
        }
        return labels;
    }

    /**
     * The value of a contour line, to be written beside the middle of its longest piece.
     *
     * @param x    the piece's vertices
     * @param y    the piece's vertices
     * @param text the level
     */
    record ContourLabel(double[] x, double[] y, String text) {
    }

    /**
     * Writes the contour labels beside their lines. Call after every series of the chart has been
     * added: the chart is laid out once to know where the lines are drawn.
     *
     * @param c      the chart
     * @param labels from {@link #draw}
     */
    static void label(XYChart c, List<ContourLabel> labels) {
        Style.layOut(c);
        java.awt.geom.Rectangle2D box = LABEL_FONT.getStringBounds("0", new java.awt.font.FontRenderContext(null,
                true, true));
        for (ContourLabel l : labels) {
            double[] x = l.x();
            double[] y = l.y();
            String text = l.text();
            int m = x.length / 2;
            int a = Math.max(m - 1, 0);
            int b = Math.min(m + 1, x.length - 1);
            double px = c.getScreenXFromChart(x[m]);
            double py = c.getScreenYFromChart(y[m]);
            double tx = c.getScreenXFromChart(x[b]) - c.getScreenXFromChart(x[a]);
            double ty = c.getScreenYFromChart(y[b]) - c.getScreenYFromChart(y[a]);
            double norm = Math.hypot(tx, ty);
            // unit normal to the line, pointing right (or up for a horizontal line)
            double nx = norm == 0 ? 1 : -ty / norm;
            double ny = norm == 0 ? 0 : tx / norm;
            if (nx < 0 || (nx == 0 && ny > 0)) {
                nx = -nx;
                ny = -ny;
            }
            double halfW = 0.5 * Style.textWidth(text, LABEL_FONT);
            double halfH = 0.5 * box.getHeight();
            double offset = Math.abs(nx) * halfW + Math.abs(ny) * halfH + 3;
            Style.textAtPixel(c, text, px + nx * offset, py + ny * offset);
        }
    }

    /** Cell boundaries: halfway between neighbours, half a step beyond the ends. */
    static double[] cellEdges(double[] v) {
        int n = v.length;
        double[] e = new double[n + 1];
        if (n == 1) {
            e[0] = v[0] - 0.5;
            e[1] = v[0] + 0.5;
            return e;
        }
        for (int i = 1; i < n; i++) {
            e[i] = 0.5 * (v[i - 1] + v[i]);
        }
        e[0] = v[0] - 0.5 * (v[1] - v[0]);
        e[n] = v[n - 1] + 0.5 * (v[n - 1] - v[n - 2]);
        return e;
    }
}
