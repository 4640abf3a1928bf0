package org.gyreplan.solver.plan.mooring;

import org.junit.jupiter.api.Test;

import java.util.BitSet;
import java.util.Random;

import static org.junit.jupiter.api.Assertions.*;

/**
 * The set selection against exhaustive enumeration of all subsets (the definition of the optimum of
 * "max count ≤ K, then max total score, pairwise compatible") on seeded random cases.
 */
class SiteSelectionTest {

    record Opt(int count, double total) { }

    static Opt bruteForce(double[] score, BitSet[] conflicts, int k) {
        int n = score.length;
        Opt best = new Opt(0, 0);
        for (int mask = 0; mask < (1 << n); mask++) {
            int c = Integer.bitCount(mask);
            if (c > k) continue;
            boolean ok = true;
            double t = 0;
            for (int i = 0; i < n && ok; i++) {
                if ((mask >> i & 1) == 0) continue;
                t += score[i];
                for (int j = i + 1; j < n; j++) if ((mask >> j & 1) == 1 && conflicts[i].get(j)) { ok = false; break; }
            }
            if (!ok) continue;
            if (c > best.count || (c == best.count && t > best.total + 1e-12)) best = new Opt(c, t);
        }
        return best;
    }

    /** Random geometric conflict graph: points in the unit square, conflict when closer than r. */
    static BitSet[] randomConflicts(Random rnd, int n, double r) {
        double[][] p = new double[n][2];
        for (double[] q : p) { q[0] = rnd.nextDouble(); q[1] = rnd.nextDouble(); }
        BitSet[] c = new BitSet[n];
        for (int i = 0; i < n; i++) c[i] = new BitSet(n);
        for (int i = 0; i < n; i++) for (int j = i + 1; j < n; j++) {
            if (Math.hypot(p[i][0] - p[j][0], p[i][1] - p[j][1]) < r) { c[i].set(j); c[j].set(i); }
        }
        return c;
    }

    static boolean atLeast(SiteSelection.Selection a, SiteSelection.Selection b) {
        return a.count() > b.count() || (a.count() == b.count() && a.total() >= b.total() - 1e-12);
    }

    static void assertIndependent(SiteSelection.Selection s, BitSet[] conflicts, int k) {
        assertTrue(s.count() <= k);
        for (int a : s.chosen()) for (int b : s.chosen()) if (a != b) assertFalse(conflicts[a].get(b), "conflicting pair chosen");
    }

    @Test
    void matchesBruteForceAndNeverWorseThanGreedyOn80SeededCases() {
        int greedyStrictlyWorse = 0, localStrictlyWorse = 0;
        for (int seed = 1; seed <= 80; seed++) {
            Random rnd = new Random(seed);
            int n = 6 + rnd.nextInt(9);            // 6…14 candidates
            int k = 1 + rnd.nextInt(5);            // K = 1…5
            double r = 0.15 + 0.35 * rnd.nextDouble();
            double[] score = new double[n];
            for (int i = 0; i < n; i++) score[i] = rnd.nextDouble();
            BitSet[] conf = randomConflicts(rnd, n, r);
            SiteSelection sel = new SiteSelection(score, conf, k);
            SiteSelection.Selection g = sel.greedy(), ls = sel.localSearch(), best = sel.best();
            Opt opt = bruteForce(score, conf, k);
            assertIndependent(g, conf, k);
            assertIndependent(ls, conf, k);
            assertIndependent(best, conf, k);
            assertTrue(atLeast(ls, g), "seed " + seed + ": local search worse than greedy");
            assertTrue(atLeast(best, ls), "seed " + seed + ": branch-and-bound worse than local search");
            assertTrue(best.provenOptimal(), "seed " + seed);
            assertEquals(opt.count, best.count(), "seed " + seed + " count");
            assertEquals(opt.total, best.total(), 1e-9, "seed " + seed + " total");
            if (!(g.count() == opt.count && Math.abs(g.total() - opt.total) < 1e-9)) greedyStrictlyWorse++;
            if (!(ls.count() == opt.count && Math.abs(ls.total() - opt.total) < 1e-9)) localStrictlyWorse++;
        }
        // the cases are not trivial: greedy misses the optimum in some of them (the exact search matters)
        assertTrue(greedyStrictlyWorse > 0, "random cases never separated greedy from the optimum");
        assertTrue(localStrictlyWorse <= greedyStrictlyWorse);
    }

    /** Hand case where greedy is trapped: A (1.0) conflicts with B and C (0.8 each), B and C are compatible; K = 2. */
    @Test
    void greedyTrapIsEscaped() {
        double[] s = {1.0, 0.8, 0.8};
        BitSet[] c = {new BitSet(), new BitSet(), new BitSet()};
        c[0].set(1); c[0].set(2); c[1].set(0); c[2].set(0);
        SiteSelection sel = new SiteSelection(s, c, 2);
        assertEquals(1, sel.greedy().count());
        assertEquals(1.0, sel.greedy().total(), 0);
        SiteSelection.Selection ls = sel.localSearch();
        assertEquals(2, ls.count());
        assertEquals(1.6, ls.total(), 1e-12);
        assertArrayEquals(new int[] {1, 2}, sel.best().chosen());
    }

    @Test
    void largeCaseFinishesQuicklyAndStaysFeasible() {
        Random rnd = new Random(7);
        int n = 1500, k = 8;
        double[] s = new double[n];
        for (int i = 0; i < n; i++) s[i] = rnd.nextDouble();
        BitSet[] conf = randomConflicts(rnd, n, 0.08);
        SiteSelection sel = new SiteSelection(s, conf, k);
        long t0 = System.nanoTime();
        SiteSelection.Selection best = sel.best(200_000);
        assertTrue((System.nanoTime() - t0) / 1e9 < 8.0, "selection took too long");
        assertIndependent(best, conf, k);
        assertTrue(atLeast(best, sel.greedy()));
        assertEquals(k, best.count());
    }

    /**
     * Realistic structure: scores peak smoothly in one place (like an upwelling centre) and the spacing forbids
     * neighbours, so greedy takes the peak and boxes itself in. Local search and the exact search must beat greedy
     * strictly here (values found when the test was written: greedy 2.655, optimum 2.781 for seed 300·31+3), and the
     * exact search must prove optimality.
     */
    @Test
    void smoothPeakCaseWhereGreedyIsBeaten() {
        int n = 300, k = 3;
        Random rnd = new Random(n * 31 + k);
        double[][] p = new double[n][2];
        double[] s = new double[n];
        for (int i = 0; i < n; i++) {
            p[i][0] = rnd.nextDouble();
            p[i][1] = rnd.nextDouble();
            s[i] = Math.exp(-(Math.pow(p[i][0] - 0.3, 2) + Math.pow(p[i][1] - 0.5, 2)) / 0.05) + 0.05 * rnd.nextDouble();
        }
        BitSet[] c = new BitSet[n];
        for (int i = 0; i < n; i++) c[i] = new BitSet(n);
        for (int i = 0; i < n; i++) for (int j = i + 1; j < n; j++) {
            if (Math.hypot(p[i][0] - p[j][0], p[i][1] - p[j][1]) < 0.1) { c[i].set(j); c[j].set(i); }
        }
        SiteSelection sel = new SiteSelection(s, c, k);
        SiteSelection.Selection g = sel.greedy(), ls = sel.localSearch(), best = sel.best();
        assertTrue(ls.total() > g.total() + 1e-3, "local search " + ls.total() + " vs greedy " + g.total());
        assertTrue(best.provenOptimal());
        assertEquals(best.total(), ls.total(), 1e-12);
        assertIndependent(best, c, k);
    }
}
