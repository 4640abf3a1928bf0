package org.gyreplan.solver.plan.survey;

/** What happens at a stop of the cruise. */
public enum StopKind {
    /** Port of departure and return. */
    PORT,
    /** CTD cast (profile to near the bottom). */
    CTD_STATION,
    /** Deploy a mooring. */
    MOORING_DEPLOYMENT,
    /** Recover / service / redeploy a mooring. */
    MOORING_SERVICE
}
