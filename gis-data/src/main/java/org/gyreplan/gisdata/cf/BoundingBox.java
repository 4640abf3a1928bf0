package org.gyreplan.gisdata.cf;

/**
 * A longitude–latitude box in degrees (WGS 84). Longitudes are continuous: a box across the antimeridian is
 * written {@code west = 170, east = 200} (or {@code east = -160}, which is read as 200). The box selects every
 * grid cell that overlaps it.
 *
 * @param westDeg  western edge, degrees east
 * @param eastDeg  eastern edge, degrees east (if ≤ west, 360° is added)
 * @param southDeg southern edge, degrees north (−90…90)
 * @param northDeg northern edge, degrees north (&gt; south)
 */
public record BoundingBox(double westDeg, double eastDeg, double southDeg, double northDeg) {
    public BoundingBox {
        if (!Double.isFinite(westDeg) || !Double.isFinite(eastDeg) || !Double.isFinite(southDeg) || !Double.isFinite(northDeg)) {
            throw new IllegalArgumentException("bounding box edges must be finite numbers");
        }
        if (eastDeg <= westDeg) eastDeg += 360;
        if (eastDeg - westDeg > 360 + 1e-9) {
            throw new IllegalArgumentException("bounding box spans more than 360° of longitude: " + westDeg + "…" + eastDeg);
        }
        if (southDeg < -90 || northDeg > 90 || northDeg <= southDeg) {
            throw new IllegalArgumentException("bounding box latitudes must satisfy −90 ≤ south < north ≤ 90, got "
                    + southDeg + "…" + northDeg);
        }
    }

    /** The whole globe, longitudes −180…180. */
    public static BoundingBox world() { return new BoundingBox(-180, 180, -90, 90); }

    /** Width in degrees of longitude. */
    public double widthDeg() { return eastDeg - westDeg; }
}
