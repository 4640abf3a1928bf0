package org.gyreplan.solver.upwelling;

/**
 * The steps of the sea-level-pressure index at one point.
 *
 * @param geostrophicEastwardMPerS  geostrophic (or gradient-corrected) wind, eastward, m s⁻¹
 * @param geostrophicNorthwardMPerS same, northward, m s⁻¹
 * @param surfaceEastwardMPerS      surface wind after reduction and turning, eastward, m s⁻¹
 * @param surfaceNorthwardMPerS     same, northward, m s⁻¹
 * @param index                     stress, Ekman transport and the index (see {@link PointIndex})
 */
public record PressureIndexPoint(double geostrophicEastwardMPerS, double geostrophicNorthwardMPerS,
                                 double surfaceEastwardMPerS, double surfaceNorthwardMPerS, PointIndex index) {
    /** The index, m³ s⁻¹ per 100 m of coastline (positive offshore). */
    public double indexM3PerSPer100m() { return index.indexM3PerSPer100m(); }
}
