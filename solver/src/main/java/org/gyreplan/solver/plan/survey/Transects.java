package org.gyreplan.solver.plan.survey;

import org.gyreplan.solver.plan.Geodesy;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.prep.PreparedGeometry;
import org.locationtech.jts.geom.prep.PreparedGeometryFactory;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;

/**
 * Lays out cross-shore transects perpendicular to the smoothed coast, with stations along them.
 *
 * <p>Method:
 * <ol>
 *   <li>Smooth the offshore bearings with a running circular mean (mean of unit vectors) over
 *       ±{@code smoothingPoints} coast points, so small wiggles of the coast do not swing the transects.</li>
 *   <li>Measure the coast by geodesic distance between successive points and place transect origins every
 *       {@code alongCoastSpacingKm} along it (positions and bearings interpolated between coast points).</li>
 *   <li>Each transect runs along the geodesic leaving the origin at the smoothed offshore bearing. If zones are
 *       given, only transects whose line crosses a zone are kept; of those, at most {@code maxTransects}
 *       consecutive ones centred on the middle of the eligible stretch.</li>
 *   <li>Stations start {@code firstStationKm} offshore and follow at {@code shelfStationSpacingKm} while the depth
 *       is less than {@code shelfDepthM}, else at {@code stationSpacingKm}, up to {@code lengthKm}; with a target
 *       depth the transect ends at the first station at least that deep. Positions on land (depth NaN from a known
 *       depth model, or inside a land polygon) are skipped.</li>
 * </ol>
 */
public final class Transects {
    private static final GeometryFactory GF = new GeometryFactory();

    private Transects() { }

    /**
     * @param coast  coast points in order along the coast (≥ 2)
     * @param design layout parameters
     * @param zones  upwelling zones (lon/lat polygons) the transects must cross, or null for no restriction
     * @param land   land polygons where no station may be placed, or null
     * @param depth  depth model (m, positive down), or {@link DepthModel#UNKNOWN}
     */
    public static List<Transect> design(List<ShorePoint> coast, TransectDesign design, Geometry zones, Geometry land,
                                        DepthModel depth) {
        Objects.requireNonNull(coast, "coast");
        Objects.requireNonNull(design, "design");
        if (depth == null) depth = DepthModel.UNKNOWN;
        int n = coast.size();
        if (n < 2) throw new IllegalArgumentException("coast needs at least 2 points, got " + n);
        double[] sx = new double[n], sy = new double[n];
        for (int p = 0; p < n; p++) {
            double ex = 0, ny = 0;
            for (int q = Math.max(0, p - design.smoothingPoints()); q <= Math.min(n - 1, p + design.smoothingPoints()); q++) {
                double b = Math.toRadians(coast.get(q).offshoreBearingDeg());
                ex += Math.sin(b);
                ny += Math.cos(b);
            }
            double norm = Math.hypot(ex, ny);
            if (norm < 1e-9) throw new IllegalArgumentException("coast point " + p + ": offshore bearings cancel out within the smoothing window");
            sx[p] = ex / norm;
            sy[p] = ny / norm;
        }
        double[] s = new double[n];
        for (int p = 1; p < n; p++) {
            ShorePoint a = coast.get(p - 1), b = coast.get(p);
            s[p] = s[p - 1] + Geodesy.distanceM(a.lonDeg(), a.latDeg(), b.lonDeg(), b.latDeg());
        }
        PreparedGeometry pz = zones == null || zones.isEmpty() ? null : PreparedGeometryFactory.prepare(zones);
        PreparedGeometry pl = land == null || land.isEmpty() ? null : PreparedGeometryFactory.prepare(land);
        double step = design.alongCoastSpacingKm() * 1000.0;
        List<double[]> origins = new ArrayList<>();   // lon, lat, bearing
        int seg = 0;
        for (double d = 0; d <= s[n - 1] + 1e-6; d += step) {
            while (seg < n - 2 && s[seg + 1] < d) seg++;
            double len = s[seg + 1] - s[seg];
            double t = len > 0 ? Math.min(1, Math.max(0, (d - s[seg]) / len)) : 0;
            ShorePoint a = coast.get(seg), b = coast.get(seg + 1);
            double lon = a.lonDeg() + t * unwrap(b.lonDeg() - a.lonDeg()), lat = a.latDeg() + t * (b.latDeg() - a.latDeg());
            double ex = (1 - t) * sx[seg] + t * sx[seg + 1], ny = (1 - t) * sy[seg] + t * sy[seg + 1];
            double bearing = Math.toDegrees(Math.atan2(ex, ny));
            if (bearing < 0) bearing += 360;
            if (pz != null) {
                double[] end = Geodesy.direct(lon, lat, bearing, design.lengthKm() * 1000);
                double[][] line = Geodesy.densify(lon, lat, end[0], end[1], 2000);
                Coordinate[] cs = new Coordinate[line.length];
                for (int q = 0; q < line.length; q++) cs[q] = new Coordinate(line[q][0], line[q][1]);
                if (!pz.intersects(GF.createLineString(cs))) continue;
            }
            origins.add(new double[] {lon, lat, bearing});
        }
        int keep = Math.min(design.maxTransects(), origins.size());
        int start = (origins.size() - keep) / 2;
        List<Transect> out = new ArrayList<>();
        for (int q = 0; q < keep; q++) {
            double[] o = origins.get(start + q);
            int id = q + 1;
            List<Stop> stations = stations(id, o[0], o[1], o[2], design, pl, depth);
            double last = stations.isEmpty() ? 0
                    : Geodesy.distanceM(o[0], o[1], stations.get(stations.size() - 1).lonDeg(), stations.get(stations.size() - 1).latDeg()) / 1000;
            out.add(new Transect(id, o[0], o[1], o[2], last, stations));
        }
        return out;
    }

    private static List<Stop> stations(int id, double lon, double lat, double bearing, TransectDesign d,
                                       PreparedGeometry land, DepthModel depth) {
        List<Stop> out = new ArrayList<>();
        double x = d.firstStationKm();
        int k = 1;
        while (x <= d.lengthKm() + 1e-9) {
            double[] p = Geodesy.direct(lon, lat, bearing, x * 1000);
            double z = depth.depthM(p[0], p[1]);
            boolean onLand = (land != null && land.intersects(GF.createPoint(new Coordinate(p[0], p[1]))))
                    || (depth != DepthModel.UNKNOWN && !(z > 0));
            if (!onLand) {
                out.add(new Stop(String.format(Locale.ROOT, "T%02d-S%02d", id, k++), p[0], p[1], z, StopKind.CTD_STATION));
                if (Double.isFinite(d.targetDepthM()) && z >= d.targetDepthM()) break;
            }
            boolean shelf = Double.isFinite(z) && z < d.shelfDepthM();
            x += shelf ? d.shelfStationSpacingKm() : d.stationSpacingKm();
        }
        return out;
    }

    private static double unwrap(double dLon) {
        while (dLon > 180) dLon -= 360;
        while (dLon < -180) dLon += 360;
        return dLon;
    }
}
