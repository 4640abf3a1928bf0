package org.gyreplan.solver.plan.survey;

import java.util.List;

/**
 * A closed cruise track: port → stops → port.
 *
 * @param port     port of departure and return
 * @param order    stops in visiting order (port excluded)
 * @param legs     legs port → first … last → port
 * @param method   how the order was found, in words
 * @param cautions cautions to print with the route
 */
public record Route(Stop port, List<Stop> order, List<Leg> legs, String method, List<String> cautions) {
    public Route {
        order = List.copyOf(order);
        legs = List.copyOf(legs);
        cautions = List.copyOf(cautions);
    }

    /** Total sailing distance, m. */
    public double totalDistanceM() {
        double s = 0;
        for (Leg l : legs) s += l.distanceM();
        return s;
    }

    /** Total sailing distance, nautical miles. */
    public double totalDistanceNmi() { return totalDistanceM() / 1852.0; }
}
