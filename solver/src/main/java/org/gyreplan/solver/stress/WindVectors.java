package org.gyreplan.solver.stress;

import org.gyreplan.solver.DegreeTrig;

/**
 * Conversion between the meteorological wind convention and vector components.
 * <pre>
 *   u = −S sin θ,   v = −S cos θ
 *   S = √(u² + v²), θ = atan2(−u, −v)  mapped to [0°, 360°)
 * </pre>
 * <table>
 *   <caption>Symbols</caption>
 *   <tr><td>S</td><td>wind speed</td><td>m s⁻¹</td></tr>
 *   <tr><td>θ</td><td>direction the wind blows FROM, clockwise from true north</td><td>degrees</td></tr>
 *   <tr><td>u, v</td><td>eastward and northward components (the direction the air moves TOWARD)</td><td>m s⁻¹</td></tr>
 * </table>
 * A north wind (θ = 0°) blows toward the south: v &lt; 0. A calm (S = 0) is reported with direction 0°.
 * Source: WMO meteorological convention (common practice). Valid for any finite input; degrees are reduced
 * exactly at multiples of 90° ({@link DegreeTrig}).
 */
public final class WindVectors {
    private WindVectors() {}

    /** Components (u, v), m s⁻¹, of a wind of speed {@code speed} (m s⁻¹, ≥ 0) blowing from {@code fromDeg}. */
    public static WindVector fromMeteorological(double speed, double fromDeg) {
        if (speed < 0) throw new IllegalArgumentException("wind speed must be non-negative, got " + speed);
        return new WindVector(-speed * DegreeTrig.sinDeg(fromDeg), -speed * DegreeTrig.cosDeg(fromDeg));
    }

    /** Direction the wind blows from, degrees clockwise from true north in [0, 360); 0 for a calm. */
    public static double fromDirectionDeg(double eastward, double northward) {
        if (eastward == 0 && northward == 0) return 0.0;
        double deg = Math.toDegrees(Math.atan2(-eastward, -northward));
        if (deg < 0) deg += 360.0;
        return deg >= 360.0 ? 0.0 : deg;
    }

    /** Direction the wind blows from (degrees clockwise from true north, [0, 360)) of {@code wind}. */
    public static double fromDirectionDeg(WindVector wind) {
        return fromDirectionDeg(wind.eastward(), wind.northward());
    }
}
