package org.gyreplan.solver.plan.survey;

import java.util.List;

/**
 * One leg of the route between two consecutive stops.
 *
 * @param from      stop left
 * @param to        stop reached
 * @param distanceM sailing distance along the waypoints, m (sum of WGS 84 geodesic lengths)
 * @param waypoints {lon, lat} from {@code from} to {@code to} inclusive; consecutive waypoints are joined by geodesics;
 *                  more than two when the leg goes around land or an exclusion zone
 */
public record Leg(Stop from, Stop to, double distanceM, List<double[]> waypoints) {
    public Leg {
        waypoints = List.copyOf(waypoints);
    }

    /** Distance in nautical miles (1 nmi = 1852 m). */
    public double distanceNmi() { return distanceM / 1852.0; }

    /** Whether the leg detours around an obstacle. */
    public boolean detours() { return waypoints.size() > 2; }
}
