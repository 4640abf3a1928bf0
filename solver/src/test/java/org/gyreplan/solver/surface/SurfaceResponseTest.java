package org.gyreplan.solver.surface;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.ekman.EkmanPumping;
import org.gyreplan.solver.ekman.EkmanTransport;
import org.gyreplan.solver.ekman.EquatorialCutoff;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;
import org.gyreplan.solver.stress.DragLaw;
import org.gyreplan.solver.stress.LargePond1981;
import org.gyreplan.solver.stress.WindStress;
import org.junit.jupiter.api.Test;

import java.util.Arrays;

import static org.junit.jupiter.api.Assertions.*;

/**
 * The per-step surface response must equal the separately verified steps (WindStress: CHECKS §2c; EkmanTransport:
 * EK-01…04; EkmanPumping: EP-01…05) bit for bit, carry the CF names and units, count masked cells, and never turn
 * land into numbers.
 */
class SurfaceResponseTest {
    private static final PhysicalConstants C = PhysicalConstants.DEFAULT;
    private static final DragLaw LAW = LargePond1981.INSTANCE;

    /** A 2° grid from 20°S to 30°N with a land block and a missing value; winds from 0 to ~30 m/s. */
    private static VectorField wind() {
        int nx = 30, ny = 25;
        boolean[] ocean = new boolean[nx * ny];
        Arrays.fill(ocean, true);
        for (int j = 15; j < 20; j++) for (int i = 20; i < 26; i++) ocean[j * nx + i] = false;
        LonLatGrid g = new LonLatGrid(nx, ny, -40, -19, 2, 2, C.earthRadius(), ocean);
        double[] u = new double[g.size()], v = new double[g.size()];
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                int k = g.index(i, j);
                if (!g.isOcean(k)) { u[k] = Double.NaN; v[k] = Double.NaN; continue; }
                u[k] = 15 * Math.sin(0.2 * i + 0.1 * j) + 8;
                v[k] = 10 * Math.cos(0.15 * j) - 3;
            }
        }
        u[g.index(3, 3)] = Double.NaN;
        return new VectorField(new ScalarField(g, u, "u10", "m s-1", null), new ScalarField(g, v, "v10", "m s-1", null));
    }

    @Test
    void equalsTheSeparateStepsBitForBit() {
        VectorField wind = wind();
        SurfaceResponse.Step s = SurfaceResponse.ofWind(wind, LAW, C, EquatorialCutoff.DEFAULT);
        WindStress.Result stress = WindStress.field(wind, LAW, C.rhoAir());
        EkmanTransport.Field transport = EkmanTransport.field(stress.stress(), C, EquatorialCutoff.DEFAULT);
        EkmanPumping.Field pumping = EkmanPumping.field(stress.stress(), C, EquatorialCutoff.DEFAULT);
        assertArrayEquals(stress.stress().eastward().values(), s.stress().eastward().values());
        assertArrayEquals(stress.stress().northward().values(), s.stress().northward().values());
        assertArrayEquals(pumping.stressCurl().values(), s.stressCurl().values());
        assertArrayEquals(transport.transport().eastward().values(), s.ekmanTransport().eastward().values());
        assertArrayEquals(transport.transport().northward().values(), s.ekmanTransport().northward().values());
        assertArrayEquals(pumping.pumping().values(), s.ekmanPumping().values());
        assertEquals(stress.outOfRangeCells(), s.dragOutOfRangeCells());
        assertEquals(transport.cutoffCells(), s.cutoffCells());
        assertEquals(pumping.cutoffCells(), s.cutoffCells());
        assertTrue(s.dragOutOfRangeCells() > 0, "the test wind includes speeds outside 4–25 m/s");
        // rows −5 … 3 lie within |φ| < 5°: rows at −3, −1, 1, 3 → 4 rows × 30 cells (no land there)
        assertEquals(4 * 30, s.cutoffCells());
    }

    @Test
    void carriesNamesAndUnits() {
        SurfaceResponse.Step s = SurfaceResponse.ofWind(wind(), LAW, C, EquatorialCutoff.DEFAULT);
        assertEquals("surface_downward_eastward_stress", s.stress().eastward().name());
        assertEquals("surface_downward_northward_stress", s.stress().northward().name());
        assertEquals("Pa", s.stress().units());
        assertEquals("N m-3", s.stressCurl().units());
        assertEquals("m2 s-1", s.ekmanTransport().units());
        assertEquals("ekman_pumping_velocity", s.ekmanPumping().name());
        assertEquals("m s-1", s.ekmanPumping().units());
        assertTrue(s.ekmanPumping().longName().contains("positive upward"));
    }

    @Test
    void landAndMissingNeverProduceNumbersAndNothingIsInfinite() {
        VectorField wind = wind();
        LonLatGrid g = wind.grid();
        SurfaceResponse.Step s = SurfaceResponse.ofWind(wind, LAW, C, EquatorialCutoff.DEFAULT);
        double[][] outputs = {s.stress().eastward().values(), s.stress().northward().values(), s.stressCurl().values(),
                s.ekmanTransport().eastward().values(), s.ekmanTransport().northward().values(), s.ekmanPumping().values()};
        for (int k = 0; k < g.size(); k++) {
            boolean missing = !g.isOcean(k) || Double.isNaN(wind.eastward().values()[k]);
            for (double[] o : outputs) {
                assertFalse(Double.isInfinite(o[k]), "infinite at " + k);
                if (missing) assertTrue(Double.isNaN(o[k]), "land/missing cell " + k + " must stay NaN");
            }
        }
    }

    @Test
    void fromStressMatchesFromWindAndIsReproducible() {
        VectorField wind = wind();
        SurfaceResponse response = new SurfaceResponse(LAW, C, EquatorialCutoff.DEFAULT);
        SurfaceResponse.Step a = response.fromWind(wind);
        SurfaceResponse.Step b = SurfaceResponse.ofStress(a.stress(), C, EquatorialCutoff.DEFAULT);
        assertArrayEquals(a.ekmanPumping().values(), b.ekmanPumping().values());
        assertArrayEquals(a.ekmanTransport().northward().values(), b.ekmanTransport().northward().values());
        assertEquals(0, b.dragOutOfRangeCells());
        // reuse of one instance across grids and repeated calls: identical results
        LonLatGrid other = LonLatGrid.covering(0, 10, 20, 30, 1, C.earthRadius());
        double[] ones = new double[other.size()];
        Arrays.fill(ones, 7.0);
        response.fromWind(new VectorField(new ScalarField(other, ones, "u", "m s-1", null),
                new ScalarField(other, ones.clone(), "v", "m s-1", null)));
        SurfaceResponse.Step c = response.fromWind(wind);
        assertArrayEquals(a.ekmanPumping().values(), c.ekmanPumping().values());
        assertArrayEquals(a.stressCurl().values(), c.stressCurl().values());
    }

    @Test
    void rejectsWrongUnitsAndMissingDragLaw() {
        VectorField wind = wind();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> SurfaceResponse.ofStress(wind, C, EquatorialCutoff.DEFAULT));
        assertTrue(e.getMessage().contains("u10") && e.getMessage().contains("Pa"), e.getMessage());
        assertThrows(IllegalStateException.class,
                () -> new SurfaceResponse(null, C, EquatorialCutoff.DEFAULT).fromWind(wind));
    }

    @Test
    void reusedOutputArraysGiveTheSameBitsAndAreOnlyReusedOnTheSameGrid() {
        VectorField wind = wind();
        SurfaceResponse response = new SurfaceResponse(LAW, C, EquatorialCutoff.DEFAULT);
        SurfaceResponse.Step fresh = response.fromWind(wind);
        // a previous step filled with other values must be overwritten completely
        double[] u2 = wind.eastward().values().clone(), v2 = wind.northward().values().clone();
        for (int k = 0; k < u2.length; k++) { u2[k] = -2 * u2[k] + 1; v2[k] = 0.5 * v2[k]; }
        LonLatGrid g = wind.grid();
        SurfaceResponse.Step prev = response.fromWind(new VectorField(new ScalarField(g, u2, "u10", "m s-1", null),
                new ScalarField(g, v2, "v10", "m s-1", null)));
        double[] prevPumping = prev.ekmanPumping().values();
        SurfaceResponse.Step reused = response.fromWind(wind, prev);
        assertSame(prevPumping, reused.ekmanPumping().values(), "arrays of the previous step are reused");
        assertArrayEquals(fresh.stress().eastward().values(), reused.stress().eastward().values());
        assertArrayEquals(fresh.stress().northward().values(), reused.stress().northward().values());
        assertArrayEquals(fresh.stressCurl().values(), reused.stressCurl().values());
        assertArrayEquals(fresh.ekmanTransport().eastward().values(), reused.ekmanTransport().eastward().values());
        assertArrayEquals(fresh.ekmanTransport().northward().values(), reused.ekmanTransport().northward().values());
        assertArrayEquals(fresh.ekmanPumping().values(), reused.ekmanPumping().values());
        assertEquals(fresh.cutoffCells(), reused.cutoffCells());
        assertEquals(fresh.dragOutOfRangeCells(), reused.dragOutOfRangeCells());
        // from stress, reusing the same step (input and output share the stress arrays): still the same bits
        SurfaceResponse.Step again = response.fromStress(reused.stress(), reused);
        assertArrayEquals(fresh.ekmanPumping().values(), again.ekmanPumping().values());
        // another grid object (same geometry, other mask): new arrays, not the old ones
        boolean[] mask = g.oceanMask();
        mask[g.index(10, 10)] = false;
        LonLatGrid g2 = g.withOcean(mask);
        SurfaceResponse.Step other = response.fromWind(new VectorField(
                new ScalarField(g2, wind.eastward().values(), "u10", "m s-1", null),
                new ScalarField(g2, wind.northward().values(), "v10", "m s-1", null)), reused);
        assertNotSame(reused.ekmanPumping().values(), other.ekmanPumping().values());
        assertTrue(Double.isNaN(other.ekmanPumping().values()[g.index(10, 10)]), "the new mask is honoured");
    }

    @Test
    void cutoffCountFollowsTheMaskOfEachGrid() {
        VectorField wind = wind();
        LonLatGrid g = wind.grid();
        boolean[] mask = g.oceanMask();
        for (int i = 0; i < 7; i++) mask[g.index(i, 9)] = false; // row 9 is at −1°, inside the cut-off
        LonLatGrid g2 = g.withOcean(mask);
        SurfaceResponse response = new SurfaceResponse(LAW, C, EquatorialCutoff.DEFAULT);
        assertEquals(4 * 30, response.fromWind(wind).cutoffCells());
        VectorField w2 = new VectorField(new ScalarField(g2, wind.eastward().values(), "u10", "m s-1", null),
                new ScalarField(g2, wind.northward().values(), "v10", "m s-1", null));
        double[] ue = new double[g2.size()], ve = new double[g2.size()];
        double[] tx = new double[g2.size()], ty = new double[g2.size()];
        WindStress.compute(g2, w2.eastward().values(), w2.northward().values(), LAW, C.rhoAir(), tx, ty);
        int expected = EkmanTransport.compute(g2, tx, ty, C, EquatorialCutoff.DEFAULT, ue, ve);
        assertEquals(4 * 30 - 7, expected);
        assertEquals(expected, response.fromWind(w2).cutoffCells());
    }
}
