package org.gyreplan.app.render;

import javax.imageio.ImageIO;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.time.LocalDate;
import java.time.format.TextStyle;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Time-series charts with Java2D: lines over a date axis, the area between a series and its reference (e.g. the
 * climatology) shaded by sign of the anomaly, a zero line, and labelled date markers (e.g. season dates).
 * Display only: the values are computed elsewhere.
 */
public final class ChartRenderer {

    public record Line(String name, double[] values, Color color, float width) {}

    /** Shade between {@code values} and {@code reference}: positive anomalies in one colour, negative in another. */
    public record Shade(double[] values, double[] reference, Color positive, Color negative, String positiveName, String negativeName) {}

    public record Marker(LocalDate date, String label, Color color) {}

    public static final class ChartSpec {
        final String title;
        final String yLabel;
        final List<LocalDate> dates;
        final List<Line> lines = new ArrayList<>();
        final List<Marker> markers = new ArrayList<>();
        Shade shade;
        String note;
        boolean breakYearly;

        public ChartSpec(String title, String yLabel, List<LocalDate> dates) {
            this.title = title;
            this.yLabel = yLabel;
            this.dates = List.copyOf(dates);
        }

        public ChartSpec line(Line l) {
            if (l.values().length != dates.size()) throw new IllegalArgumentException("line '" + l.name() + "' length " + l.values().length + " ≠ " + dates.size() + " dates");
            lines.add(l);
            return this;
        }
        public ChartSpec shade(Shade s) { this.shade = s; return this; }
        public ChartSpec marker(Marker m) { markers.add(m); return this; }
        public ChartSpec note(String n) { this.note = n; return this; }
        /** Lift the pen at each 1 January (for quantities that restart every year, e.g. cumulative sums). */
        public ChartSpec breakYearly() { this.breakYearly = true; return this; }
    }

    static final Color UP = new Color(0x23, 0x83, 0xA8);
    static final Color DOWN = new Color(0xC2, 0x5B, 0x21);

    private final int width, height;

    public ChartRenderer() { this(1000, 360); }
    public ChartRenderer(int width, int height) { this.width = width; this.height = height; }

    public byte[] renderPng(ChartSpec c) {
        ByteArrayOutputStream bos = new ByteArrayOutputStream();
        try {
            ImageIO.write(render(c), "png", bos);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return bos.toByteArray();
    }

    public BufferedImage render(ChartSpec c) {
        BufferedImage img = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setColor(Color.WHITE);
        g.fillRect(0, 0, width, height);
        int left = 78, right = 24, top = 44, bottom = 62;
        int pw = width - left - right, ph = height - top - bottom;
        int n = c.dates.size();

        double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY;
        for (Line l : c.lines) for (double v : l.values()) if (Double.isFinite(v)) { lo = Math.min(lo, v); hi = Math.max(hi, v); }
        if (c.shade != null) {
            for (double v : c.shade.values()) if (Double.isFinite(v)) { lo = Math.min(lo, v); hi = Math.max(hi, v); }
        }
        if (!(lo <= hi)) { lo = -1; hi = 1; }
        if (lo > 0) lo = 0;
        if (hi < 0) hi = 0;
        double pad = 0.05 * (hi - lo + 1e-12);
        lo -= pad;
        hi += pad;
        final double ylo = lo, yhi = hi;
        java.util.function.DoubleUnaryOperator X = k -> left + (n <= 1 ? 0 : k / (n - 1) * pw);
        java.util.function.DoubleUnaryOperator Y = v -> top + (yhi - v) / (yhi - ylo) * ph;

        // y ticks
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        FontMetrics fm = g.getFontMetrics();
        ColorScale ticks = ColorScale.sequential(lo, hi, "");
        for (double t : ticks.ticks()) {
            int y = (int) Math.round(Y.applyAsDouble(t));
            g.setColor(new Color(0, 0, 0, 30));
            g.drawLine(left, y, left + pw, y);
            g.setColor(MapRenderer.INK);
            String s = ticks.format(t);
            g.drawString(s, left - 6 - fm.stringWidth(s), y + 4);
        }
        // x ticks: months (or years for long series)
        boolean yearly = n > 3 * 366;
        for (int k = 0; k < n; k++) {
            LocalDate d = c.dates.get(k);
            boolean tick = yearly ? d.getDayOfYear() == 1 : d.getDayOfMonth() == 1;
            if (!tick) continue;
            int x = (int) Math.round(X.applyAsDouble(k));
            g.setColor(new Color(0, 0, 0, d.getDayOfYear() == 1 ? 70 : 25));
            g.drawLine(x, top, x, top + ph);
            g.setColor(MapRenderer.INK);
            String s = yearly ? Integer.toString(d.getYear())
                    : d.getMonth().getDisplayName(TextStyle.SHORT, Locale.ENGLISH).substring(0, 1)
                    + (d.getMonthValue() == 1 ? " " + d.getYear() : "");
            g.drawString(s, x + 2, top + ph + 15);
        }
        // shade
        if (c.shade != null) {
            for (int k = 0; k + 1 < n; k++) {
                double a = c.shade.values()[k], b = c.shade.values()[k + 1];
                double ra = c.shade.reference()[k], rb = c.shade.reference()[k + 1];
                if (!(Double.isFinite(a) && Double.isFinite(b) && Double.isFinite(ra) && Double.isFinite(rb))) continue;
                Path2D p = new Path2D.Double();
                p.moveTo(X.applyAsDouble(k), Y.applyAsDouble(a));
                p.lineTo(X.applyAsDouble(k + 1), Y.applyAsDouble(b));
                p.lineTo(X.applyAsDouble(k + 1), Y.applyAsDouble(rb));
                p.lineTo(X.applyAsDouble(k), Y.applyAsDouble(ra));
                p.closePath();
                Color col = (a + b) >= (ra + rb) ? c.shade.positive() : c.shade.negative();
                g.setColor(new Color(col.getRed(), col.getGreen(), col.getBlue(), 120));
                g.fill(p);
            }
        }
        // zero line
        if (lo < 0 && hi > 0) {
            g.setColor(new Color(0x33, 0x33, 0x33));
            g.setStroke(new BasicStroke(1f));
            int y0 = (int) Math.round(Y.applyAsDouble(0));
            g.drawLine(left, y0, left + pw, y0);
        }
        // lines
        for (Line l : c.lines) {
            g.setColor(l.color());
            g.setStroke(new BasicStroke(l.width(), BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
            Path2D p = new Path2D.Double();
            boolean pen = false;
            for (int k = 0; k < n; k++) {
                double v = l.values()[k];
                if (!Double.isFinite(v)) { pen = false; continue; }
                if (c.breakYearly && k > 0 && c.dates.get(k).getYear() != c.dates.get(k - 1).getYear()) pen = false;
                if (!pen) p.moveTo(X.applyAsDouble(k), Y.applyAsDouble(v));
                else p.lineTo(X.applyAsDouble(k), Y.applyAsDouble(v));
                pen = true;
            }
            g.draw(p);
        }
        // markers
        g.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 11));
        int stagger = 0;
        for (Marker m : c.markers) {
            int k = c.dates.indexOf(m.date());
            if (k < 0) continue;
            double x = X.applyAsDouble(k);
            g.setColor(m.color());
            g.setStroke(new BasicStroke(1.4f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 4f, new float[] {4f, 3f}, 0f));
            g.draw(new Line2D.Double(x, top, x, top + ph));
            int lw = g.getFontMetrics().stringWidth(m.label());
            float lx0 = x + 3 + lw > left + pw ? (float) (x - 3 - lw) : (float) x + 3;
            g.drawString(m.label(), lx0, top + 12 + 13 * (stagger++ % 2));
        }
        // frame, title, labels, legend
        g.setStroke(new BasicStroke(1f));
        g.setColor(MapRenderer.INK);
        g.drawRect(left, top, pw, ph);
        g.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 15));
        g.drawString(c.title, left, 24);
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 12));
        java.awt.geom.AffineTransform old = g.getTransform();
        g.rotate(-Math.PI / 2);
        g.drawString(c.yLabel, -(top + ph / 2 + g.getFontMetrics().stringWidth(c.yLabel) / 2), 16);
        g.setTransform(old);
        int lx = left;
        int ly = top + ph + 38;
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        for (Line l : c.lines) {
            g.setColor(l.color());
            g.setStroke(new BasicStroke(Math.max(2f, l.width())));
            g.drawLine(lx, ly - 4, lx + 22, ly - 4);
            g.setColor(MapRenderer.INK);
            g.drawString(l.name(), lx + 28, ly);
            lx += 40 + g.getFontMetrics().stringWidth(l.name());
        }
        if (c.shade != null) {
            for (int s = 0; s < 2; s++) {
                Color col = s == 0 ? c.shade.positive() : c.shade.negative();
                g.setColor(new Color(col.getRed(), col.getGreen(), col.getBlue(), 120));
                g.fillRect(lx, ly - 10, 18, 10);
                g.setColor(MapRenderer.INK);
                String name = s == 0 ? c.shade.positiveName() : c.shade.negativeName();
                g.drawString(name, lx + 24, ly);
                lx += 36 + g.getFontMetrics().stringWidth(name);
            }
        }
        if (c.note != null) {
            g.setColor(new Color(0x55, 0x55, 0x55));
            g.drawString(c.note, left, height - 6);
        }
        g.dispose();
        return img;
    }
}
