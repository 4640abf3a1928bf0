package org.gyreplan.solver.gyre.mg;

/**
 * Block Gauss–Seidel relaxation by eastward lines (x-lines) with multi-colour row ordering.
 *
 * <pre>
 *   for each colour c = 0 … radius (rows j ≡ c mod (radius+1)), for every row j of that colour:
 *       A_jj x_j = b_j − Σ_{j' ≠ j} A_jj' x_j'        (banded solve along the row, half-bandwidth = radius)
 * </pre>
 *
 * Rows of one colour are more than {@code radius} apart, so they do not couple and are solved in parallel without
 * changing the result. Line relaxation in x treats the zonal coupling exactly: the β ∂ψ/∂x term (which carries
 * information westward and builds the western boundary layer) and the stronger zonal coupling of lon–lat grids
 * where Δx = R cos φ Δλ is smaller than Δy. The row band matrices are factorised once (LU without pivoting, valid
 * because the symmetric part of the operator is positive definite).
 */
final class LineSmoother {
    private final StencilMatrix A;
    private final double[] lu;     // per node: w band entries (L below the diagonal, U on and above it; 1/diag stored)
    private final int w;
    private final int R;

    LineSmoother(StencilMatrix A) {
        this.A = A;
        this.R = A.radius;
        this.w = 2 * R + 1;
        int nx = A.nx, ny = A.ny;
        lu = new double[nx * ny * w];
        for (int j = 0; j < ny; j++) {
            int base = j * nx;
            for (int i = 0; i < nx; i++) {
                int k = base + i;
                for (int d = -R; d <= R; d++) {
                    double v;
                    if (!A.active[k]) v = d == 0 ? 1.0 : 0.0;
                    else if (i + d < 0 || i + d >= nx) v = 0.0;
                    else v = A.get(k, d, 0);
                    lu[k * w + d + R] = v;
                }
            }
            // banded LU of the row, no pivoting
            for (int i = 0; i < nx; i++) {
                int k = base + i;
                double piv = lu[k * w + R];
                if (piv == 0.0 || !Double.isFinite(piv)) {
                    throw new ArithmeticException("zero pivot in line relaxation at lattice node (" + i + "," + j + ")");
                }
                double inv = 1.0 / piv;
                for (int q = 1; q <= R && i + q < nx; q++) {
                    int kq = k + q;
                    double f = lu[kq * w + (-q + R)] * inv;
                    lu[kq * w + (-q + R)] = f;
                    if (f == 0.0) continue;
                    for (int d = 1; d <= R; d++) {
                        int dd = d - q;           // column i+d seen from row i+q
                        if (dd > R) continue;
                        lu[kq * w + dd + R] -= f * lu[k * w + d + R];
                    }
                }
                lu[k * w + R] = inv;
            }
        }
    }

    /** One sweep over all colours, in forward ({@code reverse=false}) or reverse colour order. */
    void sweep(double[] b, double[] x, boolean reverse, Parallel par) {
        int colours = R + 1;
        for (int cc = 0; cc < colours; cc++) {
            int colour = reverse ? colours - 1 - cc : cc;
            int rowsOfColour = (A.ny - colour + colours - 1) / colours;
            final int col = colour;
            int rowsPerChunk = 4;
            int nChunks = (rowsOfColour + rowsPerChunk - 1) / rowsPerChunk;
            par.forEach(nChunks, ch -> {
                int r0 = ch * rowsPerChunk, r1 = Math.min(rowsOfColour, r0 + rowsPerChunk);
                for (int r = r0; r < r1; r++) relaxRow(col + r * colours, b, x);
            });
        }
    }

    private void relaxRow(int j, double[] b, double[] x) {
        int nx = A.nx;
        int k0 = j * nx, k1 = k0 + nx;
        boolean any = false;
        for (int k = k0; k < k1; k++) if (A.active[k]) { any = true; break; }
        if (!any) return;
        // right-hand side: b minus the couplings to other rows (written into x's row, in-row values not needed)
        for (int k = k0; k < k1; k++) x[k] = A.active[k] ? b[k] : 0.0;
        double[][] a = A.a;
        for (int dj = -R; dj <= R; dj++) {
            if (dj == 0) continue;
            for (int di = -R; di <= R; di++) {
                int s = A.slot(di, dj);
                double[] cs = a[s];
                if (cs == null) continue;
                int off = A.offset[s];
                int lo = Math.max(k0, -off), hi = Math.min(k1, A.nx * A.ny - off);
                for (int k = lo; k < hi; k++) x[k] -= cs[k] * x[k + off];
            }
        }
        // forward substitution with L (unit diagonal)
        for (int i = 0; i < nx; i++) {
            int k = k0 + i;
            double v = x[k];
            for (int q = 1; q <= R && i - q >= 0; q++) v -= lu[k * w + (-q + R)] * x[k - q];
            x[k] = v;
        }
        // back substitution with U
        for (int i = nx - 1; i >= 0; i--) {
            int k = k0 + i;
            double v = x[k];
            for (int d = 1; d <= R && i + d < nx; d++) v -= lu[k * w + d + R] * x[k + d];
            x[k] = v * lu[k * w + R];
        }
    }
}
