package org.gyreplan.solver.plan.mooring;

import java.util.List;
import java.util.Map;

/**
 * Outcome of {@link MooringSiting#choose}.
 *
 * @param sites             chosen sites by decreasing score
 * @param weights           normalised weights used
 * @param method            the selection method that produced the set, in words
 * @param provenOptimal     whether branch-and-bound proved the set optimal (max count ≤ K, then max total score)
 * @param totalScore        sum of the chosen scores
 * @param greedyTotalScore  sum of the scores of the plain greedy set (for comparison)
 * @param greedyCount       size of the plain greedy set
 * @param feasibleCount     number of candidates passing the per-site constraints
 * @param rejected          rejected candidates per reason
 * @param cautions          cautions to print with the sites
 */
public record SitingResult(List<ChosenSite> sites, SiteWeights weights, String method, boolean provenOptimal,
                           double totalScore, double greedyTotalScore, int greedyCount, int feasibleCount,
                           Map<String, Integer> rejected, List<String> cautions) {
    public SitingResult {
        sites = List.copyOf(sites);
        rejected = Map.copyOf(rejected);
        cautions = List.copyOf(cautions);
    }
}
