package org.gyreplan.solver.plan;

/**
 * Unit conversions used at the edges of the planning packages. All constants are exact definitions.
 *
 * <ul>
 *   <li>1 international nautical mile = 1852 m (definition, 1929 International Hydrographic Conference).</li>
 *   <li>1 knot = 1 nmi h⁻¹ = 1852/3600 m s⁻¹ ≈ 0.514444 m s⁻¹.</li>
 *   <li>1 day = 86 400 s.</li>
 * </ul>
 */
public final class PlanUnits {
    /** Metres per international nautical mile (exact). */
    public static final double METRES_PER_NMI = 1852.0;
    /** Seconds per hour. */
    public static final double SECONDS_PER_HOUR = 3600.0;
    /** Seconds per day. */
    public static final double SECONDS_PER_DAY = 86_400.0;

    private PlanUnits() { }

    /** Knots to m s⁻¹. */
    public static double knotsToMps(double kn) { return kn * METRES_PER_NMI / SECONDS_PER_HOUR; }
    /** m s⁻¹ to knots. */
    public static double mpsToKnots(double mps) { return mps * SECONDS_PER_HOUR / METRES_PER_NMI; }
    /** m to nautical miles. */
    public static double metresToNmi(double m) { return m / METRES_PER_NMI; }
    /** Nautical miles to m. */
    public static double nmiToMetres(double nmi) { return nmi * METRES_PER_NMI; }
    /** m day⁻¹ to m s⁻¹. */
    public static double metresPerDayToMps(double mPerDay) { return mPerDay / SECONDS_PER_DAY; }
    /** m s⁻¹ to m day⁻¹. */
    public static double mpsToMetresPerDay(double mps) { return mps * SECONDS_PER_DAY; }
}
