package org.gyreplan.solver.plan.survey;

import org.junit.jupiter.api.Test;

import java.time.Duration;
import java.time.Instant;
import java.time.LocalDate;

import static org.junit.jupiter.api.Assertions.*;

class SolarDayTest {

    /**
     * At the equator near an equinox (δ ≈ 0) the sunrise hour angle is 90.833° (0.833° = standard refraction 34′ +
     * solar semi-diameter 16′, common practice), so day length = 2·90.833°·4 min/° = 726.7 min = 12 h 06.7 min
     * (derived). Tolerance 1 min (δ ≤ 0.5° on that date changes it by &lt; 0.1 min).
     */
    @Test
    void equatorialEquinoxDayLength() {
        SolarDay.Sun s = SolarDay.on(LocalDate.of(2024, 3, 20), 0, 0);
        assertEquals(SolarDay.Kind.NORMAL, s.kind());
        assertEquals(726.66 / 60, s.dayLengthHours(), 1.0 / 60);
        assertTrue(Math.abs(s.declinationDeg()) < 0.5);
    }

    /** Declination at the June solstice equals the obliquity of the ecliptic, ≈ 23.44° in the 2020s (IAU value; common knowledge). */
    @Test
    void solsticeDeclination() {
        assertEquals(23.44, SolarDay.on(LocalDate.of(2024, 6, 20), 0, 45).declinationDeg(), 0.02);
        assertEquals(-23.44, SolarDay.on(LocalDate.of(2024, 12, 21), 0, 45).declinationDeg(), 0.02);
    }

    /**
     * Equation of time extremes (from memory, common almanac values): about +16.4 min near 3 November and
     * about −14.2 min near 11 February; so solar noon at Greenwich is ≈ 11:43:36 UTC and ≈ 12:14:12 UTC. Tolerance 0.3 min.
     */
    @Test
    void equationOfTimeExtremes() {
        SolarDay.Sun nov = SolarDay.on(LocalDate.of(2023, 11, 3), 0, 51.5);
        assertEquals(16.4, nov.equationOfTimeMin(), 0.3);
        assertEquals(0, Duration.between(Instant.parse("2023-11-03T11:43:36Z"), nov.solarNoon()).getSeconds(), 20);
        SolarDay.Sun feb = SolarDay.on(LocalDate.of(2024, 2, 11), 0, 51.5);
        assertEquals(-14.2, feb.equationOfTimeMin(), 0.3);
    }

    /** Helsinki (60.17°N, 24.94°E) on 21 June: day length ≈ 18 h 56 min (from memory, almanac tables). Tol 3 min. */
    @Test
    void highLatitudeSummerDay() {
        SolarDay.Sun s = SolarDay.on(LocalDate.of(2024, 6, 21), 24.94, 60.17);
        assertEquals(18 + 56 / 60.0, s.dayLengthHours(), 3.0 / 60);
    }

    /** Polar night and midnight sun at 80°N (Arctic circle ≈ 66.56°N). */
    @Test
    void polarDayAndNight() {
        assertEquals(SolarDay.Kind.POLAR_NIGHT, SolarDay.on(LocalDate.of(2024, 12, 21), 15, 80).kind());
        assertEquals(SolarDay.Kind.POLAR_DAY, SolarDay.on(LocalDate.of(2024, 6, 21), 15, 80).kind());
        assertEquals(24.0, SolarDay.on(LocalDate.of(2024, 6, 21), 15, 80).dayLengthHours(), 0);
    }
}
