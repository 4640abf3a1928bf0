package org.gyreplan.solver.plan.mooring;

/**
 * A possible mooring position with the criteria used for siting.
 *
 * @param id                 caller's identifier (e.g. "c-120-45" for grid cell i=120, j=45)
 * @param lonDeg             longitude, degrees east
 * @param latDeg             latitude, degrees north
 * @param depthM             water depth, m positive down (NaN = unknown, rejected)
 * @param coastDistanceKm    distance to the nearest coast, km
 * @param portDistanceKm     distance to the port of departure, km (straight geodesic; sailing distance may be longer)
 * @param persistence        fraction of time upwelling, 0…1
 * @param meanMps            time-mean upwelling rate (e.g. Ekman pumping), m s⁻¹, positive upward
 * @param stdMps             standard deviation of the rate or index (variability a mooring would capture), m s⁻¹
 * @param zoneId             id of the upwelling zone containing the candidate, 0 if none
 */
public record MooringCandidate(String id, double lonDeg, double latDeg, double depthM, double coastDistanceKm,
                               double portDistanceKm, double persistence, double meanMps, double stdMps, int zoneId) {
    public MooringCandidate {
        if (id == null || id.isBlank()) throw new IllegalArgumentException("mooring candidate needs an id");
        if (!Double.isFinite(lonDeg) || !(latDeg >= -90 && latDeg <= 90)) {
            throw new IllegalArgumentException("mooring candidate '" + id + "' has an invalid position (" + lonDeg + ", " + latDeg + ")");
        }
    }
}
