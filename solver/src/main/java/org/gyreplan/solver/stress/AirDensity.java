package org.gyreplan.solver.stress;

/**
 * Density of moist air from temperature, pressure and humidity, by the ideal-gas law with the virtual temperature.
 * <pre>
 *   ρₐ = p / (R_d T_v),     T_v = T / (1 − (1 − ε) e / p)
 *   e  = q p / (ε + (1 − ε) q)                          (vapour pressure from specific humidity)
 *   e  = RH · e_s(T),  e_s = 611.2 exp(17.67 (T − 273.15) / (T − 29.65))   (Bolton 1980)
 * </pre>
 * <table>
 *   <caption>Symbols</caption>
 *   <tr><td>ρₐ</td><td>air density</td><td>kg m⁻³</td></tr>
 *   <tr><td>p</td><td>air pressure</td><td>Pa</td></tr>
 *   <tr><td>T, T_v</td><td>air temperature, virtual temperature</td><td>K</td></tr>
 *   <tr><td>q</td><td>specific humidity</td><td>kg kg⁻¹</td></tr>
 *   <tr><td>RH</td><td>relative humidity over water, as a fraction 0–1</td><td>1</td></tr>
 *   <tr><td>e, e_s</td><td>vapour pressure, saturation vapour pressure over water</td><td>Pa</td></tr>
 *   <tr><td>R_d</td><td>gas constant of dry air, 287.05287 J kg⁻¹ K⁻¹ (ISO 2533 standard atmosphere)</td><td></td></tr>
 *   <tr><td>ε</td><td>R_d/R_v = 0.622, ratio of the molar masses of water and dry air</td><td>1</td></tr>
 * </table>
 *
 * <p>The virtual-temperature form is exact for an ideal mixture of dry air and vapour (it equals the sum of the two
 * partial densities). Validity: near-surface air, 200–350 K, 10–110 kPa; the Bolton fit is good to 0.1 % for
 * −35 °C … 35 °C. No sign convention applies.
 *
 * <p>Sources: ideal-gas law with virtual temperature (common practice; e.g. Wallace &amp; Hobbs, Atmospheric
 * Science, ch. 3); Bolton, D. (1980), "The computation of equivalent potential temperature", Mon. Wea. Rev. 108,
 * 1046–1053, eq. 10; R_d of the ISO 2533 / ICAO standard atmosphere, which gives 1.225 kg m⁻³ at 288.15 K and
 * 101 325 Pa.
 */
public final class AirDensity {
    private AirDensity() {}

    /** Gas constant of dry air, J kg⁻¹ K⁻¹ (ISO 2533). */
    public static final double R_DRY = 287.05287;
    /** Ratio of the gas constants R_d/R_v (molar masses M_w/M_d), dimensionless (common practice). */
    public static final double EPSILON = 0.622;

    /** Density of dry air, kg m⁻³, at temperature {@code temperatureK} (K) and pressure {@code pressurePa} (Pa). */
    public static double dry(double temperatureK, double pressurePa) {
        check(temperatureK, pressurePa);
        return pressurePa / (R_DRY * temperatureK);
    }

    /** Density of moist air, kg m⁻³, with specific humidity {@code specificHumidity} (kg kg⁻¹, 0 ≤ q &lt; 0.1). */
    public static double withSpecificHumidity(double temperatureK, double pressurePa, double specificHumidity) {
        check(temperatureK, pressurePa);
        if (!(specificHumidity >= 0 && specificHumidity < 0.1)) {
            throw new IllegalArgumentException("specific humidity must be in [0, 0.1) kg/kg, got " + specificHumidity);
        }
        double e = specificHumidity * pressurePa / (EPSILON + (1 - EPSILON) * specificHumidity);
        return fromVapourPressure(temperatureK, pressurePa, e);
    }

    /** Density of moist air, kg m⁻³, with relative humidity over water {@code relativeHumidity} as a fraction 0–1. */
    public static double withRelativeHumidity(double temperatureK, double pressurePa, double relativeHumidity) {
        check(temperatureK, pressurePa);
        if (!(relativeHumidity >= 0 && relativeHumidity <= 1.0)) {
            throw new IllegalArgumentException("relative humidity must be a fraction in [0, 1], got " + relativeHumidity);
        }
        double e = relativeHumidity * saturationVapourPressure(temperatureK);
        if (e >= pressurePa) {
            throw new IllegalArgumentException("vapour pressure " + e + " Pa is not below the air pressure " + pressurePa + " Pa");
        }
        return fromVapourPressure(temperatureK, pressurePa, e);
    }

    /** Saturation vapour pressure over water, Pa (Bolton 1980, eq. 10). */
    public static double saturationVapourPressure(double temperatureK) {
        return 611.2 * Math.exp(17.67 * (temperatureK - 273.15) / (temperatureK - 29.65));
    }

    /** Virtual temperature, K, for vapour pressure {@code vapourPressurePa} (Pa). */
    public static double virtualTemperature(double temperatureK, double pressurePa, double vapourPressurePa) {
        return temperatureK / (1 - (1 - EPSILON) * vapourPressurePa / pressurePa);
    }

    private static double fromVapourPressure(double temperatureK, double pressurePa, double e) {
        return pressurePa / (R_DRY * virtualTemperature(temperatureK, pressurePa, e));
    }

    private static void check(double temperatureK, double pressurePa) {
        if (!(temperatureK >= 150 && temperatureK <= 400)) {
            throw new IllegalArgumentException("air temperature must be in kelvin (150-400 K), got " + temperatureK);
        }
        if (!(pressurePa >= 1e4 && pressurePa <= 2e5)) {
            throw new IllegalArgumentException("air pressure must be in pascal (1e4-2e5 Pa), got " + pressurePa);
        }
    }
}
