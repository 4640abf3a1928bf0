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

    /**
     * The weather model t/(1 − p) is the mean elapsed time to accumulate t hours of workable weather when each short
     * interval is unworkable with probability p independently (a sum of geometric waiting times; elementary
     * probability). Checked by seeded Monte Carlo: t = 10 h, p = 0.3, 6-minute steps, 20 000 trials → 14.286 h
     * within 4 standard errors. With persistent weather (a two-state Markov chain with the same p and 6-hour mean bad
     * spells, stationary at the start) the mean becomes t/(1 − p) + p·τ_b = 14.286 + 1.8 = 16.086 h (derived: bad
     * spells entered while working plus arriving in one), and the spread is much larger — the reason for the
     * contingency caution. The schedule uses the same formula; checked on a one-station cruise.
     */
    @Test
    void weatherDowntimeModelMatchesMonteCarlo() {
        java.util.Random rnd = new java.util.Random(11);
        double t = 10, p = 0.3, dt = 0.1;
        int trials = 20_000;
        double sum = 0, sum2 = 0;
        for (int k = 0; k < trials; k++) {
            double work = 0, elapsed = 0;
            while (work < t - 1e-9) { elapsed += dt; if (rnd.nextDouble() >= p) work += dt; }
            sum += elapsed;
            sum2 += elapsed * elapsed;
        }
        double mean = sum / trials, sd = Math.sqrt(sum2 / trials - mean * mean);
        double model = t / (1 - p);
        assertEquals(model, mean, 4 * sd / Math.sqrt(trials) + 1e-9);
        // persistent weather: P(bad→good) = dt/6h·…, stationary bad fraction p
        double leaveBad = dt / 6.0, leaveGood = leaveBad * p / (1 - p);
        double sumM = 0, sumM2 = 0;
        for (int k = 0; k < trials; k++) {
            boolean bad = rnd.nextDouble() < p;
            double work = 0, elapsed = 0;
            while (work < t - 1e-9) {
                elapsed += dt;
                if (!bad) work += dt;
                bad = bad ? rnd.nextDouble() >= leaveBad : rnd.nextDouble() < leaveGood;
            }
            sumM += elapsed;
            sumM2 += elapsed * elapsed;
        }
        double meanM = sumM / trials, sdM = Math.sqrt(sumM2 / trials - meanM * meanM);
        double sdMean = sdM / Math.sqrt(trials);
        assertEquals(model + p * 6.0, meanM, 4 * sdMean + 0.05, "persistent weather mean (0.05 h for the 6-min step)");
        assertTrue(sdM > 3 * sd, "persistent weather spreads the elapsed time: sd " + sdM + " vs " + sd);
        // the schedule: 10 h of mooring work, p ≈ 0.3, τ_b = 6 h → t/(1 − p) + p·τ_b on station
        Stop port = Stop.port("P", -10, 30);
        double[] pos = Geodesy.direct(-10, 30, 0, 10 * 1852.0);
        Route r = SurveyRoute.inOrder(port, List.of(new Stop("M1", pos[0], pos[1], 3000, StopKind.MOORING_SERVICE)), Obstacles.none());
        DeploymentWindows w = constantDowntime(0.3);
        double pJul = w.downtimeFraction(7);   // 0.3 up to the month's sample count (124 six-hourly samples)
        assertEquals(0.3, pJul, 0.01);
        ScheduleParameters par = new ScheduleParameters(10, 60, 60, 20, 10, 6000, 8, 10, false, w, null, 0.9, 6.0);
        CruiseSchedule c = CruiseSchedule.of(r, par, Instant.parse("2025-07-01T00:00:00Z"));
        assertEquals(10 / (1 - pJul) + pJul * 6, c.rows().get(0).stationHours(), 1e-9);
    }
}
