package org.gyreplan.solver.stress;

/**
 * Large &amp; Pond (1981) modified for low winds as used by Trenberth, Large &amp; Olson (1990).
 * <pre>
 *   10³ C_D = 2.18                 for      U ≤ 1  m s⁻¹
 *   10³ C_D = 0.62 + 1.56 / U      for  1 &lt; U &lt; 3
 *   10³ C_D = 1.14                 for  3 ≤ U &lt; 10
 *   10³ C_D = 0.49 + 0.065 U       for 10 ≤ U
 * </pre>
 * Symbols: U wind speed at 10 m (m s⁻¹); C_D dimensionless. The pieces join continuously at 1, 3 and 10 m s⁻¹.
 *
 * <p>Validity: 0–25 m s⁻¹; above 25 m s⁻¹ the linear law is extrapolated and flagged.
 * Note the 1.14e-3 plateau differs from Large &amp; Pond's published 1.2e-3 for 4–11 m s⁻¹.
 *
 * <p>Source: Trenberth, K.E., W.G. Large and J.G. Olson (1990), "The mean annual cycle in global ocean wind stress",
 * J. Phys. Oceanogr. 20, 1742–1760. The piecewise formula is <b>from memory</b> (the use of this low-wind
 * modification is documented, the coefficients were not confirmed in a text).
 */
public final class TrenberthLargeOlson1990 implements DragLaw {
    /** The single instance. */
    public static final TrenberthLargeOlson1990 INSTANCE = new TrenberthLargeOlson1990();

    private TrenberthLargeOlson1990() {}

    @Override
    public double dragCoefficient(double windSpeed10m) {
        double u = Math.abs(windSpeed10m);
        if (Double.isNaN(u)) return Double.NaN;
        if (u <= 1.0) return 2.18e-3;
        if (u < 3.0) return (0.62 + 1.56 / u) * 1e-3;
        if (u < 10.0) return 1.14e-3;
        return (0.49 + 0.065 * u) * 1e-3;
    }

    @Override public String id() { return "trenberth-1990"; }
    @Override public String name() { return "Trenberth, Large & Olson (1990)"; }
    @Override public String source() {
        return "Trenberth, K.E., W.G. Large & J.G. Olson (1990), J. Phys. Oceanogr. 20, 1742-1760; "
                + "low-wind modification of Large & Pond (1981), coefficients from memory";
    }
    @Override public double validMinSpeed() { return 0.0; }
    @Override public double validMaxSpeed() { return 25.0; }
    @Override public String toString() { return id(); }
}
