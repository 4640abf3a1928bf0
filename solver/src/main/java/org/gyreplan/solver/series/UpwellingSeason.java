package org.gyreplan.solver.series;

import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.TreeSet;

/**
 * Upwelling season of one year from the cumulative upwelling index (CUI).
 *
 * <pre>
 *   CUI(d) = Σ_{k = 1…d} UI(k) · 1 day                   d = day of the season year (its first day = 1)
 *   STI  = day of the minimum of CUI                     (spring transition)
 *   END  = day of the maximum of CUI                     (end of the upwelling season)
 *   LUSI = END − STI                                     (length, days)
 *   TUMI = CUI(END) − CUI(STI)                           (total upwelling, index unit × day)
 * </pre>
 * <table>
 *   <caption>Symbols</caption>
 *   <tr><td>UI(k)</td><td>daily mean upwelling index of day k, positive = upwelling</td><td>e.g. m³ s⁻¹ per 100 m</td></tr>
 *   <tr><td>CUI</td><td>cumulative index</td><td>index unit × day</td></tr>
 * </table>
 *
 * <p>The season year starts on 1 January by default (d = day of year), as in the source; for coasts whose
 * upwelling season spans the turn of the year (e.g. in the southern hemisphere) a start month can be chosen
 * ({@link Options#withStartMonth}, e.g. 7 for years from 1 July), and the days then count from that date.
 *
 * <h2>Status</h2>
 * <ul>
 *   <li>{@link Status#NOT_RESOLVED} when the data show no downwelling season to bound the upwelling season: the
 *       minimum falls on the first day of the (season) year (CUI rising from its start, e.g. upwelling-favourable all year),
 *       the maximum on the last day (the season does not end within the year), or the maximum comes before the
 *       minimum (no upwelling season). The unresolved dates, LUSI and TUMI are NaN; the raw day of the CUI minimum
 *       and maximum are still given.</li>
 *   <li>{@link Status#INSUFFICIENT_DATA} when more than {@code maxMissingFraction} of the days are missing, or a gap
 *       is longer than {@code maxGapDays}. Shorter gaps are filled by linear interpolation between the neighbouring
 *       valid days (the nearest valid day at the ends of the year); their number is reported.</li>
 * </ul>
 *
 * <h2>Monthly data</h2>
 * With monthly means (median step ≥ 27 days) the CUI is accumulated at month ends,
 * CUI(end of month m) = Σ_{i ≤ m} UI_i · (days in month i), and the dates are month-end days of year
 * (0 = start of the year); the result is marked {@link Resolution#MONTHLY_COARSE} with an uncertainty of
 * ±15 days. Sub-daily data are averaged to days first with {@link Coverage#DEFAULT}.
 *
 * <p><b>Source</b>: Bograd, Schroeder, Sarkar, Qiu, Sydeman and Schwing (2009), "Phenology of coastal upwelling in
 * the California Current", Geophys. Res. Lett. 36, L01602 (STI as the day of the CUI minimum; END, LUSI, TUMI and
 * the sum from 1 January as recalled from memory).
 */
public final class UpwellingSeason {
    private UpwellingSeason() {}

    /** Outcome of the season analysis. */
    public enum Status { RESOLVED, NOT_RESOLVED, INSUFFICIENT_DATA }

    /** Time resolution the dates were derived from. */
    public enum Resolution { DAILY, MONTHLY_COARSE }

    /**
     * @param maxGapDays         longest run of missing days that is filled by interpolation (days ≥ 0)
     * @param maxMissingFraction largest fraction of missing days in the year, in [0, 1]
     * @param startMonth         month (1…12) on whose first day the season year starts (1 = calendar year)
     */
    public record Options(int maxGapDays, double maxMissingFraction, int startMonth) {
        /** Gaps up to 5 days filled, at most 10 % missing (a stated choice), calendar years. */
        public static final Options DEFAULT = new Options(5, 0.10, 1);

        /** Options for calendar years. */
        public Options(int maxGapDays, double maxMissingFraction) { this(maxGapDays, maxMissingFraction, 1); }

        /** The same options with season years starting on the first day of {@code month} (1…12). */
        public Options withStartMonth(int month) { return new Options(maxGapDays, maxMissingFraction, month); }

        public Options {
            if (maxGapDays < 0) throw new IllegalArgumentException("maximum gap must be ≥ 0 days, got " + maxGapDays);
            if (!(maxMissingFraction >= 0 && maxMissingFraction <= 1)) {
                throw new IllegalArgumentException("maximum missing fraction must be in [0, 1], got " + maxMissingFraction);
            }
            if (startMonth < 1 || startMonth > 12) {
                throw new IllegalArgumentException("season-year start month must be 1…12, got " + startMonth);
            }
        }
    }

    /**
     * The season metrics of one year.
     *
     * @param year                  calendar year in which the season year starts
     * @param startDate             first day of the season year (day 1)
     * @param resolution            daily or coarse (monthly)
     * @param status                resolved, not resolved, insufficient data
     * @param reason                human-readable reason when not resolved (empty when resolved)
     * @param springTransitionDay   STI, day of the season year (NaN unless resolved)
     * @param endDay                END, day of the season year (NaN unless resolved)
     * @param lengthDays            LUSI = END − STI, days (NaN unless both resolved)
     * @param totalUpwelling        TUMI = CUI(END) − CUI(STI), index unit × day (NaN unless both resolved)
     * @param cuiMinDay             day of year of the CUI minimum (raw, also when not resolved; NaN without data)
     * @param cuiMaxDay             day of year of the CUI maximum (raw)
     * @param uncertaintyDays       uncertainty of the dates from the time resolution (0.5 daily, 15 monthly), days
     * @param cumulativeDays        day of year of each cumulative value
     * @param cumulative            CUI at those days, index unit × day
     * @param missingDays           days (or months, for monthly data) without a value
     * @param filledDays            missing days filled by interpolation
     */
    public record Season(int year, LocalDate startDate, Resolution resolution, Status status, String reason,
                         double springTransitionDay, double endDay, double lengthDays, double totalUpwelling,
                         double cuiMinDay, double cuiMaxDay, double uncertaintyDays,
                         double[] cumulativeDays, double[] cumulative, int missingDays, int filledDays) {
        public boolean isResolved() { return status == Status.RESOLVED; }

        /** The spring transition as a date (null unless resolved; coarse dates round down to a day). */
        public LocalDate springTransitionDate() {
            return Double.isNaN(springTransitionDay) ? null : startDate.plusDays(Math.max(1, (int) springTransitionDay) - 1);
        }

        /**
         * The cumulative index as a series stamped at the end of each day (daily) or month (coarse), i.e. at
         * startDate + day, in the given unit (index unit × day); empty without data.
         */
        public TimeSeries cumulativeSeries(String name, String units) {
            long t0 = startDate.atStartOfDay(java.time.ZoneOffset.UTC).toEpochSecond();
            long[] t = new long[cumulative.length];
            for (int k = 0; k < t.length; k++) t[k] = t0 + Math.round(cumulativeDays[k] * 86400.0);
            return new TimeSeries(name, units, t, cumulative);
        }

        /** The end of the season as a date (null unless resolved). */
        public LocalDate endDate() {
            return Double.isNaN(endDay) ? null : startDate.plusDays(Math.max(1, (int) endDay) - 1);
        }
    }

    /** Whether a series is treated as monthly (median step ≥ 27 days). */
    public static boolean isMonthly(TimeSeries ui) {
        return ui.medianStepSeconds() >= 27L * 86400L;
    }

    /** Season metrics of every season year touched by the series, in order. */
    public static List<Season> perYear(TimeSeries ui, Options options) {
        TreeSet<Integer> years = new TreeSet<>();
        for (int k = 0; k < ui.size(); k++) {
            LocalDate d = LocalDate.ofEpochDay(Math.floorDiv(ui.epochSecond(k), 86400L));
            years.add(d.getMonthValue() >= options.startMonth() ? d.getYear() : d.getYear() - 1);
        }
        List<Season> out = new ArrayList<>();
        for (int y : years) out.add(ofYear(ui, y, options));
        return out;
    }

    /** Season metrics of the season year starting in {@code year} (on the first day of the start month). */
    public static Season ofYear(TimeSeries ui, int year, Options options) {
        Objects.requireNonNull(ui, "series");
        Objects.requireNonNull(options, "options");
        LocalDate start = LocalDate.of(year, options.startMonth(), 1);
        return isMonthly(ui) ? monthly(ui, year, start) : daily(ui, year, start, options);
    }

    private static Season daily(TimeSeries ui, int year, LocalDate start, Options o) {
        int n = (int) (start.plusYears(1).toEpochDay() - start.toEpochDay());
        long t0 = start.atStartOfDay(ZoneOffset.UTC).toEpochSecond();
        long[] b = new long[n + 1];
        for (int d = 0; d <= n; d++) b[d] = t0 + d * 86400L;
        long step = ui.medianStepSeconds() > 0 && ui.medianStepSeconds() < 86400L ? 0 : 86400L;
        AggregatedSeries days = Aggregation.periods(ui, b, new Coverage(Coverage.DEFAULT.minFraction(), 1, step));
        double[] v = new double[n];
        int missing = 0;
        for (int d = 0; d < n; d++) {
            v[d] = days.mean(d);
            if (Double.isNaN(v[d])) missing++;
        }
        double[] dayOfYear = new double[n];
        for (int d = 0; d < n; d++) dayOfYear[d] = d + 1;
        if (missing > o.maxMissingFraction() * n) {
            return insufficient(year, start, Resolution.DAILY, missing + " of " + n + " days missing (more than "
                    + Math.round(100 * o.maxMissingFraction()) + " %)", 0.5, missing);
        }
        int filled = 0;
        for (int d = 0; d < n; ) {
            if (!Double.isNaN(v[d])) { d++; continue; }
            int e = d;
            while (e < n && Double.isNaN(v[e])) e++;
            int len = e - d;
            if (len > o.maxGapDays()) {
                return insufficient(year, start, Resolution.DAILY, "gap of " + len + " days from day " + (d + 1)
                        + " (longer than " + o.maxGapDays() + ")", 0.5, missing);
            }
            double left = d > 0 ? v[d - 1] : Double.NaN, right = e < n ? v[e] : Double.NaN;
            for (int k = d; k < e; k++) {
                if (Double.isNaN(left)) v[k] = right;
                else if (Double.isNaN(right)) v[k] = left;
                else v[k] = left + (right - left) * (k - d + 1) / (double) (len + 1);
            }
            filled += len;
            d = e;
        }
        double[] cui = new double[n];
        double acc = 0;
        for (int d = 0; d < n; d++) { acc += v[d]; cui[d] = acc; }
        return finish(year, start, Resolution.DAILY, dayOfYear, cui, 0.5, missing, filled, 1, n);
    }

    private static Season monthly(TimeSeries ui, int year, LocalDate jan1) {
        long[] b = new long[13];
        for (int m = 0; m <= 12; m++) b[m] = jan1.plusMonths(m).atStartOfDay(ZoneOffset.UTC).toEpochSecond();
        AggregatedSeries months = Aggregation.periods(ui, b, new Coverage(0.0, 1, 0));
        double[] dayOfYear = new double[13];
        double[] cui = new double[13];
        int missing = 0;
        for (int m = 0; m < 12; m++) {
            double v = months.mean(m);
            if (Double.isNaN(v)) missing++;
            int days = jan1.plusMonths(m).lengthOfMonth();
            dayOfYear[m + 1] = dayOfYear[m] + days;
            cui[m + 1] = cui[m] + v * days;
        }
        if (missing > 0) {
            return insufficient(year, jan1, Resolution.MONTHLY_COARSE, missing + " of 12 months missing", 15, missing);
        }
        return finish(year, jan1, Resolution.MONTHLY_COARSE, dayOfYear, cui, 15, 0, 0, 0, dayOfYear[12]);
    }

    private static Season finish(int year, LocalDate start, Resolution res, double[] days, double[] cui, double unc, int missing,
                                 int filled, double firstDay, double lastDay) {
        int iMin = 0, iMax = 0;
        for (int k = 1; k < cui.length; k++) {
            if (cui[k] < cui[iMin]) iMin = k;
            if (cui[k] > cui[iMax]) iMax = k;
        }
        double minDay = days[iMin], maxDay = days[iMax];
        List<String> why = new ArrayList<>();
        boolean stiOk = true, endOk = true;
        if (minDay <= firstDay) {
            stiOk = false;
            why.add("CUI minimum at the start of the year: no downwelling season before the upwelling season");
        }
        if (maxDay >= lastDay) {
            endOk = false;
            why.add("CUI maximum at the end of the year: the upwelling season does not end within the year");
        }
        if (maxDay <= minDay) {
            stiOk = false;
            endOk = false;
            why.add("CUI maximum before its minimum: no upwelling season");
        }
        double sti = stiOk ? minDay : Double.NaN, end = endOk ? maxDay : Double.NaN;
        double lusi = stiOk && endOk ? end - sti : Double.NaN;
        double tumi = stiOk && endOk ? cui[iMax] - cui[iMin] : Double.NaN;
        Status st = stiOk && endOk ? Status.RESOLVED : Status.NOT_RESOLVED;
        return new Season(year, start, res, st, String.join("; ", why), sti, end, lusi, tumi, minDay, maxDay, unc,
                days, cui, missing, filled);
    }

    private static Season insufficient(int year, LocalDate start, Resolution res, String why, double unc, int missing) {
        return new Season(year, start, res, Status.INSUFFICIENT_DATA, why, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                Double.NaN, Double.NaN, unc, new double[0], new double[0], missing, 0);
    }
}
