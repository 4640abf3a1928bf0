package org.gyreplan.solver.upwelling;

/**
 * Parameters of the classic conversion from sea-level pressure to surface stress used for upwelling indices.
 *
 * <pre>
 *   V_g  = k̂ × ∇p / (ρₐ f)                       geostrophic wind
 *   V_gr = (V / V_g) V_g                          optional gradient-wind correction for isobar curvature
 *   W    = a · R(±θ) V                            surface wind: reduced, turned toward low pressure
 *   τ    = ρₐ C_D |W| W                           surface stress
 * </pre>
 * R(±θ) turns counter-clockwise (+θ) in the northern hemisphere and clockwise (−θ) in the southern one, i.e. always
 * toward low pressure.
 *
 * @param reduction              a, ratio of surface to geostrophic wind speed (dimensionless, (0, 1.5])
 * @param turningDeg             θ, turning of the surface wind toward low pressure, degrees in [0, 90)
 * @param dragCoefficient        C_D (dimensionless), constant
 * @param gradientWindCorrection whether to correct the geostrophic speed for isobar curvature (gradient wind)
 */
public record PressureWindMethod(double reduction, double turningDeg, double dragCoefficient,
                                 boolean gradientWindCorrection) {

    /**
     * The classic parameter set for 6-hourly pressure fields: a = 0.7, θ = 15°, C_D = 0.0013, no curvature
     * correction (with ρₐ = 1.22 kg m⁻³ from {@link org.gyreplan.solver.PhysicalConstants}). Bakun (1973), NOAA
     * Tech. Rep. NMFS SSRF-671 — parameters from memory, not confirmed in a text.
     */
    public static final PressureWindMethod CLASSIC = new PressureWindMethod(0.7, 15.0, 0.0013, false);

    /**
     * The classic parameter set for monthly-mean pressure fields: as {@link #CLASSIC} with C_D = 0.0026, which
     * compensates the variance lost by averaging the pressure before squaring the wind (from memory).
     */
    public static final PressureWindMethod CLASSIC_MONTHLY_MEAN = new PressureWindMethod(0.7, 15.0, 0.0026, false);

    public PressureWindMethod {
        new org.gyreplan.solver.atmos.SurfaceWindFromGeostrophic(reduction, turningDeg);   // validates both
        if (!(dragCoefficient > 0 && dragCoefficient < 0.01)) {
            throw new IllegalArgumentException("drag coefficient must be in (0, 0.01), got " + dragCoefficient);
        }
    }

    public PressureWindMethod withReduction(double a) { return new PressureWindMethod(a, turningDeg, dragCoefficient, gradientWindCorrection); }
    public PressureWindMethod withTurningDeg(double t) { return new PressureWindMethod(reduction, t, dragCoefficient, gradientWindCorrection); }
    public PressureWindMethod withDragCoefficient(double cd) { return new PressureWindMethod(reduction, turningDeg, cd, gradientWindCorrection); }
    public PressureWindMethod withGradientWindCorrection(boolean on) { return new PressureWindMethod(reduction, turningDeg, dragCoefficient, on); }
}
