package org.gyreplan.gisdata.vector;

import org.gyreplan.gisdata.vector.GeometryFileException.Problem;

import java.nio.file.Path;
import java.util.Locale;

/**
 * Recognises geographic WGS 84 longitude/latitude in a coordinate reference written as OGC WKT (WKT 1 as in
 * ESRI .prj files and GeoPackage, or WKT 2). Gyreplan does no reprojection: a projected or other geographic
 * reference is refused with a message that names it and suggests reprojecting to EPSG:4326.
 */
public final class CrsCheck {
    private CrsCheck() {}

    /**
     * Checks that the WKT describes geographic WGS 84 coordinates in degrees.
     *
     * @param wkt  the coordinate reference text
     * @param file the file named in the error
     * @throws GeometryFileException PROJECTED_CRS or UNSUPPORTED_CRS
     */
    public static void requireGeographicWgs84(String wkt, Path file) throws GeometryFileException {
        String t = wkt.strip();
        String u = t.toUpperCase(Locale.ROOT);
        String name = firstQuoted(t);
        if (u.startsWith("PROJCS") || u.startsWith("PROJCRS") || u.startsWith("PROJECTEDCRS")) {
            throw new GeometryFileException(Problem.PROJECTED_CRS, file, -1, null, null, "the coordinate reference is projected ("
                    + name + "); Gyreplan reads geographic WGS 84 longitude/latitude in degrees only. Reproject first,"
                    + " e.g. ogr2ogr -t_srs EPSG:4326 out.shp in.shp");
        }
        boolean geographic = u.startsWith("GEOGCS") || u.startsWith("GEOGCRS") || u.startsWith("GEODCRS")
                || u.startsWith("GEOGRAPHICCRS");
        // the datum (or datum ensemble) name must be WGS 84; TOWGS84[...] shift parameters of another datum do not count
        String datum = nameAfter(u, "DATUM[");
        if (datum == null) datum = nameAfter(u, "ENSEMBLE[");
        String d = datum == null ? "" : datum.replace(" ", "").replace("_", "");
        boolean wgs84 = d.contains("WGS1984") || d.contains("WGS84") || d.contains("WORLDGEODETICSYSTEM1984");
        boolean degrees = !u.contains("UNIT[\"GRAD") && !u.contains("UNIT[\"RADIAN");
        if (!geographic || !wgs84 || !degrees) {
            throw new GeometryFileException(Problem.UNSUPPORTED_CRS, file, -1, null, null, "the coordinate reference ("
                    + name + ") is not geographic WGS 84 longitude/latitude in degrees; reproject to EPSG:4326 first");
        }
    }

    private static String nameAfter(String u, String keyword) {
        int k = u.indexOf(keyword);
        if (k < 0) return null;
        int a = u.indexOf('"', k), b = a < 0 ? -1 : u.indexOf('"', a + 1);
        return a >= 0 && b > a ? u.substring(a + 1, b) : null;
    }

    private static String firstQuoted(String t) {
        int a = t.indexOf('"');
        int b = a < 0 ? -1 : t.indexOf('"', a + 1);
        String head = t.length() > 60 ? t.substring(0, 60) + "…" : t;
        return a >= 0 && b > a ? t.substring(a + 1, b) : head;
    }
}
