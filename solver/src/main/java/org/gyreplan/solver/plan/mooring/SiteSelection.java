package org.gyreplan.solver.plan.mooring;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.List;

/**
 * Choosing at most K items with pairwise conflicts (here: sites closer than the minimum spacing) to maximise,
 * lexicographically, first the number chosen and then the sum of their scores. This is a cardinality-constrained
 * maximum-weight independent set problem on the conflict graph (NP-hard in general), solved by:
 *
 * <ol>
 *   <li><b>Greedy</b>: take candidates by decreasing score, skipping any that conflicts with those taken.</li>
 *   <li><b>Local search</b> from the greedy set until no move helps, trying in turn: add a compatible candidate
 *       (while fewer than K); 1-for-2 exchange raising the count; shift (remove one site, insert one of the 300 best
 *       free candidates — or none — and refill greedily; best over all such moves); two-site shift (remove two,
 *       insert one of the 40 best free candidates, refill greedily); 1-for-1 swap raising the total score. Never worse than greedy, because it starts
 *       there and only accepts improvements.</li>
 *   <li><b>Exact branch-and-bound</b> (depth first, candidates by decreasing score, include-before-exclude),
 *       seeded with the local-search set as incumbent. Bound: the current set plus the (K − c) best remaining
 *       candidates not in conflict with it (a relaxation that ignores conflicts among those). It stops after a work
 *       budget (nodes plus candidates scanned by the bound, so the result is deterministic); if it finishes, the set is proven optimal, otherwise the best set found (never worse than local
 *       search) is returned and flagged not proven.</li>
 * </ol>
 * The 1-for-2 exchange considers pairs among the 300 best-scoring candidates that would be free after the removal,
 * which keeps a local-search pass at O(K·300²) on large candidate sets.
 * Scores must be finite and ≥ 0. Ties are broken by index, so results are deterministic.
 */
public final class SiteSelection {
    /** Default work budget of the branch-and-bound (search nodes plus candidates scanned by the bound; deterministic). */
    public static final long DEFAULT_NODE_BUDGET = 5_000_000L;
    private static final double EPS = 1e-12;
    /** The 1-for-2 exchange looks for pairs among this many best-scoring free candidates (bounds the O(n²) pair scan). */
    static final int PAIR_POOL = 300;
    /** The two-site shift tries this many best-scoring free candidates as the new site. */
    static final int SHIFT_POOL = 40;

    /** A chosen set with its objective and whether it was proven optimal. */
    public record Selection(int[] chosen, double total, boolean provenOptimal, String method) {
        public int count() { return chosen.length; }
    }

    private final double[] score;
    private final BitSet[] conflicts;
    private final int k;
    private final Integer[] sortedOrder;

    /**
     * @param score     per-candidate score, finite, ≥ 0
     * @param conflicts conflicts[i] = candidates that may not be chosen together with i (symmetric)
     * @param k         maximum number to choose (≥ 0)
     */
    public SiteSelection(double[] score, BitSet[] conflicts, int k) {
        if (score.length != conflicts.length) throw new IllegalArgumentException("score and conflict lists differ in length");
        if (k < 0) throw new IllegalArgumentException("number of sites K must be ≥ 0, got " + k);
        for (double s : score) if (!(s >= 0) || !Double.isFinite(s)) throw new IllegalArgumentException("scores must be finite and ≥ 0, got " + s);
        this.score = score.clone();
        this.conflicts = conflicts;
        this.k = k;
        this.sortedOrder = computeOrder();
    }

    /** Greedy by decreasing score. */
    public Selection greedy() {
        List<Integer> chosen = new ArrayList<>();
        BitSet blocked = new BitSet();
        for (int i : order()) {
            if (chosen.size() >= k) break;
            if (blocked.get(i)) continue;
            chosen.add(i);
            blocked.or(conflicts[i]);
            blocked.set(i);
        }
        return of(chosen, false, "greedy");
    }

    /** Greedy followed by add / swap / 1-for-2 local search. */
    public Selection localSearch() {
        int n = score.length;
        List<Integer> s = new ArrayList<>();
        for (int i : greedy().chosen()) s.add(i);
        boolean improved = true;
        while (improved) {
            improved = false;
            boolean[] in = new boolean[n];
            for (int i : s) in[i] = true;
            // conflict counts with the current set
            int[] hits = new int[n];
            for (int i : s) for (int j = conflicts[i].nextSetBit(0); j >= 0; j = conflicts[i].nextSetBit(j + 1)) hits[j]++;
            // 1) add
            if (s.size() < k) {
                int best = -1;
                for (int j : order()) if (!in[j] && hits[j] == 0) { best = j; break; }
                if (best >= 0) { s.add(best); improved = true; continue; }
            }
            // 2) 1-for-2 exchange (raises the count)
            if (s.size() < k) {
                int[] move = bestOneForTwo(s, in, hits);
                if (move != null) {
                    s.remove(Integer.valueOf(move[0]));
                    s.add(move[1]);
                    s.add(move[2]);
                    improved = true;
                    continue;
                }
            }
            // 3) shift: remove one site, put in one of the best free candidates (or none), refill greedily
            {
                double curTotal = 0;
                for (int i : s) curTotal += score[i];
                List<Integer> bestSet = null;
                double bestT = curTotal;
                int bestC = s.size();
                for (int out : s) {
                    BitSet base = new BitSet();
                    for (int i : s) if (i != out) { base.or(conflicts[i]); base.set(i); }
                    base.set(out);
                    List<Integer> entries = new ArrayList<>();
                    entries.add(-1);
                    for (int j : sortedOrder) {
                        if (entries.size() > PAIR_POOL) break;
                        if (!base.get(j)) entries.add(j);
                    }
                    for (int in0 : entries) {
                        List<Integer> t = new ArrayList<>(s);
                        t.remove(Integer.valueOf(out));
                        BitSet blocked = (BitSet) base.clone();
                        if (in0 >= 0) { t.add(in0); blocked.or(conflicts[in0]); blocked.set(in0); }
                        refillGreedily(t, blocked);
                        double tt = 0;
                        for (int i : t) tt += score[i];
                        if (t.size() > bestC || (t.size() == bestC && tt > bestT + EPS)) { bestC = t.size(); bestT = tt; bestSet = t; }
                    }
                }
                if (bestSet != null) {
                    s.clear();
                    s.addAll(bestSet);
                    improved = true;
                    continue;
                }
            }
            // 4) shift two: remove two sites, insert one of the best free candidates, refill greedily
            if (s.size() >= 2) {
                List<Integer> better = shiftTwo(s);
                if (better != null) {
                    s.clear();
                    s.addAll(better);
                    improved = true;
                    continue;
                }
            }
            // 5) 1-for-1 swap (raises the score)
            double bestGain = EPS;
            int out = -1, inn = -1;
            for (int i : s) {
                for (int j = 0; j < n; j++) {
                    if (in[j]) continue;
                    int h = hits[j] - (conflicts[i].get(j) ? 1 : 0);
                    if (h != 0) continue;
                    double gain = score[j] - score[i];
                    if (gain > bestGain) { bestGain = gain; out = i; inn = j; }
                }
            }
            if (out >= 0) {
                s.remove(Integer.valueOf(out));
                s.add(inn);
                improved = true;
            }
        }
        return of(s, false, "greedy + add/1-for-2/shift-refill/two-site shift/swap local search");
    }

    /** Best improving "remove two, insert one of the best free, refill greedily" move, or null. */
    /** Adds candidates by decreasing score while the set has fewer than K and a candidate is free of conflicts. */
    private void refillGreedily(List<Integer> t, BitSet blocked) {
        for (int j : sortedOrder) {
            if (t.size() >= k) break;
            if (blocked.get(j)) continue;
            t.add(j);
            blocked.or(conflicts[j]);
            blocked.set(j);
        }
    }

    private List<Integer> shiftTwo(List<Integer> s) {
        double curTotal = 0;
        for (int i : s) curTotal += score[i];
        List<Integer> bestSet = null;
        double bestT = curTotal;
        int bestC = s.size();
        for (int a = 0; a < s.size(); a++) {
            for (int b = a + 1; b < s.size(); b++) {
                int oa = s.get(a), ob = s.get(b);
                BitSet base = new BitSet();
                for (int i : s) if (i != oa && i != ob) { base.or(conflicts[i]); base.set(i); }
                base.set(oa);
                base.set(ob);
                int tried = 0;
                for (int in0 : sortedOrder) {
                    if (tried >= SHIFT_POOL) break;
                    if (base.get(in0)) continue;
                    tried++;
                    List<Integer> t = new ArrayList<>(s);
                    t.remove(Integer.valueOf(oa));
                    t.remove(Integer.valueOf(ob));
                    t.add(in0);
                    BitSet blocked = (BitSet) base.clone();
                    blocked.or(conflicts[in0]);
                    blocked.set(in0);
                    refillGreedily(t, blocked);
                    double tt = 0;
                    for (int i : t) tt += score[i];
                    if (t.size() > bestC || (t.size() == bestC && tt > bestT + EPS)) { bestC = t.size(); bestT = tt; bestSet = t; }
                }
            }
        }
        return bestSet;
    }

    private int[] bestOneForTwo(List<Integer> s, boolean[] in, int[] hits) {
        int n = score.length;
        int[] best = null;
        double bestTotal = Double.NEGATIVE_INFINITY;
        for (int i : s) {
            List<Integer> free = new ArrayList<>();
            for (int j : order()) {
                if (in[j]) continue;
                int h = hits[j] - (conflicts[i].get(j) ? 1 : 0);
                if (h == 0) free.add(j);
                if (free.size() >= PAIR_POOL) break;
            }
            for (int a = 0; a < free.size(); a++) {
                for (int b = a + 1; b < free.size(); b++) {
                    int ja = free.get(a), jb = free.get(b);
                    if (conflicts[ja].get(jb)) continue;
                    double t = score[ja] + score[jb] - score[i];
                    if (t > bestTotal) { bestTotal = t; best = new int[] {i, ja, jb}; }
                }
            }
        }
        return best;
    }

    /** Branch-and-bound with the default work budget. */
    public Selection best() { return best(DEFAULT_NODE_BUDGET); }

    /** Branch-and-bound seeded with local search; exact when it finishes within {@code nodeBudget} work units (nodes plus candidates scanned). */
    public Selection best(long nodeBudget) {
        Selection seed = localSearch();
        Integer[] ord = order();
        int n = ord.length;
        double[] sorted = new double[n];
        for (int p = 0; p < n; p++) sorted[p] = score[ord[p]];
        double[] prefix = new double[n + 1];
        for (int p = 0; p < n; p++) prefix[p + 1] = prefix[p] + sorted[p];
        Bnb b = new Bnb(ord, sorted, prefix, nodeBudget);
        b.bestCount = seed.count();
        b.bestSum = seed.total();
        b.bestSet = seed.chosen().clone();
        b.dfs(0, new int[Math.max(k, 1)], 0, 0.0, new int[n]);
        List<Integer> chosen = new ArrayList<>();
        for (int i : b.bestSet) chosen.add(i);
        boolean proven = !b.exhausted;
        return of(chosen, proven, proven ? "exact branch-and-bound (seeded by greedy + local search)"
                : "greedy + local search, improved by a truncated branch-and-bound (work budget " + nodeBudget + " reached)");
    }

    private final class Bnb {
        final Integer[] ord;
        final double[] sorted;
        final long budget;
        long nodes;
        boolean exhausted;
        int bestCount;
        double bestSum;
        int[] bestSet;

        final double[] prefix;

        Bnb(Integer[] ord, double[] sorted, double[] prefix, long budget) {
            this.ord = ord; this.sorted = sorted; this.prefix = prefix; this.budget = budget;
        }

        /** blockedBy[p] = number of chosen items conflicting with ord[p]. */
        void dfs(int pos, int[] chosen, int c, double sum, int[] blockedBy) {
            if (exhausted) return;
            if (++nodes > budget) { exhausted = true; return; }
            if (c > bestCount || (c == bestCount && sum > bestSum + EPS)) {
                bestCount = c;
                bestSum = sum;
                bestSet = Arrays.copyOf(chosen, c);
                for (int q = 0; q < c; q++) bestSet[q] = ord[bestSet[q]];
            }
            int n = ord.length;
            if (c == k || pos == n) return;
            // cheap bound first: the (K − c) best remaining scores, blocked or not
            int room = Math.min(k - c, n - pos);
            double loose = sum + prefix[pos + room] - prefix[pos];
            if (c + room < bestCount || (c + room == bestCount && loose <= bestSum + EPS)) return;
            // tighter bound: the (K − c) best remaining candidates not blocked by the chosen ones (conflicts among
            // them ignored); the scan counts against the work budget
            int found = 0;
            double sumBound = sum;
            int scan = pos;
            for (; scan < n && found < k - c; scan++) {
                if (blockedBy[scan] == 0) { sumBound += sorted[scan]; found++; }
            }
            nodes += scan - pos;
            int countBound = c + found;
            if (countBound < bestCount || (countBound == bestCount && sumBound <= bestSum + EPS)) return;
            int i = ord[pos];
            if (blockedBy[pos] == 0) {
                // include ord[pos]
                List<Integer> marked = new ArrayList<>();
                for (int j = conflicts[i].nextSetBit(0); j >= 0; j = conflicts[i].nextSetBit(j + 1)) marked.add(j);
                int[] posOf = positionsOf(marked);
                for (int p : posOf) blockedBy[p]++;
                chosen[c] = pos;
                dfs(pos + 1, chosen, c + 1, sum + sorted[pos], blockedBy);
                for (int p : posOf) blockedBy[p]--;
            }
            dfs(pos + 1, chosen, c, sum, blockedBy);
        }

        private int[] rank;
        int[] positionsOf(List<Integer> items) {
            if (rank == null) {
                rank = new int[ord.length];
                for (int p = 0; p < ord.length; p++) rank[ord[p]] = p;
            }
            int[] r = new int[items.size()];
            for (int q = 0; q < r.length; q++) r[q] = rank[items.get(q)];
            return r;
        }
    }

    private Integer[] order() { return sortedOrder.clone(); }

    private Integer[] computeOrder() {
        Integer[] ord = new Integer[score.length];
        for (int i = 0; i < ord.length; i++) ord[i] = i;
        Arrays.sort(ord, (a, b) -> score[a] != score[b] ? Double.compare(score[b], score[a]) : Integer.compare(a, b));
        return ord;
    }

    private Selection of(List<Integer> chosen, boolean proven, String method) {
        int[] c = chosen.stream().mapToInt(Integer::intValue).toArray();
        Integer[] boxed = chosen.toArray(new Integer[0]);
        Arrays.sort(boxed, (a, b) -> score[a] != score[b] ? Double.compare(score[b], score[a]) : Integer.compare(a, b));
        for (int q = 0; q < c.length; q++) c[q] = boxed[q];
        double t = 0;
        for (int i : c) t += score[i];
        return new Selection(c, t, proven, method);
    }
}
