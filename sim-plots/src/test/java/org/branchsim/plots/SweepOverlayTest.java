package org.branchsim.plots;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.util.ArrayList;
import java.util.List;
import org.branchsim.core.results.Trace;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.UnitSystem;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYItemRenderer;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.Test;

/**
 * Sweep overlays past six variants: one series per variant in the order of the varied value, coloured from the
 * sequential map (lowest darkest), a colour bar spanning the varied values instead of a legend; each sample in bar
 * (1 bar = 1e5 Pa, NIST SP 811, 2008, Appendix B). The map's end colours are those of viridis (van der Walt and
 * Smith, matplotlib, 2015; hex values from memory) and its luma (ITU-R BT.601: 0.299 R + 0.587 G + 0.114 B) rises
 * from end to end, so that the order reads in grey print.
 */
class SweepOverlayTest {

    private static final double BAR = 1e5;

    /** A trace of one pressure held at p (Pa) for 11 samples over 10 ms. */
    private static Trace constant(double p) {
        Trace t = new Trace(List.of(new Trace.Column("out.p", Dimension.PRESSURE)));
        for (int k = 0; k <= 10; k++) {
            t.add(k * 1e-3, new double[] {p});
        }
        return t;
    }

    private static List<SweepOverlay.Variant> variants(int n) {
        List<SweepOverlay.Variant> list = new ArrayList<>();
        // given out of order: 0.9, 0.2, 0.7, ... mm; the curve of value d holds 10*d bar
        for (int k = 0; k < n; k++) {
            double d = 0.1 + ((k * 7) % n) * 0.1;
            list.add(new SweepOverlay.Variant(new TraceCharts.Labelled("d=" + d, constant(10 * d * BAR)), d));
        }
        return list;
    }

    private static PaintScaleLegend colourBar(JFreeChart chart) {
        for (int i = 0; i < chart.getSubtitleCount(); i++) {
            if (chart.getSubtitle(i) instanceof PaintScaleLegend l) {
                return l;
            }
        }
        return null;
    }

    @Test
    void sixVariantsKeepTheirLegend() {
        JFreeChart chart = SweepOverlay.chart(variants(6), "out.p", "d [mm]", "six", UnitSystem.METRIC);
        assertEquals(6, chart.getXYPlot().getDataset().getSeriesCount());
        assertNotNull(chart.getLegend());
        assertNull(colourBar(chart));
    }

    @Test
    void pastSixVariantsTheCurvesAreColouredByValueWithAColourBar() {
        int n = 9;
        JFreeChart chart = SweepOverlay.chart(variants(n), "out.p", "d [mm]", "nine", UnitSystem.METRIC);
        XYPlot plot = chart.getXYPlot();
        XYDataset data = plot.getDataset();
        assertEquals(n, data.getSeriesCount());
        assertNull(chart.getLegend(), "no legend past six variants");
        XYItemRenderer r = plot.getRenderer();
        double previous = Double.NEGATIVE_INFINITY;
        for (int s = 0; s < n; s++) {
            // series in the order of the varied value; each holds 10*d bar at every sample
            double value = data.getYValue(s, 0);
            assertTrue(value > previous, "series " + s + " out of order");
            previous = value;
            assertEquals(11, data.getItemCount(s));
            double d = 0.1 + s * 0.1;
            assertEquals(10 * d, value, 1e-9);
            assertEquals(ColourMap.at((d - 0.1) / ((n - 1) * 0.1)), r.getSeriesPaint(s));
        }
        PaintScaleLegend bar = colourBar(chart);
        assertNotNull(bar);
        assertEquals(0.1, bar.getAxis().getRange().getLowerBound(), 1e-12);
        assertEquals(0.1 * n, bar.getAxis().getRange().getUpperBound(), 1e-12);
        assertEquals("d [mm]", bar.getAxis().getLabel());
        // time axis spans the samples, value axis the values (1 to 9 bar)
        assertTrue(plot.getRangeAxis().getRange().contains(1.0) && plot.getRangeAxis().getRange().contains(9.0));
    }

    @Test
    void aThousandVariantsDrawAHundredEvenlySpacedWithTheFullColourRange() {
        JFreeChart chart = SweepOverlay.chart(variants(1000), "out.p", "d [mm]", "thousand", UnitSystem.METRIC);
        assertEquals(SweepOverlay.MAX_DRAWN, chart.getXYPlot().getDataset().getSeriesCount());
        // the bar still spans the lowest and the highest value of all variants: 0.1 mm to 100.0 mm
        PaintScaleLegend bar = colourBar(chart);
        assertEquals(0.1, bar.getScale().getLowerBound(), 1e-9);
        assertEquals(100.0, bar.getScale().getUpperBound(), 1e-9);
        boolean said = false;
        for (int i = 0; i < chart.getSubtitleCount(); i++) {
            if (chart.getSubtitle(i) instanceof org.jfree.chart.title.TextTitle t
                    && t.getText().startsWith("100 of 1000 variants drawn")) {
                said = true;
            }
        }
        assertTrue(said, "the figure says how many variants it draws");
    }

    @Test
    void mapRunsFromViridisDarkToLightWithRisingLuma() {
        assertEquals(new Color(0x440154), ColourMap.at(0));
        assertEquals(new Color(0xfde725), ColourMap.at(1));
        assertEquals(new Color(0x21918c), ColourMap.at(0.5));
        double last = -1;
        for (int k = 0; k <= 100; k++) {
            Color c = ColourMap.at(k / 100.0);
            double luma = 0.299 * c.getRed() + 0.587 * c.getGreen() + 0.114 * c.getBlue();
            assertTrue(luma > last, "luma falls at " + k + " %");
            last = luma;
        }
        assertEquals(ColourMap.MISSING, new ColourMap(0, 1).getPaint(Double.NaN));
    }
}
