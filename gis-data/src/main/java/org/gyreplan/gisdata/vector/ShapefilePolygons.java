package org.gyreplan.gisdata.vector;

import org.gyreplan.gisdata.vector.GeometryFileException.Problem;
import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.algorithm.PointLocation;
import org.locationtech.jts.algorithm.Area;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * A small reader of ESRI Shapefiles with polygons, after the published "ESRI Shapefile Technical Description"
 * (ESRI, July 1998): the main file (.shp), its index (.shx, used to check the record count), the dBASE attribute
 * table (.dbf, dBASE III layout) and the coordinate reference (.prj, OGC WKT 1), which must be geographic WGS 84.
 *
 * <p>Shape types Polygon (5), PolygonZ (15) and PolygonM (25) are read (z and m ignored). Following the
 * specification, clockwise rings are exterior rings and counter-clockwise rings are holes; each hole is assigned
 * to the smallest exterior ring that contains it (a counter-clockwise ring inside none is taken as an exterior
 * ring). The .dbf text encoding is taken from a .cpg file when present, else ISO-8859-1.
 */
public final class ShapefilePolygons {
    private ShapefilePolygons() {}

    private static Path sibling(Path shp, String ext) {
        String n = shp.getFileName().toString();
        String base = n.substring(0, n.length() - 4);
        for (String e : new String[] {ext, ext.toUpperCase(Locale.ROOT)}) {
            Path p = shp.resolveSibling(base + e);
            if (Files.exists(p)) return p;
        }
        return null;
    }

    /** Reads the polygons of a shapefile (see the class description); {@code repair} as in {@link PolygonFiles.Options}. */
    public static List<PolygonFeature> read(Path shp, boolean repair) throws IOException {
        Path prj = sibling(shp, ".prj");
        if (prj != null) CrsCheck.requireGeographicWgs84(Files.readString(prj, StandardCharsets.ISO_8859_1), prj);
        Path dbf = sibling(shp, ".dbf");
        Path shx = sibling(shp, ".shx");
        List<Map<String, Object>> table = dbf == null ? null : readDbf(dbf, sibling(shp, ".cpg"));
        ByteBuffer b = ByteBuffer.wrap(Files.readAllBytes(shp));
        if (b.limit() < 100 || b.order(ByteOrder.BIG_ENDIAN).getInt(0) != 9994) {
            throw new GeometryFileException(Problem.UNREADABLE, shp, -1, null, null, "not a shapefile (file code 9994 missing)");
        }
        int type = b.order(ByteOrder.LITTLE_ENDIAN).getInt(32);
        if (type != 0 && type != 5 && type != 15 && type != 25) {
            throw new GeometryFileException(Problem.NOT_POLYGON, shp, -1, null, null, "shape type is " + typeName(type)
                    + "; a basin, exclusion zone or study area must be a Polygon shapefile");
        }
        long fileBytes = 2L * b.order(ByteOrder.BIG_ENDIAN).getInt(24);
        int end = (int) Math.min(fileBytes, b.limit());
        List<PolygonFeature> out = new ArrayList<>();
        int pos = 100, k = 0;
        while (pos + 8 <= end) {
            b.order(ByteOrder.BIG_ENDIAN);
            int contentBytes = 2 * b.getInt(pos + 4);
            int rec = pos + 8;
            if (rec + contentBytes > b.limit() || contentBytes < 4) {
                throw new GeometryFileException(Problem.UNREADABLE, shp, k, null, null, "record is truncated");
            }
            b.order(ByteOrder.LITTLE_ENDIAN);
            int st = b.getInt(rec);
            Map<String, Object> props = table != null && k < table.size() ? table.get(k) : new LinkedHashMap<>();
            PolygonAssembly a = new PolygonAssembly(shp, k, PolygonAssembly.nameFrom(props, null), repair);
            if (st == 0) {
                throw a.error(Problem.NOT_POLYGON, null, "is a null shape; expected a polygon");
            }
            if (st != 5 && st != 15 && st != 25) {
                throw a.error(Problem.NOT_POLYGON, null, "shape type is " + typeName(st) + "; expected a polygon");
            }
            int numParts = b.getInt(rec + 36), numPoints = b.getInt(rec + 40);
            if (numParts < 1 || numPoints < 0 || rec + 44 + 4L * numParts + 16L * numPoints > rec + contentBytes) {
                throw a.error(Problem.UNREADABLE, null, "polygon record with " + numParts + " parts and " + numPoints
                        + " points does not fit its length");
            }
            int[] starts = new int[numParts + 1];
            for (int p = 0; p < numParts; p++) starts[p] = b.getInt(rec + 44 + 4 * p);
            starts[numParts] = numPoints;
            int ptBase = rec + 44 + 4 * numParts;
            List<Coordinate[]> rings = new ArrayList<>();
            for (int p = 0; p < numParts; p++) {
                int n = starts[p + 1] - starts[p];
                if (n < 0) throw a.error(Problem.UNREADABLE, null, "part index table is not increasing");
                Coordinate[] cs = new Coordinate[n];
                for (int q = 0; q < n; q++) {
                    int at = ptBase + 16 * (starts[p] + q);
                    cs[q] = new Coordinate(b.getDouble(at), b.getDouble(at + 8));
                }
                rings.add(cs);
            }
            out.add(a.feature(a.polygonal(group(a, rings)), props));
            pos = rec + contentBytes;
            k++;
        }
        if (shx != null) {
            long shxRecords = (Files.size(shx) - 100) / 8;
            if (shxRecords != k) {
                throw new GeometryFileException(Problem.UNREADABLE, shx, -1, null, null, "index lists " + shxRecords
                        + " records but the .shp holds " + k);
            }
        }
        if (table != null && table.size() != k) {
            throw new GeometryFileException(Problem.UNREADABLE, dbf, -1, null, null, "attribute table has " + table.size()
                    + " records but the .shp holds " + k);
        }
        if (out.isEmpty()) throw new GeometryFileException(Problem.NO_POLYGONS, shp, -1, null, null, "no shapes");
        return out;
    }

    /** Groups rings into polygons: clockwise exterior rings, counter-clockwise holes (ESRI 1998, p. 8). */
    private static List<List<Coordinate[]>> group(PolygonAssembly a, List<Coordinate[]> rings) throws GeometryFileException {
        List<List<Coordinate[]>> polys = new ArrayList<>();
        List<Coordinate[]> shells = new ArrayList<>();
        List<Coordinate[]> holes = new ArrayList<>();
        for (int r = 0; r < rings.size(); r++) {
            Coordinate[] ring = a.ring(rings.get(r), "ring " + r).getCoordinates(); // closure and size checks
            if (Orientation.isCCW(ring)) holes.add(ring); else shells.add(ring);
        }
        for (Coordinate[] s : shells) {
            List<Coordinate[]> p = new ArrayList<>();
            p.add(s);
            polys.add(p);
        }
        for (Coordinate[] h : holes) {
            int best = -1;
            double bestArea = Double.MAX_VALUE;
            Envelope he = envelope(h);
            for (int s = 0; s < shells.size(); s++) {
                Coordinate[] sh = shells.get(s);
                if (!envelope(sh).contains(he)) continue;
                Coordinate probe = interiorVertex(h, sh);
                if (probe == null || !PointLocation.isInRing(probe, sh)) continue;
                double area = Math.abs(Area.ofRingSigned(sh));
                if (area < bestArea) { bestArea = area; best = s; }
            }
            if (best >= 0) polys.get(best).add(h);
            else {
                List<Coordinate[]> p = new ArrayList<>();
                p.add(h);
                polys.add(p);
            }
        }
        return polys;
    }

    private static Coordinate interiorVertex(Coordinate[] hole, Coordinate[] shell) {
        for (Coordinate c : hole) {
            if (!PointLocation.isOnLine(c, shell)) return c;
        }
        return null;
    }

    private static Envelope envelope(Coordinate[] cs) {
        Envelope e = new Envelope();
        for (Coordinate c : cs) e.expandToInclude(c);
        return e;
    }

    /** Reads a dBASE III table: one ordered map per record (deleted records are kept as empty maps). */
    static List<Map<String, Object>> readDbf(Path dbf, Path cpg) throws IOException {
        Charset cs = StandardCharsets.ISO_8859_1;
        if (cpg != null) {
            String name = Files.readString(cpg, StandardCharsets.US_ASCII).trim();
            try {
                cs = Charset.forName(name.equalsIgnoreCase("UTF8") ? "UTF-8" : name);
            } catch (RuntimeException e) {
                throw new GeometryFileException(Problem.UNREADABLE, cpg, -1, null, null, "unknown text encoding \"" + name + "\"");
            }
        }
        ByteBuffer b = ByteBuffer.wrap(Files.readAllBytes(dbf)).order(ByteOrder.LITTLE_ENDIAN);
        if (b.limit() < 33) throw new GeometryFileException(Problem.UNREADABLE, dbf, -1, null, null, "too short for a dBASE table");
        int nRec = b.getInt(4);
        int headerLen = b.getShort(8) & 0xffff, recLen = b.getShort(10) & 0xffff;
        List<String> names = new ArrayList<>();
        List<Character> types = new ArrayList<>();
        List<Integer> lengths = new ArrayList<>();
        for (int at = 32; at + 32 <= headerLen && b.get(at) != 0x0D; at += 32) {
            int len = 0;
            while (len < 11 && b.get(at + len) != 0) len++;
            names.add(new String(b.array(), at, len, StandardCharsets.ISO_8859_1).trim());
            types.add((char) (b.get(at + 11) & 0xff));
            lengths.add(b.get(at + 16) & 0xff);
        }
        List<Map<String, Object>> out = new ArrayList<>(nRec);
        for (int r = 0; r < nRec; r++) {
            int at = headerLen + r * recLen;
            if (at + recLen > b.limit()) {
                throw new GeometryFileException(Problem.UNREADABLE, dbf, r, null, null, "attribute record is truncated");
            }
            Map<String, Object> rec = new LinkedHashMap<>();
            int off = at + 1;
            for (int f = 0; f < names.size(); f++) {
                int len = lengths.get(f);
                String raw = new String(b.array(), off, len, cs).trim();
                off += len;
                rec.put(names.get(f), value(types.get(f), raw, dbf, r, names.get(f)));
            }
            out.add(rec);
        }
        return out;
    }

    private static Object value(char type, String raw, Path dbf, int r, String field) throws GeometryFileException {
        if (raw.isEmpty() || raw.chars().allMatch(ch -> ch == '*')) return null;
        switch (type) {
            case 'N': case 'F':
                try {
                    if (raw.indexOf('.') < 0 && raw.indexOf('e') < 0 && raw.indexOf('E') < 0 && raw.length() < 19) {
                        return Long.parseLong(raw);
                    }
                    return Double.parseDouble(raw);
                } catch (NumberFormatException e) {
                    throw new GeometryFileException(Problem.UNREADABLE, dbf, r, null, null, "field " + field
                            + " holds \"" + raw + "\"; expected a number");
                }
            case 'L':
                char c = Character.toUpperCase(raw.charAt(0));
                return c == 'Y' || c == 'T' ? Boolean.TRUE : c == 'N' || c == 'F' ? Boolean.FALSE : null;
            default:
                return raw;
        }
    }

    private static String typeName(int t) {
        switch (t) {
            case 0: return "Null";
            case 1: return "Point";
            case 3: return "PolyLine";
            case 5: return "Polygon";
            case 8: return "MultiPoint";
            case 11: return "PointZ";
            case 13: return "PolyLineZ";
            case 15: return "PolygonZ";
            case 18: return "MultiPointZ";
            case 21: return "PointM";
            case 23: return "PolyLineM";
            case 25: return "PolygonM";
            case 28: return "MultiPointM";
            case 31: return "MultiPatch";
            default: return "unknown (" + t + ")";
        }
    }
}
