package org.gyreplan.solver.coast;

import org.gyreplan.solver.DegreeTrig;

import java.util.Objects;

/**
 * A point on the coast where a coastal index is evaluated.
 *
 * @param name               label of the point (user name or generated, e.g. {@code "km 250.0"})
 * @param lonDeg             longitude of the point on the coast, degrees east (continuous with the coastline)
 * @param latDeg             latitude, degrees north
 * @param alongCoastKm       distance along the coastline from its first vertex, km ({@code NaN} for a free point
 *                           not tied to a {@link Coastline})
 * @param coastBearingDeg    bearing of the coastline, degrees clockwise from north, in the direction that keeps
 *                           the ocean on the right, in [0, 360)
 * @param offshoreBearingDeg bearing of the offshore unit normal (from the coast into the ocean), degrees clockwise
 *                           from north, in [0, 360); equals coastBearingDeg + 90° unless both were set by the user
 * @param snapDistanceKm     distance from the position the user gave to this point on the coast, km (0 for
 *                           points generated along the coast)
 * @param smoothingLengthKm  length of coast over which the orientation was smoothed, km ({@code NaN} when the
 *                           orientation is user-given)
 * @param orientation        whether the bearings are smoothed from the coastline or user-given
 */
public record CoastPoint(String name, double lonDeg, double latDeg, double alongCoastKm,
                         double coastBearingDeg, double offshoreBearingDeg, double snapDistanceKm,
                         double smoothingLengthKm, OrientationSource orientation) {

    public CoastPoint {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(orientation, "orientation");
        if (!Double.isFinite(lonDeg) || !Double.isFinite(latDeg) || Math.abs(latDeg) > 90) {
            throw new IllegalArgumentException("coast point '" + name + "': position must be finite with |lat| ≤ 90°, got ("
                    + lonDeg + ", " + latDeg + ")");
        }
        if (!Double.isFinite(coastBearingDeg) || !Double.isFinite(offshoreBearingDeg)) {
            throw new IllegalArgumentException("coast point '" + name + "': bearings must be finite, got coast "
                    + coastBearingDeg + "°, offshore " + offshoreBearingDeg + "°");
        }
        coastBearingDeg = normalize360(coastBearingDeg);
        offshoreBearingDeg = normalize360(offshoreBearingDeg);
    }

    /**
     * A free user point with a given offshore bearing (no coastline needed), e.g. a station of a published index.
     *
     * @param offshoreBearingDeg direction from the coast into the ocean, degrees clockwise from north
     */
    public static CoastPoint of(String name, double lonDeg, double latDeg, double offshoreBearingDeg) {
        return new CoastPoint(name, lonDeg, latDeg, Double.NaN, offshoreBearingDeg - 90.0, offshoreBearingDeg,
                0.0, Double.NaN, OrientationSource.USER);
    }

    /** The same point with a user-given coast bearing (ocean on the right); the offshore bearing becomes coast + 90°. */
    public CoastPoint withCoastBearingDeg(double bearingDeg) {
        return new CoastPoint(name, lonDeg, latDeg, alongCoastKm, bearingDeg, bearingDeg + 90.0, snapDistanceKm,
                Double.NaN, OrientationSource.USER);
    }

    /** The same point with a user-given offshore bearing; the coast bearing becomes offshore − 90°. */
    public CoastPoint withOffshoreBearingDeg(double bearingDeg) {
        return new CoastPoint(name, lonDeg, latDeg, alongCoastKm, bearingDeg - 90.0, bearingDeg, snapDistanceKm,
                Double.NaN, OrientationSource.USER);
    }

    /** The same point under another name. */
    public CoastPoint withName(String newName) {
        return new CoastPoint(newName, lonDeg, latDeg, alongCoastKm, coastBearingDeg, offshoreBearingDeg,
                snapDistanceKm, smoothingLengthKm, orientation);
    }

    /** Eastward component of the offshore unit normal, sin(offshore bearing) (dimensionless). */
    public double offshoreEastward() { return DegreeTrig.sinDeg(offshoreBearingDeg); }

    /** Northward component of the offshore unit normal, cos(offshore bearing) (dimensionless). */
    public double offshoreNorthward() { return DegreeTrig.cosDeg(offshoreBearingDeg); }

    static double normalize360(double deg) {
        double r = deg % 360.0;
        if (r < 0) r += 360.0;
        return r == 360.0 ? 0.0 : r;
    }
}
