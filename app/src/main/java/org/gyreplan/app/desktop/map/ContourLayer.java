package org.gyreplan.app.desktop.map;

import javafx.scene.canvas.GraphicsContext;
import javafx.scene.paint.Color;
import javafx.scene.text.Font;
import org.gyreplan.solver.grid.ScalarField;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleFunction;

/**
 * Contour lines of a field (e.g. streamfunction, depth) by {@link MarchingSquares}, at "nice" levels.
 * Negative levels are dashed, the zero line is drawn heavier. One frame per time step or a single frame.
 * Segments are computed once per frame and cached.
 */
public class ContourLayer extends MapLayer {
    private final List<ScalarField> frames;
    private final double[] levels;
    private final Color colour;
    private final List<List<List<double[]>>> cache = new ArrayList<>();
    private final DoubleFunction<String> labeller;

    public ContourLayer(String title, List<ScalarField> frames, double[] levels, Color colour, DoubleFunction<String> labeller) {
        super(title);
        if (frames.isEmpty()) throw new IllegalArgumentException("layer '" + title + "' has no field");
        this.frames = List.copyOf(frames);
        this.levels = levels.clone();
        this.colour = colour;
        this.labeller = labeller;
        for (int k = 0; k < frames.size(); k++) cache.add(null);
    }

    /** Contours at about {@code count} nice levels spanning all frames. */
    public static ContourLayer auto(String title, List<ScalarField> frames, int count, Color colour) {
        double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY;
        for (ScalarField f : frames) { double[] r = f.range(); lo = Math.min(lo, r[0]); hi = Math.max(hi, r[1]); }
        return new ContourLayer(title, frames, MarchingSquares.niceLevels(lo, hi, count), colour, Format::tick);
    }

    public double[] levels() { return levels.clone(); }
    @Override public int timeSteps() { return frames.size(); }

    /** Segments of every level for a time step: list per level of {lon1, lat1, lon2, lat2}. */
    public List<List<double[]>> segments(int timeStep) {
        int t = Math.max(0, Math.min(frames.size() - 1, timeStep));
        if (cache.get(t) == null) {
            List<List<double[]>> all = new ArrayList<>();
            for (double level : levels) all.add(MarchingSquares.segments(frames.get(t), level));
            cache.set(t, all);
        }
        return cache.get(t);
    }

    @Override
    public void draw(GraphicsContext g, MapViewport view, int timeStep) {
        List<List<double[]>> segs = segments(timeStep);
        g.setStroke(colour);
        g.setFont(Font.font(10));
        for (int l = 0; l < levels.length; l++) {
            double level = levels[l];
            g.setLineWidth(level == 0 ? 1.6 : 0.9);
            g.setLineDashes(level < 0 ? new double[] {5, 3} : null);
            g.beginPath();
            double[] labelAt = null;
            for (double[] s : segs.get(l)) {
                double x1 = view.screenX(s[0]), y1 = view.screenY(s[1]);
                double x2 = view.screenX(s[2]), y2 = view.screenY(s[3]);
                g.moveTo(x1, y1);
                g.lineTo(x2, y2);
                if (labelAt == null && x1 > 40 && x1 < view.width() - 60 && y1 > 20 && y1 < view.height() - 40) {
                    labelAt = new double[] {x1, y1};
                }
            }
            g.stroke();
            if (labelAt != null && labeller != null) {
                g.setFill(colour);
                g.fillText(labeller.apply(level), labelAt[0] + 2, labelAt[1] - 2);
            }
        }
        g.setLineDashes(null);
    }

    @Override
    public List<Probe> probe(double lonDeg, double latDeg, int timeStep) { return List.of(); }
}
