package org.gyreplan.gisdata.vector;

import org.gyreplan.gisdata.vector.GeometryFileException.Problem;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;

import java.io.FileNotFoundException;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;

/**
 * The one entry point for polygons in (basins, exclusion zones, study areas), choosing the reader by extension:
 * <ul>
 *   <li>{@code .geojson}, {@code .json} — GeoJSON (RFC 7946): FeatureCollection, Feature, Polygon, MultiPolygon;</li>
 *   <li>{@code .wkt}, {@code .txt} — OGC Well-Known Text POLYGON / MULTIPOLYGON, one or more;</li>
 *   <li>{@code .shp} — ESRI Shapefile with .shx, .dbf and .prj (geographic WGS 84 only);</li>
 *   <li>{@code .gpkg} — GeoPackage polygon layer (the only one, or the one named in the options).</li>
 * </ul>
 * Coordinates are geographic WGS 84 longitude/latitude in degrees (x = lon, y = lat). Every polygon is checked
 * (closed rings with at least 4 points, valid by {@code IsValidOp}); problems are reported as
 * {@link GeometryFileException} naming the file, the feature (index and name) and the location. With
 * {@link Options#repair()} open rings are closed and invalid polygons are rebuilt (JTS {@code GeometryFixer}).
 *
 * <pre>
 *   List&lt;PolygonFeature&gt; zones = PolygonFiles.read(Path.of("exclusion.geojson"));
 *   Geometry basin = PolygonFiles.readOne(Path.of("basin.shp"), PolygonFiles.Options.DEFAULT, null);
 * </pre>
 */
public final class PolygonFiles {
    private PolygonFiles() {}

    /**
     * Reading options.
     *
     * @param repair close open rings and rebuild invalid polygons instead of refusing them
     * @param layer  GeoPackage layer name, or {@code null} for the only polygon layer
     */
    public record Options(boolean repair, String layer) {
        /** No repair, the only polygon layer. */
        public static final Options DEFAULT = new Options(false, null);

        /** These options with repair switched on. */
        public Options withRepair() { return new Options(true, layer); }

        /** These options with a GeoPackage layer name. */
        public Options withLayer(String name) { return new Options(repair, name); }
    }

    /** Reads all polygon features with the default options (no repair). */
    public static List<PolygonFeature> read(Path file) throws IOException {
        return read(file, Options.DEFAULT);
    }

    /** Reads all polygon features of a file; the format follows the file extension. */
    public static List<PolygonFeature> read(Path file, Options options) throws IOException {
        if (!Files.isRegularFile(file)) throw new FileNotFoundException(file + " (no such polygon file)");
        String n = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (n.endsWith(".geojson") || n.endsWith(".json")) return GeoJsonFiles.readPolygons(file, options.repair());
        if (n.endsWith(".wkt") || n.endsWith(".txt")) return WktPolygons.read(file, options.repair());
        if (n.endsWith(".shp")) return ShapefilePolygons.read(file, options.repair());
        if (n.endsWith(".gpkg")) return GeoPackageFiles.readPolygons(file, options.layer(), options.repair());
        throw new GeometryFileException(Problem.UNSUPPORTED_FORMAT, file, -1, null, null,
                "unknown polygon file type; expected .geojson/.json (GeoJSON), .wkt/.txt (WKT), .shp (Shapefile) or .gpkg (GeoPackage)");
    }

    /**
     * Reads one polygonal geometry: the feature with the given name, or — with {@code name == null} — the only
     * feature of the file (several features are refused, listing their names).
     */
    public static Geometry readOne(Path file, Options options, String name) throws IOException {
        List<PolygonFeature> all = read(file, options);
        if (name == null) {
            if (all.size() == 1) return all.get(0).polygon();
            List<String> names = new ArrayList<>();
            for (PolygonFeature f : all) names.add(f.name());
            throw new GeometryFileException(Problem.NO_POLYGONS, file, -1, null, null, "holds " + all.size()
                    + " polygons " + names + "; name the one to use");
        }
        for (PolygonFeature f : all) if (name.equals(f.name())) return f.polygon();
        List<String> names = new ArrayList<>();
        for (PolygonFeature f : all) names.add(f.name());
        throw new GeometryFileException(Problem.NO_POLYGONS, file, -1, null, null, "has no polygon named \"" + name
                + "\"; names are " + names);
    }

    /**
     * A polygon from inline [longitude, latitude] pairs in degrees (e.g. from a scenario). The ring may be given
     * closed or open (an open ring is closed by repeating the first point); it must have at least 3 distinct
     * points and must not cross itself.
     *
     * @param lonLatDeg the exterior ring as [lon, lat] pairs
     */
    public static Polygon fromLonLat(List<double[]> lonLatDeg) throws GeometryFileException {
        return fromLonLat(lonLatDeg, List.of());
    }

    /** A polygon with holes from inline [lon, lat] pairs (each ring open or closed). */
    public static Polygon fromLonLat(List<double[]> shell, List<List<double[]>> holes) throws GeometryFileException {
        PolygonAssembly a = new PolygonAssembly(null, -1, null, false);
        List<Coordinate[]> rings = new ArrayList<>();
        rings.add(inlineRing(a, shell, "exterior ring"));
        int h = 1;
        for (List<double[]> hole : holes) rings.add(inlineRing(a, hole, "hole " + h++));
        Geometry g = a.polygonal(List.of(rings));
        return (Polygon) g;
    }

    private static Coordinate[] inlineRing(PolygonAssembly a, List<double[]> pts, String label) throws GeometryFileException {
        List<Coordinate> cs = new ArrayList<>();
        int k = 0;
        for (double[] p : pts) {
            if (p == null || p.length < 2) {
                throw a.error(Problem.UNREADABLE, null, label + " point " + k + " must be [longitude, latitude]");
            }
            cs.add(new Coordinate(p[0], p[1]));
            k++;
        }
        if (!cs.isEmpty() && !cs.get(0).equals2D(cs.get(cs.size() - 1))) cs.add(new Coordinate(cs.get(0)));
        return cs.toArray(new Coordinate[0]);
    }

    /** Polygons as writer features (a "name" property, then the attributes), e.g. to export a basin. */
    public static FeatureLayer toLayer(String layerName, List<PolygonFeature> polygons) {
        List<Feature> fs = new ArrayList<>();
        for (PolygonFeature p : polygons) fs.add(p.toFeature());
        return new FeatureLayer(layerName, fs);
    }

    static LinkedHashMap<String, Object> noAttributes() { return new LinkedHashMap<>(); }
}
