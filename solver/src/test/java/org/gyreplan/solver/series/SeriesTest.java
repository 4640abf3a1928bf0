package org.gyreplan.solver.series;

import org.junit.jupiter.api.Test;

import java.time.Duration;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;

import static org.junit.jupiter.api.Assertions.*;

/** Aggregation, coverage, climatology, anomalies and persistence on hand-computable series (arithmetic checks). */
class SeriesTest {

    @Test
    void hourlyToDailyMeansWithCoverage() {
        long t0 = LocalDate.of(2020, 2, 28).atStartOfDay(ZoneOffset.UTC).toEpochSecond();
        long[] t = new long[72];
        double[] v = new double[72];
        for (int k = 0; k < 72; k++) { t[k] = t0 + 3600L * k; v[k] = k; }
        // second day (29 Feb 2020): only 12 of 24 hours valid
        for (int k = 36; k < 48; k++) v[k] = Double.NaN;
        AggregatedSeries d = Aggregation.daily(new TimeSeries("x", "1", t, v), Coverage.DEFAULT);
        assertEquals(3, d.size());
        assertEquals(11.5, d.mean(0), 1e-12);          // mean of 0…23
        assertEquals(24, d.count(0));
        assertEquals(24, d.expected(0));
        assertEquals(12, d.count(1));
        assertFalse(d.accepted(1));                     // 50 % < 80 %
        assertTrue(Double.isNaN(d.mean(1)));
        assertEquals(29.5, d.rawMean(1), 1e-12);         // mean of 24…35
        assertEquals(59.5, d.mean(2), 1e-12);
        assertEquals(Instant.parse("2020-02-29T00:00:00Z"), d.start(1));
        AggregatedSeries any = Aggregation.daily(new TimeSeries("x", "1", t, v), Coverage.ANY);
        assertEquals(29.5, any.mean(1), 1e-12);
    }

    @Test
    void dailyToMonthlyUsesCalendarMonths() {
        // 2021-01-01 … 2021-03-31, value = month number; February has 28 days.
        LocalDate start = LocalDate.of(2021, 1, 1);
        double[] v = new double[90];
        for (int k = 0; k < 90; k++) v[k] = start.plusDays(k).getMonthValue();
        v[40] = Double.NaN;
        AggregatedSeries m = Aggregation.monthly(TimeSeries.daily("x", "1", start, v), Coverage.DEFAULT);
        assertEquals(3, m.size());
        assertEquals(31, m.count(0));
        assertEquals(27, m.count(1));
        assertEquals(28, m.expected(1));
        assertEquals(2.0, m.mean(1), 0.0);
        assertEquals(3.0, m.mean(2), 0.0);
        // user periods of 10 days from 1 January
        AggregatedSeries p = Aggregation.every(TimeSeries.daily("x", "1", start, v), Duration.ofDays(10),
                Instant.parse("2021-01-01T00:00:00Z"), Coverage.DEFAULT);
        assertEquals(9, p.size());
        assertEquals(1.0, p.mean(0), 0.0);
        assertEquals((1 + 2 * 9) / 10.0, p.mean(3), 1e-12);   // 31 Jan (1) + 1…9 Feb (2)
    }

    /** 132 monthly means, January 1982 – December 1992, stamped mid-month (like a monthly wind product). */
    private static TimeSeries monthly132() {
        long[] t = new long[132];
        double[] v = new double[132];
        for (int k = 0; k < 132; k++) {
            LocalDate d = LocalDate.of(1982, 1, 1).plusMonths(k).plusDays(14);
            t[k] = d.atStartOfDay(ZoneOffset.UTC).toEpochSecond();
            int m = d.getMonthValue();
            v[k] = 100 * Math.cos(2 * Math.PI * (m - 7) / 12.0) + (k / 12 - 5);   // seasonal cycle + a yearly offset
        }
        return new TimeSeries("UI", "m3 s-1 (100 m)-1", t, v);
    }

    @Test
    void monthlyOnlyDataAggregateAndGiveClimatologyAndAnomalies() {
        TimeSeries s = monthly132();
        AggregatedSeries m = Aggregation.monthly(s, Coverage.DEFAULT);
        assertEquals(132, m.size());
        for (int k = 0; k < 132; k++) {
            assertTrue(m.accepted(k));
            assertEquals(1, m.count(k));
            assertEquals(1, m.expected(k));
            assertEquals(s.value(k), m.mean(k), 0.0);
        }
        MonthlyClimatology c = MonthlyClimatology.of(m.means(), 1982, 1992, 5);
        for (int mo = 1; mo <= 12; mo++) {
            assertEquals(11, c.years(mo));
            // yearly offsets −5 … +5 average to 0
            assertEquals(100 * Math.cos(2 * Math.PI * (mo - 7) / 12.0), c.mean(mo), 1e-9);
        }
        assertEquals(7, c.maxMonth());
        assertEquals(1, c.minMonth());
        TimeSeries a = c.anomalies(m.means());
        assertEquals(-5.0, a.value(0), 1e-9);
        assertEquals(5.0, a.value(131), 1e-9);
        // a base period with too few years leaves the climatology undefined
        MonthlyClimatology short1 = MonthlyClimatology.of(m.means(), 1990, 1992, 5);
        assertTrue(Double.isNaN(short1.mean(1)));
        // daily input is refused by the climatology with a clear message
        TimeSeries daily = TimeSeries.daily("d", "1", LocalDate.of(2000, 1, 1), new double[40]);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> MonthlyClimatology.of(daily, 2000, 2000, 1));
        assertTrue(e.getMessage().contains("aggregate first"), e.getMessage());
        // season dates from monthly data are marked coarse
        UpwellingSeason.Season season = UpwellingSeason.ofYear(s, 1985, UpwellingSeason.Options.DEFAULT);
        assertEquals(UpwellingSeason.Resolution.MONTHLY_COARSE, season.resolution());
    }

    @Test
    void persistenceOfUpwellingFavourableRuns() {
        double n = Double.NaN;
        double[] v = {1, 1, 1, -1, 1, 1, n, 1, -1, 1, 1, 1, 1};
        UpwellingPersistence p = UpwellingPersistence.compute(v, 3);
        assertEquals(12, p.validDays());
        assertEquals(10, p.favourableDays());
        assertEquals(10 / 12.0, p.favourableFraction(), 1e-15);
        assertEquals(4, p.runCount());                 // 3, 2, 1, 4 (the missing day ends a run)
        assertEquals(2.5, p.meanRunDays(), 1e-15);
        assertEquals(4, p.maxRunDays());
        assertEquals(0.7, p.longRunFraction(), 1e-15); // (3 + 4) / 10
        UpwellingPersistence q = UpwellingPersistence.of(TimeSeries.daily("x", "1", LocalDate.of(2001, 1, 1), v), 3);
        assertEquals(p, q);
        UpwellingPersistence r = UpwellingPersistence.of(TimeSeries.daily("x", "1", LocalDate.of(2001, 1, 1), v),
                LocalDate.of(2001, 1, 5), LocalDate.of(2001, 1, 6), 1);
        assertEquals(2, r.favourableDays());
        assertEquals(1, r.runCount());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> UpwellingPersistence.of(monthly132(), 3));
        assertTrue(e.getMessage().contains("daily"), e.getMessage());
    }

    @Test
    void badSeriesAreRefused() {
        assertThrows(IllegalArgumentException.class, () -> new TimeSeries("x", "1", new long[] {1, 1}, new double[2]));
        assertThrows(IllegalArgumentException.class, () -> new TimeSeries("x", "1", new long[] {1}, new double[2]));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new TimeSeries("x", "1", new long[] {1}, new double[] {Double.POSITIVE_INFINITY}));
        assertTrue(e.getMessage().contains("infinite"));
        assertThrows(IllegalArgumentException.class, () -> new Coverage(1.5, 1, 0));
    }
}
