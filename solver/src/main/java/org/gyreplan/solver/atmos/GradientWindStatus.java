package org.gyreplan.solver.atmos;

/** Outcome of a {@link GradientWind} solution. */
public enum GradientWindStatus {
    /** A regular (and, around a high, an anomalous) root exists. */
    REGULAR("regular solution"),
    /**
     * Around a high the geostrophic speed exceeds |f| r / 4: the pressure gradient is too strong for the curvature
     * and the gradient-wind balance has no real root.
     */
    NO_REGULAR_SOLUTION("no gradient-wind solution: geostrophic speed exceeds |f| r / 4 around a high"),
    /** Inside the equatorial cut-off (f too small) or invalid input: no balance is computed. */
    UNDEFINED("undefined: inside the equatorial cut-off or invalid input");

    private final String text;

    GradientWindStatus(String text) { this.text = text; }

    /** A readable description. */
    public String text() { return text; }
}
