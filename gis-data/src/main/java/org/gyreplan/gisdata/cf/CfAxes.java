package org.gyreplan.gisdata.cf;

import org.gyreplan.gisdata.netcdf.NetcdfDataset;
import org.gyreplan.gisdata.netcdf.NetcdfFormatException;
import org.gyreplan.gisdata.netcdf.Variable;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * Recognises longitude, latitude and time coordinate variables (CF Conventions 1.8, §4.1–4.4), in this order of
 * evidence: {@code standard_name}; {@code units} (degrees_east / degrees_north and their CF spellings, or
 * "&lt;unit&gt; since &lt;date&gt;"); the {@code axis} attribute (X/Y/T); common names (lon, longitude, lat, time, ...).
 * Files without CF attributes whose axes are known only by units (e.g. {@code FNOCX:units = "degrees_east"}) are
 * recognised by the units rule.
 */
public final class CfAxes {
    private CfAxes() {}

    private static final Set<String> LON_UNITS = Set.of("degrees_east", "degree_east", "degree_e", "degrees_e",
            "degreee", "degreese");
    private static final Set<String> LAT_UNITS = Set.of("degrees_north", "degree_north", "degree_n", "degrees_n",
            "degreen", "degreesn");
    private static final Set<String> LON_NAMES = Set.of("lon", "longitude", "long", "x", "nav_lon", "longitudes", "lons");
    private static final Set<String> LAT_NAMES = Set.of("lat", "latitude", "y", "nav_lat", "latitudes", "lats");
    private static final Set<String> TIME_NAMES = Set.of("time", "t", "times", "valid_time", "date");

    /** Kinds of coordinate axis. */
    public enum Kind { LONGITUDE, LATITUDE, TIME }

    private static String lower(String s) { return s == null ? "" : s.trim().toLowerCase(Locale.ROOT); }

    /** Whether a 1-D variable is a longitude coordinate. */
    public static boolean isLongitude(Variable v) { return is(v, Kind.LONGITUDE); }
    /** Whether a 1-D variable is a latitude coordinate. */
    public static boolean isLatitude(Variable v) { return is(v, Kind.LATITUDE); }
    /** Whether a 1-D variable is a time coordinate. */
    public static boolean isTime(Variable v) { return is(v, Kind.TIME); }

    /** Whether a 1-D variable is a coordinate of that kind. */
    public static boolean is(Variable v, Kind kind) {
        if (v == null || v.rank() != 1 || !v.dataType().isNumeric()) return false;
        String sn = lower(v.textAttribute("standard_name"));
        String units = lower(v.textAttribute("units")).replace(" ", "");
        String axis = lower(v.textAttribute("axis"));
        String name = lower(v.name());
        return switch (kind) {
            case LONGITUDE -> sn.equals("longitude") || sn.equals("grid_longitude") || LON_UNITS.contains(units)
                    || (axis.equals("x") && units.startsWith("degree"))
                    || (LON_NAMES.contains(name) && (units.isEmpty() || units.startsWith("degree")));
            case LATITUDE -> sn.equals("latitude") || sn.equals("grid_latitude") || LAT_UNITS.contains(units)
                    || (axis.equals("y") && units.startsWith("degree"))
                    || (LAT_NAMES.contains(name) && (units.isEmpty() || units.startsWith("degree")));
            case TIME -> sn.equals("time") || units.contains("since") || (axis.equals("t") && !units.isEmpty())
                    || (TIME_NAMES.contains(name) && units.contains("since"));
        };
    }

    /** The coordinate variable of a dimension (a 1-D variable of the same name), or {@code null}. */
    public static Variable coordinate(NetcdfDataset nc, String dimName) {
        Variable v = nc.findVariable(dimName);
        return v != null && v.rank() == 1 && v.dimensionNames().get(0).equals(dimName) ? v : null;
    }

    /**
     * The positions of the longitude, latitude and time dimensions of a data variable: {lonDim, latDim, timeDim},
     * −1 where absent. Each dimension is identified through its coordinate variable.
     */
    public static int[] find(NetcdfDataset nc, Variable data) {
        int lon = -1, lat = -1, time = -1;
        List<String> dims = data.dimensionNames();
        for (int d = 0; d < dims.size(); d++) {
            Variable c = coordinate(nc, dims.get(d));
            if (c == null) continue;
            if (lon < 0 && isLongitude(c)) lon = d;
            else if (lat < 0 && isLatitude(c)) lat = d;
            else if (time < 0 && isTime(c)) time = d;
        }
        return new int[] {lon, lat, time};
    }

    /** As {@link #find}, but requires longitude and latitude; the error names the file, the variable and its dimensions. */
    public static int[] require(NetcdfDataset nc, Variable data) throws NetcdfFormatException {
        int[] f = find(nc, data);
        if (f[0] < 0 || f[1] < 0) {
            List<String> desc = new ArrayList<>();
            for (String d : data.dimensionNames()) {
                Variable c = coordinate(nc, d);
                desc.add(d + (c == null ? " (no coordinate variable)"
                        : " (units '" + c.textAttribute("units") + "', standard_name '" + c.textAttribute("standard_name") + "')"));
            }
            throw new NetcdfFormatException(nc.path(), "variable '" + data.name() + "': cannot find its "
                    + (f[0] < 0 ? "longitude" : "latitude") + " axis; expected a coordinate variable with "
                    + "standard_name longitude/latitude or units degrees_east/degrees_north; its dimensions are "
                    + String.join(", ", desc));
        }
        return f;
    }
}
