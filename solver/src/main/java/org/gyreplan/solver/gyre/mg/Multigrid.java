package org.gyreplan.solver.gyre.mg;

import java.util.ArrayList;
import java.util.List;

/**
 * Geometric multigrid on a masked lattice, used as a preconditioner.
 *
 * <p>Method (standard vertex-centred geometric multigrid, e.g. Trottenberg, Oosterlee &amp; Schüller 2001,
 * "Multigrid", ch. 2–5, and Wesseling 1992, "An Introduction to Multigrid Methods"):
 * <ul>
 *   <li>Coarse lattice node (I, J) sits on fine node (2I, 2J). It is active if that fine node is active; in addition,
 *       a fine active node none of whose bilinear-interpolation parents is active activates its first parent, so
 *       one-cell channels and ragged coasts keep a coarse representation. The activation order makes the
 *       prolongation full rank.</li>
 *   <li>Prolongation P: bilinear interpolation from active coarse parents (inactive parents count as 0, which is the
 *       ψ = 0 coast). Restriction R = Pᵀ.</li>
 *   <li>Coarse operators by the Galerkin product A_c = Pᵀ A P (computed node by node in a gather form, so the
 *       result does not depend on the thread count); the stencil radius is preserved (5/9-point stays 9-point,
 *       13-point stays 25-point).</li>
 *   <li>Smoother: x-line Gauss–Seidel with multi-colour row ordering ({@link LineSmoother}).</li>
 *   <li>Coarsest level: banded LU ({@link BandedDirect}).</li>
 * </ul>
 */
public final class Multigrid {
    private final List<Level> levels = new ArrayList<>();
    private final Parallel par;
    private final int preSweeps;
    private final int postSweeps;
    private final int cycleIndex;
    private BandedDirect direct;

    private static final class Level {
        final StencilMatrix A;
        LineSmoother smoother;
        double[] x, b, r;
        Level(StencilMatrix A) { this.A = A; }
    }

    /**
     * @param fine       fine-level operator (not modified)
     * @param par        parallel executor
     * @param preSweeps  smoothing sweeps before the coarse correction (≥ 0)
     * @param postSweeps smoothing sweeps after it (≥ 0)
     * @param cycleIndex 1 = V-cycle, 2 = W-cycle
     */
    public Multigrid(StencilMatrix fine, Parallel par, int preSweeps, int postSweeps, int cycleIndex) {
        this.par = par;
        this.preSweeps = preSweeps;
        this.postSweeps = postSweeps;
        this.cycleIndex = cycleIndex;
        Level l0 = new Level(fine);
        levels.add(l0);
        StencilMatrix cur = fine;
        int minActive = 200;
        while (cur.activeCount() > minActive) {
            int nxc = (cur.nx - 1) / 2 + 1, nyc = (cur.ny - 1) / 2 + 1;
            if (Math.min(nxc, nyc) < 2 * cur.radius + 3) break;
            StencilMatrix coarse = coarsen(cur, par);
            if (coarse.activeCount() == 0 || coarse.activeCount() >= cur.activeCount()) break;
            levels.add(new Level(coarse));
            cur = coarse;
        }
        for (int l = 0; l < levels.size(); l++) {
            Level lev = levels.get(l);
            int n = lev.A.size();
            if (l > 0) { lev.x = new double[n]; lev.b = new double[n]; }
            if (l < levels.size() - 1) { lev.r = new double[n]; lev.smoother = new LineSmoother(lev.A); }
        }
        direct = new BandedDirect(levels.get(levels.size() - 1).A);
    }

    /** Number of levels including the finest. */
    public int levelCount() { return levels.size(); }

    /** Active unknowns on each level, finest first. */
    public int[] activeCounts() {
        int[] c = new int[levels.size()];
        for (int l = 0; l < c.length; l++) c[l] = levels.get(l).A.activeCount();
        return c;
    }

    /** Approximately solves A z = v with one multigrid cycle from z = 0 (the preconditioner M⁻¹). */
    public void precondition(double[] v, double[] z) {
        java.util.Arrays.fill(z, 0.0);
        cycle(0, v, z);
    }

    /**
     * One cycle on level l for A_l x = b, improving x in place. The coarse problem is set up once from the residual
     * after pre-smoothing; it is then treated by {@code cycleIndex} coarse cycles (1 = V, 2 = W), the later ones
     * starting from the earlier coarse iterate, before the single prolongation and post-smoothing (the textbook
     * γ-cycle, Trottenberg et al. 2001 §2.4). With a Galerkin coarse operator this equals repeating the fine-level
     * coarse-grid correction, at the cost of one fine residual, restriction and prolongation instead of γ.
     */
    private void cycle(int l, double[] b, double[] x) {
        Level lev = levels.get(l);
        if (l == levels.size() - 1) {
            direct.solve(b, x);
            return;
        }
        for (int s = 0; s < preSweeps; s++) lev.smoother.sweep(b, x, false, par);
        Level co = levels.get(l + 1);
        lev.A.residual(b, x, lev.r, par);
        restrict(lev.A, co.A, lev.r, co.b, par);
        java.util.Arrays.fill(co.x, 0.0);
        int gamma = l + 1 == levels.size() - 1 ? 1 : cycleIndex;   // the direct solve needs no repetition
        for (int g = 0; g < gamma; g++) cycle(l + 1, co.b, co.x);
        prolongAdd(lev.A, co.A, co.x, x, par);
        for (int s = 0; s < postSweeps; s++) lev.smoother.sweep(b, x, true, par);
    }

    // ---- transfer operators ---------------------------------------------------------------------------------

    /**
     * r_c = Pᵀ r (gather over the 3×3 fine nodes around 2I, 2J). Vectors vanish on inactive nodes, so no fine mask
     * test is needed; inactive coarse nodes get 0.
     */
    static void restrict(StencilMatrix fine, StencilMatrix coarse, double[] r, double[] rc, Parallel par) {
        int nxc = coarse.nx, nyc = coarse.ny, nxf = fine.nx, R = coarse.radius;
        par.forEach((nyc + 7) / 8, ch -> {
            int J0 = ch * 8, J1 = Math.min(nyc, J0 + 8);
            for (int J = J0; J < J1; J++) {
                int kc0 = J * nxc;
                if (J < R || J >= nyc - R) { java.util.Arrays.fill(rc, kc0, kc0 + nxc, 0.0); continue; }
                int fm = (2 * J - 1) * nxf, f0 = 2 * J * nxf, fp = (2 * J + 1) * nxf;
                for (int I = 0; I < nxc; I++) {
                    int kc = kc0 + I;
                    if (!coarse.active[kc]) { rc[kc] = 0.0; continue; }
                    int fx = 2 * I;
                    double tm = r[fm + fx] + 0.5 * (r[fm + fx - 1] + r[fm + fx + 1]);
                    double t0 = r[f0 + fx] + 0.5 * (r[f0 + fx - 1] + r[f0 + fx + 1]);
                    double tp = r[fp + fx] + 0.5 * (r[fp + fx - 1] + r[fp + fx + 1]);
                    rc[kc] = t0 + 0.5 * (tm + tp);
                }
            }
        });
    }

    /** x += P x_c on active fine nodes (x_c vanishes on inactive coarse nodes). */
    static void prolongAdd(StencilMatrix fine, StencilMatrix coarse, double[] xc, double[] x, Parallel par) {
        int nxc = coarse.nx, nyc = coarse.ny, nxf = fine.nx, nyf = fine.ny;
        par.forEach((nyf + 15) / 16, ch -> {
            int j0 = ch * 16, j1 = Math.min(nyf, j0 + 16);
            double[] t = new double[nxc];
            for (int j = j0; j < j1; j++) {
                int J0 = j >> 1;
                if ((j & 1) == 0) {
                    System.arraycopy(xc, J0 * nxc, t, 0, nxc);
                } else {
                    if (J0 + 1 >= nyc) continue;
                    int a = J0 * nxc, b = a + nxc;
                    for (int I = 0; I < nxc; I++) t[I] = 0.5 * (xc[a + I] + xc[b + I]);
                }
                int kf0 = j * nxf;
                for (int i = 0; i + 1 < nxf; i += 2) {
                    int I = i >> 1;
                    if (fine.active[kf0 + i]) x[kf0 + i] += t[I];
                    if (fine.active[kf0 + i + 1]) x[kf0 + i + 1] += 0.5 * (t[I] + t[I + 1]);
                }
                if ((nxf & 1) == 1 && fine.active[kf0 + nxf - 1]) x[kf0 + nxf - 1] += t[(nxf - 1) >> 1];
            }
        });
    }

    /** Coarse active set and Galerkin operator A_c = Pᵀ A P. */
    static StencilMatrix coarsen(StencilMatrix f, Parallel par) {
        int nxf = f.nx, nyf = f.ny, R = f.radius;
        int nxc = (nxf - 1) / 2 + 1, nyc = (nyf - 1) / 2 + 1;
        boolean[] act = new boolean[nxc * nyc];
        for (int J = R; J < nyc - R; J++) {
            for (int I = R; I < nxc - R; I++) act[J * nxc + I] = f.active[(2 * J) * nxf + 2 * I];
        }
        // fine active nodes without an active parent activate their first admissible parent (fixed scan order)
        for (int j = 0; j < nyf; j++) {
            for (int i = 0; i < nxf; i++) {
                if (!f.active[j * nxf + i]) continue;
                int J0 = j >> 1, J1 = (j & 1) == 0 ? J0 : J0 + 1;
                int I0 = i >> 1, I1 = (i & 1) == 0 ? I0 : I0 + 1;
                boolean covered = false;
                int firstI = -1, firstJ = -1;
                for (int J = J0; J <= J1 && !covered; J++) {
                    for (int I = I0; I <= I1; I++) {
                        if (act[J * nxc + I]) { covered = true; break; }
                        if (firstI < 0 && I >= R && J >= R && I < nxc - R && J < nyc - R) { firstI = I; firstJ = J; }
                    }
                }
                if (!covered && firstI >= 0) act[firstJ * nxc + firstI] = true;
            }
        }
        StencilMatrix c = new StencilMatrix(nxc, nyc, R, act);
        int w = 2 * R + 1;
        for (int s = 0; s < w * w; s++) c.a[s] = new double[nxc * nyc];
        int[] nonNull = java.util.stream.IntStream.range(0, f.a.length).filter(s -> f.a[s] != null).toArray();
        int ns = nonNull.length;
        int[] sdi = new int[ns], sdj = new int[ns];
        double[][] fa = new double[ns][];
        for (int q = 0; q < ns; q++) { sdi[q] = nonNull[q] % w - R; sdj[q] = nonNull[q] / w - R; fa[q] = f.a[nonNull[q]]; }
        par.forEach((nyc + 3) / 4, ch -> {
            int Ja = ch * 4, Jb = Math.min(nyc, Ja + 4);
            double[] acc = new double[w * w];
            for (int J = Ja; J < Jb; J++) {
                for (int I = 0; I < nxc; I++) {
                    int kc = J * nxc + I;
                    if (!act[kc]) continue;
                    java.util.Arrays.fill(acc, 0.0);
                    for (int fy = 2 * J - 1; fy <= 2 * J + 1; fy++) {
                        double wy = fy == 2 * J ? 1.0 : 0.5;
                        for (int fx = 2 * I - 1; fx <= 2 * I + 1; fx++) {
                            int kf = fy * nxf + fx;
                            if (!f.active[kf]) continue;
                            double wf = (fx == 2 * I ? 1.0 : 0.5) * wy;
                            for (int q = 0; q < ns; q++) {
                                double aval = fa[q][kf];
                                if (aval == 0.0) continue;
                                int gx = fx + sdi[q], gy = fy + sdj[q];
                                double wa = wf * aval;
                                int GI0 = gx >> 1, GJ0 = gy >> 1;
                                // offsets of the parents relative to (I, J), shifted into the accumulator
                                int bx = GI0 - I + R, by = GJ0 - J + R;
                                if ((gx & 1) == 0) {
                                    if ((gy & 1) == 0) {
                                        if (act[GJ0 * nxc + GI0]) acc[by * w + bx] += wa;
                                    } else {
                                        double h = 0.5 * wa;
                                        if (act[GJ0 * nxc + GI0]) acc[by * w + bx] += h;
                                        if (act[(GJ0 + 1) * nxc + GI0]) acc[(by + 1) * w + bx] += h;
                                    }
                                } else if ((gy & 1) == 0) {
                                    double h = 0.5 * wa;
                                    if (act[GJ0 * nxc + GI0]) acc[by * w + bx] += h;
                                    if (act[GJ0 * nxc + GI0 + 1]) acc[by * w + bx + 1] += h;
                                } else {
                                    double h = 0.25 * wa;
                                    int k0 = GJ0 * nxc + GI0;
                                    if (act[k0]) acc[by * w + bx] += h;
                                    if (act[k0 + 1]) acc[by * w + bx + 1] += h;
                                    if (act[k0 + nxc]) acc[(by + 1) * w + bx] += h;
                                    if (act[k0 + nxc + 1]) acc[(by + 1) * w + bx + 1] += h;
                                }
                            }
                        }
                    }
                    for (int s = 0; s < w * w; s++) c.a[s][kc] = acc[s];
                }
            }
        });
        c.compact();
        return c;
    }
}
