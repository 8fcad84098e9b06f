package org.wurtzkit.plot;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.font.FontRenderContext;
import java.awt.image.BufferedImage;
import java.util.List;
import java.util.Locale;
import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.internal.chartpart.Chart;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.XYStyler;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * The common look of every plot of this package (XChart, rendered headless) and a few drawing
 * helpers built from ordinary XChart series. Labels follow {@link Labels}.
 */
final class Style {
    /** Font family of every plot (a logical font, present on every JDK). */
    static final String FAMILY = Font.SANS_SERIF;
    static final Color INK = new Color(30, 30, 30);
    static final Color GRID = new Color(228, 228, 228);
    /** Line colours, distinguishable also in grey scale. */
    static final Color BLUE = new Color(31, 94, 168);
    static final Color RED = new Color(196, 52, 44);
    static final Color GREEN = new Color(38, 132, 62);
    static final Color ORANGE = new Color(222, 128, 20);
    static final Color PURPLE = new Color(117, 65, 160);
    static final Color GREY = new Color(110, 110, 110);
    static final Font ANNOTATION_FONT = new Font(FAMILY, Font.PLAIN, 13);

    static final BasicStroke SOLID = new BasicStroke(2.2f);
    static final BasicStroke THIN = new BasicStroke(1.3f);
    static final BasicStroke DASHED = new BasicStroke(2.0f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
            new float[] {9f, 6f}, 0f);
    static final BasicStroke DOTTED = new BasicStroke(1.8f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND, 10f,
            new float[] {2f, 5f}, 0f);

    private Style() {
    }

    /**
     * @param width  pixels
     * @param height pixels
     * @param title  chart title
     * @param xTitle x-axis title with unit
     * @param yTitle y-axis title with unit
     * @return an XY chart in the examples' style
     */
    static XYChart xy(int width, int height, String title, String xTitle, String yTitle) {
        XYChart c = new XYChartBuilder().width(width).height(height).title(title).xAxisTitle(xTitle)
                .yAxisTitle(yTitle).build();
        style(c.getStyler());
        return c;
    }

    static void style(XYStyler s) {
        s.setLocale(Locale.ROOT);
        s.setAntiAlias(true);
        s.setChartBackgroundColor(Color.WHITE);
        s.setPlotBackgroundColor(Color.WHITE);
        s.setPlotBorderVisible(true);
        s.setPlotBorderColor(GREY);
        s.setPlotGridLinesColor(GRID);
        s.setChartFontColor(INK);
        s.setAxisTickLabelsColor(INK);
        s.setChartTitleFont(new Font(FAMILY, Font.BOLD, 17));
        s.setChartTitleBoxVisible(false);
        s.setAxisTitleFont(new Font(FAMILY, Font.PLAIN, 16));
        s.setAxisTickLabelsFont(new Font(FAMILY, Font.PLAIN, 14));
        s.setLegendFont(new Font(FAMILY, Font.PLAIN, 13));
        s.setLegendBackgroundColor(new Color(255, 255, 255, 235));
        s.setLegendBorderColor(GREY);
        s.setLegendPosition(Styler.LegendPosition.InsideNE);
        s.setLegendSeriesLineLength(20);
        s.setAnnotationTextFont(ANNOTATION_FONT);
        s.setAnnotationTextFontColor(INK);
        s.setMarkerSize(7);
        s.setXAxisTickMarkSpacingHint(70);
        s.setYAxisTickMarkSpacingHint(55);
        s.setChartPadding(12);
        s.setPlotMargin(0);
        s.setAxisTicksLineVisible(false);
        s.setAxisTitlePadding(8);
    }

    /**
     * A line series.
     *
     * @return the series
     */
    static XYSeries line(XYChart c, String name, double[] x, double[] y, Color color, BasicStroke stroke) {
        XYSeries s = c.addSeries(name, x, y);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        s.setMarker(SeriesMarkers.NONE);
        s.setLineColor(color);
        s.setLineStyle(stroke);
        return s;
    }

    /** A line with markers at the points. */
    static XYSeries lineWithMarkers(XYChart c, String name, double[] x, double[] y, Color color,
            BasicStroke stroke) {
        XYSeries s = line(c, name, x, y, color, stroke);
        s.setMarker(SeriesMarkers.CIRCLE);
        s.setMarkerColor(color);
        return s;
    }

    /**
     * A filled polygon (closed automatically), outlined in its own fill colour.
     *
     * @return the series
     */
    static XYSeries polygon(XYChart c, String name, double[] x, double[] y, Color fill, boolean inLegend) {
        XYSeries s = c.addSeries(name, x, y);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.PolygonArea);
        s.setMarker(SeriesMarkers.NONE);
        s.setFillColor(fill);
        s.setLineColor(fill);
        s.setLineStyle(new BasicStroke(0.6f));
        s.setShowInLegend(inLegend);
        return s;
    }

    /** An axis-parallel rectangle as a filled polygon. */
    static XYSeries rectangle(XYChart c, String name, double x0, double x1, double y0, double y1, Color fill,
            boolean inLegend) {
        return polygon(c, name, new double[] {x0, x1, x1, x0}, new double[] {y0, y0, y1, y1}, fill, inLegend);
    }

    /**
     * Paints the chart once off-screen, so that its mapping from data to pixels
     * ({@link Chart#getScreenXFromChart(double)}) is known before annotations are placed.
     *
     * @param chart the chart, with all its series and axis ranges set
     */
    static void layOut(Chart<?, ?> chart) {
        BufferedImage img = new BufferedImage(chart.getWidth(), chart.getHeight(), BufferedImage.TYPE_INT_ARGB);
        Graphics2D g = img.createGraphics();
        try {
            chart.paint(g, chart.getWidth(), chart.getHeight());
        } finally {
            g.dispose();
        }
    }

    /** @return the width of a text in pixels in a font */
    static double textWidth(String text, Font font) {
        return font.getStringBounds(text, new FontRenderContext(null, true, true)).getWidth();
    }

    /**
     * A text centred at a pixel position (x from the left, y from the top of the image), for use
     * after {@link #layOut(Chart)}.
     */
    static void textAtPixel(Chart<?, ?> chart, String text, double xPx, double yPxFromTop) {
        chart.addAnnotation(new AnnotationText(text, xPx, chart.getHeight() - yPxFromTop, true));
    }

}
