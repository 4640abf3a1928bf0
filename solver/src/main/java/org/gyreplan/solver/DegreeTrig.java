package org.gyreplan.solver;

/**
 * Trigonometry in degrees with exact values at multiples of 90° and 30°-type angles where double allows:
 * the argument is reduced to [−45°, 45°] before conversion to radians, so sin(0°), sin(180°), cos(90°)
 * are exactly 0 and sin(90°) is exactly 1. The same approach is used by geodesic libraries (Karney 2013).
 */
public final class DegreeTrig {
    private DegreeTrig() {}

    /** sin of an angle in degrees; exact zeros and ones at multiples of 90°. */
    public static double sinDeg(double deg) {
        if (!Double.isFinite(deg)) return Double.NaN;
        double r = Math.IEEEremainder(deg, 360.0);          // in [−180, 180]
        long q = Math.round(r / 90.0);                        // quadrant
        double x = Math.toRadians(r - 90.0 * q);              // in [−45°, 45°]
        double s = Math.sin(x), c = Math.cos(x);
        double v;
        switch ((int) Math.floorMod(q, 4L)) {
            case 0: v = s; break;
            case 1: v = c; break;
            case 2: v = -s; break;
            default: v = -c; break;
        }
        return v == 0.0 ? 0.0 * Math.signum(deg) + 0.0 : v;
    }

    /** cos of an angle in degrees; exact zeros and ones at multiples of 90°. */
    public static double cosDeg(double deg) {
        if (!Double.isFinite(deg)) return Double.NaN;
        double r = Math.IEEEremainder(deg, 360.0);
        long q = Math.round(r / 90.0);
        double x = Math.toRadians(r - 90.0 * q);
        double s = Math.sin(x), c = Math.cos(x);
        double v;
        switch ((int) Math.floorMod(q, 4L)) {
            case 0: v = c; break;
            case 1: v = -s; break;
            case 2: v = -c; break;
            default: v = s; break;
        }
        return v == 0.0 ? 0.0 : v;
    }

    /** Wraps a longitude difference into (−180°, 180°]. */
    public static double wrap180(double deg) {
        double r = Math.IEEEremainder(deg, 360.0);
        return r == -180.0 ? 180.0 : r;
    }
}
