package org.gyreplan.solver.ekman;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.stress.StressVector;

/**
 * The steady Ekman spiral in an infinitely deep ocean with constant eddy viscosity, for any stress direction and
 * either hemisphere.
 * <pre>
 *   A_z ∂²W/∂z² = i f W,    ρ₀ A_z ∂W/∂z (0) = T,    W → 0 as z → −∞       (W = u + i v,  T = τₓ + i τᵧ)
 *
 *   W(z) = C e^{a z} e^{i s a z},      a = √(|f| / (2 A_z)),   s = sign f
 *   C    = T (1 − i s) / (2 ρ₀ A_z a)  ⇒  |C| = V₀ = |τ| / (ρ₀ √(|f| A_z))
 * </pre>
 * <table>
 *   <caption>Symbols</caption>
 *   <tr><td>u, v</td><td>eastward, northward current</td><td>m s⁻¹</td></tr>
 *   <tr><td>z</td><td>height, positive upward, 0 at the surface (z ≤ 0 in the layer)</td><td>m</td></tr>
 *   <tr><td>τₓ, τᵧ</td><td>surface stress</td><td>Pa</td></tr>
 *   <tr><td>A_z</td><td>vertical eddy viscosity</td><td>m² s⁻¹</td></tr>
 *   <tr><td>f</td><td>Coriolis parameter</td><td>s⁻¹</td></tr>
 *   <tr><td>a</td><td>inverse e-folding scale, a = π / D_E</td><td>m⁻¹</td></tr>
 *   <tr><td>V₀</td><td>surface speed</td><td>m s⁻¹</td></tr>
 * </table>
 * Sign convention: the surface current is 45° to the right of the stress in the northern hemisphere (left in the
 * southern) and turns further clockwise (NH) / counter-clockwise (SH) with depth; at z = −D_E it points opposite
 * to the surface current with speed e^(−π) V₀. Its vertical integral is the Ekman transport
 * ∫W dz = −i T/(ρ₀ f), i.e. (τᵧ, −τₓ)/(ρ₀ f). Validity: constant A_z, steady state, no bottom, outside the
 * equatorial cut-off (inside it every value is {@code NaN}).
 * Source: Ekman (1905); Stewart, Introduction to Physical Oceanography, eqs. 9.5–9.15 (written there for a
 * northward stress in the northern hemisphere; rotated here to any stress direction and sign of f).
 */
public final class EkmanSpiral {
    private final double cRe;
    private final double cIm;
    private final double a;
    private final double s;
    private final double f;
    private final double rho0Az;

    private EkmanSpiral(double cRe, double cIm, double a, double s, double f, double rho0Az) {
        this.cRe = cRe;
        this.cIm = cIm;
        this.a = a;
        this.s = s;
        this.f = f;
        this.rho0Az = rho0Az;
    }

    private static EkmanSpiral undefined() {
        return new EkmanSpiral(Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN);
    }

    /** The spiral for stress (τₓ, τᵧ) in Pa, eddy viscosity {@code az} (m² s⁻¹) at {@code latDeg}; default 5° cut-off. */
    public static EkmanSpiral of(double tauX, double tauY, double az, double latDeg, PhysicalConstants constants) {
        return of(tauX, tauY, az, latDeg, constants, EquatorialCutoff.DEFAULT);
    }

    /** The spiral; undefined (all values {@code NaN}) inside {@code cutoff}. */
    public static EkmanSpiral of(double tauX, double tauY, double az, double latDeg, PhysicalConstants constants,
                                 EquatorialCutoff cutoff) {
        EkmanDepth.requireViscosity(az);
        if (cutoff.applies(latDeg)) return undefined();
        double f = constants.coriolis(latDeg);
        double s = Math.signum(f);
        double a = Math.sqrt(Math.abs(f) / (2 * az));
        double k = 1.0 / (2 * constants.rho0() * az * a);
        // C = T (1 − i s) k = ((τₓ + s τᵧ) + i (τᵧ − s τₓ)) k
        return new EkmanSpiral((tauX + s * tauY) * k, (tauY - s * tauX) * k, a, s, f, constants.rho0() * az);
    }

    /**
     * The spiral whose surface current is (u₀, v₀) in m s⁻¹, for eddy viscosity {@code az} (m² s⁻¹) at {@code latDeg}:
     * the stress is recovered from C = (u₀ + i v₀) as T = 2 ρ₀ A_z a C / (1 − i s); undefined inside {@code cutoff}.
     */
    public static EkmanSpiral fromSurfaceCurrent(double u0, double v0, double az, double latDeg,
                                                 PhysicalConstants constants, EquatorialCutoff cutoff) {
        EkmanDepth.requireViscosity(az);
        if (cutoff.applies(latDeg)) return undefined();
        double f = constants.coriolis(latDeg);
        double s = Math.signum(f);
        double a = Math.sqrt(Math.abs(f) / (2 * az));
        return new EkmanSpiral(u0, v0, a, s, f, constants.rho0() * az);
    }

    /** The surface stress (Pa) that drives this spiral: T = 2 ρ₀ A_z a C / (1 − i s) = ρ₀ A_z a C (1 + i s). */
    public StressVector stress() {
        double k = rho0Az * a;
        return new StressVector(k * (cRe - s * cIm), k * (cIm + s * cRe));
    }

    /** Eastward surface current u(0), m s⁻¹. */
    public double surfaceEastward() { return cRe; }

    /** Northward surface current v(0), m s⁻¹. */
    public double surfaceNorthward() { return cIm; }

    /** Whether the spiral is defined (outside the cut-off). */
    public boolean isDefined() { return !Double.isNaN(a); }

    /** Eastward current u(z), m s⁻¹, at height {@code z} (m, ≤ 0). */
    public double eastwardAt(double z) {
        requireBelowSurface(z);
        double e = Math.exp(a * z), th = s * a * z;
        return e * (cRe * Math.cos(th) - cIm * Math.sin(th));
    }

    /** Northward current v(z), m s⁻¹, at height {@code z} (m, ≤ 0). */
    public double northwardAt(double z) {
        requireBelowSurface(z);
        double e = Math.exp(a * z), th = s * a * z;
        return e * (cRe * Math.sin(th) + cIm * Math.cos(th));
    }

    /** Speed √(u² + v²) at {@code z}, m s⁻¹ (= V₀ e^{a z}). */
    public double speedAt(double z) { return Math.hypot(eastwardAt(z), northwardAt(z)); }

    /** Surface speed V₀ = |τ|/(ρ₀ √(|f| A_z)), m s⁻¹. */
    public double surfaceSpeed() { return Math.hypot(cRe, cIm); }

    /** Theoretical Ekman depth D_E = π/a = π√(2A_z/|f|), m. */
    public double ekmanDepth() { return Math.PI / a; }

    /** e-folding scale 1/a = √(2A_z/|f|), m. */
    public double eFoldingScale() { return 1.0 / a; }

    /** Coriolis parameter used, s⁻¹. */
    public double coriolis() { return f; }

    private static void requireBelowSurface(double z) {
        if (!(z <= 0)) {
            throw new IllegalArgumentException("height z must be at or below the surface (z <= 0 m, positive up), got " + z);
        }
    }
}
