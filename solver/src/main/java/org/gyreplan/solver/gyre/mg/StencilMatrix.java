package org.gyreplan.solver.gyre.mg;

/**
 * A sparse matrix with a structured stencil on an {@code nx × ny} lattice (row-major, node {@code k = j·nx + i}).
 *
 * <p>Row k holds coefficients to nodes {@code (i + di, j + dj)} with {@code |di|, |dj| ≤ radius}; coefficient arrays
 * are indexed {@code s = (dj + radius)·w + (di + radius)}, {@code w = 2·radius + 1}, and a {@code null} array means
 * that offset is zero everywhere. Inactive nodes (land) carry no unknown: their rows and columns are zero and every
 * vector is zero there. Active nodes never lie within {@code radius} of the lattice edge, so no bounds checks are
 * needed in the kernels.
 */
public final class StencilMatrix {
    /** Rows per parallel chunk (fixed, independent of the thread count). */
    static final int ROWS_PER_CHUNK = 8;

    final int nx;
    final int ny;
    final int radius;
    final int width;
    final double[][] a;
    final boolean[] active;
    final int[] offset;
    private int activeCount = -1;

    public StencilMatrix(int nx, int ny, int radius, boolean[] active) {
        if (radius < 1) throw new IllegalArgumentException("radius must be ≥ 1");
        if (active.length != nx * ny) throw new IllegalArgumentException("active mask size mismatch");
        this.nx = nx;
        this.ny = ny;
        this.radius = radius;
        this.width = 2 * radius + 1;
        this.a = new double[width * width][];
        this.active = active;
        this.offset = new int[width * width];
        for (int dj = -radius; dj <= radius; dj++) {
            for (int di = -radius; di <= radius; di++) offset[slot(di, dj)] = dj * nx + di;
        }
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                if (active[j * nx + i] && (i < radius || j < radius || i >= nx - radius || j >= ny - radius)) {
                    throw new IllegalArgumentException("active node (" + i + "," + j + ") within the stencil radius of the lattice edge");
                }
            }
        }
    }

    public int nx() { return nx; }
    public int ny() { return ny; }
    public int radius() { return radius; }
    public int size() { return nx * ny; }
    public boolean isActive(int k) { return active[k]; }

    public int activeCount() {
        if (activeCount < 0) {
            int n = 0;
            for (boolean b : active) if (b) n++;
            activeCount = n;
        }
        return activeCount;
    }

    /** Slot index of offset (di, dj). */
    public int slot(int di, int dj) { return (dj + radius) * width + (di + radius); }

    /** Coefficient array for offset (di, dj), allocated on first use. */
    public double[] coefficients(int di, int dj) {
        int s = slot(di, dj);
        if (a[s] == null) a[s] = new double[nx * ny];
        return a[s];
    }

    /** Coefficient of row k at offset (di, dj) (0 if not stored). */
    public double get(int k, int di, int dj) {
        double[] c = a[slot(di, dj)];
        return c == null ? 0.0 : c[k];
    }

    /** Drops coefficient arrays that are zero everywhere (saves memory and time). */
    public void compact() {
        for (int s = 0; s < a.length; s++) {
            double[] c = a[s];
            if (c == null) continue;
            boolean zero = true;
            for (double v : c) if (v != 0.0) { zero = false; break; }
            if (zero) a[s] = null;
        }
    }

    int chunks() { return (ny + ROWS_PER_CHUNK - 1) / ROWS_PER_CHUNK; }

    /** Stored (non-null) stencil slots in slot order. */
    int[] storedSlots() {
        int cnt = 0;
        for (double[] c : a) if (c != null) cnt++;
        int[] out = new int[cnt];
        cnt = 0;
        for (int s = 0; s < a.length; s++) if (a[s] != null) out[cnt++] = s;
        return out;
    }

    /**
     * r[k] := r[k] − Σ_q c_q[k] x[k + o_q] over the given slots for k0 ≤ k &lt; k1, subtracting the terms one by one in
     * slot order (the same rounding as one pass per slot), four slots per pass over r to save memory traffic.
     */
    static void subtractSlots(double[][] a, int[] offset, int[] slots, double[] x, double[] r, int k0, int k1) {
        int q = 0, ns = slots.length;
        for (; q + 3 < ns; q += 4) {
            double[] c0 = a[slots[q]], c1 = a[slots[q + 1]], c2 = a[slots[q + 2]], c3 = a[slots[q + 3]];
            int o0 = offset[slots[q]], o1 = offset[slots[q + 1]], o2 = offset[slots[q + 2]], o3 = offset[slots[q + 3]];
            for (int k = k0; k < k1; k++) {
                r[k] = r[k] - c0[k] * x[k + o0] - c1[k] * x[k + o1] - c2[k] * x[k + o2] - c3[k] * x[k + o3];
            }
        }
        for (; q < ns; q++) {
            double[] cs = a[slots[q]];
            int off = offset[slots[q]];
            for (int k = k0; k < k1; k++) r[k] -= cs[k] * x[k + off];
        }
    }

    /** y = A x (y is zero on inactive nodes provided the matrix has zero rows there). */
    public void apply(double[] x, double[] y, Parallel par) {
        int[] slots = storedSlots();
        par.forEach(chunks(), c -> {
            int j0 = c * ROWS_PER_CHUNK, j1 = Math.min(ny, j0 + ROWS_PER_CHUNK);
            for (int j = j0; j < j1; j++) {
                int k0 = j * nx, k1 = k0 + nx;
                java.util.Arrays.fill(y, k0, k1, 0.0);
                if (j < radius || j >= ny - radius) continue;
                int q = 0, ns = slots.length;
                for (; q + 3 < ns; q += 4) {
                    double[] c0 = a[slots[q]], c1 = a[slots[q + 1]], c2 = a[slots[q + 2]], c3 = a[slots[q + 3]];
                    int o0 = offset[slots[q]], o1 = offset[slots[q + 1]], o2 = offset[slots[q + 2]], o3 = offset[slots[q + 3]];
                    for (int k = k0 + radius; k < k1 - radius; k++) {
                        y[k] = y[k] + c0[k] * x[k + o0] + c1[k] * x[k + o1] + c2[k] * x[k + o2] + c3[k] * x[k + o3];
                    }
                }
                for (; q < ns; q++) {
                    double[] cs = a[slots[q]];
                    int off = offset[slots[q]];
                    for (int k = k0 + radius; k < k1 - radius; k++) y[k] += cs[k] * x[k + off];
                }
            }
        });
    }

    /** r = b − A x. */
    public void residual(double[] b, double[] x, double[] r, Parallel par) {
        int[] slots = storedSlots();
        par.forEach(chunks(), c -> {
            int j0 = c * ROWS_PER_CHUNK, j1 = Math.min(ny, j0 + ROWS_PER_CHUNK);
            for (int j = j0; j < j1; j++) {
                int k0 = j * nx, k1 = k0 + nx;
                for (int k = k0; k < k1; k++) r[k] = active[k] ? b[k] : 0.0;
                if (j < radius || j >= ny - radius) continue;
                subtractSlots(a, offset, slots, x, r, k0 + radius, k1 - radius);
            }
        });
    }
}
