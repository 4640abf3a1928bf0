package org.gyreplan.solver.gyre;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.gyre.mg.StencilMatrix;

/**
 * Finite-difference discretisation of the gyre operator on the masked grid.
 *
 * <pre>
 *   −A_j [ r ∇²ψ + β_j ∂ψ/∂x − A_H ∇⁴ψ ] = −A_j curl τ / ρ₀          (row of cell (i, j), A_j = Δx_j Δy)
 *
 *   A_j ∇²ψ ≈ (Sψ)_ij = s_x (ψ_E + ψ_W − 2ψ) + s_n (ψ_N − ψ) + s_s (ψ_S − ψ)
 *       s_x = Δy/Δx_j,  s_n = Δx_{j+½}/Δy,  s_s = Δx_{j−½}/Δy    (flux form; Δx at the faces uses cos φ at the faces)
 *   A_j β_j ∂ψ/∂x ≈ β_j Δy (ψ_E − ψ_W)/2                          (centred)
 *   A_j ∇⁴ψ ≈ (S ζ)_ij,   ζ = S ψ / A on ocean cells,
 *   ζ_w on coast cells:  no-slip Σ 2 (ψ₁ − ψ_w)/h² over the directions with one ocean neighbour (Thom), free-slip 0
 * </pre>
 *
 * ψ lives at cell centres; coast (land) cell centres carry the coast value of ψ (0 on the outer coast, the island
 * constant on an island), so the discrete wall lies on the first land cell centre. Scaling each row by the cell area
 * makes the Laplacian part symmetric and the β part antisymmetric within a row; the operator's symmetric part is
 * then positive definite, which the multigrid and the row/band factorisations rely on. Second order in Δx, Δy for
 * smooth fields. The Munk term uses the spherical Laplacian twice (metric terms of the viscous stress tensor on the
 * sphere are neglected, as is common in basin models).
 */
final class GyreOperator {
    final LonLatGrid grid;
    final BasinTopology topo;
    final Geometry geom;
    final double r;
    final double aH;
    final WallCondition wall;
    final int R;         // stencil radius: 1 (drag only) or 2 (biharmonic)
    final int P;         // lattice padding
    final int nxL, nyL;
    final int w;
    private final double[] betaRow;
    private final double dy;
    private final double dxUnit;

    GyreOperator(GyreProblem p, BasinTopology topo) {
        this.grid = p.grid();
        this.topo = topo;
        this.geom = p.geometry();
        this.r = p.drag();
        this.aH = p.viscosity();
        this.wall = p.wall();
        this.R = aH > 0 ? 2 : 1;
        this.P = 2 * R;
        this.nxL = grid.nx() + 2 * P;
        this.nyL = grid.ny() + 2 * P;
        this.w = 2 * R + 1;
        PhysicalConstants pc = p.constants();
        this.betaRow = new double[grid.ny()];
        for (int j = 0; j < grid.ny(); j++) betaRow[j] = geom.beta(grid, j, pc);
        this.dy = geom.dy(grid);
        this.dxUnit = geom.dxUnit(grid);
    }

    int lattice(int i, int j) { return (j + P) * nxL + (i + P); }

    boolean ocean(int i, int j) {
        return i >= 0 && j >= 0 && i < grid.nx() && j < grid.ny() && topo.isMain(j * grid.nx() + i);
    }

    double lat(int j) { return grid.lat0Deg() + j * grid.dLatDeg(); }
    double dx(int j) { return dxUnit * geom.cosFactor(lat(j)); }
    double dy() { return dy; }
    double area(int j) { return dx(j) * dy; }
    double beta(int j) { return betaRow[j]; }
    private double sx(int j) { return dy / dx(j); }
    private double sn(int j) { return dxUnit * geom.cosFactor(lat(j) + grid.dLatDeg() / 2) / dy; }
    private double ss(int j) { return dxUnit * geom.cosFactor(lat(j) - grid.dLatDeg() / 2) / dy; }

    /** ζ at node (i, j) as coefficients on its 3×3 neighbourhood (index (dj+1)·3 + di+1). */
    private void zeta(int i, int j, double[] z) {
        java.util.Arrays.fill(z, 0.0);
        if (ocean(i, j)) {
            double c = 1.0 / area(j), sx = sx(j), sn = sn(j), ss = ss(j);
            z[4] = -(2 * sx + sn + ss) * c;
            z[3] = sx * c;
            z[5] = sx * c;
            z[7] = sn * c;
            z[1] = ss * c;
            return;
        }
        if (wall != WallCondition.NO_SLIP) return;
        boolean oE = ocean(i + 1, j), oW = ocean(i - 1, j), oN = ocean(i, j + 1), oS = ocean(i, j - 1);
        if (oE || oW) {
            double h2 = 1.0 / (dx(j) * dx(j));
            if (oE && oW) { z[5] += h2; z[3] += h2; z[4] -= 2 * h2; }
            else if (oE) { z[5] += 2 * h2; z[4] -= 2 * h2; }
            else { z[3] += 2 * h2; z[4] -= 2 * h2; }
        }
        if (oN || oS) {
            double h2 = 1.0 / (dy * dy);
            if (oN && oS) { z[7] += h2; z[1] += h2; z[4] -= 2 * h2; }
            else if (oN) { z[7] += 2 * h2; z[4] -= 2 * h2; }
            else { z[1] += 2 * h2; z[4] -= 2 * h2; }
        }
    }

    /**
     * Row of the area-scaled, negated operator at grid cell (i, j) (ocean or island cell), as coefficients on the
     * (2R+1)² neighbourhood, index (dj+R)·w + (di+R). Works on the full lattice: coast cells are variables.
     */
    void row(int i, int j, double[] out) {
        java.util.Arrays.fill(out, 0.0);
        double sx = sx(j), sn = sn(j), ss = ss(j);
        int c = R * w + R;
        // −r S ψ
        out[c] += r * (2 * sx + sn + ss);
        out[c + 1] -= r * sx;
        out[c - 1] -= r * sx;
        out[c + w] -= r * sn;
        out[c - w] -= r * ss;
        // −β Δy (ψE − ψW)/2
        double bt = beta(j) * dy / 2;
        out[c + 1] -= bt;
        out[c - 1] += bt;
        if (aH > 0) {
            double[] z = new double[9];
            int[][] nbs = {{1, 0}, {-1, 0}, {0, 1}, {0, -1}};
            double[] sc = {sx, sx, sn, ss};
            double[] zc = new double[9];
            zeta(i, j, zc);
            for (int q = 0; q < 4; q++) {
                int di = nbs[q][0], dj = nbs[q][1];
                zeta(i + di, j + dj, z);
                double f = aH * sc[q];
                for (int b = 0; b < 9; b++) {
                    int bi = b % 3 - 1 + di, bj = b / 3 - 1 + dj;
                    out[(bj + R) * w + (bi + R)] += f * z[b];
                    out[(b / 3 - 1 + R) * w + (b % 3 - 1 + R)] -= f * zc[b];
                }
            }
        }
    }

    /** The multigrid matrix: rows and columns of main-basin ocean cells only (coast values go to the right side). */
    StencilMatrix matrix() {
        int nx = grid.nx(), ny = grid.ny();
        boolean[] act = new boolean[nxL * nyL];
        for (int j = 0; j < ny; j++) for (int i = 0; i < nx; i++) if (ocean(i, j)) act[lattice(i, j)] = true;
        StencilMatrix A = new StencilMatrix(nxL, nyL, R, act);
        double[][] cols = new double[w * w][];
        double[] out = new double[w * w];
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                if (!ocean(i, j)) continue;
                row(i, j, out);
                int k = lattice(i, j);
                for (int s = 0; s < w * w; s++) {
                    if (out[s] == 0.0) continue;
                    int di = s % w - R, dj = s / w - R;
                    if (!ocean(i + di, j + dj)) continue;
                    if (cols[s] == null) cols[s] = A.coefficients(di, dj);
                    cols[s][k] = out[s];
                }
            }
        }
        A.compact();
        return A;
    }
}
