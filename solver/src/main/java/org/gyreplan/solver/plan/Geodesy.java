package org.gyreplan.solver.plan;

import net.sf.geographiclib.Geodesic;
import net.sf.geographiclib.GeodesicData;
import net.sf.geographiclib.GeodesicLine;
import net.sf.geographiclib.GeodesicMask;

/**
 * Geodesics on the WGS 84 ellipsoid (a = 6 378 137 m, f = 1/298.257223563) through GeographicLib
 * (Karney 2013, "Algorithms for geodesics", J. Geodesy 87, 43–55; accurate to ~15 nm), plus a spherical
 * haversine used only as a fast pre-filter. Distances in m, azimuths in degrees clockwise from true north,
 * longitudes unrolled (continuous) so a path across the antimeridian stays continuous.
 */
public final class Geodesy {
    private static final Geodesic WGS84 = Geodesic.WGS84;
    /** Mean Earth radius used by the haversine pre-filter, m (IUGG mean radius R₁, rounded). */
    public static final double MEAN_RADIUS_M = 6_371_008.8;

    private Geodesy() { }

    /** Geodesic distance on WGS 84, m. */
    public static double distanceM(double lon1Deg, double lat1Deg, double lon2Deg, double lat2Deg) {
        return WGS84.Inverse(lat1Deg, lon1Deg, lat2Deg, lon2Deg, GeodesicMask.DISTANCE).s12;
    }

    /** Initial azimuth at point 1 of the geodesic to point 2, degrees clockwise from north. */
    public static double initialAzimuthDeg(double lon1Deg, double lat1Deg, double lon2Deg, double lat2Deg) {
        return WGS84.Inverse(lat1Deg, lon1Deg, lat2Deg, lon2Deg, GeodesicMask.AZIMUTH).azi1;
    }

    /** Point reached from (lon, lat) along azimuth {@code aziDeg} after {@code distanceM} m: {lonDeg (unrolled), latDeg}. */
    public static double[] direct(double lonDeg, double latDeg, double aziDeg, double distanceM) {
        GeodesicData d = WGS84.Direct(latDeg, lonDeg, aziDeg, distanceM,
                GeodesicMask.LATITUDE | GeodesicMask.LONGITUDE | GeodesicMask.LONG_UNROLL);
        return new double[] {d.lon2, d.lat2};
    }

    /**
     * Points along the geodesic from 1 to 2, both ends included, at most {@code maxStepM} apart:
     * {@code [n][2]} = {lonDeg (unrolled from lon1), latDeg}.
     */
    public static double[][] densify(double lon1Deg, double lat1Deg, double lon2Deg, double lat2Deg, double maxStepM) {
        GeodesicData inv = WGS84.Inverse(lat1Deg, lon1Deg, lat2Deg, lon2Deg);
        int n = Math.max(1, (int) Math.ceil(inv.s12 / maxStepM));
        double[][] pts = new double[n + 1][];
        GeodesicLine line = WGS84.Line(lat1Deg, lon1Deg, inv.azi1,
                GeodesicMask.LATITUDE | GeodesicMask.LONGITUDE | GeodesicMask.DISTANCE_IN);
        pts[0] = new double[] {lon1Deg, lat1Deg};
        for (int q = 1; q < n; q++) {
            GeodesicData d = line.Position(inv.s12 * q / n,
                    GeodesicMask.LATITUDE | GeodesicMask.LONGITUDE | GeodesicMask.LONG_UNROLL);
            pts[q] = new double[] {d.lon2, d.lat2};
        }
        // exact end point, unrolled next to the previous one
        double lonEnd = lon2Deg;
        double prev = pts[n - 1][0];
        while (lonEnd - prev > 180) lonEnd -= 360;
        while (lonEnd - prev < -180) lonEnd += 360;
        pts[n] = new double[] {lonEnd, lat2Deg};
        return pts;
    }

    /**
     * Points along the great circle (on the sphere, by spherical linear interpolation of unit vectors) from 1 to 2,
     * both ends included, at most {@code maxStepM} apart (measured on the mean sphere): {@code [n][2]} = {lonDeg
     * (unrolled from lon1), latDeg}. A fast stand-in for {@link #densify} in crossing tests: over a leg of length L
     * the great circle and the WGS 84 geodesic between the same ends separate by roughly f·L²/(8R)·(a few) — tens of
     * metres for L = 300 km — far below typical obstacle margins.
     */
    public static double[][] greatCirclePoints(double lon1Deg, double lat1Deg, double lon2Deg, double lat2Deg, double maxStepM) {
        double p1 = Math.toRadians(lat1Deg), l1 = Math.toRadians(lon1Deg), p2 = Math.toRadians(lat2Deg), l2 = Math.toRadians(lon2Deg);
        double x1 = Math.cos(p1) * Math.cos(l1), y1 = Math.cos(p1) * Math.sin(l1), z1 = Math.sin(p1);
        double x2 = Math.cos(p2) * Math.cos(l2), y2 = Math.cos(p2) * Math.sin(l2), z2 = Math.sin(p2);
        double cx = y1 * z2 - z1 * y2, cy = z1 * x2 - x1 * z2, cz = x1 * y2 - y1 * x2;
        double omega = Math.atan2(Math.sqrt(cx * cx + cy * cy + cz * cz), x1 * x2 + y1 * y2 + z1 * z2);
        int n = Math.max(1, (int) Math.ceil(omega * MEAN_RADIUS_M / maxStepM));
        double[][] pts = new double[n + 1][];
        pts[0] = new double[] {lon1Deg, lat1Deg};
        double so = Math.sin(omega);
        double prevLon = lon1Deg;
        for (int q = 1; q < n; q++) {
            double t = (double) q / n;
            double a = so > 1e-15 ? Math.sin((1 - t) * omega) / so : 1 - t, b = so > 1e-15 ? Math.sin(t * omega) / so : t;
            double x = a * x1 + b * x2, y = a * y1 + b * y2, z = a * z1 + b * z2;
            double lat = Math.toDegrees(Math.atan2(z, Math.hypot(x, y)));
            double lon = Math.toDegrees(Math.atan2(y, x));
            while (lon - prevLon > 180) lon -= 360;
            while (lon - prevLon < -180) lon += 360;
            pts[q] = new double[] {lon, lat};
            prevLon = lon;
        }
        double lonEnd = lon2Deg;
        while (lonEnd - prevLon > 180) lonEnd -= 360;
        while (lonEnd - prevLon < -180) lonEnd += 360;
        pts[n] = new double[] {lonEnd, lat2Deg};
        return pts;
    }

    /** Great-circle distance on a sphere of radius {@link #MEAN_RADIUS_M} (haversine), m. Within ~0.5 % of WGS 84. */
    public static double sphereDistanceM(double lon1Deg, double lat1Deg, double lon2Deg, double lat2Deg) {
        double p1 = Math.toRadians(lat1Deg), p2 = Math.toRadians(lat2Deg);
        double dp = p2 - p1, dl = Math.toRadians(lon2Deg - lon1Deg);
        double h = Math.sin(dp / 2) * Math.sin(dp / 2) + Math.cos(p1) * Math.cos(p2) * Math.sin(dl / 2) * Math.sin(dl / 2);
        return 2 * MEAN_RADIUS_M * Math.asin(Math.min(1.0, Math.sqrt(h)));
    }
}
