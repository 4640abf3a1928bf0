package org.gyreplan.solver.ekman;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

import static org.junit.jupiter.api.Assertions.*;

/**
 * Ekman transport Uₑ = τᵧ/(ρ₀f), Vₑ = −τₓ/(ρ₀f) (Stewart, Introduction to Physical Oceanography, eq. 9.26)
 * against CHECKS.md §3 EK-01…EK-04 (derived by arithmetic with Ω = 7.292115e-5 s⁻¹; tolerance rel 1e-6 / 1e-5 as
 * listed), plus the symmetry properties of the formula.
 */
class EkmanTransportTest {
    private static final PhysicalConstants C = PhysicalConstants.DEFAULT;

    @Test
    void ek01MassTransport() {
        // EK-01: |τ|/|f| = 969.687 kg m⁻¹ s⁻¹ for τ = 0.1 N/m² at 45°N (rel 1e-6)
        EkmanTransport t = EkmanTransport.of(0.1, 0, 45, C);
        assertEquals(969.687, t.magnitude() * C.rho0(), 969.687 * 1e-6);
    }

    @Test
    void ek02VolumeTransportAndDensities() {
        // EK-02: 0.94604 m²/s with ρ₀ = 1025; EK-02b: 0.94419 (1027) / 0.96969 (1000) (rel 1e-5: 5-digit values)
        assertEquals(0.94604, EkmanTransport.of(0.1, 0, 45, C).magnitude(), 0.94604 * 1e-5);
        assertEquals(0.94419, EkmanTransport.of(0.1, 0, 45, C.withRho0(1027)).magnitude(), 0.94419 * 1e-5);
        assertEquals(0.96969, EkmanTransport.of(0.1, 0, 45, C.withRho0(1000)).magnitude(), 0.96969 * 1e-5);
        // = 94.604 m³/s per 100 m of coastline
        assertEquals(94.604, 100 * EkmanTransport.of(0.1, 0, 45, C).magnitude(), 94.604 * 1e-5);
    }

    @ParameterizedTest(name = "EK-03 at {0}°N")
    @CsvSource({"15, 2.58462", "30, 1.33790", "45, 0.94604", "60, 0.77244"})
    void ek03VersusLatitude(double lat, double expected) {
        // eastward stress in the NH: transport to the right, i.e. southward
        EkmanTransport t = EkmanTransport.of(0.1, 0, lat, C);
        assertEquals(0.0, t.eastward(), 0.0);
        assertEquals(-expected, t.northward(), expected * 1e-5);
    }

    @Test
    void ek04SouthernHemisphereLeftOfStress() {
        // EK-04: τ = 0.1 N/m² toward north at 25°S → 1.58287 m²/s toward WEST (left of the stress), rel 1e-5
        EkmanTransport t = EkmanTransport.of(0, 0.1, -25, C);
        assertEquals(-1.58287, t.eastward(), 1.58287 * 1e-5);
        assertEquals(0.0, t.northward(), 1e-15);
    }

    @Test
    void sv03EkmanTransportAcross26N() {
        // CHECKS.md SV-03 (D, assumed inputs): zonal-mean τₓ = −0.05 N/m² over 6000 km at 26.5°N → 4.50 Sv northward
        // (rel 1e-3). Plausibility against the RAPID array's Ekman component 3.2 ± 3.4 Sv (2004–2014, CHECKS OBS-02):
        // within one standard deviation.
        double sv = EkmanTransport.of(-0.05, 0, 26.5, C).northward() * 6000e3 / 1e6;
        assertEquals(4.50, sv, 4.50 * 1e-3);
        assertTrue(Math.abs(sv - 3.2) <= 3.4);
    }

    @Test
    void northernHemisphereRightOfStressForEveryDirection() {
        for (double dir = 0; dir < 360; dir += 15) {
            double tx = 0.1 * Math.sin(Math.toRadians(dir)), ty = 0.1 * Math.cos(Math.toRadians(dir));
            EkmanTransport n = EkmanTransport.of(tx, ty, 40, C);
            // z-component of stress × transport is negative when the transport is to the right of the stress
            assertTrue(tx * n.northward() - ty * n.eastward() < 0, "NH right of stress at " + dir);
            assertEquals(0.0, tx * n.eastward() + ty * n.northward(), 1e-15, "perpendicular");
            EkmanTransport s = EkmanTransport.of(tx, ty, -40, C);
            assertTrue(tx * s.northward() - ty * s.eastward() > 0, "SH left of stress at " + dir);
        }
    }

    @Test
    void reversedWindReversesTransport() {
        EkmanTransport a = EkmanTransport.of(0.07, -0.03, 33, C);
        EkmanTransport b = EkmanTransport.of(-0.07, 0.03, 33, C);
        assertEquals(-a.eastward(), b.eastward(), 0.0);
        assertEquals(-a.northward(), b.northward(), 0.0);
    }

    @Test
    void mirroredHemisphereGivesMirroredTransport() {
        // Reflecting the stress across the equator (τₓ, τᵧ) at φ → (τₓ, −τᵧ) at −φ reflects the transport (Uₑ, −Vₑ).
        EkmanTransport n = EkmanTransport.of(0.07, 0.05, 27, C);
        EkmanTransport s = EkmanTransport.of(0.07, -0.05, -27, C);
        assertEquals(n.eastward(), s.eastward(), Math.abs(n.eastward()) * 1e-15);
        assertEquals(-n.northward(), s.northward(), Math.abs(n.northward()) * 1e-15);
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.0, -0.0, 1e-12, 4.999, -4.999, Double.NaN})
    void insideCutoffIsNaNNeverInfinite(double lat) {
        EkmanTransport t = EkmanTransport.of(0.1, 0.1, lat, C);
        assertFalse(t.isDefined());
        assertTrue(Double.isNaN(t.eastward()) && Double.isNaN(t.northward()));
    }

    @Test
    void cutoffBoundaryIsDefinedAndConfigurable() {
        assertTrue(EkmanTransport.of(0.1, 0, 5.0, C).isDefined(), "±cut-off itself lies outside the band");
        assertTrue(EkmanTransport.of(0.1, 0, -5.0, C).isDefined());
        EquatorialCutoff three = EquatorialCutoff.ofDegrees(3);
        assertTrue(EkmanTransport.of(0.1, 0, 4, C, three).isDefined());
        assertFalse(EkmanTransport.of(0.1, 0, 2.9, C, three).isDefined());
        EquatorialCutoff none = EquatorialCutoff.ofDegrees(0);
        assertFalse(EkmanTransport.of(0.1, 0, 0, C, none).isDefined(), "f = 0 is always excluded");
        assertTrue(Double.isFinite(EkmanTransport.of(0.1, 0, 0.01, C, none).northward()));
    }

    @Test
    void fieldMasksLandAndCountsCutoffCells() {
        boolean[] ocean = new boolean[4 * 9];
        java.util.Arrays.fill(ocean, true);
        ocean[0] = false;                                   // one land cell at −8°
        LonLatGrid g = new LonLatGrid(4, 9, 0.5, -8, 1, 2, 6.371e6, ocean);   // rows at −8, −6, …, 8
        double[] tx = new double[g.size()], ty = new double[g.size()];
        java.util.Arrays.fill(tx, 0.1);
        java.util.Arrays.fill(ty, -0.05);
        tx[0] = Double.NaN;
        ty[0] = Double.NaN;
        VectorField stress = new VectorField(new ScalarField(g, tx, "tx", "Pa", null), new ScalarField(g, ty, "ty", "Pa", null));
        EkmanTransport.Field f = EkmanTransport.field(stress, C, EquatorialCutoff.DEFAULT);
        // rows −4, −2, 0, 2, 4 are inside the 5° cut-off: 5 rows × 4 cells
        assertEquals(20, f.cutoffCells());
        for (int j = 0; j < g.ny(); j++) {
            for (int i = 0; i < g.nx(); i++) {
                int k = g.index(i, j);
                double ue = f.transport().eastward().values()[k], ve = f.transport().northward().values()[k];
                assertFalse(Double.isInfinite(ue) || Double.isInfinite(ve));
                if (!g.isOcean(k) || Math.abs(g.latDeg(j)) < 5) {
                    assertTrue(Double.isNaN(ue) && Double.isNaN(ve), "masked cell " + i + "," + j);
                } else {
                    EkmanTransport p = EkmanTransport.of(0.1, -0.05, g.latDeg(j), C);
                    assertEquals(p.eastward(), ue, Math.abs(p.eastward()) * 1e-15);
                    assertEquals(p.northward(), ve, Math.abs(p.northward()) * 1e-15);
                }
            }
        }
        assertEquals("m2 s-1", f.transport().units());
    }
}
