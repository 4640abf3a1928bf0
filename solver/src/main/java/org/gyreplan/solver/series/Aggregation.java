package org.gyreplan.solver.series;

import java.time.Duration;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.Arrays;
import java.util.Objects;

/**
 * Period means of a {@link TimeSeries}: calendar days, calendar months (UTC) and user periods.
 *
 * <pre>
 *   mean_p = (1/n_p) Σ_{t ∈ [start_p, end_p), v(t) valid} v(t)
 * </pre>
 * A sample belongs to the period containing its time stamp. Missing samples (NaN) are not counted. The periods run
 * from the one containing the first sample to the one containing the last, empty periods included (mean NaN,
 * count 0). The {@link Coverage} rule decides which means are accepted. Sample times are treated as instants: a
 * monthly mean stamped at mid-month falls in its month; a daily mean stamped at 00:00 in its day.
 * Source: arithmetic means with a minimum-coverage rule, common practice (the 80 % default is a stated choice).
 */
public final class Aggregation {
    private Aggregation() {}

    /** Means per UTC calendar day. */
    public static AggregatedSeries daily(TimeSeries s, Coverage coverage) {
        Objects.requireNonNull(s, "series");
        if (s.size() == 0) return periods(s, new long[] {0}, coverage);
        long d0 = Math.floorDiv(s.epochSecond(0), 86400L), d1 = Math.floorDiv(s.epochSecond(s.size() - 1), 86400L);
        long[] b = new long[(int) (d1 - d0 + 2)];
        for (int k = 0; k < b.length; k++) b[k] = (d0 + k) * 86400L;
        return periods(s, b, coverage);
    }

    /** Means per UTC calendar month. */
    public static AggregatedSeries monthly(TimeSeries s, Coverage coverage) {
        Objects.requireNonNull(s, "series");
        if (s.size() == 0) return periods(s, new long[] {0}, coverage);
        LocalDate first = LocalDate.ofEpochDay(Math.floorDiv(s.epochSecond(0), 86400L)).withDayOfMonth(1);
        LocalDate last = LocalDate.ofEpochDay(Math.floorDiv(s.epochSecond(s.size() - 1), 86400L)).withDayOfMonth(1);
        int n = (int) (java.time.temporal.ChronoUnit.MONTHS.between(first, last) + 2);
        long[] b = new long[n];
        for (int k = 0; k < n; k++) b[k] = first.plusMonths(k).atStartOfDay(ZoneOffset.UTC).toEpochSecond();
        return periods(s, b, coverage);
    }

    /** Means over consecutive periods of fixed length starting at {@code origin} and covering the series. */
    public static AggregatedSeries every(TimeSeries s, Duration length, Instant origin, Coverage coverage) {
        long len = length.getSeconds();
        if (len <= 0) throw new IllegalArgumentException("period length must be positive, got " + length);
        if (s.size() == 0) return periods(s, new long[] {origin.getEpochSecond()}, coverage);
        long o = origin.getEpochSecond();
        if (s.epochSecond(0) < o) {
            throw new IllegalArgumentException("period origin " + origin + " lies after the first sample " + s.time(0));
        }
        long k1 = Math.floorDiv(s.epochSecond(s.size() - 1) - o, len);
        long k0 = Math.floorDiv(s.epochSecond(0) - o, len);
        long[] b = new long[(int) (k1 - k0 + 2)];
        for (int k = 0; k < b.length; k++) b[k] = o + (k0 + k) * len;
        return periods(s, b, coverage);
    }

    /**
     * Means over the user periods [b₀, b₁), [b₁, b₂), … given by strictly increasing boundaries (epoch seconds).
     * Samples outside [b₀, b_last) are ignored.
     */
    public static AggregatedSeries periods(TimeSeries s, long[] boundaries, Coverage coverage) {
        Objects.requireNonNull(coverage, "coverage");
        for (int k = 1; k < boundaries.length; k++) {
            if (boundaries[k] <= boundaries[k - 1]) {
                throw new IllegalArgumentException("period boundaries must increase strictly; boundary " + k + " does not");
            }
        }
        int np = Math.max(0, boundaries.length - 1);
        long step = coverage.nominalStepSeconds() > 0 ? coverage.nominalStepSeconds() : s.medianStepSeconds();
        double[] sum = new double[np];
        int[] count = new int[np];
        for (int k = 0; k < s.size(); k++) {
            double v = s.value(k);
            if (Double.isNaN(v)) continue;
            int p = Arrays.binarySearch(boundaries, s.epochSecond(k));
            if (p < 0) p = -p - 2;
            if (p < 0 || p >= np) continue;
            sum[p] += v;
            count[p]++;
        }
        double[] mean = new double[np];
        int[] expected = new int[np];
        boolean[] accepted = new boolean[np];
        for (int p = 0; p < np; p++) {
            mean[p] = count[p] > 0 ? sum[p] / count[p] : Double.NaN;
            expected[p] = Coverage.expected(boundaries[p + 1] - boundaries[p], step);
            accepted[p] = coverage.accepts(count[p], expected[p]);
        }
        long[] start = np > 0 ? Arrays.copyOf(boundaries, np) : new long[0];
        long[] end = np > 0 ? Arrays.copyOfRange(boundaries, 1, np + 1) : new long[0];
        return new AggregatedSeries(s.name(), s.units(), start, end, mean, count, expected, accepted);
    }
}
