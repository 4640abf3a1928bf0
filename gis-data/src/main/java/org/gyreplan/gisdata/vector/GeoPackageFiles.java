package org.gyreplan.gisdata.vector;

import org.gyreplan.gisdata.io.AtomicWrite;
import org.gyreplan.gisdata.vector.GeometryFileException.Problem;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.MultiPolygon;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.io.ParseException;
import org.sqlite.SQLiteConfig;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.ResultSetMetaData;
import java.sql.SQLException;
import java.sql.Statement;
import java.sql.Types;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * GeoPackage 1.3 (OGC 12-128r18) vector layers: writing several feature tables into one file and reading them back.
 *
 * <p>Written files carry {@code PRAGMA application_id = 0x47504B47} ("GPKG") and {@code user_version = 10300}
 * (version 1.3), the required {@code gpkg_spatial_ref_sys} rows (−1, 0 and EPSG:4326 WGS 84), one
 * {@code gpkg_contents} row per layer with its extent, one {@code gpkg_geometry_columns} row per layer, and
 * geometry blobs with the GeoPackage header and an xy envelope. Longitudes are brought into [−180°, 180°]
 * (antimeridian-crossing geometries are split). The contents' {@code last_change} is a parameter so that the same
 * inputs give the same file.
 */
public final class GeoPackageFiles {
    private GeoPackageFiles() {}

    /** "GPKG" as a 32-bit integer, the SQLite application id of GeoPackages (GeoPackage 1.3 §1.1.1.1.1). */
    public static final int APPLICATION_ID = 0x47504B47;
    /** user_version of GeoPackage 1.3.0. */
    public static final int USER_VERSION = 10300;
    /** OGC WKT 1 of EPSG:4326 as listed in GeoPackage 1.3 Annex for the WGS 84 row. */
    public static final String WGS84_WKT = "GEOGCS[\"WGS 84\",DATUM[\"WGS_1984\",SPHEROID[\"WGS 84\",6378137,298.257223563,"
            + "AUTHORITY[\"EPSG\",\"7030\"]],AUTHORITY[\"EPSG\",\"6326\"]],PRIMEM[\"Greenwich\",0,AUTHORITY[\"EPSG\",\"8901\"]],"
            + "UNIT[\"degree\",0.0174532925199433,AUTHORITY[\"EPSG\",\"9122\"]],AXIS[\"Latitude\",NORTH],"
            + "AXIS[\"Longitude\",EAST],AUTHORITY[\"EPSG\",\"4326\"]]";

    private static final DateTimeFormatter STAMP = DateTimeFormatter.ofPattern("yyyy-MM-dd'T'HH:mm:ss.SSS'Z'", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    // ------------------------------------------------------------------ writing

    /** Writes layers with {@code last_change} = the Unix epoch (bit-reproducible output). */
    public static void write(Path target, List<FeatureLayer> layers) throws IOException {
        write(target, layers, Instant.EPOCH);
    }

    /**
     * Writes the layers (one feature table each) into a new GeoPackage 1.3, atomically.
     *
     * @param lastChange value for {@code gpkg_contents.last_change} (e.g. the run time)
     */
    public static void write(Path target, List<FeatureLayer> layers, Instant lastChange) throws IOException {
        if (layers.isEmpty()) throw new IllegalArgumentException("a GeoPackage needs at least one layer");
        List<String> names = new ArrayList<>();
        for (FeatureLayer l : layers) {
            String n = l.name();
            if (n.toLowerCase(Locale.ROOT).startsWith("gpkg_") || n.toLowerCase(Locale.ROOT).startsWith("rtree_")) {
                throw new IllegalArgumentException("layer name \"" + n + "\" is reserved by GeoPackage");
            }
            for (String o : names) {
                if (o.equalsIgnoreCase(n)) throw new IllegalArgumentException("duplicate layer name \"" + n + "\"");
            }
            names.add(n);
        }
        AtomicWrite.toFile(target, tmp -> {
            try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + tmp.toAbsolutePath())) {
                try (Statement s = c.createStatement()) {
                    s.execute("PRAGMA application_id = " + APPLICATION_ID);
                    s.execute("PRAGMA user_version = " + USER_VERSION);
                }
                c.setAutoCommit(false);
                createCoreTables(c);
                String stamp = STAMP.format(lastChange.truncatedTo(ChronoUnit.MILLIS));
                for (FeatureLayer l : layers) writeLayer(c, l, stamp);
                c.commit();
            } catch (SQLException e) {
                throw new IOException("cannot write GeoPackage " + target.getFileName() + ": " + e.getMessage(), e);
            }
        });
    }

    private static void createCoreTables(Connection c) throws SQLException {
        try (Statement s = c.createStatement()) {
            s.execute("CREATE TABLE gpkg_spatial_ref_sys (srs_name TEXT NOT NULL, srs_id INTEGER NOT NULL PRIMARY KEY,"
                    + " organization TEXT NOT NULL, organization_coordsys_id INTEGER NOT NULL, definition TEXT NOT NULL,"
                    + " description TEXT)");
            s.execute("CREATE TABLE gpkg_contents (table_name TEXT NOT NULL PRIMARY KEY, data_type TEXT NOT NULL,"
                    + " identifier TEXT UNIQUE, description TEXT DEFAULT '', last_change DATETIME NOT NULL DEFAULT"
                    + " (strftime('%Y-%m-%dT%H:%M:%fZ','now')), min_x DOUBLE, min_y DOUBLE, max_x DOUBLE, max_y DOUBLE,"
                    + " srs_id INTEGER, CONSTRAINT fk_gc_r_srs_id FOREIGN KEY (srs_id) REFERENCES gpkg_spatial_ref_sys(srs_id))");
            s.execute("CREATE TABLE gpkg_geometry_columns (table_name TEXT NOT NULL, column_name TEXT NOT NULL,"
                    + " geometry_type_name TEXT NOT NULL, srs_id INTEGER NOT NULL, z TINYINT NOT NULL, m TINYINT NOT NULL,"
                    + " CONSTRAINT pk_geom_cols PRIMARY KEY (table_name, column_name),"
                    + " CONSTRAINT uk_gc_table_name UNIQUE (table_name),"
                    + " CONSTRAINT fk_gc_tn FOREIGN KEY (table_name) REFERENCES gpkg_contents(table_name),"
                    + " CONSTRAINT fk_gc_srs FOREIGN KEY (srs_id) REFERENCES gpkg_spatial_ref_sys (srs_id))");
        }
        try (PreparedStatement p = c.prepareStatement("INSERT INTO gpkg_spatial_ref_sys VALUES (?,?,?,?,?,?)")) {
            srs(p, "Undefined cartesian SRS", -1, "NONE", -1, "undefined", "undefined cartesian coordinate reference system");
            srs(p, "Undefined geographic SRS", 0, "NONE", 0, "undefined", "undefined geographic coordinate reference system");
            srs(p, "WGS 84 geodetic", 4326, "EPSG", 4326, WGS84_WKT,
                    "longitude/latitude coordinates in decimal degrees on the WGS 84 spheroid");
        }
    }

    private static void srs(PreparedStatement p, String name, int id, String org, int orgId, String def, String desc)
            throws SQLException {
        p.setString(1, name);
        p.setInt(2, id);
        p.setString(3, org);
        p.setInt(4, orgId);
        p.setString(5, def);
        p.setString(6, desc);
        p.executeUpdate();
    }

    static String quoteId(String id) {
        return "\"" + id.replace("\"", "\"\"") + "\"";
    }

    private enum ColumnType { INTEGER, DOUBLE, BOOLEAN, DATETIME, TEXT }

    private static ColumnType typeOf(Object v) {
        if (v instanceof Integer || v instanceof Long || v instanceof Short || v instanceof Byte) return ColumnType.INTEGER;
        if (v instanceof Number) return ColumnType.DOUBLE;
        if (v instanceof Boolean) return ColumnType.BOOLEAN;
        if (v instanceof Instant) return ColumnType.DATETIME;
        return ColumnType.TEXT;
    }

    private static ColumnType merge(ColumnType a, ColumnType b) {
        if (a == null) return b;
        if (b == null || a == b) return a;
        if ((a == ColumnType.INTEGER && b == ColumnType.DOUBLE) || (a == ColumnType.DOUBLE && b == ColumnType.INTEGER)) {
            return ColumnType.DOUBLE;
        }
        return ColumnType.TEXT;
    }

    private static void writeLayer(Connection c, FeatureLayer layer, String stamp) throws SQLException {
        List<Geometry> geoms = new ArrayList<>();
        for (Feature f : layer.features()) geoms.add(Antimeridian.toStandardRange(f.geometry()));
        String typeName = geometryTypeName(geoms);
        if (typeName.equals("MULTIPOLYGON")) {
            for (int k = 0; k < geoms.size(); k++) {
                if (geoms.get(k) instanceof Polygon) {
                    geoms.set(k, geoms.get(k).getFactory().createMultiPolygon(new Polygon[] {(Polygon) geoms.get(k)}));
                }
            }
        }
        LinkedHashMap<String, ColumnType> columns = new LinkedHashMap<>();
        for (Feature f : layer.features()) {
            for (Map.Entry<String, Object> e : f.properties().entrySet()) {
                if (e.getKey().equalsIgnoreCase("fid") || e.getKey().equalsIgnoreCase("geom")) {
                    throw new IllegalArgumentException("property name \"" + e.getKey() + "\" is reserved in GeoPackage layer "
                            + layer.name());
                }
                ColumnType t = e.getValue() == null ? null : typeOf(e.getValue());
                columns.put(e.getKey(), merge(columns.get(e.getKey()), t));
            }
        }
        StringBuilder ddl = new StringBuilder("CREATE TABLE ").append(quoteId(layer.name()))
                .append(" (fid INTEGER PRIMARY KEY AUTOINCREMENT NOT NULL, geom ").append(typeName);
        for (Map.Entry<String, ColumnType> e : columns.entrySet()) {
            ColumnType t = e.getValue() == null ? ColumnType.TEXT : e.getValue();
            ddl.append(", ").append(quoteId(e.getKey())).append(' ').append(t.name());
        }
        ddl.append(')');
        Envelope extent = new Envelope();
        for (Geometry g : geoms) extent.expandToInclude(g.getEnvelopeInternal());
        try (Statement s = c.createStatement()) {
            s.execute(ddl.toString());
        }
        try (PreparedStatement p = c.prepareStatement("INSERT INTO gpkg_contents (table_name, data_type, identifier,"
                + " description, last_change, min_x, min_y, max_x, max_y, srs_id) VALUES (?,?,?,?,?,?,?,?,?,?)")) {
            p.setString(1, layer.name());
            p.setString(2, "features");
            p.setString(3, layer.name());
            p.setString(4, "");
            p.setString(5, stamp);
            if (extent.isNull()) {
                for (int k = 6; k <= 9; k++) p.setNull(k, Types.DOUBLE);
            } else {
                p.setDouble(6, extent.getMinX());
                p.setDouble(7, extent.getMinY());
                p.setDouble(8, extent.getMaxX());
                p.setDouble(9, extent.getMaxY());
            }
            p.setInt(10, 4326);
            p.executeUpdate();
        }
        try (PreparedStatement p = c.prepareStatement("INSERT INTO gpkg_geometry_columns VALUES (?,?,?,?,0,0)")) {
            p.setString(1, layer.name());
            p.setString(2, "geom");
            p.setString(3, typeName);
            p.setInt(4, 4326);
            p.executeUpdate();
        }
        StringBuilder ins = new StringBuilder("INSERT INTO ").append(quoteId(layer.name())).append(" (geom");
        for (String n : columns.keySet()) ins.append(", ").append(quoteId(n));
        ins.append(") VALUES (?");
        ins.append(", ?".repeat(columns.size())).append(')');
        try (PreparedStatement p = c.prepareStatement(ins.toString())) {
            for (int k = 0; k < geoms.size(); k++) {
                p.setBytes(1, GpkgGeometry.encode(geoms.get(k), 4326));
                int col = 2;
                Map<String, Object> props = layer.features().get(k).properties();
                for (Map.Entry<String, ColumnType> e : columns.entrySet()) {
                    Object v = props.get(e.getKey());
                    ColumnType t = e.getValue();
                    if (v == null || (v instanceof Double && !Double.isFinite((Double) v))
                            || (v instanceof Float && !Float.isFinite((Float) v))) {
                        p.setNull(col, Types.NULL);
                    } else if (t == ColumnType.INTEGER) {
                        p.setLong(col, ((Number) v).longValue());
                    } else if (t == ColumnType.DOUBLE) {
                        p.setDouble(col, ((Number) v).doubleValue());
                    } else if (t == ColumnType.BOOLEAN) {
                        p.setInt(col, ((Boolean) v) ? 1 : 0);
                    } else if (t == ColumnType.DATETIME) {
                        p.setString(col, STAMP.format(((Instant) v).truncatedTo(ChronoUnit.MILLIS)));
                    } else {
                        p.setString(col, v instanceof Instant ? v.toString() : String.valueOf(v));
                    }
                    col++;
                }
                p.executeUpdate();
            }
        }
    }

    private static String geometryTypeName(List<Geometry> geoms) {
        String t = null;
        for (Geometry g : geoms) {
            String n = g.getGeometryType().toUpperCase(Locale.ROOT);
            if (t == null) t = n;
            else if (!t.equals(n)) {
                if ((t.equals("POLYGON") || t.equals("MULTIPOLYGON")) && (n.equals("POLYGON") || n.equals("MULTIPOLYGON"))) {
                    t = "MULTIPOLYGON";
                } else {
                    t = "GEOMETRY";
                }
            }
        }
        return t == null ? "GEOMETRY" : t.equals("GEOMETRYCOLLECTION") ? "GEOMETRYCOLLECTION" : t;
    }

    // ------------------------------------------------------------------ reading

    private static Connection openReadOnly(Path file) throws IOException {
        if (!Files.isRegularFile(file)) throw new java.io.FileNotFoundException(file + " (no such file)");
        try {
            byte[] head = new byte[16];
            try (var in = Files.newInputStream(file)) {
                if (in.readNBytes(head, 0, 16) < 16 || !new String(head, 0, 15, java.nio.charset.StandardCharsets.US_ASCII)
                        .equals("SQLite format 3")) {
                    throw new GeometryFileException(Problem.UNREADABLE, file, -1, null, null, "not an SQLite/GeoPackage file");
                }
            }
            SQLiteConfig cfg = new SQLiteConfig();
            cfg.setReadOnly(true);
            return cfg.createConnection("jdbc:sqlite:" + file.toAbsolutePath());
        } catch (SQLException e) {
            throw new GeometryFileException(Problem.UNREADABLE, file, -1, null, null, "cannot open GeoPackage: " + e.getMessage());
        }
    }

    /** Layer (feature table) names with their geometry type names, in file order. */
    public static Map<String, String> layers(Path file) throws IOException {
        try (Connection c = openReadOnly(file)) {
            return layers(c, file);
        } catch (SQLException e) {
            throw new GeometryFileException(Problem.UNREADABLE, file, -1, null, null, e.getMessage());
        }
    }

    private static Map<String, String> layers(Connection c, Path file) throws SQLException, GeometryFileException {
        Map<String, String> out = new LinkedHashMap<>();
        try (Statement s = c.createStatement();
             ResultSet r = s.executeQuery("SELECT g.table_name, g.geometry_type_name FROM gpkg_geometry_columns g"
                     + " JOIN gpkg_contents c ON c.table_name = g.table_name ORDER BY c.rowid")) {
            while (r.next()) out.put(r.getString(1), r.getString(2).toUpperCase(Locale.ROOT));
        } catch (SQLException e) {
            throw new GeometryFileException(Problem.UNREADABLE, file, -1, null, null,
                    "not a GeoPackage with vector layers (gpkg_geometry_columns/gpkg_contents): " + e.getMessage());
        }
        return out;
    }

    private static void requireLayer(Map<String, String> layers, Path file, String layer) throws GeometryFileException {
        if (!layers.containsKey(layer)) {
            throw new GeometryFileException(Problem.NO_POLYGONS, file, -1, null, null, "no layer \"" + layer
                    + "\"; layers are " + layers.keySet());
        }
    }

    /** Reads one layer (any geometry type) with its attributes; the fid is not a property. */
    public static FeatureLayer readLayer(Path file, String layer) throws IOException {
        try (Connection c = openReadOnly(file)) {
            Map<String, String> ls = layers(c, file);
            requireLayer(ls, file, layer);
            checkSrs(c, file, layer);
            List<Feature> out = new ArrayList<>();
            Rows rows = rows(c, layer);
            PreparedStatement st = rows.statement;
            try (st; ResultSet r = st.executeQuery()) {
                int k = 0;
                while (r.next()) {
                    Map<String, Object> props = attributes(r, rows.geometryColumn);
                    byte[] blob = r.getBytes(rows.geometryColumn);
                    if (blob == null) throw new GeometryFileException(Problem.UNREADABLE, file, k, null, null, "has no geometry");
                    try {
                        out.add(new Feature(GpkgGeometry.decode(blob), props));
                    } catch (ParseException | IllegalArgumentException e) {
                        throw new GeometryFileException(Problem.UNREADABLE, file, k, null, null, "bad geometry blob: " + e.getMessage());
                    }
                    k++;
                }
            }
            return new FeatureLayer(layer, out);
        } catch (SQLException e) {
            throw new GeometryFileException(Problem.UNREADABLE, file, -1, null, null, e.getMessage());
        }
    }

    /** Reads polygon features of a layer (or of the only polygon layer when {@code layer} is null). */
    static List<PolygonFeature> readPolygons(Path file, String layer, boolean repair) throws IOException {
        try (Connection c = openReadOnly(file)) {
            Map<String, String> ls = layers(c, file);
            if (layer == null) {
                List<String> polyLayers = new ArrayList<>();
                ls.forEach((n, t) -> { if (t.equals("POLYGON") || t.equals("MULTIPOLYGON") || t.equals("GEOMETRY")) polyLayers.add(n); });
                if (polyLayers.size() != 1) {
                    throw new GeometryFileException(Problem.NO_POLYGONS, file, -1, null, null, polyLayers.isEmpty()
                            ? "no polygon layer; layers are " + ls
                            : "several polygon layers " + polyLayers + "; name the one to use");
                }
                layer = polyLayers.get(0);
            } else {
                requireLayer(ls, file, layer);
            }
            checkSrs(c, file, layer);
            List<PolygonFeature> out = new ArrayList<>();
            Rows rows = rows(c, layer);
            PreparedStatement st = rows.statement;
            try (st; ResultSet r = st.executeQuery()) {
                int k = 0;
                while (r.next()) {
                    Map<String, Object> props = attributes(r, rows.geometryColumn);
                    PolygonAssembly a = new PolygonAssembly(file, k, PolygonAssembly.nameFrom(props, r.getObject(rows.fidColumn)), repair);
                    byte[] blob = r.getBytes(rows.geometryColumn);
                    if (blob == null) throw a.error(Problem.NOT_POLYGON, null, "has no geometry; expected a Polygon or MultiPolygon");
                    String[] type = new String[1];
                    List<List<Coordinate[]>> parts;
                    try {
                        parts = GpkgGeometry.rawPolygons(blob, type);
                    } catch (RuntimeException e) {
                        throw a.error(Problem.UNREADABLE, null, "bad geometry blob in layer " + layer + ": " + e.getMessage());
                    }
                    if (parts == null) {
                        throw a.error(Problem.NOT_POLYGON, null, "geometry type is " + type[0] + " in layer " + layer
                                + "; expected a Polygon or MultiPolygon");
                    }
                    out.add(a.feature(a.polygonal(parts), props));
                    k++;
                }
            }
            if (out.isEmpty()) throw new GeometryFileException(Problem.NO_POLYGONS, file, -1, null, null, "layer " + layer + " is empty");
            return out;
        } catch (SQLException e) {
            throw new GeometryFileException(Problem.UNREADABLE, file, -1, null, null, e.getMessage());
        }
    }

    private static void checkSrs(Connection c, Path file, String layer) throws SQLException, GeometryFileException {
        try (PreparedStatement p = c.prepareStatement("SELECT s.srs_id, s.organization, s.organization_coordsys_id,"
                + " s.definition FROM gpkg_geometry_columns g JOIN gpkg_spatial_ref_sys s ON s.srs_id = g.srs_id"
                + " WHERE g.table_name = ?")) {
            p.setString(1, layer);
            try (ResultSet r = p.executeQuery()) {
                if (!r.next()) {
                    throw new GeometryFileException(Problem.UNSUPPORTED_CRS, file, -1, null, null, "layer " + layer
                            + " has no entry in gpkg_spatial_ref_sys");
                }
                int id = r.getInt(1);
                String org = r.getString(2);
                int orgId = r.getInt(3);
                if (id == 0 || ("EPSG".equalsIgnoreCase(org) && orgId == 4326)) return;
                CrsCheck.requireGeographicWgs84(r.getString(4), file);
            }
        }
    }

    private static final class Rows {
        PreparedStatement statement;
        String geometryColumn;
        String fidColumn;
    }

    private static Rows rows(Connection c, String layer) throws SQLException {
        Rows rows = new Rows();
        try (PreparedStatement p = c.prepareStatement("SELECT column_name FROM gpkg_geometry_columns WHERE table_name = ?")) {
            p.setString(1, layer);
            try (ResultSet r = p.executeQuery()) {
                r.next();
                rows.geometryColumn = r.getString(1);
            }
        }
        rows.fidColumn = "fid";
        try (Statement s = c.createStatement(); ResultSet r = s.executeQuery("PRAGMA table_info(" + quoteId(layer) + ")")) {
            while (r.next()) {
                if (r.getInt("pk") == 1) rows.fidColumn = r.getString("name");
            }
        }
        rows.statement = c.prepareStatement("SELECT * FROM " + quoteId(layer) + " ORDER BY " + quoteId(rows.fidColumn));
        return rows;
    }

    private static Map<String, Object> attributes(ResultSet r, String geometryColumn) throws SQLException {
        ResultSetMetaData md = r.getMetaData();
        Map<String, Object> props = new LinkedHashMap<>();
        for (int i = 1; i <= md.getColumnCount(); i++) {
            String n = md.getColumnName(i);
            if (n.equalsIgnoreCase(geometryColumn) || n.equalsIgnoreCase("fid")) continue;
            Object v = r.getObject(i);
            if (v instanceof Integer) v = ((Integer) v).longValue();
            props.put(n, v);
        }
        return props;
    }

    /** Whether a geometry is polygonal (Polygon or MultiPolygon). */
    static boolean polygonal(Geometry g) {
        return g instanceof Polygon || g instanceof MultiPolygon;
    }
}
