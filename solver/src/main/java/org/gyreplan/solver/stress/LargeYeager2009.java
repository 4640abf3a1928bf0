package org.gyreplan.solver.stress;

/**
 * Large &amp; Yeager (2009) neutral 10 m drag coefficient with the high-wind cap.
 * <pre>
 *   10³ C_D = 2.7 / U + 0.142 + U / 13.09 − 3.14807e-10 U⁶    for U &lt; 33 m s⁻¹,  U = max(|U₁₀|, 0.5 m s⁻¹)
 *   10³ C_D = 2.34                                             for U ≥ 33 m s⁻¹
 * </pre>
 * Symbols: U₁₀ wind speed at 10 m (m s⁻¹); C_D dimensionless.
 *
 * <p>Low wind: the 1/U term is evaluated at no less than 0.5 m s⁻¹ (common practice), so C_D stays finite.
 * Validity taken here as U ≥ 0.5 m s⁻¹ with no upper limit, since the cap is the published high-wind treatment.
 * The polynomial and the cap differ by about 0.05 % at 33 m s⁻¹ (2.3389e-3 vs 2.34e-3).
 *
 * <p>Source: Large, W.G. and S.G. Yeager (2009), "The global climatology of an interannually varying air–sea
 * flux data set", Clim. Dyn. 33, 341–364 (formula as used in public model code; the cap value 2.34e-3 is
 * from memory).
 */
public final class LargeYeager2009 implements DragLaw {
    /** The single instance. */
    public static final LargeYeager2009 INSTANCE = new LargeYeager2009();
    /** Speed at and above which the coefficient is capped, m s⁻¹. */
    public static final double CAP_SPEED = 33.0;
    /** The capped coefficient (dimensionless). */
    public static final double CAP_VALUE = 2.34e-3;

    private LargeYeager2009() {}

    @Override
    public double dragCoefficient(double windSpeed10m) {
        double u = Math.abs(windSpeed10m);
        if (Double.isNaN(u)) return Double.NaN;
        if (u >= CAP_SPEED) return CAP_VALUE;
        u = Math.max(u, LargeYeager2004.MIN_SPEED);
        double u2 = u * u;
        double u6 = u2 * u2 * u2;
        return (2.7 / u + 0.142 + u / 13.09 - 3.14807e-10 * u6) * 1e-3;
    }

    @Override public String id() { return "large-yeager-2009"; }
    @Override public String name() { return "Large & Yeager (2009)"; }
    @Override public String source() {
        return "Large, W.G. & S.G. Yeager (2009), Clim. Dyn. 33, 341-364; capped at 2.34e-3 for U >= 33 m/s "
                + "(cap from memory); 1/U term floored at 0.5 m/s";
    }
    @Override public double validMinSpeed() { return LargeYeager2004.MIN_SPEED; }
    @Override public double validMaxSpeed() { return Double.POSITIVE_INFINITY; }
    @Override public String toString() { return id(); }
}
