package org.gyreplan.app.render;

import org.gyreplan.solver.grid.ScalarField;

import java.awt.Color;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

/**
 * Maps values to colours. Sequential scales run from {@code min} to {@code max}; diverging scales are centred on
 * zero (the same limit on both sides) so that white means zero, for signed quantities such as Ekman pumping.
 */
public final class ColorScale {
    /** Deep blue-green to pale sand (our own sequential ramp). */
    static final Color[] SEQUENTIAL = {
            new Color(0x1B, 0x26, 0x4F), new Color(0x1F, 0x4E, 0x79), new Color(0x23, 0x7A, 0x8C),
            new Color(0x4C, 0xA5, 0x8F), new Color(0x9C, 0xC9, 0x7E), new Color(0xE8, 0xE2, 0x9A),
            new Color(0xFA, 0xF3, 0xD8)};
    /** Negative: warm rust; zero: white; positive: cool teal-blue (our own diverging ramp). */
    static final Color[] DIVERGING = {
            new Color(0x7A, 0x2E, 0x0E), new Color(0xC2, 0x5B, 0x21), new Color(0xEE, 0xA9, 0x6E),
            new Color(0xFF, 0xFF, 0xFF),
            new Color(0x7F, 0xC4, 0xD0), new Color(0x23, 0x83, 0xA8), new Color(0x0D, 0x3B, 0x66)};

    private final double min, max;
    private final boolean diverging;
    private final String units;
    private final Color[] stops;
    private final String highLabel, lowLabel;

    private ColorScale(double min, double max, boolean diverging, String units, Color[] stops, String high, String low) {
        this.min = min;
        this.max = max > min ? max : min + 1;
        this.diverging = diverging;
        this.units = units;
        this.stops = stops;
        this.highLabel = high;
        this.lowLabel = low;
    }

    public static ColorScale sequential(double min, double max, String units) {
        return new ColorScale(min, max, false, units, SEQUENTIAL, null, null);
    }

    /** Centred on zero with limit ±{@code limit}; labels name what the signs mean (e.g. "upwelling"). */
    public static ColorScale diverging(double limit, String units, String positiveMeans, String negativeMeans) {
        double l = limit > 0 && Double.isFinite(limit) ? limit : 1;
        return new ColorScale(-l, l, true, units, DIVERGING, positiveMeans, negativeMeans);
    }

    /** Sequential over the 2nd–98th percentile, or diverging if the field takes both signs. */
    public static ColorScale auto(ScalarField f) {
        double[] v = Arrays.stream(f.values()).filter(Double::isFinite).sorted().toArray();
        if (v.length == 0) return sequential(0, 1, f.units());
        double lo = v[(int) (0.02 * (v.length - 1))], hi = v[(int) Math.ceil(0.98 * (v.length - 1))];
        if (lo < 0 && hi > 0) return diverging(Math.max(-lo, hi), f.units(), "positive", "negative");
        if (hi == lo) { lo -= 0.5 * Math.abs(lo) + 1e-12; hi += 0.5 * Math.abs(hi) + 1e-12; }
        return sequential(lo, hi, f.units());
    }

    /** Robust symmetric limit: the 98th percentile of |v|. */
    public static double robustLimit(ScalarField f) {
        double[] v = Arrays.stream(f.values()).filter(Double::isFinite).map(Math::abs).sorted().toArray();
        return v.length == 0 ? 1 : v[(int) Math.ceil(0.98 * (v.length - 1))];
    }

    public String units() { return units; }
    public String highLabel() { return highLabel; }
    public String lowLabel() { return lowLabel; }
    public boolean isDiverging() { return diverging; }

    /** Position of a value on the bar, clamped to [0, 1]. */
    public double fraction(double v) { return Math.max(0, Math.min(1, (v - min) / (max - min))); }

    public Color color(double v) { return colorAt(fraction(v)); }

    public Color colorAt(double t) {
        double x = t * (stops.length - 1);
        int k = Math.min(stops.length - 2, (int) Math.floor(x));
        return MapRenderer.mix(stops[k], stops[k + 1], x - k);
    }

    /** About five round tick values inside the range (including 0 for diverging scales). */
    public List<Double> ticks() {
        double span = max - min;
        double raw = span / 5;
        double mag = Math.pow(10, Math.floor(Math.log10(raw)));
        double step = raw / mag < 1.5 ? mag : raw / mag < 3.5 ? 2 * mag : raw / mag < 7.5 ? 5 * mag : 10 * mag;
        List<Double> t = new ArrayList<>();
        for (double v = Math.ceil(min / step) * step; v <= max + 1e-9 * span; v += step) {
            t.add(Math.abs(v) < 1e-9 * span ? 0.0 : v);
        }
        return t;
    }

    public String format(double v) {
        double a = Math.abs(max - min);
        if (v == 0) return "0";
        if (a >= 1000 && Math.abs(v) < 1e7) return String.format(Locale.ROOT, "%,.0f", v);
        if (a >= 1000 || a < 0.01) return String.format(Locale.ROOT, "%.1e", v);
        if (a >= 10) return String.format(Locale.ROOT, "%.0f", v);
        if (a >= 1) return String.format(Locale.ROOT, "%.1f", v);
        return String.format(Locale.ROOT, "%.2f", v);
    }
}
