package org.gyreplan.app.desktop.map;

import javafx.scene.canvas.GraphicsContext;
import javafx.scene.paint.Color;
import javafx.scene.shape.FillRule;
import javafx.scene.text.Font;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * Polygons in longitude/latitude (land, basin outline, upwelling zones, exclusion zones), with a fill, a stroke
 * and an optional label. Holes are honoured (even–odd fill). A polygon is also drawn shifted by ±360° when the
 * view shows longitudes beyond ±180°, so base-map land lines up with basins that cross the antimeridian.
 */
public class PolygonLayer extends MapLayer {
    /** A drawn polygon with an optional label. */
    public record Item(Geometry geometry, String label) { }

    private final List<Item> items = new ArrayList<>();
    private final Color fill, stroke;
    private final double lineWidth;
    private final double[] dashes;
    private final String kind;

    /**
     * @param kind inspector wording for a point inside a polygon (e.g. "Exclusion zone"), or null for none
     */
    public PolygonLayer(String title, String kind, Color fill, Color stroke, double lineWidth, double[] dashes) {
        super(title);
        this.kind = kind;
        this.fill = fill;
        this.stroke = stroke;
        this.lineWidth = lineWidth;
        this.dashes = dashes;
    }

    public List<Item> items() { return Collections.unmodifiableList(items); }
    public void add(Geometry g, String label) { items.add(new Item(g, label)); }
    public void clear() { items.clear(); }
    public void setAll(List<Item> newItems) { items.clear(); items.addAll(newItems); }

    @Override
    public void draw(GraphicsContext g, MapViewport view, int timeStep) {
        double[] lon = view.lonRange(), lat = view.latRange();
        g.setFillRule(FillRule.EVEN_ODD);
        g.setLineWidth(lineWidth);
        g.setLineDashes(dashes);
        for (Item it : items) {
            Envelope e = it.geometry().getEnvelopeInternal();
            if (e.getMaxY() < lat[0] || e.getMinY() > lat[1]) continue;
            for (int shift = -360; shift <= 360; shift += 360) {
                if (e.getMaxX() + shift < lon[0] || e.getMinX() + shift > lon[1]) continue;
                g.beginPath();
                path(g, view, it.geometry(), shift);
                if (fill != null) { g.setFill(fill); g.fill(); }
                if (stroke != null) { g.setStroke(stroke); g.stroke(); }
                if (it.label() != null && !it.label().isEmpty()) {
                    Coordinate c = it.geometry().getInteriorPoint().getCoordinate();
                    g.setFill(stroke != null ? stroke.darker() : Color.BLACK);
                    g.setFont(Font.font(11));
                    g.fillText(it.label(), view.screenX(c.x + shift) + 3, view.screenY(c.y));
                }
            }
        }
        g.setLineDashes(null);
        g.setFillRule(FillRule.NON_ZERO);
    }

    private static void path(GraphicsContext g, MapViewport view, Geometry geom, double shift) {
        for (int n = 0; n < geom.getNumGeometries(); n++) {
            Geometry part = geom.getGeometryN(n);
            if (part instanceof Polygon p) {
                ring(g, view, p.getExteriorRing(), shift);
                for (int h = 0; h < p.getNumInteriorRing(); h++) ring(g, view, p.getInteriorRingN(h), shift);
            } else if (part instanceof LineString ls) {
                ring(g, view, ls, shift);
            }
        }
    }

    private static void ring(GraphicsContext g, MapViewport view, LineString ring, double shift) {
        Coordinate[] cs = ring.getCoordinates();
        if (cs.length == 0) return;
        g.moveTo(view.screenX(cs[0].x + shift), view.screenY(cs[0].y));
        for (int k = 1; k < cs.length; k++) g.lineTo(view.screenX(cs[k].x + shift), view.screenY(cs[k].y));
        if (ring.isClosed()) g.closePath();
    }

    @Override
    public List<Probe> probe(double lonDeg, double latDeg, int timeStep) {
        if (kind == null) return List.of();
        org.locationtech.jts.geom.Point pt = new org.locationtech.jts.geom.GeometryFactory()
                .createPoint(new Coordinate(lonDeg, latDeg));
        for (Item it : items) {
            for (int shift = -360; shift <= 360; shift += 360) {
                org.locationtech.jts.geom.Point q = shift == 0 ? pt : pt.getFactory()
                        .createPoint(new Coordinate(lonDeg - shift, latDeg));
                if (it.geometry().covers(q)) {
                    return List.of(Probe.note(kind, it.label() == null || it.label().isEmpty() ? "inside" : it.label()));
                }
            }
        }
        return List.of();
    }
}
