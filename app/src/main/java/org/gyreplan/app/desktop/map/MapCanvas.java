package org.gyreplan.app.desktop.map;

import javafx.beans.property.IntegerProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleIntegerProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.value.ChangeListener;
import javafx.collections.FXCollections;
import javafx.collections.ListChangeListener;
import javafx.collections.ObservableList;
import javafx.geometry.VPos;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.image.WritableImage;
import javafx.scene.input.KeyCode;
import javafx.scene.input.MouseButton;
import javafx.scene.input.MouseEvent;
import javafx.scene.input.ScrollEvent;
import javafx.scene.layout.Region;
import javafx.scene.paint.Color;
import javafx.scene.text.Font;
import javafx.scene.text.TextAlignment;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;

import java.util.ArrayList;
import java.util.List;
import java.util.function.BiConsumer;
import java.util.function.Consumer;

/**
 * The map: a resizable canvas drawing {@link MapLayer}s bottom to top, with graticule, scale bar and colour bar.
 * Drag pans, the scroll wheel zooms about the cursor, a click picks; in drawing mode clicks add vertices and a
 * double-click (or Enter) closes the polygon. Draggable point layers can have their points moved.
 */
public class MapCanvas extends Region {
    /** What a primary-button click does. */
    public enum Tool { NAVIGATE, DRAW_POLYGON }

    /** Mean Earth radius for the scale bar, km (common practice). */
    static final double EARTH_RADIUS_KM = 6371.0;
    private static final Color SEA = Color.rgb(246, 249, 252);

    private final Canvas canvas = new Canvas(800, 600);
    /** Transparent canvas on top for the polygon being drawn, so rubber-banding does not redraw the layers. */
    private final Canvas overlay = new Canvas(800, 600);
    private final MapViewport view = new MapViewport(MapProjection.EQUIRECTANGULAR);
    private final ObservableList<MapLayer> layers = FXCollections.observableArrayList();
    private final IntegerProperty timeStep = new SimpleIntegerProperty(0);
    private final ObjectProperty<Tool> tool = new SimpleObjectProperty<>(Tool.NAVIGATE);
    private final List<double[]> sketch = new ArrayList<>();
    private double[] sketchCursor;

    private Consumer<Polygon> onPolygonDrawn = p -> { };
    private BiConsumer<Double, Double> onHover = (a, b) -> { };
    private BiConsumer<Double, Double> onClick = (a, b) -> { };
    private Consumer<MapPoint> onPointClicked = p -> { };

    private double pressX, pressY, lastX, lastY;
    private boolean dragged;
    private MapPoint draggedPoint;
    private PointLayer draggedLayer;
    private long redraws;
    private boolean redrawPending;

    public MapCanvas() {
        getChildren().addAll(canvas, overlay);
        setFocusTraversable(true);
        setMinSize(200, 150);
        setPrefSize(900, 620);
        ChangeListener<Object> redraw = (o, a, b) -> redraw();
        timeStep.addListener(redraw);
        tool.addListener((o, a, b) -> { sketch.clear(); sketchCursor = null; redrawOverlay(); });
        layers.addListener((ListChangeListener<MapLayer>) c -> {
            while (c.next()) for (MapLayer l : c.getAddedSubList()) l.visibleProperty().addListener(redraw);
            redraw();
        });
        overlay.setOnMousePressed(this::pressed);
        overlay.setOnMouseDragged(this::dragged);
        overlay.setOnMouseReleased(this::released);
        overlay.setOnMouseMoved(this::moved);
        overlay.setOnScroll(this::scrolled);
        setOnKeyPressed(e -> {
            if (e.getCode() == KeyCode.ESCAPE) { sketch.clear(); sketchCursor = null; redrawOverlay(); }
            if (e.getCode() == KeyCode.ENTER) closeSketch();
        });
    }

    public MapViewport viewport() { return view; }
    public ObservableList<MapLayer> layers() { return layers; }
    public IntegerProperty timeStepProperty() { return timeStep; }
    public ObjectProperty<Tool> toolProperty() { return tool; }
    public Canvas canvas() { return canvas; }
    /** The top canvas, which receives the mouse. */
    public Canvas overlay() { return overlay; }
    /** Number of redraws so far (for tests). */
    public long redrawCount() { return redraws; }
    /** Vertices placed so far in drawing mode, {lon, lat}. */
    public List<double[]> sketch() { return List.copyOf(sketch); }

    public void setOnPolygonDrawn(Consumer<Polygon> c) { onPolygonDrawn = c; }
    public void setOnHover(BiConsumer<Double, Double> c) { onHover = c; }
    public void setOnMapClicked(BiConsumer<Double, Double> c) { onClick = c; }
    public void setOnPointClicked(Consumer<MapPoint> c) { onPointClicked = c; }

    public void setProjection(MapProjection p) { view.setProjection(p); redraw(); }

    /** Fits a lon/lat box into the view. */
    public void fit(double westDeg, double eastDeg, double southDeg, double northDeg) {
        view.setSize(getWidth() > 0 ? getWidth() : canvas.getWidth(), getHeight() > 0 ? getHeight() : canvas.getHeight());
        view.fit(westDeg, eastDeg, southDeg, northDeg, 0.06);
        redraw();
    }

    @Override
    protected void layoutChildren() {
        double w = snapSizeX(getWidth()), h = snapSizeY(getHeight());
        if (w != canvas.getWidth() || h != canvas.getHeight()) {
            // keep the geographic centre when resized
            double cLon = view.lonAt(view.width() / 2), cLat = view.latAt(view.height() / 2);
            canvas.setWidth(w);
            canvas.setHeight(h);
            overlay.setWidth(w);
            overlay.setHeight(h);
            view.setSize(w, h);
            double dx = view.screenX(cLon) - w / 2, dy = view.screenY(cLat) - h / 2;
            view.pan(-dx, -dy);
            redraw();
        }
    }

    /** The current map as an image (for PNG export and tests). */
    public WritableImage snapshot() {
        redraw();
        return snapshot(null, null);
    }

    /**
     * Asks for a redraw at the next opportunity; many requests within one pulse (mouse moves while dragging or
     * sketching) cost one redraw.
     */
    public void requestRedraw() {
        if (redrawPending) return;
        redrawPending = true;
        javafx.application.Platform.runLater(() -> {
            if (redrawPending) redraw();
        });
    }

    /** Redraws everything now (FX thread). */
    public void redraw() {
        redrawPending = false;
        redraws++;
        GraphicsContext g = canvas.getGraphicsContext2D();
        view.setSize(canvas.getWidth(), canvas.getHeight());
        g.setFill(SEA);
        g.fillRect(0, 0, canvas.getWidth(), canvas.getHeight());
        int t = timeStep.get();
        for (MapLayer l : layers) {
            if (!l.isVisible()) continue;
            g.save();
            try {
                l.draw(g, view, t);
            } finally {
                g.restore();
            }
        }
        drawGraticule(g);
        drawScaleBar(g);
        drawColourBar(g);
        redrawOverlay();
    }

    /** Redraws only the overlay (the polygon being drawn). */
    public void redrawOverlay() {
        GraphicsContext o = overlay.getGraphicsContext2D();
        o.clearRect(0, 0, overlay.getWidth(), overlay.getHeight());
        drawSketch(o);
    }

    // ---- mouse ----

    private void pressed(MouseEvent e) {
        requestFocus();
        pressX = lastX = e.getX();
        pressY = lastY = e.getY();
        dragged = false;
        draggedPoint = null;
        if (tool.get() == Tool.NAVIGATE && e.getButton() == MouseButton.PRIMARY) {
            for (int k = layers.size() - 1; k >= 0; k--) {
                if (layers.get(k) instanceof PointLayer pl && pl.isVisible() && pl.isDraggable()) {
                    MapPoint p = pl.hit(view, e.getX(), e.getY());
                    if (p != null) { draggedPoint = p; draggedLayer = pl; break; }
                }
            }
        }
    }

    private void dragged(MouseEvent e) {
        if (Math.hypot(e.getX() - pressX, e.getY() - pressY) > 3) dragged = true;
        if (!dragged) return;
        if (draggedPoint != null) {
            draggedPoint.moveTo(view.lonAt(e.getX()), view.latAt(e.getY()));
        } else {
            view.pan(e.getX() - lastX, e.getY() - lastY);
        }
        lastX = e.getX();
        lastY = e.getY();
        requestRedraw();
    }

    private void released(MouseEvent e) {
        if (draggedPoint != null && dragged) {
            draggedLayer.move(draggedPoint, view.lonAt(e.getX()), view.latAt(e.getY()));
            draggedPoint = null;
            redraw();
            return;
        }
        draggedPoint = null;
        if (dragged || e.getButton() != MouseButton.PRIMARY) return;
        double lon = view.lonAt(e.getX()), lat = view.latAt(e.getY());
        if (tool.get() == Tool.DRAW_POLYGON) {
            if (e.getClickCount() >= 2) {
                closeSketch();
            } else {
                sketch.add(new double[] {lon, lat});
                redrawOverlay();
            }
            return;
        }
        MapPoint hit = pick(e.getX(), e.getY());
        if (hit != null) onPointClicked.accept(hit);
        onClick.accept(lon, lat);
    }

    /** The topmost visible point under screen (sx, sy), or null. */
    public MapPoint pick(double sx, double sy) {
        for (int k = layers.size() - 1; k >= 0; k--) {
            if (layers.get(k) instanceof PointLayer pl && pl.isVisible()) {
                MapPoint p = pl.hit(view, sx, sy);
                if (p != null) return p;
            }
        }
        return null;
    }

    private void moved(MouseEvent e) {
        double lon = view.lonAt(e.getX()), lat = view.latAt(e.getY());
        if (tool.get() == Tool.DRAW_POLYGON && !sketch.isEmpty()) {
            sketchCursor = new double[] {lon, lat};
            redrawOverlay();
        }
        onHover.accept(lon, lat);
    }

    private void scrolled(ScrollEvent e) {
        if (e.getDeltaY() == 0) return;
        // one wheel notch (deltaY = multiplierY, typically 40 px) zooms by 20 %; trackpads give fractions of a notch
        double notches = e.getDeltaY() / (e.getMultiplierY() > 0 ? e.getMultiplierY() : 40);
        view.zoomAbout(Math.pow(1.2, notches), e.getX(), e.getY());
        requestRedraw();
        e.consume();
    }

    /** Closes the polygon being drawn (needs three distinct vertices) and hands it to the listener. */
    public void closeSketch() {
        List<double[]> pts = new ArrayList<>();
        for (double[] p : sketch) {
            if (pts.isEmpty() || Math.hypot(p[0] - pts.get(pts.size() - 1)[0], p[1] - pts.get(pts.size() - 1)[1]) > 1e-9) pts.add(p);
        }
        sketch.clear();
        sketchCursor = null;
        redrawOverlay();
        if (pts.size() < 3) return;
        Coordinate[] cs = new Coordinate[pts.size() + 1];
        for (int k = 0; k < pts.size(); k++) cs[k] = new Coordinate(pts.get(k)[0], pts.get(k)[1]);
        cs[pts.size()] = cs[0];
        onPolygonDrawn.accept(new GeometryFactory().createPolygon(cs));
    }

    // ---- decorations ----

    private void drawSketch(GraphicsContext g) {
        if (sketch.isEmpty()) return;
        g.setStroke(Color.rgb(200, 30, 120));
        g.setFill(Color.rgb(200, 30, 120, 0.12));
        g.setLineWidth(1.8);
        g.beginPath();
        for (int k = 0; k < sketch.size(); k++) {
            double x = view.screenX(sketch.get(k)[0]), y = view.screenY(sketch.get(k)[1]);
            if (k == 0) g.moveTo(x, y); else g.lineTo(x, y);
        }
        if (sketchCursor != null) g.lineTo(view.screenX(sketchCursor[0]), view.screenY(sketchCursor[1]));
        g.fill();
        g.stroke();
        g.setFill(Color.rgb(200, 30, 120));
        for (double[] p : sketch) g.fillRect(view.screenX(p[0]) - 3, view.screenY(p[1]) - 3, 6, 6);
    }

    /** Graticule spacing for the current view, degrees. */
    public double graticuleStep() {
        double[] lon = view.lonRange();
        double span = Math.max(1e-6, lon[1] - lon[0]);
        double[] steps = {0.05, 0.1, 0.25, 0.5, 1, 2, 5, 10, 15, 30, 45, 90};
        for (double s : steps) if (span / s <= 8) return s;
        return 90;
    }

    private void drawGraticule(GraphicsContext g) {
        double step = graticuleStep();
        double[] lon = view.lonRange(), lat = view.latRange();
        double w = canvas.getWidth(), h = canvas.getHeight();
        g.setStroke(Color.rgb(90, 100, 115, 0.35));
        g.setLineWidth(0.6);
        g.setFont(Font.font(10));
        g.setFill(Color.rgb(50, 60, 75));
        g.setTextBaseline(VPos.CENTER);
        for (double x = Math.ceil(lon[0] / step) * step; x <= lon[1]; x += step) {
            double sx = view.screenX(x);
            g.strokeLine(sx, 0, sx, h);
            g.setTextAlign(TextAlignment.CENTER);
            labelBox(g, Format.tickLon(x), sx, h - 9);
        }
        double south = Math.max(lat[0], -89.999), north = Math.min(lat[1], 89.999);
        for (double y = Math.ceil(south / step) * step; y <= north; y += step) {
            double sy = view.screenY(y);
            g.strokeLine(0, sy, w, sy);
            g.setTextAlign(TextAlignment.LEFT);
            labelBox(g, Format.tickLat(y), 3, sy);
        }
        g.setTextAlign(TextAlignment.LEFT);
        g.setTextBaseline(VPos.BASELINE);
    }

    private static void labelBox(GraphicsContext g, String text, double x, double y) {
        double tw = text.length() * 5.6 + 4;
        double left = g.getTextAlign() == TextAlignment.CENTER ? x - tw / 2 : x - 2;
        g.setFill(Color.rgb(255, 255, 255, 0.7));
        g.fillRect(left, y - 7, tw, 14);
        g.setFill(Color.rgb(50, 60, 75));
        g.fillText(text, x, y);
    }

    /** Length of the scale bar and its label: {px, km}. */
    public double[] scaleBar() {
        double midLat = view.latAt(canvas.getHeight() / 2);
        double kmPerDegLon = Math.PI * EARTH_RADIUS_KM / 180 * Math.cos(Math.toRadians(midLat));
        double kmPerPx = kmPerDegLon / view.scale();
        double km = MarchingSquares.niceStep(kmPerPx * 120);
        if (km / kmPerPx > 160) km /= 2;
        return new double[] {km / kmPerPx, km};
    }

    private void drawScaleBar(GraphicsContext g) {
        double[] sb = scaleBar();
        double x = 46, y = canvas.getHeight() - 34;
        g.setFill(Color.rgb(255, 255, 255, 0.85));
        g.fillRoundRect(x - 6, y - 18, sb[0] + 52, 28, 6, 6);
        g.setFill(Color.rgb(30, 30, 30));
        g.fillRect(x, y, sb[0] / 2, 4);
        g.setStroke(Color.rgb(30, 30, 30));
        g.setLineWidth(1);
        g.strokeRect(x, y, sb[0], 4);
        g.setFont(Font.font(11));
        g.fillText(Format.tick(sb[1]) + " km", x + sb[0] + 4, y + 5);
        g.fillText("at " + Format.tickLat(Math.round(view.latAt(canvas.getHeight() / 2) * 10) / 10.0), x, y - 5);
    }

    /** Visible layers with a colour scale, topmost first (at most two get a colour bar). */
    public List<MapLayer> colourBarLayers() {
        List<MapLayer> out = new ArrayList<>();
        for (int k = layers.size() - 1; k >= 0 && out.size() < 2; k--) {
            MapLayer l = layers.get(k);
            if (l.isVisible() && l.colourScale() != null) out.add(l);
        }
        return out;
    }

    private void drawColourBar(GraphicsContext g) {
        double y = 30;
        for (MapLayer l : colourBarLayers()) {
            drawColourBar(g, l, y);
            y += 64;
        }
    }

    private void drawColourBar(GraphicsContext g, MapLayer l, double y) {
        ColourScale s = l.colourScale();
        double w = 240, h = 12, x = canvas.getWidth() - w - 24;
        g.setFill(Color.rgb(255, 255, 255, 0.88));
        g.fillRoundRect(x - 10, y - 24, w + 20, 58, 6, 6);
        for (int k = 0; k < w; k++) {
            g.setFill(s.color(s.min() + (s.max() - s.min()) * (k + 0.5) / w));
            g.fillRect(x + k, y, 1.2, h);
        }
        g.setStroke(Color.rgb(40, 40, 40));
        g.setLineWidth(0.8);
        g.strokeRect(x, y, w, h);
        g.setFill(Color.rgb(25, 25, 25));
        g.setFont(Font.font(11));
        String cap = l.colourBarCaption();
        if (cap != null && cap.length() > 44) cap = cap.substring(0, 43) + "…";
        if (cap != null) g.fillText(cap, x, y - 7);
        g.setFont(Font.font(10));
        g.setTextAlign(TextAlignment.CENTER);
        double[] ticks = MarchingSquares.niceLevels(s.min(), s.max(), 4);
        for (double t : ticks) {
            double tx = x + (t - s.min()) / (s.max() - s.min()) * w;
            g.strokeLine(tx, y + h, tx, y + h + 3);
            g.fillText(Format.tick(t), tx, y + h + 14);
        }
        g.setTextAlign(TextAlignment.LEFT);
    }
}
