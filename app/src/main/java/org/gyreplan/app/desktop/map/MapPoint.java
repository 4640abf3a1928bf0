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
    private double[] stepValues;

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
    /** Value at a time step (the per-step values if set, else the single value). */
    public double value(int step) {
        return stepValues == null || stepValues.length == 0 ? value : stepValues[Math.max(0, Math.min(stepValues.length - 1, step))];
    }
    /** Sets one value per time step (e.g. a monthly mean of the point's series), or null. */
    public void setStepValues(double[] v) { stepValues = v == null ? null : v.clone(); }
    public int steps() { return stepValues == null ? 1 : stepValues.length; }
    public void moveTo(double lon, double lat) { lonDeg = lon; latDeg = lat; }

    @Override public String toString() { return label + " (" + Format.lat(latDeg) + ", " + Format.lon(lonDeg) + ")"; }
}
