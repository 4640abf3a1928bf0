package org.gyreplan.solver.plan.survey;

import org.gyreplan.solver.plan.Geodesy;
import org.gyreplan.solver.plan.mooring.DeploymentWindows;
import org.junit.jupiter.api.Test;

import java.time.Duration;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

class CruiseScheduleTest {

    /** A downtime climatology with fraction p of time above the limit in every month. */
    static DeploymentWindows constantDowntime(double p) {
        List<Instant> t = new ArrayList<>();
        List<Double> u = new ArrayList<>();
        LocalDate d = LocalDate.of(2019, 1, 1);
        int k = 0;
        while (d.getYear() == 2019) {
            for (int h = 0; h < 24; h += 6) {
                t.add(d.atTime(h, 0).toInstant(ZoneOffset.UTC));
                u.add((k++ % 10) < p * 10 ? 20.0 : 5.0);
            }
            d = d.plusDays(1);
        }
        return DeploymentWindows.of(t, u.stream().mapToDouble(Double::doubleValue).toArray(), 12.0);
    }

    /**
     * Hand-worked time budget (CHECKS PL-01, PL-03, PL-04, common practice):
     * port → station 100 nmi due north, back 100 nmi; 10 kn → 10.0 h each way.
     * Cast: depth 4010 m, 10 m clearance → 4000 m; 4000/60 + 4000/60 = 133.33 min wire time; + 20 min overhead
     * = 153.33 min = 2.5556 h. Weather downtime p = 0.2 → 153.33/0.8 = 191.67 min = 3.1944 h (0.6389 h weather).
     * Total 20 + 3.1944 = 23.1944 h = 0.96644 days.
     */
    @Test
    void handWorkedTimeBudget() {
        Stop port = Stop.port("P", -10, 30);
        double[] p = Geodesy.direct(-10, 30, 0, 100 * 1852.0);
        Stop s = new Stop("S1", p[0], p[1], 4010, StopKind.CTD_STATION);
        Route r = SurveyRoute.inOrder(port, List.of(s), Obstacles.none());
        DeploymentWindows w = constantDowntime(0.2);
        assertEquals(0.2, w.downtimeFraction(6), 1e-12);
        ScheduleParameters par = ScheduleParameters.commonPractice().withWeather(w, null);
        Instant dep = Instant.parse("2025-06-01T08:00:00Z");
        CruiseSchedule c = CruiseSchedule.of(r, par, dep);
        assertEquals(2, c.rows().size());
        LegRow out = c.rows().get(0), back = c.rows().get(1);
        assertEquals(100.0, out.distanceNmi(), 1e-6);
        assertEquals(10.0, out.transitHours(), 1e-6);
        assertEquals(Instant.parse("2025-06-01T18:00:00Z"), out.arrival());
        assertEquals(133.333333 / 60 + 20.0 / 60, out.workHours(), 1e-6);
        assertEquals(191.666667 / 60, out.stationHours(), 1e-6);
        assertEquals(38.333333 / 60, out.weatherHours(), 1e-6);
        assertEquals(0.0, back.stationHours(), 0);
        assertEquals(23.194444, c.rows().get(1).cumulativeHours(), 1e-3);
        assertEquals(23.194444 / 24, c.totalDays(), 1e-4);
        assertEquals(200.0, c.totalDistanceNmi(), 1e-6);
        assertEquals(20.0, c.totalTransitHours(), 1e-6);
        assertEquals(dep.plusMillis(Math.round(23.194444 * 3.6e6)).getEpochSecond(), c.returnTime().getEpochSecond(), 1);
        // 12 kn: 100 nmi → 8.33 h (PL-01)
        CruiseSchedule fast = CruiseSchedule.of(r, ScheduleParameters.commonPractice().withSpeedKn(12), dep);
        assertEquals(100.0 / 12, fast.rows().get(0).transitHours(), 1e-6);
        assertEquals(153.333333 / 60, fast.rows().get(0).stationHours(), 1e-6);
    }

    /**
     * Mooring work needs daylight: arriving at 20:00 UTC at (0°, 0°) on 20 March 2024, 8 h of work waits for the next
     * sunrise, ≈ 06:04 UTC (noon ≈ 12:07 UTC from the equation of time ≈ −7.5 min, half day ≈ 6 h 03 min; from
     * memory, ±6 min), and ends before sunset.
     */
    @Test
    void mooringWaitsForDaylight() {
        double[] portPos = Geodesy.direct(0, 0, 180, 10 * 12 * 1852.0);   // 120 nmi south → 12 h at 10 kn
        Stop port = Stop.port("P", portPos[0], portPos[1]);
        Stop m = new Stop("M1", 0, 0, 4000, StopKind.MOORING_DEPLOYMENT);
        Route r = SurveyRoute.inOrder(port, List.of(m), Obstacles.none());
        CruiseSchedule c = CruiseSchedule.of(r, ScheduleParameters.commonPractice(), Instant.parse("2024-03-20T08:00:00Z"));
        LegRow row = c.rows().get(0);
        assertEquals(Instant.parse("2024-03-20T20:00:00Z").getEpochSecond(), row.arrival().getEpochSecond(), 2);
        Instant start = row.arrival().plusMillis(Math.round(row.daylightWaitHours() * 3.6e6));
        assertEquals(0, Duration.between(Instant.parse("2024-03-21T06:04:00Z"), start).toMinutes(), 6);
        SolarDay.Sun sun = SolarDay.on(LocalDate.of(2024, 3, 21), 0, 0);
        assertTrue(!start.isBefore(sun.sunrise()) && !row.departure().isAfter(sun.sunset()));
        assertEquals(8.0, row.stationHours(), 1e-9);
        // without the daylight rule the work starts at once
        CruiseSchedule n = CruiseSchedule.of(r, ScheduleParameters.commonPractice().withDaylightForMooring(false),
                Instant.parse("2024-03-20T08:00:00Z"));
        assertEquals(0.0, n.rows().get(0).daylightWaitHours(), 0);
    }
}
