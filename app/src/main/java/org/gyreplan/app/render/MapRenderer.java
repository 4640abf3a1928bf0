package org.gyreplan.app.render;

import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;

import javax.imageio.ImageIO;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.Polygon;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.geom.AffineTransform;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Draws maps of the study with Java2D (headless): a scalar field with its colour bar, land, bathymetry shading,
 * stress or transport arrows, contours, zones, points and tracks, a graticule, a scale bar and a legend.
 *
 * <p>Projection: equirectangular with the east–west scale multiplied by cos(φ_mid), so shapes near the middle
 * latitude of the map are not stretched; it is for display only, not for measuring.
 */
public final class MapRenderer {

    /** Width of the plot area in pixels (the image is wider: margins, colour bar, legend). */
    private final int plotWidth;

    public MapRenderer() { this(760); }

    public MapRenderer(int plotWidth) { this.plotWidth = plotWidth; }

    /** What to draw. Build with {@link #of} and the {@code with…} methods. */
    public static final class MapSpec {
        ScalarField field;
        String title;
        String subtitle;
        ColorScale scale;
        ScalarField shading;          // bathymetry (m, negative below sea level) drawn under a transparent field
        VectorField arrows;
        String arrowUnits;
        double arrowReference;
        ScalarField contours;
        double[] contourLevels;
        String contourLabel;
        final List<List<double[]>> land = new ArrayList<>();
        final List<List<double[]>> coast = new ArrayList<>();
        final List<Overlay> overlays = new ArrayList<>();
        LonLatGrid extent;

        public static MapSpec of(ScalarField field, String title) {
            MapSpec m = new MapSpec();
            m.field = field;
            m.title = title;
            m.extent = field.grid();
            m.scale = ColorScale.auto(field);
            return m;
        }

        public MapSpec subtitle(String s) { this.subtitle = s; return this; }
        public MapSpec scale(ColorScale s) { this.scale = s; return this; }
        public MapSpec shading(ScalarField elevation) { this.shading = elevation; return this; }
        /** Arrows of a vector field; {@code reference} is the magnitude of the legend arrow, in {@code units}. */
        public MapSpec arrows(VectorField v, double reference, String units) {
            this.arrows = v; this.arrowReference = reference; this.arrowUnits = units; return this;
        }
        public MapSpec contours(ScalarField f, double[] levels, String label) {
            this.contours = f; this.contourLevels = levels; this.contourLabel = label; return this;
        }
        /** A land polygon ring as [lonDeg, latDeg] points (from the base map). */
        public MapSpec land(List<double[]> ring) { this.land.add(ring); return this; }
        /** A coastline ring (e.g. of the basin polygon) drawn as a line instead of the mask's cell edges. */
        public MapSpec coastline(List<double[]> ring) { this.coast.add(ring); return this; }
        public MapSpec overlay(Overlay o) { this.overlays.add(o); return this; }
    }

    /** Points, lines or areas drawn over the field, with a legend entry. */
    public record Overlay(Kind kind, String legend, Color color, List<double[]> points, List<String> labels) {
        public enum Kind { POINTS, MOORINGS, PORT, TRACK, AREA, OUTLINE }
    }

    /** Renders to PNG bytes. */
    public byte[] renderPng(MapSpec m) {
        BufferedImage img = render(m);
        ByteArrayOutputStream bos = new ByteArrayOutputStream();
        try {
            ImageIO.write(img, "png", bos);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return bos.toByteArray();
    }

    static final Color LAND = new Color(0xD8, 0xD0, 0xBE);
    static final Color LAND_EDGE = new Color(0x6B, 0x5E, 0x48);
    static final Color GRID = new Color(0, 0, 0, 60);
    static final Color INK = new Color(0x22, 0x22, 0x22);
    static final Color NO_DATA = new Color(0xEE, 0xEE, 0xEE);

    /** Renders to an image. */
    public BufferedImage render(MapSpec m) {
        LonLatGrid g = m.extent;
        double west = g.westDeg(), east = g.eastDeg(), south = g.southDeg(), north = g.northDeg();
        double midLat = 0.5 * (south + north);
        double aspect = (north - south) / ((east - west) * Math.cos(Math.toRadians(midLat)));
        int pw = plotWidth;
        int ph = (int) Math.round(pw * aspect);
        ph = Math.max(200, Math.min(ph, 1100));
        int left = 62, top = m.subtitle == null ? 46 : 64, right = 200, bottom = 74;
        int W = left + pw + right, H = top + ph + bottom;
        BufferedImage img = new BufferedImage(W, H, BufferedImage.TYPE_INT_RGB);
        Graphics2D gr = img.createGraphics();
        gr.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        gr.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        gr.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
        gr.setColor(Color.WHITE);
        gr.fillRect(0, 0, W, H);

        final int plotH = ph;
        Proj p = new Proj(west, east, south, north, left, top, pw, plotH);

        // field cells (land and missing drawn as land colour; the basin mask decides), clipped to the coastline
        gr.setColor(LAND);
        gr.fillRect(left, top, pw, ph);
        Path2D basin = null;
        if (!m.coast.isEmpty()) {
            basin = new Path2D.Double(Path2D.WIND_EVEN_ODD);
            for (List<double[]> ring : m.coast) basin.append(p.path(ring, true), false);
            gr.setClip(basin);
        }
        ScalarField f = m.field;
        LonLatGrid fg = f.grid();
        for (int j = 0; j < fg.ny(); j++) {
            for (int i = 0; i < fg.nx(); i++) {
                double v = f.values()[fg.index(i, j)];
                Color c;
                if (!fg.isOcean(i, j)) c = LAND;
                else if (!Double.isFinite(v)) c = NO_DATA;
                else c = m.scale.color(v);
                if (m.shading != null && fg.isOcean(i, j)) {
                    double e = m.shading.interpolate(fg.lonDeg(i), fg.latDeg(j));
                    c = shade(c, e);
                }
                gr.setColor(c);
                int x0 = (int) Math.floor(p.x(fg.lonDeg(i) - fg.dLonDeg() / 2));
                int x1 = (int) Math.ceil(p.x(fg.lonDeg(i) + fg.dLonDeg() / 2));
                int y0 = (int) Math.floor(p.y(fg.latDeg(j) + fg.dLatDeg() / 2));
                int y1 = (int) Math.ceil(p.y(fg.latDeg(j) - fg.dLatDeg() / 2));
                gr.fillRect(x0, y0, Math.max(1, x1 - x0), Math.max(1, y1 - y0));
            }
        }
        gr.setClip(null);
        gr.setClip(left, top, pw, plotH);
        // base-map land
        for (List<double[]> ring : m.land) {
            Path2D path = p.path(ring, true);
            gr.setColor(LAND);
            gr.fill(path);
            gr.setColor(LAND_EDGE);
            gr.setStroke(new BasicStroke(0.8f));
            gr.draw(path);
        }
        // coastline: the given rings, or else the edges between ocean and land cells of the mask
        gr.setColor(LAND_EDGE);
        gr.setStroke(new BasicStroke(1.3f));
        for (List<double[]> ring : m.coast) gr.draw(p.path(ring, true));
        for (int j = 0; m.coast.isEmpty() && j < fg.ny(); j++) {
            for (int i = 0; i < fg.nx(); i++) {
                if (!fg.isOcean(i, j)) continue;
                double lw = fg.lonDeg(i) - fg.dLonDeg() / 2, le = lw + fg.dLonDeg();
                double ls = fg.latDeg(j) - fg.dLatDeg() / 2, ln = ls + fg.dLatDeg();
                if (i > 0 && !fg.isOcean(i - 1, j)) gr.draw(new Line2D.Double(p.x(lw), p.y(ls), p.x(lw), p.y(ln)));
                if (i < fg.nx() - 1 && !fg.isOcean(i + 1, j)) gr.draw(new Line2D.Double(p.x(le), p.y(ls), p.x(le), p.y(ln)));
                if (j > 0 && !fg.isOcean(i, j - 1)) gr.draw(new Line2D.Double(p.x(lw), p.y(ls), p.x(le), p.y(ls)));
                if (j < fg.ny() - 1 && !fg.isOcean(i, j + 1)) gr.draw(new Line2D.Double(p.x(lw), p.y(ln), p.x(le), p.y(ln)));
            }
        }
        // contours and arrows stay inside the coastline
        if (basin != null) gr.setClip(basin);
        if (m.contours != null && m.contourLevels != null) {
            for (double level : m.contourLevels) {
                boolean negative = level < 0;
                gr.setColor(level == 0 ? new Color(0, 0, 0, 150) : new Color(0x1A, 0x1A, 0x1A, 200));
                float[] dash = negative ? new float[] {5f, 4f} : null;
                gr.setStroke(new BasicStroke(level == 0 ? 1.6f : 1.1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 4f, dash, 0f));
                for (double[] seg : Contours.segments(m.contours, level)) {
                    gr.draw(new Line2D.Double(p.x(seg[0]), p.y(seg[1]), p.x(seg[2]), p.y(seg[3])));
                }
            }
        }
        // arrows
        double arrowPx = 0;
        if (m.arrows != null && m.arrowReference > 0) {
            arrowPx = 34;
            drawArrows(gr, p, m.arrows, m.arrowReference, arrowPx);
        }
        // overlays (may lie on the coast or on land: port, exclusion zones)
        gr.setClip(left, top, pw, plotH);
        for (Overlay o : m.overlays) drawOverlay(gr, p, o);
        gr.setClip(null);

        // graticule and frame
        drawGraticule(gr, p);
        gr.setColor(INK);
        gr.setStroke(new BasicStroke(1f));
        gr.drawRect(left, top, pw, plotH);

        // title
        gr.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 16));
        gr.drawString(m.title, left, 26);
        if (m.subtitle != null) {
            gr.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 12));
            gr.setColor(new Color(0x55, 0x55, 0x55));
            gr.drawString(m.subtitle, left, 46);
        }
        // colour bar
        drawColorBar(gr, m.scale, left + pw + 22, top, 18, Math.min(plotH, 360));
        // legend below the bar
        int ly = top + Math.min(plotH, 360) + 48;
        ly = drawLegend(gr, m, left + pw + 14, ly, arrowPx);
        // scale bar
        drawScaleBar(gr, p, left + 8, top + plotH + 48, midLat);
        gr.dispose();
        return img;
    }

    // ------------------------------------------------------------------------------------------- pieces

    private static Color shade(Color c, double elevation) {
        if (!Double.isFinite(elevation)) return c;
        double depth = -elevation;
        // lighten shallow water: shelf (< 200 m) noticeably, slope gradually
        double k = depth < 0 ? 0 : depth < 200 ? 0.45 : depth < 1000 ? 0.45 * (1000 - depth) / 800 : 0;
        return mix(c, Color.WHITE, k * 0.6);
    }

    static Color mix(Color a, Color b, double t) {
        return new Color((int) Math.round(a.getRed() + (b.getRed() - a.getRed()) * t),
                (int) Math.round(a.getGreen() + (b.getGreen() - a.getGreen()) * t),
                (int) Math.round(a.getBlue() + (b.getBlue() - a.getBlue()) * t));
    }

    private static void drawArrows(Graphics2D gr, Proj p, VectorField v, double ref, double refPx) {
        LonLatGrid g = v.grid();
        double cellPx = Math.abs(p.x(g.lonDeg(0) + g.dLonDeg()) - p.x(g.lonDeg(0)));
        int step = Math.max(1, (int) Math.ceil(26 / Math.max(cellPx, 1e-9)));
        gr.setColor(new Color(0x10, 0x10, 0x10, 220));
        gr.setStroke(new BasicStroke(1.1f));
        for (int j = step / 2; j < g.ny(); j += step) {
            for (int i = step / 2; i < g.nx(); i += step) {
                int k = g.index(i, j);
                double u = v.eastward().values()[k], w = v.northward().values()[k];
                if (!Double.isFinite(u) || !Double.isFinite(w)) continue;
                double len = Math.hypot(u, w) / ref * refPx;
                if (len < 1.5) continue;
                len = Math.min(len, 2.2 * refPx);
                double ang = Math.atan2(-w, u);
                arrow(gr, p.x(g.lonDeg(i)), p.y(g.latDeg(j)), len, ang);
            }
        }
    }

    static void arrow(Graphics2D gr, double x, double y, double len, double ang) {
        double x2 = x + len * Math.cos(ang), y2 = y + len * Math.sin(ang);
        double x1 = x - 0.5 * len * Math.cos(ang), y1 = y - 0.5 * len * Math.sin(ang);
        x2 -= 0.5 * len * Math.cos(ang);
        y2 -= 0.5 * len * Math.sin(ang);
        gr.draw(new Line2D.Double(x1, y1, x2, y2));
        double h = Math.min(6, 0.35 * len + 2);
        Path2D head = new Path2D.Double();
        head.moveTo(x2, y2);
        head.lineTo(x2 - h * Math.cos(ang - 0.4), y2 - h * Math.sin(ang - 0.4));
        head.lineTo(x2 - h * Math.cos(ang + 0.4), y2 - h * Math.sin(ang + 0.4));
        head.closePath();
        gr.fill(head);
    }

    private static void drawOverlay(Graphics2D gr, Proj p, Overlay o) {
        gr.setColor(o.color());
        switch (o.kind()) {
            case AREA, OUTLINE -> {
                Path2D path = p.path(o.points(), true);
                if (o.kind() == Overlay.Kind.AREA) {
                    gr.setColor(new Color(o.color().getRed(), o.color().getGreen(), o.color().getBlue(), 70));
                    gr.fill(path);
                }
                gr.setColor(o.color());
                gr.setStroke(new BasicStroke(1.8f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND, 4f,
                        o.kind() == Overlay.Kind.AREA ? new float[] {6f, 3f} : null, 0f));
                gr.draw(path);
            }
            case TRACK -> {
                gr.setStroke(new BasicStroke(1.8f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
                gr.draw(p.path(o.points(), false));
                for (double[] pt : o.points()) gr.fillOval((int) p.x(pt[0]) - 2, (int) p.y(pt[1]) - 2, 5, 5);
            }
            case POINTS, MOORINGS, PORT -> {
                gr.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 11));
                for (int k = 0; k < o.points().size(); k++) {
                    double[] pt = o.points().get(k);
                    double x = p.x(pt[0]), y = p.y(pt[1]);
                    Shape s = marker(o.kind(), x, y);
                    gr.setColor(Color.WHITE);
                    gr.setStroke(new BasicStroke(3f));
                    gr.draw(s);
                    gr.setColor(o.color());
                    gr.fill(s);
                    gr.setColor(INK);
                    gr.setStroke(new BasicStroke(1f));
                    gr.draw(s);
                    if (o.labels() != null && k < o.labels().size() && o.labels().get(k) != null) {
                        String lab = o.labels().get(k);
                        int w = gr.getFontMetrics().stringWidth(lab);
                        java.awt.Rectangle clip = gr.getClipBounds();
                        boolean left = clip != null && x + 8 + w > clip.getMaxX() - 2;
                        haloText(gr, lab, (float) (left ? x - 8 - w : x + 8), (float) y + 4);
                    }
                }
            }
        }
    }

    static Shape marker(Overlay.Kind kind, double x, double y) {
        return switch (kind) {
            case MOORINGS -> new Polygon(new int[] {(int) x, (int) x + 7, (int) x - 7}, new int[] {(int) y - 8, (int) y + 5, (int) y + 5}, 3);
            case PORT -> new java.awt.geom.Rectangle2D.Double(x - 5, y - 5, 10, 10);
            default -> new java.awt.geom.Ellipse2D.Double(x - 4, y - 4, 8, 8);
        };
    }

    static void haloText(Graphics2D gr, String s, float x, float y) {
        Color c = gr.getColor();
        gr.setColor(new Color(255, 255, 255, 220));
        for (int dx = -1; dx <= 1; dx++) for (int dy = -1; dy <= 1; dy++) gr.drawString(s, x + dx, y + dy);
        gr.setColor(INK);
        gr.drawString(s, x, y);
        gr.setColor(c);
    }

    private static void drawGraticule(Graphics2D gr, Proj p) {
        double span = Math.max(p.east - p.west, p.north - p.south);
        double step = span > 60 ? 10 : span > 24 ? 5 : span > 10 ? 2 : span > 4 ? 1 : 0.5;
        gr.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        FontMetrics fm = gr.getFontMetrics();
        gr.setStroke(new BasicStroke(0.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 4f, new float[] {2f, 3f}, 0f));
        for (double lon = Math.ceil(p.west / step) * step; lon <= p.east + 1e-9; lon += step) {
            int x = (int) Math.round(p.x(lon));
            gr.setColor(GRID);
            gr.drawLine(x, p.top, x, p.top + p.h);
            gr.setColor(INK);
            String s = lonLabel(lon);
            gr.drawString(s, x - fm.stringWidth(s) / 2, p.top + p.h + 15);
        }
        for (double lat = Math.ceil(p.south / step) * step; lat <= p.north + 1e-9; lat += step) {
            int y = (int) Math.round(p.y(lat));
            gr.setColor(GRID);
            gr.drawLine(p.left, y, p.left + p.w, y);
            gr.setColor(INK);
            String s = latLabel(lat);
            gr.drawString(s, p.left - 6 - fm.stringWidth(s), y + 4);
        }
    }

    static String lonLabel(double lon) {
        double l = ((lon + 540) % 360) - 180;
        String n = trim(Math.abs(l));
        return l == 0 || Math.abs(l) == 180 ? n + "°" : n + "°" + (l < 0 ? "W" : "E");
    }

    static String latLabel(double lat) {
        String n = trim(Math.abs(lat));
        return lat == 0 ? "0°" : n + "°" + (lat < 0 ? "S" : "N");
    }

    private static String trim(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : String.format(Locale.ROOT, "%.1f", v);
    }

    private static void drawColorBar(Graphics2D gr, ColorScale s, int x, int y, int w, int h) {
        for (int k = 0; k < h; k++) {
            double t = 1.0 - (double) k / (h - 1);
            gr.setColor(s.colorAt(t));
            gr.fillRect(x, y + k, w, 1);
        }
        gr.setColor(INK);
        gr.setStroke(new BasicStroke(1f));
        gr.drawRect(x, y, w, h);
        gr.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        for (double tick : s.ticks()) {
            double t = s.fraction(tick);
            int yy = (int) Math.round(y + (1 - t) * (h - 1));
            gr.drawLine(x + w, yy, x + w + 4, yy);
            gr.drawString(s.format(tick), x + w + 7, yy + 4);
        }
        gr.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        AffineTransform old = gr.getTransform();
        gr.drawString(s.units(), x - 4, y + h + 16);
        if (s.highLabel() != null) {
            gr.setFont(new Font(Font.SANS_SERIF, Font.ITALIC, 10));
            gr.drawString(s.highLabel(), x - 4, y - 6);
            gr.drawString(s.lowLabel(), x - 4, y + h + 30);
        }
        gr.setTransform(old);
    }

    private static int drawLegend(Graphics2D gr, MapSpec m, int x, int y, double arrowPx) {
        gr.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        if (m.arrows != null && arrowPx > 0) {
            gr.setColor(INK);
            gr.setStroke(new BasicStroke(1.1f));
            arrow(gr, x + 6 + arrowPx / 2, y - 4, arrowPx, 0);
            gr.drawString(trimNum(m.arrowReference) + " " + m.arrowUnits, x + 6, y + 12);
            y += 30;
        }
        if (m.contours != null) {
            gr.setColor(INK);
            gr.setStroke(new BasicStroke(1.1f));
            gr.drawLine(x + 4, y - 4, x + 26, y - 4);
            gr.drawString(m.contourLabel, x + 32, y);
            y += 18;
        }
        for (Overlay o : m.overlays) {
            if (o.legend() == null) continue;
            gr.setColor(o.color());
            switch (o.kind()) {
                case TRACK -> { gr.setStroke(new BasicStroke(1.8f)); gr.drawLine(x + 4, y - 4, x + 26, y - 4); }
                case AREA, OUTLINE -> {
                    gr.setColor(new Color(o.color().getRed(), o.color().getGreen(), o.color().getBlue(), 90));
                    gr.fillRect(x + 6, y - 10, 18, 12);
                    gr.setColor(o.color());
                    gr.drawRect(x + 6, y - 10, 18, 12);
                }
                default -> { Shape s = marker(o.kind(), x + 15, y - 4); gr.fill(s); gr.setColor(INK); gr.draw(s); }
            }
            gr.setColor(INK);
            gr.drawString(o.legend(), x + 32, y);
            y += 18;
        }
        gr.setColor(LAND);
        gr.fillRect(x + 6, y - 10, 18, 12);
        gr.setColor(LAND_EDGE);
        gr.drawRect(x + 6, y - 10, 18, 12);
        gr.setColor(INK);
        gr.drawString("land / outside basin", x + 32, y);
        return y + 18;
    }

    static String trimNum(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e6) return Long.toString((long) v);
        return String.format(Locale.ROOT, "%.3g", v);
    }

    private static void drawScaleBar(Graphics2D gr, Proj p, int x, int y, double midLat) {
        double kmPerDegLon = 2 * Math.PI * 6371.0 / 360.0 * Math.cos(Math.toRadians(midLat));
        double pxPerKm = p.w / ((p.east - p.west) * kmPerDegLon);
        double target = 160 / pxPerKm;
        double[] nice = {10, 20, 25, 50, 100, 200, 250, 500, 1000, 2000};
        double km = nice[0];
        for (double n : nice) if (n <= target) km = n;
        int len = (int) Math.round(km * pxPerKm);
        gr.setColor(INK);
        gr.setStroke(new BasicStroke(1f));
        gr.fillRect(x, y, len / 2, 5);
        gr.drawRect(x, y, len, 5);
        gr.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        gr.drawString("0", x - 3, y + 18);
        gr.drawString(trimNum(km) + " km (at " + latLabel(Math.round(midLat * 10) / 10.0) + ")", x + len - 10, y + 18);
    }

    /** Equirectangular projection with cos(φ_mid) aspect, to pixel coordinates. */
    static final class Proj {
        final double west, east, south, north;
        final int left, top, w, h;

        Proj(double west, double east, double south, double north, int left, int top, int w, int h) {
            this.west = west; this.east = east; this.south = south; this.north = north;
            this.left = left; this.top = top; this.w = w; this.h = h;
        }

        double x(double lon) { return left + (lon - west) / (east - west) * w; }
        double y(double lat) { return top + (north - lat) / (north - south) * h; }

        Path2D path(List<double[]> pts, boolean close) {
            Path2D path = new Path2D.Double();
            for (int k = 0; k < pts.size(); k++) {
                double[] pt = pts.get(k);
                if (k == 0) path.moveTo(x(pt[0]), y(pt[1]));
                else path.lineTo(x(pt[0]), y(pt[1]));
            }
            if (close) path.closePath();
            return path;
        }
    }
}
