package org.branchsim.plots;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.ToDoubleFunction;
import javax.imageio.ImageIO;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Unit;
import org.branchsim.core.units.UnitSystem;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.Range;
import org.jfree.data.general.DatasetUtils;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * The quasi-static characteristic of one reducing valve as one figure of three panels, stacked: (a) outlet
 * pressure against main flow during the demand ramps, rising and falling demand as separate series, with the
 * setting line and the droop (least-squares slope of outlet pressure against flow, in pressure per flow display
 * unit); (b) outlet pressure against inlet pressure during the supply ramps, with the setting line and the
 * regulation deviation (highest minus lowest outlet pressure) over the inlet range; (c) pilot drain flow against
 * outlet pressure over all ramp samples. Pressures and flows in the display units of the unit system. The curves
 * are a static characteristic only when the ramps are slow compared with the valve's response; the subtitle says
 * so.
 */
public final class CharacteristicChart {

    /** Height of one panel, px. */
    public static final int PANEL_HEIGHT = 400;
    /** Subtitle stating when the curves are static. */
    static final String QUASI_STATIC = "quasi-static: read from the run's ramps; a static characteristic only "
            + "where the ramps are slow compared with the valve's response";

    private CharacteristicChart() {
    }

    /**
     * Writes the three panels, stacked, as one PNG of {@link TraceCharts#WIDTH} by 3 {@link #PANEL_HEIGHT} px.
     *
     * @param c the valve's characteristic
     * @param title figure title
     * @param units unit system for the axes
     * @param file PNG to write
     * @throws IOException when the file cannot be written
     */
    public static void save(ValveCharacteristic c, String title, UnitSystem units, Path file) throws IOException {
        List<JFreeChart> panels = panels(c, title, units);
        BufferedImage image = new BufferedImage(TraceCharts.WIDTH, PANEL_HEIGHT * panels.size(),
                BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setColor(Color.WHITE);
        g.fillRect(0, 0, image.getWidth(), image.getHeight());
        for (int k = 0; k < panels.size(); k++) {
            panels.get(k).draw(g, new Rectangle2D.Double(0, k * PANEL_HEIGHT, TraceCharts.WIDTH, PANEL_HEIGHT));
        }
        g.dispose();
        ImageIO.write(image, "png", file.toFile());
    }

    /**
     * @param c the valve's characteristic
     * @param title figure title (on the first panel, with the quasi-static subtitle)
     * @param units unit system for the axes
     * @return the three panels (a), (b), (c) in drawing order; the last carries the caution
     */
    public static List<JFreeChart> panels(ValveCharacteristic c, String title, UnitSystem units) {
        Unit pu = units.displayUnit(Dimension.PRESSURE);
        Unit qu = units.displayUnit(Dimension.VOLUME_FLOW);
        List<JFreeChart> out = new ArrayList<>();
        JFreeChart a = chart(title, flowPanel(c, pu, qu));
        a.addSubtitle(new TextTitle(QUASI_STATIC, new Font(Font.SANS_SERIF, Font.PLAIN, 12)));
        a.addSubtitle(new TextTitle("(a) " + droopText(c, pu, qu), new Font(Font.SANS_SERIF, Font.BOLD, 12)));
        out.add(a);
        JFreeChart b = chart(null, inletPanel(c, pu));
        b.addSubtitle(new TextTitle("(b) " + deviationText(c, pu), new Font(Font.SANS_SERIF, Font.BOLD, 12)));
        out.add(b);
        JFreeChart d = chart(null, drainPanel(c, pu, qu));
        d.addSubtitle(new TextTitle("(c) pilot drain flow against outlet pressure, all ramp samples",
                new Font(Font.SANS_SERIF, Font.BOLD, 12)));
        out.add(TraceCharts.withCaution(d));
        return out;
    }

    /** @return the droop in the display units, pressure unit per flow unit */
    public static double droopInDisplayUnits(ValveCharacteristic c, UnitSystem units) {
        return c.droop() * units.displayUnit(Dimension.VOLUME_FLOW).factor()
                / units.displayUnit(Dimension.PRESSURE).factor();
    }

    /** @return the droop in words, with what it is measured from */
    static String droopText(ValveCharacteristic c, Unit pu, Unit qu) {
        int n = c.samplesOf(ValveCharacteristic.Drive.DEMAND).size();
        if (n < 2) {
            return "no demand ramp: droop not measured";
        }
        return String.format(Locale.ROOT, "droop %.4g %s per %s: least-squares slope of outlet pressure against "
                + "main flow over %d demand-ramp samples (rising and falling)",
                c.droop() * qu.factor() / pu.factor(), pu.symbol(), qu.symbol(), n);
    }

    /** @return the regulation deviation in words, with the inlet range it is measured over */
    static String deviationText(ValveCharacteristic c, Unit pu) {
        if (c.samplesOf(ValveCharacteristic.Drive.SUPPLY).isEmpty()) {
            return "no supply-pressure ramp: regulation deviation not measured";
        }
        double[] r = c.inletRange();
        return String.format(Locale.ROOT, "regulation deviation %.4g %s: highest minus lowest outlet pressure while "
                + "the inlet pressure is ramped over %.4g .. %.4g %s", pu.fromSi(c.deviation()) - pu.fromSi(0.0),
                pu.symbol(), pu.fromSi(r[0]), pu.fromSi(r[1]), pu.symbol());
    }

    private static JFreeChart chart(String title, XYPlot plot) {
        JFreeChart chart = new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, plot, true);
        chart.setBackgroundPaint(Color.WHITE);
        return chart;
    }

    private static XYPlot flowPanel(ValveCharacteristic c, Unit pu, Unit qu) {
        XYPlot p = panel(byDirection(c, ValveCharacteristic.Drive.DEMAND, ValveCharacteristic.Sample::flow, qu,
                ValveCharacteristic.Sample::outlet, pu), c.id() + ".q (main flow) [" + qu.symbol() + "]",
                c.id() + ".p.out [" + pu.symbol() + "]");
        p.addRangeMarker(setting(c, pu), Layer.FOREGROUND);
        include(p.getRangeAxis(), DatasetUtils.findRangeBounds(p.getDataset(), false), pu.fromSi(c.setting()));
        return p;
    }

    private static XYPlot inletPanel(ValveCharacteristic c, Unit pu) {
        XYPlot p = panel(byDirection(c, ValveCharacteristic.Drive.SUPPLY, ValveCharacteristic.Sample::inlet, pu,
                ValveCharacteristic.Sample::outlet, pu), "inlet pressure [" + pu.symbol() + "]",
                c.id() + ".p.out [" + pu.symbol() + "]");
        p.addRangeMarker(setting(c, pu), Layer.FOREGROUND);
        include(p.getRangeAxis(), DatasetUtils.findRangeBounds(p.getDataset(), false), pu.fromSi(c.setting()));
        return p;
    }

    private static XYPlot drainPanel(ValveCharacteristic c, Unit pu, Unit qu) {
        XYSeriesCollection data = new XYSeriesCollection();
        for (ValveCharacteristic.Drive d : ValveCharacteristic.Drive.values()) {
            List<ValveCharacteristic.Sample> s = c.samplesOf(d);
            if (!s.isEmpty()) {
                data.addSeries(series("during " + (d == ValveCharacteristic.Drive.DEMAND ? "demand" : "supply-pressure")
                        + " ramps", s, ValveCharacteristic.Sample::outlet, pu, ValveCharacteristic.Sample::drain, qu));
            }
        }
        XYPlot p = panel(data, c.id() + ".p.out [" + pu.symbol() + "]", c.id() + ".drain.q [" + qu.symbol() + "]");
        ValueMarker m = setting(c, pu);
        m.setLabelAnchor(RectangleAnchor.BOTTOM_RIGHT);
        m.setLabelTextAnchor(TextAnchor.BOTTOM_LEFT);
        p.addDomainMarker(m, Layer.FOREGROUND);
        include(p.getDomainAxis(), DatasetUtils.findDomainBounds(p.getDataset(), false), pu.fromSi(c.setting()));
        return p;
    }

    /** @return one series per direction of the drive that has samples, rising first */
    static XYSeriesCollection byDirection(ValveCharacteristic c, ValveCharacteristic.Drive drive,
                                          ToDoubleFunction<ValveCharacteristic.Sample> x, Unit xu,
                                          ToDoubleFunction<ValveCharacteristic.Sample> y, Unit yu) {
        XYSeriesCollection data = new XYSeriesCollection();
        for (boolean rising : new boolean[] {true, false}) {
            List<ValveCharacteristic.Sample> s = c.samplesOf(drive).stream()
                    .filter(v -> v.stretch().rising() == rising).toList();
            if (!s.isEmpty()) {
                data.addSeries(series(s.get(0).stretch().label(), s, x, xu, y, yu));
            }
        }
        return data;
    }

    private static XYSeries series(String label, List<ValveCharacteristic.Sample> samples,
                                   ToDoubleFunction<ValveCharacteristic.Sample> x, Unit xu,
                                   ToDoubleFunction<ValveCharacteristic.Sample> y, Unit yu) {
        XYSeries s = new XYSeries(label, false, true);
        for (ValveCharacteristic.Sample v : samples) {
            s.add(xu.fromSi(x.applyAsDouble(v)), yu.fromSi(y.applyAsDouble(v)), false);
        }
        return s;
    }

    private static XYPlot panel(XYSeriesCollection data, String xLabel, String yLabel) {
        NumberAxis x = new NumberAxis(xLabel);
        x.setAutoRangeIncludesZero(false);
        NumberAxis y = new NumberAxis(yLabel);
        y.setAutoRangeIncludesZero(false);
        y.setAutoRangeMinimumSize(1e-6);
        x.setAutoRangeMinimumSize(1e-6);
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(false, true);
        for (int k = 0; k < data.getSeriesCount(); k++) {
            TraceCharts.style(r, k, 1.2f);
            r.setSeriesShape(k, new java.awt.geom.Ellipse2D.Double(-1.5, -1.5, 3, 3));
        }
        XYPlot p = new XYPlot(data, x, y, r);
        TraceCharts.grid(p);
        return p;
    }

    /** Fixes an axis to the data's range widened to show a value (the setting), with a 5 % margin each side. */
    static void include(ValueAxis axis, Range data, double value) {
        double low = data == null ? value : Math.min(data.getLowerBound(), value);
        double high = data == null ? value : Math.max(data.getUpperBound(), value);
        double margin = 0.05 * Math.max(high - low, 1e-6 * Math.max(1.0, Math.abs(value)));
        axis.setAutoRange(false);
        axis.setRange(low - margin, high + margin);
    }

    private static ValueMarker setting(ValveCharacteristic c, Unit pu) {
        double v = pu.fromSi(c.setting());
        ValueMarker m = new ValueMarker(v, new Color(0x2e8b57), new BasicStroke(1.4f));
        m.setLabel(String.format(Locale.ROOT, "setting %.2f %s", v, pu.symbol()));
        m.setLabelAnchor(RectangleAnchor.TOP_LEFT);
        m.setLabelTextAnchor(TextAnchor.BOTTOM_LEFT);
        m.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        return m;
    }
}
