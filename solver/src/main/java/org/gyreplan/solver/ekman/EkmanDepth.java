package org.gyreplan.solver.ekman;

import org.gyreplan.solver.DegreeTrig;
import org.gyreplan.solver.PhysicalConstants;

/**
 * Depth scales of the Ekman layer. Two different quantities carry the name "Ekman depth" in the literature;
 * they differ by a factor π and have distinct methods here.
 * <pre>
 *   theoretical (Ekman depth):  D_E = π √(2 A_z / |f|)     depth where the current has turned 180° and decayed to e^(−π) ≈ 4 %
 *   e-folding scale:            d   =   √(2 A_z / |f|)     = D_E / π, depth where the speed has decayed to 1/e
 *   empirical (Ekman):          D_E = 7.6 U₁₀ / √(sin|φ|)
 *   drifter fit (Ralph–Niiler): D_E = 7.12 U₁₀ / √(sin|φ|)
 * </pre>
 * <table>
 *   <caption>Symbols</caption>
 *   <tr><td>D_E, d</td><td>depth scales (positive numbers)</td><td>m</td></tr>
 *   <tr><td>A_z</td><td>vertical eddy viscosity</td><td>m² s⁻¹</td></tr>
 *   <tr><td>f</td><td>Coriolis parameter 2Ω sin φ</td><td>s⁻¹</td></tr>
 *   <tr><td>U₁₀</td><td>wind speed at 10 m</td><td>m s⁻¹</td></tr>
 *   <tr><td>φ</td><td>latitude</td><td>degrees</td></tr>
 *   <tr><td>7.6, 7.12</td><td>empirical coefficients</td><td>s (so that U₁₀ in m s⁻¹ gives metres)</td></tr>
 * </table>
 * Sign convention: depths are positive; the layer occupies −D_E ≤ z ≤ 0. Validity: constant A_z (theoretical);
 * |φ| ≥ 10° for Ekman's empirical constant (derived with ρ = 1027 kg m⁻³, ρₐ = 1.25 kg m⁻³, C_D = 2.6e-3);
 * all return {@code NaN} inside the equatorial cut-off, never infinity.
 * Sources: Stewart, Introduction to Physical Oceanography, eqs. 9.15 and 9.16 and Table 9.3; Ralph, E.A. and
 * P.P. Niiler, "Wind-driven currents in the tropical Pacific", J. Phys. Oceanogr. 29, 2121–2129 (often cited as 2000;
 * year and pages from memory; coefficient 7.12 as quoted in secondary texts).
 */
public final class EkmanDepth {
    private EkmanDepth() {}

    /** Ekman's empirical coefficient, s (Stewart eq. 9.16). */
    public static final double EKMAN_COEFFICIENT = 7.6;
    /** Ralph &amp; Niiler (2000) drifter-fit coefficient, s. */
    public static final double RALPH_NIILER_COEFFICIENT = 7.12;

    /** Theoretical Ekman depth D_E = π√(2A_z/|f|), m, for eddy viscosity {@code az} (m² s⁻¹); default constants and cut-off. */
    public static double theoretical(double az, double latDeg) {
        return theoretical(az, latDeg, PhysicalConstants.DEFAULT, EquatorialCutoff.DEFAULT);
    }

    /** Theoretical Ekman depth D_E = π√(2A_z/|f|), m; {@code NaN} inside {@code cutoff}. */
    public static double theoretical(double az, double latDeg, PhysicalConstants constants, EquatorialCutoff cutoff) {
        return Math.PI * eFoldingScale(az, latDeg, constants, cutoff);
    }

    /** e-folding scale d = √(2A_z/|f|) = D_E/π, m; default constants and cut-off. */
    public static double eFoldingScale(double az, double latDeg) {
        return eFoldingScale(az, latDeg, PhysicalConstants.DEFAULT, EquatorialCutoff.DEFAULT);
    }

    /** e-folding scale d = √(2A_z/|f|) = D_E/π, m; {@code NaN} inside {@code cutoff}. */
    public static double eFoldingScale(double az, double latDeg, PhysicalConstants constants, EquatorialCutoff cutoff) {
        requireViscosity(az);
        if (cutoff.applies(latDeg)) return Double.NaN;
        return Math.sqrt(2 * az / Math.abs(constants.coriolis(latDeg)));
    }

    /** Ekman's empirical depth 7.6·U₁₀/√(sin|φ|), m, for wind speed {@code u10} (m s⁻¹); default cut-off. */
    public static double empirical(double u10, double latDeg) {
        return empirical(u10, latDeg, EquatorialCutoff.DEFAULT);
    }

    /** Ekman's empirical depth 7.6·U₁₀/√(sin|φ|), m; {@code NaN} inside {@code cutoff}. */
    public static double empirical(double u10, double latDeg, EquatorialCutoff cutoff) {
        return windScaled(EKMAN_COEFFICIENT, u10, latDeg, cutoff);
    }

    /** Ralph &amp; Niiler (2000) depth 7.12·U₁₀/√(sin|φ|), m; default cut-off. */
    public static double ralphNiiler(double u10, double latDeg) {
        return ralphNiiler(u10, latDeg, EquatorialCutoff.DEFAULT);
    }

    /** Ralph &amp; Niiler (2000) depth 7.12·U₁₀/√(sin|φ|), m; {@code NaN} inside {@code cutoff}. */
    public static double ralphNiiler(double u10, double latDeg, EquatorialCutoff cutoff) {
        return windScaled(RALPH_NIILER_COEFFICIENT, u10, latDeg, cutoff);
    }

    static double windScaled(double coefficient, double u10, double latDeg, EquatorialCutoff cutoff) {
        if (cutoff.applies(latDeg)) return Double.NaN;
        return coefficient * Math.abs(u10) / Math.sqrt(Math.abs(DegreeTrig.sinDeg(latDeg)));
    }

    static void requireViscosity(double az) {
        if (!(az > 0) || Double.isInfinite(az)) {
            throw new IllegalArgumentException("vertical eddy viscosity A_z must be positive (m2 s-1), got " + az);
        }
    }
}
