package org.gyreplan.solver.series;

import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

/**
 * Cumulative upwelling index and season dates (Bograd et al. 2009, GRL 36, L01602: STI = day of the CUI minimum;
 * END, LUSI, TUMI from memory). Synthetic case CHECKS.md §4b (derived): UI(d) = −100 cos(2π(d − 15)/365),
 * d = 1…365 → STI 106, END 288, LUSI 182, TUMI 11 618.35 (analytic 100·365/π = 11 618.31).
 */
class UpwellingSeasonTest {
    private static final int YEAR = 2001;   // not a leap year

    private static double[] synthetic() {
        double[] v = new double[365];
        for (int d = 1; d <= 365; d++) v[d - 1] = -100 * Math.cos(2 * Math.PI * (d - 15) / 365.0);
        return v;
    }

    private static TimeSeries daily(double[] v) {
        return TimeSeries.daily("UI", "m3 s-1 (100 m)-1", LocalDate.of(YEAR, 1, 1), v);
    }

    @Test
    void syntheticSeasonMatchesTheCheckValues() {
        UpwellingSeason.Season s = UpwellingSeason.ofYear(daily(synthetic()), YEAR, UpwellingSeason.Options.DEFAULT);
        assertEquals(UpwellingSeason.Status.RESOLVED, s.status());
        assertEquals(UpwellingSeason.Resolution.DAILY, s.resolution());
        assertEquals(106, s.springTransitionDay(), 1.0);          // tol ±1 day (CHECKS §4b)
        assertEquals(288, s.endDay(), 1.0);
        assertEquals(182, s.lengthDays(), 2.0);
        assertEquals(11_618.35, s.totalUpwelling(), 11_618.35 * 1e-4);
        assertEquals(LocalDate.of(YEAR, 4, 16), s.springTransitionDate());
        assertEquals(365, s.cumulative().length);
        TimeSeries cui = s.cumulativeSeries("CUI", "m3 s-1 (100 m)-1 day");
        assertEquals(365, cui.size());
        assertEquals(java.time.Instant.parse("2001-01-02T00:00:00Z"), cui.time(0));   // end of 1 January
        assertEquals(s.cumulative()[287] - s.cumulative()[105], s.totalUpwelling(), 1e-9);
    }

    @Test
    void syntheticSeasonFromSixHourlyData() {
        // the same signal sampled 4 times a day at 00, 06, 12, 18 UTC: daily means then the same dates
        long t0 = LocalDate.of(YEAR, 1, 1).atStartOfDay(ZoneOffset.UTC).toEpochSecond();
        long[] t = new long[365 * 4];
        double[] v = new double[t.length];
        for (int k = 0; k < t.length; k++) {
            t[k] = t0 + k * 21600L;
            double d = 1 + k / 4.0 - 0.375;   // mean of the four samples of a day is then the cosine at day d
            v[k] = -100 * Math.cos(2 * Math.PI * (d - 15) / 365.0);
        }
        UpwellingSeason.Season s = UpwellingSeason.ofYear(new TimeSeries("UI", "u", t, v), YEAR,
                UpwellingSeason.Options.DEFAULT);
        assertEquals(106, s.springTransitionDay(), 1.0);
        assertEquals(288, s.endDay(), 1.0);
        assertEquals(11_618.35, s.totalUpwelling(), 11_618.35 * 1e-3);
    }

    @Test
    void monthlyDataGiveCoarseMonthEndDates() {
        // Monthly means of the synthetic daily values, stamped mid-month. Derived by arithmetic: the April mean is
        // slightly negative and the October mean slightly negative, so the CUI at month ends has its minimum at the
        // end of April (day 120) and its maximum at the end of September (day 273); both within the stated ±15 days
        // (+1 for the daily rounding) of the daily dates 106 and 288.
        double[] d = synthetic();
        AggregatedSeries m = Aggregation.monthly(daily(d), Coverage.DEFAULT);
        assertEquals(12, m.size());
        long[] t = new long[12];
        double[] v = new double[12];
        for (int k = 0; k < 12; k++) {
            t[k] = LocalDate.of(YEAR, k + 1, 15).atStartOfDay(ZoneOffset.UTC).toEpochSecond();
            v[k] = m.mean(k);
        }
        UpwellingSeason.Season s = UpwellingSeason.ofYear(new TimeSeries("UI", "u", t, v), YEAR,
                UpwellingSeason.Options.DEFAULT);
        assertEquals(UpwellingSeason.Resolution.MONTHLY_COARSE, s.resolution());
        assertEquals(UpwellingSeason.Status.RESOLVED, s.status());
        assertEquals(120, s.springTransitionDay(), 0.0);
        assertEquals(273, s.endDay(), 0.0);
        assertEquals(15, s.uncertaintyDays(), 0.0);
        assertEquals(106, s.springTransitionDay(), s.uncertaintyDays() + 1);
        assertEquals(288, s.endDay(), s.uncertaintyDays() + 1);
        // TUMI from month sums is the daily sum over the same whole months
        double sum = 0;
        for (int k = 120; k < 273; k++) sum += d[k];
        assertEquals(sum, s.totalUpwelling(), 1e-9 * Math.abs(sum));
    }

    @Test
    void upwellingAllYearIsNotResolved() {
        double[] v = new double[365];
        for (int k = 0; k < 365; k++) v[k] = 50 + 40 * Math.sin(2 * Math.PI * k / 365.0);   // always > 0
        UpwellingSeason.Season s = UpwellingSeason.ofYear(daily(v), YEAR, UpwellingSeason.Options.DEFAULT);
        assertEquals(UpwellingSeason.Status.NOT_RESOLVED, s.status());
        assertTrue(s.reason().contains("start of the year"), s.reason());
        assertTrue(Double.isNaN(s.springTransitionDay()));
        assertTrue(Double.isNaN(s.totalUpwelling()));
        assertEquals(1, s.cuiMinDay());
        assertEquals(365, s.cuiMaxDay());
        // all downwelling: no upwelling season
        for (int k = 0; k < 365; k++) v[k] = -v[k];
        UpwellingSeason.Season d = UpwellingSeason.ofYear(daily(v), YEAR, UpwellingSeason.Options.DEFAULT);
        assertEquals(UpwellingSeason.Status.NOT_RESOLVED, d.status());
        assertTrue(d.reason().contains("no upwelling season"), d.reason());
    }

    @Test
    void shortGapsAreFilledLongGapsMakeTheYearInsufficient() {
        double[] v = synthetic();
        v[50] = Double.NaN;
        v[51] = Double.NaN;
        v[200] = Double.NaN;
        UpwellingSeason.Season s = UpwellingSeason.ofYear(daily(v), YEAR, UpwellingSeason.Options.DEFAULT);
        assertEquals(UpwellingSeason.Status.RESOLVED, s.status());
        assertEquals(3, s.missingDays());
        assertEquals(3, s.filledDays());
        assertEquals(106, s.springTransitionDay(), 1.0);
        assertEquals(11_618.35, s.totalUpwelling(), 11_618.35 * 1e-3);
        for (int k = 100; k < 110; k++) v[k] = Double.NaN;
        UpwellingSeason.Season bad = UpwellingSeason.ofYear(daily(v), YEAR, UpwellingSeason.Options.DEFAULT);
        assertEquals(UpwellingSeason.Status.INSUFFICIENT_DATA, bad.status());
        assertTrue(bad.reason().contains("gap of 10 days"), bad.reason());
        // a year with no data at all
        assertEquals(UpwellingSeason.Status.INSUFFICIENT_DATA,
                UpwellingSeason.ofYear(daily(synthetic()), YEAR + 1, UpwellingSeason.Options.DEFAULT).status());
    }

    @Test
    void perYearCoversEveryYear() {
        double[] two = new double[365 + 365];
        double[] one = synthetic();
        System.arraycopy(one, 0, two, 0, 365);
        System.arraycopy(one, 0, two, 365, 365);
        List<UpwellingSeason.Season> s = UpwellingSeason.perYear(daily(two), UpwellingSeason.Options.DEFAULT);
        assertEquals(2, s.size());
        assertEquals(YEAR + 1, s.get(1).year());
        assertEquals(s.get(0).totalUpwelling(), s.get(1).totalUpwelling(), 1e-9);
    }

    @Test
    void seasonYearsMayStartInJulyForSeasonsAcrossTheTurnOfTheYear() {
        // the synthetic cycle shifted to start on 1 July 2001: with season years from July the dates are the same
        // days of the season year (STI 106 ± 1 → 14 October ± 1), with calendar years the season is cut in two
        double[] v = new double[365 + 365];
        double[] one = synthetic();
        System.arraycopy(one, 0, v, 0, 365);
        System.arraycopy(one, 0, v, 365, 365);
        TimeSeries s = TimeSeries.daily("UI", "u", LocalDate.of(2001, 7, 1), v);
        UpwellingSeason.Options july = UpwellingSeason.Options.DEFAULT.withStartMonth(7);
        UpwellingSeason.Season a = UpwellingSeason.ofYear(s, 2001, july);
        assertEquals(UpwellingSeason.Status.RESOLVED, a.status());
        assertEquals(LocalDate.of(2001, 7, 1), a.startDate());
        assertEquals(106, a.springTransitionDay(), 1.0);
        assertEquals(288, a.endDay(), 1.0);
        assertEquals(11_618.35, a.totalUpwelling(), 11_618.35 * 1e-4);
        assertEquals(LocalDate.of(2001, 7, 1).plusDays(105), a.springTransitionDate());
        // per season year: the 730 days are exactly the season years 2001/02 and 2002/03
        List<UpwellingSeason.Season> all = UpwellingSeason.perYear(s, july);
        assertEquals(List.of(2001, 2002), all.stream().map(UpwellingSeason.Season::year).toList());
        assertEquals(a.totalUpwelling(), all.get(1).totalUpwelling(), 1e-9);
        // with calendar years, 2002 holds the end of one cycle and the start of the next: CUI max before its min
        UpwellingSeason.Season cal = UpwellingSeason.ofYear(s, 2002, UpwellingSeason.Options.DEFAULT);
        assertEquals(UpwellingSeason.Status.NOT_RESOLVED, cal.status(), cal.reason());
        assertThrows(IllegalArgumentException.class, () -> UpwellingSeason.Options.DEFAULT.withStartMonth(13));
    }
}
