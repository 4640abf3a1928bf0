package org.gyreplan.app.desktop.map;

import javafx.scene.canvas.GraphicsContext;
import javafx.scene.paint.Color;
import javafx.scene.text.Font;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.function.Consumer;

/**
 * Point features: index points coloured by value, mooring sites, survey stations (optionally joined in order as
 * a route). Points of a draggable layer can be moved with the mouse; listeners hear about every move.
 */
public class PointLayer extends MapLayer {
    /** Marker shapes. */
    public enum Marker { CIRCLE, SQUARE, TRIANGLE, DIAMOND }

    /** Hit radius for picking and dragging, px. */
    public static final double HIT_PX = 9;

    private final List<MapPoint> points = new ArrayList<>();
    private final Marker marker;
    private final Color colour;
    private final ColourScale scale;
    private final String valueName, valueUnits;
    private final boolean route, draggable, labels;
    private final List<Consumer<MapPoint>> moveListeners = new ArrayList<>();

    /**
     * @param scale     colour scale for point values, or null for the plain colour
     * @param valueName quantity of the point value (inspector, colour bar), or null
     * @param route     join the points in order with a line
     */
    public PointLayer(String title, List<MapPoint> points, Marker marker, Color colour, ColourScale scale,
                      String valueName, String valueUnits, boolean route, boolean draggable, boolean labels) {
        super(title);
        this.points.addAll(points);
        this.marker = marker;
        this.colour = colour;
        this.scale = scale;
        this.valueName = valueName;
        this.valueUnits = valueUnits;
        this.route = route;
        this.draggable = draggable;
        this.labels = labels;
    }

    public List<MapPoint> points() { return Collections.unmodifiableList(points); }
    public boolean isDraggable() { return draggable; }
    public void addMoveListener(Consumer<MapPoint> l) { moveListeners.add(l); }

    /** Moves a point and tells the listeners. */
    public void move(MapPoint p, double lonDeg, double latDeg) {
        p.moveTo(lonDeg, latDeg);
        for (Consumer<MapPoint> l : moveListeners) l.accept(p);
    }

    @Override public ColourScale colourScale() { return scale; }
    @Override public String colourBarCaption() {
        return scale == null ? null : valueName + (valueUnits == null || valueUnits.isEmpty() ? "" : " (" + valueUnits + ")");
    }

    /** The point nearest to screen (sx, sy) within {@link #HIT_PX}, or null. */
    public MapPoint hit(MapViewport view, double sx, double sy) {
        MapPoint best = null;
        double bestD = HIT_PX;
        for (MapPoint p : points) {
            double d = Math.hypot(view.screenX(p.lonDeg()) - sx, view.screenY(p.latDeg()) - sy);
            if (d <= bestD) { bestD = d; best = p; }
        }
        return best;
    }

    @Override
    public void draw(GraphicsContext g, MapViewport view, int timeStep) {
        if (route && points.size() > 1) {
            g.setStroke(colour);
            g.setLineWidth(1.4);
            g.setLineDashes(6, 4);
            g.beginPath();
            for (int k = 0; k < points.size(); k++) {
                MapPoint p = points.get(k);
                double x = view.screenX(p.lonDeg()), y = view.screenY(p.latDeg());
                if (k == 0) g.moveTo(x, y); else g.lineTo(x, y);
            }
            g.stroke();
            g.setLineDashes(null);
        }
        g.setFont(Font.font(11));
        for (MapPoint p : points) {
            double x = view.screenX(p.lonDeg()), y = view.screenY(p.latDeg());
            if (x < -20 || y < -20 || x > view.width() + 20 || y > view.height() + 20) continue;
            double val = p.value(timeStep);
            Color c = scale != null && Double.isFinite(val) ? scale.color(val) : colour;
            g.setFill(c);
            g.setStroke(Color.rgb(20, 20, 20));
            g.setLineWidth(1);
            double r = 5.5;
            switch (marker) {
                case CIRCLE -> { g.fillOval(x - r, y - r, 2 * r, 2 * r); g.strokeOval(x - r, y - r, 2 * r, 2 * r); }
                case SQUARE -> { g.fillRect(x - r, y - r, 2 * r, 2 * r); g.strokeRect(x - r, y - r, 2 * r, 2 * r); }
                case TRIANGLE -> {
                    double[] xs = {x, x + r * 1.1, x - r * 1.1}, ys = {y - r * 1.2, y + r * 0.8, y + r * 0.8};
                    g.fillPolygon(xs, ys, 3); g.strokePolygon(xs, ys, 3);
                }
                case DIAMOND -> {
                    double[] xs = {x, x + r * 1.2, x, x - r * 1.2}, ys = {y - r * 1.2, y, y + r * 1.2, y};
                    g.fillPolygon(xs, ys, 4); g.strokePolygon(xs, ys, 4);
                }
            }
            if (labels && p.label() != null) {
                g.setFill(Color.rgb(255, 255, 255, 0.75));
                double tw = p.label().length() * 6.2;
                g.fillRect(x + 7, y - 16, tw + 4, 14);
                g.setFill(Color.rgb(25, 25, 25));
                g.fillText(p.label(), x + 9, y - 5);
            }
        }
    }

    @Override
    public int timeSteps() {
        int n = 1;
        for (MapPoint p : points) n = Math.max(n, p.steps());
        return n;
    }

    @Override
    public List<Probe> probe(double lonDeg, double latDeg, int timeStep) { return List.of(); }
}
