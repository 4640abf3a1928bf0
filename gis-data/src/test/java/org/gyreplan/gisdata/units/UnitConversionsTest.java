package org.gyreplan.gisdata.units;

import org.gyreplan.gisdata.units.UnitConversions.Quantity;
import org.gyreplan.gisdata.units.UnitConversions.UnknownUnitsException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

/**
 * Unit definitions: 1 knot = 1852 m h⁻¹ (international nautical mile, 1929); 1 hPa = 1 mbar = 100 Pa;
 * 1 dyn cm⁻² = 0.1 Pa; 1 ft = 0.3048 m (1959 agreement); 1 fathom = 6 ft. Source: NIST SP 811 (2008), appendix B.
 * Tolerance: 1e-12 relative (floating-point arithmetic).
 */
class UnitConversionsTest {
    private static void close(double expected, double actual) {
        assertEquals(expected, actual, 1e-12 * Math.abs(expected));
    }

    @Test
    void windSpeeds() {
        close(1.0, UnitConversions.factorToSI(Quantity.SPEED, "m/s"));
        close(1.0, UnitConversions.factorToSI(Quantity.SPEED, "M/S"));
        close(1.0, UnitConversions.factorToSI(Quantity.SPEED, "m s-1"));
        close(1.0, UnitConversions.factorToSI(Quantity.SPEED, "m s**-1"));
        close(1.0, UnitConversions.factorToSI(Quantity.SPEED, "meters/second"));
        close(10 * 1852.0 / 3600.0, UnitConversions.toSI(Quantity.SPEED, "knots", 10)); // 5.1444 m/s
        close(10 * 1852.0 / 3600.0, UnitConversions.toSI(Quantity.SPEED, "kt", 10));
        close(0.25, UnitConversions.toSI(Quantity.SPEED, "cm/s", 25));
        close(0.25, UnitConversions.toSI(Quantity.SPEED, "cm s-1", 25));
        close(10.0, UnitConversions.toSI(Quantity.SPEED, "km/h", 36));
    }

    @Test
    void pressures() {
        close(101325.0, UnitConversions.toSI(Quantity.PRESSURE, "hPa", 1013.25));
        close(101325.0, UnitConversions.toSI(Quantity.PRESSURE, "mbar", 1013.25));
        close(101325.0, UnitConversions.toSI(Quantity.PRESSURE, "MB", 1013.25));
        close(101325.0, UnitConversions.toSI(Quantity.PRESSURE, "millibars", 1013.25));
        close(101325.0, UnitConversions.toSI(Quantity.PRESSURE, "Pa", 101325));
        close(101325.0, UnitConversions.toSI(Quantity.PRESSURE, "kPa", 101.325));
    }

    @Test
    void stresses() {
        close(0.1, UnitConversions.toSI(Quantity.STRESS, "N/m2", 0.1));
        close(0.1, UnitConversions.toSI(Quantity.STRESS, "N m-2", 0.1));
        close(0.1, UnitConversions.toSI(Quantity.STRESS, "N m**-2", 0.1));
        close(0.1, UnitConversions.toSI(Quantity.STRESS, "dyn/cm2", 1.0));
        close(0.1, UnitConversions.toSI(Quantity.STRESS, "dyn cm-2", 1.0));
        close(0.1, UnitConversions.toSI(Quantity.STRESS, "Pa", 0.1));
    }

    @Test
    void lengths() {
        close(1.0, UnitConversions.factorToSI(Quantity.LENGTH, "METERS"));
        close(1.0, UnitConversions.factorToSI(Quantity.LENGTH, "metres"));
        close(1828.8, UnitConversions.toSI(Quantity.LENGTH, "fathoms", 1000));
        close(304.8, UnitConversions.toSI(Quantity.LENGTH, "ft", 1000));
        close(1.0, UnitConversions.fromSI(Quantity.LENGTH, "km", 1000));
    }

    @Test
    void unknownOrWrongQuantityUnitsAreClearErrors() {
        var e = assertThrows(UnknownUnitsException.class,
                () -> UnitConversions.factorToSI(Quantity.SPEED, "furlongs/fortnight", "variable 'u' in w.nc"));
        assertTrue(e.getMessage().contains("furlongs/fortnight"), e.getMessage());
        assertTrue(e.getMessage().contains("variable 'u' in w.nc"), e.getMessage());
        assertTrue(e.getMessage().contains("knots"), "lists what is expected: " + e.getMessage());
        // a pressure unit is not a speed
        assertThrows(UnknownUnitsException.class, () -> UnitConversions.factorToSI(Quantity.SPEED, "hPa"));
        assertThrows(UnknownUnitsException.class, () -> UnitConversions.factorToSI(Quantity.STRESS, "m/s"));
        assertThrows(UnknownUnitsException.class, () -> UnitConversions.factorToSI(Quantity.PRESSURE, ""));
    }
}
