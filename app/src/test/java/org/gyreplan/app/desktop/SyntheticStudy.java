package org.gyreplan.app.desktop;

import org.gyreplan.app.desktop.map.MapPoint;
import org.gyreplan.app.desktop.study.MapStudy;
import org.gyreplan.app.desktop.study.PointSeries;
import org.gyreplan.app.desktop.study.CruisePlan;
import org.gyreplan.solver.plan.survey.CruiseSchedule;
import org.gyreplan.solver.plan.survey.Obstacles;
import org.gyreplan.solver.plan.survey.Route;
import org.gyreplan.solver.plan.survey.ScheduleParameters;
import org.gyreplan.solver.plan.survey.Stop;
import org.gyreplan.solver.plan.survey.StopKind;
import org.gyreplan.solver.plan.survey.SurveyRoute;
import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;

import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;

/**
 * A small invented study for UI tests only: an idealised rectangular basin 15°–45° N, 60°–20° W on a 1° grid with
 * analytic fields (known values at every cell, so the inspector can be checked), 12 monthly steps, a coast to the
 * east, three index points, two moorings and a five-station survey line. Nothing here is a model result.
 */
public final class SyntheticStudy {
    public static final double WEST = -60, EAST = -20, SOUTH = 15, NORTH = 45;
    private static final GeometryFactory GF = new GeometryFactory();

    private SyntheticStudy() { }

    /** Analytic depth, m: 4000 m in the west, shoaling linearly to 100 m at the coast (20° W). */
    public static double depthAt(double lonDeg) { return Math.max(100, Math.min(4000, 100 + 3900 * (-21 - lonDeg) / 12.0)); }

    /** Analytic "stress curl" for month k (0…11), N m⁻³. */
    public static double curlAt(double latDeg, int k) {
        return -1.0e-7 * Math.sin(Math.PI * (latDeg - SOUTH) / (NORTH - SOUTH)) * (1 + 0.3 * Math.cos(2 * Math.PI * k / 12));
    }

    public static MapStudy build() {
        LonLatGrid grid = LonLatGrid.covering(WEST, EAST, SOUTH, NORTH, 1.0, PhysicalConstants.DEFAULT.earthRadius());
        MapStudy s = new MapStudy();
        s.title = "Synthetic test basin";
        List<Instant> times = new ArrayList<>();
        for (int m = 1; m <= 12; m++) {
            times.add(LocalDate.of(2001, m, 15).atStartOfDay().toInstant(ZoneOffset.UTC));
            s.stepLabels.add(String.format("2001-%02d", m));
        }
        double[] depth = new double[grid.size()];
        for (int j = 0; j < grid.ny(); j++) for (int i = 0; i < grid.nx(); i++) {
            depth[grid.index(i, j)] = depthAt(grid.lonDeg(i));
        }
        s.depth = new ScalarField(grid, depth, "depth", "m", "Sea-floor depth");
        List<ScalarField> curl = new ArrayList<>();
        List<VectorField> stress = new ArrayList<>();
        for (int k = 0; k < 12; k++) {
            double[] c = new double[grid.size()], u = new double[grid.size()], v = new double[grid.size()];
            for (int j = 0; j < grid.ny(); j++) for (int i = 0; i < grid.nx(); i++) {
                double lat = grid.latDeg(j);
                c[grid.index(i, j)] = curlAt(lat, k);
                u[grid.index(i, j)] = -0.1 * Math.cos(Math.PI * (lat - SOUTH) / (NORTH - SOUTH)) * (1 + 0.3 * Math.cos(2 * Math.PI * k / 12));
                v[grid.index(i, j)] = -0.03 * (1 + 0.5 * Math.cos(2 * Math.PI * k / 12));
            }
            curl.add(new ScalarField(grid, c, "curl", "N m-3", "Wind-stress curl"));
            stress.add(new VectorField(new ScalarField(grid, u, "taux", "Pa", "Eastward stress"),
                    new ScalarField(grid, v, "tauy", "Pa", "Northward stress")));
        }
        s.scalars.add(new MapStudy.Scalar("Wind-stress curl", curl, true));
        double[] psi = new double[grid.size()];
        for (int j = 0; j < grid.ny(); j++) for (int i = 0; i < grid.nx(); i++) {
            double x = (grid.lonDeg(i) - WEST) / (EAST - WEST), y = (grid.latDeg(j) - SOUTH) / (NORTH - SOUTH);
            psi[grid.index(i, j)] = -30 * Math.sin(Math.PI * y) * (1 - x) * (1 - Math.exp(-x / 0.06));
        }
        s.streamfunction = new ScalarField(grid, psi, "psi", "Sv", "Streamfunction");
        s.scalars.add(new MapStudy.Scalar("Streamfunction", List.of(s.streamfunction), true));
        s.vectors.add(new MapStudy.Vector("Surface stress arrows", "Surface stress", stress));
        s.land.add(box(-20, 0, 0, 60));
        s.basin = box(WEST, EAST, SOUTH, NORTH);
        s.exclusions.add(box(-28, -24, 30, 33));
        s.upwellingZones.add(box(-23, -20, 20, 32));
        double[] lats = {22, 27, 32};
        for (int p = 0; p < 3; p++) {
            double[] vals = new double[12], cum = new double[12];
            double acc = 0;
            for (int k = 0; k < 12; k++) {
                vals[k] = 100 * (p + 1) * Math.sin(Math.PI * k / 11.0) - 20;
                acc += vals[k];
                cum[k] = acc;
            }
            PointSeries ps = new PointSeries("Coastal upwelling index", "m3 s-1 per 100 m", times, vals, vals.clone(), times, cum,
                    "m3 s-1 per 100 m × months", List.of(times.get(2)), List.of(times.get(9)));
            s.indexPoints.add(new MapStudy.IndexPoint("P" + (p + 1), "Index point " + (p + 1), -21, lats[p],
                    vals[6], "Upwelling index, July", "m3 s-1 per 100 m", ps));
        }
        List<Stop> stops = new ArrayList<>();
        for (int k = 0; k < 5; k++) {
            double lon = -22 - 2 * k;
            stops.add(new Stop("S" + (k + 1), lon, 28, depthAt(lon), StopKind.CTD_STATION));
        }
        stops.add(new Stop("M2", -25, 36, depthAt(-25), StopKind.MOORING_DEPLOYMENT));
        stops.add(new Stop("M1", -24, 25, depthAt(-24), StopKind.MOORING_DEPLOYMENT));
        Stop port = Stop.port("Port Ardent", -20.2, 28.6);
        Obstacles obstacles = Obstacles.of(s.exclusions, 2, 5);
        Route route = SurveyRoute.inOrder(port, stops, obstacles);
        CruiseSchedule schedule = CruiseSchedule.of(route, ScheduleParameters.commonPractice(),
                Instant.parse("2001-06-01T06:00:00Z"));
        s.cruise = new CruisePlan(route, schedule, obstacles, s.depth);
        for (Stop st : stops) {
            MapPoint mp = new MapPoint(st.id(), st.id(), st.lonDeg(), st.latDeg(), Double.NaN);
            if (st.kind() == StopKind.CTD_STATION) s.stations.add(mp); else s.moorings.add(mp);
        }
        s.port = new MapPoint("port", port.id(), port.lonDeg(), port.latDeg(), Double.NaN);
        s.warnings.add("Synthetic test study: every field is an analytic pattern, not a result.");
        return s;
    }

    /** Great-circle distance on a sphere of radius 6371 km (haversine form; Sinnott 1984), km. */
    public static double haversineKm(double lat1, double lon1, double lat2, double lon2) {
        double p1 = Math.toRadians(lat1), p2 = Math.toRadians(lat2);
        double dp = p2 - p1, dl = Math.toRadians(lon2 - lon1);
        double a = Math.sin(dp / 2) * Math.sin(dp / 2) + Math.cos(p1) * Math.cos(p2) * Math.sin(dl / 2) * Math.sin(dl / 2);
        return 2 * 6371.0 * Math.asin(Math.sqrt(a));
    }

    static Polygon box(double w, double e, double s, double n) {
        return GF.createPolygon(new Coordinate[] {new Coordinate(w, s), new Coordinate(e, s), new Coordinate(e, n),
                new Coordinate(w, n), new Coordinate(w, s)});
    }
}
