package org.gyreplan.solver.plan.survey;

import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;

/**
 * Sunrise, sunset and solar noon from the NOAA solar-position formulas (the NOAA Global Monitoring Laboratory
 * "solar calculator" equations, based on Meeus, J. 1991, <i>Astronomical Algorithms</i>, Willmann-Bell; common
 * practice, accurate to about a minute for latitudes within ±72° and years 1800–2100 — beyond that the times are
 * rougher, and near the polar circles day length is very sensitive to refraction).
 *
 * <pre>
 *   T   = (JD − 2451545)/36525                                   (Julian centuries since J2000.0)
 *   L₀  = 280.46646 + T(36000.76983 + 0.0003032 T)                (geometric mean longitude, °)
 *   M   = 357.52911 + T(35999.05029 − 0.0001537 T)                (mean anomaly, °)
 *   e   = 0.016708634 − T(0.000042037 + 0.0000001267 T)           (orbit eccentricity)
 *   C   = sin M (1.914602 − T(0.004817 + 0.000014 T)) + sin 2M (0.019993 − 0.000101 T) + 0.000289 sin 3M
 *   λ   = L₀ + C − 0.00569 − 0.00478 sin Ω',   Ω' = 125.04 − 1934.136 T      (apparent longitude, °)
 *   ε   = 23° 26′ (21.448 − T(46.815 + T(0.00059 − 0.001813 T)))″ + 0.00256 cos Ω'   (obliquity)
 *   δ   = asin(sin ε sin λ)                                      (declination)
 *   y   = tan²(ε/2)
 *   EoT = 4·deg( y sin 2L₀ − 2e sin M + 4ey sin M cos 2L₀ − ½y² sin 4L₀ − 1.25e² sin 2M )   (minutes)
 *   H₀  = acos( cos 90.833° / (cos φ cos δ) − tan φ tan δ )      (hour angle of sunrise; 0.833° = refraction + semi-diameter)
 *   noon = 720 − 4·lon − EoT (min UTC),  sunrise = noon − 4H₀,  sunset = noon + 4H₀
 * </pre>
 * φ latitude, lon longitude (degrees east). Evaluated at the day's solar noon (one refinement).
 */
public final class SolarDay {
    /** What the sun does on a day at a place. */
    public enum Kind { NORMAL, POLAR_DAY, POLAR_NIGHT }

    /**
     * @param kind           normal day, sun always up, or always down
     * @param sunrise        sunrise (null unless NORMAL)
     * @param solarNoon      solar noon
     * @param sunset         sunset (null unless NORMAL)
     * @param declinationDeg solar declination at noon, degrees
     * @param equationOfTimeMin equation of time at noon, minutes (apparent − mean solar time)
     */
    public record Sun(Kind kind, Instant sunrise, Instant solarNoon, Instant sunset, double declinationDeg,
                      double equationOfTimeMin) {
        /** Day length, hours (24 for polar day, 0 for polar night). */
        public double dayLengthHours() {
            return switch (kind) {
                case NORMAL -> (sunset.toEpochMilli() - sunrise.toEpochMilli()) / 3.6e6;
                case POLAR_DAY -> 24.0;
                case POLAR_NIGHT -> 0.0;
            };
        }
        /** Whether the sun is up at the instant (within this day's sunrise–sunset). */
        public boolean isDaylight(Instant t) {
            return switch (kind) {
                case NORMAL -> !t.isBefore(sunrise) && !t.isAfter(sunset);
                case POLAR_DAY -> true;
                case POLAR_NIGHT -> false;
            };
        }
    }

    private SolarDay() { }

    /** The sun on the UTC calendar date {@code date} at (lon, lat). */
    public static Sun on(LocalDate date, double lonDeg, double latDeg) {
        if (!(latDeg >= -90 && latDeg <= 90)) throw new IllegalArgumentException("latitude must be within ±90°, got " + latDeg);
        double jd0 = date.toEpochDay() + 2440587.5;           // JD at 00:00 UTC
        double noonMin = 720 - 4 * lonDeg;                     // first guess
        double[] s = solar(jd0 + noonMin / 1440.0);
        noonMin = 720 - 4 * lonDeg - s[1];
        s = solar(jd0 + noonMin / 1440.0);
        noonMin = 720 - 4 * lonDeg - s[1];
        double decl = s[0];
        Instant midnight = date.atStartOfDay().toInstant(ZoneOffset.UTC);
        Instant noon = midnight.plusMillis(Math.round(noonMin * 60_000));
        double phi = Math.toRadians(latDeg), dr = Math.toRadians(decl);
        double cosH = Math.cos(Math.toRadians(90.833)) / (Math.cos(phi) * Math.cos(dr)) - Math.tan(phi) * Math.tan(dr);
        if (cosH < -1) return new Sun(Kind.POLAR_DAY, null, noon, null, decl, s[1]);
        if (cosH > 1) return new Sun(Kind.POLAR_NIGHT, null, noon, null, decl, s[1]);
        double h0 = Math.toDegrees(Math.acos(cosH));
        Instant rise = midnight.plusMillis(Math.round((noonMin - 4 * h0) * 60_000));
        Instant set = midnight.plusMillis(Math.round((noonMin + 4 * h0) * 60_000));
        return new Sun(Kind.NORMAL, rise, noon, set, decl, s[1]);
    }

    /** {declination °, equation of time min} at Julian day jd. */
    static double[] solar(double jd) {
        double t = (jd - 2451545.0) / 36525.0;
        double l0 = mod360(280.46646 + t * (36000.76983 + t * 0.0003032));
        double m = 357.52911 + t * (35999.05029 - 0.0001537 * t);
        double e = 0.016708634 - t * (0.000042037 + 0.0000001267 * t);
        double mr = Math.toRadians(m);
        double c = Math.sin(mr) * (1.914602 - t * (0.004817 + 0.000014 * t)) + Math.sin(2 * mr) * (0.019993 - 0.000101 * t)
                + Math.sin(3 * mr) * 0.000289;
        double omega = Math.toRadians(125.04 - 1934.136 * t);
        double lambda = l0 + c - 0.00569 - 0.00478 * Math.sin(omega);
        double eps0 = 23 + (26 + (21.448 - t * (46.815 + t * (0.00059 - t * 0.001813))) / 60) / 60;
        double eps = eps0 + 0.00256 * Math.cos(omega);
        double decl = Math.toDegrees(Math.asin(Math.sin(Math.toRadians(eps)) * Math.sin(Math.toRadians(lambda))));
        double y = Math.pow(Math.tan(Math.toRadians(eps / 2)), 2);
        double l0r = Math.toRadians(l0);
        double eot = 4 * Math.toDegrees(y * Math.sin(2 * l0r) - 2 * e * Math.sin(mr) + 4 * e * y * Math.sin(mr) * Math.cos(2 * l0r)
                - 0.5 * y * y * Math.sin(4 * l0r) - 1.25 * e * e * Math.sin(2 * mr));
        return new double[] {decl, eot};
    }

    private static double mod360(double x) {
        double r = x % 360;
        return r < 0 ? r + 360 : r;
    }
}
