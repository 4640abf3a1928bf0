package org.gyreplan.solver.plan.mooring;

/**
 * A chosen mooring site.
 *
 * @param rank      1 = highest score among the chosen
 * @param candidate the candidate (position, depth m, criteria)
 * @param breakdown the score and its parts
 */
public record ChosenSite(int rank, MooringCandidate candidate, ScoreBreakdown breakdown) {
    public double score() { return breakdown.score(); }
}
