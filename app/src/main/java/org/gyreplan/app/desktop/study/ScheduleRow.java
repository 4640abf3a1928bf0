package org.gyreplan.app.desktop.study;

/**
 * One line of a cruise schedule as shown in the plan table.
 *
 * @param step        order, from 1
 * @param what        activity, e.g. "Transit" or "Station S3"
 * @param distanceKm  leg distance, km (0 for work on station)
 * @param hours       duration, h
 * @param arrival     arrival or end time, text (UTC)
 */
public record ScheduleRow(int step, String what, double distanceKm, double hours, String arrival) { }
