package org.gyreplan.app.desktop.study;

import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.plan.survey.CruiseSchedule;
import org.gyreplan.solver.plan.survey.LegRow;
import org.gyreplan.solver.plan.survey.Obstacles;
import org.gyreplan.solver.plan.survey.Route;
import org.gyreplan.solver.plan.survey.Stop;
import org.gyreplan.solver.plan.survey.SurveyRoute;

import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * An editable cruise: the stops in visiting order, the schedule figures and the obstacles (exclusion zones).
 * Moving a stop (a mooring site or a survey station dragged on the map) keeps the visiting order, reroutes the legs
 * around the obstacles and recomputes the schedule with the solver's {@link SurveyRoute#inOrder} and
 * {@link CruiseSchedule#of}. A stop's water depth is re-read from the bathymetry at its new position when one is
 * given. Not thread-safe; used on the FX thread.
 */
public final class CruisePlan {
    private static final DateTimeFormatter UTC = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm").withZone(ZoneOffset.UTC);

    private final Stop port;
    private final List<Stop> order;
    private final CruiseSchedule original;
    private final Obstacles obstacles;
    private final ScalarField depth;
    private Route route;
    private CruiseSchedule schedule;

    /**
     * @param route     the planned route (its order is kept)
     * @param schedule  the schedule of that route (its parameters and departure are reused)
     * @param obstacles exclusion zones to route around
     * @param depth     sea-floor depth, m positive down, for moved stops; or null to keep their depths
     */
    public CruisePlan(Route route, CruiseSchedule schedule, Obstacles obstacles, ScalarField depth) {
        this.port = Objects.requireNonNull(route, "route").port();
        this.order = new ArrayList<>(route.order());
        this.original = Objects.requireNonNull(schedule, "schedule");
        this.obstacles = obstacles == null ? Obstacles.none() : obstacles;
        this.depth = depth;
        this.route = route;
        this.schedule = schedule;
    }

    public Stop port() { return port; }
    public List<Stop> stops() { return List.copyOf(order); }
    public Route route() { return route; }
    public CruiseSchedule schedule() { return schedule; }

    /** Moves the stop with this id and recomputes route and schedule; returns the new schedule. */
    public CruiseSchedule move(String id, double lonDeg, double latDeg) {
        for (int k = 0; k < order.size(); k++) {
            Stop s = order.get(k);
            if (s.id().equals(id)) {
                double z = s.depthM();
                if (depth != null) {
                    int cell = depth.grid().cellAt(lonDeg, latDeg);
                    z = cell < 0 ? Double.NaN : depth.values()[cell];
                }
                order.set(k, new Stop(s.id(), lonDeg, latDeg, z, s.kind()));
                route = SurveyRoute.inOrder(port, order, obstacles);
                schedule = CruiseSchedule.of(route, original.parameters(), original.departure());
                return schedule;
            }
        }
        throw new IllegalArgumentException("no stop '" + id + "' in the cruise plan");
    }

    /** The schedule as table rows. */
    public List<ScheduleRow> rows() { return rows(schedule); }

    public static List<ScheduleRow> rows(CruiseSchedule s) {
        List<ScheduleRow> out = new ArrayList<>();
        for (LegRow r : s.rows()) {
            out.add(new ScheduleRow(r.index(), r.fromId() + " → " + r.toId(), r.distanceNmi(), r.transitHours(),
                    r.stationHours() + r.daylightWaitHours(), UTC.format(r.arrival())));
        }
        return out;
    }

    /** Each leg's track as {lon, lat} points (detours around exclusion zones included). */
    public List<List<double[]>> tracks() {
        List<List<double[]>> out = new ArrayList<>();
        route.legs().forEach(l -> out.add(l.waypoints()));
        return out;
    }

    /** Departure, text (UTC). */
    public static String utc(Instant t) { return UTC.format(t); }
}
