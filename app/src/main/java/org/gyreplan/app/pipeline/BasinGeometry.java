package org.gyreplan.app.pipeline;

import org.gyreplan.app.scenario.Scenario;
import org.gyreplan.gisdata.vector.PolygonFeature;
import org.gyreplan.gisdata.vector.PolygonFiles;
import org.gyreplan.solver.grid.LonLatGrid;
import org.locationtech.jts.algorithm.locate.IndexedPointInAreaLocator;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Location;
import org.locationtech.jts.geom.Polygon;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The basin polygon and exclusion zones of a scenario, read through gis-data, and the basin mask on a grid.
 *
 * @param basin      the water area (Polygon or MultiPolygon; holes are islands), lon/lat degrees
 * @param exclusions exclusion-zone polygons (may be empty)
 * @param names      names of the exclusion zones
 */
record BasinGeometry(Geometry basin, List<Geometry> exclusions, List<String> names) {

    static BasinGeometry of(Scenario s) throws StudyException {
        Geometry basin;
        if (s.basin.polygon != null) {
            Path p = s.resolve(s.basin.polygon);
            try {
                List<PolygonFeature> all = PolygonFiles.read(p);
                basin = pick(all, s.basin.name, p);
            } catch (IOException e) {
                throw new StudyException(p, "basin.polygon", GyreplanText.oneLine(e), e);
            }
        } else {
            List<double[]> shell = new ArrayList<>();
            for (List<Double> pt : s.basin.coordinates) shell.add(new double[] {pt.get(0), pt.get(1)});
            List<List<double[]>> holes = new ArrayList<>();
            if (s.basin.islands != null) {
                for (List<List<Double>> ring : s.basin.islands) {
                    List<double[]> h = new ArrayList<>();
                    for (List<Double> pt : ring) h.add(new double[] {pt.get(0), pt.get(1)});
                    holes.add(h);
                }
            }
            try {
                basin = PolygonFiles.fromLonLat(shell, holes);
            } catch (IOException e) {
                throw new StudyException(s.sourceFile, "basin.coordinates", GyreplanText.oneLine(e), e);
            }
        }
        List<Geometry> ex = new ArrayList<>();
        List<String> names = new ArrayList<>();
        if (s.exclusionZones != null) {
            Path p = s.resolve(s.exclusionZones);
            try {
                for (PolygonFeature f : PolygonFiles.read(p)) {
                    ex.add(f.polygon());
                    names.add(f.name() == null ? "zone " + (names.size() + 1) : f.name());
                }
            } catch (IOException e) {
                throw new StudyException(p, "exclusionZones", GyreplanText.oneLine(e), e);
            }
        }
        return new BasinGeometry(basin, ex, names);
    }

    private static Geometry pick(List<PolygonFeature> all, String name, Path p) throws StudyException {
        if (all.size() == 1) return all.get(0).polygon();
        if (name != null) for (PolygonFeature f : all) if (name.equals(f.name())) return f.polygon();
        List<String> names = all.stream().map(PolygonFeature::name).toList();
        throw new StudyException(p, "basin.polygon", "holds " + all.size() + " polygons " + names
                + "; set basin.name to the one to use");
    }

    Envelope envelope() { return basin.getEnvelopeInternal(); }

    /** The largest polygon of the basin (its outer coast is the coast of the study). */
    Polygon mainPolygon() {
        Polygon best = null;
        for (int k = 0; k < basin.getNumGeometries(); k++) {
            Geometry g = basin.getGeometryN(k);
            if (g instanceof Polygon poly && (best == null || poly.getArea() > best.getArea())) best = poly;
        }
        return best;
    }

    /** Number of islands (holes) in the basin. */
    int islandCount() {
        int n = 0;
        for (int k = 0; k < basin.getNumGeometries(); k++) {
            if (basin.getGeometryN(k) instanceof Polygon poly) n += poly.getNumInteriorRing();
        }
        return n;
    }

    /** A copy of the grid whose ocean cells are those whose centre lies inside the basin. */
    LonLatGrid mask(LonLatGrid g) {
        return org.gyreplan.gisdata.mask.PolygonMask.applyBasin(g, basin);
    }

    /** Outer and inner rings of the basin as [lon, lat] lists (for drawing). */
    List<List<double[]>> rings() {
        List<List<double[]>> out = new ArrayList<>();
        for (int k = 0; k < basin.getNumGeometries(); k++) {
            if (!(basin.getGeometryN(k) instanceof Polygon poly)) continue;
            out.add(ring(poly.getExteriorRing().getCoordinates()));
            for (int h = 0; h < poly.getNumInteriorRing(); h++) out.add(ring(poly.getInteriorRingN(h).getCoordinates()));
        }
        return out;
    }

    static List<double[]> ring(Coordinate[] cs) {
        List<double[]> r = new ArrayList<>(cs.length);
        for (Coordinate c : cs) r.add(new double[] {c.x, c.y});
        return r;
    }
}
