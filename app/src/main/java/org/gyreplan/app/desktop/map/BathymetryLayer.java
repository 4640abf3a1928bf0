package org.gyreplan.app.desktop.map;

import javafx.scene.canvas.GraphicsContext;
import javafx.scene.paint.Color;
import javafx.scene.text.Font;
import org.gyreplan.solver.grid.ScalarField;

import java.util.ArrayList;
import java.util.List;

/**
 * Sea-floor depth (m, positive downward; NaN or ≤ 0 on land) as blue shading, light for the shelf and dark for
 * the deep sea, with isobaths at standard depths (200 m shelf break, then 1000 m steps), labelled.
 */
public class BathymetryLayer extends MapLayer {
    /** Isobaths drawn, m. */
    public static final double[] ISOBATHS_M = {200, 1000, 2000, 3000, 4000, 5000, 6000};

    private final ScalarField depth;
    private final ColourScale scale;
    private final GridRaster raster = new GridRaster();
    private final List<List<double[]>> contours = new ArrayList<>();

    /** @param depth sea-floor depth, m, positive downward */
    public BathymetryLayer(String title, ScalarField depth) {
        super(title);
        double[] v = depth.values().clone();
        for (int k = 0; k < v.length; k++) if (!(v[k] > 0)) v[k] = Double.NaN;
        this.depth = new ScalarField(depth.grid(), v, depth.name(), depth.units(), depth.longName());
        double max = this.depth.range()[1];
        this.scale = new ColourScale(ColourScale.Kind.DEPTH, 0, Double.isFinite(max) ? max : 5000, 1.0);
        for (double level : ISOBATHS_M) contours.add(MarchingSquares.segments(this.depth, level));
    }

    public ScalarField depth() { return depth; }

    @Override
    public void draw(GraphicsContext g, MapViewport view, int timeStep) {
        raster.draw(g, view, depth, scale);
        g.setStroke(Color.rgb(40, 70, 110, 0.55));
        g.setFill(Color.rgb(30, 55, 90, 0.8));
        g.setFont(Font.font(9));
        g.setLineWidth(0.7);
        for (int l = 0; l < ISOBATHS_M.length; l++) {
            g.beginPath();
            double[] labelAt = null;
            for (double[] s : contours.get(l)) {
                double x1 = view.screenX(s[0]), y1 = view.screenY(s[1]);
                g.moveTo(x1, y1);
                g.lineTo(view.screenX(s[2]), view.screenY(s[3]));
                if (labelAt == null && x1 > 30 && x1 < view.width() - 50 && y1 > 30 && y1 < view.height() - 50) {
                    labelAt = new double[] {x1, y1};
                }
            }
            g.stroke();
            if (labelAt != null) g.fillText((int) ISOBATHS_M[l] + " m", labelAt[0] + 2, labelAt[1] - 2);
        }
    }

    @Override
    public List<Probe> probe(double lonDeg, double latDeg, int timeStep) {
        return List.of(new Probe("Depth", GridRaster.cellValue(depth, lonDeg, latDeg), "m"));
    }
}
