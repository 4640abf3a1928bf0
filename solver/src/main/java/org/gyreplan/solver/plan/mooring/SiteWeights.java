package org.gyreplan.solver.plan.mooring;

/**
 * Caller's weights of the siting criteria (any non-negative numbers, at least one positive; they are normalised
 * to sum to 1 and the normalised values are reported with the result).
 *
 * @param persistence  weight of the fraction of time upwelling
 * @param intensity    weight of the mean upwelling rate
 * @param variability  weight of the variability captured (standard deviation of the rate or index)
 * @param portProximity weight of closeness to the port (closer is better)
 */
public record SiteWeights(double persistence, double intensity, double variability, double portProximity) {
    public SiteWeights {
        for (double w : new double[] {persistence, intensity, variability, portProximity}) {
            if (!(w >= 0) || !Double.isFinite(w)) throw new IllegalArgumentException("siting weights must be finite and ≥ 0, got " + w);
        }
        if (persistence + intensity + variability + portProximity <= 0) {
            throw new IllegalArgumentException("at least one siting weight must be positive");
        }
    }

    /** Equal weights. */
    public static SiteWeights equal() { return new SiteWeights(1, 1, 1, 1); }

    /** The same weights scaled to sum to 1. */
    public SiteWeights normalised() {
        double s = persistence + intensity + variability + portProximity;
        return new SiteWeights(persistence / s, intensity / s, variability / s, portProximity / s);
    }
}
