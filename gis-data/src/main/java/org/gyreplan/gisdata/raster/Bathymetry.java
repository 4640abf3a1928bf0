package org.gyreplan.gisdata.raster;

import org.gyreplan.gisdata.cf.BoundingBox;
import org.gyreplan.gisdata.cf.CfAxes;
import org.gyreplan.gisdata.cf.CfDecoder;
import org.gyreplan.gisdata.cf.HorizontalSubset;
import org.gyreplan.gisdata.cf.VariableFinder;
import org.gyreplan.gisdata.cf.VariableMapping;
import org.gyreplan.gisdata.cf.VariableRole;
import org.gyreplan.gisdata.netcdf.NetcdfDataset;
import org.gyreplan.gisdata.netcdf.NetcdfFormatException;
import org.gyreplan.gisdata.netcdf.Variable;
import org.gyreplan.gisdata.units.UnitConversions;
import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

/**
 * Water depth from a bathymetry/topography file, on a target grid.
 *
 * <pre>
 *   source: z (m, positive up: surface altitude, e.g. ETOPO "ROSE")  or  d (m, positive down: sea-floor depth)
 *   depth  = −z  where z &lt; 0,  NaN where z ≥ 0 (land)         (or d where d &gt; 0, NaN elsewhere)
 * </pre>
 *
 * <p>Sources: netCDF (classic or netCDF-4) with a variable found as {@link VariableRole#SEA_FLOOR_DEPTH}
 * (standard_name sea_floor_depth_below_geoid, ...; positive down unless {@code positive = "up"}) or
 * {@link VariableRole#ALTITUDE} (standard_name altitude, ..., or names such as ROSE, elevation, z; positive up
 * unless {@code positive = "down"}); or a GeoTIFF read by {@link GeoTiffReader}, whose sign the caller states
 * (GeoTIFF carries no sign convention; elevation rasters are positive up).
 *
 * <p>Regridding onto the target {@link LonLatGrid}:
 * <ul>
 *   <li>{@link Method#AREA_AVERAGE}: the source cells whose centres fall in a target cell are counted; the target
 *       cell is water when at least half of them are water, with the mean depth of its water cells; when no
 *       source centre falls in the cell (source coarser than target), bilinear is used for that cell.</li>
 *   <li>{@link Method#BILINEAR}: bilinear interpolation of the signed elevation at the target cell centre
 *       (land included, so coastlines are not pushed landward), then the depth rule above.</li>
 * </ul>
 * The result's mask is not applied to the grid; callers decide the land mask (e.g. depth NaN → land).
 */
public final class Bathymetry {
    private Bathymetry() {}

    /** Regridding method. */
    public enum Method { AREA_AVERAGE, BILINEAR }

    /** Sign convention of the source values. */
    public enum Sign {
        /** netCDF: from the variable's role and {@code positive} attribute; GeoTIFF: positive up. */
        AUTO,
        /** Values are heights, positive up (negative at sea). */
        ALTITUDE_UP,
        /** Values are depths, positive down. */
        DEPTH_DOWN
    }

    /**
     * Water depth (m, positive down, NaN on land) on the target grid.
     *
     * @param file    netCDF or GeoTIFF file
     * @param target  target grid (its mask is ignored)
     * @param method  regridding method
     * @param mapping explicit variable choice for netCDF ({@link VariableRole#ALTITUDE} or
     *                {@link VariableRole#SEA_FLOOR_DEPTH}), or {@link VariableMapping#automatic()}
     * @param sign    sign convention of the source values
     */
    public static ScalarField depthOnGrid(Path file, LonLatGrid target, Method method, VariableMapping mapping, Sign sign)
            throws IOException {
        // the source box: the target's edges plus a margin of a couple of degrees for interpolation
        double margin = Math.max(target.dLonDeg(), target.dLatDeg()) + 1.0;
        double west = target.westDeg() - margin, east = target.eastDeg() + margin;
        if (east - west > 360) { west = target.westDeg(); east = west + 360; }
        BoundingBox box = new BoundingBox(west, east, Math.max(-90, target.southDeg() - margin),
                Math.min(90, target.northDeg() + margin));
        ScalarField elevation = elevation(file, box, mapping, sign);
        return regrid(elevation, target, method);
    }

    /**
     * Signed elevation (m, positive up) over a box on the source grid (latitude ascending).
     */
    public static ScalarField elevation(Path file, BoundingBox box, VariableMapping mapping, Sign sign) throws IOException {
        if (isTiff(file)) {
            GeoTiffReader.Raster r = GeoTiffReader.read(file);
            double[] lon = new double[r.width()], lat = new double[r.height()];
            for (int i = 0; i < lon.length; i++) lon[i] = r.westDeg() + (i + 0.5) * r.dLonDeg();
            for (int j = 0; j < lat.length; j++) lat[j] = r.northDeg() - (j + 0.5) * r.dLatDeg();
            HorizontalSubset sub = HorizontalSubset.of(file, "x", lon, "y", lat, box, PhysicalConstants.DEFAULT.earthRadius());
            double[] out = new double[sub.grid().size()];
            sub.read(new ArrayVariable("band1", r.values(), r.height(), r.width()), 1, 0, new int[2], out, null);
            if (sign == Sign.DEPTH_DOWN) for (int k = 0; k < out.length; k++) out[k] = -out[k];
            return new ScalarField(sub.grid(), out, "altitude", "m", "surface altitude, positive up (from GeoTIFF " + file.getFileName() + ")");
        }
        try (NetcdfDataset nc = NetcdfDataset.open(file)) {
            VariableFinder.Match m = VariableFinder.find(nc, VariableRole.SEA_FLOOR_DEPTH, mapping);
            boolean down = true;
            if (m == null || (mapping.get(VariableRole.SEA_FLOOR_DEPTH) == null && mapping.get(VariableRole.ALTITUDE) != null)) {
                m = VariableFinder.find(nc, VariableRole.ALTITUDE, mapping);
                down = false;
            }
            if (m == null) {
                throw new NetcdfFormatException(file, "no bathymetry or topography variable found: expected standard_name "
                        + "sea_floor_depth_below_geoid or altitude (or a variable named depth, elevation, z, ROSE ...); "
                        + "the file has: " + VariableFinder.listing(nc));
            }
            Variable v = m.variable();
            String positive = v.textAttribute("positive");
            if (positive != null) down = positive.trim().toLowerCase(Locale.ROOT).equals("down");
            if (sign == Sign.ALTITUDE_UP) down = false;
            if (sign == Sign.DEPTH_DOWN) down = true;
            String units = v.textAttribute("units");
            double factor = units == null || units.isBlank() ? 1.0
                    : UnitConversions.factorToSI(UnitConversions.Quantity.LENGTH, units, "variable '" + v.name() + "' in " + file);
            int[] ax = CfAxes.require(nc, v);
            Variable lonV = CfAxes.coordinate(nc, v.dimensionNames().get(ax[0]));
            Variable latV = CfAxes.coordinate(nc, v.dimensionNames().get(ax[1]));
            HorizontalSubset sub = HorizontalSubset.of(file, lonV.name(), lonV.readAll(), latV.name(), latV.readAll(), box,
                    PhysicalConstants.DEFAULT.earthRadius());
            double[] out = new double[sub.grid().size()];
            sub.read(v, ax[0], ax[1], new int[v.rank()], out, null);
            new CfDecoder(v, down ? -factor : factor).decodeInPlace(out, 0, out.length);
            return new ScalarField(sub.grid(), out, "altitude", "m",
                    "surface altitude, positive up (from " + v.name() + " in " + file.getFileName() + ")");
        }
    }

    /** Regrids a signed elevation field (m, positive up) to water depth (m, positive down, NaN on land) on the target. */
    public static ScalarField regrid(ScalarField elevation, LonLatGrid target, Method method) {
        int n = target.size();
        double[] depth = new double[n];
        if (method == Method.BILINEAR) {
            for (int j = 0; j < target.ny(); j++) {
                for (int i = 0; i < target.nx(); i++) {
                    depth[target.index(i, j)] = toDepth(elevation.interpolate(target.lonDeg(i), target.latDeg(j)));
                }
            }
        } else {
            double[] sum = new double[n];
            int[] water = new int[n], total = new int[n];
            LonLatGrid s = elevation.grid();
            double[] z = elevation.values();
            for (int j = 0; j < s.ny(); j++) {
                double lat = s.latDeg(j);
                for (int i = 0; i < s.nx(); i++) {
                    double zz = z[s.index(i, j)];
                    if (Double.isNaN(zz)) continue;
                    int k = target.cellAt(s.lonDeg(i), lat);
                    if (k < 0) continue;
                    total[k]++;
                    if (zz < 0) { water[k]++; sum[k] += -zz; }
                }
            }
            for (int j = 0; j < target.ny(); j++) {
                for (int i = 0; i < target.nx(); i++) {
                    int k = target.index(i, j);
                    if (total[k] == 0) depth[k] = toDepth(elevation.interpolate(target.lonDeg(i), target.latDeg(j)));
                    else depth[k] = 2 * water[k] >= total[k] ? sum[k] / water[k] : Double.NaN;
                }
            }
        }
        return new ScalarField(target, depth, "sea_floor_depth_below_geoid", "m",
                "water depth, positive down; NaN on land (" + (method == Method.BILINEAR ? "bilinear" : "area average") + ")");
    }

    private static double toDepth(double z) { return z < 0 ? -z : Double.NaN; }

    private static boolean isTiff(Path f) throws IOException {
        try (InputStream in = Files.newInputStream(f)) {
            byte[] m = in.readNBytes(4);
            return m.length == 4 && ((m[0] == 'I' && m[1] == 'I' && m[2] == 42 && m[3] == 0)
                    || (m[0] == 'M' && m[1] == 'M' && m[2] == 0 && m[3] == 42)
                    || (m[0] == 'I' && m[1] == 'I' && m[2] == 43) || (m[0] == 'M' && m[1] == 'M' && m[3] == 43));
        }
    }
}
