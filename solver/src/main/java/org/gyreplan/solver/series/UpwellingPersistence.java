package org.gyreplan.solver.series;

import java.time.LocalDate;
import java.time.ZoneOffset;

/**
 * How often and how persistently conditions are upwelling-favourable in a daily index series.
 *
 * <pre>
 *   favourable day:  UI(d) &gt; 0
 *   fraction  = N_fav / N_valid
 *   run       = maximal sequence of consecutive calendar days that are all valid and favourable
 *   mean run  = N_fav / N_runs (days)
 *   long-run fraction = (favourable days in runs of at least L_min days) / N_fav
 * </pre>
 * A missing day (NaN, or a day without a sample) ends a run and is not counted as valid. Sub-daily input is
 * averaged to days first with {@link Coverage#DEFAULT}.
 * <p>Sign: favourable means a positive index (offshore Ekman transport). Validity: daily values; runs depend on the
 * index threshold (0 here). Source: counting favourable days and runs is common practice in upwelling phenology
 * (e.g. the duration indicators discussed by Bograd et al. 2009, GRL 36, L01602); the exact statistics here are
 * our own definitions, stated above.
 *
 * @param validDays            days with a value
 * @param favourableDays       days with UI &gt; 0
 * @param favourableFraction   favourableDays / validDays (NaN without valid days)
 * @param runCount             number of favourable runs
 * @param meanRunDays          mean run length, days (NaN without runs)
 * @param maxRunDays           longest run, days
 * @param minRunDays           the run length L_min used for the long-run fraction, days
 * @param longRunFraction      fraction of favourable days lying in runs of at least L_min days (NaN without any)
 */
public record UpwellingPersistence(int validDays, int favourableDays, double favourableFraction, int runCount,
                                   double meanRunDays, int maxRunDays, int minRunDays, double longRunFraction) {

    private static void requireDaily(TimeSeries ui) {
        if (ui.medianStepSeconds() > 36L * 3600L) {
            throw new IllegalArgumentException("series '" + ui.name() + "': persistence needs daily or sub-daily values, "
                    + "got a median step of " + Math.round(ui.medianStepSeconds() / 86400.0) + " days");
        }
    }

    /** Persistence over the whole series (daily values, or sub-daily averaged to days). */
    public static UpwellingPersistence of(TimeSeries ui, int minRunDays) {
        requireDaily(ui);
        if (ui.size() == 0) return compute(new double[0], minRunDays);
        AggregatedSeries days = Aggregation.daily(ui, ui.medianStepSeconds() >= 86400L
                ? new Coverage(0.0, 1, 86400L) : Coverage.DEFAULT);
        double[] v = new double[days.size()];
        for (int d = 0; d < v.length; d++) v[d] = days.mean(d);
        return compute(v, minRunDays);
    }

    /** Persistence between two dates (inclusive). */
    public static UpwellingPersistence of(TimeSeries ui, LocalDate from, LocalDate toInclusive, int minRunDays) {
        requireDaily(ui);
        int n = (int) (toInclusive.toEpochDay() - from.toEpochDay() + 1);
        if (n < 1) throw new IllegalArgumentException("date range " + from + " … " + toInclusive + " is empty");
        long[] b = new long[n + 1];
        long t0 = from.atStartOfDay(ZoneOffset.UTC).toEpochSecond();
        for (int d = 0; d <= n; d++) b[d] = t0 + d * 86400L;
        AggregatedSeries days = Aggregation.periods(ui, b, ui.medianStepSeconds() >= 86400L
                ? new Coverage(0.0, 1, 86400L) : Coverage.DEFAULT);
        double[] v = new double[n];
        for (int d = 0; d < n; d++) v[d] = days.mean(d);
        return compute(v, minRunDays);
    }

    /** Persistence of consecutive daily values (NaN = missing). */
    public static UpwellingPersistence compute(double[] daily, int minRunDays) {
        if (minRunDays < 1) throw new IllegalArgumentException("minimum run length must be ≥ 1 day, got " + minRunDays);
        int valid = 0, fav = 0, runs = 0, maxRun = 0, inLong = 0, run = 0;
        for (int d = 0; d <= daily.length; d++) {
            double v = d < daily.length ? daily[d] : Double.NaN;
            if (!Double.isNaN(v)) valid++;
            if (v > 0) {
                fav++;
                run++;
            } else if (run > 0) {
                runs++;
                maxRun = Math.max(maxRun, run);
                if (run >= minRunDays) inLong += run;
                run = 0;
            }
        }
        return new UpwellingPersistence(valid, fav, valid > 0 ? fav / (double) valid : Double.NaN, runs,
                runs > 0 ? fav / (double) runs : Double.NaN, maxRun, minRunDays,
                fav > 0 ? inLong / (double) fav : Double.NaN);
    }
}
