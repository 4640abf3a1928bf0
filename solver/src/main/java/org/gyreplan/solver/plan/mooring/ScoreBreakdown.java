package org.gyreplan.solver.plan.mooring;

/**
 * Why a site scored as it did. Each criterion is min–max normalised over the feasible candidates to 0…1
 * (1 = best among them; a criterion that is the same for all feasible candidates normalises to 1), then multiplied
 * by its normalised weight; the score is the sum of the four contributions, 0…1.
 *
 * @param persistenceNorm   normalised persistence, 0…1
 * @param intensityNorm     normalised mean rate, 0…1
 * @param variabilityNorm   normalised standard deviation, 0…1
 * @param portProximityNorm normalised closeness to port, 0…1 (1 = nearest)
 * @param weights           normalised weights used
 * @param score             weighted sum, 0…1
 */
public record ScoreBreakdown(double persistenceNorm, double intensityNorm, double variabilityNorm,
                             double portProximityNorm, SiteWeights weights, double score) {
    /** One-line explanation, e.g. for a report table. */
    public String explain() {
        return String.format(java.util.Locale.ROOT,
                "score %.3f = persistence %.2f×%.2f + intensity %.2f×%.2f + variability %.2f×%.2f + port %.2f×%.2f",
                score, weights.persistence(), persistenceNorm, weights.intensity(), intensityNorm,
                weights.variability(), variabilityNorm, weights.portProximity(), portProximityNorm);
    }
}
