package org.gyreplan.app.desktop.map;

/**
 * A point on the map (index point, mooring site, survey station). Position is mutable so sites can be dragged.
 *
 * @param id     stable identifier (matches the scenario or result)
 */
public final class MapPoint {
    private final String id;
    private final String label;
    private double lonDeg, latDeg;
    private final double value;

    /**
     * @param value a value to colour the point by (unit given by the layer), or NaN for none
     */
    public MapPoint(String id, String label, double lonDeg, double latDeg, double value) {
        this.id = id;
        this.label = label;
        this.lonDeg = lonDeg;
        this.latDeg = latDeg;
        this.value = value;
    }

    public String id() { return id; }
    public String label() { return label; }
    public double lonDeg() { return lonDeg; }
    public double latDeg() { return latDeg; }
    public double value() { return value; }
    public void moveTo(double lon, double lat) { lonDeg = lon; latDeg = lat; }

    @Override public String toString() { return label + " (" + Format.lat(latDeg) + ", " + Format.lon(lonDeg) + ")"; }
}
