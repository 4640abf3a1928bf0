package org.gyreplan.app.desktop.map;

import javafx.beans.property.BooleanProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.scene.canvas.GraphicsContext;

import java.util.List;

/**
 * One drawable layer of the map: a title shown in the layer panel, a visibility switch, a draw method and,
 * optionally, the values it holds at a point (for the inspector). Layers are drawn bottom to top in the
 * order of {@link MapCanvas#layers()}.
 */
public abstract class MapLayer {
    private final String title;
    private final BooleanProperty visible = new SimpleBooleanProperty(true);

    protected MapLayer(String title) { this.title = title; }

    public String title() { return title; }
    public BooleanProperty visibleProperty() { return visible; }
    public boolean isVisible() { return visible.get(); }
    public void setVisible(boolean v) { visible.set(v); }

    /** Draws the layer for the given time step (layers without time ignore it). */
    public abstract void draw(GraphicsContext g, MapViewport view, int timeStep);

    /** Values this layer holds at a point, for the inspector; empty if none. */
    public List<Probe> probe(double lonDeg, double latDeg, int timeStep) { return List.of(); }

    /** Number of time steps (1 for static layers). */
    public int timeSteps() { return 1; }

    /** Colour scale shown in the colour bar, or {@code null} if the layer has none. */
    public ColourScale colourScale() { return null; }

    /** Caption of the colour bar (quantity and unit), or {@code null}. */
    public String colourBarCaption() { return null; }

    @Override public String toString() { return title; }

    /** A value read at a point: quantity, value and unit. */
    public record Probe(String quantity, double value, String units, String note) {
        public Probe(String quantity, double value, String units) { this(quantity, value, units, null); }

        /** A textual entry (no number), e.g. "inside". */
        public static Probe note(String quantity, String note) { return new Probe(quantity, Double.NaN, "", note); }

        /** Human-readable value with 4 significant digits and the unit. */
        public String text() {
            if (note != null) return note;
            if (Double.isNaN(value)) return "—";
            boolean none = units == null || units.isEmpty() || units.equals("1");   // "1": dimensionless (UDUNITS)
            return Format.number(value) + (none ? "" : " " + units);
        }
    }
}
