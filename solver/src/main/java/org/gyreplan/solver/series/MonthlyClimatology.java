package org.gyreplan.solver.series;

import java.time.LocalDate;
import java.util.HashMap;
import java.util.Map;

/**
 * Monthly climatology of a series of monthly means over a base period, and anomalies from it.
 *
 * <pre>
 *   clim(m) = (1/Nₘ) Σ_{y = y₀…y₁, value valid} v(y, m)          m = 1…12
 *   anomaly(t) = v(t) − clim(month of t)
 * </pre>
 * The input holds at most one value per calendar month (aggregate daily data first with
 * {@link Aggregation#monthly}); a month's climatology is NaN unless at least {@code minYears} valid years of the
 * base period contribute.
 */
public final class MonthlyClimatology {
    private final double[] mean = new double[12];
    private final int[] years = new int[12];
    private final int firstYear;
    private final int lastYear;
    private final String units;

    private MonthlyClimatology(int firstYear, int lastYear, String units) {
        this.firstYear = firstYear;
        this.lastYear = lastYear;
        this.units = units;
    }

    /**
     * @param monthly   monthly values (one per calendar month at most), NaN = missing
     * @param firstYear first year of the base period (inclusive)
     * @param lastYear  last year of the base period (inclusive)
     * @param minYears  minimum number of valid years for a month's mean (≥ 1)
     */
    public static MonthlyClimatology of(TimeSeries monthly, int firstYear, int lastYear, int minYears) {
        if (lastYear < firstYear) {
            throw new IllegalArgumentException("base period " + firstYear + "–" + lastYear + " is empty");
        }
        if (minYears < 1) throw new IllegalArgumentException("minimum number of years must be ≥ 1, got " + minYears);
        Map<Integer, Integer> seen = new HashMap<>();
        MonthlyClimatology c = new MonthlyClimatology(firstYear, lastYear, monthly.units());
        double[] sum = new double[12];
        for (int k = 0; k < monthly.size(); k++) {
            LocalDate d = LocalDate.ofEpochDay(Math.floorDiv(monthly.epochSecond(k), 86400L));
            int key = d.getYear() * 12 + d.getMonthValue() - 1;
            if (seen.put(key, k) != null) {
                throw new IllegalArgumentException("series '" + monthly.name() + "' has more than one value in "
                        + d.getYear() + "-" + d.getMonthValue() + "; expected monthly values (aggregate first)");
            }
            double v = monthly.value(k);
            if (Double.isNaN(v) || d.getYear() < firstYear || d.getYear() > lastYear) continue;
            sum[d.getMonthValue() - 1] += v;
            c.years[d.getMonthValue() - 1]++;
        }
        for (int m = 0; m < 12; m++) c.mean[m] = c.years[m] >= minYears ? sum[m] / c.years[m] : Double.NaN;
        return c;
    }

    /** Climatological mean of month m (1 = January … 12 = December), NaN if too few years. */
    public double mean(int month) { return mean[checkMonth(month) - 1]; }
    /** Number of valid years contributing to month m. */
    public int years(int month) { return years[checkMonth(month) - 1]; }
    /** The twelve means, January first. */
    public double[] means() { return mean.clone(); }
    public int firstYear() { return firstYear; }
    public int lastYear() { return lastYear; }
    public String units() { return units; }

    /** Month (1…12) with the largest climatological mean (first one on ties), or 0 if all are NaN. */
    public int maxMonth() {
        int best = 0;
        for (int m = 1; m <= 12; m++) if (!Double.isNaN(mean[m - 1]) && (best == 0 || mean[m - 1] > mean[best - 1])) best = m;
        return best;
    }

    /** Month (1…12) with the smallest climatological mean (first one on ties), or 0 if all are NaN. */
    public int minMonth() {
        int best = 0;
        for (int m = 1; m <= 12; m++) if (!Double.isNaN(mean[m - 1]) && (best == 0 || mean[m - 1] < mean[best - 1])) best = m;
        return best;
    }

    /** Anomalies v(t) − clim(month of t) of any series in the same unit (NaN where either is missing). */
    public TimeSeries anomalies(TimeSeries s) {
        double[] a = new double[s.size()];
        for (int k = 0; k < a.length; k++) {
            int m = LocalDate.ofEpochDay(Math.floorDiv(s.epochSecond(k), 86400L)).getMonthValue();
            a[k] = s.value(k) - mean[m - 1];
        }
        return s.withValues(s.name() + " anomaly", s.units(), a);
    }

    private static int checkMonth(int m) {
        if (m < 1 || m > 12) throw new IllegalArgumentException("month must be 1…12, got " + m);
        return m;
    }
}
