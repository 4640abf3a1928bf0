package org.gyreplan.solver.ekman;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

/** The equatorial cut-off band |φ| &lt; φ_c (common practice; default 5°). */
class EquatorialCutoffTest {
    @Test
    void defaultBand() {
        EquatorialCutoff c = EquatorialCutoff.DEFAULT;
        assertEquals(5.0, c.latitudeDeg());
        assertTrue(c.applies(0));
        assertTrue(c.applies(-0.0));
        assertTrue(c.applies(4.9999));
        assertTrue(c.applies(-4.9999));
        assertFalse(c.applies(5.0));
        assertFalse(c.applies(-5.0));
        assertTrue(c.applies(Double.NaN));
        assertFalse(c.applies(90));
    }

    @Test
    void zeroCutoffStillExcludesTheEquator() {
        EquatorialCutoff c = EquatorialCutoff.ofDegrees(0);
        assertTrue(c.applies(0));
        assertFalse(c.applies(1e-9));
    }

    @Test
    void rejectsInvalid() {
        assertThrows(IllegalArgumentException.class, () -> EquatorialCutoff.ofDegrees(-1));
        assertThrows(IllegalArgumentException.class, () -> EquatorialCutoff.ofDegrees(90));
        assertThrows(IllegalArgumentException.class, () -> EquatorialCutoff.ofDegrees(Double.NaN));
    }
}
