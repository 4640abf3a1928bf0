package org.gyreplan.gisdata.vector;

import org.gyreplan.gisdata.io.AtomicWrite;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.List;
import java.util.Objects;

/**
 * GPX 1.1 (Topografix, "GPX 1.1 Schema Documentation", 2004) writer for waypoints (e.g. mooring sites, survey
 * stations) and routes (a cruise track through the stations). The metadata description and every route carry
 * {@link SeaCaution#TEXT}. Longitudes are written in [−180°, 180°); latitudes and longitudes with 7 decimals.
 */
public final class GpxFiles {
    private GpxFiles() {}

    /** GPX 1.1 namespace. */
    public static final String NAMESPACE = "http://www.topografix.com/GPX/1/1";

    /**
     * A waypoint.
     *
     * @param name        short name (e.g. "M3")
     * @param lonDeg      longitude, degrees east (any range; wrapped on output)
     * @param latDeg      latitude, degrees north
     * @param description free text, or {@code null}
     */
    public record Waypoint(String name, double lonDeg, double latDeg, String description) {
        public Waypoint {
            if (!(latDeg >= -90 && latDeg <= 90) || !Double.isFinite(lonDeg)) {
                throw new IllegalArgumentException("waypoint " + name + ": position (" + lonDeg + ", " + latDeg
                        + ") is not a longitude/latitude in degrees");
            }
        }
    }

    /**
     * A route: an ordered list of points.
     *
     * @param name        route name
     * @param description free text, or {@code null}
     * @param points      route points in order
     */
    public record Route(String name, String description, List<Waypoint> points) {
        public Route {
            Objects.requireNonNull(name, "name");
            points = List.copyOf(points);
        }
    }

    /**
     * Waypoints from the Point features of a layer: the name is the "name" property (else the layer name and the
     * index), the description the "description" or "desc" property.
     *
     * @throws IllegalArgumentException if a feature is not a Point
     */
    public static List<Waypoint> waypoints(FeatureLayer layer) {
        java.util.ArrayList<Waypoint> out = new java.util.ArrayList<>();
        int k = 0;
        for (Feature f : layer.features()) {
            if (!(f.geometry() instanceof org.locationtech.jts.geom.Point)) {
                throw new IllegalArgumentException("layer " + layer.name() + ", feature " + k + ": GPX waypoints need points, got "
                        + f.geometry().getGeometryType());
            }
            Object name = f.get("name");
            Object desc = f.get("description") != null ? f.get("description") : f.get("desc");
            var c = f.geometry().getCoordinate();
            out.add(new Waypoint(name == null ? layer.name() + " " + k : String.valueOf(name), c.x, c.y,
                    desc == null ? null : String.valueOf(desc)));
            k++;
        }
        return out;
    }

    /**
     * Writes a GPX 1.1 file atomically.
     *
     * @param target    the file
     * @param title     metadata name
     * @param time      metadata time (for reproducible files pass a fixed instant), or {@code null} to omit
     * @param waypoints waypoints (may be empty)
     * @param routes    routes (may be empty)
     */
    public static void write(Path target, String title, Instant time, List<Waypoint> waypoints, List<Route> routes)
            throws IOException {
        AtomicWrite.writeString(target, toXml(title, time, waypoints, routes));
    }

    /** The GPX 1.1 document text. */
    public static String toXml(String title, Instant time, List<Waypoint> waypoints, List<Route> routes) {
        StringBuilder b = new StringBuilder(4096);
        b.append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
        b.append("<gpx version=\"1.1\" creator=\"Gyreplan\" xmlns=\"").append(NAMESPACE)
                .append("\" xmlns:xsi=\"http://www.w3.org/2001/XMLSchema-instance\" xsi:schemaLocation=\"")
                .append(NAMESPACE).append(" http://www.topografix.com/GPX/1/1/gpx.xsd\">\n");
        b.append("  <metadata>\n");
        b.append("    <name>").append(XmlText.escape(title)).append("</name>\n");
        b.append("    <desc>").append(XmlText.escape(SeaCaution.TEXT)).append("</desc>\n");
        if (time != null) b.append("    <time>").append(time.truncatedTo(ChronoUnit.SECONDS)).append("</time>\n");
        b.append("  </metadata>\n");
        for (Waypoint w : waypoints) point(b, "wpt", w, "  ");
        for (Route r : routes) {
            b.append("  <rte>\n");
            b.append("    <name>").append(XmlText.escape(r.name())).append("</name>\n");
            String d = r.description() == null ? SeaCaution.TEXT : r.description() + " " + SeaCaution.TEXT;
            b.append("    <desc>").append(XmlText.escape(d)).append("</desc>\n");
            for (Waypoint w : r.points()) point(b, "rtept", w, "    ");
            b.append("  </rte>\n");
        }
        b.append("</gpx>\n");
        return b.toString();
    }

    private static void point(StringBuilder b, String tag, Waypoint w, String indent) {
        double lon = Antimeridian.wrap180(w.lonDeg());
        if (lon == 180) lon = -180; // the GPX schema's longitude range is [-180, 180)
        b.append(indent).append('<').append(tag).append(" lat=\"").append(VectorText.coordinate(w.latDeg()))
                .append("\" lon=\"").append(VectorText.coordinate(lon)).append("\">");
        if (w.name() != null) b.append("<name>").append(XmlText.escape(w.name())).append("</name>");
        if (w.description() != null) b.append("<desc>").append(XmlText.escape(w.description())).append("</desc>");
        b.append("</").append(tag).append(">\n");
    }
}
