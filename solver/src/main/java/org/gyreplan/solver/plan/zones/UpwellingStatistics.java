package org.gyreplan.solver.plan.zones;

import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;

import java.time.Instant;
import java.time.ZoneOffset;
import java.util.Objects;

/**
 * Streaming per-cell statistics of an upwelling rate (e.g. Ekman pumping w_E, m s⁻¹, positive upward): one
 * time step at a time, memory O(12 · cells), never the whole series.
 *
 * <pre>
 *   mean      w̄   = (1/n) Σ wₜ                              (m s⁻¹)
 *   std       s   = √( Σ (wₜ − w̄)² / (n − 1) )              (m s⁻¹, sample standard deviation; 0 if n = 1)
 *   persistence p = #{ wₜ &gt; w₀ } / n                       (fraction of time upwelling, 0…1)
 *   month mean  w̄ₘ = mean of wₜ over steps in month m (UTC), m = 1…12
 *   peak month  argmaxₘ w̄ₘ (1…12; 0 where no month has data)
 * </pre>
 * Mean and variance by Welford's (1962) one-pass update ("Note on a method for calculating corrected sums of
 * squares and products", Technometrics 4, 419–420), which avoids the cancellation of the naive Σw² − n w̄².
 * w₀ is the "upwelling" cut (default 0: any upward velocity counts). Non-finite values (land, equatorial
 * cut-off, missing) are skipped per cell, so n may differ between cells. Results are bit-identical for the same
 * input order. The raw-array entry points ({@link #add(Instant, double[])}, {@link #addCellSeries}) accept any rate
 * (e.g. a coastal upwelling index in m³ s⁻¹ per 100 m) as long as the cut and the zone thresholds use the same unit;
 * the {@code ScalarField} entry point insists on m s⁻¹.
 */
public final class UpwellingStatistics {
    private final LonLatGrid grid;
    private final double upwellingCutMps;
    private final long[] count;
    private final double[] mean;
    private final double[] m2;
    private final long[] upCount;
    private final double[] monthSum;   // [month0 * size + k]
    private final long[] monthCount;
    private int steps;

    private UpwellingStatistics(LonLatGrid grid, double upwellingCutMps) {
        this.grid = Objects.requireNonNull(grid, "grid");
        if (!Double.isFinite(upwellingCutMps)) throw new IllegalArgumentException("upwelling cut must be finite (m s-1)");
        this.upwellingCutMps = upwellingCutMps;
        int n = grid.size();
        count = new long[n];
        mean = new double[n];
        m2 = new double[n];
        upCount = new long[n];
        monthSum = new double[12 * n];
        monthCount = new long[12 * n];
    }

    /** An empty accumulator counting w &gt; 0 as upwelling. */
    public static UpwellingStatistics on(LonLatGrid grid) { return new UpwellingStatistics(grid, 0.0); }

    /** An empty accumulator counting w &gt; {@code upwellingCutMps} (m s⁻¹) as upwelling. */
    public static UpwellingStatistics on(LonLatGrid grid, double upwellingCutMps) {
        return new UpwellingStatistics(grid, upwellingCutMps);
    }

    /** Adds one time step of a field on the same grid geometry; its units must be m s⁻¹. */
    public UpwellingStatistics add(Instant time, ScalarField field) {
        Objects.requireNonNull(field, "field");
        if (!field.grid().sameGeometry(grid)) {
            throw new IllegalArgumentException("field '" + field.name() + "' is on another grid than the statistics ("
                    + field.grid() + " vs " + grid + ")");
        }
        String u = field.units().trim();
        if (!java.util.Set.of("m s-1", "m/s", "m s^-1", "m s**-1", "m.s-1").contains(u)) {
            throw new IllegalArgumentException("field '" + field.name() + "' has units '" + field.units()
                    + "', expected an upwelling rate in 'm s-1'");
        }
        return add(time, field.values());
    }

    /** Adds one time step: values in m s⁻¹, flat {@code [j * nx + i]}, NaN where undefined. Land cells are ignored. */
    public UpwellingStatistics add(Instant time, double[] values) {
        Objects.requireNonNull(time, "time");
        Objects.requireNonNull(values, "values");
        int n = grid.size();
        if (values.length != n) {
            throw new IllegalArgumentException("time step " + time + " has " + values.length + " values, grid has " + n);
        }
        int month0 = time.atOffset(ZoneOffset.UTC).getMonthValue() - 1;
        int off = month0 * n;
        for (int k = 0; k < n; k++) {
            double w = values[k];
            if (!Double.isFinite(w) || !grid.isOcean(k)) continue;
            long c = ++count[k];
            double d = w - mean[k];
            mean[k] += d / c;
            m2[k] += d * (w - mean[k]);
            if (w > upwellingCutMps) upCount[k]++;
            monthSum[off + k] += w;
            monthCount[off + k]++;
        }
        steps++;
        return this;
    }

    /** Adds one time step given as rows {@code values[j][i]} (j northward), m s⁻¹. */
    public UpwellingStatistics add(Instant time, double[][] rows) {
        int nx = grid.nx(), ny = grid.ny();
        if (rows.length != ny) throw new IllegalArgumentException("time step " + time + " has " + rows.length + " rows, grid has " + ny);
        double[] flat = new double[grid.size()];
        for (int j = 0; j < ny; j++) {
            if (rows[j].length != nx) throw new IllegalArgumentException("time step " + time + " row " + j + " has " + rows[j].length + " values, grid has " + nx);
            System.arraycopy(rows[j], 0, flat, j * nx, nx);
        }
        return add(time, flat);
    }

    /**
     * Adds a whole series for one cell (e.g. a coastal upwelling series at a coast cell), m s⁻¹. Does not change
     * {@link #steps()}, which counts field time steps only.
     */
    public UpwellingStatistics addCellSeries(int cell, java.util.List<Instant> times, double[] values) {
        Objects.requireNonNull(times, "times");
        Objects.requireNonNull(values, "values");
        if (cell < 0 || cell >= grid.size()) throw new IllegalArgumentException("cell index " + cell + " is outside the grid (size " + grid.size() + ")");
        if (times.size() != values.length) {
            throw new IllegalArgumentException("cell " + cell + " series: " + times.size() + " times but " + values.length + " values");
        }
        int n = grid.size();
        for (int t = 0; t < values.length; t++) {
            double w = values[t];
            if (!Double.isFinite(w)) continue;
            int off = (times.get(t).atOffset(ZoneOffset.UTC).getMonthValue() - 1) * n;
            long c = ++count[cell];
            double d = w - mean[cell];
            mean[cell] += d / c;
            m2[cell] += d * (w - mean[cell]);
            if (w > upwellingCutMps) upCount[cell]++;
            monthSum[off + cell] += w;
            monthCount[off + cell]++;
        }
        return this;
    }

    public LonLatGrid grid() { return grid; }
    /** Number of time steps added. */
    public int steps() { return steps; }
    /** The upwelling cut w₀, m s⁻¹. */
    public double upwellingCutMps() { return upwellingCutMps; }
    /** Number of finite samples at cell k. */
    public long count(int k) { return count[k]; }
    /** Mean at cell k, m s⁻¹ (NaN if no sample). */
    public double mean(int k) { return count[k] > 0 ? mean[k] : Double.NaN; }
    /** Sample standard deviation at cell k, m s⁻¹ (NaN if no sample, 0 for one sample). */
    public double std(int k) {
        if (count[k] == 0) return Double.NaN;
        if (count[k] == 1) return 0.0;
        return Math.sqrt(Math.max(0.0, m2[k] / (count[k] - 1)));
    }
    /** Fraction of samples with w &gt; w₀ at cell k (NaN if no sample). */
    public double persistence(int k) { return count[k] > 0 ? (double) upCount[k] / count[k] : Double.NaN; }
    /** Climatological mean for month 1…12 at cell k, m s⁻¹ (NaN if that month has no sample). */
    public double monthMean(int k, int month) {
        if (month < 1 || month > 12) throw new IllegalArgumentException("month must be 1…12, got " + month);
        int idx = (month - 1) * grid.size() + k;
        return monthCount[idx] > 0 ? monthSum[idx] / monthCount[idx] : Double.NaN;
    }
    /** Month (1…12) with the largest climatological mean at cell k; 0 if no month has data. Ties: earliest month. */
    public int peakMonth(int k) {
        int best = 0;
        double bv = Double.NEGATIVE_INFINITY;
        for (int m = 1; m <= 12; m++) {
            double v = monthMean(k, m);
            if (Double.isFinite(v) && v > bv) { bv = v; best = m; }
        }
        return best;
    }

    /** Field of means, m s⁻¹. */
    public ScalarField meanField() {
        double[] v = new double[grid.size()];
        for (int k = 0; k < v.length; k++) v[k] = mean(k);
        return new ScalarField(grid, v, "upwelling_mean", "m s-1", "time-mean upwelling rate (positive upward)");
    }
    /** Field of standard deviations, m s⁻¹. */
    public ScalarField stdField() {
        double[] v = new double[grid.size()];
        for (int k = 0; k < v.length; k++) v[k] = std(k);
        return new ScalarField(grid, v, "upwelling_std", "m s-1", "sample standard deviation of the upwelling rate");
    }
    /** Field of persistence (fraction of time upwelling), 1. */
    public ScalarField persistenceField() {
        double[] v = new double[grid.size()];
        for (int k = 0; k < v.length; k++) v[k] = persistence(k);
        return new ScalarField(grid, v, "upwelling_persistence", "1", "fraction of time with upwelling rate above the cut");
    }
    /** Field of peak months (1…12; NaN where no data). */
    public ScalarField peakMonthField() {
        double[] v = new double[grid.size()];
        for (int k = 0; k < v.length; k++) { int m = peakMonth(k); v[k] = m == 0 ? Double.NaN : m; }
        return new ScalarField(grid, v, "upwelling_peak_month", "1", "month of year (1-12) of the largest climatological mean upwelling");
    }
}
