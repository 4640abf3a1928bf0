package org.gyreplan.solver.plan.survey;

/**
 * How to lay out cross-shore transects and their stations.
 *
 * @param alongCoastSpacingKm  distance between neighbouring transects measured along the coast, km (&gt; 0)
 * @param maxTransects         at most this many transects (the ones closest to the middle of the eligible coast are kept)
 * @param lengthKm             transect length from the coast, km (&gt; 0); the outer limit when a target depth is set
 * @param targetDepthM         stop a transect at the first station at least this deep, m (NaN = use the length only)
 * @param stationSpacingKm     station spacing off the shelf, km (&gt; 0)
 * @param shelfStationSpacingKm station spacing where the depth is less than {@code shelfDepthM}, km (&gt; 0)
 * @param shelfDepthM          shelf-break depth for the closer spacing, m (e.g. 200)
 * @param firstStationKm       distance of the first station from the coast, km (≥ 0)
 * @param smoothingPoints      half-width of the running circular mean of coast bearings, in coast points (≥ 0)
 */
public record TransectDesign(double alongCoastSpacingKm, int maxTransects, double lengthKm, double targetDepthM,
                             double stationSpacingKm, double shelfStationSpacingKm, double shelfDepthM,
                             double firstStationKm, int smoothingPoints) {
    public TransectDesign {
        if (!(alongCoastSpacingKm > 0)) throw new IllegalArgumentException("transect spacing along the coast must be > 0 km, got " + alongCoastSpacingKm);
        if (maxTransects < 1) throw new IllegalArgumentException("maxTransects must be ≥ 1, got " + maxTransects);
        if (!(lengthKm > 0)) throw new IllegalArgumentException("transect length must be > 0 km, got " + lengthKm);
        if (!(stationSpacingKm > 0) || !(shelfStationSpacingKm > 0)) throw new IllegalArgumentException("station spacings must be > 0 km");
        if (!(firstStationKm >= 0)) throw new IllegalArgumentException("first station distance must be ≥ 0 km");
        if (smoothingPoints < 0) throw new IllegalArgumentException("smoothingPoints must be ≥ 0");
    }

    /** Evenly spaced stations, no shelf refinement, no target depth. */
    public static TransectDesign simple(double alongCoastSpacingKm, int maxTransects, double lengthKm, double stationSpacingKm) {
        return new TransectDesign(alongCoastSpacingKm, maxTransects, lengthKm, Double.NaN, stationSpacingKm,
                stationSpacingKm, 200, stationSpacingKm / 2, 2);
    }

    /** The same design with closer stations over the shelf. */
    public TransectDesign withShelf(double shelfDepthM, double shelfSpacingKm) {
        return new TransectDesign(alongCoastSpacingKm, maxTransects, lengthKm, targetDepthM, stationSpacingKm,
                shelfSpacingKm, shelfDepthM, firstStationKm, smoothingPoints);
    }

    /** The same design ending each transect at the first station at least {@code depthM} deep. */
    public TransectDesign toDepth(double depthM) {
        return new TransectDesign(alongCoastSpacingKm, maxTransects, lengthKm, depthM, stationSpacingKm,
                shelfStationSpacingKm, shelfDepthM, firstStationKm, smoothingPoints);
    }
}
