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
 * because the symmetric part of the operator is positive definite); factors are stored as separate arrays
 * (sub-diagonals of L, inverse diagonal and super-diagonals of U).
 */
final class LineSmoother {
    private final StencilMatrix A;
    private final int R;
    private final double[] l1, l2, dinv, u1, u2;    // l2/u2 only for radius 2
    private final int[] offRowSlots;                 // stencil slots with dj ≠ 0 that are stored
    private final boolean[] rowActive;

    LineSmoother(StencilMatrix A) {
        this.A = A;
        this.R = A.radius;
        if (R > 2) throw new IllegalArgumentException("line smoother supports stencil radius 1 or 2");
        int nx = A.nx, ny = A.ny, n = nx * ny;
        l1 = new double[n]; dinv = new double[n]; u1 = new double[n];
        l2 = R == 2 ? new double[n] : null;
        u2 = R == 2 ? new double[n] : null;
        double[] cW2 = R == 2 ? A.a[A.slot(-2, 0)] : null, cW1 = A.a[A.slot(-1, 0)], cC = A.a[A.slot(0, 0)];
        double[] cE1 = A.a[A.slot(1, 0)], cE2 = R == 2 ? A.a[A.slot(2, 0)] : null;
        rowActive = new boolean[ny];
        // band entries in place: l2 ← A(i,i−2), l1 ← A(i,i−1), dinv ← A(i,i), u1 ← A(i,i+1), u2 ← A(i,i+2)
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                int k = j * nx + i;
                if (!A.active[k]) { dinv[k] = 1.0; continue; }
                rowActive[j] = true;
                if (cW1 != null && i >= 1) l1[k] = cW1[k];
                if (cE1 != null && i + 1 < nx) u1[k] = cE1[k];
                dinv[k] = cC == null ? 0.0 : cC[k];
                if (R == 2) {
                    if (cW2 != null && i >= 2) l2[k] = cW2[k];
                    if (cE2 != null && i + 2 < nx) u2[k] = cE2[k];
                }
            }
            // LU without pivoting, row by row (Doolittle on the band)
            for (int i = 0; i < nx; i++) {
                int k = j * nx + i;
                if (R == 1) {
                    if (i >= 1) {
                        double f = l1[k] * dinv[k - 1];          // dinv[k−1] already inverted
                        l1[k] = f;
                        dinv[k] -= f * u1[k - 1];
                    }
                } else {
                    if (i >= 2) {
                        double f2 = l2[k] * dinv[k - 2];
                        l2[k] = f2;
                        l1[k] -= f2 * u1[k - 2];
                        dinv[k] -= f2 * u2[k - 2];
                    }
                    if (i >= 1) {
                        double f1 = l1[k] * dinv[k - 1];
                        l1[k] = f1;
                        dinv[k] -= f1 * u1[k - 1];
                        u1[k] -= f1 * u2[k - 1];
                    }
                }
                double piv = dinv[k];
                if (piv == 0.0 || !Double.isFinite(piv)) {
                    throw new ArithmeticException("zero pivot in line relaxation at lattice node (" + i + "," + j + ")");
                }
                dinv[k] = 1.0 / piv;
            }
        }
        int cnt = 0;
        int[] tmp = new int[A.a.length];
        for (int dj = -R; dj <= R; dj++) {
            if (dj == 0) continue;
            for (int di = -R; di <= R; di++) {
                int s = A.slot(di, dj);
                if (A.a[s] != null) tmp[cnt++] = s;
            }
        }
        offRowSlots = java.util.Arrays.copyOf(tmp, cnt);
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
                int r = r0;
                // two independent rows at a time: their band solves interleave (instruction-level parallelism);
                // each row's arithmetic is unchanged, so results do not depend on the pairing
                if (R == 1) {
                    for (; r + 1 < r1; r += 2) relaxRowPair(col + r * colours, col + (r + 1) * colours, b, x);
                } else {
                    for (; r + 1 < r1; r += 2) relaxRowPair2(col + r * colours, col + (r + 1) * colours, b, x);
                }
                for (; r < r1; r++) relaxRow(col + r * colours, b, x);
            });
        }
    }

    /** Two rows of radius 1 relaxed together (identical arithmetic to two {@link #relaxRow} calls). */
    private void relaxRowPair(int ja, int jb, double[] b, double[] x) {
        if (!rowActive[ja] || !rowActive[jb]) {
            relaxRow(ja, b, x);
            relaxRow(jb, b, x);
            return;
        }
        int nx = A.nx;
        int a0 = ja * nx, b0 = jb * nx, d = b0 - a0;
        boolean[] act = A.active;
        for (int k = a0; k < a0 + nx; k++) {
            x[k] = act[k] ? b[k] : 0.0;
            x[k + d] = act[k + d] ? b[k + d] : 0.0;
        }
        for (int s : offRowSlots) {
            double[] cs = A.a[s];
            int off = A.offset[s];
            for (int k = a0 + 1; k < a0 + nx - 1; k++) {
                x[k] -= cs[k] * x[k + off];
                x[k + d] -= cs[k + d] * x[k + d + off];
            }
        }
        for (int k = a0 + 1; k < a0 + nx; k++) {
            x[k] -= l1[k] * x[k - 1];
            x[k + d] -= l1[k + d] * x[k + d - 1];
        }
        int ka = a0 + nx - 1;
        x[ka] *= dinv[ka];
        x[ka + d] *= dinv[ka + d];
        for (int k = ka - 1; k >= a0; k--) {
            x[k] = (x[k] - u1[k] * x[k + 1]) * dinv[k];
            x[k + d] = (x[k + d] - u1[k + d] * x[k + d + 1]) * dinv[k + d];
        }
    }

    /** Two rows of radius 2 relaxed together (identical arithmetic to two {@link #relaxRow} calls). */
    private void relaxRowPair2(int ja, int jb, double[] b, double[] x) {
        if (!rowActive[ja] || !rowActive[jb]) {
            relaxRow(ja, b, x);
            relaxRow(jb, b, x);
            return;
        }
        int nx = A.nx;
        int k0 = ja * nx, k1 = k0 + nx, d = (jb - ja) * nx;
        boolean[] act = A.active;
        for (int k = k0; k < k1; k++) {
            x[k] = act[k] ? b[k] : 0.0;
            x[k + d] = act[k + d] ? b[k + d] : 0.0;
        }
        StencilMatrix.subtractSlots(A.a, A.offset, offRowSlots, x, x, k0 + R, k1 - R);
        StencilMatrix.subtractSlots(A.a, A.offset, offRowSlots, x, x, k0 + d + R, k1 + d - R);
        x[k0 + 1] -= l1[k0 + 1] * x[k0];
        x[k0 + d + 1] -= l1[k0 + d + 1] * x[k0 + d];
        for (int k = k0 + 2; k < k1; k++) {
            x[k] -= l1[k] * x[k - 1] + l2[k] * x[k - 2];
            x[k + d] -= l1[k + d] * x[k + d - 1] + l2[k + d] * x[k + d - 2];
        }
        x[k1 - 1] *= dinv[k1 - 1];
        x[k1 + d - 1] *= dinv[k1 + d - 1];
        x[k1 - 2] = (x[k1 - 2] - u1[k1 - 2] * x[k1 - 1]) * dinv[k1 - 2];
        x[k1 + d - 2] = (x[k1 + d - 2] - u1[k1 + d - 2] * x[k1 + d - 1]) * dinv[k1 + d - 2];
        for (int k = k1 - 3; k >= k0; k--) {
            x[k] = (x[k] - u1[k] * x[k + 1] - u2[k] * x[k + 2]) * dinv[k];
            x[k + d] = (x[k + d] - u1[k + d] * x[k + d + 1] - u2[k + d] * x[k + d + 2]) * dinv[k + d];
        }
    }

    private void relaxRow(int j, double[] b, double[] x) {
        if (!rowActive[j]) return;
        int nx = A.nx;
        int k0 = j * nx, k1 = k0 + nx;
        boolean[] act = A.active;
        // right-hand side: b minus the couplings to other rows (in-row values of x are not needed)
        for (int k = k0; k < k1; k++) x[k] = act[k] ? b[k] : 0.0;
        StencilMatrix.subtractSlots(A.a, A.offset, offRowSlots, x, x, k0 + R, k1 - R);
        if (R == 1) {
            for (int k = k0 + 1; k < k1; k++) x[k] -= l1[k] * x[k - 1];
            x[k1 - 1] *= dinv[k1 - 1];
            for (int k = k1 - 2; k >= k0; k--) x[k] = (x[k] - u1[k] * x[k + 1]) * dinv[k];
        } else {
            x[k0 + 1] -= l1[k0 + 1] * x[k0];
            for (int k = k0 + 2; k < k1; k++) x[k] -= l1[k] * x[k - 1] + l2[k] * x[k - 2];
            x[k1 - 1] *= dinv[k1 - 1];
            x[k1 - 2] = (x[k1 - 2] - u1[k1 - 2] * x[k1 - 1]) * dinv[k1 - 2];
            for (int k = k1 - 3; k >= k0; k--) x[k] = (x[k] - u1[k] * x[k + 1] - u2[k] * x[k + 2]) * dinv[k];
        }
    }
}
