package org.gyreplan.solver.stress;

/**
 * Large &amp; Pond (1981) neutral drag coefficient for moderate to strong winds.
 * <pre>
 *   10³ C_D = 1.2                 for  4 ≤ U &lt; 11 m s⁻¹
 *   10³ C_D = 0.49 + 0.065 U      for 11 ≤ U ≤ 25 m s⁻¹
 * </pre>
 * Symbols: U wind speed at 10 m (m s⁻¹); C_D dimensionless.
 *
 * <p><b>Outside the range (this implementation's choice, stated in reports):</b> below 4 m s⁻¹ C_D is held at
 * 1.2e-3 (so C_D stays finite and the stress tends to zero with U); above 25 m s⁻¹ the linear law is extrapolated.
 * Both are flagged by {@link #inValidRange(double)}. Validity: 4–25 m s⁻¹, neutral stability, open ocean.
 *
 * <p>Source: Large, W.G. and S. Pond (1981), "Open ocean momentum flux measurements in moderate to strong winds",
 * J. Phys. Oceanogr. 11, 324–336 (formula as quoted by secondary texts).
 */
public final class LargePond1981 implements DragLaw {
    /** The single instance. */
    public static final LargePond1981 INSTANCE = new LargePond1981();

    private LargePond1981() {}

    @Override
    public double dragCoefficient(double windSpeed10m) {
        double u = Math.abs(windSpeed10m);
        if (Double.isNaN(u)) return Double.NaN;
        return u < 11.0 ? 1.2e-3 : (0.49 + 0.065 * u) * 1e-3;
    }

    @Override public String id() { return "large-pond-1981"; }
    @Override public String name() { return "Large & Pond (1981)"; }
    @Override public String source() {
        return "Large, W.G. & S. Pond (1981), J. Phys. Oceanogr. 11, 324-336; held at 1.2e-3 below 4 m/s, "
                + "linear law extrapolated above 25 m/s";
    }
    @Override public double validMinSpeed() { return 4.0; }
    @Override public double validMaxSpeed() { return 25.0; }
    @Override public String toString() { return id(); }
}
