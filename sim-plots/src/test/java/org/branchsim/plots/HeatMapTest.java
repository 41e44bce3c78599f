package org.branchsim.plots;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYBlockRenderer;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.data.xy.XYZDataset;
import org.junit.jupiter.api.Test;

/**
 * A two-parameter grid as a heat map: one cell per grid point holding the metric of that point, axes covering
 * exactly the grid's cells, the colour scale spanning the finite values (a failed point, NaN, left out of the
 * scale). Test values are made up: z = 10 i + j, so each cell's expected value is known without the code.
 */
class HeatMapTest {

    @Test
    void everyGridPointIsOneCellWithItsValue() {
        List<String> xs = List.of("0.3 mm", "0.6 mm", "0.9 mm");
        List<String> ys = List.of("4 cm^3", "8 cm^3");
        double[][] z = new double[3][2];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 2; j++) {
                z[i][j] = 10 * i + j;
            }
        }
        z[1][1] = Double.NaN;
        JFreeChart chart = HeatMap.chart(xs, ys, z, "d [mm]", "V [cm^3]", "overshoot [%]", "grid");
        XYPlot plot = chart.getXYPlot();
        XYZDataset data = (XYZDataset) plot.getDataset();
        assertEquals(6, data.getItemCount(0));
        for (int k = 0; k < 6; k++) {
            int i = (int) data.getXValue(0, k);
            int j = (int) data.getYValue(0, k);
            double expected = i == 1 && j == 1 ? Double.NaN : 10 * i + j;
            assertEquals(expected, data.getZValue(0, k), 0.0, "cell " + i + "," + j);
        }
        assertEquals(-0.5, plot.getDomainAxis().getRange().getLowerBound(), 0.0);
        assertEquals(2.5, plot.getDomainAxis().getRange().getUpperBound(), 0.0);
        assertEquals(1.5, plot.getRangeAxis().getRange().getUpperBound(), 0.0);
        XYBlockRenderer r = (XYBlockRenderer) plot.getRenderer();
        assertEquals(0.0, r.getPaintScale().getLowerBound(), 0.0);
        assertEquals(21.0, r.getPaintScale().getUpperBound(), 0.0);
        assertEquals(6, plot.getAnnotations().size(), "each cell carries its value");
        boolean bar = false;
        for (int i = 0; i < chart.getSubtitleCount(); i++) {
            bar |= chart.getSubtitle(i) instanceof PaintScaleLegend l && l.getAxis().getLabel().equals("overshoot [%]");
        }
        assertTrue(bar, "colour bar named after the metric");
    }

    @Test
    void aGridOfTheWrongShapeIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> HeatMap.chart(List.of("a", "b"), List.of("c"),
                new double[1][1], "x", "y", "z", "t"));
    }
}
