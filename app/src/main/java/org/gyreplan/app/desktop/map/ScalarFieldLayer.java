package org.gyreplan.app.desktop.map;

import javafx.scene.canvas.GraphicsContext;
import org.gyreplan.solver.grid.ScalarField;

import java.util.List;

/**
 * A gridded scalar (stress curl, Ekman pumping, persistence, streamfunction, …) painted with a colour scale.
 * One frame per time step, or a single frame for a time-independent field. Signed fields use a diverging scale
 * centred on zero; the user may set the range.
 */
public class ScalarFieldLayer extends MapLayer {
    private final List<ScalarField> frames;
    private final ColourScale scale;
    private final GridRaster raster = new GridRaster();
    private final String caption;

    /**
     * @param title   name in the layer panel
     * @param frames  one field per time step (or one field), all on the same grid
     * @param signed  whether values are signed (diverging scale centred on zero)
     * @param opacity 0…1
     */
    public ScalarFieldLayer(String title, List<ScalarField> frames, boolean signed, double opacity) {
        super(title);
        if (frames.isEmpty()) throw new IllegalArgumentException("layer '" + title + "' has no field");
        this.frames = List.copyOf(frames);
        double[] r = robustRange(this.frames);
        this.scale = new ColourScale(signed ? ColourScale.Kind.DIVERGING : ColourScale.Kind.SEQUENTIAL, r[0], r[1], opacity);
        ScalarField f = frames.get(0);
        this.caption = title + " (" + f.units() + ")";
    }

    public ScalarField frame(int timeStep) { return frames.get(Math.max(0, Math.min(frames.size() - 1, timeStep))); }

    @Override public int timeSteps() { return frames.size(); }
    @Override public ColourScale colourScale() { return scale; }
    @Override public String colourBarCaption() { return caption; }

    @Override
    public void draw(GraphicsContext g, MapViewport view, int timeStep) {
        raster.draw(g, view, frame(timeStep), scale);
    }

    @Override
    public List<Probe> probe(double lonDeg, double latDeg, int timeStep) {
        ScalarField f = frame(timeStep);
        return List.of(new Probe(title(), GridRaster.cellValue(f, lonDeg, latDeg), f.units()));
    }

    /** Resets the colour range to the 2nd–98th percentile of all frames (robust to a few extreme cells). */
    public void autoRange() {
        double[] r = robustRange(frames);
        scale.setRange(r[0], r[1]);
    }

    static double[] robustRange(List<ScalarField> frames) {
        int n = 0;
        for (ScalarField f : frames) for (double v : f.values()) if (Double.isFinite(v)) n++;
        if (n == 0) return new double[] {-1, 1};
        double[] all = new double[n];
        int k = 0;
        for (ScalarField f : frames) for (double v : f.values()) if (Double.isFinite(v)) all[k++] = v;
        java.util.Arrays.sort(all);
        double lo = all[(int) Math.floor(0.02 * (n - 1))], hi = all[(int) Math.ceil(0.98 * (n - 1))];
        if (lo == hi) { lo = all[0]; hi = all[n - 1]; }
        return new double[] {lo, hi};
    }
}
