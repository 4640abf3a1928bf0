package org.gyreplan.solver.ekman;

/**
 * Empirical speed of the Ekman surface current from the wind speed.
 * <pre>
 *   Ekman:              V₀ = 0.0127 U₁₀ / √(sin|φ|)
 *   Ralph &amp; Niiler:     V₀ = 0.0068 U₁₀ / √(sin|φ|)
 * </pre>
 * Symbols: V₀ surface current speed (m s⁻¹); U₁₀ wind speed at 10 m (m s⁻¹); φ latitude (degrees).
 * Sign convention: a speed (≥ 0); in the theory the surface current points 45° right of the wind in the northern
 * hemisphere, left in the southern (see {@link EkmanSpiral}). Validity: |φ| ≥ 10° (Ekman's constant);
 * {@code NaN} inside the equatorial cut-off.
 * Sources: Stewart, Introduction to Physical Oceanography, eq. 9.14; Ralph &amp; Niiler (2000), J. Phys.
 * Oceanogr. 29, 2121–2129 (year and pages from memory; coefficient as quoted in secondary texts).
 */
public final class EkmanSurfaceCurrent {
    private EkmanSurfaceCurrent() {}

    /** Ekman's coefficient (dimensionless). */
    public static final double EKMAN_COEFFICIENT = 0.0127;
    /** Ralph &amp; Niiler (2000) coefficient (dimensionless). */
    public static final double RALPH_NIILER_COEFFICIENT = 0.0068;

    /** Ekman's empirical surface speed, m s⁻¹, for wind speed {@code u10} (m s⁻¹); default 5° cut-off. */
    public static double empirical(double u10, double latDeg) {
        return EkmanDepth.windScaled(EKMAN_COEFFICIENT, u10, latDeg, EquatorialCutoff.DEFAULT);
    }

    /** Ekman's empirical surface speed, m s⁻¹; {@code NaN} inside {@code cutoff}. */
    public static double empirical(double u10, double latDeg, EquatorialCutoff cutoff) {
        return EkmanDepth.windScaled(EKMAN_COEFFICIENT, u10, latDeg, cutoff);
    }

    /** Ralph &amp; Niiler (2000) surface speed, m s⁻¹; default 5° cut-off. */
    public static double ralphNiiler(double u10, double latDeg) {
        return EkmanDepth.windScaled(RALPH_NIILER_COEFFICIENT, u10, latDeg, EquatorialCutoff.DEFAULT);
    }

    /** Ralph &amp; Niiler (2000) surface speed, m s⁻¹; {@code NaN} inside {@code cutoff}. */
    public static double ralphNiiler(double u10, double latDeg, EquatorialCutoff cutoff) {
        return EkmanDepth.windScaled(RALPH_NIILER_COEFFICIENT, u10, latDeg, cutoff);
    }
}
