package org.gyreplan.solver.stress;

/**
 * A neutral 10 m drag coefficient as a function of wind speed: the C_D of the bulk formula
 * <pre>
 *   τ = ρₐ C_D(U₁₀) |U₁₀| U₁₀
 * </pre>
 * <table>
 *   <caption>Symbols</caption>
 *   <tr><td>C_D</td><td>neutral drag coefficient at 10 m</td><td>dimensionless</td></tr>
 *   <tr><td>U₁₀</td><td>wind speed at 10 m</td><td>m s⁻¹</td></tr>
 * </table>
 *
 * <p>Contract for every implementation: the speed is taken as |U| (a negative argument is treated as its
 * magnitude); {@code NaN} gives {@code NaN}; the coefficient is finite and non-negative for every finite speed,
 * including U → 0 (laws with a 1/U term evaluate it at a documented floor speed), so the stress tends to zero
 * with the wind. Outside [{@link #validMinSpeed()}, {@link #validMaxSpeed()}] the value is an extrapolation
 * described by the implementation and {@link #inValidRange(double)} is {@code false}.
 * Implementations are listed and created by {@link DragLaws}.
 */
public interface DragLaw {

    /** Neutral 10 m drag coefficient C_D (dimensionless) at wind speed {@code windSpeed10m} (m s⁻¹). */
    double dragCoefficient(double windSpeed10m);

    /** Stable identifier accepted by {@link DragLaws#byName(String)}, e.g. {@code "large-pond-1981"}. */
    String id();

    /** Human-readable name with author and year, e.g. "Large &amp; Pond (1981)". */
    String name();

    /** Published source of the formula, with a provenance note (e.g. "formula from memory"). */
    String source();

    /** Lower end of the published validity range, m s⁻¹. */
    double validMinSpeed();

    /** Upper end of the published validity range, m s⁻¹ (may be infinite). */
    double validMaxSpeed();

    /** Whether |u| (m s⁻¹) lies inside the published validity range; {@code false} for NaN. */
    default boolean inValidRange(double u) {
        double s = Math.abs(u);
        return s >= validMinSpeed() && s <= validMaxSpeed();
    }
}
