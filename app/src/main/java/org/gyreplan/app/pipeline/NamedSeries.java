package org.gyreplan.app.pipeline;

import java.time.LocalDate;
import java.util.List;
import java.util.Objects;

/**
 * A time series for charts and tables (e.g. the daily coastal upwelling index at one point).
 *
 * @param name     short name, e.g. the index point's name
 * @param quantity what is measured, e.g. "coastal upwelling index"
 * @param units    unit string, e.g. "m3 s-1 per 100 m"
 * @param dates    one date per value (UTC days)
 * @param values   values, NaN where missing
 * @param lonDeg   position, degrees east (NaN if not a point series)
 * @param latDeg   position, degrees north (NaN if not a point series)
 */
public record NamedSeries(String name, String quantity, String units, List<LocalDate> dates, double[] values,
                          double lonDeg, double latDeg) {
    public NamedSeries {
        Objects.requireNonNull(name);
        dates = List.copyOf(dates);
        if (dates.size() != values.length) {
            throw new IllegalArgumentException("series '" + name + "': " + dates.size() + " dates but " + values.length + " values");
        }
    }
}
