package org.gyreplan.solver.grid;

import org.gyreplan.solver.DegreeTrig;

import java.util.Arrays;

/**
 * A regular longitude–latitude grid of cell centres with spherical metrics and one land/ocean mask.
 *
 * <pre>
 *   λᵢ = lon0Deg + i·dLonDeg,  φⱼ = lat0Deg + j·dLatDeg        (cell centres, degrees)
 *   dx(φ) = R cos φ · Δλ,  dy = R · Δφ                          (m, Δ in radians)
 *   area(φ) = R² Δλ (sin(φ + Δφ/2) − sin(φ − Δφ/2))            (m², exact spherical cell area)
 * </pre>
 *
 * <table>
 *   <caption>Symbols</caption>
 *   <tr><td>R</td><td>sphere radius</td><td>m</td></tr>
 *   <tr><td>Δλ, Δφ</td><td>grid spacing</td><td>degrees (stored), radians in the formulas</td></tr>
 * </table>
 *
 * <p>Longitudes are continuous (no wrap inside the grid), so a basin that crosses the antimeridian
 * is described by, e.g., {@code lon0Deg = 170, nx = 40, dLonDeg = 0.5} (170°E … 189.5°, i.e. 170.5°W).
 * Instances are immutable; {@link #withOcean(boolean[])} returns a copy with another mask.
 */
public final class LonLatGrid {
    private final int nx;
    private final int ny;
    private final double lon0Deg;
    private final double lat0Deg;
    private final double dLonDeg;
    private final double dLatDeg;
    private final double radius;
    private final boolean[] ocean;
    private final double[] dxAtRow;
    private final double[] areaAtRow;

    /**
     * @param nx      number of cells eastward (≥ 1)
     * @param ny      number of cells northward (≥ 1)
     * @param lon0Deg longitude of the centre of cell i = 0, degrees east
     * @param lat0Deg latitude of the centre of row j = 0 (the southernmost), degrees north
     * @param dLonDeg spacing eastward, degrees (&gt; 0)
     * @param dLatDeg spacing northward, degrees (&gt; 0)
     * @param radius  sphere radius, m
     * @param ocean   ocean mask at cell centres ({@code true} = ocean), length nx·ny, or {@code null} for all ocean
     */
    public LonLatGrid(int nx, int ny, double lon0Deg, double lat0Deg, double dLonDeg, double dLatDeg,
                      double radius, boolean[] ocean) {
        if (nx < 1 || ny < 1) throw new IllegalArgumentException("grid size must be at least 1×1, got " + nx + "×" + ny);
        if (!(dLonDeg > 0) || !(dLatDeg > 0)) throw new IllegalArgumentException("grid spacing must be positive");
        if (!(radius > 0)) throw new IllegalArgumentException("radius must be positive, got " + radius);
        double south = lat0Deg - dLatDeg / 2, north = lat0Deg + (ny - 0.5) * dLatDeg;
        if (south < -90 - 1e-9 || north > 90 + 1e-9) {
            throw new IllegalArgumentException("grid latitudes must lie within [−90°, 90°], got " + south + "…" + north);
        }
        if (ocean != null && ocean.length != nx * ny) {
            throw new IllegalArgumentException("mask length " + ocean.length + " does not match grid " + nx + "×" + ny);
        }
        this.nx = nx;
        this.ny = ny;
        this.lon0Deg = lon0Deg;
        this.lat0Deg = lat0Deg;
        this.dLonDeg = dLonDeg;
        this.dLatDeg = dLatDeg;
        this.radius = radius;
        if (ocean == null) {
            this.ocean = new boolean[nx * ny];
            Arrays.fill(this.ocean, true);
        } else {
            this.ocean = ocean.clone();
        }
        this.dxAtRow = new double[ny];
        this.areaAtRow = new double[ny];
        double dLon = Math.toRadians(dLonDeg);
        for (int j = 0; j < ny; j++) {
            double lat = latDeg(j);
            dxAtRow[j] = radius * DegreeTrig.cosDeg(lat) * dLon;
            double top = Math.min(90.0, lat + dLatDeg / 2), bottom = Math.max(-90.0, lat - dLatDeg / 2);
            areaAtRow[j] = radius * radius * dLon * (DegreeTrig.sinDeg(top) - DegreeTrig.sinDeg(bottom));
        }
    }

    /** An all-ocean grid covering [west, east] × [south, north] (cell edges, degrees) at the given spacing. */
    public static LonLatGrid covering(double westDeg, double eastDeg, double southDeg, double northDeg,
                                      double spacingDeg, double radius) {
        int nx = (int) Math.round((eastDeg - westDeg) / spacingDeg);
        int ny = (int) Math.round((northDeg - southDeg) / spacingDeg);
        return new LonLatGrid(nx, ny, westDeg + spacingDeg / 2, southDeg + spacingDeg / 2,
                spacingDeg, spacingDeg, radius, null);
    }

    public int nx() { return nx; }
    public int ny() { return ny; }
    /** Number of cells, nx·ny. */
    public int size() { return nx * ny; }
    public double lon0Deg() { return lon0Deg; }
    public double lat0Deg() { return lat0Deg; }
    public double dLonDeg() { return dLonDeg; }
    public double dLatDeg() { return dLatDeg; }
    /** Sphere radius, m. */
    public double radius() { return radius; }

    /** Longitude of cell centre column i, degrees east (continuous, may exceed 180). */
    public double lonDeg(int i) { return lon0Deg + i * dLonDeg; }
    /** Latitude of cell centre row j, degrees north. */
    public double latDeg(int j) { return lat0Deg + j * dLatDeg; }
    /** Flat index of cell (i, j). */
    public int index(int i, int j) { return j * nx + i; }

    /** Zonal cell width at row j, m. */
    public double dx(int j) { return dxAtRow[j]; }
    /** Meridional cell height, m (the same for every row). */
    public double dy() { return radius * Math.toRadians(dLatDeg); }
    /** Cell area at row j, m². */
    public double cellArea(int j) { return areaAtRow[j]; }

    /** Whether cell (i, j) is ocean. Out-of-grid cells count as land. */
    public boolean isOcean(int i, int j) {
        return i >= 0 && i < nx && j >= 0 && j < ny && ocean[j * nx + i];
    }
    /** Whether the cell at flat index k is ocean. */
    public boolean isOcean(int k) { return ocean[k]; }
    /** A copy of the ocean mask. */
    public boolean[] oceanMask() { return ocean.clone(); }
    /** Number of ocean cells. */
    public int oceanCount() {
        int n = 0;
        for (boolean b : ocean) if (b) n++;
        return n;
    }

    /** A copy of this grid with another ocean mask. */
    public LonLatGrid withOcean(boolean[] newOcean) {
        return new LonLatGrid(nx, ny, lon0Deg, lat0Deg, dLonDeg, dLatDeg, radius, newOcean);
    }

    /** Fractional column of a longitude (cell centres at integers); the longitude is shifted by ±360° into the grid's span if needed. */
    public double columnOf(double lonDeg) {
        double x = (lonDeg - lon0Deg) / dLonDeg;
        double period = 360.0 / dLonDeg;
        while (x < -0.5 - 1e-9 && x + period <= nx - 0.5 + 1e-9) x += period;
        while (x > nx - 0.5 + 1e-9 && x - period >= -0.5 - 1e-9) x -= period;
        return x;
    }
    /** Fractional row of a latitude (cell centres at integers). */
    public double rowOf(double latDeg) { return (latDeg - lat0Deg) / dLatDeg; }

    /** Flat index of the cell containing (lon, lat), or −1 if outside the grid. */
    public int cellAt(double lonDeg, double latDeg) {
        int i = (int) Math.floor(columnOf(lonDeg) + 0.5);
        int j = (int) Math.floor(rowOf(latDeg) + 0.5);
        if (i < 0 || i >= nx || j < 0 || j >= ny) return -1;
        return index(i, j);
    }

    /** Westernmost cell edge, degrees east. */
    public double westDeg() { return lon0Deg - dLonDeg / 2; }
    /** Easternmost cell edge, degrees east (continuous). */
    public double eastDeg() { return lon0Deg + (nx - 0.5) * dLonDeg; }
    /** Southernmost cell edge, degrees north. */
    public double southDeg() { return lat0Deg - dLatDeg / 2; }
    /** Northernmost cell edge, degrees north. */
    public double northDeg() { return lat0Deg + (ny - 0.5) * dLatDeg; }

    /** Whether two grids have the same geometry (mask ignored). */
    public boolean sameGeometry(LonLatGrid o) {
        return nx == o.nx && ny == o.ny && lon0Deg == o.lon0Deg && lat0Deg == o.lat0Deg
                && dLonDeg == o.dLonDeg && dLatDeg == o.dLatDeg && radius == o.radius;
    }

    @Override
    public String toString() {
        return String.format("LonLatGrid[%d×%d, lon %.4f…%.4f, lat %.4f…%.4f, Δ %.4f°×%.4f°, ocean %d]",
                nx, ny, westDeg(), eastDeg(), southDeg(), northDeg(), dLonDeg, dLatDeg, oceanCount());
    }
}
