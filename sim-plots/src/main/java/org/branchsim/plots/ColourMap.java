package org.branchsim.plots;

import java.awt.Color;
import java.awt.Paint;
import org.jfree.chart.renderer.PaintScale;

/**
 * A sequential colour map for values ordered along one axis: dark blue-violet for the lowest, through blue and
 * green, to yellow for the highest, linear between five anchor colours taken from the "viridis" map of van der
 * Walt and Smith (matplotlib, 2015; anchors from memory), whose lightness rises steadily so that the order reads
 * also in grey print and for most colour-vision deficiencies. As a JFreeChart {@link PaintScale} it maps
 * [lower, upper] onto the map; values outside are clamped, NaN is grey.
 */
public final class ColourMap implements PaintScale {

    /** Anchor colours at 0, 1/4, 1/2, 3/4 and 1. */
    private static final int[] ANCHORS = {0x440154, 0x3b528b, 0x21918c, 0x5ec962, 0xfde725};
    /** Colour of a missing value (a failed variant). */
    public static final Color MISSING = new Color(0xbbbbbb);

    private final double lower;
    private final double upper;

    /**
     * @param lower value drawn in the darkest colour
     * @param upper value drawn in the lightest colour (equal to lower: everything in the middle colour)
     */
    public ColourMap(double lower, double upper) {
        if (!(upper >= lower)) {
            throw new IllegalArgumentException("colour map from " + lower + " to " + upper);
        }
        this.lower = lower;
        this.upper = upper;
    }

    /** @return the colour at a fraction of the map, 0 = lowest, 1 = highest (clamped) */
    public static Color at(double fraction) {
        double f = Math.max(0, Math.min(1, fraction)) * (ANCHORS.length - 1);
        int i = Math.min((int) Math.floor(f), ANCHORS.length - 2);
        double w = f - i;
        Color a = new Color(ANCHORS[i]);
        Color b = new Color(ANCHORS[i + 1]);
        return new Color(mix(a.getRed(), b.getRed(), w), mix(a.getGreen(), b.getGreen(), w),
                mix(a.getBlue(), b.getBlue(), w));
    }

    private static int mix(int a, int b, double w) {
        return (int) Math.round(a + (b - a) * w);
    }

    @Override
    public double getLowerBound() {
        return lower;
    }

    @Override
    public double getUpperBound() {
        return upper;
    }

    @Override
    public Paint getPaint(double value) {
        if (Double.isNaN(value)) {
            return MISSING;
        }
        return at(upper > lower ? (value - lower) / (upper - lower) : 0.5);
    }
}
