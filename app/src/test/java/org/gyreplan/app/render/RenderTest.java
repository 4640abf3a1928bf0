package org.gyreplan.app.render;

import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.junit.jupiter.api.Test;

import java.awt.Color;
import java.awt.image.BufferedImage;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

/** Rendering sanity: diverging scales centre on zero, maps and charts are drawn, contours cross where expected. */
class RenderTest {

    @Test
    void divergingScaleIsWhiteAtZeroAndSymmetric() {
        ColorScale s = ColorScale.diverging(2e-6, "m s-1", "upward", "downward");
        assertEquals(Color.WHITE, s.color(0));
        assertEquals(0.5, s.fraction(0), 1e-12);
        assertEquals(1 - s.fraction(1e-6), s.fraction(-1e-6), 1e-12);
        assertTrue(s.ticks().contains(0.0), s.ticks().toString());
    }

    @Test
    void contourOfALinearFieldLiesOnTheLevelLine() {
        // f = lon: the contour f = -17.25 is the meridian lon = -17.25 (exact for linear interpolation)
        LonLatGrid g = LonLatGrid.covering(-20, -15, 30, 33, 0.5, 6.371e6);
        double[] v = new double[g.size()];
        for (int j = 0; j < g.ny(); j++) for (int i = 0; i < g.nx(); i++) v[g.index(i, j)] = g.lonDeg(i);
        List<double[]> segs = Contours.segments(new ScalarField(g, v, "x", "1", null), -17.25);
        assertEquals(g.ny() - 1, segs.size());
        for (double[] s : segs) { assertEquals(-17.25, s[0], 1e-12); assertEquals(-17.25, s[2], 1e-12); }
    }

    @Test
    void mapHasFieldColoursLandAndFrame() {
        LonLatGrid g = LonLatGrid.covering(-20, -15, 30, 33, 0.25, 6.371e6);
        boolean[] ocean = new boolean[g.size()];
        double[] v = new double[g.size()];
        for (int j = 0; j < g.ny(); j++) for (int i = 0; i < g.nx(); i++) {
            int k = g.index(i, j);
            ocean[k] = i < g.nx() - 4;
            v[k] = ocean[k] ? Math.sin(i / 3.0) * 1e-6 : Double.NaN;
        }
        LonLatGrid m = g.withOcean(ocean);
        ScalarField f = new ScalarField(m, v, "w", "m s-1", "test");
        BufferedImage img = new MapRenderer().render(MapRenderer.MapSpec.of(f, "test map")
                .scale(ColorScale.diverging(1e-6, "m s-1", "upward", "downward")));
        boolean land = false, blue = false, rust = false;
        for (int y = 0; y < img.getHeight(); y += 2) for (int x = 0; x < img.getWidth(); x += 2) {
            Color c = new Color(img.getRGB(x, y));
            if (c.equals(MapRenderer.LAND)) land = true;
            if (c.getBlue() > c.getRed() + 60) blue = true;
            if (c.getRed() > c.getBlue() + 60) rust = true;
        }
        assertTrue(land && blue && rust, "land " + land + ", positive " + blue + ", negative " + rust);
    }

    @Test
    void chartDrawsLinesShadeAndMarkers() {
        List<LocalDate> d = new ArrayList<>();
        double[] a = new double[365], ref = new double[365];
        for (int k = 0; k < 365; k++) {
            d.add(LocalDate.of(2021, 1, 1).plusDays(k));
            ref[k] = 100 * Math.sin(2 * Math.PI * k / 365);
            a[k] = ref[k] + 30 * Math.sin(k / 5.0);
        }
        byte[] png = new ChartRenderer().renderPng(new ChartRenderer.ChartSpec("index", "m3 s-1 per 100 m", d)
                .shade(new ChartRenderer.Shade(a, ref, ChartRenderer.UP, ChartRenderer.DOWN, "above", "below"))
                .line(new ChartRenderer.Line("daily", a, Color.DARK_GRAY, 1f))
                .line(new ChartRenderer.Line("climatology", ref, Color.BLACK, 2f))
                .marker(new ChartRenderer.Marker(LocalDate.of(2021, 4, 13), "spring transition", Color.RED)));
        assertTrue(png.length > 5000, "chart too small: " + png.length);
    }
}
