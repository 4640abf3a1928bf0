package org.gyreplan.app.desktop.study;

import java.time.Instant;
import java.util.List;

/**
 * The charts of one index point: its time series, monthly climatology and cumulative index with season dates.
 *
 * @param quantity     what the series is, e.g. "Coastal upwelling index"
 * @param units        unit of {@code values} and {@code climatology}, e.g. "m3 s-1 per 100 m"
 * @param times        UTC instants of the series
 * @param values       one value per instant (NaN = missing)
 * @param climatology  12 monthly means, January first (NaN = missing); may be empty
 * @param cumulativeTimes instants of the cumulative index (may differ from {@code times}); may be empty
 * @param cumulative   cumulative index from the start of each year, one per cumulative instant; may be empty
 * @param cumulativeUnits unit of the cumulative index
 * @param seasonStarts dates where the upwelling season starts (may be empty)
 * @param seasonEnds   dates where it ends (may be empty)
 */
public record PointSeries(String quantity, String units, List<Instant> times, double[] values, double[] climatology,
                          List<Instant> cumulativeTimes, double[] cumulative, String cumulativeUnits, List<Instant> seasonStarts, List<Instant> seasonEnds) {
    public PointSeries {
        times = List.copyOf(times);
        cumulativeTimes = List.copyOf(cumulativeTimes);
        seasonStarts = List.copyOf(seasonStarts);
        seasonEnds = List.copyOf(seasonEnds);
        if (values.length != times.size()) {
            throw new IllegalArgumentException("series '" + quantity + "': " + values.length + " values for " + times.size() + " times");
        }
        if (cumulative.length != cumulativeTimes.size()) {
            throw new IllegalArgumentException("series '" + quantity + "': cumulative index has " + cumulative.length
                    + " values for " + cumulativeTimes.size() + " times");
        }
    }
}
