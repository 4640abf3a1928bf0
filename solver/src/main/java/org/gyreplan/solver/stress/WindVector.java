package org.gyreplan.solver.stress;

/**
 * A horizontal wind (or any velocity) as eastward and northward components, m s⁻¹, pointing "toward".
 *
 * @param eastward eastward component u, m s⁻¹
 * @param northward northward component v, m s⁻¹
 */
public record WindVector(double eastward, double northward) {
    /** Speed |U| = √(u² + v²), m s⁻¹. */
    public double speed() { return Math.hypot(eastward, northward); }
}
