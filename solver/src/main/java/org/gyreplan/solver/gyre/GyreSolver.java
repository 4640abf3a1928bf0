package org.gyreplan.solver.gyre;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.gyre.mg.Krylov;
import org.gyreplan.solver.gyre.mg.Multigrid;
import org.gyreplan.solver.gyre.mg.Parallel;
import org.gyreplan.solver.gyre.mg.StencilMatrix;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.ProgressListener;

import java.util.ArrayList;
import java.util.List;

/**
 * Steady wind-driven barotropic circulation (Stommel 1948, Munk 1950, or both) on a masked basin.
 *
 * <pre>
 *   r ∇²ψ + β ∂ψ/∂x − A_H ∇⁴ψ = curl_z τ / ρ₀
 *   V = ∂ψ/∂x (northward), U = −∂ψ/∂y (eastward); ψ = 0 on the outer coast; ψ = c_m on island m
 *   island rule: the steady vorticity balance integrated over each island's cells (which by Stokes' theorem is the
 *   circulation of the momentum balance around its coast: ∮ r u·dl − A_H ∮ ∂ζ/∂n dl … = ∮ τ·dl/ρ₀) holds
 * </pre>
 *
 * <table>
 *   <caption>Symbols</caption>
 *   <tr><td>ψ</td><td>depth-integrated streamfunction</td><td>m³ s⁻¹ inside, Sv in outputs</td></tr>
 *   <tr><td>r</td><td>linear bottom-drag rate on the transport form</td><td>s⁻¹</td></tr>
 *   <tr><td>A_H</td><td>lateral eddy viscosity</td><td>m² s⁻¹</td></tr>
 *   <tr><td>β</td><td>df/dy</td><td>m⁻¹ s⁻¹</td></tr>
 *   <tr><td>curl_z τ</td><td>wind-stress curl</td><td>N m⁻³</td></tr>
 *   <tr><td>ρ₀</td><td>reference density</td><td>kg m⁻³</td></tr>
 * </table>
 *
 * Sign convention: with V = +∂ψ/∂x the dissipative form is β ψ_x = curl τ/ρ₀ + A_H ∇⁴ψ − r∇²ψ, whose decaying
 * boundary-layer roots lie at the WESTERN coast in both hemispheres (β &gt; 0). A subtropical gyre (negative curl)
 * has ψ &lt; 0 and a northward western boundary current.
 *
 * <p>Validity: linear, steady, flat bottom, homogeneous; boundary layers need ≥ 3 cells (a warning otherwise).
 * Sources: Stommel (1948) Trans. AGU 29, 202–206; Munk (1950) J. Meteorol. 7, 79–93; Godfrey (1989) Geophys.
 * Astrophys. Fluid Dyn. 45, 89–112 (island rule). Numerics: {@link GyreOperator}, multigrid-preconditioned BiCGStab
 * ({@link Multigrid}, {@link Krylov}); island constants by superposition of unit-island solutions. Results are
 * bit-identical for any thread count.
 */
public final class GyreSolver {
    /** Stage name reported to the progress listener. */
    public static final String STAGE = "gyre solve";

    private GyreSolver() { }

    /** Solves the problem; reports progress and polls the cancel token during the iterations. */
    public static GyreSolution solve(GyreProblem p, ProgressListener listener, CancelToken cancel) {
        if (listener == null) listener = ProgressListener.NONE;
        if (cancel == null) cancel = CancelToken.none();
        LonLatGrid grid = p.grid();
        int nx = grid.nx(), ny = grid.ny();
        PhysicalConstants pc = p.constants();
        List<String> warnings = new ArrayList<>();
        listener.progress(STAGE, 0.0, "analysing basin");
        BasinTopology topo = BasinTopology.of(grid);
        if (topo.mainCellCount() == 0) throw new GyreException(GyreException.Reason.NO_OCEAN, "the mask has no ocean cell");
        if (topo.oceanComponentCount() > 1) {
            warnings.add(String.format("%d ocean cells in %d separate basin(s) are not connected to the main basin (%d cells) and were left out (NaN)",
                    topo.excludedOceanCells(), topo.oceanComponentCount() - 1, topo.mainCellCount()));
        }
        if (topo.touchesGridEdge()) warnings.add("the main basin reaches the edge of the grid; the grid edge is treated as a coast (ψ = 0)");
        if (p.geometry().kind() == Geometry.Kind.SPHERE) {
            for (int j = 0; j < ny; j++) {
                if (Math.abs(grid.latDeg(j)) > 89.0) {
                    for (int i = 0; i < nx; i++) if (topo.isMain(j * nx + i)) throw new GyreException(GyreException.Reason.POLAR_CELL,
                            String.format("ocean cell (%d,%d) at %.3f°N is within 1° of a pole, where β → 0 and the spherical metrics degenerate", i, j, grid.latDeg(j)));
                }
            }
        }
        List<BasinTopology.Island> islands = topo.islands();
        if (islands.size() > p.options().maxIslands()) {
            StringBuilder sb = new StringBuilder("the basin has " + islands.size() + " islands, more than the limit of "
                    + p.options().maxIslands() + " for the island rule; fill small islands in the mask or raise the limit. First islands: ");
            for (int m = 0; m < Math.min(5, islands.size()); m++) sb.append(m > 0 ? "; " : "").append(islands.get(m).describe());
            throw new GyreException(GyreException.Reason.ISLAND_UNSUPPORTED, sb.toString());
        }
        double[] forcing = forcing(p, topo, warnings);
        GyreOperator op = new GyreOperator(p, topo);
        resolutionGuard(p, op, warnings);

        Parallel par = new Parallel(p.options().threads());
        try {
            StencilMatrix A = op.matrix();
            cancel.check();
            listener.progress(STAGE, 0.02, "building multigrid hierarchy");
            int[] cyc = cycleParameters(op.R);
            Multigrid mg = new Multigrid(A, par, cyc[0], cyc[1], cyc[2]);
            int n = A.size();
            int nSolves = 1 + islands.size();
            int[] iters = new int[nSolves];
            double[] res = new double[nSolves];
            double[][] sol = new double[nSolves][];
            int w = op.w, R = op.R;
            double[] row = new double[w * w];
            for (int s = 0; s < nSolves; s++) {
                double[] b = new double[n];
                if (s == 0) {
                    for (int j = 0; j < ny; j++) for (int i = 0; i < nx; i++) {
                        if (op.ocean(i, j)) b[op.lattice(i, j)] = -op.area(j) * forcing[j * nx + i];
                    }
                } else {
                    liftIsland(op, islands.get(s - 1), b, row);
                }
                double[] x = new double[n];
                String stage = nSolves == 1 ? STAGE : STAGE + " (" + (s == 0 ? "wind" : islands.get(s - 1).describe()) + ")";
                Krylov.Result kr = Krylov.bicgstab(A, mg, b, x, p.options().tolerance(), p.options().maxIterations(),
                        par, listener, cancel, stage);
                if (!kr.converged()) throw new GyreException(GyreException.Reason.NOT_CONVERGED, String.format(
                        "the linear solver stopped after %d iterations at relative residual %.2e (target %.1e, accepted up to 10×)",
                        kr.iterations(), kr.relativeResidual(), p.options().tolerance()));
                iters[s] = kr.iterations();
                res[s] = kr.relativeResidual();
                sol[s] = x;
            }
            // island constants
            int K = islands.size();
            double[] c = new double[K];
            if (K > 0) c = islandConstants(op, islands, sol, forcing, row);
            // assemble ψ (m³ s⁻¹) on the grid with coast values
            double[] psiFull = new double[nx * ny];
            double[] psiSv = new double[nx * ny];
            for (int j = 0; j < ny; j++) for (int i = 0; i < nx; i++) {
                int k = j * nx + i;
                if (op.ocean(i, j)) {
                    int kl = op.lattice(i, j);
                    double v = sol[0][kl];
                    for (int m = 0; m < K; m++) v += c[m] * sol[m + 1][kl];
                    psiFull[k] = v;
                    psiSv[k] = v * 1e-6;
                } else {
                    int isl = topo.islandOf(k);
                    psiFull[k] = isl >= 0 ? c[isl] : 0.0;
                    psiSv[k] = Double.NaN;
                }
            }
            double[] sv = Sverdrup.streamfunction(grid, topo.mainMask(), forcing, p.geometry(), pc);
            for (int k = 0; k < sv.length; k++) sv[k] *= 1e-6;
            ScalarField psiField = new ScalarField(grid, psiSv, "ocean_barotropic_streamfunction", "Sv",
                    "depth-integrated (barotropic) streamfunction; northward transport = d(psi)/dx, eastward transport = -d(psi)/dy");
            ScalarField svField = new ScalarField(grid, sv, "sverdrup_streamfunction", "Sv",
                    "Sverdrup streamfunction; northward transport = d(psi)/dx, zero on the eastern coast of each row segment");
            BoundaryCurrentDiagnostics diag = BoundaryCurrentDiagnostics.compute(op, psiFull, forcing, p.depth());
            double[] cSv = new double[K];
            for (int m = 0; m < K; m++) cSv[m] = c[m] * 1e-6;
            listener.progress(STAGE, 1.0, "done");
            return new GyreSolution(psiField, svField, topo, cSv, diag, List.copyOf(warnings),
                    new GyreSolution.SolverStats(A.activeCount(), mg.levelCount(), nSolves, iters, res));
        } finally {
            par.shutdown();
        }
    }

    /** {pre-sweeps, post-sweeps, cycle index} of the multigrid preconditioner for a stencil radius. */
    static int[] cycleParameters(int radius) {
        // drag only (5-point): V(1,1); with the biharmonic term: W(1,1), which keeps the iteration count from growing
        // quickly under refinement (bilinear transfers are only just adequate for a fourth-order operator)
        return radius == 1 ? new int[] {1, 1, 1} : new int[] {1, 1, 2};
    }

    /** curl τ/ρ₀ per cell (m s⁻²); checks main-basin cells, fills island cells from adjacent ocean if undefined. */
    static double[] forcing(GyreProblem p, BasinTopology topo, List<String> warnings) {
        LonLatGrid g = p.grid();
        int nx = g.nx(), ny = g.ny();
        double rho0 = p.constants().rho0();
        double[] f = new double[nx * ny];
        String name;
        if (p.curl() != null) {
            name = "field '" + p.curl().name() + "'";
            double[] c = p.curl().values();
            for (int k = 0; k < f.length; k++) f[k] = c[k] / rho0;
        } else {
            name = "the curl of the wind stress";
            double[] c = curlOf(p);
            for (int k = 0; k < f.length; k++) f[k] = c[k] / rho0;
        }
        for (int k = 0; k < f.length; k++) {
            if (topo.isMain(k) && !Double.isFinite(f[k])) {
                throw new GyreException(GyreException.Reason.BAD_FORCING, String.format(
                        "%s is undefined at ocean cell (%d,%d), %.3f°E %.3f°N; the forcing must be finite on every ocean cell",
                        name, k % nx, k / nx, g.lonDeg(k % nx), g.latDeg(k / nx)));
            }
        }
        for (BasinTopology.Island isl : topo.islands()) {
            boolean filled = false;
            for (int k : isl.cells()) {
                if (Double.isFinite(f[k])) continue;
                filled = true;
            }
            if (!filled) continue;
            double s = 0;
            int cnt = 0;
            for (int k : isl.cells()) {
                int i = k % nx, j = k / nx;
                int[][] nb = {{1, 0}, {-1, 0}, {0, 1}, {0, -1}};
                for (int[] d : nb) {
                    int ii = i + d[0], jj = j + d[1];
                    if (ii < 0 || jj < 0 || ii >= nx || jj >= ny) continue;
                    int m = jj * nx + ii;
                    if (topo.isMain(m)) { s += f[m]; cnt++; }
                }
            }
            double mean = cnt > 0 ? s / cnt : 0.0;
            for (int k : isl.cells()) if (!Double.isFinite(f[k])) f[k] = mean;
            warnings.add("wind forcing undefined over " + isl.describe() + "; the mean of the surrounding ocean cells was used for its circulation integral");
        }
        return f;
    }

    /** Wind-stress curl (N m⁻³) from the stress field with centred differences (one-sided next to gaps). */
    static double[] curlOf(GyreProblem p) {
        return curlOf(p.grid(), p.stress(), p.geometry());
    }

    /**
     * Wind-stress curl (N m⁻³) with the grid metrics: sphere curl τ = (1/(R cos φ)) [∂τ_y/∂λ − ∂(τ_x cos φ)/∂φ],
     * β-plane ∂τ_y/∂x − ∂τ_x/∂y; centred differences, one-sided where a neighbour is missing (NaN) or outside the
     * grid, NaN where both are missing.
     */
    static double[] curlOf(LonLatGrid g, org.gyreplan.solver.grid.VectorField stress, Geometry geom) {
        int nx = g.nx(), ny = g.ny();
        double[] tx = stress.eastward().values(), ty = stress.northward().values();
        double dy = geom.dy(g);
        double[] out = new double[nx * ny];
        for (int j = 0; j < ny; j++) {
            double dx = geom.dx(g, j);
            double cj = geom.cosFactor(g.latDeg(j));
            for (int i = 0; i < nx; i++) {
                double dTy = diff(ty, nx, ny, i, j, 1, 0, null, g, geom) / dx;
                double dTx = diff(tx, nx, ny, i, j, 0, 1, new double[0], g, geom) / (dy * cj);
                out[j * nx + i] = dTy - dTx;
            }
        }
        return out;
    }

    /** Centred (or one-sided) difference per grid step; cosWeighted != null multiplies values by cos φ of their row. */
    private static double diff(double[] v, int nx, int ny, int i, int j, int di, int dj, double[] cosWeighted,
                               LonLatGrid g, Geometry geom) {
        double c = val(v, nx, ny, i, j, cosWeighted, g, geom);
        double p = val(v, nx, ny, i + di, j + dj, cosWeighted, g, geom);
        double m = val(v, nx, ny, i - di, j - dj, cosWeighted, g, geom);
        if (Double.isFinite(p) && Double.isFinite(m)) return (p - m) / 2;
        if (Double.isFinite(p) && Double.isFinite(c)) return p - c;
        if (Double.isFinite(m) && Double.isFinite(c)) return c - m;
        return Double.NaN;
    }

    private static double val(double[] v, int nx, int ny, int i, int j, double[] cosWeighted, LonLatGrid g, Geometry geom) {
        if (i < 0 || j < 0 || i >= nx || j >= ny) return Double.NaN;
        double x = v[j * nx + i];
        return cosWeighted == null ? x : x * geom.cosFactor(g.latDeg(j));
    }

    /**
     * Warns when the western boundary layer spans fewer than 3 cells of Δx at some row of the main basin. With both
     * frictions the wider of δ_S = r/β and δ_M = (A_H/β)^(1/3) sets the layer (the narrower one is then irrelevant).
     */
    private static void resolutionGuard(GyreProblem p, GyreOperator op, List<String> warnings) {
        LonLatGrid g = p.grid();
        double worst = Double.POSITIVE_INFINITY, worstLat = Double.NaN, worstWidth = Double.NaN, worstDx = Double.NaN;
        String which = p.viscosity() > 0 && p.drag() > 0 ? "Stommel r/β and Munk (A_H/β)^(1/3)"
                : p.viscosity() > 0 ? "Munk (A_H/β)^(1/3)" : "Stommel r/β";
        for (int j = 0; j < g.ny(); j++) {
            boolean any = false;
            for (int i = 0; i < g.nx() && !any; i++) any = op.ocean(i, j);
            if (!any) continue;
            double beta = op.beta(j);
            double width = Math.max(p.drag() > 0 ? p.drag() / beta : 0, p.viscosity() > 0 ? Math.cbrt(p.viscosity() / beta) : 0);
            double cells = width / op.dx(j);
            if (cells < worst) { worst = cells; worstLat = g.latDeg(j); worstWidth = width; worstDx = op.dx(j); }
        }
        if (worst < 3) {
            warnings.add(String.format("resolution: the western boundary layer (%s = %.1f km at %.2f°N) spans only %.2f grid cells "
                    + "(Δx = %.1f km); at least 3 are needed for a trustworthy boundary current", which, worstWidth / 1e3, worstLat, worst, worstDx / 1e3));
        }
    }

    /** Right side of the unit-island solve: −Σ_L a(k, L)·1 over island cells L within the stencil of ocean cell k. */
    private static void liftIsland(GyreOperator op, BasinTopology.Island isl, double[] b, double[] row) {
        int nx = op.grid.nx(), ny = op.grid.ny(), R = op.R, w = op.w;
        boolean[] touched = new boolean[nx * ny];
        for (int kIsl : isl.cells()) {
            int li = kIsl % nx, lj = kIsl / nx;
            for (int dj = -R; dj <= R; dj++) for (int di = -R; di <= R; di++) {
                int i = li + di, j = lj + dj;
                if (!op.ocean(i, j) || touched[j * nx + i]) continue;
                touched[j * nx + i] = true;
                op.row(i, j, row);
                double s = 0;
                for (int q = 0; q < w * w; q++) {
                    if (row[q] == 0.0) continue;
                    int ii = i + q % w - R, jj = j + q / w - R;
                    if (ii >= 0 && jj >= 0 && ii < nx && jj < ny && op.topo.islandOf(jj * nx + ii) == isl.id()) s += row[q];
                }
                b[op.lattice(i, j)] -= s;
            }
        }
    }

    /** Solves the K×K island-rule system for the island constants (m³ s⁻¹). */
    private static double[] islandConstants(GyreOperator op, List<BasinTopology.Island> islands, double[][] sol,
                                            double[] forcing, double[] row) {
        int K = islands.size();
        int nx = op.grid.nx(), ny = op.grid.ny(), R = op.R, w = op.w;
        double[][] G = new double[K][K + 1];
        for (int m = 0; m < K; m++) {
            BasinTopology.Island isl = islands.get(m);
            double rhs = 0;
            double[] g = new double[K + 1];   // g[0] for the wind solution, g[1 + k] for unit island k
            for (int kL : isl.cells()) {
                int i = kL % nx, j = kL / nx;
                rhs += -op.area(j) * forcing[kL];
                op.row(i, j, row);
                for (int q = 0; q < w * w; q++) {
                    if (row[q] == 0.0) continue;
                    int ii = i + q % w - R, jj = j + q / w - R;
                    if (ii < 0 || jj < 0 || ii >= nx || jj >= ny) continue;
                    int kk = jj * nx + ii;
                    if (op.ocean(ii, jj)) {
                        int kl = op.lattice(ii, jj);
                        for (int s = 0; s <= K; s++) g[s] += row[q] * sol[s][kl];
                    } else {
                        int other = op.topo.islandOf(kk);
                        if (other >= 0) g[1 + other] += row[q];
                    }
                }
            }
            for (int k = 0; k < K; k++) G[m][k] = g[1 + k];
            G[m][K] = rhs - g[0];
        }
        // Gaussian elimination with partial pivoting
        for (int col = 0; col < K; col++) {
            int piv = col;
            for (int r2 = col + 1; r2 < K; r2++) if (Math.abs(G[r2][col]) > Math.abs(G[piv][col])) piv = r2;
            if (!(Math.abs(G[piv][col]) > 0)) {
                throw new GyreException(GyreException.Reason.ISLAND_UNSUPPORTED,
                        "the island-rule system is singular for " + islands.get(col).describe());
            }
            double[] t = G[col]; G[col] = G[piv]; G[piv] = t;
            for (int r2 = col + 1; r2 < K; r2++) {
                double f = G[r2][col] / G[col][col];
                for (int c2 = col; c2 <= K; c2++) G[r2][c2] -= f * G[col][c2];
            }
        }
        double[] c = new double[K];
        for (int r2 = K - 1; r2 >= 0; r2--) {
            double s = G[r2][K];
            for (int c2 = r2 + 1; c2 < K; c2++) s -= G[r2][c2] * c[c2];
            c[r2] = s / G[r2][r2];
        }
        return c;
    }
}
