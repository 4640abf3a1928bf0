package org.gyreplan.solver.ekman;

/**
 * The band around the equator where Ekman theory (balance with f = 2Ω sin φ) is not applied.
 * <pre>
 *   applies(φ)  ⇔  |φ| &lt; φ_c   or  φ = 0   or  φ is NaN
 * </pre>
 * Symbols: φ latitude (degrees north); φ_c the cut-off latitude (degrees, 0 ≤ φ_c &lt; 90), default 5°.
 *
 * <p>Why: Uₑ = τᵧ/(ρ₀ f) and wₑ = curl(τ/f)/ρ₀ grow without bound as f → 0. Cells inside the band are masked
 * ({@code NaN}) and counted; the latitude ±φ_c itself lies outside the band. With φ_c = 0 only the equator itself
 * (f exactly 0) is excluded. Sign convention: symmetric about the equator.
 * Source: common practice (a few degrees, typically 3–5°, e.g. in upwelling-index and Ekman-pumping climatologies).
 *
 * @param latitudeDeg the cut-off φ_c, degrees
 */
public record EquatorialCutoff(double latitudeDeg) {

    /** The default 5° cut-off (common practice). */
    public static final EquatorialCutoff DEFAULT = new EquatorialCutoff(5.0);

    public EquatorialCutoff {
        if (!(latitudeDeg >= 0 && latitudeDeg < 90)) {
            throw new IllegalArgumentException("equatorial cut-off must be in [0, 90) degrees, got " + latitudeDeg);
        }
    }

    /** A cut-off at {@code latitudeDeg} degrees. */
    public static EquatorialCutoff ofDegrees(double latitudeDeg) {
        return new EquatorialCutoff(latitudeDeg);
    }

    /** Whether latitude {@code latDeg} (degrees north) lies inside the cut-off band, so Ekman quantities are undefined. */
    public boolean applies(double latDeg) {
        if (Double.isNaN(latDeg)) return true;
        double a = Math.abs(latDeg);
        return a < latitudeDeg || a == 0.0;
    }
}
