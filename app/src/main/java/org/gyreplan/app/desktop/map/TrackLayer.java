package org.gyreplan.app.desktop.map;

import javafx.scene.canvas.GraphicsContext;
import javafx.scene.paint.Color;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Supplier;

/** Ship tracks: polylines in longitude/latitude, with a direction tick at the middle of each leg. */
public class TrackLayer extends MapLayer {
    private final Supplier<List<List<double[]>>> tracks;
    private final Color colour;

    /** @param tracks supplies the current legs (re-read at every draw, so edits show at once) */
    public TrackLayer(String title, Supplier<List<List<double[]>>> tracks, Color colour) {
        super(title);
        this.tracks = tracks;
        this.colour = colour;
    }

    public static TrackLayer empty(String title) { return new TrackLayer(title, ArrayList::new, Color.GRAY); }

    @Override
    public void draw(GraphicsContext g, MapViewport view, int timeStep) {
        g.setStroke(colour);
        g.setFill(colour);
        g.setLineWidth(1.6);
        for (List<double[]> leg : tracks.get()) {
            if (leg.size() < 2) continue;
            g.beginPath();
            for (int k = 0; k < leg.size(); k++) {
                double x = view.screenX(leg.get(k)[0]), y = view.screenY(leg.get(k)[1]);
                if (k == 0) g.moveTo(x, y); else g.lineTo(x, y);
            }
            g.stroke();
            // chevron at the middle of the leg showing the direction of travel
            int m = leg.size() / 2;
            double[] a = leg.get(Math.max(0, m - 1)), b = leg.get(m);
            if (leg.size() == 2) { a = leg.get(0); b = leg.get(1); }
            double x0 = view.screenX(a[0]), y0 = view.screenY(a[1]), x1 = view.screenX(b[0]), y1 = view.screenY(b[1]);
            double len = Math.hypot(x1 - x0, y1 - y0);
            if (len < 20) continue;
            double ux = (x1 - x0) / len, uy = (y1 - y0) / len;
            double cx = (x0 + x1) / 2, cy = (y0 + y1) / 2;
            g.fillPolygon(new double[] {cx + 5 * ux, cx - 4 * ux + 4 * uy, cx - 4 * ux - 4 * uy},
                    new double[] {cy + 5 * uy, cy - 4 * uy - 4 * ux, cy - 4 * uy + 4 * ux}, 3);
        }
    }
}
