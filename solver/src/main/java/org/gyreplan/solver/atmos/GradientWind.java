package org.gyreplan.solver.atmos;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.ekman.EquatorialCutoff;

/**
 * Gradient wind: the balance of pressure gradient, Coriolis and centrifugal forces for flow along curved isobars,
 * solved from the geostrophic speed.
 * <pre>
 *   V² / r ± |f| V ∓ |f| V_g = 0        (upper signs: around a low; lower signs: around a high)
 *
 *   regular low:     V = (|f| r / 2) (−1 + √(1 + 4 V_g / (|f| r)))
 *   regular high:    V = (|f| r / 2) ( 1 − √(1 − 4 V_g / (|f| r)))
 *   anomalous high:  V = (|f| r / 2) ( 1 + √(1 − 4 V_g / (|f| r)))
 *   high limit:      V_g ≤ |f| r / 4,   V ≤ |f| r / 2,   |∂p/∂n| ≤ ρₐ f² r / 4
 * </pre>
 * <table>
 *   <caption>Symbols</caption>
 *   <tr><td>V</td><td>gradient wind speed</td><td>m s⁻¹</td></tr>
 *   <tr><td>V_g</td><td>geostrophic wind speed |∇p|/(ρₐ|f|)</td><td>m s⁻¹</td></tr>
 *   <tr><td>r</td><td>radius of curvature of the trajectory (positive)</td><td>m</td></tr>
 *   <tr><td>f</td><td>Coriolis parameter</td><td>s⁻¹</td></tr>
 *   <tr><td>ρₐ</td><td>air density</td><td>kg m⁻³</td></tr>
 * </table>
 * Sign convention: speeds are magnitudes (≥ 0); "low" means cyclonic flow (counter-clockwise in the northern
 * hemisphere), "high" anticyclonic; the same magnitudes hold in both hemispheres with |f|. The wind is
 * sub-geostrophic around a low and super-geostrophic around a high.
 * Validity: steady, frictionless, circular trajectories. Around a high, V_g &gt; |f| r / 4 has no real root:
 * reported as {@link GradientWindStatus#NO_REGULAR_SOLUTION} with {@code NaN} speeds, never silently.
 * The anomalous high root (V &gt; |f| r / 2) is returned for completeness; it is rarely observed.
 * The anomalous low (flow around a low with pressure force and Coriolis both outward) is not offered.
 * Sources: Holton, An Introduction to Dynamic Meteorology, ch. 3, eqs. 3.15–3.17 and Table 3.1;
 * AMS Glossary of Meteorology, "gradient wind".
 *
 * @param status         whether a solution exists
 * @param speed          the regular root V, m s⁻¹ ({@code NaN} unless {@code status} is REGULAR)
 * @param anomalousSpeed the anomalous root around a high, m s⁻¹ ({@code NaN} around a low or with no solution)
 */
public record GradientWind(GradientWindStatus status, double speed, double anomalousSpeed) {

    private static final GradientWind UNDEFINED = new GradientWind(GradientWindStatus.UNDEFINED, Double.NaN, Double.NaN);

    /** Whether a regular solution exists. */
    public boolean hasSolution() { return status == GradientWindStatus.REGULAR; }

    /** Gradient wind around a low (cyclonic) for geostrophic speed {@code vg} (m s⁻¹) and radius {@code radius} (m). */
    public static GradientWind aroundLow(double vg, double radius, double latDeg, PhysicalConstants constants) {
        return aroundLow(vg, radius, latDeg, constants, EquatorialCutoff.DEFAULT);
    }

    /** Gradient wind around a low; {@link GradientWindStatus#UNDEFINED} inside {@code cutoff}. */
    public static GradientWind aroundLow(double vg, double radius, double latDeg, PhysicalConstants constants,
                                         EquatorialCutoff cutoff) {
        if (!validInput(vg, radius, latDeg, cutoff)) return UNDEFINED;
        double fr = Math.abs(constants.coriolis(latDeg)) * radius;
        return new GradientWind(GradientWindStatus.REGULAR, 0.5 * fr * (-1 + Math.sqrt(1 + 4 * vg / fr)), Double.NaN);
    }

    /** Gradient wind around a high (anticyclonic); {@link GradientWindStatus#NO_REGULAR_SOLUTION} if V_g &gt; |f| r / 4. */
    public static GradientWind aroundHigh(double vg, double radius, double latDeg, PhysicalConstants constants) {
        return aroundHigh(vg, radius, latDeg, constants, EquatorialCutoff.DEFAULT);
    }

    /** Gradient wind around a high; {@link GradientWindStatus#UNDEFINED} inside {@code cutoff}. */
    public static GradientWind aroundHigh(double vg, double radius, double latDeg, PhysicalConstants constants,
                                          EquatorialCutoff cutoff) {
        if (!validInput(vg, radius, latDeg, cutoff)) return UNDEFINED;
        double fr = Math.abs(constants.coriolis(latDeg)) * radius;
        double d = 1 - 4 * vg / fr;
        if (d < 0) return new GradientWind(GradientWindStatus.NO_REGULAR_SOLUTION, Double.NaN, Double.NaN);
        double root = Math.sqrt(d);
        return new GradientWind(GradientWindStatus.REGULAR, 0.5 * fr * (1 - root), 0.5 * fr * (1 + root));
    }

    /** Largest geostrophic speed a high of radius {@code radius} (m) can balance, |f| r / 4, m s⁻¹. */
    public static double maxGeostrophicSpeedInHigh(double radius, double latDeg, PhysicalConstants constants) {
        return Math.abs(constants.coriolis(latDeg)) * radius / 4;
    }

    /** Largest regular gradient-wind speed around a high, |f| r / 2, m s⁻¹. */
    public static double maxSpeedInHigh(double radius, double latDeg, PhysicalConstants constants) {
        return Math.abs(constants.coriolis(latDeg)) * radius / 2;
    }

    /** Largest pressure gradient a high can balance, ρₐ f² r / 4, Pa m⁻¹ (ρₐ from {@code constants}). */
    public static double maxPressureGradientInHigh(double radius, double latDeg, PhysicalConstants constants) {
        double f = constants.coriolis(latDeg);
        return constants.rhoAir() * f * f * radius / 4;
    }

    private static boolean validInput(double vg, double radius, double latDeg, EquatorialCutoff cutoff) {
        return vg >= 0 && Double.isFinite(vg) && radius > 0 && Double.isFinite(radius)
                && !cutoff.applies(latDeg) && Math.abs(latDeg) <= 90;
    }
}
