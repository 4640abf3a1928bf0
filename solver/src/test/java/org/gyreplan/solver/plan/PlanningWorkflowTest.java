package org.gyreplan.solver.plan;

import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.plan.mooring.CandidateLattice;
import org.gyreplan.solver.plan.mooring.ChosenSite;
import org.gyreplan.solver.plan.mooring.DeploymentWindows;
import org.gyreplan.solver.plan.mooring.MooringCandidate;
import org.gyreplan.solver.plan.mooring.MooringSiting;
import org.gyreplan.solver.plan.mooring.MooringType;
import org.gyreplan.solver.plan.mooring.SiteConstraints;
import org.gyreplan.solver.plan.mooring.SiteDossier;
import org.gyreplan.solver.plan.mooring.SiteWeights;
import org.gyreplan.solver.plan.mooring.SitingResult;
import org.gyreplan.solver.plan.survey.ShorePoint;
import org.gyreplan.solver.plan.survey.CruiseSchedule;
import org.gyreplan.solver.plan.survey.DepthModel;
import org.gyreplan.solver.plan.survey.Leg;
import org.gyreplan.solver.plan.survey.Obstacles;
import org.gyreplan.solver.plan.survey.Route;
import org.gyreplan.solver.plan.survey.ScheduleParameters;
import org.gyreplan.solver.plan.survey.Stop;
import org.gyreplan.solver.plan.survey.StopKind;
import org.gyreplan.solver.plan.survey.SurveyRoute;
import org.gyreplan.solver.plan.survey.SurveyStops;
import org.gyreplan.solver.plan.survey.Transect;
import org.gyreplan.solver.plan.survey.TransectDesign;
import org.gyreplan.solver.plan.survey.Transects;
import org.gyreplan.solver.plan.zones.UpwellingStatistics;
import org.gyreplan.solver.plan.zones.UpwellingZone;
import org.gyreplan.solver.plan.zones.UpwellingZones;
import org.gyreplan.solver.plan.zones.ZoneThresholds;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.ProgressListener;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;

import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

/**
 * End to end on an invented eastern-boundary coast (ocean west of 12°W, 20–30°N): statistics → zones → candidates →
 * sites → transects → route around land and an exclusion box → schedule. Checks the hand-derivable facts of the
 * chain (zone width, constraints, no crossings, row counts, budget identities).
 */
class PlanningWorkflowTest {
    private static final GeometryFactory GF = new GeometryFactory();

    static Geometry box(double w, double s, double e, double n) {
        return GF.createPolygon(new Coordinate[] {new Coordinate(w, s), new Coordinate(e, s), new Coordinate(e, n),
                new Coordinate(w, n), new Coordinate(w, s)});
    }

    @Test
    void fromPumpingToSchedule() {
        double spacing = 0.25;
        LonLatGrid g0 = LonLatGrid.covering(-20, -10, 20, 30, spacing, 6.371e6);
        boolean[] ocean = new boolean[g0.size()];
        for (int j = 0; j < g0.ny(); j++) for (int i = 0; i < g0.nx(); i++) ocean[g0.index(i, j)] = g0.lonDeg(i) < -12;
        LonLatGrid g = g0.withOcean(ocean);
        // pumping: 2 m/day at the coast decaying over 100 km offshore, seasonal (strong Apr–Sep), a weak negative
        // background in winter so that persistence falls offshore
        UpwellingStatistics stats = UpwellingStatistics.on(g);
        for (int y = 2001; y <= 2002; y++) {
            for (int m = 1; m <= 12; m++) {
                double season = (m >= 4 && m <= 9) ? 1.5 : 0.5;
                double[] v = new double[g.size()];
                for (int j = 0; j < g.ny(); j++) for (int i = 0; i < g.nx(); i++) {
                    int k = g.index(i, j);
                    if (!ocean[k]) { v[k] = Double.NaN; continue; }
                    double xKm = Geodesy.distanceM(g.lonDeg(i), g.latDeg(j), -12, g.latDeg(j)) / 1000;
                    v[k] = PlanUnits.metresPerDayToMps(2.0 * season * Math.exp(-xKm / 100) - (m <= 3 ? 0.3 : 0.0));
                }
                stats.add(LocalDate.of(y, m, 15).atStartOfDay().toInstant(ZoneOffset.UTC), v);
            }
        }
        List<UpwellingZone> zones = UpwellingZones.find(stats, ZoneThresholds.ofMetresPerDay(1.0, 0.7));
        assertEquals(1, zones.size());
        UpwellingZone z = zones.get(0);
        // annual mean 2·(6·1.5 + 6·0.5)/12·e^(−x/100) − 0.075 ≥ 1 → x ≤ 100·ln(2/1.075) = 62.1 km; persistence ≥ 0.7
        // needs Jan–Mar positive too: 2·0.5·e^(−x/100) &gt; 0.3 → x &lt; 120 km (not binding). Width ≈ 62 km (±1 cell).
        double widthKm = z.areaKm2() / (Geodesy.distanceM(-12, 20, -12, 30) / 1000);
        assertEquals(62.1, widthKm, 0.25 * 111 * Math.cos(Math.toRadians(25)) + 1);
        assertEquals(List.of(4, 5, 6, 7, 8, 9), z.monthsActive());

        // depth: 20 m per km offshore, capped at 5000 m
        double[] depth = new double[g.size()];
        for (int j = 0; j < g.ny(); j++) for (int i = 0; i < g.nx(); i++) {
            double xKm = Geodesy.distanceM(g.lonDeg(i), g.latDeg(j), -12, g.latDeg(j)) / 1000;
            depth[g.index(i, j)] = ocean[g.index(i, j)] ? Math.min(5000, 20 * xKm) : Double.NaN;
        }
        ScalarField depthField = new ScalarField(g, depth, "depth", "m", "water depth, positive down");
        double portLon = -12.05, portLat = 25.0;
        List<MooringCandidate> cands = CandidateLattice.fromGrid(stats, zones, depthField, portLon, portLat, 1,
                ProgressListener.NONE, CancelToken.none());
        Geometry exclusion = box(-12.9, 24.2, -12.4, 24.6);
        SiteConstraints k = new SiteConstraints(200, 4000, 10, 200, List.of(exclusion), 80, true);
        SitingResult r = MooringSiting.choose(cands, k, new SiteWeights(1, 1, 0.5, 0.5), 3);
        assertEquals(3, r.sites().size());
        for (ChosenSite s : r.sites()) {
            assertTrue(s.candidate().zoneId() == 1);
            assertTrue(s.candidate().depthM() >= 200 && s.candidate().depthM() <= 4000);
        }
        DeploymentWindows calm = DeploymentWindows.of(List.of(Instant.parse("2001-06-01T00:00:00Z")), new double[] {5}, 12);
        SiteDossier d = SiteDossier.of(r.sites().get(0), calm, 0.8, MooringType.TAUT_SUBSURFACE, 100, 10);
        assertEquals(List.of(6), d.deploymentMonths());
        assertTrue(d.cautions().stream().anyMatch(c -> c.contains("No wind data for January")));

        // transects through the zone and the route
        List<ShorePoint> coast = new ArrayList<>();
        for (int q = 0; q <= 40; q++) coast.add(new ShorePoint(-12.0, 22 + q * 0.15, 270));
        Geometry land = box(-12.0, 19, -8, 31);
        List<Transect> transects = Transects.design(coast, TransectDesign.simple(120, 3, 150, 30), z.polygon(), land,
                (lon, lat) -> depthField.interpolate(lon, lat));
        assertEquals(3, transects.size());
        List<Stop> stops = new ArrayList<>(SurveyStops.ofTransects(transects));
        stops.removeIf(s -> exclusion.intersects(GF.createPoint(new Coordinate(s.lonDeg(), s.latDeg()))));
        stops.addAll(SurveyStops.ofSites(r.sites(), StopKind.MOORING_DEPLOYMENT));
        Obstacles obstacles = Obstacles.of(List.of(land, exclusion), 3, 2);
        Route route = SurveyRoute.plan(Stop.port("Puerto Ficticio", portLon, portLat), stops, obstacles);
        assertEquals(stops.size() + 1, route.legs().size());
        Geometry both = land.union(exclusion);
        for (Leg l : route.legs()) {
            for (int q = 0; q + 1 < l.waypoints().size(); q++) {
                double[] a = l.waypoints().get(q), b = l.waypoints().get(q + 1);
                double[][] pts = Geodesy.densify(a[0], a[1], b[0], b[1], 500);
                Coordinate[] cs = new Coordinate[pts.length];
                for (int p = 0; p < pts.length; p++) cs[p] = new Coordinate(pts[p][0], pts[p][1]);
                // leaving and entering port touches the coast box only at the port itself (0.05° offshore)
                assertFalse(both.intersects(GF.createLineString(cs)), l.from().id() + "→" + l.to().id());
            }
        }
        CruiseSchedule c = CruiseSchedule.of(route, ScheduleParameters.commonPractice(), Instant.parse("2025-05-01T06:00:00Z"));
        assertEquals(route.legs().size(), c.rows().size());
        assertEquals(route.totalDistanceNmi(), c.totalDistanceNmi(), 1e-9);
        assertEquals(c.totalTransitHours() + c.totalStationHours() + c.totalWaitHours(), c.totalDays() * 24, 1e-3);
        assertEquals(route.totalDistanceNmi() / 10.0, c.totalTransitHours(), 1e-9);
    }
}
