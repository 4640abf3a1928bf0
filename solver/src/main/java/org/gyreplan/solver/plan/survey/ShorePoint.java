package org.gyreplan.solver.plan.survey;

import java.util.ArrayList;
import java.util.List;

/**
 * A point of the coastline with the direction toward the open sea, in order along the coast (a plain stand-in for
 * {@link org.gyreplan.solver.coast.CoastPoint}; see {@link #of(org.gyreplan.solver.coast.CoastPoint)}).
 *
 * @param lonDeg             longitude, degrees east
 * @param latDeg             latitude, degrees north
 * @param offshoreBearingDeg direction pointing offshore, degrees clockwise from true north
 */
public record ShorePoint(double lonDeg, double latDeg, double offshoreBearingDeg) {
    public ShorePoint {
        if (!Double.isFinite(lonDeg) || !(latDeg >= -90 && latDeg <= 90) || !Double.isFinite(offshoreBearingDeg)) {
            throw new IllegalArgumentException("coast point needs finite lon/lat/bearing, got (" + lonDeg + ", " + latDeg
                    + ", " + offshoreBearingDeg + ")");
        }
    }

    /** From a coast point of {@code org.gyreplan.solver.coast} (its position and offshore bearing). */
    public static ShorePoint of(org.gyreplan.solver.coast.CoastPoint p) {
        return new ShorePoint(p.lonDeg(), p.latDeg(), p.offshoreBearingDeg());
    }

    /** From a list of coast points, in order. */
    public static List<ShorePoint> allOf(List<org.gyreplan.solver.coast.CoastPoint> points) {
        List<ShorePoint> out = new ArrayList<>(points.size());
        for (org.gyreplan.solver.coast.CoastPoint p : points) out.add(of(p));
        return out;
    }
}
