package org.gyreplan.app.desktop.study;

/**
 * One line of the cruise table as shown in the plan panel: sail a leg, then work at its end.
 *
 * @param step          leg number, from 1
 * @param leg           "from → to"
 * @param distanceNmi   sailing distance, nautical miles
 * @param transitHours  time under way, h
 * @param stationHours  work at the end of the leg including expected weather downtime, h
 * @param arrivalUtc    arrival time, text (UTC)
 */
public record ScheduleRow(int step, String leg, double distanceNmi, double transitHours, double stationHours,
                          String arrivalUtc) { }
