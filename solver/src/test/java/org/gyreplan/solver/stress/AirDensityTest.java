package org.gyreplan.solver.stress;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

/** Air density from the ideal-gas law with virtual temperature (common practice; Bolton 1980 for e_s). */
class AirDensityTest {

    @Test
    void isaSeaLevelDry() {
        // CHECKS.md RD-02: ISA sea level 288.15 K, 101 325 Pa → 1.225 kg/m³ (ISO 2533; table value to 4 digits).
        assertEquals(1.225, AirDensity.dry(288.15, 101325), 5e-5);
        assertEquals(AirDensity.dry(288.15, 101325), AirDensity.withSpecificHumidity(288.15, 101325, 0), 0.0);
        assertEquals(AirDensity.dry(288.15, 101325), AirDensity.withRelativeHumidity(288.15, 101325, 0), 0.0);
    }

    @Test
    void moistAirEqualsTheSumOfPartialDensities() {
        // Dalton's law (common practice): ρ = (p − e)/(R_d T) + e/(R_v T), R_v = R_d/ε. Independent form of the same
        // physics; agreement to floating-point precision (rel 1e-12).
        double t = 298.15, p = 100800, q = 0.015;
        double e = q * p / (AirDensity.EPSILON + (1 - AirDensity.EPSILON) * q);
        double rv = AirDensity.R_DRY / AirDensity.EPSILON;
        double expected = (p - e) / (AirDensity.R_DRY * t) + e / (rv * t);
        assertEquals(expected, AirDensity.withSpecificHumidity(t, p, q), expected * 1e-12);
        assertTrue(AirDensity.withSpecificHumidity(t, p, q) < AirDensity.dry(t, p), "moist air is lighter");
    }

    @Test
    void saturatedWarmAir() {
        // Bolton (1980) eq. 10 at 30 °C: e_s ≈ 4246 Pa (tables of saturation vapour pressure give 4.246 kPa, from
        // memory; tol 0.3 %). Saturated air at 30 °C, 1013.25 hPa ≈ 1.146 kg/m³ (from memory, tol 0.2 %).
        assertEquals(4246, AirDensity.saturationVapourPressure(303.15), 4246 * 3e-3);
        assertEquals(1.146, AirDensity.withRelativeHumidity(303.15, 101325, 1.0), 1.146 * 2e-3);
    }

    @Test
    void badInputNamesTheQuantity() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> AirDensity.dry(15, 101325));
        assertTrue(e.getMessage().contains("kelvin"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> AirDensity.dry(288.15, 1013.25));
        assertTrue(e.getMessage().contains("pascal"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> AirDensity.withRelativeHumidity(288.15, 101325, 80));
        assertThrows(IllegalArgumentException.class, () -> AirDensity.withSpecificHumidity(288.15, 101325, -0.01));
    }
}
