package org.wurtzkit.plot;

import de.erichseifert.vectorgraphics2d.Document;
import de.erichseifert.vectorgraphics2d.VectorGraphics2D;
import de.erichseifert.vectorgraphics2d.svg.SVGProcessor;
import de.erichseifert.vectorgraphics2d.util.PageSize;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.imageio.ImageIO;
import org.knowm.xchart.XYChart;
import org.wurtzkit.errors.InvalidParameterException;

/**
 * A finished plot: one or more XChart panels laid out side by side in a row, or stacked one above
 * the other over a shared x axis, drawn as one picture. {@link #image()} gives it as a
 * {@link BufferedImage} (what a notebook displays), {@link #writePng} and {@link #writeSvg} write
 * it to a file.
 *
 * <p>In a stack the panels' plot areas are aligned to the pixel, whatever the width of their
 * y-axis labels, so that one x value lies on one vertical line through every panel; only the
 * bottom panel carries the x-axis title and tick labels.
 *
 * <p>{@link #panels()} hands out the XChart charts themselves for further styling; a change to a
 * chart shows in every later {@link #image()} or file. A figure is not safe for use by several
 * threads at once (XChart charts are not).
 */
public final class Figure {
    /** How the panels are arranged. */
    public enum Layout {
        /** Side by side, left to right, each at its own size. */
        ROW,
        /** One above the other, all of one width, the x axes aligned and shared. */
        STACKED_SHARED_X
    }

    private final List<XYChart> panels;
    private final Layout layout;
    /** Width of a stack (pixels); its panels are painted narrower to align their plot areas. */
    private final int stackWidth;

    private Figure(List<XYChart> panels, Layout layout) {
        if (panels.isEmpty()) {
            throw new InvalidParameterException("panels", "[]", "at least one chart");
        }
        this.panels = List.copyOf(panels);
        this.layout = layout;
        this.stackWidth = panels.get(0).getWidth();
        if (layout == Layout.STACKED_SHARED_X) {
            Double xMin = panels.get(0).getStyler().getXAxisMin();
            Double xMax = panels.get(0).getStyler().getXAxisMax();
            if (xMin == null || xMax == null) {
                throw new InvalidParameterException("x-axis range of the first panel", xMin + " to " + xMax,
                        "set explicitly (XYStyler.setXAxisMin/Max) in a stack");
            }
            for (XYChart c : panels) {
                if (c.getWidth() != stackWidth) {
                    throw new InvalidParameterException("panel width", Integer.toString(c.getWidth()),
                            "the width of the first panel, " + stackWidth + " px, in a stack");
                }
                if (!xMin.equals(c.getStyler().getXAxisMin()) || !xMax.equals(c.getStyler().getXAxisMax())) {
                    throw new InvalidParameterException("x-axis range of panel \"" + c.getTitle() + "\"",
                            c.getStyler().getXAxisMin() + " to " + c.getStyler().getXAxisMax(),
                            "the range of the first panel, " + xMin + " to " + xMax + ", in a stack");
                }
            }
            for (int k = 0; k < panels.size() - 1; k++) {
                panels.get(k).getStyler().setXAxisTitleVisible(false);
                panels.get(k).getStyler().setXAxisTicksVisible(false);
            }
        }
    }

    /**
     * @param chart one chart
     * @return a figure of that chart alone
     */
    public static Figure of(XYChart chart) {
        return new Figure(List.of(chart), Layout.ROW);
    }

    /**
     * @param panels charts, left to right
     * @return a figure of the charts side by side
     */
    public static Figure row(List<XYChart> panels) {
        return new Figure(panels, Layout.ROW);
    }

    /**
     * @param panels charts of one width, top to bottom, all over the same x range
     * @return a figure of the charts stacked over a shared x axis
     */
    public static Figure stackedSharedX(List<XYChart> panels) {
        return new Figure(panels, Layout.STACKED_SHARED_X);
    }

    /** @return the panels (the live XChart charts), in drawing order */
    public List<XYChart> panels() {
        return panels;
    }

    /** @return how the panels are arranged */
    public Layout layout() {
        return layout;
    }

    /** @return width of the picture (pixels) */
    public int width() {
        if (layout == Layout.ROW) {
            return panels.stream().mapToInt(XYChart::getWidth).sum();
        }
        return stackWidth;
    }

    /** @return height of the picture (pixels) */
    public int height() {
        if (layout == Layout.ROW) {
            return panels.stream().mapToInt(XYChart::getHeight).max().orElseThrow();
        }
        return panels.stream().mapToInt(XYChart::getHeight).sum();
    }

    /** @return the figure drawn into a new image of {@link #width()} by {@link #height()} pixels */
    public BufferedImage image() {
        BufferedImage img = new BufferedImage(width(), height(), BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            paint(g);
        } finally {
            g.dispose();
        }
        return img;
    }

    /**
     * Writes the figure as PNG.
     *
     * @param file the file, replaced if it exists
     * @return the file
     * @throws IOException from the file system
     */
    public Path writePng(Path file) throws IOException {
        if (!ImageIO.write(image(), "png", file.toFile())) {
            throw new IOException("no PNG writer in this JDK");
        }
        return file;
    }

    /**
     * Writes the figure as SVG (through VectorGraphics2D): lines and text stay vectors, the page is
     * {@link #width()} by {@link #height()} units.
     *
     * @param file the file, replaced if it exists
     * @return the file
     * @throws IOException from the file system
     */
    public Path writeSvg(Path file) throws IOException {
        VectorGraphics2D g = new VectorGraphics2D();
        paint(g);
        Document doc = new SVGProcessor().getDocument(g.getCommands(), new PageSize(0, 0, width(), height()));
        try (OutputStream out = Files.newOutputStream(file)) {
            doc.writeTo(out);
        }
        return file;
    }

    /**
     * Writes PNG or SVG, chosen by the file name's ending.
     *
     * @param file a file whose name ends in ".png" or ".svg"
     * @return the file
     * @throws IOException from the file system
     * @throws InvalidParameterException for any other ending
     */
    public Path write(Path file) throws IOException {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".png")) {
            return writePng(file);
        }
        if (name.endsWith(".svg")) {
            return writeSvg(file);
        }
        throw new InvalidParameterException("file", file.toString(), "a name ending in .png or .svg");
    }

    /**
     * Paints the figure with its top left corner at the origin.
     *
     * @param g where to paint
     */
    public void paint(Graphics2D g) {
        g.setColor(Color.WHITE);
        g.fillRect(0, 0, width(), height());
        List<int[]> frames = frames();
        int y = 0;
        int x = 0;
        for (int k = 0; k < panels.size(); k++) {
            XYChart c = panels.get(k);
            int[] f = frames.get(k);
            Graphics2D pg = (Graphics2D) g.create();
            try {
                if (layout == Layout.ROW) {
                    pg.translate(x, 0);
                    c.paint(pg, c.getWidth(), c.getHeight());
                    x += c.getWidth();
                } else {
                    pg.translate(f[0], y);
                    c.paint(pg, f[1], c.getHeight());
                    y += c.getHeight();
                }
            } finally {
                pg.dispose();
            }
        }
        if (layout == Layout.STACKED_SHARED_X) {
            // leave every chart at its full width for the caller
            for (XYChart c : panels) {
                c.paint(scratch(), width(), c.getHeight());
            }
        }
    }

    /**
     * The left edge of each panel's plot area in the picture (pixels), as drawn: equal for every
     * panel of a stack.
     *
     * @return one value per panel
     */
    public double[] plotAreaLeftPx() {
        List<int[]> frames = frames();
        double[] out = new double[panels.size()];
        int x = 0;
        for (int k = 0; k < panels.size(); k++) {
            XYChart c = panels.get(k);
            int w = layout == Layout.ROW ? c.getWidth() : frames.get(k)[1];
            int offset = layout == Layout.ROW ? x : frames.get(k)[0];
            out[k] = offset + plotLeft(c, w);
            x += c.getWidth();
        }
        if (layout == Layout.STACKED_SHARED_X) {
            for (XYChart c : panels) {
                c.paint(scratch(), width(), c.getHeight());
            }
        }
        return out;
    }

    /**
     * For a stack: per panel the horizontal offset and the width at which it is painted so that
     * every plot area spans the same pixels. The left margin of a plot area depends on the y-axis
     * labels, not on the chart's width, and the right margin on the legend and a right-hand axis;
     * the widest of each sets the common plot area, and two refinement passes absorb the pixel
     * rounding of XChart's layout.
     */
    private List<int[]> frames() {
        List<int[]> frames = new ArrayList<>();
        if (layout == Layout.ROW) {
            for (XYChart c : panels) {
                frames.add(new int[] {0, c.getWidth()});
            }
            return frames;
        }
        int w = width();
        int n = panels.size();
        double[] left = new double[n];
        double[] rightMargin = new double[n];
        for (int k = 0; k < n; k++) {
            left[k] = plotLeft(panels.get(k), w);
            rightMargin[k] = w - plotRight(panels.get(k), w);
        }
        double commonLeft = max(left);
        double commonRightMargin = max(rightMargin);
        for (int k = 0; k < n; k++) {
            XYChart c = panels.get(k);
            int offset = (int) Math.round(commonLeft - left[k]);
            int width = (int) Math.round(w - commonRightMargin + rightMargin[k] - offset);
            for (int pass = 0; pass < 2; pass++) {
                double l = offset + plotLeft(c, width);
                double r = offset + plotRight(c, width);
                offset += (int) Math.round(commonLeft - l);
                width += (int) Math.round((w - commonRightMargin) - r) - (int) Math.round(commonLeft - l);
            }
            frames.add(new int[] {offset, width});
        }
        return frames;
    }

    private static double plotLeft(XYChart c, int width) {
        c.paint(scratch(), width, c.getHeight());
        return c.getScreenXFromChart(c.getStyler().getXAxisMin());
    }

    private static double plotRight(XYChart c, int width) {
        c.paint(scratch(), width, c.getHeight());
        return c.getScreenXFromChart(c.getStyler().getXAxisMax());
    }

    private static Graphics2D scratch() {
        return new BufferedImage(1, 1, BufferedImage.TYPE_INT_RGB).createGraphics();
    }

    private static double max(double[] v) {
        double m = Double.NEGATIVE_INFINITY;
        for (double d : v) {
            m = Math.max(m, d);
        }
        return m;
    }
}
