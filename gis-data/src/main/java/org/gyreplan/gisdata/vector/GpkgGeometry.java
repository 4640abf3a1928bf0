package org.gyreplan.gisdata.vector;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.io.ByteOrderValues;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKBReader;
import org.locationtech.jts.io.WKBWriter;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.util.ArrayList;
import java.util.List;

/**
 * GeoPackage geometry blobs (OGC 12-128r18, GeoPackage 1.3, §2.1.3): a header — magic "GP", version 0, a flags
 * byte (bit 0 byte order, bits 1–3 envelope kind, bit 4 empty, bit 5 extended type), the SRS id and an optional
 * envelope — followed by standard OGC Well-Known Binary (OGC 06-103r4 §8).
 */
final class GpkgGeometry {
    private GpkgGeometry() {}

    /** Encodes a 2-D geometry with an [minx, maxx, miny, maxy] envelope, little-endian. */
    static byte[] encode(Geometry g, int srsId) {
        byte[] wkb = new WKBWriter(2, ByteOrderValues.LITTLE_ENDIAN).write(g);
        boolean empty = g.isEmpty();
        int envBytes = empty ? 0 : 32;
        ByteBuffer b = ByteBuffer.allocate(8 + envBytes + wkb.length).order(ByteOrder.LITTLE_ENDIAN);
        b.put((byte) 'G').put((byte) 'P').put((byte) 0);
        int flags = 1 /* little endian */ | ((empty ? 0 : 1) << 1) | ((empty ? 1 : 0) << 4);
        b.put((byte) flags);
        b.putInt(srsId);
        if (!empty) {
            Envelope e = g.getEnvelopeInternal();
            b.putDouble(e.getMinX()).putDouble(e.getMaxX()).putDouble(e.getMinY()).putDouble(e.getMaxY());
        }
        b.put(wkb);
        return b.array();
    }

    /** Offset of the WKB after the header; throws if the magic or flags are wrong. */
    static int wkbOffset(byte[] blob) {
        if (blob.length < 8 || blob[0] != 'G' || blob[1] != 'P') {
            throw new IllegalArgumentException("not a GeoPackage geometry blob (missing \"GP\" magic)");
        }
        int flags = blob[3] & 0xff;
        if ((flags & 0x20) != 0) throw new IllegalArgumentException("extended GeoPackage geometry types are not supported");
        int env = (flags >> 1) & 0x7;
        int envBytes;
        switch (env) {
            case 0: envBytes = 0; break;
            case 1: envBytes = 32; break;
            case 2: case 3: envBytes = 48; break;
            case 4: envBytes = 64; break;
            default: throw new IllegalArgumentException("invalid envelope indicator " + env + " in GeoPackage geometry header");
        }
        return 8 + envBytes;
    }

    /** SRS id in the header. */
    static int srsId(byte[] blob) {
        ByteOrder o = (blob[3] & 1) != 0 ? ByteOrder.LITTLE_ENDIAN : ByteOrder.BIG_ENDIAN;
        return ByteBuffer.wrap(blob, 4, 4).order(o).getInt();
    }

    /** Decodes to a JTS geometry (any type). */
    static Geometry decode(byte[] blob) throws ParseException {
        int off = wkbOffset(blob);
        byte[] wkb = new byte[blob.length - off];
        System.arraycopy(blob, off, wkb, 0, wkb.length);
        Geometry g = new WKBReader(PolygonAssembly.FACTORY).read(wkb);
        g.setSRID(srsId(blob));
        return g;
    }

    /**
     * Decodes a Polygon or MultiPolygon into raw rings without building JTS rings (so an unclosed ring can be
     * reported with its location). Returns {@code null} when the WKB is another type; its type name is then in
     * {@code typeOut[0]}.
     */
    static List<List<Coordinate[]>> rawPolygons(byte[] blob, String[] typeOut) {
        ByteBuffer b = ByteBuffer.wrap(blob);
        b.position(wkbOffset(blob));
        int type = header(b);
        List<List<Coordinate[]>> parts = new ArrayList<>();
        if (type % 1000 == 3) {
            parts.add(polygon(b, type / 1000));
        } else if (type % 1000 == 6) {
            int n = b.getInt();
            for (int k = 0; k < n; k++) {
                int t = header(b);
                if (t % 1000 != 3) throw new IllegalArgumentException("MultiPolygon member of WKB type " + t);
                parts.add(polygon(b, t / 1000));
            }
        } else {
            typeOut[0] = typeName(type % 1000);
            return null;
        }
        return parts;
    }

    private static int header(ByteBuffer b) {
        b.order(b.get() == 1 ? ByteOrder.LITTLE_ENDIAN : ByteOrder.BIG_ENDIAN);
        int t = b.getInt();
        // EWKB flags (PostGIS style) → ISO code
        boolean z = (t & 0x80000000) != 0, m = (t & 0x40000000) != 0;
        if ((t & 0x20000000) != 0) throw new IllegalArgumentException("WKB with embedded SRID is not supported");
        t &= 0x0fffffff;
        if (z || m) t = t % 1000 + (z && m ? 3000 : z ? 1000 : 2000);
        return t;
    }

    private static List<Coordinate[]> polygon(ByteBuffer b, int dimsCode) {
        int stride = dimsCode == 0 ? 2 : dimsCode == 3 ? 4 : 3;
        int nr = b.getInt();
        List<Coordinate[]> rings = new ArrayList<>(nr);
        for (int r = 0; r < nr; r++) {
            int np = b.getInt();
            Coordinate[] cs = new Coordinate[np];
            for (int k = 0; k < np; k++) {
                double x = b.getDouble(), y = b.getDouble();
                for (int e = 2; e < stride; e++) b.getDouble();
                cs[k] = new Coordinate(x, y);
            }
            rings.add(cs);
        }
        return rings;
    }

    static String typeName(int code) {
        switch (code) {
            case 1: return "Point";
            case 2: return "LineString";
            case 3: return "Polygon";
            case 4: return "MultiPoint";
            case 5: return "MultiLineString";
            case 6: return "MultiPolygon";
            case 7: return "GeometryCollection";
            default: return "WKB type " + code;
        }
    }
}
