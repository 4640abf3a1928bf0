package org.gyreplan.gisdata.cf;

import org.gyreplan.gisdata.io.AtomicWrite;
import org.gyreplan.gisdata.netcdf.ClassicNetcdfWriter;
import org.gyreplan.gisdata.netcdf.DataType;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.ProgressListener;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Writes CF-1.8 netCDF files (64-bit offset format, readable by every netCDF client) through {@link AtomicWrite}:
 *
 * <ul>
 *   <li>gridded fields {@code var(time, lat, lon)} (or {@code var(lat, lon)} without times), written one step
 *       at a time so memory stays O(grid);</li>
 *   <li>station time series {@code var(station, time)} with {@code station_name}, {@code lon}, {@code lat}
 *       (CF §H.2.1, orthogonal multidimensional representation, {@code featureType = "timeSeries"}).</li>
 * </ul>
 *
 * Every file carries the global attributes Conventions, title, history, source (plus any extra ones), a
 * {@code crs} grid-mapping variable ({@code latitude_longitude} on WGS 84, with {@code crs_wkt} for EPSG:4326), CF
 * coordinate variables with {@code standard_name}, {@code units} and {@code axis}, and for each data variable
 * its {@code units}, {@code long_name} (which states the sign convention), {@code standard_name} where CF
 * defines one, {@code grid_mapping = "crs"} and a {@code _FillValue} (NaN values are written as the fill value).
 * Times are written as {@code seconds since 1970-01-01 00:00:00} in the proleptic Gregorian calendar (the
 * calendar of {@link Instant}).
 */
public final class CfNetcdfWriter {
    private CfNetcdfWriter() {}

    /** Fill value written for NaN (the netCDF default fill for FLOAT). */
    public static final float FILL = 9.96921e36f;

    /** WKT of EPSG:4326 (OGC WKT 1, as GDAL writes it). */
    public static final String WKT_EPSG_4326 = "GEOGCS[\"WGS 84\",DATUM[\"WGS_1984\",SPHEROID[\"WGS 84\",6378137,"
            + "298.257223563,AUTHORITY[\"EPSG\",\"7030\"]],AUTHORITY[\"EPSG\",\"6326\"]],PRIMEM[\"Greenwich\",0,"
            + "AUTHORITY[\"EPSG\",\"8901\"]],UNIT[\"degree\",0.0174532925199433,AUTHORITY[\"EPSG\",\"9122\"]],"
            + "AXIS[\"Latitude\",NORTH],AXIS[\"Longitude\",EAST],AUTHORITY[\"EPSG\",\"4326\"]]";

    /**
     * One output variable.
     *
     * @param name         variable name in the file
     * @param units        UDUNITS unit string (e.g. "Pa", "m s-1", "m2 s-1")
     * @param standardName CF standard name, or {@code null} where CF defines none
     * @param longName     description including the sign convention
     */
    public record FieldSpec(String name, String units, String standardName, String longName) { }

    /**
     * Global attributes.
     *
     * @param title   short title
     * @param source  how the data were produced (program and version)
     * @param history processing history line(s)
     * @param extra   further global attributes (e.g. comment, references), may be empty
     */
    public record GlobalInfo(String title, String source, String history, Map<String, String> extra) {
        public GlobalInfo {
            extra = extra == null ? Map.of() : new LinkedHashMap<>(extra);
        }
    }

    /** Supplies the values of every field at step k, in {@link FieldSpec} order (each of length grid size, row-major, latitude ascending). */
    @FunctionalInterface
    public interface StepSource {
        List<double[]> step(int k) throws IOException;
    }

    /**
     * Writes a gridded file.
     *
     * @param times step times, or an empty list for a file without a time axis (then the source is asked for step 0)
     */
    public static void writeGridded(Path target, LonLatGrid grid, List<Instant> times, List<FieldSpec> fields,
                                    GlobalInfo info, StepSource source, ProgressListener progress, CancelToken cancel)
            throws IOException {
        boolean hasTime = !times.isEmpty();
        ClassicNetcdfWriter w = new ClassicNetcdfWriter();
        globals(w, info, null);
        if (hasTime) w.recordDimension("time", times.size());
        w.dimension("lat", grid.ny()).dimension("lon", grid.nx());
        if (hasTime) timeVariable(w, "time");
        w.variable("lat", DataType.DOUBLE, "lat").text("standard_name", "latitude").text("long_name", "latitude")
                .text("units", "degrees_north").text("axis", "Y");
        w.variable("lon", DataType.DOUBLE, "lon").text("standard_name", "longitude").text("long_name", "longitude")
                .text("units", "degrees_east").text("axis", "X");
        crs(w);
        for (FieldSpec f : fields) {
            ClassicNetcdfWriter.VariableDef v = hasTime ? w.variable(f.name(), DataType.FLOAT, "time", "lat", "lon")
                    : w.variable(f.name(), DataType.FLOAT, "lat", "lon");
            describe(v, f);
            v.text("grid_mapping", "crs");
        }
        double[] lat = new double[grid.ny()], lon = new double[grid.nx()];
        for (int j = 0; j < lat.length; j++) lat[j] = grid.latDeg(j);
        for (int i = 0; i < lon.length; i++) lon[i] = grid.lonDeg(i);
        int n = hasTime ? times.size() : 1;
        AtomicWrite.toFile(target, tmp -> {
            try (ClassicNetcdfWriter.Output out = w.open(tmp)) {
                if (hasTime) out.write("time", seconds(times));
                out.write("lat", lat);
                out.write("lon", lon);
                for (int k = 0; k < n; k++) {
                    cancel.check();
                    List<double[]> vals = source.step(k);
                    if (vals.size() != fields.size()) {
                        throw new IllegalArgumentException("step " + k + ": " + vals.size() + " fields for " + fields.size() + " declared");
                    }
                    for (int f = 0; f < fields.size(); f++) {
                        double[] v = vals.get(f);
                        if (v.length != grid.size()) {
                            throw new IllegalArgumentException("field '" + fields.get(f).name() + "' has " + v.length
                                    + " values, the grid has " + grid.size());
                        }
                        if (hasTime) {
                            out.write(fields.get(f).name(), new int[] {k, 0, 0}, new int[] {1, grid.ny(), grid.nx()}, v);
                        } else {
                            out.write(fields.get(f).name(), v);
                        }
                    }
                    progress.progress("write " + target.getFileName(), (k + 1.0) / n, "");
                }
            }
        });
    }

    /** A station: name, position in degrees. */
    public record Station(String name, double lonDeg, double latDeg) { }

    /**
     * Writes station time series: {@code values.get(f)[s][t]} is field f at station s and time t.
     */
    public static void writeStations(Path target, List<Station> stations, List<Instant> times, List<FieldSpec> fields,
                                     List<double[][]> values, GlobalInfo info) throws IOException {
        if (stations.isEmpty()) throw new IllegalArgumentException("no stations to write");
        if (times.isEmpty()) throw new IllegalArgumentException("no times to write");
        if (values.size() != fields.size()) throw new IllegalArgumentException(values.size() + " value arrays for " + fields.size() + " fields");
        int ns = stations.size(), nt = times.size();
        int strlen = 1;
        for (Station s : stations) strlen = Math.max(strlen, s.name().getBytes(StandardCharsets.UTF_8).length);
        ClassicNetcdfWriter w = new ClassicNetcdfWriter();
        globals(w, info, "timeSeries");
        w.dimension("station", ns).dimension("time", nt).dimension("name_strlen", strlen);
        w.variable("station_name", DataType.CHAR, "station", "name_strlen").text("long_name", "station name")
                .text("cf_role", "timeseries_id");
        w.variable("lon", DataType.DOUBLE, "station").text("standard_name", "longitude").text("long_name", "station longitude")
                .text("units", "degrees_east");
        w.variable("lat", DataType.DOUBLE, "station").text("standard_name", "latitude").text("long_name", "station latitude")
                .text("units", "degrees_north");
        timeVariable(w, "time");
        crs(w);
        for (FieldSpec f : fields) {
            describe(w.variable(f.name(), DataType.FLOAT, "station", "time"), f)
                    .text("coordinates", "time lat lon station_name").text("grid_mapping", "crs");
        }
        String[] names = new String[ns];
        double[] lon = new double[ns], lat = new double[ns];
        for (int s = 0; s < ns; s++) {
            names[s] = stations.get(s).name();
            lon[s] = stations.get(s).lonDeg();
            lat[s] = stations.get(s).latDeg();
        }
        AtomicWrite.toFile(target, tmp -> {
            try (ClassicNetcdfWriter.Output out = w.open(tmp)) {
                out.writeStrings("station_name", names);
                out.write("lon", lon);
                out.write("lat", lat);
                out.write("time", seconds(times));
                for (int f = 0; f < fields.size(); f++) {
                    double[][] v = values.get(f);
                    double[] flat = new double[ns * nt];
                    for (int s = 0; s < ns; s++) {
                        if (v[s].length != nt) throw new IllegalArgumentException("field '" + fields.get(f).name()
                                + "', station " + s + ": " + v[s].length + " values for " + nt + " times");
                        System.arraycopy(v[s], 0, flat, s * nt, nt);
                    }
                    out.write(fields.get(f).name(), flat);
                }
            }
        });
    }

    private static ClassicNetcdfWriter.VariableDef describe(ClassicNetcdfWriter.VariableDef v, FieldSpec f) {
        if (f.standardName() != null && !f.standardName().isBlank()) v.text("standard_name", f.standardName());
        v.text("long_name", f.longName()).text("units", f.units()).sameType("_FillValue", FILL);
        return v;
    }

    private static void timeVariable(ClassicNetcdfWriter w, String dim) {
        w.variable("time", DataType.DOUBLE, dim).text("standard_name", "time").text("long_name", "time")
                .text("units", "seconds since 1970-01-01 00:00:00").text("calendar", "proleptic_gregorian").text("axis", "T");
    }

    private static void crs(ClassicNetcdfWriter w) {
        w.variable("crs", DataType.INT).text("grid_mapping_name", "latitude_longitude")
                .numbers("longitude_of_prime_meridian", DataType.DOUBLE, 0.0)
                .numbers("semi_major_axis", DataType.DOUBLE, 6378137.0)
                .numbers("inverse_flattening", DataType.DOUBLE, 298.257223563)
                .text("crs_wkt", WKT_EPSG_4326).text("spatial_ref", WKT_EPSG_4326)
                .text("long_name", "WGS 84 (EPSG:4326) geographic coordinates");
    }

    private static void globals(ClassicNetcdfWriter w, GlobalInfo info, String featureType) {
        w.globalText("Conventions", "CF-1.8");
        w.globalText("title", info.title());
        w.globalText("history", info.history());
        w.globalText("source", info.source());
        if (featureType != null) w.globalText("featureType", featureType);
        info.extra().forEach(w::globalText);
    }

    private static double[] seconds(List<Instant> times) {
        double[] t = new double[times.size()];
        for (int k = 0; k < t.length; k++) {
            Instant i = times.get(k);
            t[k] = i.getEpochSecond() + i.getNano() * 1e-9;
        }
        return t;
    }
}
