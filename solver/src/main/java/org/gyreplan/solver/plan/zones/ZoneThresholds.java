package org.gyreplan.solver.plan.zones;

import org.gyreplan.solver.plan.PlanUnits;

/**
 * User thresholds that define an upwelling zone: a cell belongs to a zone when its time-mean upwelling rate is at
 * least {@code minMeanMps} AND its persistence (fraction of time upwelling) is at least {@code minPersistence}.
 *
 * @param minMeanMps     intensity threshold on the mean rate, m s⁻¹ (positive upward)
 * @param minPersistence persistence threshold, fraction 0…1
 * @param minCells       smallest zone kept, in grid cells (≥ 1); smaller contiguous patches are dropped as noise
 */
public record ZoneThresholds(double minMeanMps, double minPersistence, int minCells) {
    public ZoneThresholds {
        if (!Double.isFinite(minMeanMps)) throw new IllegalArgumentException("zone intensity threshold must be finite (m s-1), got " + minMeanMps);
        if (!(minPersistence >= 0 && minPersistence <= 1)) {
            throw new IllegalArgumentException("zone persistence threshold must be a fraction in [0, 1], got " + minPersistence);
        }
        if (minCells < 1) throw new IllegalArgumentException("minimum zone size must be at least 1 cell, got " + minCells);
    }

    /** Thresholds with the intensity in m s⁻¹, keeping zones of any size. */
    public static ZoneThresholds ofMetresPerSecond(double minMeanMps, double minPersistence) {
        return new ZoneThresholds(minMeanMps, minPersistence, 1);
    }

    /** Thresholds with the intensity in m day⁻¹ (converted: 1 m day⁻¹ = 1/86400 m s⁻¹). */
    public static ZoneThresholds ofMetresPerDay(double minMeanMetresPerDay, double minPersistence) {
        return new ZoneThresholds(PlanUnits.metresPerDayToMps(minMeanMetresPerDay), minPersistence, 1);
    }

    /** The same thresholds dropping zones smaller than {@code cells} grid cells. */
    public ZoneThresholds withMinCells(int cells) { return new ZoneThresholds(minMeanMps, minPersistence, cells); }
}
