package org.gyreplan.solver.series;

import java.time.Instant;
import java.util.Arrays;
import java.util.Objects;

/**
 * An immutable series of values at strictly increasing UTC times (epoch seconds), NaN = missing.
 *
 * @see Aggregation
 */
public final class TimeSeries {
    private final String name;
    private final String units;
    private final long[] epochSeconds;
    private final double[] values;

    /**
     * @param name         variable name (e.g. the coast point's name)
     * @param units        unit string (UDUNITS spelling)
     * @param epochSeconds sample times, seconds since 1970-01-01T00:00Z, strictly increasing
     * @param values       sample values, same length; NaN = missing (infinities are rejected)
     */
    public TimeSeries(String name, String units, long[] epochSeconds, double[] values) {
        this.name = Objects.requireNonNull(name, "name");
        this.units = Objects.requireNonNull(units, "units");
        Objects.requireNonNull(epochSeconds, "epochSeconds");
        Objects.requireNonNull(values, "values");
        if (epochSeconds.length != values.length) {
            throw new IllegalArgumentException("series '" + name + "': " + epochSeconds.length + " times but "
                    + values.length + " values");
        }
        for (int k = 1; k < epochSeconds.length; k++) {
            if (epochSeconds[k] <= epochSeconds[k - 1]) {
                throw new IllegalArgumentException("series '" + name + "': times must increase strictly; sample " + k
                        + " (" + Instant.ofEpochSecond(epochSeconds[k]) + ") is not after "
                        + Instant.ofEpochSecond(epochSeconds[k - 1]));
            }
        }
        for (int k = 0; k < values.length; k++) {
            if (Double.isInfinite(values[k])) {
                throw new IllegalArgumentException("series '" + name + "': sample " + k + " is infinite; use NaN for missing");
            }
        }
        this.epochSeconds = epochSeconds.clone();
        this.values = values.clone();
    }

    /** A series from instants. */
    public static TimeSeries of(String name, String units, Instant[] times, double[] values) {
        long[] t = new long[times.length];
        for (int k = 0; k < times.length; k++) t[k] = times[k].getEpochSecond();
        return new TimeSeries(name, units, t, values);
    }

    /** Daily values starting at 00:00 UTC of {@code firstDay} (epoch day), one per day. */
    public static TimeSeries daily(String name, String units, java.time.LocalDate firstDay, double[] values) {
        long[] t = new long[values.length];
        long d0 = firstDay.toEpochDay();
        for (int k = 0; k < values.length; k++) t[k] = (d0 + k) * 86400L;
        return new TimeSeries(name, units, t, values);
    }

    public String name() { return name; }
    public String units() { return units; }
    public int size() { return values.length; }
    /** Time of sample k, epoch seconds. */
    public long epochSecond(int k) { return epochSeconds[k]; }
    /** Time of sample k. */
    public Instant time(int k) { return Instant.ofEpochSecond(epochSeconds[k]); }
    /** Value of sample k (NaN = missing). */
    public double value(int k) { return values[k]; }
    /** A copy of the times, epoch seconds. */
    public long[] epochSeconds() { return epochSeconds.clone(); }
    /** A copy of the values. */
    public double[] values() { return values.clone(); }

    /** Number of non-missing samples. */
    public int validCount() {
        int n = 0;
        for (double v : values) if (!Double.isNaN(v)) n++;
        return n;
    }

    /** Median spacing between consecutive samples, seconds (0 for fewer than two samples). */
    public long medianStepSeconds() {
        if (values.length < 2) return 0;
        long[] d = new long[values.length - 1];
        for (int k = 1; k < values.length; k++) d[k - 1] = epochSeconds[k] - epochSeconds[k - 1];
        Arrays.sort(d);
        return d[d.length / 2];
    }

    /** The same series with other values (same times). */
    public TimeSeries withValues(String newName, String newUnits, double[] newValues) {
        return new TimeSeries(newName, newUnits, epochSeconds, newValues);
    }

    @Override
    public String toString() {
        return "TimeSeries[" + name + " (" + units + "), " + values.length + " samples"
                + (values.length > 0 ? ", " + time(0) + " … " + time(values.length - 1) : "") + "]";
    }
}
