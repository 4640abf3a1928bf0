package org.gyreplan.gisdata.cf;

import org.gyreplan.gisdata.netcdf.Attribute;
import org.gyreplan.gisdata.netcdf.Dimension;
import org.gyreplan.gisdata.netcdf.NetcdfDataset;
import org.gyreplan.gisdata.netcdf.Variable;
import org.gyreplan.gisdata.units.UnitConversions;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Describes a netCDF file the way Gyreplan would read it: format, dimensions, variables (with units and standard
 * names), and for each variable how it would be interpreted (which is the eastward wind, the sea-level pressure,
 * an axis, ...), the horizontal grid (extent, resolution, latitude order) and the time span with its calendar.
 * Used by the command-line {@code inspect} command.
 *
 * <pre>{@code
 * System.out.println(FileInspector.describe(path).toText());
 * }</pre>
 */
public final class FileInspector {
    private FileInspector() {}

    /** One variable of the file and Gyreplan's reading of it. */
    public record VariableInfo(String name, String type, List<String> dimensions, String units, String standardName,
                               String longName, String interpretation) { }

    /**
     * The horizontal grid of the first recognised gridded variable.
     *
     * @param westDeg  western edge (degrees east), edges are half a spacing beyond the outer centres
     * @param eastDeg  eastern edge
     * @param southDeg southern edge
     * @param northDeg northern edge
     * @param dLonDeg  longitude spacing, degrees
     * @param dLatDeg  latitude spacing, degrees (positive)
     */
    public record GridInfo(String lonVariable, String latVariable, int nx, int ny, double westDeg, double eastDeg,
                           double southDeg, double northDeg, double dLonDeg, double dLatDeg, boolean latitudeDescending,
                           boolean global) { }

    /** The time axis: number of steps, first and last instant, calendar and units as in the file. */
    public record TimeInfo(String variable, int steps, Instant first, Instant last, String calendar, String units) { }

    /** The summary. {@code grid} and {@code time} are null when not found. */
    public record FileSummary(Path file, String format, List<Dimension> dimensions, List<VariableInfo> variables,
                              List<Attribute> globalAttributes, GridInfo grid, TimeInfo time, List<String> notes) {
        /** A plain-text description, one fact per line. */
        public String toText() {
            StringBuilder b = new StringBuilder();
            b.append("file: ").append(file).append('\n');
            b.append("format: ").append(format).append('\n');
            b.append("dimensions:\n");
            for (Dimension d : dimensions) b.append("  ").append(d).append('\n');
            b.append("variables:\n");
            for (VariableInfo v : variables) {
                b.append("  ").append(v.name()).append(" ").append(v.type().toLowerCase(Locale.ROOT)).append(v.dimensions());
                if (v.units() != null) b.append("  units: ").append(v.units());
                if (v.standardName() != null) b.append("  standard_name: ").append(v.standardName());
                if (v.longName() != null) b.append("  long_name: ").append(v.longName());
                b.append('\n').append("      → ").append(v.interpretation()).append('\n');
            }
            if (grid != null) {
                b.append(String.format(Locale.ROOT, "grid: %d × %d cells, %.4g° × %.4g°, longitude %.4f … %.4f%s, latitude %.4f … %.4f (%s in the file)%n",
                        grid.nx(), grid.ny(), grid.dLonDeg(), grid.dLatDeg(), grid.westDeg(), grid.eastDeg(),
                        grid.global() ? " (global)" : "", grid.southDeg(), grid.northDeg(),
                        grid.latitudeDescending() ? "descending" : "ascending"));
            } else {
                b.append("grid: no regular longitude/latitude grid recognised\n");
            }
            if (time != null) {
                b.append("time: ").append(time.steps()).append(" steps, ").append(time.first()).append(" … ")
                        .append(time.last()).append(", calendar ").append(time.calendar()).append(" (units '")
                        .append(time.units()).append("')\n");
            } else {
                b.append("time: no time axis\n");
            }
            if (!globalAttributes.isEmpty()) {
                b.append("global attributes:\n");
                for (Attribute a : globalAttributes) b.append("  ").append(a).append('\n');
            }
            for (String n : notes) b.append("note: ").append(n).append('\n');
            return b.toString();
        }
    }

    /** Describes a netCDF file (classic, 64-bit offset or netCDF-4) or a single-band GeoTIFF. */
    public static FileSummary describe(Path file) throws IOException {
        if (isTiff(file)) return describeTiff(file);
        try (NetcdfDataset nc = NetcdfDataset.open(file)) {
            List<String> notes = new ArrayList<>();
            Map<String, String> roleOf = new LinkedHashMap<>();
            for (VariableRole r : VariableRole.values()) {
                VariableFinder.Match m = VariableFinder.find(nc, r, VariableMapping.automatic());
                if (m == null || roleOf.containsKey(m.variable().name())) continue;
                String units = m.variable().textAttribute("units");
                String conv;
                if (units == null || units.isBlank()) {
                    conv = r.quantity() == UnitConversions.Quantity.LENGTH ? "no units: read as m" : "no units: cannot be used without units";
                } else if (UnitConversions.isKnown(r.quantity(), units)) {
                    double f = UnitConversions.factorToSI(r.quantity(), units);
                    conv = f == 1 ? "already " + r.quantity().siUnit() : "× " + f + " → " + r.quantity().siUnit();
                } else {
                    conv = "UNKNOWN units '" + units + "' for " + r.description();
                }
                roleOf.put(m.variable().name(), r.description() + " (by " + m.evidence().name().toLowerCase(Locale.ROOT)
                        .replace('_', ' ') + "; " + conv + ")");
            }
            List<VariableInfo> vars = new ArrayList<>();
            GridInfo grid = null;
            TimeInfo time = null;
            for (Variable v : nc.variables()) {
                String interp = roleOf.get(v.name());
                if (interp == null) {
                    if (CfAxes.isLongitude(v)) interp = "longitude axis";
                    else if (CfAxes.isLatitude(v)) interp = "latitude axis";
                    else if (CfAxes.isTime(v)) interp = "time axis";
                    else interp = "not used by Gyreplan";
                }
                vars.add(new VariableInfo(v.name(), v.dataType().name(), v.dimensionNames(), v.textAttribute("units"),
                        v.textAttribute("standard_name"), v.textAttribute("long_name"), interp));
                if (grid == null && v.rank() >= 2 && v.dataType().isNumeric()) {
                    int[] ax = CfAxes.find(nc, v);
                    if (ax[0] >= 0 && ax[1] >= 0) {
                        Variable lon = CfAxes.coordinate(nc, v.dimensionNames().get(ax[0]));
                        Variable lat = CfAxes.coordinate(nc, v.dimensionNames().get(ax[1]));
                        try {
                            double[] x = lon.readAll(), y = lat.readAll();
                            double dx = HorizontalSubset.spacing(file, lon.name(), x);
                            double dy = HorizontalSubset.spacing(file, lat.name(), y);
                            double ady = Math.abs(dy);
                            double s = Math.min(y[0], y[y.length - 1]), n = Math.max(y[0], y[y.length - 1]);
                            grid = new GridInfo(lon.name(), lat.name(), x.length, y.length, x[0] - dx / 2,
                                    x[x.length - 1] + dx / 2, Math.max(-90, s - ady / 2), Math.min(90, n + ady / 2), dx, ady,
                                    dy < 0, Math.abs(x.length * dx - 360) < 1e-3 * Math.abs(dx));
                        } catch (IOException e) {
                            notes.add(e.getMessage());
                        }
                        if (ax[2] >= 0 && time == null) {
                            Variable t = CfAxes.coordinate(nc, v.dimensionNames().get(ax[2]));
                            try {
                                CfTime ct = CfTime.parse(t.textAttribute("units"), t.textAttribute("calendar"));
                                double[] tv = t.readAll();
                                if (tv.length > 0) {
                                    time = new TimeInfo(t.name(), tv.length, ct.toInstant(tv[0]), ct.toInstant(tv[tv.length - 1]),
                                            ct.calendar().cfName() + (t.textAttribute("calendar") == null ? " (default)" : ""),
                                            t.textAttribute("units"));
                                    if (!ct.calendar().isReal()) {
                                        notes.add("calendar " + ct.calendar().cfName() + " is mapped to real dates by the "
                                                + "fraction of the year (360_day, all_leap) or the same date (noleap)");
                                    }
                                }
                            } catch (IllegalArgumentException e) {
                                notes.add("time axis '" + t.name() + "' cannot be decoded: " + e.getMessage());
                            }
                        }
                    }
                }
            }
            if (grid != null && grid.latitudeDescending()) notes.add("latitude is stored north to south; Gyreplan flips it to ascending");
            return new FileSummary(file, nc.format().label(), nc.dimensions(), vars, nc.globalAttributes(), grid, time, notes);
        }
    }

    private static boolean isTiff(Path f) throws IOException {
        try (java.io.InputStream in = java.nio.file.Files.newInputStream(f)) {
            byte[] m = in.readNBytes(4);
            return m.length == 4 && ((m[0] == 'I' && m[1] == 'I' && m[2] == 42 && m[3] == 0)
                    || (m[0] == 'M' && m[1] == 'M' && m[2] == 0 && m[3] == 42));
        }
    }

    private static FileSummary describeTiff(Path file) throws IOException {
        org.gyreplan.gisdata.raster.GeoTiffReader.Raster r = org.gyreplan.gisdata.raster.GeoTiffReader.read(file);
        GridInfo g = new GridInfo("(GeoTIFF columns)", "(GeoTIFF rows)", r.width(), r.height(), r.westDeg(),
                r.westDeg() + r.width() * r.dLonDeg(), r.northDeg() - r.height() * r.dLatDeg(), r.northDeg(),
                r.dLonDeg(), r.dLatDeg(), true, Math.abs(r.width() * r.dLonDeg() - 360) < 1e-6);
        List<Dimension> dims = List.of(new Dimension("rows", r.height(), false), new Dimension("columns", r.width(), false));
        VariableInfo band = new VariableInfo("band 1", "raster", List.of("rows", "columns"), null, null, null,
                "bathymetry/topography when used as such (sign stated by the user; elevation rasters are positive up)");
        List<String> notes = new ArrayList<>();
        notes.add(r.epsg() == 4326 ? "CRS EPSG:4326 (WGS 84)" : r.epsg() == 0 ? "no GeographicTypeGeoKey: assumed WGS 84 longitude/latitude"
                : "geographic CRS EPSG:" + r.epsg() + " (read as longitude/latitude)");
        return new FileSummary(file, "GeoTIFF", dims, List.of(band), List.of(), g, null, notes);
    }
}
