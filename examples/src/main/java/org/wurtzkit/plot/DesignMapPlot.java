package org.wurtzkit.plot;

import java.util.ArrayList;
import java.util.List;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.markers.SeriesMarkers;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.solvers.workflow.Axis;
import org.wurtzkit.solvers.workflow.DesignMapResult;

/**
 * A quantity over a two-parameter grid as filled cells with labelled contour lines, and, when a
 * second map of the same grid is given ({@link #compareWith}), the two side by side on one colour
 * scale followed by a third panel: their relative difference (second &minus; first) / first in
 * percent, on a blue&ndash;white&ndash;red scale centred on zero. Two maps that look alike in the
 * first two panels show in the third where and by how much they differ.
 *
 * <pre>{@code
 * DesignMapPlot.of(map, "sheet_density", 1e-13)               // a 2-axis DesignMapResult
 *         .quantity("n_s (10¹³ cm⁻²)")
 *         .compareWith("analytic model", analyticNs)
 *         .figure().writePng(Path.of("map.png"));
 * }</pre>
 *
 * <p>A failed point (NaN) is a grey cell, and its difference is NaN too.
 */
public final class DesignMapPlot {
    private final double[] xs;
    private final double[] ys;
    private final double[][] z;
    private String xTitle = "x";
    private String yTitle = "y";
    private String quantity = "value";
    private String firstName = "map";
    private String secondName;
    private double[][] second;
    private String subject = "";
    private final List<double[]> marks = new ArrayList<>();
    private final List<String> markNames = new ArrayList<>();
    private int bands = 9;
    private int panelWidth = 980;
    private int panelHeight = 720;

    private DesignMapPlot(double[] xs, double[] ys, double[][] z) {
        this.xs = increasing("x values", xs);
        this.ys = increasing("y values", ys);
        this.z = grid("values", z, xs.length, ys.length);
    }

    /**
     * @param xs grid values of the x axis, strictly increasing
     * @param ys grid values of the y axis, strictly increasing
     * @param z  z[i][j] at (xs[i], ys[j]), NaN where a point failed
     * @return a map plot
     */
    public static DesignMapPlot of(double[] xs, double[] ys, double[][] z) {
        return new DesignMapPlot(xs, ys, z);
    }

    /**
     * A column of a two-axis design map; the axis titles are the axes' names and units.
     *
     * @param map    a map over exactly two axes, each strictly increasing
     * @param column the name of a quantity column, e.g. "sheet_density"
     * @param scale  factor applied to every value (e.g. 1e-13 to plot in units of 10^13)
     * @return a map plot
     */
    public static DesignMapPlot of(DesignMapResult map, String column, double scale) {
        Require.nonNull("map", map);
        List<Axis> axes = map.axes();
        if (axes.size() != 2) {
            throw new InvalidParameterException("map axes", Integer.toString(axes.size()), "exactly 2");
        }
        double[] values = map.column(column);
        double[] xs = axes.get(0).values();
        double[] ys = axes.get(1).values();
        double[][] z = new double[xs.length][ys.length];
        for (int i = 0; i < xs.length; i++) {
            for (int j = 0; j < ys.length; j++) {
                z[i][j] = values[map.index(i, j)] * scale;
            }
        }
        return of(xs, ys, z).axes(title(axes.get(0)), title(axes.get(1)));
    }

    private static String title(Axis a) {
        return a.unit().isEmpty() ? a.name() : a.name() + " (" + a.unit() + ")";
    }

    /** @param x title of the x axis, with unit @param y title of the y axis @return this plot */
    public DesignMapPlot axes(String x, String y) {
        this.xTitle = Require.nonNull("x title", x);
        this.yTitle = Require.nonNull("y title", y);
        return this;
    }

    /** @param label what the values are, with unit, e.g. "n_s (10¹³ cm⁻²)" @return this plot */
    public DesignMapPlot quantity(String label) {
        this.quantity = Require.nonNull("quantity", label);
        return this;
    }

    /** @param text what every panel title ends with, e.g. the wafer family @return this plot */
    public DesignMapPlot title(String text) {
        this.subject = Require.nonNull("title", text);
        return this;
    }

    /** @param name what the first map is, e.g. "self-consistent solver" @return this plot */
    public DesignMapPlot name(String name) {
        this.firstName = Require.nonNull("name", name);
        return this;
    }

    /**
     * Compares with a second map of the same grid: three panels, the first map, the second, and
     * their relative difference.
     *
     * @param name what the second map is, e.g. "analytic model"
     * @param z    values on the same grid, same scale
     * @return this plot
     */
    public DesignMapPlot compareWith(String name, double[][] z) {
        this.secondName = Require.nonNull("name", name);
        this.second = grid("second map", z, xs.length, ys.length);
        return this;
    }

    /** @param label legend text @param x position @param y position @return this plot */
    public DesignMapPlot mark(String label, double x, double y) {
        markNames.add(Require.nonNull("label", label));
        marks.add(new double[] {Require.finite("x", x), Require.finite("y", y)});
        return this;
    }

    /** @param count about how many colour bands (2 to 20, default 9) @return this plot */
    public DesignMapPlot bands(int count) {
        this.bands = Require.inRange("bands", count, 2, 20);
        return this;
    }

    /** @param widthPx width of each panel @param heightPx height @return this plot */
    public DesignMapPlot panelSize(int widthPx, int heightPx) {
        this.panelWidth = Require.inRange("width", widthPx, 300, 20_000);
        this.panelHeight = Require.inRange("height", heightPx, 200, 20_000);
        return this;
    }

    /**
     * @return (second &minus; first) / first &times; 100 at every point (percent); NaN where either
     *         is NaN or the first is zero
     * @throws IllegalStateException without a second map
     */
    public double[][] relativeDifferencePercent() {
        if (second == null) {
            throw new IllegalStateException("no second map: call compareWith first");
        }
        double[][] d = new double[xs.length][ys.length];
        for (int i = 0; i < xs.length; i++) {
            for (int j = 0; j < ys.length; j++) {
                double a = z[i][j];
                d[i][j] = a == 0 ? Double.NaN : 100 * (second[i][j] - a) / a;
            }
        }
        return d;
    }

    /** @return one panel, or three with a second map */
    public Figure figure() {
        if (second == null) {
            return Figure.of(panel(firstName + ": " + quantity + suffix(), z, levels(z), ""));
        }
        MapPanel.Levels shared = levels(z, second);
        double[][] diff = relativeDifferencePercent();
        double maxAbs = 0;
        for (double[] row : diff) {
            for (double v : row) {
                if (!Double.isNaN(v)) {
                    maxAbs = Math.max(maxAbs, Math.abs(v));
                }
            }
        }
        return Figure.row(List.of(panel(firstName + ": " + quantity + suffix(), z, shared, ""),
                panel(secondName + ": " + quantity + suffix(), second, shared, ""),
                panel("(" + secondName + " \u2212 " + firstName + ") / " + firstName + " (%)", diff,
                        MapPanel.Levels.diverging(maxAbs, bands - 1 + (bands - 1) % 2), " %")));
    }

    private String suffix() {
        return subject.isEmpty() ? "" : ", " + subject;
    }

    private MapPanel.Levels levels(double[][]... maps) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double[][] m : maps) {
            for (double[] row : m) {
                for (double v : row) {
                    if (!Double.isNaN(v)) {
                        lo = Math.min(lo, v);
                        hi = Math.max(hi, v);
                    }
                }
            }
        }
        if (lo > hi) {
            lo = 0;
            hi = 1;
        }
        return MapPanel.Levels.nice(lo, hi, bands);
    }

    private XYChart panel(String title, double[][] values, MapPanel.Levels levels, String unit) {
        XYChart c = Style.xy(panelWidth, panelHeight, title, xTitle, yTitle);
        c.getStyler().setLegendPosition(Styler.LegendPosition.OutsideE);
        List<MapPanel.ContourLabel> labels = MapPanel.draw(c, xs, ys, values, levels, unit);
        for (int k = 0; k < marks.size(); k++) {
            XYSeries w = c.addSeries(markNames.get(k), new double[] {marks.get(k)[0]}, new double[] {marks.get(k)[1]});
            w.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            w.setMarker(SeriesMarkers.DIAMOND);
            w.setMarkerColor(Style.RED);
        }
        c.getStyler().setMarkerSize(12);
        MapPanel.label(c, labels);
        return c;
    }

    private static double[] increasing(String name, double[] v) {
        Require.nonNull(name, v);
        if (v.length < 2) {
            throw new InvalidParameterException(name, java.util.Arrays.toString(v), "at least 2 values");
        }
        for (int i = 1; i < v.length; i++) {
            if (!(v[i] > v[i - 1])) {
                throw new InvalidParameterException(name, java.util.Arrays.toString(v), "strictly increasing");
            }
        }
        return v.clone();
    }

    private static double[][] grid(String name, double[][] z, int nx, int ny) {
        Require.nonNull(name, z);
        double[][] out = new double[nx][];
        if (z.length != nx) {
            throw new InvalidParameterException(name + " rows", Integer.toString(z.length), nx + " (one per x value)");
        }
        for (int i = 0; i < nx; i++) {
            if (z[i].length != ny) {
                throw new InvalidParameterException(name + " row " + i + " length", Integer.toString(z[i].length),
                        ny + " (one per y value)");
            }
            out[i] = z[i].clone();
        }
        return out;
    }
}
