package org.gyreplan.solver.gyre;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Larger sweep of the Stommel (1948) convergence study (CHECKS.md §8a closed form): Δx = 19.5 km → 9.8 km
 * (0.26 M unknowns); observed order 2 ± 0.1. Tagged slow (run with -Dgroups=slow -DexcludedGroups=).
 */
@Tag("slow")
class StommelConvergenceSlowTest {
    @Test
    void orderStaysTwoOnFinerGrids() {
        double e2 = StommelAnalyticTest.maxError(StommelAnalyticTest.solve(511, 127));
        double e3 = StommelAnalyticTest.maxError(StommelAnalyticTest.solve(1023, 255));
        assertEquals(2.0, Math.log(e2 / e3) / Math.log(2), 0.1, "errors " + e2 + ", " + e3);
    }
}
