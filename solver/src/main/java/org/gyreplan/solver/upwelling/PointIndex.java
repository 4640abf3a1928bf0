package org.gyreplan.solver.upwelling;

import org.gyreplan.solver.coast.CoastPoint;

import java.util.Objects;

/**
 * The coastal upwelling index at one coast point and time.
 *
 * @param point                 the coast point (position and offshore bearing used)
 * @param indexM3PerSPer100m    cross-shore Ekman transport, positive offshore (upwelling), m³ s⁻¹ per 100 m of
 *                              coastline; NaN unless {@code flag} is OK
 * @param tauEastwardPa         sampled eastward surface stress τₓ, Pa
 * @param tauNorthwardPa        sampled northward surface stress τᵧ, Pa
 * @param ekmanEastwardM2PerS   eastward Ekman transport per unit width Qₓ = τᵧ/(ρ₀ f), m² s⁻¹
 * @param ekmanNorthwardM2PerS  northward Ekman transport per unit width Qᵧ = −τₓ/(ρ₀ f), m² s⁻¹
 * @param dataDistanceKm        distance from the point to the wind cell used (the nearest contributing cell for
 *                              bilinear sampling), km; NaN when none; 0 for point forms
 * @param flag                  quality flag
 */
public record PointIndex(CoastPoint point, double indexM3PerSPer100m, double tauEastwardPa, double tauNorthwardPa,
                         double ekmanEastwardM2PerS, double ekmanNorthwardM2PerS, double dataDistanceKm,
                         IndexFlag flag) {
    public PointIndex {
        Objects.requireNonNull(point, "point");
        Objects.requireNonNull(flag, "flag");
    }

    /** Alongshore stress component (along the coast bearing, ocean on the right), Pa. */
    public double alongshoreStressPa() {
        return tauEastwardPa * org.gyreplan.solver.DegreeTrig.sinDeg(point.coastBearingDeg())
                + tauNorthwardPa * org.gyreplan.solver.DegreeTrig.cosDeg(point.coastBearingDeg());
    }
}
