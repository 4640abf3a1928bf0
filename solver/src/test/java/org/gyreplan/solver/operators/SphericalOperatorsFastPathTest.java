package org.gyreplan.solver.operators;

import org.gyreplan.solver.grid.LonLatGrid;
import org.junit.jupiter.api.Test;

import java.util.Random;

import static org.junit.jupiter.api.Assertions.*;

/**
 * The prepared fast path ({@link SphericalOperators.OnGrid}: precomputed runs of full centred stencils) must give
 * bit-identical results to the general per-cell stencil kept as the package-private reference
 * ({@code curlReference}, {@code divergenceReference}, {@code gradientReference}). The reference is the
 * implementation that the analytic convergence tests in {@link SphericalOperatorsTest} verify. Tolerance: exact
 * (compared with {@link Double#doubleToLongBits}, so NaN must map to NaN and −0 to −0).
 */
class SphericalOperatorsFastPathTest {
    private static final double R = 6.371e6;

    private static boolean[] randomMask(int n, double landFraction, Random rnd) {
        boolean[] m = new boolean[n];
        for (int k = 0; k < n; k++) m[k] = rnd.nextDouble() >= landFraction;
        return m;
    }

    /** Smooth field plus noise, with NaN holes, ±∞ and exact zeros sprinkled in. */
    private static double[] randomField(LonLatGrid g, Random rnd, double holes) {
        double[] a = new double[g.size()];
        for (int k = 0; k < a.length; k++) {
            double x = Math.sin(0.3 * (k % g.nx())) * Math.cos(0.2 * (k / g.nx())) + 0.1 * rnd.nextGaussian();
            double r = rnd.nextDouble();
            if (r < holes) x = Double.NaN;
            else if (r < holes * 1.1) x = rnd.nextBoolean() ? Double.POSITIVE_INFINITY : Double.NEGATIVE_INFINITY;
            else if (r < holes * 1.3) x = 0.0;
            else if (r < holes * 1.4) x = -0.0;
            a[k] = x;
        }
        return a;
    }

    private static void assertSameBits(double[] expected, double[] actual, String what) {
        assertEquals(expected.length, actual.length);
        for (int k = 0; k < expected.length; k++) {
            if (Double.doubleToLongBits(expected[k]) != Double.doubleToLongBits(actual[k])) {
                fail(what + ": cell " + k + " expected " + expected[k] + " got " + actual[k]);
            }
        }
    }

    private static void compareAll(LonLatGrid g, Random rnd, double holes, String what) {
        double[] u = randomField(g, rnd, holes), v = randomField(g, rnd, holes), p = randomField(g, rnd, holes);
        int n = g.size();
        double[] ref = new double[n], got = new double[n], ref2 = new double[n], got2 = new double[n];
        SphericalOperators.curlReference(g, u, v, ref);
        SphericalOperators.curl(g, u, v, got);
        assertSameBits(ref, got, what + " curl");
        SphericalOperators.divergenceReference(g, u, v, ref);
        SphericalOperators.on(g).divergence(u, v, got);
        assertSameBits(ref, got, what + " divergence");
        SphericalOperators.gradientReference(g, p, ref, ref2);
        SphericalOperators.gradient(g, p, got, got2);
        assertSameBits(ref, got, what + " gradient x");
        assertSameBits(ref2, got2, what + " gradient y");
    }

    @Test
    void regionalMaskedGridsWithHolesAreBitIdentical() {
        Random rnd = new Random(20261201L);
        for (int rep = 0; rep < 20; rep++) {
            int nx = 3 + rnd.nextInt(40), ny = 3 + rnd.nextInt(30);
            LonLatGrid g = new LonLatGrid(nx, ny, -30 + rnd.nextDouble(), -50 + rnd.nextDouble(), 1.0, 1.5, R,
                    randomMask(nx * ny, rnd.nextDouble() * 0.4, rnd));
            compareAll(g, rnd, rep % 2 == 0 ? 0.0 : 0.05, "regional " + g);
        }
    }

    @Test
    void periodicGlobalGridIsBitIdentical() {
        Random rnd = new Random(7L);
        // 360° in longitude → periodic; rows from −89° to 89°
        LonLatGrid all = new LonLatGrid(90, 45, 2, -88, 4, 4, R, null);
        assertTrue(SphericalOperators.on(all).fastCells() > 0, "fast path must be used on an all-ocean grid");
        compareAll(all, rnd, 0.0, "global all ocean");
        compareAll(all, rnd, 0.03, "global with holes");
        LonLatGrid masked = all.withOcean(randomMask(all.size(), 0.2, rnd));
        compareAll(masked, rnd, 0.02, "global masked");
    }

    @Test
    void degenerateGridsAreBitIdentical() {
        Random rnd = new Random(3L);
        compareAll(new LonLatGrid(1, 5, 0, 0, 1, 1, R, null), rnd, 0.0, "one column");
        compareAll(new LonLatGrid(5, 1, 0, 0, 1, 1, R, null), rnd, 0.0, "one row");
        compareAll(new LonLatGrid(2, 2, 0, 0, 1, 1, R, null), rnd, 0.0, "2x2");
        compareAll(new LonLatGrid(3, 3, 0, 10, 120, 1, R, null), rnd, 0.1, "3 columns, periodic");
        compareAll(new LonLatGrid(6, 4, 0, 10, 1, 1, R, new boolean[24]), rnd, 0.0, "all land");
    }

    @Test
    void preparedOperatorsFollowTheGridIdentity() {
        Random rnd = new Random(11L);
        LonLatGrid a = new LonLatGrid(20, 10, 0, 20, 1, 1, R, null);
        LonLatGrid b = a.withOcean(randomMask(a.size(), 0.5, rnd));
        // alternate grids of the same geometry but different masks: the cache must not mix them up
        compareAll(a, rnd, 0.0, "a");
        compareAll(b, rnd, 0.0, "b");
        compareAll(a, rnd, 0.0, "a again");
        assertTrue(SphericalOperators.on(b).fastCells() < SphericalOperators.on(a).fastCells());
        assertEquals(18 * 8, SphericalOperators.on(a).fastCells(), "interior cells of a 20×10 all-ocean regional grid");
    }
}
