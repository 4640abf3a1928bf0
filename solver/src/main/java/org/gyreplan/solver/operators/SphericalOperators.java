package org.gyreplan.solver.operators;

import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;

/**
 * Curl, divergence and gradient on the sphere by second-order finite differences with the grid's metrics.
 * <pre>
 *   curl_z(u, v) = (1/(R cos φ)) [ ∂v/∂λ − ∂(u cos φ)/∂φ ]
 *   div(u, v)    = (1/(R cos φ)) [ ∂u/∂λ + ∂(v cos φ)/∂φ ]
 *   ∇p           = ( (1/(R cos φ)) ∂p/∂λ ,  (1/R) ∂p/∂φ )
 *
 *   discretely, with dxⱼ = R cos φⱼ Δλ and dy = R Δφ from the grid (so cos φⱼ₊₁/cos φⱼ = dxⱼ₊₁/dxⱼ):
 *   curl_z ≈ δᵢ v / dxⱼ − δⱼ (u·dx) / (dxⱼ dy)
 *   div    ≈ δᵢ u / dxⱼ + δⱼ (v·dx) / (dxⱼ dy)
 *   ∇p     ≈ ( δᵢ p / dxⱼ ,  δⱼ p / dy )
 * </pre>
 * <table>
 *   <caption>Symbols</caption>
 *   <tr><td>u, v</td><td>eastward and northward components</td><td>any unit X</td></tr>
 *   <tr><td>λ, φ</td><td>longitude, latitude</td><td>rad</td></tr>
 *   <tr><td>R</td><td>grid radius</td><td>m</td></tr>
 *   <tr><td>curl_z, div, ∇p</td><td>results</td><td>X m⁻¹</td></tr>
 * </table>
 *
 * <p><b>Stencil δ</b> (derivative per grid step, along i or j): a cell with a valid neighbour on both sides uses the
 * centred difference (a₊ − a₋)/2. Next to land, a missing value or the grid edge it uses the one-sided
 * second-order difference ∓(3a₀ − 4a₁ + a₂)/2 when two valid cells lie on the open side, else the first-order
 * difference ±(a₁ − a₀) with one, else no stencil exists and the result is {@code NaN}. A cell that is land or
 * whose own value is not finite gives {@code NaN}. "Valid" means ocean in the grid mask and a finite value.
 * A grid spanning exactly 360° of longitude (with at least 3 columns) is treated as periodic in i.
 *
 * <p>Sign convention: curl_z is positive counter-clockwise seen from above (cyclonic in the northern hemisphere).
 * Validity: accuracy O(Δ²) in the interior and O(Δ) next to land with the first-order fallback; the metric terms
 * are singular at the poles (cell centres never lie on them in a {@link LonLatGrid}).
 * Source: spherical-coordinate vector calculus (e.g. Vallis, Atmospheric and Oceanic Fluid Dynamics, 2017,
 * §2.2); centred differences, common practice. Verified by convergence tests on analytic fields.
 */
public final class SphericalOperators {
    private SphericalOperators() {}

    /** The last prepared grid (identity cache; {@link OnGrid} is immutable, so sharing it between threads is safe). */
    private static volatile OnGrid last;

    /**
     * The operators prepared for one grid: per-row metrics and the runs of cells whose mask allows the centred
     * stencil are computed once, so repeated calls (one per time step) skip the per-cell land and edge checks.
     * Results are bit-identical to the static methods. Immutable and thread-safe.
     * Usage: {@code SphericalOperators.OnGrid ops = SphericalOperators.on(grid); ops.curl(u, v, out);}
     */
    public static OnGrid on(LonLatGrid grid) {
        OnGrid o = last;
        if (o == null || o.grid != grid) {
            o = new OnGrid(grid);
            last = o;
        }
        return o;
    }

    /** curl_z of (u, v) on flat arrays into {@code out} (unit of u per metre). */
    public static void curl(LonLatGrid grid, double[] u, double[] v, double[] out) {
        on(grid).curl(u, v, out);
    }

    /** Horizontal divergence of (u, v) on flat arrays into {@code out} (unit of u per metre). */
    public static void divergence(LonLatGrid grid, double[] u, double[] v, double[] out) {
        on(grid).divergence(u, v, out);
    }

    /** Gradient (∂p/∂x, ∂p/∂y) of a scalar on flat arrays into {@code outX}, {@code outY} (unit of p per metre). */
    public static void gradient(LonLatGrid grid, double[] p, double[] outX, double[] outY) {
        on(grid).gradient(p, outX, outY);
    }

    /**
     * Operators prepared for one grid (see {@link SphericalOperators#on}). Cells whose own mask and the masks of
     * their four neighbours are ocean, away from the grid edges, form per-row runs; there the centred stencil is
     * evaluated in a tight loop (same arithmetic, same order as the general stencil) and a single finiteness test
     * of the result and the cell's own values sends any cell touching a NaN or infinite value to the general
     * stencil. All other cells (edges, next to land, the periodic seam) use the general stencil directly.
     */
    public static final class OnGrid {
        private final LonLatGrid grid;
        private final Stencil stencil;
        private final int nx;
        private final int ny;
        private final double dy;
        /** dx(j), m. */
        private final double[] dx;
        /** dx(j)·dy, m². */
        private final double[] dxdy;
        /** Runs of row j: flat indices [runs[2r], runs[2r+1]) for r in [rowRun[j], rowRun[j+1]). */
        private final int[] rowRun;
        private final int[] runs;

        private OnGrid(LonLatGrid grid) {
            this.grid = grid;
            this.stencil = new Stencil(grid);
            this.nx = grid.nx();
            this.ny = grid.ny();
            this.dy = grid.dy();
            this.dx = new double[ny];
            this.dxdy = new double[ny];
            for (int j = 0; j < ny; j++) {
                dx[j] = grid.dx(j);
                dxdy[j] = dx[j] * dy;
            }
            this.rowRun = new int[ny + 1];
            int[] buf = new int[16];
            int nr = 0;
            for (int j = 0; j < ny; j++) {
                rowRun[j] = nr;
                if (j == 0 || j == ny - 1) continue;
                int i = 1;
                while (i < nx - 1) {
                    while (i < nx - 1 && !full(i, j)) i++;
                    if (i >= nx - 1) break;
                    int s = i;
                    while (i < nx - 1 && full(i, j)) i++;
                    if (2 * nr + 2 > buf.length) buf = java.util.Arrays.copyOf(buf, buf.length * 2);
                    buf[2 * nr] = j * nx + s;
                    buf[2 * nr + 1] = j * nx + i;
                    nr++;
                }
            }
            rowRun[ny] = nr;
            this.runs = java.util.Arrays.copyOf(buf, 2 * nr);
        }

        /** Whether (i, j) and its four neighbours are ocean (caller keeps 1 ≤ i ≤ nx−2, 1 ≤ j ≤ ny−2). */
        private boolean full(int i, int j) {
            int k = j * nx + i;
            return grid.isOcean(k) && grid.isOcean(k - 1) && grid.isOcean(k + 1)
                    && grid.isOcean(k - nx) && grid.isOcean(k + nx);
        }

        /** The grid these operators were prepared for. */
        public LonLatGrid grid() { return grid; }

        /** Number of cells that take the centred fast path when all values are finite (for diagnostics). */
        public int fastCells() {
            int c = 0;
            for (int r = 0; r < runs.length; r += 2) c += runs[r + 1] - runs[r];
            return c;
        }

        private void check(double[]... arrays) {
            for (double[] a : arrays) {
                if (a.length < grid.size()) {
                    throw new IllegalArgumentException("array length " + a.length + " is shorter than grid " + nx + "×" + ny);
                }
            }
        }

        /** curl_z of (u, v) into {@code out} (unit of u per metre); same as {@link SphericalOperators#curl}. */
        public void curl(double[] u, double[] v, double[] out) {
            check(u, v, out);
            for (int j = 0; j < ny; j++) curlRow(u, v, out, j);
        }

        /** curl_z of row j only (for fused per-row loops; rows j−2…j+2 of u and v must be ready). */
        public void curlRow(double[] u, double[] v, double[] out, int j) {
            int i = 0, row = j * nx;
            double dxj = dx[j], dxjdy = dxdy[j];
            for (int r = rowRun[j]; r < rowRun[j + 1]; r++) {
                int s = runs[2 * r], e = runs[2 * r + 1];
                for (; row + i < s; i++) out[row + i] = curlAt(u, v, i, j, dxj);
                double dxn = dx[j + 1], dxs = dx[j - 1];
                for (int k = s; k < e; k++) {
                    double dv = 0.5 * (v[k + 1] - v[k - 1]);
                    double du = 0.5 * (u[k + nx] * dxn - u[k - nx] * dxs);
                    double res = dv / dxj - du / dxjdy;
                    out[k] = Double.isFinite(res + u[k] + v[k]) ? res : curlAt(u, v, k - row, j, dxj);
                }
                i = e - row;
            }
            for (; i < nx; i++) out[row + i] = curlAt(u, v, i, j, dxj);
        }

        private double curlAt(double[] u, double[] v, int i, int j, double dxj) {
            int k = j * nx + i;
            if (!stencil.valid(u, k) || !stencil.valid(v, k)) return Double.NaN;
            double dvg = stencil.alongI(v, i, j);
            double dug = stencil.alongJ(u, i, j, true);
            return dvg / dxj - dug / (dxj * dy);
        }

        /** Horizontal divergence of (u, v) into {@code out}; same as {@link SphericalOperators#divergence}. */
        public void divergence(double[] u, double[] v, double[] out) {
            check(u, v, out);
            for (int j = 0; j < ny; j++) {
                int i = 0, row = j * nx;
                double dxj = dx[j], dxjdy = dxdy[j];
                for (int r = rowRun[j]; r < rowRun[j + 1]; r++) {
                    int s = runs[2 * r], e = runs[2 * r + 1];
                    for (; row + i < s; i++) out[row + i] = divergenceAt(u, v, i, j, dxj);
                    double dxn = dx[j + 1], dxs = dx[j - 1];
                    for (int k = s; k < e; k++) {
                        double du = 0.5 * (u[k + 1] - u[k - 1]);
                        double dv = 0.5 * (v[k + nx] * dxn - v[k - nx] * dxs);
                        double res = du / dxj + dv / dxjdy;
                        out[k] = Double.isFinite(res + u[k] + v[k]) ? res : divergenceAt(u, v, k - row, j, dxj);
                    }
                    i = e - row;
                }
                for (; i < nx; i++) out[row + i] = divergenceAt(u, v, i, j, dxj);
            }
        }

        private double divergenceAt(double[] u, double[] v, int i, int j, double dxj) {
            int k = j * nx + i;
            if (!stencil.valid(u, k) || !stencil.valid(v, k)) return Double.NaN;
            return stencil.alongI(u, i, j) / dxj + stencil.alongJ(v, i, j, true) / (dxj * dy);
        }

        /** Gradient of p into {@code outX}, {@code outY}; same as {@link SphericalOperators#gradient}. */
        public void gradient(double[] p, double[] outX, double[] outY) {
            check(p, outX, outY);
            for (int j = 0; j < ny; j++) {
                int i = 0, row = j * nx;
                double dxj = dx[j];
                for (int r = rowRun[j]; r < rowRun[j + 1]; r++) {
                    int s = runs[2 * r], e = runs[2 * r + 1];
                    for (; row + i < s; i++) gradientAt(p, i, j, dxj, outX, outY);
                    for (int k = s; k < e; k++) {
                        double gx = 0.5 * (p[k + 1] - p[k - 1]) / dxj;
                        // the general stencil multiplies by the unit weight 1.0, which is exact
                        double gy = 0.5 * (p[k + nx] - p[k - nx]) / dy;
                        if (Double.isFinite(gx + gy + p[k])) {
                            outX[k] = gx;
                            outY[k] = gy;
                        } else {
                            gradientAt(p, k - row, j, dxj, outX, outY);
                        }
                    }
                    i = e - row;
                }
                for (; i < nx; i++) gradientAt(p, i, j, dxj, outX, outY);
            }
        }

        private void gradientAt(double[] p, int i, int j, double dxj, double[] outX, double[] outY) {
            int k = j * nx + i;
            if (!stencil.valid(p, k)) { outX[k] = Double.NaN; outY[k] = Double.NaN; return; }
            outX[k] = stencil.alongI(p, i, j) / dxj;
            outY[k] = stencil.alongJ(p, i, j, false) / dy;
        }
    }

    /** The general per-cell implementation of {@link #curl(LonLatGrid, double[], double[], double[])}; reference for tests. */
    static void curlReference(LonLatGrid grid, double[] u, double[] v, double[] out) {
        Stencil s = new Stencil(grid);
        int nx = grid.nx(), ny = grid.ny();
        double dy = grid.dy();
        for (int j = 0; j < ny; j++) {
            double dxj = grid.dx(j);
            for (int i = 0; i < nx; i++) {
                int k = j * nx + i;
                if (!s.valid(u, k) || !s.valid(v, k)) { out[k] = Double.NaN; continue; }
                double dv = s.alongI(v, i, j);
                double du = s.alongJ(u, i, j, true);
                out[k] = dv / dxj - du / (dxj * dy);
            }
        }
    }

    /** The general per-cell divergence; reference for tests. */
    static void divergenceReference(LonLatGrid grid, double[] u, double[] v, double[] out) {
        Stencil s = new Stencil(grid);
        int nx = grid.nx(), ny = grid.ny();
        double dy = grid.dy();
        for (int j = 0; j < ny; j++) {
            double dxj = grid.dx(j);
            for (int i = 0; i < nx; i++) {
                int k = j * nx + i;
                if (!s.valid(u, k) || !s.valid(v, k)) { out[k] = Double.NaN; continue; }
                out[k] = s.alongI(u, i, j) / dxj + s.alongJ(v, i, j, true) / (dxj * dy);
            }
        }
    }

    /** The general per-cell gradient; reference for tests. */
    static void gradientReference(LonLatGrid grid, double[] p, double[] outX, double[] outY) {
        Stencil s = new Stencil(grid);
        int nx = grid.nx(), ny = grid.ny();
        double dy = grid.dy();
        for (int j = 0; j < ny; j++) {
            double dxj = grid.dx(j);
            for (int i = 0; i < nx; i++) {
                int k = j * nx + i;
                if (!s.valid(p, k)) { outX[k] = Double.NaN; outY[k] = Double.NaN; continue; }
                outX[k] = s.alongI(p, i, j) / dxj;
                outY[k] = s.alongJ(p, i, j, false) / dy;
            }
        }
    }

    /** curl_z of a vector field; the result's unit is the field's unit followed by " m-1". */
    public static ScalarField curl(VectorField field) {
        LonLatGrid g = field.grid();
        double[] out = new double[g.size()];
        curl(g, field.eastward().values(), field.northward().values(), out);
        return new ScalarField(g, out, "curl_z_of_" + field.eastward().name(), perMetre(field.units()),
                "vertical component of the curl (positive counter-clockwise seen from above)");
    }

    /** Horizontal divergence of a vector field; unit of the field followed by " m-1". */
    public static ScalarField divergence(VectorField field) {
        LonLatGrid g = field.grid();
        double[] out = new double[g.size()];
        divergence(g, field.eastward().values(), field.northward().values(), out);
        return new ScalarField(g, out, "divergence_of_" + field.eastward().name(), perMetre(field.units()),
                "horizontal divergence (positive where the field spreads out)");
    }

    /** Gradient of a scalar field as an eastward/northward vector field; unit of the field followed by " m-1". */
    public static VectorField gradient(ScalarField field) {
        LonLatGrid g = field.grid();
        double[] gx = new double[g.size()];
        double[] gy = new double[g.size()];
        gradient(g, field.values(), gx, gy);
        String units = perMetre(field.units());
        return new VectorField(
                new ScalarField(g, gx, "eastward_derivative_of_" + field.name(), units, "eastward derivative of " + field.longName()),
                new ScalarField(g, gy, "northward_derivative_of_" + field.name(), units, "northward derivative of " + field.longName()));
    }

    private static String perMetre(String units) {
        return units.isBlank() ? "m-1" : units + " m-1";
    }

    /** The δ stencils of the class comment, for one grid. */
    private static final class Stencil {
        private final LonLatGrid grid;
        private final int nx;
        private final int ny;
        private final boolean periodic;

        Stencil(LonLatGrid grid) {
            this.grid = grid;
            this.nx = grid.nx();
            this.ny = grid.ny();
            this.periodic = nx >= 3 && Math.abs(nx * grid.dLonDeg() - 360.0) < 1e-6;
        }

        boolean valid(double[] a, int k) {
            return grid.isOcean(k) && Double.isFinite(a[k]);
        }

        /** Flat index of column i (wrapped if periodic) in row j, or −1 outside the grid. */
        private int at(int i, int j) {
            if (i < 0 || i >= nx) {
                if (!periodic) return -1;
                i = Math.floorMod(i, nx);
            }
            return j * nx + i;
        }

        private boolean ok(double[] a, int k) {
            return k >= 0 && grid.isOcean(k) && Double.isFinite(a[k]);
        }

        /** ∂a/∂i per grid step at (i, j). */
        double alongI(double[] a, int i, int j) {
            int k0 = j * nx + i;
            int ke = at(i + 1, j), kw = at(i - 1, j);
            boolean e = ok(a, ke), w = ok(a, kw);
            if (e && w) return 0.5 * (a[ke] - a[kw]);
            if (e) {
                int kee = at(i + 2, j);
                return ok(a, kee) ? 0.5 * (-3 * a[k0] + 4 * a[ke] - a[kee]) : a[ke] - a[k0];
            }
            if (w) {
                int kww = at(i - 2, j);
                return ok(a, kww) ? 0.5 * (3 * a[k0] - 4 * a[kw] + a[kww]) : a[k0] - a[kw];
            }
            return Double.NaN;
        }

        /** ∂(a·w)/∂j per grid step at (i, j), w = dx(j) if {@code weighted}, else 1. */
        double alongJ(double[] a, int i, int j, boolean weighted) {
            int k0 = j * nx + i;
            int kn = j + 1 < ny ? k0 + nx : -1, ks = j - 1 >= 0 ? k0 - nx : -1;
            boolean n = ok(a, kn), s = ok(a, ks);
            double w0 = weight(j, weighted);
            if (n && s) return 0.5 * (a[kn] * weight(j + 1, weighted) - a[ks] * weight(j - 1, weighted));
            if (n) {
                int knn = j + 2 < ny ? k0 + 2 * nx : -1;
                return ok(a, knn)
                        ? 0.5 * (-3 * a[k0] * w0 + 4 * a[kn] * weight(j + 1, weighted) - a[knn] * weight(j + 2, weighted))
                        : a[kn] * weight(j + 1, weighted) - a[k0] * w0;
            }
            if (s) {
                int kss = j - 2 >= 0 ? k0 - 2 * nx : -1;
                return ok(a, kss)
                        ? 0.5 * (3 * a[k0] * w0 - 4 * a[ks] * weight(j - 1, weighted) + a[kss] * weight(j - 2, weighted))
                        : a[k0] * w0 - a[ks] * weight(j - 1, weighted);
            }
            return Double.NaN;
        }

        private double weight(int j, boolean weighted) {
            return weighted ? grid.dx(j) : 1.0;
        }
    }
}
