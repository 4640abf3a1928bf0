package org.gyreplan.solver.plan.mooring;

/** Mooring designs with a rule of thumb for the line length (common practice, see {@link MooringLine}). */
public enum MooringType {
    /** Taut subsurface mooring: top float below the surface, scope ≈ 1.0. */
    TAUT_SUBSURFACE,
    /** Slack (inverse-catenary) surface mooring: scope ≈ 1.1–1.4 × depth. */
    SLACK_SURFACE
}
