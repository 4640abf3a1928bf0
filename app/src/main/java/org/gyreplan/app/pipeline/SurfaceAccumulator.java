package org.gyreplan.app.pipeline;

import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;
import org.gyreplan.solver.surface.SurfaceResponse;

/**
 * Running time means of the surface response, one pass, memory O(grid): wind speed, stress, stress curl, Ekman
 * transport and Ekman pumping. A cell's mean uses the steps where it was defined (the count is kept per cell), so
 * gaps in the wind record do not bias the mean toward zero. Plain sums in step order: reproducible.
 */
final class SurfaceAccumulator {
    private final LonLatGrid grid;
    private final double[] speed, tx, ty, curl, ue, ve, w;
    private final int[] nSpeed, nStress, nCurl, nEk, nW;
    private int steps;
    private long missingOceanValues;
    private int maxCutoffCells;
    private long dragOutOfRange;

    SurfaceAccumulator(LonLatGrid grid) {
        this.grid = grid;
        int n = grid.size();
        speed = new double[n]; tx = new double[n]; ty = new double[n]; curl = new double[n];
        ue = new double[n]; ve = new double[n]; w = new double[n];
        nSpeed = new int[n]; nStress = new int[n]; nCurl = new int[n]; nEk = new int[n]; nW = new int[n];
    }

    void add(VectorField wind, SurfaceResponse.Step s) {
        steps++;
        double[] u = wind == null ? null : wind.eastward().values(), v = wind == null ? null : wind.northward().values();
        double[] sx = s.stress().eastward().values(), sy = s.stress().northward().values();
        double[] c = s.stressCurl().values();
        double[] eu = s.ekmanTransport().eastward().values(), ev = s.ekmanTransport().northward().values();
        double[] pw = s.ekmanPumping().values();
        for (int k = 0; k < grid.size(); k++) {
            if (!grid.isOcean(k)) continue;
            if (u != null) {
                double sp = Math.hypot(u[k], v[k]);
                if (Double.isFinite(sp)) { speed[k] += sp; nSpeed[k]++; } else missingOceanValues++;
            }
            if (Double.isFinite(sx[k]) && Double.isFinite(sy[k])) { tx[k] += sx[k]; ty[k] += sy[k]; nStress[k]++; }
            if (Double.isFinite(c[k])) { curl[k] += c[k]; nCurl[k]++; }
            if (Double.isFinite(eu[k]) && Double.isFinite(ev[k])) { ue[k] += eu[k]; ve[k] += ev[k]; nEk[k]++; }
            if (Double.isFinite(pw[k])) { w[k] += pw[k]; nW[k]++; }
        }
        maxCutoffCells = Math.max(maxCutoffCells, s.cutoffCells());
        dragOutOfRange += s.dragOutOfRangeCells();
    }

    int steps() { return steps; }
    long missingOceanValues() { return missingOceanValues; }
    int cutoffCells() { return maxCutoffCells; }
    long dragOutOfRange() { return dragOutOfRange; }

    private ScalarField mean(double[] sum, int[] n, String name, String units, String longName) {
        double[] m = new double[grid.size()];
        for (int k = 0; k < m.length; k++) m[k] = n[k] > 0 ? sum[k] / n[k] : Double.NaN;
        return new ScalarField(grid, m, name, units, longName);
    }

    ScalarField meanSpeed() {
        return mean(speed, nSpeed, "wind_speed", "m s-1", "time mean of the 10 m wind speed");
    }

    VectorField meanStress() {
        return new VectorField(
                mean(tx, nStress, "surface_downward_eastward_stress", "Pa", "time mean eastward wind stress on the sea surface"),
                mean(ty, nStress, "surface_downward_northward_stress", "Pa", "time mean northward wind stress on the sea surface"));
    }

    ScalarField meanCurl() {
        return mean(curl, nCurl, "surface_stress_curl", "N m-3",
                "time mean of the vertical component of the wind-stress curl, positive counter-clockwise");
    }

    VectorField meanEkmanTransport() {
        return new VectorField(
                mean(ue, nEk, "eastward_ekman_transport", "m2 s-1", "time mean eastward Ekman transport per unit width"),
                mean(ve, nEk, "northward_ekman_transport", "m2 s-1", "time mean northward Ekman transport per unit width"));
    }

    ScalarField meanPumping() {
        return mean(w, nW, "ekman_pumping_velocity", "m s-1",
                "time mean Ekman pumping velocity at the base of the Ekman layer, positive upward (upwelling)");
    }
}
