package org.gyreplan.solver.stress;

/**
 * Large &amp; Yeager (2004) neutral 10 m drag coefficient (the CORE bulk formula).
 * <pre>
 *   10³ C_D = 2.7 / U + 0.142 + U / 13.09,     U = max(|U₁₀|, 0.5 m s⁻¹)
 * </pre>
 * Symbols: U₁₀ wind speed at 10 m (m s⁻¹); C_D dimensionless.
 *
 * <p>Low wind: the 1/U term is evaluated at no less than 0.5 m s⁻¹ (a floor common in practice), so C_D is finite
 * (5.615e-3 at most) and the stress ρₐ C_D |U| U goes to zero with the wind. Validity taken here as
 * 0.5 ≤ U &lt; 33 m s⁻¹: at and above 33 m s⁻¹ the later Large &amp; Yeager (2009) version caps the coefficient,
 * so this law is flagged as extrapolated there.
 *
 * <p>Source: Large, W.G. and S.G. Yeager (2004), "Diurnal to decadal global forcing for ocean and sea-ice models:
 * the data sets and flux climatologies", NCAR Technical Note NCAR/TN-460+STR (formula as used in public model
 * code; the report itself was not consulted).
 */
public final class LargeYeager2004 implements DragLaw {
    /** The single instance. */
    public static final LargeYeager2004 INSTANCE = new LargeYeager2004();
    /** Floor speed for the 1/U term, m s⁻¹. */
    public static final double MIN_SPEED = 0.5;

    private LargeYeager2004() {}

    @Override
    public double dragCoefficient(double windSpeed10m) {
        double u = Math.abs(windSpeed10m);
        if (Double.isNaN(u)) return Double.NaN;
        u = Math.max(u, MIN_SPEED);
        return (2.7 / u + 0.142 + u / 13.09) * 1e-3;
    }

    @Override public String id() { return "large-yeager-2004"; }
    @Override public String name() { return "Large & Yeager (2004)"; }
    @Override public String source() {
        return "Large, W.G. & S.G. Yeager (2004), NCAR/TN-460+STR; 1/U term floored at 0.5 m/s";
    }
    @Override public double validMinSpeed() { return MIN_SPEED; }
    @Override public double validMaxSpeed() { return 33.0; }

    /** 0.5 ≤ |u| &lt; 33 m s⁻¹ (33 m s⁻¹ itself is where the 2009 cap takes over). */
    @Override
    public boolean inValidRange(double u) {
        double s = Math.abs(u);
        return s >= MIN_SPEED && s < 33.0;
    }
    @Override public String toString() { return id(); }
}
