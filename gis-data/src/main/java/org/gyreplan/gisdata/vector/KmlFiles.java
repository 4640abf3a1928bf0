package org.gyreplan.gisdata.vector;

import org.gyreplan.gisdata.io.AtomicWrite;
import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.geom.Polygon;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Map;

/**
 * KML 2.2 (OGC 07-147r2, 2008) writer: one Document with the caution {@link SeaCaution#TEXT} in its description,
 * one Folder per layer, one Placemark per feature (Point, LineString, Polygon with holes, or MultiGeometry) with
 * its properties as ExtendedData. The placemark name is the "name" property when present. Coordinates are
 * "lon,lat" in WGS 84 degrees with 7 decimals, longitudes in [−180°, 180°] (antimeridian-crossing geometries split);
 * exterior rings counter-clockwise.
 */
public final class KmlFiles {
    private KmlFiles() {}

    /** KML 2.2 namespace. */
    public static final String NAMESPACE = "http://www.opengis.net/kml/2.2";

    /** Writes a KML 2.2 document atomically. */
    public static void write(Path target, String title, List<FeatureLayer> layers) throws IOException {
        AtomicWrite.writeString(target, toXml(title, layers));
    }

    /** The KML 2.2 document text. */
    public static String toXml(String title, List<FeatureLayer> layers) {
        StringBuilder b = new StringBuilder(8192);
        b.append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
        b.append("<kml xmlns=\"").append(NAMESPACE).append("\">\n<Document>\n");
        b.append("  <name>").append(XmlText.escape(title)).append("</name>\n");
        b.append("  <description>").append(XmlText.escape(SeaCaution.TEXT)).append("</description>\n");
        for (FeatureLayer l : layers) {
            b.append("  <Folder>\n    <name>").append(XmlText.escape(l.name())).append("</name>\n");
            int k = 0;
            for (Feature f : l.features()) {
                b.append("    <Placemark>\n");
                Object name = f.get("name");
                b.append("      <name>").append(XmlText.escape(name == null ? l.name() + " " + k : String.valueOf(name)))
                        .append("</name>\n");
                if (!f.properties().isEmpty()) {
                    b.append("      <ExtendedData>\n");
                    for (Map.Entry<String, Object> e : f.properties().entrySet()) {
                        b.append("        <Data name=\"").append(XmlText.escape(e.getKey())).append("\"><value>")
                                .append(XmlText.escape(text(e.getValue()))).append("</value></Data>\n");
                    }
                    b.append("      </ExtendedData>\n");
                }
                geometry(b, Antimeridian.toStandardRange(f.geometry()), "      ");
                b.append("    </Placemark>\n");
                k++;
            }
            b.append("  </Folder>\n");
        }
        b.append("</Document>\n</kml>\n");
        return b.toString();
    }

    private static String text(Object v) {
        if (v == null) return "";
        if (v instanceof Double || v instanceof Float) {
            double d = ((Number) v).doubleValue();
            return Double.isFinite(d) ? VectorText.number(d) : "";
        }
        if (v instanceof Instant) return v.toString();
        return String.valueOf(v);
    }

    private static void geometry(StringBuilder b, Geometry g, String in) {
        if (g instanceof Point) {
            b.append(in).append("<Point><coordinates>");
            coords(b, g.getCoordinates(), null);
            b.append("</coordinates></Point>\n");
        } else if (g instanceof LineString) {
            b.append(in).append("<LineString><tessellate>1</tessellate><coordinates>");
            coords(b, g.getCoordinates(), null);
            b.append("</coordinates></LineString>\n");
        } else if (g instanceof Polygon) {
            Polygon p = (Polygon) g;
            b.append(in).append("<Polygon><outerBoundaryIs><LinearRing><coordinates>");
            coords(b, p.getExteriorRing().getCoordinates(), Boolean.TRUE);
            b.append("</coordinates></LinearRing></outerBoundaryIs>");
            for (int h = 0; h < p.getNumInteriorRing(); h++) {
                b.append("<innerBoundaryIs><LinearRing><coordinates>");
                coords(b, p.getInteriorRingN(h).getCoordinates(), Boolean.FALSE);
                b.append("</coordinates></LinearRing></innerBoundaryIs>");
            }
            b.append("</Polygon>\n");
        } else {
            b.append(in).append("<MultiGeometry>\n");
            for (int k = 0; k < g.getNumGeometries(); k++) geometry(b, g.getGeometryN(k), in + "  ");
            b.append(in).append("</MultiGeometry>\n");
        }
    }

    private static void coords(StringBuilder b, Coordinate[] cs, Boolean ccw) {
        boolean reverse = ccw != null && cs.length >= 4 && Orientation.isCCW(cs) != ccw;
        for (int k = 0; k < cs.length; k++) {
            if (k > 0) b.append(' ');
            Coordinate c = cs[reverse ? cs.length - 1 - k : k];
            b.append(VectorText.coordinate(c.x)).append(',').append(VectorText.coordinate(c.y));
        }
    }
}
