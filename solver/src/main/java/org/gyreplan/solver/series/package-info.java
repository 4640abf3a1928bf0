/**
 * Compact time series and the season metrics of coastal upwelling: aggregation to days, months and user periods
 * with a coverage rule, monthly climatology and anomalies, the cumulative upwelling index with spring transition,
 * end of season, length and total, and the persistence of upwelling-favourable conditions.
 *
 * <h2>Conventions</h2>
 * <ul>
 *   <li>Times are UTC instants stored as epoch seconds; days and months are UTC calendar days and months
 *       (proleptic Gregorian, {@code java.time}).</li>
 *   <li>{@code NaN} marks a missing value; every aggregate reports how many valid samples it used.</li>
 *   <li>Day of year is 1-based (1 January = day 1).</li>
 *   <li>Cumulative index unit: index unit × day, e.g. (m³ s⁻¹ per 100 m)·day.</li>
 * </ul>
 */
package org.gyreplan.solver.series;
