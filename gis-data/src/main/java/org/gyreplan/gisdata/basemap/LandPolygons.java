package org.gyreplan.gisdata.basemap;

import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.PrecisionModel;
import org.locationtech.jts.geom.util.PolygonExtracter;
import org.locationtech.jts.index.strtree.STRtree;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKBReader;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.zip.GZIPInputStream;

/**
 * Land polygons for map backgrounds, from Natural Earth (public domain) as redistributed in the npm package
 * {@code world-atlas} 2.0.2 (TopoJSON, Natural Earth 4.1.0), decoded once with {@link TopoJson} and shipped as
 * gzip-compressed WKB resources (see the NOTICE beside them and {@code gis-data/tools/basemap/README.md}).
 * Geographic WGS 84, degrees; polygons are valid (JTS) and lie within [−180°, 180°] (Natural Earth splits land at
 * the antimeridian).
 *
 * <pre>
 *   Geometry land = LandPolygons.clip(LandPolygons.Resolution.MEDIUM_50M, 160, -50, 200, -30); // across 180°
 * </pre>
 * For drawing at small scales, not for coastline positions at sea: the 1:50m data generalise coasts by kilometres.
 */
public final class LandPolygons {
    private LandPolygons() {}

    /** Natural Earth scale. */
    public enum Resolution {
        /** 1:110 million (coarse, ~50 kB). */
        COARSE_110M("land-110m.wkb.gz"),
        /** 1:50 million (medium). */
        MEDIUM_50M("land-50m.wkb.gz");

        final String resource;
        Resolution(String resource) { this.resource = resource; }
    }

    private static final GeometryFactory FACTORY = new GeometryFactory(new PrecisionModel(), 4326);
    private static final Map<Resolution, Loaded> CACHE = new EnumMap<>(Resolution.class);

    private record Loaded(Geometry land, List<Polygon> polygons, STRtree index) {}

    private static synchronized Loaded loaded(Resolution r) {
        return CACHE.computeIfAbsent(r, LandPolygons::read);
    }

    private static Loaded read(Resolution r) {
        try (InputStream raw = LandPolygons.class.getResourceAsStream(r.resource)) {
            if (raw == null) throw new IllegalStateException("base-map resource " + r.resource + " is missing from the jar");
            byte[] wkb = new GZIPInputStream(raw, 1 << 16).readAllBytes();
            Geometry g = new WKBReader(FACTORY).read(wkb);
            g.setSRID(4326);
            @SuppressWarnings("unchecked")
            List<Polygon> polys = new ArrayList<>(PolygonExtracter.getPolygons(g));
            STRtree index = new STRtree();
            for (int k = 0; k < polys.size(); k++) index.insert(polys.get(k).getEnvelopeInternal(), k);
            index.build();
            return new Loaded(g, polys, index);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read base-map resource " + r.resource, e);
        } catch (ParseException e) {
            throw new IllegalStateException("base-map resource " + r.resource + " is corrupt: " + e.getMessage(), e);
        }
    }

    /** All land as one MultiPolygon (a copy; longitudes −180…180°, latitudes degrees). */
    public static Geometry load(Resolution r) {
        return loaded(r).land().copy();
    }

    /** Number of land polygons at a resolution. */
    public static int polygonCount(Resolution r) {
        return loaded(r).polygons().size();
    }

    /** {@link #clip(Resolution, double, double, double, double)} with the box as an envelope (x = lon, y = lat). */
    public static Geometry clip(Resolution r, Envelope box) {
        return clip(r, box.getMinX(), box.getMinY(), box.getMaxX(), box.getMaxY());
    }

    /**
     * The land inside a box, clipped to it. The box's longitudes are continuous: {@code westDeg} may be below −180°
     * or {@code eastDeg} above 180° (a box across the antimeridian, e.g. 160…200), and the land is returned in
     * those longitudes. Land parts meeting at ±180° stay separate polygons (they touch along the meridian).
     *
     * @return a MultiPolygon (possibly empty)
     */
    public static Geometry clip(Resolution r, double westDeg, double southDeg, double eastDeg, double northDeg) {
        if (!(eastDeg > westDeg) || !(northDeg > southDeg)) {
            throw new IllegalArgumentException("box must have west < east and south < north, got " + westDeg + ", " + southDeg
                    + ", " + eastDeg + ", " + northDeg);
        }
        if (eastDeg - westDeg > 360) throw new IllegalArgumentException("box wider than 360°: " + westDeg + "…" + eastDeg);
        Loaded l = loaded(r);
        List<Polygon> out = new ArrayList<>();
        long kMin = (long) Math.floor((westDeg + 180) / 360), kMax = (long) Math.floor((eastDeg + 180) / 360);
        for (long k = kMin; k <= kMax; k++) {
            double shift = 360.0 * k;
            double w = Math.max(-180, westDeg - shift), e = Math.min(180, eastDeg - shift);
            if (!(e > w)) continue;
            Envelope box = new Envelope(w, e, southDeg, northDeg);
            Geometry boxGeom = FACTORY.toGeometry(box);
            @SuppressWarnings("unchecked")
            List<Integer> ids = new ArrayList<>(l.index().query(box));
            java.util.Collections.sort(ids); // file order, so the output does not depend on the tree layout
            for (int id : ids) {
                Polygon p = l.polygons().get(id);
                Geometry part = box.contains(p.getEnvelopeInternal()) ? p.copy() : p.intersection(boxGeom);
                @SuppressWarnings("unchecked")
                List<Polygon> pieces = PolygonExtracter.getPolygons(part);
                for (Polygon q : pieces) {
                    if (q.isEmpty()) continue;
                    Geometry s = q.copy();
                    if (shift != 0) {
                        s.apply(new org.locationtech.jts.geom.util.AffineTransformation().translate(shift, 0));
                        s.geometryChanged();
                    }
                    out.add((Polygon) s);
                }
            }
        }
        return FACTORY.createMultiPolygon(out.toArray(new Polygon[0]));
    }
}
