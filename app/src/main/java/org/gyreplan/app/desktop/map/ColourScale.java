package org.gyreplan.app.desktop.map;

import javafx.scene.paint.Color;

/**
 * Maps a value to a colour over [min, max]. A diverging scale (for signed fields) is centred on zero:
 * the range is made symmetric, −a…+a, with white at zero, blue for negative and red for positive values.
 * A sequential scale runs from deep navy through teal to pale yellow. Values outside the range saturate;
 * NaN is transparent.
 */
public final class ColourScale {
    /** Palette family. */
    public enum Kind { SEQUENTIAL, DIVERGING, DEPTH }

    private static final int LUT_SIZE = 256;
    private final Kind kind;
    private double min, max;
    private final int[] lut = new int[LUT_SIZE];
    private final double opacity;

    public ColourScale(Kind kind, double min, double max, double opacity) {
        this.kind = kind;
        this.opacity = opacity;
        buildLut();
        setRange(min, max);
    }

    public Kind kind() { return kind; }
    public double min() { return min; }
    public double max() { return max; }

    /** Sets the range; a diverging scale is made symmetric about zero using the larger magnitude. */
    public void setRange(double lo, double hi) {
        if (!Double.isFinite(lo) || !Double.isFinite(hi)) { lo = -1; hi = 1; }
        if (lo > hi) { double t = lo; lo = hi; hi = t; }
        if (kind == Kind.DIVERGING) {
            double a = Math.max(Math.abs(lo), Math.abs(hi));
            if (a == 0) a = 1;
            lo = -a; hi = a;
        } else if (lo == hi) {
            hi = lo + (lo == 0 ? 1 : Math.abs(lo) * 0.01);
        }
        min = lo;
        max = hi;
    }

    /** Fraction of the range, clamped to [0, 1]; NaN for NaN. */
    public double fraction(double v) {
        if (Double.isNaN(v)) return Double.NaN;
        return Math.max(0, Math.min(1, (v - min) / (max - min)));
    }

    /** ARGB colour (0 = transparent for NaN). */
    public int argb(double v) {
        double f = fraction(v);
        if (Double.isNaN(f)) return 0;
        return lut[(int) Math.round(f * (LUT_SIZE - 1))];
    }

    /** Colour of a value (transparent for NaN). */
    public Color color(double v) {
        int c = argb(v);
        return Color.rgb((c >> 16) & 255, (c >> 8) & 255, c & 255, ((c >>> 24) & 255) / 255.0);
    }

    private void buildLut() {
        double[][] stops = switch (kind) {
            // position, r, g, b
            case DIVERGING -> new double[][] {
                    {0.0, 0.13, 0.25, 0.60}, {0.25, 0.38, 0.60, 0.85}, {0.5, 0.97, 0.97, 0.97},
                    {0.75, 0.93, 0.55, 0.40}, {1.0, 0.62, 0.08, 0.13}};
            case SEQUENTIAL -> new double[][] {
                    {0.0, 0.10, 0.12, 0.35}, {0.35, 0.13, 0.45, 0.55}, {0.7, 0.45, 0.75, 0.45},
                    {1.0, 0.98, 0.93, 0.55}};
            case DEPTH -> new double[][] {
                    {0.0, 0.84, 0.92, 0.97}, {0.3, 0.60, 0.78, 0.90}, {1.0, 0.20, 0.38, 0.62}};
        };
        int a = (int) Math.round(255 * opacity);
        for (int k = 0; k < LUT_SIZE; k++) {
            double f = k / (double) (LUT_SIZE - 1);
            int s = 0;
            while (s < stops.length - 2 && f > stops[s + 1][0]) s++;
            double t = (f - stops[s][0]) / (stops[s + 1][0] - stops[s][0]);
            int r = (int) Math.round(255 * (stops[s][1] + t * (stops[s + 1][1] - stops[s][1])));
            int g = (int) Math.round(255 * (stops[s][2] + t * (stops[s + 1][2] - stops[s][2])));
            int b = (int) Math.round(255 * (stops[s][3] + t * (stops[s + 1][3] - stops[s][3])));
            lut[k] = (a << 24) | (r << 16) | (g << 8) | b;
        }
    }
}
