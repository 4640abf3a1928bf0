package org.gyreplan.gisdata.csv;

import org.gyreplan.solver.series.TimeSeries;

import java.time.Instant;
import java.util.Objects;

/**
 * A wind time series at one station: times (UTC, strictly increasing) and the wind vector as eastward and
 * northward components in m s⁻¹ (the direction the air moves toward). Gaps are NaN in both components.
 */
public final class StationWindSeries {
    private final String source;
    private final Instant[] times;
    private final double[] eastwardMs;
    private final double[] northwardMs;

    /**
     * @param source      where the data came from (file name), for reports
     * @param times       sample times, strictly increasing
     * @param eastwardMs  eastward wind component u, m s⁻¹ (NaN = gap)
     * @param northwardMs northward wind component v, m s⁻¹ (NaN = gap)
     */
    public StationWindSeries(String source, Instant[] times, double[] eastwardMs, double[] northwardMs) {
        Objects.requireNonNull(times, "times");
        if (eastwardMs.length != times.length || northwardMs.length != times.length) {
            throw new IllegalArgumentException("times, eastward and northward must have the same length");
        }
        for (int k = 1; k < times.length; k++) {
            if (!times[k].isAfter(times[k - 1])) throw new IllegalArgumentException("times must increase strictly at " + k);
        }
        this.source = source;
        this.times = times.clone();
        this.eastwardMs = eastwardMs.clone();
        this.northwardMs = northwardMs.clone();
    }

    /** Source name. */
    public String source() { return source; }
    /** Number of samples (gaps included). */
    public int size() { return times.length; }
    /** Sample time k. */
    public Instant time(int k) { return times[k]; }
    /** Eastward component at k, m s⁻¹. */
    public double eastwardMs(int k) { return eastwardMs[k]; }
    /** Northward component at k, m s⁻¹. */
    public double northwardMs(int k) { return northwardMs[k]; }
    /** Copy of the times. */
    public Instant[] times() { return times.clone(); }
    /** Copy of the eastward components, m s⁻¹. */
    public double[] eastwardMs() { return eastwardMs.clone(); }
    /** Copy of the northward components, m s⁻¹. */
    public double[] northwardMs() { return northwardMs.clone(); }
    /** The eastward component as a solver series named "eastward_wind" in "m s-1" (times to whole seconds). */
    public TimeSeries eastwardSeries() { return TimeSeries.of("eastward_wind", "m s-1", times, eastwardMs); }

    /** The northward component as a solver series named "northward_wind" in "m s-1" (times to whole seconds). */
    public TimeSeries northwardSeries() { return TimeSeries.of("northward_wind", "m s-1", times, northwardMs); }

    /** Number of samples that are not gaps. */
    public int validCount() {
        int n = 0;
        for (int k = 0; k < times.length; k++) if (!Double.isNaN(eastwardMs[k]) && !Double.isNaN(northwardMs[k])) n++;
        return n;
    }
}
