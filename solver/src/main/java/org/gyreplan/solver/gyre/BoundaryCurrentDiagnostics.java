package org.gyreplan.solver.gyre;

import java.util.ArrayList;
import java.util.List;

/**
 * Western-boundary-current diagnostics of a gyre solution, row by row.
 *
 * <pre>
 *   V_{i+½} = (ψ_{i+1} − ψ_i)/Δx_j                         northward transport per unit width on cell faces, m² s⁻¹
 *   boundary current of a row: faces from the western coast of the row's longest ocean segment while V keeps the sign
 *     of the first face; transport T = ψ(end of run) − ψ(coast)  (Sv, positive northward)
 *   zero-crossing width: distance from the coast to where V changes sign (linear interpolation), km
 *   e-folding width:     distance from the coast to where |V| falls below |V|max / e east of the maximum, km
 *   peak speed:          |V|max / H, m s⁻¹ (depth-mean speed for depth H)
 *   interior Sverdrup transport of the segment: Σ curl τ/(ρ₀ β) Δx, Sv; mass balance: T ≈ −(Sverdrup interior)
 *   net transport of the row: Σ over all segments of ψ(east coast) − ψ(west coast), Sv (0 for a closed basin)
 * </pre>
 *
 * The coast sits at the centre of the first land cell (the discrete wall of {@link GyreSolver}). Sign: transports
 * positive northward (V = ∂ψ/∂x); a subtropical gyre has a positive (northward) western boundary current in the
 * northern hemisphere. Validity: the run-based definition assumes the boundary current of a row starts at the western
 * coast of the row's longest segment; rows cut by islands or bays report their longest segment only. The e-folding and
 * zero-crossing widths follow the Stommel (1948) exponential and Munk (1950) oscillatory profiles (for Munk no-slip
 * walls the zero crossing is at 2π/√3 δ_M, CHECKS.md §8b). Speeds are depth means over H, not surface speeds.
 */
public final class BoundaryCurrentDiagnostics {
    /** Diagnostics of one grid row (NaN where undefined). */
    public record Row(int j, double latitudeDeg, double boundaryCurrentTransportSv, double zeroCrossingWidthKm,
                      double eFoldingWidthKm, double peakTransportPerWidth, double peakSpeedMs,
                      double interiorSverdrupSv, double returnTransportSv, double netTransportSv) { }

    private final List<Row> rows;
    private final Row peak;

    private BoundaryCurrentDiagnostics(List<Row> rows, Row peak) {
        this.rows = List.copyOf(rows);
        this.peak = peak;
    }

    /** Rows of the main basin, south to north. */
    public List<Row> rows() { return rows; }
    /** The row with the largest |boundary-current transport| (null if none). */
    public Row peak() { return peak; }
    /** Peak western-boundary-current transport, Sv (signed, positive northward). */
    public double peakTransportSv() { return peak == null ? Double.NaN : peak.boundaryCurrentTransportSv(); }
    /** Latitude of the peak, degrees north. */
    public double peakLatitudeDeg() { return peak == null ? Double.NaN : peak.latitudeDeg(); }
    /** Largest |net transport| across a row, Sv. */
    public double maxNetTransportSv() {
        double m = 0;
        for (Row r : rows) if (Double.isFinite(r.netTransportSv())) m = Math.max(m, Math.abs(r.netTransportSv()));
        return m;
    }

    /**
     * @param op       discretisation (grid, metrics, topology)
     * @param psiFull  ψ in m³ s⁻¹ on the grid with coast values filled in (0 outer coast, island constants)
     * @param forcing  curl τ/ρ₀ per cell, m s⁻²
     * @param depth    depth H, m
     */
    static BoundaryCurrentDiagnostics compute(GyreOperator op, double[] psiFull, double[] forcing, double depth) {
        int nx = op.grid.nx(), ny = op.grid.ny();
        List<Row> out = new ArrayList<>();
        Row best = null;
        for (int j = 0; j < ny; j++) {
            double dx = op.dx(j), beta = op.beta(j);
            int bestStart = -1, bestLen = 0;
            double net = 0;
            boolean anySeg = false;
            int i = 0;
            while (i < nx) {
                if (!op.ocean(i, j)) { i++; continue; }
                int s = i;
                while (i < nx && op.ocean(i, j)) i++;
                anySeg = true;
                net += coast(psiFull, nx, i, j) - coast(psiFull, nx, s - 1, j);
                if (i - s > bestLen) { bestLen = i - s; bestStart = s; }
            }
            if (!anySeg) continue;
            int iW = bestStart, iE = bestStart + bestLen - 1;
            double psiC = coast(psiFull, nx, iW - 1, j), psiCE = coast(psiFull, nx, iE + 1, j);
            int nFaces = bestLen + 1;
            double[] v = new double[nFaces];
            for (int f = 0; f < nFaces; f++) {
                double a = f == 0 ? psiC : psiFull[j * nx + iW - 1 + f];
                double b = f == nFaces - 1 ? psiCE : psiFull[j * nx + iW + f];
                v[f] = (b - a) / dx;
            }
            double sverdrup = 0;
            for (int q = iW; q <= iE; q++) sverdrup += forcing[j * nx + q] / beta * dx;
            int f0 = 0;
            while (f0 < nFaces && v[f0] == 0.0) f0++;
            double T = Double.NaN, zc = Double.NaN, ef = Double.NaN, vmax = Double.NaN, ret = Double.NaN;
            if (f0 < nFaces) {
                double sg = Math.signum(v[f0]);
                int f = f0;
                int fmax = f0;
                while (f < nFaces && Math.signum(v[f]) == sg) {
                    if (Math.abs(v[f]) > Math.abs(v[fmax])) fmax = f;
                    f++;
                }
                double end = f - 1 >= nFaces - 1 ? psiCE : psiFull[j * nx + iW - 1 + f];
                T = end - psiC;
                ret = psiCE - end;
                vmax = Math.abs(v[fmax]);
                if (f < nFaces) {
                    double xa = (f - 1 + 0.5) * dx, xb = (f + 0.5) * dx;
                    zc = xa + (xb - xa) * v[f - 1] / (v[f - 1] - v[f]);
                }
                double thr = vmax / Math.E;
                for (int q = fmax + 1; q < nFaces; q++) {
                    double cur = sg * v[q];
                    if (cur < thr) {
                        double prev = sg * v[q - 1];
                        double xa = (q - 1 + 0.5) * dx;
                        ef = xa + dx * (prev - thr) / (prev - cur);
                        break;
                    }
                }
            }
            Row row = new Row(j, op.grid.latDeg(j), T * 1e-6, zc * 1e-3, ef * 1e-3, vmax, vmax / depth,
                    sverdrup * 1e-6, ret * 1e-6, net * 1e-6);
            out.add(row);
            if (Double.isFinite(T) && (best == null || Math.abs(T * 1e-6) > Math.abs(best.boundaryCurrentTransportSv()))) best = row;
        }
        return new BoundaryCurrentDiagnostics(out, best);
    }

    private static double coast(double[] psiFull, int nx, int i, int j) {
        if (i < 0 || i >= nx) return 0.0;
        double v = psiFull[j * nx + i];
        return Double.isFinite(v) ? v : 0.0;
    }
}
