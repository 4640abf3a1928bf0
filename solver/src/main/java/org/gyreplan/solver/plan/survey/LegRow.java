package org.gyreplan.solver.plan.survey;

import java.time.Instant;

/**
 * One row of the cruise table: sail a leg, then work at its end.
 *
 * @param index           1-based leg number
 * @param fromId          stop left
 * @param toId            stop reached
 * @param distanceNmi     sailing distance, nautical miles
 * @param transitHours    transit time at the ship speed, h
 * @param arrival         ETA at {@code toId}
 * @param daylightWaitHours waiting for daylight before mooring work, h
 * @param workHours       planned work at {@code toId} without weather (CTD cast + overhead, or mooring work), h
 * @param weatherHours    expected weather downtime added to the work, h
 * @param stationHours    workHours + weatherHours, h
 * @param departure       when the ship leaves {@code toId}
 * @param cumulativeHours time since the cruise departure when leaving {@code toId}, h
 */
public record LegRow(int index, String fromId, String toId, double distanceNmi, double transitHours, Instant arrival,
                     double daylightWaitHours, double workHours, double weatherHours, double stationHours,
                     Instant departure, double cumulativeHours) { }
