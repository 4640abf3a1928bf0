package org.gyreplan.solver.stress;

/**
 * Yelland &amp; Taylor (1996) neutral drag coefficient from the inertial-dissipation method.
 * <pre>
 *   10³ C_D = 0.29 + 3.1 / U + 7.7 / U²     for 3 ≤ U &lt; 6 m s⁻¹
 *   10³ C_D = 0.60 + 0.071 U                for 6 ≤ U ≤ 26 m s⁻¹
 * </pre>
 * Symbols: U wind speed at 10 m (m s⁻¹); C_D dimensionless. The two pieces differ by 0.5 % at 6 m s⁻¹
 * (1.0206e-3 vs 1.026e-3); the linear piece is used at exactly 6 m s⁻¹.
 *
 * <p><b>Outside the range (this implementation's choice):</b> below 3 m s⁻¹ the coefficient is held at its
 * 3 m s⁻¹ value (2.1789e-3) instead of letting 1/U² grow without bound; above 26 m s⁻¹ the linear law is
 * extrapolated. Both are flagged.
 *
 * <p>Source: Yelland, M. and P.K. Taylor (1996), "Wind stress measurements from the open ocean",
 * J. Phys. Oceanogr. 26, 541–558, as quoted by Stewart, Introduction to Physical Oceanography, eq. 4.3
 * (slope 0.071; the paper may give 0.070 — from memory).
 */
public final class YellandTaylor1996 implements DragLaw {
    /** The single instance. */
    public static final YellandTaylor1996 INSTANCE = new YellandTaylor1996();

    private YellandTaylor1996() {}

    @Override
    public double dragCoefficient(double windSpeed10m) {
        double u = Math.abs(windSpeed10m);
        if (Double.isNaN(u)) return Double.NaN;
        if (u >= 6.0) return (0.60 + 0.071 * u) * 1e-3;
        u = Math.max(u, 3.0);
        return (0.29 + 3.1 / u + 7.7 / (u * u)) * 1e-3;
    }

    @Override public String id() { return "yelland-taylor-1996"; }
    @Override public String name() { return "Yelland & Taylor (1996)"; }
    @Override public String source() {
        return "Yelland, M. & P.K. Taylor (1996), J. Phys. Oceanogr. 26, 541-558, as quoted by Stewart eq. 4.3; "
                + "held at the 3 m/s value below 3 m/s, linear law extrapolated above 26 m/s";
    }
    @Override public double validMinSpeed() { return 3.0; }
    @Override public double validMaxSpeed() { return 26.0; }
    @Override public String toString() { return id(); }
}
