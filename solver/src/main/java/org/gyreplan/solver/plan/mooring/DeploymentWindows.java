package org.gyreplan.solver.plan.mooring;

import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * Per month of year, the fraction of time the wind speed is below an operations limit (favourable for deck work),
 * from a wind-speed series.
 *
 * <pre>
 *   calm(m) = #{ t in month m : U(t) &lt; U_lim } / #{ t in month m }      (0…1; NaN if month m has no sample)
 * </pre>
 * U wind speed at 10 m (m s⁻¹), U_lim the operations limit (m s⁻¹; mooring work is usually limited to
 * ~20–25 kn, CTD work to ~25–30 kn — common practice, ship-dependent, CHECKS PL-05/PL-06). Each sample counts
 * equally, so the series should be evenly spaced in time. Monthly-mean winds understate the exceedance of a limit
 * (variance is lost in the average); prefer 6-hourly or daily series.
 *
 * @param limitMps   operations limit U_lim, m s⁻¹
 * @param calm       fraction of time below the limit, per month (index 0 = January)
 * @param samples    number of samples per month
 */
public record DeploymentWindows(double limitMps, double[] calm, int[] samples) {

    /** From a wind-speed series (m s⁻¹; non-finite samples skipped). */
    public static DeploymentWindows of(List<Instant> times, double[] windSpeedMps, double limitMps) {
        Objects.requireNonNull(times, "times");
        Objects.requireNonNull(windSpeedMps, "windSpeedMps");
        if (times.size() != windSpeedMps.length) {
            throw new IllegalArgumentException("wind series: " + times.size() + " times but " + windSpeedMps.length + " speeds");
        }
        if (!(limitMps > 0)) throw new IllegalArgumentException("operations wind limit must be > 0 m s-1, got " + limitMps);
        int[] n = new int[12], below = new int[12];
        for (int t = 0; t < windSpeedMps.length; t++) {
            double u = windSpeedMps[t];
            if (!Double.isFinite(u)) continue;
            if (u < 0) throw new IllegalArgumentException("wind series: negative speed " + u + " at " + times.get(t));
            int m = times.get(t).atOffset(ZoneOffset.UTC).getMonthValue() - 1;
            n[m]++;
            if (u < limitMps) below[m]++;
        }
        double[] calm = new double[12];
        for (int m = 0; m < 12; m++) calm[m] = n[m] > 0 ? (double) below[m] / n[m] : Double.NaN;
        return new DeploymentWindows(limitMps, calm, n);
    }

    /** Fraction of time below the limit in month 1…12 (NaN if no data). */
    public double calmFraction(int month) { return calm[month - 1]; }

    /** Fraction of time at or above the limit in month 1…12 (NaN if no data) — the weather-downtime fraction. */
    public double downtimeFraction(int month) { return 1.0 - calm[month - 1]; }

    /** Months (1…12) whose calm fraction is at least {@code minCalmFraction}, ascending. */
    public List<Integer> favourableMonths(double minCalmFraction) {
        List<Integer> out = new ArrayList<>();
        for (int m = 1; m <= 12; m++) if (calm[m - 1] >= minCalmFraction) out.add(m);
        return out;
    }
}
