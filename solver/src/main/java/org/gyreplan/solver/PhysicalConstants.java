package org.gyreplan.solver;

/**
 * The physical constants a run uses. Every value is overridable; reports state the values used.
 *
 * @param omega       Earth's rotation rate Ω, rad s⁻¹. Default 7.292115e-5 (sidereal; WGS 84, EPSG:7030).
 * @param earthRadius mean Earth radius R, m. Default 6.371e6 (common practice).
 * @param rho0        reference sea-water density ρ₀, kg m⁻³. Default 1025 (common practice).
 * @param rhoAir      air density ρₐ, kg m⁻³. Default 1.22 (the value of the classic upwelling-index method, from memory).
 * @param gravity     gravitational acceleration g, m s⁻². Default 9.81 (common practice).
 */
public record PhysicalConstants(double omega, double earthRadius, double rho0, double rhoAir, double gravity) {

    /** Sidereal rotation rate of the Earth, rad s⁻¹ (WGS 84; EPSG:7030 quotes ω = 7292115e-11 rad/s). */
    public static final double OMEGA_SIDEREAL = 7.292115e-5;
    /** Mean Earth radius, m (common practice). */
    public static final double EARTH_RADIUS_MEAN = 6.371e6;
    /** Reference sea-water density, kg m⁻³ (common practice). */
    public static final double RHO_SEA_WATER = 1025.0;
    /** Air density of the classic sea-level-pressure upwelling-index method, kg m⁻³ (from memory). */
    public static final double RHO_AIR_INDEX = 1.22;
    /** Gravitational acceleration, m s⁻² (common practice). */
    public static final double GRAVITY = 9.81;

    /** The defaults listed above. */
    public static final PhysicalConstants DEFAULT =
            new PhysicalConstants(OMEGA_SIDEREAL, EARTH_RADIUS_MEAN, RHO_SEA_WATER, RHO_AIR_INDEX, GRAVITY);

    public PhysicalConstants {
        requirePositive("omega", omega);
        requirePositive("earthRadius", earthRadius);
        requirePositive("rho0", rho0);
        requirePositive("rhoAir", rhoAir);
        requirePositive("gravity", gravity);
    }

    private static void requirePositive(String name, double v) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new IllegalArgumentException(name + " must be a positive finite number, got " + v);
        }
    }

    public PhysicalConstants withRho0(double v) { return new PhysicalConstants(omega, earthRadius, v, rhoAir, gravity); }
    public PhysicalConstants withRhoAir(double v) { return new PhysicalConstants(omega, earthRadius, rho0, v, gravity); }
    public PhysicalConstants withOmega(double v) { return new PhysicalConstants(v, earthRadius, rho0, rhoAir, gravity); }
    public PhysicalConstants withEarthRadius(double v) { return new PhysicalConstants(omega, v, rho0, rhoAir, gravity); }

    /** Coriolis parameter f = 2Ω sin φ, s⁻¹; exactly 0 at the equator. */
    public double coriolis(double latitudeDeg) {
        return 2.0 * omega * DegreeTrig.sinDeg(latitudeDeg);
    }

    /** Meridional gradient of f, β = 2Ω cos φ / R, m⁻¹ s⁻¹; exactly 0 at the poles. */
    public double beta(double latitudeDeg) {
        return 2.0 * omega * DegreeTrig.cosDeg(latitudeDeg) / earthRadius;
    }

    /** Inertial period 2π/|f|, s; infinite at the equator. */
    public double inertialPeriod(double latitudeDeg) {
        return 2.0 * Math.PI / Math.abs(coriolis(latitudeDeg));
    }
}
