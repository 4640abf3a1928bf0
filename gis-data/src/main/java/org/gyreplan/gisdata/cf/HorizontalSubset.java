package org.gyreplan.gisdata.cf;

import org.gyreplan.gisdata.netcdf.NetcdfFormatException;
import org.gyreplan.gisdata.netcdf.Variable;
import org.gyreplan.solver.grid.LonLatGrid;

import java.io.IOException;
import java.nio.file.Path;

/**
 * The part of a regular longitude–latitude source grid that overlaps a {@link BoundingBox}, as a
 * {@link LonLatGrid} with latitude ascending and longitudes continuous, plus the mapping from each output
 * column/row to a source column/row.
 *
 * <ul>
 *   <li>Longitudes may be 0…360 or −180…180; for a global axis (n·Δλ = 360°) the box may start anywhere and
 *       cross the 0° or 180° seam (columns wrap around); for a regional axis the box is shifted by ±360° to the
 *       position of most overlap and clipped to the axis.</li>
 *   <li>Latitudes may ascend or descend; rows are flipped so that output row 0 is the southernmost.</li>
 *   <li>A cell is selected when it overlaps the box (cell edges half a spacing around the centre).</li>
 *   <li>A row centred on a pole (e.g. −90 on a 2.5° axis) is dropped, because its cell would extend past the pole.</li>
 *   <li>Both axes must be evenly spaced within 0.1 % of the spacing (else an error names the axis).</li>
 * </ul>
 */
public final class HorizontalSubset {
    private final LonLatGrid grid;
    private final int[] srcCol;    // per output column i
    private final int[] srcRow;    // per output row j
    private final int colStart, colCount, rowStart, rowCount; // block of source indices to read

    private HorizontalSubset(LonLatGrid grid, int[] srcCol, int[] srcRow, int nlon) {
        this.grid = grid;
        this.srcCol = srcCol;
        this.srcRow = srcRow;
        int cmin = Integer.MAX_VALUE, cmax = -1;
        for (int c : srcCol) { cmin = Math.min(cmin, c); cmax = Math.max(cmax, c); }
        boolean contiguous = cmax - cmin + 1 == srcCol.length;
        if (!contiguous || 2L * srcCol.length >= nlon) { // wrapped or wide: read whole rows (one contiguous run)
            cmin = 0;
            cmax = nlon - 1;
        }
        this.colStart = cmin;
        this.colCount = cmax - cmin + 1;
        int rmin = Integer.MAX_VALUE, rmax = -1;
        for (int r : srcRow) { rmin = Math.min(rmin, r); rmax = Math.max(rmax, r); }
        this.rowStart = rmin;
        this.rowCount = rmax - rmin + 1;
    }

    /** Output grid (all ocean; latitude ascending). */
    public LonLatGrid grid() { return grid; }
    /** Source column of output column i. */
    public int sourceColumn(int i) { return srcCol[i]; }
    /** Source row of output row j. */
    public int sourceRow(int j) { return srcRow[j]; }

    /**
     * Computes the subset.
     *
     * @param file   file (for error messages)
     * @param lon    longitude coordinate values, degrees east
     * @param lat    latitude coordinate values, degrees north
     * @param box    box to select, or {@code null} for the whole grid
     * @param radius sphere radius for the output grid, m
     */
    public static HorizontalSubset of(Path file, String lonName, double[] lon, String latName, double[] lat,
                                      BoundingBox box, double radius) throws NetcdfFormatException {
        double dLon = spacing(file, lonName, lon);
        double dLatSigned = spacing(file, latName, lat);
        if (dLon <= 0) {
            throw new NetcdfFormatException(file, "longitude axis '" + lonName + "' decreases; expected increasing longitudes");
        }
        int nlon = lon.length, nlat = lat.length;
        boolean global = Math.abs(nlon * dLon - 360) < 1e-3 * dLon;
        // ---- columns
        int[] cols;
        double lonOut0;
        if (global) {
            double west = box == null ? lon[0] - dLon / 2 : box.westDeg();
            double east = box == null ? west + 360 : box.eastDeg();
            long k0 = (long) Math.floor((west - lon[0]) / dLon + 0.5 + 1e-9); // first centre whose cell overlaps
            if (lon[0] + k0 * dLon + dLon / 2 <= west + 1e-9 * dLon) k0++;
            long k1 = (long) Math.ceil((east - lon[0]) / dLon - 0.5 - 1e-9);
            if (lon[0] + k1 * dLon - dLon / 2 >= east - 1e-9 * dLon) k1--;
            int n = (int) Math.min(nlon, k1 - k0 + 1);
            if (n < 1) throw new NetcdfFormatException(file, "the box " + box + " selects no longitude of axis '" + lonName + "'");
            cols = new int[n];
            for (int i = 0; i < n; i++) cols[i] = (int) Math.floorMod(k0 + i, (long) nlon);
            lonOut0 = lon[0] + k0 * dLon;
        } else {
            double axisW = lon[0] - dLon / 2, axisE = lon[nlon - 1] + dLon / 2;
            double west = box == null ? axisW : box.westDeg();
            double east = box == null ? axisE : box.eastDeg();
            // shift the box by a multiple of 360° to the position of most overlap
            double best = -1, shift = 0;
            for (int s = -2; s <= 2; s++) {
                double ov = Math.min(east + 360 * s, axisE) - Math.max(west + 360 * s, axisW);
                if (ov > best + 1e-9) { best = ov; shift = 360.0 * s; }
            }
            west += shift;
            east += shift;
            int i0 = (int) Math.max(0, Math.ceil((west - lon[0]) / dLon - 0.5 - 1e-9));
            if (lon[0] + i0 * dLon + dLon / 2 <= west + 1e-9 * dLon) i0++;
            int i1 = (int) Math.min(nlon - 1, Math.floor((east - lon[0]) / dLon + 0.5 + 1e-9));
            if (lon[0] + i1 * dLon - dLon / 2 >= east - 1e-9 * dLon) i1--;
            if (best <= 0 || i1 < i0) {
                throw new NetcdfFormatException(file, "the box " + box + " does not overlap the longitudes of axis '"
                        + lonName + "' (" + lon[0] + "…" + lon[nlon - 1] + ")");
            }
            cols = new int[i1 - i0 + 1];
            for (int i = 0; i < cols.length; i++) cols[i] = i0 + i;
            lonOut0 = lon[i0] - shift;
        }
        // ---- rows, in ascending latitude
        double dLat = Math.abs(dLatSigned);
        boolean descending = dLatSigned < 0;
        double south = box == null ? -90 : box.southDeg();
        double north = box == null ? 90 : box.northDeg();
        int[] tmp = new int[nlat];
        int n = 0;
        double firstLat = Double.NaN;
        for (int a = 0; a < nlat; a++) {
            int src = descending ? nlat - 1 - a : a;
            double c = lat[src];
            if (c - dLat / 2 < -90 - 1e-6 * dLat || c + dLat / 2 > 90 + 1e-6 * dLat) continue; // pole-centred row
            if (c + dLat / 2 <= south + 1e-9 * dLat || c - dLat / 2 >= north - 1e-9 * dLat) continue;
            if (n == 0) firstLat = c;
            tmp[n++] = src;
        }
        if (n == 0) {
            throw new NetcdfFormatException(file, "the box " + box + " selects no latitude of axis '" + latName
                    + "' (" + lat[0] + "…" + lat[nlat - 1] + ")");
        }
        int[] rows = java.util.Arrays.copyOf(tmp, n);
        LonLatGrid g = new LonLatGrid(cols.length, rows.length, lonOut0, firstLat, dLon, dLat, radius, null);
        return new HorizontalSubset(g, cols, rows, nlon);
    }

    /** The mean spacing of an axis, checked to be even within 0.1 % (signed: negative for a decreasing axis). */
    static double spacing(Path file, String name, double[] v) throws NetcdfFormatException {
        if (v.length < 2) throw new NetcdfFormatException(file, "axis '" + name + "' has fewer than 2 values; cannot infer its spacing");
        double d = (v[v.length - 1] - v[0]) / (v.length - 1);
        if (!(Math.abs(d) > 0)) throw new NetcdfFormatException(file, "axis '" + name + "' has zero spacing");
        for (int i = 0; i < v.length; i++) {
            if (Math.abs(v[i] - v[0] - i * d) > 1e-3 * Math.abs(d)) {
                throw new NetcdfFormatException(file, "axis '" + name + "' is not evenly spaced (value " + i + " is "
                        + v[i] + ", expected " + (v[0] + i * d) + "); only regular grids are supported");
            }
        }
        return d;
    }

    /**
     * Reads one horizontal slice of a variable into {@code out} (length = grid size, row-major, latitude ascending).
     *
     * @param v         variable with longitude and latitude dimensions (any order) and possibly others
     * @param lonDim    position of the longitude dimension in {@code v}
     * @param latDim    position of the latitude dimension
     * @param fixed     index for every other dimension (entries at lonDim/latDim are ignored)
     * @param block     reusable buffer (may be null or too short; the used one is returned)
     */
    public double[] read(Variable v, int lonDim, int latDim, int[] fixed, double[] out, double[] block) throws IOException {
        int rank = v.rank();
        int[] start = fixed.clone(), count = new int[rank];
        java.util.Arrays.fill(count, 1);
        start[lonDim] = colStart;
        count[lonDim] = colCount;
        start[latDim] = rowStart;
        count[latDim] = rowCount;
        int n = colCount * rowCount;
        if (block == null || block.length < n) block = new double[n];
        v.read(start, count, block, 0);
        // strides of the block in its own (dimension) order
        int strideLon = 1, strideLat = 1;
        if (lonDim > latDim) strideLat = colCount; else strideLon = rowCount;
        int nx = grid.nx(), ny = grid.ny();
        int[] colOff = new int[nx];
        for (int i = 0; i < nx; i++) colOff[i] = (srcCol[i] - colStart) * strideLon;
        if (strideLon == 1) {
            // rows are contiguous in the block: copy runs of consecutive source columns
            for (int j = 0; j < ny; j++) {
                int rowOff = (srcRow[j] - rowStart) * strideLat;
                int o = j * nx;
                int i = 0;
                while (i < nx) {
                    int e = i + 1;
                    while (e < nx && colOff[e] == colOff[e - 1] + 1) e++;
                    System.arraycopy(block, rowOff + colOff[i], out, o + i, e - i);
                    i = e;
                }
            }
            return block;
        }
        for (int j = 0; j < ny; j++) {
            int rowOff = (srcRow[j] - rowStart) * strideLat;
            int o = j * nx;
            for (int i = 0; i < nx; i++) out[o + i] = block[rowOff + colOff[i]];
        }
        return block;
    }
}
