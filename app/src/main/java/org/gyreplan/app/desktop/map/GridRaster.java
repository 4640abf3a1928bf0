package org.gyreplan.app.desktop.map;

import javafx.scene.canvas.GraphicsContext;
import javafx.scene.image.PixelFormat;
import javafx.scene.image.WritableImage;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;

/**
 * Paints a gridded field pixel by pixel: each screen pixel takes the colour of the grid cell it falls in
 * (nearest cell, no smoothing, so what is drawn is what the grid holds). Works for any cylindrical projection
 * because rows and columns are looked up independently. Keeps one buffer per instance.
 */
final class GridRaster {
    private WritableImage image;
    private int[] buffer = new int[0];

    void draw(GraphicsContext g, MapViewport view, ScalarField field, ColourScale scale) {
        int w = (int) Math.ceil(view.width()), h = (int) Math.ceil(view.height());
        if (w <= 0 || h <= 0) return;
        if (image == null || (int) image.getWidth() != w || (int) image.getHeight() != h) {
            image = new WritableImage(w, h);
            buffer = new int[w * h];
        }
        LonLatGrid grid = field.grid();
        double[] v = field.values();
        int[] col = new int[w];
        for (int x = 0; x < w; x++) {
            int i = (int) Math.floor(grid.columnOf(view.lonAt(x + 0.5)) + 0.5);
            col[x] = i >= 0 && i < grid.nx() ? i : -1;
        }
        for (int y = 0; y < h; y++) {
            int j = (int) Math.floor(grid.rowOf(view.latAt(y + 0.5)) + 0.5);
            int base = y * w;
            if (j < 0 || j >= grid.ny()) {
                java.util.Arrays.fill(buffer, base, base + w, 0);
                continue;
            }
            int rowStart = j * grid.nx();
            for (int x = 0; x < w; x++) {
                int i = col[x];
                buffer[base + x] = i < 0 ? 0 : scale.argb(v[rowStart + i]);
            }
        }
        image.getPixelWriter().setPixels(0, 0, w, h, PixelFormat.getIntArgbInstance(), buffer, 0, w);
        g.drawImage(image, 0, 0);
    }

    /** Value of the cell containing (lon, lat), NaN outside the grid. */
    static double cellValue(ScalarField f, double lonDeg, double latDeg) {
        int k = f.grid().cellAt(lonDeg, latDeg);
        return k < 0 ? Double.NaN : f.values()[k];
    }
}
