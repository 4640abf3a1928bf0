package org.gyreplan.solver.plan;

import net.sf.geographiclib.Geodesic;
import net.sf.geographiclib.GeodesicData;
import org.junit.jupiter.api.Test;

import java.util.Random;

import static org.junit.jupiter.api.Assertions.*;

class GeodesyTest {
    // WGS 84 defining constants (NIMA TR8350.2): a = 6 378 137 m, 1/f = 298.257223563
    private static final double A = 6_378_137.0, F = 1 / 298.257223563, E2 = F * (2 - F);

    /** Direct then inverse recovers the distance (GeographicLib direct/inverse, Karney 2013), ≤ 1 mm. */
    @Test
    void directAndInverseAgree() {
        Random rnd = new Random(42);
        for (int q = 0; q < 200; q++) {
            double lon = -180 + 360 * rnd.nextDouble(), lat = -70 + 140 * rnd.nextDouble();
            double azi = 360 * rnd.nextDouble(), s = 1 + 2e6 * rnd.nextDouble();
            double[] p = Geodesy.direct(lon, lat, azi, s);
            assertEquals(s, Geodesy.distanceM(lon, lat, p[0], p[1]), 1e-3);
            GeodesicData ref = Geodesic.WGS84.Direct(lat, lon, azi, s);
            assertEquals(ref.lat2, p[1], 1e-12);
        }
    }

    /**
     * Independent check of the ellipsoid: a 1′ meridian arc at 45° equals M·(π/10800) with the meridional radius of
     * curvature M = a(1 − e²)/(1 − e² sin²φ)^{3/2} (textbook geodesy, e.g. Torge &amp; Müller, Geodesy, 4th ed., §6.2;
     * for such a short arc the curvature change is negligible: error ~1e-7 m). Gives 1852.196 m (derived here; cf. 1 nmi = 1852 m).
     */
    @Test
    void meridianArcMatchesRadiusOfCurvature() {
        double phi = Math.toRadians(45);
        double m = A * (1 - E2) / Math.pow(1 - E2 * Math.sin(phi) * Math.sin(phi), 1.5);
        double expected = m * Math.PI / 10800;
        double got = Geodesy.distanceM(10, 45 - 1.0 / 120, 10, 45 + 1.0 / 120);
        assertEquals(expected, got, 1e-3);
        // along the equator the geodesic (for arcs &lt; ~179°(1 − f)) is the equator: length a·Δλ
        assertEquals(A * Math.toRadians(1), Geodesy.distanceM(0, 0, 1, 0), 1e-6);
    }

    /**
     * Haversine on the mean sphere vs WGS 84: the difference comes from the flattening f ≈ 1/298 and stays within
     * ~0.56 % (sphere R = 6371.0088 km vs ellipsoid radii 6335–6400 km along the path; common practice bound 0.6 %).
     */
    @Test
    void haversineAgreesWithinEllipsoidalDifference() {
        Random rnd = new Random(3);
        for (int q = 0; q < 500; q++) {
            double lon1 = -180 + 360 * rnd.nextDouble(), lat1 = -80 + 160 * rnd.nextDouble();
            double lon2 = lon1 + 20 * rnd.nextGaussian(), lat2 = Math.max(-85, Math.min(85, lat1 + 10 * rnd.nextGaussian()));
            double g = Geodesy.distanceM(lon1, lat1, lon2, lat2), h = Geodesy.sphereDistanceM(lon1, lat1, lon2, lat2);
            if (g < 1000) continue;
            assertEquals(g, h, 0.006 * g, "pair " + q);
        }
    }

    /** Unit edges: 1 kn = 1852/3600 m/s (definition, CHECKS §0); 100 nmi at 10 kn = 10.0 h (CHECKS PL-01). */
    @Test
    void unitsAtTheEdges() {
        assertEquals(0.514444, PlanUnits.knotsToMps(1), 1e-6);
        assertEquals(10.0, PlanUnits.nmiToMetres(100) / PlanUnits.knotsToMps(10) / 3600, 1e-12);
        assertEquals(100.0 / 12.0, PlanUnits.nmiToMetres(100) / PlanUnits.knotsToMps(12) / 3600, 1e-12);
        assertEquals(1.0, PlanUnits.mpsToMetresPerDay(PlanUnits.metresPerDayToMps(1.0)), 1e-15);
    }
}
