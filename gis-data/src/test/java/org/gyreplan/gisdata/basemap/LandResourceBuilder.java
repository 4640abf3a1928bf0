package org.gyreplan.gisdata.basemap;

import org.gyreplan.gisdata.vector.Antimeridian;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.PrecisionModel;
import org.locationtech.jts.geom.util.GeometryFixer;
import org.locationtech.jts.geom.util.PolygonExtracter;
import org.locationtech.jts.io.ByteOrderValues;
import org.locationtech.jts.io.WKBWriter;
import org.locationtech.jts.operation.valid.IsValidOp;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.zip.GZIPOutputStream;

/**
 * Builds the base-map resources from the npm package {@code world-atlas} (see gis-data/tools/basemap/README.md):
 * decodes {@code land-110m.json} and {@code land-50m.json} with {@link TopoJson}, rebuilds the few polygons that
 * are not valid in the planar sense (JTS GeometryFixer; it reports how many), and writes one little-endian WKB
 * MultiPolygon per resolution, gzip-compressed (no time stamp in the gzip header, so the output is reproducible).
 *
 * <p>Usage: {@code LandResourceBuilder <world-atlas package dir> <output dir>}
 */
public final class LandResourceBuilder {
    private LandResourceBuilder() {}

    public static void main(String[] args) throws IOException {
        Path in = Path.of(args[0]), out = Path.of(args[1]);
        for (String name : new String[] {"land-110m", "land-50m"}) {
            TopoJson topo = TopoJson.parse(Files.readString(in.resolve(name + ".json"), StandardCharsets.UTF_8));
            Geometry land = build(topo);
            byte[] wkb = new WKBWriter(2, ByteOrderValues.LITTLE_ENDIAN).write(land);
            Path target = out.resolve(name + ".wkb.gz");
            try (OutputStream o = new GZIPOutputStream(Files.newOutputStream(target), 1 << 16)) {
                o.write(wkb);
            }
            System.out.printf("%s: %d polygons, %d points, %d bytes WKB, %d bytes gzip%n", name, land.getNumGeometries(),
                    land.getNumPoints(), wkb.length, Files.size(target));
        }
    }

    /**
     * The land object of a world-atlas topology as one valid MultiPolygon within [−180°, 180°].
     *
     * <p>world-atlas rings are spherical: an edge may cross the antimeridian directly (a jump of nearly 360° in
     * longitude, e.g. around Fiji or Chukotka), and a ring may circle a pole (Antarctica). Read as planar lon/lat
     * such rings become slivers across the whole map. Each ring is therefore unwrapped to continuous longitudes
     * (each step changed by a multiple of 360° so that it is at most 180°); a ring that then ends 360° away from
     * its start circles a pole and is closed along that pole's latitude; holes are shifted next to their shell; the
     * polygon is made valid (JTS GeometryFixer) and cut back into [−180°, 180°] at the antimeridian.
     */
    static Geometry build(TopoJson topo) {
        GeometryFactory f = new GeometryFactory(new PrecisionModel(), 4326);
        List<Polygon> polys = new ArrayList<>();
        int fixed = 0, wrapped = 0, polar = 0;
        for (Geometry g : topo.geometries("land")) {
            for (int k = 0; k < g.getNumGeometries(); k++) {
                Polygon p = (Polygon) g.getGeometryN(k);
                Coordinate[] shell = unwrap(p.getExteriorRing().getCoordinates());
                boolean changed = shell != null && !java.util.Arrays.equals(shell, p.getExteriorRing().getCoordinates());
                if (Math.abs(shell[shell.length - 1].x - shell[0].x) > 180) {
                    shell = closeAroundPole(shell);
                    polar++;
                }
                double mid = f.createLineString(shell).getEnvelopeInternal().centre().x;
                List<LinearRing> holes = new ArrayList<>();
                for (int h = 0; h < p.getNumInteriorRing(); h++) {
                    Coordinate[] hole = unwrap(p.getInteriorRingN(h).getCoordinates());
                    if (Math.abs(hole[hole.length - 1].x - hole[0].x) > 180) {
                        // the source's clipping line at 89.999° around the pole (a spherical hole holding only the
                        // pole); the shell is closed to the pole instead, so the ring is dropped
                        System.out.println("dropped a ring circling the pole, envelope " + p.getInteriorRingN(h).getEnvelopeInternal());
                        continue;
                    }
                    double c = f.createLineString(hole).getEnvelopeInternal().centre().x;
                    double s = 360.0 * Math.round((mid - c) / 360.0);
                    if (s != 0) for (Coordinate q : hole) q.x += s;
                    holes.add(f.createLinearRing(hole));
                }
                if (changed) wrapped++;
                Polygon q = f.createPolygon(f.createLinearRing(shell), holes.toArray(new LinearRing[0]));
                Geometry valid = q;
                if (!q.isValid()) {
                    fixed++;
                    valid = GeometryFixer.fix(q);
                }
                Geometry cut = Antimeridian.toStandardRange(valid);
                @SuppressWarnings("unchecked")
                List<Polygon> parts = PolygonExtracter.getPolygons(cut);
                for (Polygon part : parts) if (!part.isEmpty()) polys.add(part);
            }
        }
        System.out.println("rings crossing the antimeridian: " + wrapped + ", around a pole: " + polar
                + ", polygons rebuilt by GeometryFixer: " + fixed);
        Geometry land = f.createMultiPolygon(polys.toArray(new Polygon[0]));
        IsValidOp op = new IsValidOp(land);
        if (!op.isValid()) System.out.println("WARNING: land MultiPolygon is not valid: " + op.getValidationError());
        return land;
    }

    /** Longitudes made continuous: each step changed by a multiple of 360° so that it is at most 180°. */
    static Coordinate[] unwrap(Coordinate[] ring) {
        Coordinate[] out = new Coordinate[ring.length];
        double offset = 0;
        for (int k = 0; k < ring.length; k++) {
            if (k > 0) {
                double d = ring[k].x + offset - out[k - 1].x;
                if (d > 180) offset -= 360;
                else if (d < -180) offset += 360;
            }
            out[k] = new Coordinate(ring[k].x + offset, ring[k].y);
        }
        return out;
    }

    /** Closes a ring that circles a pole: down to the pole's latitude at the end longitude, across, and back up. */
    static Coordinate[] closeAroundPole(Coordinate[] ring) {
        double meanLat = 0;
        for (Coordinate c : ring) meanLat += c.y;
        double pole = meanLat < 0 ? -90 : 90;
        Coordinate first = ring[0], last = ring[ring.length - 1];
        Coordinate[] out = new Coordinate[ring.length + 3];
        System.arraycopy(ring, 0, out, 0, ring.length);
        out[ring.length] = new Coordinate(last.x, pole);
        out[ring.length + 1] = new Coordinate(first.x, pole);
        out[ring.length + 2] = new Coordinate(first);
        return out;
    }
}
