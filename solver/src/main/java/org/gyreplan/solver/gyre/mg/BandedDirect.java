package org.gyreplan.solver.gyre.mg;

/**
 * Direct solver for the coarsest multigrid level: banded LU without pivoting of the whole lattice, ordered along
 * the shorter lattice dimension so that the bandwidth is {@code radius·min(nx, ny) + radius}. Inactive nodes are
 * identity rows.
 */
final class BandedDirect {
    private final int n;
    private final int bw;
    private final int ld;
    private final double[] band;     // row p: entries for columns p−bw … p+bw
    private final int[] perm;        // lattice node of ordered position p
    private final int[] pos;         // ordered position of lattice node k

    BandedDirect(StencilMatrix A) {
        int nx = A.nx, ny = A.ny, R = A.radius;
        n = nx * ny;
        boolean byColumns = ny < nx;     // order along the shorter dimension
        int shortDim = byColumns ? ny : nx;
        bw = R * shortDim + R;
        ld = 2 * bw + 1;
        perm = new int[n];
        pos = new int[n];
        int p = 0;
        if (byColumns) {
            for (int i = 0; i < nx; i++) for (int j = 0; j < ny; j++) { perm[p] = j * nx + i; pos[j * nx + i] = p++; }
        } else {
            for (int k = 0; k < n; k++) { perm[k] = k; pos[k] = k; }
        }
        band = new double[n * ld];
        for (int q = 0; q < n; q++) {
            int k = perm[q];
            if (!A.active[k]) { band[q * ld + bw] = 1.0; continue; }
            int i = k % nx, j = k / nx;
            for (int dj = -R; dj <= R; dj++) {
                for (int di = -R; di <= R; di++) {
                    double v = A.get(k, di, dj);
                    if (v == 0.0) continue;
                    int ii = i + di, jj = j + dj;
                    int col = pos[jj * nx + ii];
                    band[q * ld + (col - q) + bw] += v;
                }
            }
        }
        for (int q = 0; q < n; q++) {
            double piv = band[q * ld + bw];
            if (piv == 0.0 || !Double.isFinite(piv)) throw new ArithmeticException("singular coarsest-level matrix");
            double inv = 1.0 / piv;
            int last = Math.min(n - 1, q + bw);
            for (int r = q + 1; r <= last; r++) {
                int idx = r * ld + (q - r) + bw;
                double f = band[idx];
                if (f == 0.0) continue;
                f *= inv;
                band[idx] = f;
                for (int c = q + 1; c <= last; c++) {
                    double u = band[q * ld + (c - q) + bw];
                    if (u != 0.0) band[r * ld + (c - r) + bw] -= f * u;
                }
            }
            band[q * ld + bw] = inv;
        }
    }

    /** Solves A x = b (x overwritten). */
    void solve(double[] b, double[] x) {
        double[] y = new double[n];
        for (int q = 0; q < n; q++) {
            double v = b[perm[q]];
            int first = Math.max(0, q - bw);
            for (int c = first; c < q; c++) v -= band[q * ld + (c - q) + bw] * y[c];
            y[q] = v;
        }
        for (int q = n - 1; q >= 0; q--) {
            double v = y[q];
            int last = Math.min(n - 1, q + bw);
            for (int c = q + 1; c <= last; c++) v -= band[q * ld + (c - q) + bw] * y[c];
            y[q] = v * band[q * ld + bw];
        }
        for (int q = 0; q < n; q++) x[perm[q]] = y[q];
    }
}
