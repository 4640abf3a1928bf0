package org.gyreplan.solver.atmos;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.ekman.EkmanTransport;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;
import org.gyreplan.solver.stress.DragLaws;
import org.gyreplan.solver.stress.StressVector;
import org.gyreplan.solver.stress.WindStress;
import org.gyreplan.solver.stress.WindVector;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

/**
 * Surface wind from the geostrophic wind (0.7, 15° toward low pressure; Bakun 1973, from memory) and the full chain
 * pressure → geostrophic → surface wind → stress → Ekman transport against the intermediate values of CHECKS.md
 * UI-01 and UI-04 (derived by arithmetic; rel 1e-4, or the rounding of the 5-decimal values).
 */
class SurfaceWindFromGeostrophicTest {
    private static final PhysicalConstants C = PhysicalConstants.DEFAULT;   // ρₐ = 1.22, ρ₀ = 1025

    private static void near(double expected, double actual, String what) {
        assertEquals(expected, actual, Math.max(Math.abs(expected) * 1e-4, 5e-6), what);
    }

    @Test
    void ui01ChainAt36N() {
        // ∂p/∂x = −1 hPa/100 km, ∂p/∂y = 0 at 36°N; C_D = 0.0013
        WindVector geo = GeostrophicWind.of(-1e-3, 0, 36, C);
        near(0.0, geo.eastward(), "u_g");
        near(-9.56176, geo.northward(), "v_g");
        WindVector w = SurfaceWindFromGeostrophic.DEFAULT.apply(geo, 36);
        near(1.73234, w.eastward(), "u");
        near(-6.46517, w.northward(), "v");
        near(6.69323, w.speed(), "|W|");
        StressVector t = WindStress.of(w, DragLaws.byName("constant:0.0013"), C);
        near(0.01839, t.eastwardPa(), "tau_x");
        near(-0.06863, t.northwardPa(), "tau_y");
        EkmanTransport q = EkmanTransport.of(t.eastwardPa(), t.northwardPa(), 36, C);
        near(-0.78108, q.eastward(), "Q_x");
        near(-0.20929, q.northward(), "Q_y");
    }

    @Test
    void ui04ChainAt25S() {
        WindVector geo = GeostrophicWind.of(-1e-3, 0, -25, C);
        near(13.29868, geo.northward(), "v_g");
        WindVector w = SurfaceWindFromGeostrophic.DEFAULT.apply(geo, -25);
        near(2.40937, w.eastward(), "u");
        near(8.99187, w.northward(), "v");
        StressVector t = WindStress.of(w, DragLaws.constant(1.3e-3), C);
        EkmanTransport q = EkmanTransport.of(t.eastwardPa(), t.northwardPa(), -25, C);
        near(-2.10138, q.eastward(), "Q_x");
        near(0.56306, q.northward(), "Q_y");
    }

    @Test
    void turnsTowardLowPressureInBothHemispheres() {
        // Pressure rising northward (low to the south). The surface wind must gain a component toward the low
        // (southward): counter-clockwise turning in the NH, clockwise in the SH (CHECKS pitfall 5).
        WindVector nGeo = GeostrophicWind.of(0, 1e-3, 40, C);
        WindVector n = SurfaceWindFromGeostrophic.DEFAULT.apply(nGeo, 40);
        assertTrue(n.northward() < 0, "NH: toward the low");
        WindVector sGeo = GeostrophicWind.of(0, 1e-3, -40, C);
        WindVector s = SurfaceWindFromGeostrophic.DEFAULT.apply(sGeo, -40);
        assertTrue(s.northward() < 0, "SH: toward the low");
        assertEquals(0.7 * nGeo.speed(), n.speed(), 1e-12);
        double turn = Math.toDegrees(Math.atan2(nGeo.eastward() * n.northward() - nGeo.northward() * n.eastward(),
                nGeo.eastward() * n.eastward() + nGeo.northward() * n.northward()));
        assertEquals(15.0, turn, 1e-9, "NH counter-clockwise by 15°");
    }

    @Test
    void configurableAndValidated() {
        SurfaceWindFromGeostrophic none = new SurfaceWindFromGeostrophic(1.0, 0.0);
        WindVector w = none.apply(3, 4, 45);
        assertEquals(3, w.eastward(), 0.0);
        assertEquals(4, w.northward(), 0.0);
        assertThrows(IllegalArgumentException.class, () -> new SurfaceWindFromGeostrophic(0, 15));
        assertThrows(IllegalArgumentException.class, () -> new SurfaceWindFromGeostrophic(0.7, 95));
    }

    @Test
    void fieldFormMatchesPointForm() {
        LonLatGrid g = LonLatGrid.covering(0, 30, -40, 40, 10, C.earthRadius());   // rows −35 … 35 (both hemispheres)
        double[] u = new double[g.size()], v = new double[g.size()];
        for (int k = 0; k < u.length; k++) { u[k] = 5 + k; v[k] = -3 + 0.5 * k; }
        u[2] = Double.NaN;
        VectorField geo = new VectorField(new ScalarField(g, u, "ug", "m s-1", null), new ScalarField(g, v, "vg", "m s-1", null));
        VectorField surf = SurfaceWindFromGeostrophic.DEFAULT.apply(geo);
        for (int j = 0; j < g.ny(); j++) {
            for (int i = 0; i < g.nx(); i++) {
                int k = g.index(i, j);
                WindVector p = SurfaceWindFromGeostrophic.DEFAULT.apply(u[k], v[k], g.latDeg(j));
                assertEquals(p.eastward(), surf.eastward().values()[k], 1e-12);
                assertEquals(p.northward(), surf.northward().values()[k], 1e-12);
            }
        }
        assertTrue(Double.isNaN(surf.eastward().values()[2]));
        assertEquals("eastward_wind", surf.eastward().name());
    }
}
