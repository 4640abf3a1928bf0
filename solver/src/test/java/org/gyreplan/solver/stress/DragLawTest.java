package org.gyreplan.solver.stress;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

/**
 * Drag coefficients against CHECKS.md §2b (10³·C_D derived by plain arithmetic from the published formulas of §2a;
 * tolerance rel 1e-4 = the table's 4-decimal rounding). A trailing '*' marks a speed outside the published
 * validity range (extrapolated), which {@link DragLaw#inValidRange} must report.
 * Formula sources: Large &amp; Pond 1981 (JPO 11); Trenberth, Large &amp; Olson 1990 (JPO 20, formula from memory);
 * Large &amp; Yeager 2004 (NCAR TN-460) and 2009 (Clim. Dyn. 33, cap from memory); Vera 1983 via Large, Morzel &amp;
 * Crawford 1995 eq. 8 (from memory); Smith 1980 (JPO 10, formula from memory); Yelland &amp; Taylor 1996 as quoted
 * by Stewart eq. 4.3; Garratt 1977 (MWR 105, attribution from memory).
 */
class DragLawTest {

    private static final List<DragLaw> COLUMNS = List.of(LargePond1981.INSTANCE, TrenberthLargeOlson1990.INSTANCE,
            LargeYeager2004.INSTANCE, LargeYeager2009.INSTANCE, Vera1983.INSTANCE, Smith1980.INSTANCE,
            YellandTaylor1996.INSTANCE, Garratt1977.INSTANCE);

    @ParameterizedTest(name = "CHECKS 2b at U = {0} m/s")
    @CsvSource(delimiter = '|', value = {
            " 3 | 1.2000* | 1.1400  | 1.2712  | 1.2712 | 1.2769  | 0.7990* | 2.1789  | 0.9510*",
            " 5 | 1.2000  | 1.1400  | 1.0640  | 1.0640 | 1.0674  | 0.9250* | 1.2180  | 1.0850",
            " 6 | 1.2000  | 1.1400  | 1.0504  | 1.0504 | 1.0532  | 0.9880  | 1.0260  | 1.1520",
            " 8 | 1.2000  | 1.1400  | 1.0907  | 1.0906 | 1.0928  | 1.1140  | 1.1680  | 1.2860",
            "10 | 1.2000  | 1.1400  | 1.1759  | 1.1756 | 1.1777  | 1.2400  | 1.3100  | 1.4200",
            "11 | 1.2050  | 1.2050  | 1.2278  | 1.2272 | 1.2294  | 1.3030  | 1.3810  | 1.4870",
            "15 | 1.4650  | 1.4650  | 1.4679  | 1.4643 | 1.4691  | 1.5550  | 1.6650  | 1.7550",
            "20 | 1.7900  | 1.7900  | 1.8049  | 1.7847 | 1.8059  | 1.8700  | 2.0200  | 2.0900",
            "25 | 2.1150  | 2.1150  | 2.1599  | 2.0830 | 2.1607  | 2.1850* | 2.3750  | 2.4250*",
            "33 | 2.6350* | 2.6350* | 2.7448* | 2.3400 | 2.7455* | 2.6890* | 2.9430* | 2.9610*"})
    void checksTable2b(double u, String lp, String tlo, String ly04, String ly09, String vera, String smith,
                       String yt, String garratt) {
        String[] cells = {lp, tlo, ly04, ly09, vera, smith, yt, garratt};
        for (int c = 0; c < cells.length; c++) {
            DragLaw law = COLUMNS.get(c);
            String cell = cells[c].trim();
            boolean starred = cell.endsWith("*");
            double expected = Double.parseDouble(starred ? cell.substring(0, cell.length() - 1) : cell) * 1e-3;
            assertEquals(expected, law.dragCoefficient(u), expected * 1e-4, law.id() + " at " + u + " m/s");
            assertEquals(!starred, law.inValidRange(u), law.id() + " range flag at " + u + " m/s");
        }
    }

    @Test
    void trenberthLowWindBranch() {
        // CHECKS.md §2b note (D from the TLO90 formula, formula from memory): 2.18 at U = 1, 1.40 at U = 2.
        DragLaw tlo = TrenberthLargeOlson1990.INSTANCE;
        assertEquals(2.18e-3, tlo.dragCoefficient(1.0), 1e-9);
        assertEquals(1.40e-3, tlo.dragCoefficient(2.0), 1e-9);
        assertEquals(2.18e-3, tlo.dragCoefficient(0.0), 1e-12);
        assertTrue(tlo.inValidRange(0.5));
    }

    @Test
    void largePond1981LowAndHighWindTreatment() {
        // Stated treatment: hold 1.2e-3 below 4 m/s, extrapolate the linear law above 25 m/s, flag both.
        DragLaw lp = LargePond1981.INSTANCE;
        assertEquals(1.2e-3, lp.dragCoefficient(0.0), 0.0);
        assertEquals(1.2e-3, lp.dragCoefficient(2.0), 0.0);
        assertFalse(lp.inValidRange(3.99));
        assertTrue(lp.inValidRange(4.0));
        assertTrue(lp.inValidRange(25.0));
        assertFalse(lp.inValidRange(25.01));
        assertEquals((0.49 + 0.065 * 40) * 1e-3, lp.dragCoefficient(40), 1e-15);
    }

    @Test
    void largeYeager2009CapAt33() {
        // Large & Yeager (2009): constant 2.34e-3 at and above 33 m/s (cap value from memory, CHECKS CD-LY09).
        assertEquals(2.34e-3, LargeYeager2009.INSTANCE.dragCoefficient(33.0), 0.0);
        assertEquals(2.34e-3, LargeYeager2009.INSTANCE.dragCoefficient(60.0), 0.0);
        // just below the cap the polynomial is within 0.1 % of the cap (continuity check, D)
        assertEquals(2.34e-3, LargeYeager2009.INSTANCE.dragCoefficient(32.999), 2.34e-3 * 1e-3);
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.0, 1e-9, 0.1, 0.49})
    void finiteCoefficientAndVanishingStressAsWindVanishes(double u) {
        for (DragLaw law : DragLaws.speedDependent()) {
            double cd = law.dragCoefficient(u);
            assertTrue(Double.isFinite(cd) && cd > 0 && cd < 0.01, law.id() + " C_D at " + u + " = " + cd);
            StressVector t = WindStress.of(u, 0, law, 1.225);
            assertTrue(Math.abs(t.eastwardPa()) <= 1.225 * 0.01 * u * u, law.id() + " stress must vanish with U");
        }
    }

    @Test
    void negativeSpeedIsMagnitudeAndNaNPropagates() {
        for (DragLaw law : DragLaws.speedDependent()) {
            assertEquals(law.dragCoefficient(12.0), law.dragCoefficient(-12.0), 0.0, law.id());
            assertTrue(Double.isNaN(law.dragCoefficient(Double.NaN)), law.id());
            assertFalse(law.inValidRange(Double.NaN), law.id());
        }
        assertTrue(Double.isNaN(DragLaws.constant(1.3e-3).dragCoefficient(Double.NaN)));
    }

    @Test
    void byNameResolvesEveryStableIdAndConstants() {
        for (DragLaw law : DragLaws.speedDependent()) {
            assertSame(law, DragLaws.byName(law.id()));
            assertSame(law, DragLaws.byName("  " + law.id().toUpperCase() + " "));
            assertFalse(law.name().isBlank());
            assertFalse(law.source().isBlank());
        }
        assertSame(LargePond1981.INSTANCE, DragLaws.byName("large-pond-1981"));
        assertSame(TrenberthLargeOlson1990.INSTANCE, DragLaws.byName("trenberth-1990"));
        assertSame(LargeYeager2004.INSTANCE, DragLaws.byName("large-yeager-2004"));
        assertSame(LargeYeager2009.INSTANCE, DragLaws.byName("large-yeager-2009"));
        assertSame(Smith1980.INSTANCE, DragLaws.byName("smith-1980"));
        assertSame(YellandTaylor1996.INSTANCE, DragLaws.byName("yelland-taylor-1996"));
        DragLaw c = DragLaws.byName("constant:0.0013");
        assertEquals(1.3e-3, c.dragCoefficient(7), 0.0);
        assertEquals("constant:0.0013", c.id());
        assertEquals(c, DragLaws.byName(c.id()));
        assertTrue(c.inValidRange(0) && c.inValidRange(80));
    }

    @Test
    void byNameRejectsUnknownWithTheAcceptedList() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> DragLaws.byName("pond-1982"));
        assertTrue(e.getMessage().contains("pond-1982") && e.getMessage().contains("large-pond-1981"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> DragLaws.byName("constant:abc"));
        assertThrows(IllegalArgumentException.class, () -> DragLaws.byName("constant:-0.001"));
        assertThrows(IllegalArgumentException.class, () -> DragLaws.byName(null));
    }
}
