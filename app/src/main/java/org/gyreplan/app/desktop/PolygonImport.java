package org.gyreplan.app.desktop;

import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryCollection;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.io.WKTReader;
import org.locationtech.jts.io.geojson.GeoJsonReader;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** Reads polygons for the basin or exclusion zones from a file, chosen by extension. */
public final class PolygonImport {
    /** File-chooser patterns. */
    public static final String[] PATTERNS = {"*.geojson", "*.json", "*.wkt", "*.txt"};

    private PolygonImport() { }

    /** The polygons in a file (at least one), each in longitude/latitude degrees. */
    public static List<Geometry> read(Path file) throws Exception {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        String text = Files.readString(file, StandardCharsets.UTF_8);
        Geometry g;
        if (name.endsWith(".geojson") || name.endsWith(".json")) {
            g = new GeoJsonReader().read(text);
        } else if (name.endsWith(".wkt") || name.endsWith(".txt")) {
            g = new WKTReader().read(text.trim());
        } else {
            throw new IllegalArgumentException(file + ": unsupported polygon file type; expected "
                    + String.join(", ", PATTERNS));
        }
        List<Geometry> out = new ArrayList<>();
        collect(g, out);
        if (out.isEmpty()) {
            throw new IllegalArgumentException(file + ": no polygon found (geometry type " + g.getGeometryType()
                    + "); expected a Polygon or MultiPolygon");
        }
        return out;
    }

    private static void collect(Geometry g, List<Geometry> out) {
        if (g instanceof Polygon) {
            if (!g.isEmpty()) out.add(g);
        } else if (g instanceof GeometryCollection) {
            for (int k = 0; k < g.getNumGeometries(); k++) collect(g.getGeometryN(k), out);
        }
    }
}
