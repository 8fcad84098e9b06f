// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wurtzkit.units.Units.NM;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.ParameterSets;
import org.wurtzkit.solvers.workflow.Axis;
import org.wurtzkit.solvers.workflow.BiasGrid;
import org.wurtzkit.solvers.workflow.DesignTradeoff;
import org.wurtzkit.solvers.workflow.ThresholdDefinition;
import org.wurtzkit.solvers.workflow.ThresholdExtraction;
import org.wurtzkit.solvers.workflow.TradeoffPoint;
import org.wurtzkit.solvers.workflow.TradeoffResult;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/** The Pareto plot of a three-stack family (GaN cap 0, 2, 4 nm on Al0.25Ga0.75N 15 nm / GaN). */
class ParetoPlotTest {
    private static TradeoffResult result;

    private static Structure stack(double capNm) {
        Structure.Builder b = Structure.builder(ParameterSets.defaultSet())
                .grow(Layer.of("buffer", Composition.GAN, 300 * NM))
                .grow(Layer.of("barrier", Composition.alGaN(0.25), 15 * NM));
        if (capNm > 0) {
            b.grow(Layer.of("cap", Composition.GAN, capNm * NM));
        }
        return b.top(TopBoundary.schottky(1.0, 0)).build();
    }

    @BeforeAll
    static void run() {
        result = DesignTradeoff.builder(p -> stack(p[0])).axis(Axis.of("cap", "nm", 0, 2, 4)).reverseBiasV(6)
                .stepV(0.5).build().run();
    }

    @Test
    void drawsEveryStackAndTheFrontAsAStaircase(@TempDir Path dir) throws IOException {
        assertTrue(result.failures().isEmpty(), result::toString);
        Figure f = ParetoPlot.of("three caps", result).labelFront(p -> "cap " + p.design()[0] + " nm").figure();
        assertEquals(ParetoPlot.WIDTH, f.width());
        assertEquals(ParetoPlot.HEIGHT, f.height());
        XYChart c = f.panels().get(0);
        List<TradeoffPoint> front = result.front();
        XYSeries stair = c.getSeriesMap().get("Pareto front (" + front.size() + " stacks)");
        double[] x = stair.getXData();
        double[] y = stair.getYData();
        assertEquals(2 * front.size() - 1, x.length);
        for (int k = 0; k < front.size(); k++) {
            // every front stack is a corner of the staircase
            assertEquals(front.get(k).sheetResistanceOhmPerSquare(), x[2 * k], 0.0);
            assertEquals(front.get(k).leakageMagnitudeAPerCm2(), y[2 * k], 0.0);
        }
        for (int i = 1; i < x.length; i++) {
            // across then down: R_sh never falls, |J| never rises (both objectives are minimised)
            assertTrue(x[i] >= x[i - 1] && y[i] <= y[i - 1], "step " + i);
        }
        assertEquals(3, c.getSeriesMap().get("stacks with all stacks (no V_th band)").getXData().length);
        Path png = f.writePng(dir.resolve("pareto.png"));
        BufferedImage img = ImageIO.read(png.toFile());
        int red = 0;
        for (int yy = 0; yy < img.getHeight(); yy++) {
            for (int xx = 0; xx < img.getWidth(); xx++) {
                red += (img.getRGB(xx, yy) & 0xffffff) == Style.RED.getRGB() - 0xff000000 ? 1 : 0;
            }
        }
        assertTrue(red > 100, "the front is drawn in red: " + red + " pixels");
    }

    @Test
    void refusesAResultWithNothingComputed() {
        TradeoffResult none = DesignTradeoff.builder(p -> stack(p[0])).axis(Axis.of("cap", "nm", 0))
                .reverseBiasV(6).sweep(new ThresholdExtraction(BiasGrid.linear(0, -1, 3),
                        ThresholdDefinition.constantDensity(1e11)))
                .build().run();
        InvalidParameterException e = assertThrows(InvalidParameterException.class, () -> ParetoPlot.of("none", none));
        assertEquals("computed stacks of the trade-off", e.parameter());
    }
}
