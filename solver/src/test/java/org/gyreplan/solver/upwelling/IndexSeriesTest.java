package org.gyreplan.solver.upwelling;

import org.gyreplan.solver.coast.CoastPoint;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.TimeAxis;
import org.gyreplan.solver.grid.VectorField;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.CancelledException;
import org.gyreplan.solver.series.TimeSeries;
import org.junit.jupiter.api.Test;

import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;

import static org.junit.jupiter.api.Assertions.*;

/** The series form of the index: one value per step and point, progress, cancel, grid consistency. */
class IndexSeriesTest {
    private static final LonLatGrid G = new LonLatGrid(4, 4, -124.5, 34.5, 1, 1, 6.371e6, null);

    private static VectorField stress(double ty) {
        double[] a = new double[G.size()], b = new double[G.size()];
        Arrays.fill(b, ty);
        return new VectorField(new ScalarField(G, a, "tx", "Pa", null), new ScalarField(G, b, "ty", "Pa", null));
    }

    @Test
    void seriesFollowsTheStressStepByStep() {
        List<Instant> t = new ArrayList<>();
        for (int k = 0; k < 10; k++) t.add(Instant.parse("2001-01-01T00:00:00Z").plusSeconds(86400L * k));
        CoastPoint p = CoastPoint.of("p", -122.5, 36.5, 270);
        AtomicInteger calls = new AtomicInteger();
        List<TimeSeries> s = CoastalUpwellingIndex.defaults().series(new TimeAxis(t), k -> stress(-0.01 * k),
                List.of(p, p.withName("q").withOffshoreBearingDeg(90)), (st, f, m) -> calls.incrementAndGet(),
                CancelToken.none());
        assertEquals(2, s.size());
        assertEquals(10, calls.get());
        assertEquals(CoastalUpwellingIndex.UNITS, s.get(0).units());
        double perUnit = CoastalUpwellingIndex.defaults().fromStress(0, -1, 36.5, 270);
        for (int k = 0; k < 10; k++) {
            assertEquals(0.01 * k * perUnit, s.get(0).value(k), 1e-12 * Math.max(1, Math.abs(perUnit)));
            assertEquals(-s.get(0).value(k), s.get(1).value(k), 1e-12);
        }
    }

    @Test
    void cancelStopsTheLoopAndOtherGridsAreRefused() {
        List<Instant> t = List.of(Instant.EPOCH, Instant.EPOCH.plusSeconds(86400));
        CancelToken c = new CancelToken();
        c.cancel();
        CoastPoint p = CoastPoint.of("p", -122.5, 36.5, 270);
        assertThrows(CancelledException.class, () -> CoastalUpwellingIndex.defaults().series(new TimeAxis(t),
                k -> stress(0.1), List.of(p), (s, f, m) -> { }, c));
        LonLatGrid other = new LonLatGrid(4, 4, -124, 34.5, 1, 1, 6.371e6, null);
        double[] z = new double[16];
        VectorField moved = new VectorField(new ScalarField(other, z, "tx", "Pa", null), new ScalarField(other, z, "ty", "Pa", null));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> CoastalUpwellingIndex.defaults()
                .series(new TimeAxis(t), k -> k == 0 ? stress(0.1) : moved, List.of(p), (s, f, m) -> { }, CancelToken.none()));
        assertTrue(e.getMessage().contains("step 1"), e.getMessage());
    }
}
