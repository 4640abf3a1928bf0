package org.gyreplan.solver.plan;

import java.util.List;

/** Standard cautions carried by every planning product that feeds work at sea. */
public final class Cautions {
    private Cautions() { }

    /** Cautions printed with every plan, site list and route. */
    public static final List<String> STANDARD = List.of(
            "Not for navigation: positions and routes are planning estimates; verify against official charts.",
            "Check notices to mariners, navigational warnings and traffic schemes before sailing.",
            "Permits and local regulations apply (research clearance, exclusive economic zones, protected areas, fishing grounds).",
            "The master and licensed practice decide on passage and deck operations; weather limits are ship-dependent.");
}
