package org.gyreplan.solver.stress;

/**
 * Garratt (1977) neutral drag coefficient over the sea (linear form).
 * <pre>
 *   10³ C_D = 0.75 + 0.067 U
 * </pre>
 * Symbols: U wind speed at 10 m (m s⁻¹); C_D dimensionless.
 *
 * <p>Validity: 4–21 m s⁻¹; extrapolated and flagged outside (finite, 0.75e-3, as U → 0).
 *
 * <p>Source: Garratt, J.R. (1977), "Review of drag coefficients over oceans and continents", Mon. Wea. Rev. 105,
 * 915–929. Formula confirmed in an abstract; its attribution to this paper is from memory.
 */
public final class Garratt1977 implements DragLaw {
    /** The single instance. */
    public static final Garratt1977 INSTANCE = new Garratt1977();

    private Garratt1977() {}

    @Override
    public double dragCoefficient(double windSpeed10m) {
        double u = Math.abs(windSpeed10m);
        if (Double.isNaN(u)) return Double.NaN;
        return (0.75 + 0.067 * u) * 1e-3;
    }

    @Override public String id() { return "garratt-1977"; }
    @Override public String name() { return "Garratt (1977)"; }
    @Override public String source() {
        return "Garratt, J.R. (1977), Mon. Wea. Rev. 105, 915-929 (attribution from memory); "
                + "linear law extrapolated outside 4-21 m/s";
    }
    @Override public double validMinSpeed() { return 4.0; }
    @Override public double validMaxSpeed() { return 21.0; }
    @Override public String toString() { return id(); }
}
