package org.gyreplan.solver.gyre;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Sverdrup transport and streamfunction against CHECKS.md §7 (SV-01, SV-02; Stewart eq. 11.6, flag C; numbers D). */
class SverdrupTest {
    private static final PhysicalConstants PC = PhysicalConstants.DEFAULT;

    @Test
    void transportPerUnitWidth() {
        // SV-01: curl 1e-7 N/m³ at 30°N → M_y = 5044.2 kg m⁻¹ s⁻¹, V = 4.9212 m²/s (rel 1e-4)
        double v30 = Sverdrup.northwardTransport(1e-7, PC.rho0(), PC.beta(30));
        assertEquals(4.9212, v30, 4.9212 * 1e-4);
        assertEquals(5044.2, v30 * PC.rho0(), 5044.2 * 1e-4);
        // SV-02: 26.5°N → 4.7622 m²/s, 4881.3 kg m⁻¹ s⁻¹
        double v265 = Sverdrup.northwardTransport(1e-7, PC.rho0(), PC.beta(26.5));
        assertEquals(4.7622, v265, 4.7622 * 1e-4);
        assertEquals(4881.3, v265 * PC.rho0(), 4881.3 * 1e-4);
    }

    /** One ocean row at 30°N of n cells spanning exactly 5000 km, land around it. */
    static LonLatGrid row30(int n) {
        double dx = 5e6 / n;
        double dLon = Math.toDegrees(dx / (PC.earthRadius() * Math.cos(Math.toRadians(30))));
        int nx = n + 2, ny = 3;
        boolean[] ocean = new boolean[nx * ny];
        for (int i = 1; i <= n; i++) ocean[nx + i] = true;
        return new LonLatGrid(nx, ny, -40, 30 - 0.1, dLon, 0.1, PC.earthRadius(), ocean);
    }

    @Test
    void streamfunctionAcrossA5000KmSection() {
        // SV-01: over 5000 km, 24.61 Sv (rounded to 0.01 Sv); ψ = 0 on the eastern coast, ψ(west) = −∫V dx
        LonLatGrid g = row30(100);
        ScalarField curl = GyreTestSupport.curlLonLat(g, (lon, lat) -> 1e-7);
        ScalarField psi = Sverdrup.streamfunction(curl, Geometry.sphere(), PC);
        assertEquals("Sv", psi.units());
        assertEquals(-24.61, psi.at(1, 1), 0.005);
        // eastern ocean cell: one cell width from the coast, −V Δx
        assertEquals(-4.9212 * 5e4 * 1e-6, psi.at(100, 1), 1e-4);
        // monotone westward accumulation, NaN on land
        for (int i = 1; i < 100; i++) assertTrue(psi.at(i, 1) < psi.at(i + 1, 1));
        assertTrue(Double.isNaN(psi.at(0, 1)) && Double.isNaN(psi.at(50, 0)));
    }

    @Test
    void segmentsIntegrateFromTheirOwnEasternCoast() {
        LonLatGrid g = row30(100);
        boolean[] m = g.oceanMask();
        m[g.index(60, 1)] = false;              // a land cell splits the row at i = 60
        g = g.withOcean(m);
        ScalarField curl = GyreTestSupport.curlLonLat(g, (lon, lat) -> 1e-7);
        ScalarField psi = Sverdrup.streamfunction(curl, Geometry.sphere(), PC);
        double vdx = 4.9212 * 5e4 * 1e-6;
        assertEquals(-vdx, psi.at(59, 1), 1e-4);      // restarts at the western segment's own eastern coast
        assertEquals(-vdx, psi.at(100, 1), 1e-4);
        assertEquals(-59 * vdx, psi.at(1, 1), 1e-3);
    }

    @Test
    void undefinedCurlOnOceanIsRefusedWithItsCell() {
        LonLatGrid g = row30(10);
        ScalarField curl = GyreTestSupport.curlLonLat(g, (lon, lat) -> 1e-7);
        curl.values()[g.index(4, 1)] = Double.NaN;
        GyreException e = org.junit.jupiter.api.Assertions.assertThrows(GyreException.class,
                () -> Sverdrup.streamfunction(curl, Geometry.sphere(), PC));
        assertEquals(GyreException.Reason.BAD_FORCING, e.reason());
        assertTrue(e.getMessage().contains("(4,1)"), e.getMessage());
    }

    @Test
    void streamfunctionFromStressNeedsNoFriction() {
        // τ_x = −τ₀ y/L on a β-plane row set-up → curl τ = τ₀/L; compare with the curl-based integration (rel 1e-12)
        LonLatGrid g = row30(50);
        double[] tx = new double[g.size()], ty = new double[g.size()];
        double dy = g.radius() * Math.toRadians(g.dLatDeg());
        for (int j = 0; j < g.ny(); j++) for (int i = 0; i < g.nx(); i++) tx[g.index(i, j)] = -0.1 * (j * dy) / 1e6;
        var tau = new org.gyreplan.solver.grid.VectorField(new ScalarField(g, tx, "tauu", "Pa", "x"), new ScalarField(g, ty, "tauv", "Pa", "y"));
        Geometry bp = Geometry.betaPlane(30);
        ScalarField fromStress = Sverdrup.streamfunction(tau, bp, PC);
        ScalarField fromCurl = Sverdrup.streamfunction(GyreTestSupport.curlLonLat(g, (lon, lat) -> 0.1 / 1e6), bp, PC);
        for (int i = 1; i <= 50; i++) assertEquals(fromCurl.at(i, 1), fromStress.at(i, 1), 1e-9 * Math.abs(fromCurl.at(1, 1)));
        assertTrue(fromStress.at(1, 1) < 0);       // positive curl → northward interior → ψ decreases westward
    }
}
