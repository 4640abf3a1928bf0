package org.gyreplan.solver.ekman;

import org.gyreplan.solver.PhysicalConstants;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

/**
 * The Ekman spiral (Stewart, Introduction to Physical Oceanography, eqs. 9.9–9.15) against CHECKS.md §3 EK-06…EK-11:
 * τ = 0.1 N/m² toward north at 45°N, A_z = 0.05 m²/s, ρ₀ = 1025 kg/m³ (values derived by arithmetic).
 */
class EkmanSpiralTest {
    private static final PhysicalConstants C = PhysicalConstants.DEFAULT;
    private static final EkmanSpiral NORTH_45 = EkmanSpiral.of(0, 0.1, 0.05, 45, C);

    /** Bearing (degrees clockwise from north, [0, 360)) a current (u, v) points toward. */
    private static double bearing(double u, double v) {
        double b = Math.toDegrees(Math.atan2(u, v));
        return b < 0 ? b + 360 : b;
    }

    @Test
    void ek06SurfaceSpeed() {
        // EK-06: V₀ = τ/(ρ₀√(f A_z)) = 0.0961 / 0.042964 / 0.0304 m/s for A_z = 0.01 / 0.05 / 0.1 (rel 1e-3)
        assertEquals(0.0961, EkmanSpiral.of(0, 0.1, 0.01, 45, C).surfaceSpeed(), 0.0961 * 1e-3);
        assertEquals(0.042964, NORTH_45.surfaceSpeed(), 0.042964 * 1e-3);
        assertEquals(0.0304, EkmanSpiral.of(0, 0.1, 0.1, 45, C).surfaceSpeed(), 0.0304 * 1e-3);
    }

    @Test
    void ek07Surface() {
        // EK-07: u = v = 0.030380 m/s, speed 0.042964, 45° right of the (northward) wind; rel 1e-4
        assertEquals(0.030380, NORTH_45.eastwardAt(0), 0.030380 * 1e-4);
        assertEquals(0.030380, NORTH_45.northwardAt(0), 0.030380 * 1e-4);
        assertEquals(0.042964, NORTH_45.speedAt(0), 0.042964 * 1e-4);
        assertEquals(45.0, bearing(NORTH_45.eastwardAt(0), NORTH_45.northwardAt(0)), 1e-9);
    }

    @Test
    void ek08QuarterDepth() {
        // EK-08: z = −D_E/4 = −24.457 m: u = 0.019589, v = 0 (90° right of the wind); abs 1e-6
        double z = -NORTH_45.ekmanDepth() / 4;
        assertEquals(-24.457, z, 24.457 * 1e-4);
        assertEquals(0.019589, NORTH_45.eastwardAt(z), 1e-6);
        assertEquals(0.0, NORTH_45.northwardAt(z), 1e-6);
    }

    @Test
    void ek09HalfDepth() {
        // EK-09: z = −D_E/2 = −48.914 m: speed 0.008931 m/s, 135° right of the wind; rel 1e-4
        double z = -NORTH_45.ekmanDepth() / 2;
        assertEquals(-48.914, z, 48.914 * 1e-4);
        assertEquals(0.008931, NORTH_45.speedAt(z), 0.008931 * 1e-4);
        assertEquals(135.0, bearing(NORTH_45.eastwardAt(z), NORTH_45.northwardAt(z)), 1e-9);
    }

    @Test
    void ek10EkmanDepth() {
        // EK-10: z = −D_E = −97.829 m: speed e^(−π)V₀ = 0.001857 m/s, opposite to the surface current; rel 1e-4
        double z = -NORTH_45.ekmanDepth();
        assertEquals(-97.829, z, 97.829 * 1e-4);
        assertEquals(0.001857, NORTH_45.speedAt(z), 0.001857 * 1e-3);  // the 4-digit value is rounded: 1e-3
        assertEquals(Math.exp(-Math.PI) * NORTH_45.surfaceSpeed(), NORTH_45.speedAt(z), 1e-15);
        assertEquals(225.0, bearing(NORTH_45.eastwardAt(z), NORTH_45.northwardAt(z)), 1e-9);
    }

    /** ∫ from −depth to 0 of the profile by composite Simpson with n (even) intervals. */
    private static double[] integrate(EkmanSpiral s, double depth, int n) {
        double h = depth / n, su = 0, sv = 0;
        for (int k = 0; k <= n; k++) {
            double z = -k * h;
            double w = (k == 0 || k == n) ? 1 : (k % 2 == 1 ? 4 : 2);
            su += w * s.eastwardAt(z);
            sv += w * s.northwardAt(z);
        }
        return new double[] {su * h / 3, sv * h / 3};
    }

    @Test
    void ek11VerticalIntegralIsTheEkmanTransport() {
        // EK-11: ∫u dz = 0.946036 m²/s, ∫v dz ≈ 0, equal to τ/(ρ₀ f) (rel 1e-5). Quadrature to 10 D_E (e^(−10π) ≈ 2e-14).
        double[] m = integrate(NORTH_45, 10 * NORTH_45.ekmanDepth(), 20000);
        assertEquals(0.946036, m[0], 0.946036 * 1e-5);
        assertEquals(0.0, m[1], 0.946036 * 1e-5);
        EkmanTransport t = EkmanTransport.of(0, 0.1, 45, C);
        assertEquals(t.eastward(), m[0], t.magnitude() * 1e-6);
    }

    @Test
    void anyStressDirectionBothHemispheres() {
        // The spiral rotated to any stress direction: surface current 45° right (NH) / left (SH) of the stress,
        // speed V₀ = |τ|/(ρ₀√(|f|A_z)), integral equal to the Ekman transport (rel 1e-6 of its magnitude).
        for (double lat : new double[] {-60, -25, 12, 45}) {
            for (double dir = 0; dir < 360; dir += 30) {
                double tx = 0.08 * Math.sin(Math.toRadians(dir)), ty = 0.08 * Math.cos(Math.toRadians(dir));
                EkmanSpiral s = EkmanSpiral.of(tx, ty, 0.03, lat, C);
                double expectedBearing = (dir + (lat > 0 ? 45 : -45) + 360) % 360;
                double b = bearing(s.eastwardAt(0), s.northwardAt(0));
                double diff = Math.abs(((b - expectedBearing) % 360 + 540) % 360 - 180);
                assertEquals(0.0, diff, 1e-9, "surface bearing at lat " + lat + ", stress toward " + dir);
                double v0 = 0.08 / (C.rho0() * Math.sqrt(Math.abs(C.coriolis(lat)) * 0.03));
                assertEquals(v0, s.surfaceSpeed(), v0 * 1e-12);
                double[] m = integrate(s, 10 * s.ekmanDepth(), 20000);
                EkmanTransport t = EkmanTransport.of(tx, ty, lat, C);
                assertEquals(t.eastward(), m[0], t.magnitude() * 1e-6, "lat " + lat + " dir " + dir);
                assertEquals(t.northward(), m[1], t.magnitude() * 1e-6, "lat " + lat + " dir " + dir);
            }
        }
    }

    @Test
    void rotatesClockwiseWithDepthInNorthAndCounterClockwiseInSouth() {
        EkmanSpiral n = EkmanSpiral.of(0, 0.1, 0.05, 30, C);
        EkmanSpiral s = EkmanSpiral.of(0, 0.1, 0.05, -30, C);
        double z = -0.1 * n.ekmanDepth();
        double bn0 = bearing(n.eastwardAt(0), n.northwardAt(0)), bn1 = bearing(n.eastwardAt(z), n.northwardAt(z));
        double bs0 = bearing(s.eastwardAt(0), s.northwardAt(0)), bs1 = bearing(s.eastwardAt(z), s.northwardAt(z));
        assertEquals(18.0, bn1 - bn0, 1e-9, "NH: +0.1·180° clockwise");
        assertEquals(-18.0, bs1 - bs0, 1e-9, "SH: counter-clockwise");
    }

    @Test
    void surfaceCurrentRoundTrip() {
        // A spiral given by its surface current reproduces the profile and the driving stress of the stress form.
        for (double lat : new double[] {-35, 50}) {
            EkmanSpiral byStress = EkmanSpiral.of(0.06, -0.02, 0.04, lat, C);
            EkmanSpiral byCurrent = EkmanSpiral.fromSurfaceCurrent(byStress.surfaceEastward(), byStress.surfaceNorthward(),
                    0.04, lat, C, EquatorialCutoff.DEFAULT);
            for (double z = 0; z > -100; z -= 7) {
                assertEquals(byStress.eastwardAt(z), byCurrent.eastwardAt(z), 1e-15);
                assertEquals(byStress.northwardAt(z), byCurrent.northwardAt(z), 1e-15);
            }
            assertEquals(0.06, byCurrent.stress().eastwardPa(), 1e-14);
            assertEquals(-0.02, byCurrent.stress().northwardPa(), 1e-14);
            assertEquals(-0.02, byStress.stress().northwardPa(), 1e-14);
        }
    }

    @Test
    void cutoffAndBadInput() {
        EkmanSpiral eq = EkmanSpiral.of(0, 0.1, 0.05, 2, C);
        assertFalse(eq.isDefined());
        assertTrue(Double.isNaN(eq.eastwardAt(-10)) && Double.isNaN(eq.surfaceSpeed()));
        assertTrue(NORTH_45.isDefined());
        assertThrows(IllegalArgumentException.class, () -> NORTH_45.eastwardAt(1.0));
        assertThrows(IllegalArgumentException.class, () -> EkmanSpiral.of(0, 0.1, 0, 45, C));
    }
}
