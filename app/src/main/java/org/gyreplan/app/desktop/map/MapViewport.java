package org.gyreplan.app.desktop.map;

/**
 * The mapping between screen pixels and geographic coordinates for a {@link MapProjection}: a centre in
 * projected degrees and a scale in pixels per projected degree. Mutable, used on the FX thread only.
 * Screen y grows downward, projected y northward.
 */
public final class MapViewport {
    /** Smallest and largest scale, pixels per projected degree. */
    public static final double MIN_SCALE = 0.5, MAX_SCALE = 20000;

    private MapProjection projection;
    private double centreX, centreY;   // projected degrees
    private double scale = 4;          // px per projected degree
    private double width = 800, height = 600;

    public MapViewport(MapProjection projection) { this.projection = projection; }

    public MapProjection projection() { return projection; }

    /** Changes the projection, keeping the geographic centre. */
    public void setProjection(MapProjection p) {
        double lon = projection.lon(centreX), lat = projection.lat(centreY);
        projection = p;
        centreX = p.x(lon);
        centreY = p.y(lat);
    }

    public void setSize(double w, double h) { width = Math.max(1, w); height = Math.max(1, h); }
    public double width() { return width; }
    public double height() { return height; }
    /** Pixels per projected degree. */
    public double scale() { return scale; }

    /** Screen x of a longitude, px. */
    public double screenX(double lonDeg) { return width / 2 + (projection.x(lonDeg) - centreX) * scale; }
    /** Screen y of a latitude, px. */
    public double screenY(double latDeg) { return height / 2 - (projection.y(latDeg) - centreY) * scale; }
    /** Longitude under a screen x, degrees east. */
    public double lonAt(double sx) { return projection.lon(centreX + (sx - width / 2) / scale); }
    /** Latitude under a screen y, degrees north. */
    public double latAt(double sy) { return projection.lat(centreY - (sy - height / 2) / scale); }

    /** Moves the map by a screen displacement (what the cursor did while dragging), px. */
    public void pan(double dxPx, double dyPx) {
        centreX -= dxPx / scale;
        centreY += dyPx / scale;
        clampCentre();
    }

    /** Multiplies the scale by {@code factor}, keeping the point under screen (sx, sy) fixed. */
    public void zoomAbout(double factor, double sx, double sy) {
        double px = centreX + (sx - width / 2) / scale;
        double py = centreY - (sy - height / 2) / scale;
        double s = Math.max(MIN_SCALE, Math.min(MAX_SCALE, scale * factor));
        centreX = px - (sx - width / 2) / s;
        centreY = py + (sy - height / 2) / s;
        scale = s;
        clampCentre();
    }

    /** Fits the box [west, east] × [south, north] (degrees) into the view with a margin fraction on each side. */
    public void fit(double westDeg, double eastDeg, double southDeg, double northDeg, double margin) {
        double x0 = projection.x(westDeg), x1 = projection.x(eastDeg);
        double y0 = projection.y(southDeg), y1 = projection.y(northDeg);
        centreX = (x0 + x1) / 2;
        centreY = (y0 + y1) / 2;
        double sx = width * (1 - 2 * margin) / Math.max(1e-9, x1 - x0);
        double sy = height * (1 - 2 * margin) / Math.max(1e-9, y1 - y0);
        scale = Math.max(MIN_SCALE, Math.min(MAX_SCALE, Math.min(sx, sy)));
    }

    /** Visible longitude range {west, east}, degrees (continuous). */
    public double[] lonRange() { return new double[] {lonAt(0), lonAt(width)}; }
    /** Visible latitude range {south, north}, degrees. */
    public double[] latRange() {
        return new double[] {Math.max(-90, latAt(height)), Math.min(90, latAt(0))};
    }

    private void clampCentre() {
        double yMax = projection.y(MapProjection.MAX_MERCATOR_LAT + 4.99);
        centreY = Math.max(-yMax, Math.min(yMax, centreY));
        if (centreX > 540) centreX -= 360;
        if (centreX < -540) centreX += 360;
    }
}
