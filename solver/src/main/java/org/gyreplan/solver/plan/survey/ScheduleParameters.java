package org.gyreplan.solver.plan.survey;

import org.gyreplan.solver.plan.mooring.DeploymentWindows;

/**
 * Ship and deck-work figures for the schedule. Defaults from {@link #commonPractice()} are common practice
 * (CHECKS.md §9): transit 10 kn (PL-01), CTD ~60 m/min down and up (PL-02/PL-03), 20 min overhead per station
 * (PL-04, range 15–30 min); mooring times are planning guesses to be replaced by the mooring team's.
 *
 * @param shipSpeedKn            transit speed, knots (&gt; 0)
 * @param ctdDescentMpm          CTD lowering rate, m per minute (&gt; 0)
 * @param ctdAscentMpm           CTD hoisting rate, m per minute (&gt; 0)
 * @param stationOverheadMin     per-station overhead (approach, deploy, soak, recovery), minutes (≥ 0)
 * @param bottomClearanceM       the cast stops this far above the bottom, m (≥ 0)
 * @param maxCastDepthM          deepest cast (wire length), m (&gt; 0)
 * @param mooringDeploymentHours deck time to deploy one mooring, hours (≥ 0)
 * @param mooringServiceHours    deck time to recover/service/redeploy one mooring, hours (≥ 0)
 * @param daylightForMooring     whether mooring work must start after sunrise and end before sunset
 * @param stationWeather         calm fractions for the CTD operations limit (null = no weather downtime)
 * @param mooringWeather         calm fractions for the mooring operations limit (null = use {@code stationWeather})
 * @param maxDowntimeFraction    cap on the downtime fraction p in 1/(1 − p), 0…0.95 (avoids unbounded waits)
 * @param meanBadSpellHours      mean duration of a spell of weather above the limit, h (≥ 0; 0 = good and bad weather
 *                               finely mixed). Adds p·τ to each operation: the chance of arriving in a bad spell
 *                               times its mean length (see {@link CruiseSchedule})
 */
public record ScheduleParameters(double shipSpeedKn, double ctdDescentMpm, double ctdAscentMpm, double stationOverheadMin,
                                 double bottomClearanceM, double maxCastDepthM, double mooringDeploymentHours,
                                 double mooringServiceHours, boolean daylightForMooring, DeploymentWindows stationWeather,
                                 DeploymentWindows mooringWeather, double maxDowntimeFraction, double meanBadSpellHours) {
    public ScheduleParameters {
        if (!(shipSpeedKn > 0)) throw new IllegalArgumentException("ship speed must be > 0 kn, got " + shipSpeedKn);
        if (!(ctdDescentMpm > 0) || !(ctdAscentMpm > 0)) throw new IllegalArgumentException("CTD winch rates must be > 0 m/min");
        if (!(stationOverheadMin >= 0)) throw new IllegalArgumentException("station overhead must be ≥ 0 min");
        if (!(bottomClearanceM >= 0)) throw new IllegalArgumentException("bottom clearance must be ≥ 0 m");
        if (!(maxCastDepthM > 0)) throw new IllegalArgumentException("maximum cast depth must be > 0 m");
        if (!(mooringDeploymentHours >= 0) || !(mooringServiceHours >= 0)) throw new IllegalArgumentException("mooring work times must be ≥ 0 h");
        if (!(maxDowntimeFraction >= 0 && maxDowntimeFraction <= 0.95)) throw new IllegalArgumentException("maxDowntimeFraction must be in [0, 0.95]");
        if (!(meanBadSpellHours >= 0) || !Double.isFinite(meanBadSpellHours)) throw new IllegalArgumentException("meanBadSpellHours must be finite and ≥ 0 h, got " + meanBadSpellHours);
    }

    /** 10 kn, 60 m/min down and up, 20 min overhead, 10 m above the bottom, 6000 m wire, 8 h deploy, 12 h service, daylight for moorings, no weather, finely mixed weather. */
    public static ScheduleParameters commonPractice() {
        return new ScheduleParameters(10, 60, 60, 20, 10, 6000, 8, 12, true, null, null, 0.9, 0);
    }

    public ScheduleParameters withSpeedKn(double kn) {
        return new ScheduleParameters(kn, ctdDescentMpm, ctdAscentMpm, stationOverheadMin, bottomClearanceM, maxCastDepthM,
                mooringDeploymentHours, mooringServiceHours, daylightForMooring, stationWeather, mooringWeather, maxDowntimeFraction, meanBadSpellHours);
    }

    public ScheduleParameters withWeather(DeploymentWindows station, DeploymentWindows mooring) {
        return new ScheduleParameters(shipSpeedKn, ctdDescentMpm, ctdAscentMpm, stationOverheadMin, bottomClearanceM, maxCastDepthM,
                mooringDeploymentHours, mooringServiceHours, daylightForMooring, station, mooring, maxDowntimeFraction, meanBadSpellHours);
    }

    /** The same with a mean bad-weather spell length, h (0 = finely mixed weather). */
    public ScheduleParameters withBadSpellHours(double hours) {
        return new ScheduleParameters(shipSpeedKn, ctdDescentMpm, ctdAscentMpm, stationOverheadMin, bottomClearanceM, maxCastDepthM,
                mooringDeploymentHours, mooringServiceHours, daylightForMooring, stationWeather, mooringWeather, maxDowntimeFraction, hours);
    }

    public ScheduleParameters withDaylightForMooring(boolean required) {
        return new ScheduleParameters(shipSpeedKn, ctdDescentMpm, ctdAscentMpm, stationOverheadMin, bottomClearanceM, maxCastDepthM,
                mooringDeploymentHours, mooringServiceHours, required, stationWeather, mooringWeather, maxDowntimeFraction, meanBadSpellHours);
    }
}
