package org.gyreplan.solver.plan.survey;

import java.util.List;

/**
 * One cross-shore transect.
 *
 * @param id           1-based, in coast order
 * @param originLonDeg coast origin longitude, degrees east
 * @param originLatDeg coast origin latitude, degrees north
 * @param bearingDeg   smoothed offshore bearing, degrees clockwise from north
 * @param lengthKm     distance from the origin to the last station, km
 * @param stations     stations from the coast outward
 */
public record Transect(int id, double originLonDeg, double originLatDeg, double bearingDeg, double lengthKm,
                       List<Stop> stations) {
    public Transect {
        stations = List.copyOf(stations);
    }
}
