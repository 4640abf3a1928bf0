package org.gyreplan.solver.plan.mooring;

import org.locationtech.jts.geom.Geometry;

import java.util.List;

/**
 * Hard constraints on mooring sites. A candidate is feasible when every window holds and it lies outside every
 * exclusion polygon; a chosen set is feasible when every pair is at least {@code minSpacingKm} apart (geodesic).
 *
 * @param minDepthM        shallowest allowed water depth, m (positive down)
 * @param maxDepthM        deepest allowed water depth, m
 * @param minCoastKm       smallest allowed distance from the coast, km
 * @param maxCoastKm       largest allowed distance from the coast, km
 * @param exclusions       exclusion polygons in lon/lat degrees (shipping lanes, protected areas, cables...); a
 *                         candidate on or inside one is rejected
 * @param minSpacingKm     minimum geodesic distance between any two chosen sites, km (≥ 0)
 * @param requireInZone    whether a candidate must lie inside an upwelling zone ({@code zoneId > 0})
 */
public record SiteConstraints(double minDepthM, double maxDepthM, double minCoastKm, double maxCoastKm,
                              List<Geometry> exclusions, double minSpacingKm, boolean requireInZone) {
    public SiteConstraints {
        if (!(minDepthM <= maxDepthM)) throw new IllegalArgumentException("depth window: minDepthM " + minDepthM + " must be ≤ maxDepthM " + maxDepthM);
        if (!(minCoastKm <= maxCoastKm)) throw new IllegalArgumentException("coast-distance window: minCoastKm " + minCoastKm + " must be ≤ maxCoastKm " + maxCoastKm);
        if (!(minSpacingKm >= 0)) throw new IllegalArgumentException("minSpacingKm must be ≥ 0, got " + minSpacingKm);
        exclusions = exclusions == null ? List.of() : List.copyOf(exclusions);
    }

    /** Windows only, no exclusions, no spacing, zones not required. */
    public static SiteConstraints windows(double minDepthM, double maxDepthM, double minCoastKm, double maxCoastKm) {
        return new SiteConstraints(minDepthM, maxDepthM, minCoastKm, maxCoastKm, List.of(), 0, false);
    }

    public SiteConstraints withSpacingKm(double km) {
        return new SiteConstraints(minDepthM, maxDepthM, minCoastKm, maxCoastKm, exclusions, km, requireInZone);
    }
    public SiteConstraints withExclusions(List<Geometry> polygons) {
        return new SiteConstraints(minDepthM, maxDepthM, minCoastKm, maxCoastKm, polygons, minSpacingKm, requireInZone);
    }
    public SiteConstraints inZonesOnly() {
        return new SiteConstraints(minDepthM, maxDepthM, minCoastKm, maxCoastKm, exclusions, minSpacingKm, true);
    }
}
