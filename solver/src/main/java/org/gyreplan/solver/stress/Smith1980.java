package org.gyreplan.solver.stress;

/**
 * Smith (1980) neutral drag coefficient for gale-force winds.
 * <pre>
 *   10³ C_D = 0.61 + 0.063 U
 * </pre>
 * Symbols: U wind speed at 10 m (m s⁻¹); C_D dimensionless.
 *
 * <p>Validity: 6–22 m s⁻¹ (measurement range of the paper). Outside it the linear law is extrapolated and
 * flagged; it stays finite (0.61e-3) as U → 0.
 *
 * <p>Source: Smith, S.D. (1980), "Wind stress and heat flux over the ocean in gale force winds",
 * J. Phys. Oceanogr. 10, 709–726. Range confirmed in the abstract; the coefficients are from memory
 * (widely used in public code).
 */
public final class Smith1980 implements DragLaw {
    /** The single instance. */
    public static final Smith1980 INSTANCE = new Smith1980();

    private Smith1980() {}

    @Override
    public double dragCoefficient(double windSpeed10m) {
        double u = Math.abs(windSpeed10m);
        if (Double.isNaN(u)) return Double.NaN;
        return (0.61 + 0.063 * u) * 1e-3;
    }

    @Override public String id() { return "smith-1980"; }
    @Override public String name() { return "Smith (1980)"; }
    @Override public String source() {
        return "Smith, S.D. (1980), J. Phys. Oceanogr. 10, 709-726; coefficients from memory; "
                + "linear law extrapolated outside 6-22 m/s";
    }
    @Override public double validMinSpeed() { return 6.0; }
    @Override public double validMaxSpeed() { return 22.0; }
    @Override public String toString() { return id(); }
}
