package org.gyreplan.solver.stress;

/**
 * Vera (1983) neutral drag coefficient, as fitted by Large, Morzel &amp; Crawford (1995).
 * <pre>
 *   10³ C_D = 2.717 / U + 0.142 + 0.0764 U,     U = max(|U₁₀|, 0.5 m s⁻¹)
 * </pre>
 * Symbols: U₁₀ wind speed at 10 m (m s⁻¹); C_D dimensionless.
 *
 * <p>Validity: 1–25 m s⁻¹; outside it the formula is extrapolated (the 1/U term floored at 0.5 m s⁻¹) and flagged.
 *
 * <p>Source: Large, W.G., J. Morzel and G.B. Crawford (1995), "Accounting for surface wave distortion of the marine
 * wind profile in low-level ocean storms wind measurements", J. Phys. Oceanogr. 25, 2959–2971, eq. 8, after
 * Vera (1983). Formula from memory.
 */
public final class Vera1983 implements DragLaw {
    /** The single instance. */
    public static final Vera1983 INSTANCE = new Vera1983();

    private Vera1983() {}

    @Override
    public double dragCoefficient(double windSpeed10m) {
        double u = Math.abs(windSpeed10m);
        if (Double.isNaN(u)) return Double.NaN;
        u = Math.max(u, 0.5);
        return (2.717 / u + 0.142 + 0.0764 * u) * 1e-3;
    }

    @Override public String id() { return "vera-1983"; }
    @Override public String name() { return "Vera (1983)"; }
    @Override public String source() {
        return "Vera (1983) as eq. 8 of Large, Morzel & Crawford (1995), J. Phys. Oceanogr. 25, 2959-2971; "
                + "formula from memory; 1/U term floored at 0.5 m/s";
    }
    @Override public double validMinSpeed() { return 1.0; }
    @Override public double validMaxSpeed() { return 25.0; }
    @Override public String toString() { return id(); }
}
