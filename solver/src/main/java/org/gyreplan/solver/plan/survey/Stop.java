package org.gyreplan.solver.plan.survey;

/**
 * A place the ship visits.
 *
 * @param id        unique label, e.g. "T03-S05" (transect 3, station 5) or "M1"
 * @param lonDeg    longitude, degrees east
 * @param latDeg    latitude, degrees north
 * @param depthM    water depth, m positive down (NaN for the port or unknown)
 * @param kind      what happens there
 */
public record Stop(String id, double lonDeg, double latDeg, double depthM, StopKind kind) {
    public Stop {
        if (id == null || id.isBlank()) throw new IllegalArgumentException("stop needs an id");
        if (!Double.isFinite(lonDeg) || !(latDeg >= -90 && latDeg <= 90)) {
            throw new IllegalArgumentException("stop '" + id + "' has an invalid position (" + lonDeg + ", " + latDeg + ")");
        }
        if (kind == null) throw new IllegalArgumentException("stop '" + id + "' needs a kind");
    }

    /**
     * A port. Give the position of the harbour entrance or pilot station, just offshore: a position on or inside a
     * land polygon is rejected by the router.
     */
    public static Stop port(String name, double lonDeg, double latDeg) {
        return new Stop(name, lonDeg, latDeg, Double.NaN, StopKind.PORT);
    }
}
