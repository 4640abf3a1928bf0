package org.gyreplan.solver.plan.survey;

import org.gyreplan.solver.plan.PlanUnits;
import org.gyreplan.solver.plan.mooring.DeploymentWindows;

import java.time.Duration;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;

/**
 * The time budget of a cruise along a {@link Route}.
 *
 * <pre>
 *   transit      t_tr = s / V                                   (s leg distance, V ship speed; 1 kn = 1852/3600 m s⁻¹)
 *   CTD station  t_w  = z_c / r_down + z_c / r_up + t_oh,      z_c = min(depth − clearance, max cast)
 *   mooring      t_w  = deployment or service hours
 *   weather      t_st = t_w / (1 − p) + p·τ_b,   p = min(downtime fraction of the arrival month, p_max)
 *   daylight     mooring work waits for sunrise if it would start before sunrise or end after sunset
 * </pre>
 * Weather model: deck work proceeds only while the wind is below the operations limit, which it is a fraction
 * (1 − p) of the time (climatology of the arrival month, UTC). If good and bad weather alternate as a two-state
 * Markov process with mean bad-spell length τ_b (stationary at arrival), the expected elapsed time to get t_w of
 * workable time is exactly t_w/(1 − p) + p·τ_b: the first term counts the bad spells entered while working, the
 * second the chance of arriving in a bad spell times its mean (remaining) length. τ_b = 0 gives finely mixed weather.
 * This is a mean: real storms come in blocks of days and the spread of the total is much larger than the mean
 * suggests — add contingency (commonly 10–20 %).
 * Transit is not slowed by weather here. Sunrise/sunset from {@link SolarDay} (NOAA formulas after Meeus 1991).
 * Common-practice figures: CHECKS.md PL-01…PL-06.
 *
 * @param departure   departure from port
 * @param rows        one row per leg
 * @param parameters  figures used
 * @param totalDistanceNmi    total sailing distance, nmi
 * @param totalTransitHours   total transit, h
 * @param totalStationHours   total work incl. weather, h
 * @param totalWeatherHours   weather part of the station hours, h
 * @param totalWaitHours      daylight waiting, h
 * @param totalDays           whole cruise, days
 * @param returnTime          arrival back in port
 * @param cautions            cautions and model notes
 */
public record CruiseSchedule(Instant departure, List<LegRow> rows, ScheduleParameters parameters, double totalDistanceNmi,
                             double totalTransitHours, double totalStationHours, double totalWeatherHours,
                             double totalWaitHours, double totalDays, Instant returnTime, List<String> cautions) {
    public CruiseSchedule {
        rows = List.copyOf(rows);
        cautions = List.copyOf(cautions);
    }

    /** Schedules the route from the departure instant. */
    public static CruiseSchedule of(Route route, ScheduleParameters p, Instant departure) {
        Objects.requireNonNull(route, "route");
        Objects.requireNonNull(p, "parameters");
        Objects.requireNonNull(departure, "departure");
        double speedMps = PlanUnits.knotsToMps(p.shipSpeedKn());
        List<LegRow> rows = new ArrayList<>();
        List<String> cautions = new ArrayList<>(route.cautions());
        Instant now = departure;
        double dist = 0, tr = 0, st = 0, wx = 0, wait = 0;
        int idx = 1;
        for (Leg leg : route.legs()) {
            double transitH = leg.distanceM() / speedMps / PlanUnits.SECONDS_PER_HOUR;
            Instant arrival = plusHours(now, transitH);
            Stop to = leg.to();
            double workH = workHours(to, p, cautions);
            boolean mooring = to.kind() == StopKind.MOORING_DEPLOYMENT || to.kind() == StopKind.MOORING_SERVICE;
            DeploymentWindows w = mooring && p.mooringWeather() != null ? p.mooringWeather() : p.stationWeather();
            double pDown = 0;
            if (w != null && workH > 0) {
                int month = arrival.atOffset(ZoneOffset.UTC).getMonthValue();
                pDown = w.downtimeFraction(month);
                if (!Double.isFinite(pDown)) {
                    cautions.add("No wind data for month " + month + " at " + to.id() + ": no weather downtime assumed there.");
                    pDown = 0;
                }
                if (pDown > p.maxDowntimeFraction()) {
                    cautions.add(String.format(Locale.ROOT, "%s: wind above the limit %.0f %% of the time in month %d; downtime capped at %.0f %%.",
                            to.id(), 100 * pDown, month, 100 * p.maxDowntimeFraction()));
                    pDown = p.maxDowntimeFraction();
                }
            }
            double stationH = workH > 0 ? workH / (1 - pDown) + pDown * p.meanBadSpellHours() : 0.0;
            double waitH = 0;
            if (mooring && p.daylightForMooring() && stationH > 0) {
                waitH = daylightWait(arrival, stationH, to, cautions);
            }
            Instant leave = plusHours(arrival, waitH + stationH);
            double cum = Duration.between(departure, leave).toMillis() / 3.6e6;
            rows.add(new LegRow(idx++, leg.from().id(), to.id(), leg.distanceNmi(), transitH, arrival, waitH, workH,
                    stationH - workH, stationH, leave, cum));
            dist += leg.distanceNmi();
            tr += transitH;
            st += stationH;
            wx += stationH - workH;
            wait += waitH;
            now = leave;
        }
        double totalH = Duration.between(departure, now).toMillis() / 3.6e6;
        cautions.add("Weather downtime is a mean-value estimate (work/(1 − p) + p·bad-spell length); storms come in blocks: add contingency.");
        return new CruiseSchedule(departure, rows, p, dist, tr, st, wx, wait, totalH / 24.0, now, cautions);
    }

    /** CTD wire time + overhead, or mooring work, h. */
    static double workHours(Stop s, ScheduleParameters p, List<String> cautions) {
        return switch (s.kind()) {
            case PORT -> 0.0;
            case CTD_STATION -> {
                double z = s.depthM();
                if (!Double.isFinite(z)) {
                    cautions.add("Station " + s.id() + " has no depth: only the overhead is counted.");
                    z = p.bottomClearanceM();
                }
                double cast = Math.min(Math.max(0.0, z - p.bottomClearanceM()), p.maxCastDepthM());
                double minutes = cast / p.ctdDescentMpm() + cast / p.ctdAscentMpm() + p.stationOverheadMin();
                yield minutes / 60.0;
            }
            case MOORING_DEPLOYMENT -> p.mooringDeploymentHours();
            case MOORING_SERVICE -> p.mooringServiceHours();
        };
    }

    /** Hours to wait so that the work lies between sunrise and sunset of one day. */
    static double daylightWait(Instant arrival, double workH, Stop s, List<String> cautions) {
        LocalDate day = arrival.atOffset(ZoneOffset.UTC).toLocalDate().minusDays(1);
        for (int k = 0; k < 4; k++, day = day.plusDays(1)) {
            SolarDay.Sun sun = SolarDay.on(day, s.lonDeg(), s.latDeg());
            if (sun.kind() == SolarDay.Kind.POLAR_DAY) return 0.0;
            if (sun.kind() == SolarDay.Kind.POLAR_NIGHT) continue;
            Instant start = arrival.isAfter(sun.sunrise()) ? arrival : sun.sunrise();
            Instant end = plusHours(start, workH);
            if (!end.isAfter(sun.sunset())) return Duration.between(arrival, start).toMillis() / 3.6e6;
        }
        cautions.add(s.id() + ": the mooring work does not fit in daylight within the next days; no daylight wait applied.");
        return 0.0;
    }

    private static Instant plusHours(Instant t, double h) { return t.plusMillis(Math.round(h * 3.6e6)); }
}
