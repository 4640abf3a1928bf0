package org.gyreplan.solver.series;

import java.time.Instant;

/**
 * Period means of a series with their bookkeeping: for each period [start, end) the mean of the valid samples,
 * their count, the expected count and whether the {@link Coverage} rule accepted it.
 */
public final class AggregatedSeries {
    private final String name;
    private final String units;
    private final long[] start;
    private final long[] end;
    private final double[] mean;
    private final int[] count;
    private final int[] expected;
    private final boolean[] accepted;

    AggregatedSeries(String name, String units, long[] start, long[] end, double[] mean, int[] count, int[] expected,
                     boolean[] accepted) {
        this.name = name;
        this.units = units;
        this.start = start;
        this.end = end;
        this.mean = mean;
        this.count = count;
        this.expected = expected;
        this.accepted = accepted;
    }

    public String name() { return name; }
    public String units() { return units; }
    public int size() { return mean.length; }
    /** Start of period k (inclusive). */
    public Instant start(int k) { return Instant.ofEpochSecond(start[k]); }
    /** End of period k (exclusive). */
    public Instant end(int k) { return Instant.ofEpochSecond(end[k]); }
    /** Mean of the valid samples in period k (even if not accepted; NaN if none), in the series' unit. */
    public double rawMean(int k) { return mean[k]; }
    /** Mean of period k if accepted by the coverage rule, else NaN. */
    public double mean(int k) { return accepted[k] ? mean[k] : Double.NaN; }
    /** Number of valid samples in period k. */
    public int count(int k) { return count[k]; }
    /** Number of samples expected in period k. */
    public int expected(int k) { return expected[k]; }
    /** Whether period k met the coverage rule. */
    public boolean accepted(int k) { return accepted[k]; }

    /** Accepted means as a series stamped at the period starts (NaN where not accepted). */
    public TimeSeries means() {
        double[] v = new double[mean.length];
        for (int k = 0; k < v.length; k++) v[k] = mean(k);
        return new TimeSeries(name, units, start.clone(), v);
    }
}
