package org.gyreplan.app.desktop.map;

/**
 * A map projection from longitude/latitude (degrees) to plane coordinates in projected degrees
 * (equatorial degrees of arc, so both projections share the same scale along the equator).
 *
 * <pre>
 *   equirectangular:  x = λ,  y = φ
 *   Mercator:         x = λ,  y = (180/π) · ln tan(π/4 + φ/2)      (sphere; |φ| clamped to 85°)
 * </pre>
 * Source: Snyder (1987), <i>Map Projections — A Working Manual</i>, USGS Prof. Paper 1395, eqs. 7-1, 7-2 (Mercator)
 * and 12-1, 12-2 (equidistant cylindrical).
 */
public enum MapProjection {
    /** Plate carrée: x = longitude, y = latitude. */
    EQUIRECTANGULAR("Equirectangular") {
        @Override public double y(double latDeg) { return latDeg; }
        @Override public double lat(double y) { return y; }
    },
    /** Spherical Mercator (conformal), latitudes clamped to ±85°. */
    MERCATOR("Mercator") {
        @Override public double y(double latDeg) {
            double phi = Math.toRadians(Math.max(-MAX_MERCATOR_LAT, Math.min(MAX_MERCATOR_LAT, latDeg)));
            return Math.toDegrees(Math.log(Math.tan(Math.PI / 4 + phi / 2)));
        }
        @Override public double lat(double y) {
            return Math.toDegrees(2 * Math.atan(Math.exp(Math.toRadians(y))) - Math.PI / 2);
        }
    };

    /** Latitude limit of the Mercator plane, degrees. */
    public static final double MAX_MERCATOR_LAT = 85.0;

    private final String label;

    MapProjection(String label) { this.label = label; }

    /** Projected x of a longitude, projected degrees (identity for both cylindrical projections). */
    public double x(double lonDeg) { return lonDeg; }
    /** Longitude of a projected x, degrees east. */
    public double lon(double x) { return x; }
    /** Projected y of a latitude, projected degrees. */
    public abstract double y(double latDeg);
    /** Latitude of a projected y, degrees north. */
    public abstract double lat(double y);

    /**
     * Local scale of the projection relative to the equator in the north–south direction (1 for both at φ = 0):
     * equirectangular 1, Mercator sec φ. Used by the scale bar, which measures along a parallel: both projections
     * stretch a parallel by sec φ relative to its true length.
     */
    public double parallelStretch(double latDeg) { return 1.0 / Math.cos(Math.toRadians(latDeg)); }

    @Override public String toString() { return label; }
}
