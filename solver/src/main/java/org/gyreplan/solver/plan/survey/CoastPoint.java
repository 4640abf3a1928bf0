package org.gyreplan.solver.plan.survey;

/**
 * A point of the coastline with the direction toward the open sea, in order along the coast.
 *
 * @param lonDeg             longitude, degrees east
 * @param latDeg             latitude, degrees north
 * @param offshoreBearingDeg direction pointing offshore, degrees clockwise from true north
 */
public record CoastPoint(double lonDeg, double latDeg, double offshoreBearingDeg) {
    public CoastPoint {
        if (!Double.isFinite(lonDeg) || !(latDeg >= -90 && latDeg <= 90) || !Double.isFinite(offshoreBearingDeg)) {
            throw new IllegalArgumentException("coast point needs finite lon/lat/bearing, got (" + lonDeg + ", " + latDeg
                    + ", " + offshoreBearingDeg + ")");
        }
    }
}
