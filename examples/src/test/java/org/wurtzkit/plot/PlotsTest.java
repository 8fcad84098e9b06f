package org.wurtzkit.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.solvers.analytic.ChargeBalanceModel;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.solvers.sp.Solution;
import org.wurtzkit.solvers.sp.Subband;
import org.wurtzkit.solvers.workflow.BiasGrid;
import org.wurtzkit.solvers.workflow.BiasSweep;
import org.wurtzkit.solvers.workflow.BiasSweepResult;
import org.wurtzkit.solvers.workflow.ParameterSetSpread;
import org.wurtzkit.solvers.workflow.SpreadResult;
import org.wurtzkit.solvers.workflow.ThresholdDefinition;
import org.wurtzkit.solvers.workflow.ThresholdExtraction;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/**
 * Every plot of the package, drawn for a small stack (GaN 300 nm / AlN 1 nm / Al<sub>0.25</sub>Ga<sub>0.75</sub>N
 * 15 nm under a 1.0 eV gate): PNG and SVG files of the expected size that show something, and the
 * properties each plot promises (the stack's plot areas aligned to the pixel, the difference panel's
 * numbers, the median under the sets, no closing of a cut |psi|^2, one way of writing subscripts).
 */
class PlotsTest {
    private static Structure stack;
    private static Solution solution;
    private static BiasSweepResult sweep;

    @BeforeAll
    static void solve() {
        stack = stack(0.25);
        solution = new SelfConsistentSolver().solve(stack);
        sweep = new BiasSweep().run(stack, BiasGrid.linear(0.5, -5.5, 7));
    }

    private static Structure stack(double x) {
        return Structure.builder(ParameterSets.defaultSet())
                .grow(Layer.of("buffer", Composition.GAN, 300 * NM))
                .grow(Layer.of("spacer", Composition.ALN, 1 * NM))
                .grow(Layer.of("barrier", Composition.alGaN(x), 15 * NM))
                .top(TopBoundary.schottky(1.0, 0.0))
                .build();
    }

    /** Writes PNG and SVG and checks both: size, a readable picture with many colours, an SVG page. */
    private static BufferedImage assertWritesBoth(Figure f, int width, int height, Path dir, String name)
            throws IOException {
        assertEquals(width, f.width(), name + " width");
        assertEquals(height, f.height(), name + " height");
        Path png = f.write(dir.resolve(name + ".png"));
        Path svg = f.write(dir.resolve(name + ".svg"));
        assertTrue(Files.size(png) > 10_000, png + " " + Files.size(png) + " bytes");
        BufferedImage img = ImageIO.read(png.toFile());
        assertNotNull(img, png.toString());
        assertEquals(width, img.getWidth());
        assertEquals(height, img.getHeight());
        Set<Integer> colours = new HashSet<>();
        long white = 0;
        for (int y = 0; y < height; y += 2) {
            for (int x = 0; x < width; x += 2) {
                int rgb = img.getRGB(x, y) & 0xffffff;
                colours.add(rgb);
                white += rgb == 0xffffff ? 1 : 0;
            }
        }
        double whiteShare = white / ((width / 2.0) * (height / 2.0));
        assertTrue(colours.size() > 50, name + ": " + colours.size() + " colours");
        assertTrue(whiteShare > 0.02 && whiteShare < 0.98, name + ": " + whiteShare + " white");

        String text = Files.readString(svg, StandardCharsets.UTF_8);
        Matcher m = Pattern.compile("<svg[^>]*>").matcher(text);
        assertTrue(m.find(), "no svg element in " + svg);
        String root = m.group();
        assertTrue(root.contains("width=\"" + width + "px\""), root);
        assertTrue(root.contains("height=\"" + height + "px\""), root);
        assertTrue(root.contains("viewBox=\"0 0 " + width + " " + height + "\""), root);
        assertTrue(text.contains("<path") && text.strip().endsWith("</svg>"), "an SVG with drawn paths");
        return img;
    }

    /** All the text XChart draws from the series and titles of a figure. */
    private static List<String> texts(Figure f) {
        List<String> out = new ArrayList<>();
        for (XYChart c : f.panels()) {
            out.add(c.getTitle());
            out.add(c.getXAxisTitle());
            out.add(c.getYAxisTitle());
            out.add(c.getYAxisGroupTitle(1));
            for (XYSeries s : c.getSeriesMap().values()) {
                if (s.isShowInLegend()) {
                    out.add(s.getName());
                }
            }
        }
        return out;
    }

    private static void assertOneSubscriptStyle(Figure f) {
        for (String t : texts(f)) {
            if (t != null) {
                assertTrue(Labels.followsConvention(t), "label breaks the convention: " + t);
            }
        }
    }

    @Test
    void bandDiagram(@TempDir Path dir) throws IOException {
        BandDiagramPlot plot = BandDiagramPlot.of(solution).title("small stack at " + Labels.V_G + " = 0 V");
        Figure f = plot.figure();
        assertWritesBoth(f, 1400, 820, dir, "band");
        assertOneSubscriptStyle(f);
        assertFalse(plot.drawnSubbands().isEmpty(), "a 2DEG has at least one subband drawn");
        List<String> names = texts(f);
        assertTrue(names.contains("E_c, conduction band") && names.contains("E_F = 0, Fermi level"), names.toString());
        assertTrue(names.stream().anyMatch(n -> n.startsWith("|\u03c8_0|\u00b2 at E_0 = ")), names.toString());
        assertTrue(names.stream().anyMatch(n -> n.startsWith("barrier: ")), "the layers are in the legend");
        Figure small = BandDiagramPlot.of(solution).size(600, 400).figure();
        assertWritesBoth(small, 600, 400, dir, "band-small");
    }

    @Test
    void aWavefunctionCutByTheDepthRangeEndsInMidAir() {
        Subband ground = solution.subbands().get(0);
        double[] x = solution.depthNm();
        double[] psi = ground.wavefunction();
        int peak = 0;
        for (int i = 0; i < psi.length; i++) {
            peak = psi[i] * psi[i] > psi[peak] * psi[peak] ? i : peak;
        }
        double cut = x[peak] + 0.5;
        XYChart c = BandDiagramPlot.of(solution).depthRangeNm(0, cut).chart();
        XYSeries curve = c.getSeriesMap().values().stream().filter(s -> s.getName().startsWith("|\u03c8_0|"))
                .findFirst().orElseThrow();
        double[] cx = curve.getXData();
        double[] cy = curve.getYData();
        int n = cx.length;
        assertTrue(cx[n - 1] <= cut, "nothing beyond the range");
        // the last point is the curve's own value at the last node inside the range, well above its
        // level (the peak lies 0.5 nm inside), and no point was added below it to close the curve
        assertTrue(cy[n - 1] > ground.energyEv() + 1e-3, "mid-air at the edge: " + cy[n - 1] + " vs " + ground.energyEv());
        assertTrue(cx[n - 1] > cx[n - 2], "no vertical closing segment at the edge");
        int inRange = 0;
        for (int i = 0; i < x.length; i++) {
            if (x[i] <= cut && psi[i] * psi[i] >= BandDiagramPlot.PSI_CUT * psi[peak] * psi[peak] && x[i] >= 0) {
                inRange++;
            }
        }
        assertEquals(inRange, n, "one point per node of the curve inside the range, none added");
    }

    @Test
    void gateSweep(@TempDir Path dir) throws IOException {
        Figure f = GateSweepPlot.of(sweep).analyticModel(ChargeBalanceModel.fromStructure(stack))
                .constantDensityThreshold(1e11).title("small stack").figure();
        assertEquals(2, f.panels().size());
        assertWritesBoth(f, 1800, 720, dir, "gate");
        assertOneSubscriptStyle(f);
        assertTrue(texts(f).stream().anyMatch(t -> t.startsWith("V_th = ")), texts(f).toString());
    }

    @Test
    void steepestTangentOfAPiecewiseLinearCurve() {
        // exact: the steepest interval is [-1, 0] with slope 2e12 per V; through (-1, 1e12) it meets 0 at -1.5 V
        GateSweepPlot.Tangent t = GateSweepPlot.steepestTangent(new double[] {-3, -2, -1, 0},
                new double[] {0, 0, 1e12, 3e12});
        assertEquals(2e12, t.slopePerCm2PerV(), 1e-3);
        assertEquals(-1.5, t.zeroV(), 1e-12);
        assertTrue(Double.isNaN(GateSweepPlot.steepestTangent(new double[] {0, 1}, new double[] {2, 1}).zeroV()),
                "no rise, no tangent");
    }

    @Test
    void designMapComparisonHasADifferencePanel(@TempDir Path dir) throws IOException {
        double[] xs = {0.15, 0.25, 0.35};
        double[] ds = {10, 20, 30};
        double[][] a = new double[3][3];
        double[][] b = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                a[i][j] = 1 + 4 * xs[i] + 0.02 * ds[j];
                b[i][j] = a[i][j] * (1 + 0.01 * (i - j));
            }
        }
        b[2][2] = Double.NaN;
        DesignMapPlot plot = DesignMapPlot.of(xs, ds, a).axes("Al fraction x", "thickness (nm)")
                .quantity(Labels.N_S + " (" + Labels.powerOfTen(13) + " " + Labels.PER_CM2 + ")").name("solver")
                .compareWith("model", b).mark("design", 0.25, 20).panelSize(700, 500);
        double[][] d = plot.relativeDifferencePercent();
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                if (i == 2 && j == 2) {
                    assertTrue(Double.isNaN(d[i][j]), "a failed point has no difference");
                } else {
                    assertEquals(i - j, d[i][j], 1e-9, "(model - solver) / solver in percent at " + i + "," + j);
                }
            }
        }
        Figure f = plot.figure();
        assertEquals(3, f.panels().size(), "solver, model, difference");
        assertTrue(f.panels().get(2).getTitle().contains("(model \u2212 solver) / solver (%)"), f.panels().get(2).getTitle());
        assertWritesBoth(f, 2100, 500, dir, "map");
        assertOneSubscriptStyle(f);

        Figure single = DesignMapPlot.of(xs, ds, a).panelSize(700, 500).figure();
        assertEquals(1, single.panels().size());
        assertWritesBoth(single, 700, 500, dir, "map-single");
        assertThrows(IllegalStateException.class, () -> DesignMapPlot.of(xs, ds, a).relativeDifferencePercent());
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> DesignMapPlot.of(xs, new double[] {10, 5, 30}, a));
        assertTrue(e.getMessage().contains("strictly increasing"), e.getMessage());
    }

    @Test
    void differenceLevelsAreSymmetricAboutZero() {
        MapPanel.Levels l = MapPanel.Levels.diverging(2.3, 8);
        double[] e = l.edges();
        assertEquals(0, e[e.length / 2], 1e-15, "zero is a level");
        for (int k = 0; k < e.length; k++) {
            assertEquals(-e[e.length - 1 - k], e[k], 1e-12);
        }
        assertTrue(e[0] <= -2.3 && e[e.length - 1] >= 2.3, java.util.Arrays.toString(e));
        // the two bands next to zero are pale, the outer ones darker, blue below and red above
        Color below = l.color(e.length / 2 - 1);
        Color above = l.color(e.length / 2);
        assertTrue(below.getBlue() > below.getRed() && above.getRed() > above.getBlue());
    }

    @Test
    void stackedPanelsShareTheirXAxisToThePixel(@TempDir Path dir) throws IOException {
        double[] x = {0, 1, 2, 3, 4};
        TradeoffPlot plot = TradeoffPlot.along("cap (nm)", x).title("trade-off")
                .panel("large values (a.u.)").points("a", new double[] {1e6, 2e6, 2.5e6, 2.8e6, 3e6})
                .line("a, model", new double[] {1.1e6, 2e6, 2.4e6, 2.9e6, 3.1e6})
                .panel("small values (a.u.)").points("b", new double[] {1, 2, 3, 2, 1})
                .mark("chosen", 2);
        Figure f = plot.figure();
        int height = 2 * 400 + TradeoffPlot.TITLE_HEIGHT_PX + TradeoffPlot.AXIS_HEIGHT_PX;
        assertWritesBoth(f, 1200, height, dir, "tradeoff");
        assertOneSubscriptStyle(f);
        // the raw charts put their plot areas at different places (long tick labels on the top one) ...
        XYChart top = f.panels().get(0);
        XYChart bottom = f.panels().get(1);
        double rawTop = leftOfPlotArea(top, 1200);
        double rawBottom = leftOfPlotArea(bottom, 1200);
        assertTrue(rawTop - rawBottom > 10, "the test needs panels of unequal label width: " + rawTop + ", " + rawBottom);
        // ... and in the figure, the plot borders line up: found in the drawn picture
        Color marker = new Color(255, 0, 255);
        for (XYChart c : f.panels()) {
            c.getStyler().setPlotBorderColor(marker);
        }
        BufferedImage img = f.image();
        int topBorder = firstMarkerColumn(img, top.getHeight() / 2);
        int bottomBorder = firstMarkerColumn(img, top.getHeight() + bottom.getHeight() / 3);
        assertTrue(topBorder > 0 && bottomBorder > 0, topBorder + ", " + bottomBorder);
        assertEquals(topBorder, bottomBorder, 1, "left edges of the two plot areas (pixels)");
        int topRight = lastMarkerColumn(img, top.getHeight() / 2);
        int bottomRight = lastMarkerColumn(img, top.getHeight() + bottom.getHeight() / 3);
        assertEquals(topRight, bottomRight, 1, "right edges of the two plot areas (pixels)");
        double[] left = f.plotAreaLeftPx();
        assertEquals(left[0], left[1], 1.0);
        assertFalse(top.getStyler().isXAxisTitleVisible(), "only the bottom panel carries the x-axis title");
        assertTrue(bottom.getStyler().isXAxisTitleVisible());
    }

    private static double leftOfPlotArea(XYChart c, int width) {
        c.paint(new BufferedImage(1, 1, BufferedImage.TYPE_INT_RGB).createGraphics(), width, c.getHeight());
        return c.getScreenXFromChart(c.getStyler().getXAxisMin());
    }

    private static boolean isMarker(int rgb) {
        int r = (rgb >> 16) & 0xff;
        int g = (rgb >> 8) & 0xff;
        int b = rgb & 0xff;
        return r > 200 && b > 200 && g < 190;
    }

    private static int firstMarkerColumn(BufferedImage img, int y) {
        for (int x = 0; x < img.getWidth(); x++) {
            if (isMarker(img.getRGB(x, y))) {
                return x;
            }
        }
        return -1;
    }

    private static int lastMarkerColumn(BufferedImage img, int y) {
        for (int x = img.getWidth() - 1; x >= 0; x--) {
            if (isMarker(img.getRGB(x, y))) {
                return x;
            }
        }
        return -1;
    }

    @Test
    void stackRefusesPanelsThatCannotShareAnAxis() {
        XYChart a = Style.xy(800, 300, "a", "x", "y");
        XYChart b = Style.xy(700, 300, "b", "x", "y");
        for (XYChart c : List.of(a, b)) {
            c.getStyler().setXAxisMin(0.0);
            c.getStyler().setXAxisMax(1.0);
        }
        InvalidParameterException e = assertThrows(InvalidParameterException.class,
                () -> Figure.stackedSharedX(List.of(a, b)));
        assertTrue(e.getMessage().contains("700"), e.getMessage());
        XYChart c = Style.xy(800, 300, "c", "x", "y");
        c.getStyler().setXAxisMin(0.0);
        c.getStyler().setXAxisMax(2.0);
        assertThrows(InvalidParameterException.class, () -> Figure.stackedSharedX(List.of(a, c)));
        InvalidParameterException ext = assertThrows(InvalidParameterException.class,
                () -> Figure.of(a).write(Path.of("plot.jpg")));
        assertTrue(ext.getMessage().contains("plot.jpg") && ext.getMessage().contains(".svg"), ext.getMessage());
    }

    @Test
    void spreadDrawsTheMedianBroadAndUnderneath(@TempDir Path dir) throws IOException {
        ThresholdExtraction threshold = new ThresholdExtraction(BiasGrid.linear(0.5, -7.5, 5),
                ThresholdDefinition.linearExtrapolation());
        double[] xs = {0.2, 0.3};
        List<SpreadResult> spreads = new ArrayList<>();
        for (double x : xs) {
            spreads.add(new ParameterSetSpread(new SelfConsistentSolver(), threshold).run(set -> Structure.builder(set)
                    .grow(Layer.of("buffer", Composition.GAN, 300 * NM))
                    .grow(Layer.of("spacer", Composition.ALN, 1 * NM))
                    .grow(Layer.of("barrier", Composition.alGaN(x), 15 * NM))
                    .top(TopBoundary.schottky(1.0, 0.0)).build()));
        }
        int sets = spreads.get(0).members().size();
        assertTrue(sets >= 2, "the built-in sets at least");
        Figure f = SpreadPlot.of(xs, spreads).xTitle("Al fraction x").setLabels(n -> "set " + n).figure();
        assertWritesBoth(f, 1800, 720, dir, "spread");
        assertOneSubscriptStyle(f);
        for (XYChart c : f.panels()) {
            List<XYSeries> series = new ArrayList<>(c.getSeriesMap().values());
            int median = -1;
            int firstMember = -1;
            for (int k = 0; k < series.size(); k++) {
                String name = series.get(k).getName();
                if (name.startsWith("median")) {
                    median = k;
                } else if (name.startsWith("set ") && firstMember < 0) {
                    firstMember = k;
                }
            }
            assertTrue(median >= 0 && firstMember > median, "the median is drawn before (under) the sets");
            float medianWidth = series.get(median).getLineStyle().getLineWidth();
            for (XYSeries s : series) {
                if (s.getName().startsWith("set ")) {
                    BasicStroke member = s.getLineStyle();
                    assertTrue(medianWidth >= 4 * member.getLineWidth(), "broad enough to show around a set's line");
                }
            }
            assertEquals(sets, series.stream().filter(s -> s.getName().startsWith("set ")).count());
        }
    }

    @Test
    void labels() {
        assertEquals("cm\u207b\u00b2", Labels.PER_CM2);
        assertEquals("10\u00b9\u00b3", Labels.powerOfTen(13));
        assertEquals("E_0", Labels.sub("E", "0"));
        assertTrue(Labels.followsConvention("n_s (10\u00b9\u00b3 cm\u207b\u00b2)"));
        assertFalse(Labels.followsConvention("n\u209b"), "Unicode subscript s");
        assertFalse(Labels.followsConvention("cm^-2"), "caret superscript");
        assertThrows(IllegalArgumentException.class, () -> Labels.superscript("1-2"));
        assertEquals("2.5", Labels.trimmed(2.50));
        assertEquals("1800", Labels.trimmed(1800));
    }
}
