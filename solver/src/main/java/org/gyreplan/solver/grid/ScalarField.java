package org.gyreplan.solver.grid;

import java.util.Objects;

/**
 * A scalar field on a {@link LonLatGrid}: flat values {@code [j * nx + i]}, {@code NaN} on land or where undefined,
 * with a CF-style variable name, a unit string (UDUNITS spelling, e.g. {@code "Pa"}, {@code "m s-1"}) and a long name
 * that states the sign convention.
 *
 * <p>The values array is owned by the field; {@link #values()} returns it without copying for speed, and callers
 * must not modify it unless they created the field.
 */
public record ScalarField(LonLatGrid grid, double[] values, String name, String units, String longName) {

    public ScalarField {
        Objects.requireNonNull(grid, "grid");
        Objects.requireNonNull(values, "values");
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(units, "units");
        if (longName == null) longName = name;
        if (values.length != grid.size()) {
            throw new IllegalArgumentException("field '" + name + "' has " + values.length
                    + " values, grid has " + grid.size());
        }
    }

    /** A field filled with NaN. */
    public static ScalarField empty(LonLatGrid grid, String name, String units, String longName) {
        double[] v = new double[grid.size()];
        java.util.Arrays.fill(v, Double.NaN);
        return new ScalarField(grid, v, name, units, longName);
    }

    /** Value at cell (i, j). */
    public double at(int i, int j) { return values[grid.index(i, j)]; }

    /** Mean over finite cells weighted by cell area; NaN if none. */
    public double areaMean() {
        double s = 0, a = 0;
        for (int j = 0; j < grid.ny(); j++) {
            double w = grid.cellArea(j);
            for (int i = 0; i < grid.nx(); i++) {
                double v = values[grid.index(i, j)];
                if (Double.isFinite(v)) { s += w * v; a += w; }
            }
        }
        return a > 0 ? s / a : Double.NaN;
    }

    /** Smallest and largest finite value, {NaN, NaN} if none. */
    public double[] range() {
        double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY;
        for (double v : values) if (Double.isFinite(v)) { lo = Math.min(lo, v); hi = Math.max(hi, v); }
        return lo <= hi ? new double[] {lo, hi} : new double[] {Double.NaN, Double.NaN};
    }

    /** Bilinear interpolation at (lon, lat) using finite neighbours only (weights renormalised); NaN outside. */
    public double interpolate(double lonDeg, double latDeg) {
        double x = grid.columnOf(lonDeg), y = grid.rowOf(latDeg);
        int i0 = (int) Math.floor(x), j0 = (int) Math.floor(y);
        double fx = x - i0, fy = y - j0;
        double s = 0, w = 0;
        for (int dj = 0; dj <= 1; dj++) {
            for (int di = 0; di <= 1; di++) {
                int i = i0 + di, j = j0 + dj;
                if (i < 0 || i >= grid.nx() || j < 0 || j >= grid.ny()) continue;
                double v = values[grid.index(i, j)];
                if (!Double.isFinite(v)) continue;
                double wt = (di == 0 ? 1 - fx : fx) * (dj == 0 ? 1 - fy : fy);
                s += wt * v;
                w += wt;
            }
        }
        return w > 1e-12 ? s / w : Double.NaN;
    }

    /** The same values under a new name, unit and long name. */
    public ScalarField renamed(String newName, String newUnits, String newLongName) {
        return new ScalarField(grid, values, newName, newUnits, newLongName);
    }
}
