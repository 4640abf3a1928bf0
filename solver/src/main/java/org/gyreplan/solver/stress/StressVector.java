package org.gyreplan.solver.stress;

/**
 * A surface stress vector (force of the air on the sea per unit area), Pa, as eastward and northward components.
 *
 * @param eastwardPa τₓ, Pa (N m⁻²)
 * @param northwardPa τᵧ, Pa (N m⁻²)
 */
public record StressVector(double eastwardPa, double northwardPa) {
    /** |τ|, Pa. */
    public double magnitudePa() { return Math.hypot(eastwardPa, northwardPa); }
}
