package org.gyreplan.app.desktop.map;

import javafx.scene.canvas.GraphicsContext;
import javafx.scene.paint.Color;
import javafx.scene.text.Font;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.VectorField;

import java.util.ArrayList;
import java.util.List;

/**
 * Arrows of a vector field (wind, surface stress, Ekman transport), pointing "toward". Arrows are thinned with
 * zoom so that neighbours stay at least {@link #MIN_SPACING_PX} apart: every n-th cell in each direction, n
 * chosen from the on-screen cell size, anchored to the grid so the pattern does not shimmer while panning.
 * Arrow length is proportional to magnitude; a key arrow shows the reference magnitude.
 */
public class VectorLayer extends MapLayer {
    /** Smallest distance between drawn arrows, px. */
    public static final double MIN_SPACING_PX = 30;

    private final List<VectorField> frames;
    private final double reference;
    private final Color colour;
    private final String quantity;
    private int lastStride = 1;

    public VectorLayer(String title, String quantity, List<VectorField> frames, Color colour) {
        super(title);
        if (frames.isEmpty()) throw new IllegalArgumentException("layer '" + title + "' has no field");
        this.frames = List.copyOf(frames);
        this.colour = colour;
        this.quantity = quantity;
        this.reference = referenceMagnitude(this.frames);
    }

    public VectorField frame(int t) { return frames.get(Math.max(0, Math.min(frames.size() - 1, t))); }
    /** Magnitude drawn as an arrow of one arrow-spacing length, in the field's unit. */
    public double referenceMagnitude() { return reference; }
    /** Cell stride used by the last draw (1 = every cell). */
    public int lastStride() { return lastStride; }
    @Override public int timeSteps() { return frames.size(); }

    /** Stride so that arrows are at least {@link #MIN_SPACING_PX} apart for the given view. */
    public static int stride(LonLatGrid grid, MapViewport view) {
        double midLat = (view.latRange()[0] + view.latRange()[1]) / 2;
        double cellW = Math.abs(view.screenX(grid.dLonDeg()) - view.screenX(0));
        double cellH = Math.abs(view.screenY(midLat + grid.dLatDeg() / 2) - view.screenY(midLat - grid.dLatDeg() / 2));
        double cell = Math.max(1e-6, Math.min(cellW, cellH));
        return Math.max(1, (int) Math.ceil(MIN_SPACING_PX / cell));
    }

    @Override
    public void draw(GraphicsContext g, MapViewport view, int timeStep) {
        VectorField f = frame(timeStep);
        LonLatGrid grid = f.grid();
        int n = stride(grid, view);
        lastStride = n;
        double len = 0.9 * Math.min(n * cellPx(grid, view), 45);
        double[] u = f.eastward().values(), v = f.northward().values();
        g.setStroke(colour);
        g.setFill(colour);
        g.setLineWidth(1.1);
        for (int j = 0; j < grid.ny(); j += n) {
            double y = view.screenY(grid.latDeg(j));
            if (y < -len || y > view.height() + len) continue;
            for (int i = 0; i < grid.nx(); i += n) {
                int k = grid.index(i, j);
                if (!Double.isFinite(u[k]) || !Double.isFinite(v[k])) continue;
                double x = view.screenX(grid.lonDeg(i));
                if (x < -len || x > view.width() + len) continue;
                arrow(g, x, y, u[k] / reference * len, -v[k] / reference * len);
            }
        }
        // key
        double kx = view.width() - len - 70, ky = view.height() - 52;
        g.setFill(Color.rgb(255, 255, 255, 0.85));
        g.fillRoundRect(kx - 8, ky - 16, len + 74, 26, 6, 6);
        g.setFill(colour);
        arrow(g, kx, ky, len, 0);
        g.setFont(Font.font(11));
        g.fillText(Format.tick(reference) + " " + f.units(), kx + len + 6, ky + 4);
    }

    private static double cellPx(LonLatGrid grid, MapViewport view) {
        return Math.abs(view.screenX(grid.dLonDeg()) - view.screenX(0));
    }

    private static void arrow(GraphicsContext g, double x, double y, double dx, double dy) {
        double l = Math.hypot(dx, dy);
        if (l < 0.5) { g.fillOval(x - 1, y - 1, 2, 2); return; }
        // the arrow is centred on the cell centre
        double x0 = x - dx / 2, y0 = y - dy / 2, x1 = x + dx / 2, y1 = y + dy / 2;
        g.strokeLine(x0, y0, x1, y1);
        double h = Math.min(6, 0.35 * l), ux = dx / l, uy = dy / l;
        g.fillPolygon(new double[] {x1, x1 - h * ux + 0.5 * h * uy, x1 - h * ux - 0.5 * h * uy},
                new double[] {y1, y1 - h * uy - 0.5 * h * ux, y1 - h * uy + 0.5 * h * ux}, 3);
    }

    @Override
    public List<Probe> probe(double lonDeg, double latDeg, int timeStep) {
        VectorField f = frame(timeStep);
        double u = GridRaster.cellValue(f.eastward(), lonDeg, latDeg);
        double v = GridRaster.cellValue(f.northward(), lonDeg, latDeg);
        List<Probe> out = new ArrayList<>();
        out.add(new Probe(quantity + ", eastward", u, f.units()));
        out.add(new Probe(quantity + ", northward", v, f.units()));
        out.add(new Probe(quantity + ", magnitude", Math.hypot(u, v), f.units()));
        return out;
    }

    /** A nice number near the 90th percentile of magnitudes over all frames. */
    static double referenceMagnitude(List<VectorField> frames) {
        List<Double> m = new ArrayList<>();
        for (VectorField f : frames) {
            for (int k = 0; k < f.grid().size(); k++) {
                double x = f.magnitude(k);
                if (Double.isFinite(x) && x > 0) m.add(x);
            }
        }
        if (m.isEmpty()) return 1;
        m.sort(null);
        double p90 = m.get((int) Math.floor(0.9 * (m.size() - 1)));
        return MarchingSquares.niceStep(p90);
    }
}
