package org.gyreplan.solver.atmos;

import org.gyreplan.solver.PhysicalConstants;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

/**
 * Gradient wind (Holton, An Introduction to Dynamic Meteorology, ch. 3, eqs. 3.15–3.17, Table 3.1; AMS Glossary
 * "gradient wind") against CHECKS.md §5 GW-01…GW-05 (derived by arithmetic; rel 1e-5, GW-05 rel 1e-4).
 */
class GradientWindTest {
    private static final PhysicalConstants C = PhysicalConstants.DEFAULT.withRhoAir(1.225);

    @Test
    void gw01() {
        assertEquals(8.5742, GradientWind.aroundLow(10, 500e3, 45, C).speed(), 8.5742 * 1e-5);
        GradientWind high = GradientWind.aroundHigh(10, 500e3, 45, C);
        assertEquals(GradientWindStatus.REGULAR, high.status());
        assertEquals(13.5727, high.speed(), 13.5727 * 1e-5);
    }

    @Test
    void gw02LimitsOfAHigh() {
        assertEquals(25.7815, GradientWind.maxSpeedInHigh(500e3, 45, C), 25.7815 * 1e-5);
        assertEquals(12.8908, GradientWind.maxGeostrophicSpeedInHigh(500e3, 45, C), 12.8908 * 1e-5);
        assertEquals(1.6285e-3, GradientWind.maxPressureGradientInHigh(500e3, 45, C), 1.6285e-3 * 1e-5 + 5e-9);
    }

    @Test
    void gw03() {
        assertEquals(9.1824, GradientWind.aroundLow(10, 1000e3, 45, C).speed(), 9.1824 * 1e-5);
        assertEquals(11.2209, GradientWind.aroundHigh(10, 1000e3, 45, C).speed(), 11.2209 * 1e-5);
        assertEquals(51.563, GradientWind.maxSpeedInHigh(1000e3, 45, C), 51.563 * 1e-5);
        // 3.2570 hPa per 100 km = 3.2570e-3 Pa/m
        assertEquals(3.2570e-3, GradientWind.maxPressureGradientInHigh(1000e3, 45, C), 3.2570e-3 * 1e-5 + 5e-9);
    }

    @Test
    void gw04NoRegularSolutionAroundAStrongHigh() {
        // 30°N, r = 500 km: |f| r / 4 = 9.1151 m/s < V_g = 10 → no real root, reported explicitly
        assertEquals(9.1151, GradientWind.maxGeostrophicSpeedInHigh(500e3, 30, C), 9.1151 * 1e-5);
        GradientWind high = GradientWind.aroundHigh(10, 500e3, 30, C);
        assertEquals(GradientWindStatus.NO_REGULAR_SOLUTION, high.status());
        assertFalse(high.hasSolution());
        assertTrue(Double.isNaN(high.speed()) && Double.isNaN(high.anomalousSpeed()));
        assertFalse(high.status().text().isBlank());
        GradientWind low = GradientWind.aroundLow(10, 500e3, 30, C);
        assertEquals(GradientWindStatus.REGULAR, low.status());
        assertEquals(8.1695, low.speed(), 8.1695 * 1e-5);
    }

    @Test
    void gw05JustBelowTheLimit() {
        GradientWind high = GradientWind.aroundHigh(12.89, 500e3, 45, C);
        assertEquals(25.5836, high.speed(), 25.5836 * 1e-4);
        // at the limit the regular and anomalous roots meet at |f| r / 2
        GradientWind limit = GradientWind.aroundHigh(GradientWind.maxGeostrophicSpeedInHigh(500e3, 45, C), 500e3, 45, C);
        assertEquals(GradientWindStatus.REGULAR, limit.status());
        assertEquals(25.7815, limit.speed(), 25.7815 * 1e-5);
        assertEquals(limit.speed(), limit.anomalousSpeed(), 1e-6);
    }

    @Test
    void rootsSatisfyTheBalanceInBothHemispheres() {
        // Residual of V²/r ± |f|V ∓ |f|V_g = 0 (Holton eq. 3.15 in magnitudes); sub-geostrophic low, super-geostrophic high
        for (double lat : new double[] {-50, -20, 20, 50}) {
            double f = Math.abs(C.coriolis(lat)), r = 800e3, vg = 8;
            double lo = GradientWind.aroundLow(vg, r, lat, C).speed();
            GradientWind hi = GradientWind.aroundHigh(vg, r, lat, C);
            assertEquals(0.0, lo * lo / r + f * lo - f * vg, 1e-15);
            assertEquals(0.0, hi.speed() * hi.speed() / r - f * hi.speed() + f * vg, 1e-15);
            assertEquals(0.0, hi.anomalousSpeed() * hi.anomalousSpeed() / r - f * hi.anomalousSpeed() + f * vg, 1e-15);
            assertTrue(lo < vg && hi.speed() > vg && hi.anomalousSpeed() > f * r / 2);
            assertEquals(lo, GradientWind.aroundLow(vg, r, -lat, C).speed(), 0.0);
        }
    }

    @Test
    void undefinedAtTheEquatorAndForBadInput() {
        assertEquals(GradientWindStatus.UNDEFINED, GradientWind.aroundLow(10, 500e3, 0, C).status());
        assertEquals(GradientWindStatus.UNDEFINED, GradientWind.aroundHigh(10, 500e3, Double.NaN, C).status());
        assertEquals(GradientWindStatus.UNDEFINED, GradientWind.aroundHigh(10, -5, 45, C).status());
        assertEquals(GradientWindStatus.UNDEFINED, GradientWind.aroundLow(-1, 500e3, 45, C).status());
    }
}
