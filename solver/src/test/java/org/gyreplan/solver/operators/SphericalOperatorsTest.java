package org.gyreplan.solver.operators;

import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;
import org.junit.jupiter.api.Test;

import java.util.function.DoubleBinaryOperator;

import static org.junit.jupiter.api.Assertions.*;

/**
 * Curl, divergence and gradient on the sphere against analytic fields. The expected derivatives follow from the
 * spherical-coordinate formulas (e.g. Vallis 2017, Atmospheric and Oceanic Fluid Dynamics, §2.2), worked out by
 * hand below; the convergence tests assert the observed order of the second-order scheme, 2 ± 0.15, on interior
 * cells away from the edges.
 */
class SphericalOperatorsTest {
    private static final double R = 6.371e6;

    // Test fields (dimensionless), λ and φ in radians:
    //   u = cos λ sin 2φ,  v = sin 2λ cos φ,  p = sin 2λ sin 3φ
    private static double u(double lam, double phi) { return Math.cos(lam) * Math.sin(2 * phi); }
    private static double v(double lam, double phi) { return Math.sin(2 * lam) * Math.cos(phi); }
    private static double p(double lam, double phi) { return Math.sin(2 * lam) * Math.sin(3 * phi); }

    // curl = [∂v/∂λ − ∂(u cos φ)/∂φ]/(R cos φ) = [2 cos 2λ cos φ − cos λ (2 cos 2φ cos φ − sin 2φ sin φ)]/(R cos φ)
    private static double curlExact(double lam, double phi) {
        return (2 * Math.cos(2 * lam) * Math.cos(phi)
                - Math.cos(lam) * (2 * Math.cos(2 * phi) * Math.cos(phi) - Math.sin(2 * phi) * Math.sin(phi)))
                / (R * Math.cos(phi));
    }

    // div = [∂u/∂λ + ∂(v cos φ)/∂φ]/(R cos φ) = [−sin λ sin 2φ − sin 2λ sin 2φ]/(R cos φ)
    private static double divExact(double lam, double phi) {
        return (-Math.sin(lam) * Math.sin(2 * phi) - Math.sin(2 * lam) * Math.sin(2 * phi)) / (R * Math.cos(phi));
    }

    // ∂p/∂x = 2 cos 2λ sin 3φ /(R cos φ),  ∂p/∂y = 3 sin 2λ cos 3φ / R
    private static double dpdxExact(double lam, double phi) { return 2 * Math.cos(2 * lam) * Math.sin(3 * phi) / (R * Math.cos(phi)); }
    private static double dpdyExact(double lam, double phi) { return 3 * Math.sin(2 * lam) * Math.cos(3 * phi) / R; }

    private static LonLatGrid grid(double spacingDeg) {
        return LonLatGrid.covering(0, 60, 10, 60, spacingDeg, R);
    }

    private static double[] sample(LonLatGrid g, DoubleBinaryOperator fn) {
        double[] a = new double[g.size()];
        for (int j = 0; j < g.ny(); j++) {
            for (int i = 0; i < g.nx(); i++) {
                a[g.index(i, j)] = fn.applyAsDouble(Math.toRadians(g.lonDeg(i)), Math.toRadians(g.latDeg(j)));
            }
        }
        return a;
    }

    /** Max |numeric − exact| over cells with 10° ≤ λ ≤ 50°, 20° ≤ φ ≤ 50° (interior, away from the edges). */
    private static double interiorError(LonLatGrid g, double[] numeric, DoubleBinaryOperator exact) {
        double err = 0;
        for (int j = 0; j < g.ny(); j++) {
            for (int i = 0; i < g.nx(); i++) {
                double lon = g.lonDeg(i), lat = g.latDeg(j);
                if (lon < 10 || lon > 50 || lat < 20 || lat > 50) continue;
                double e = Math.abs(numeric[g.index(i, j)] - exact.applyAsDouble(Math.toRadians(lon), Math.toRadians(lat)));
                assertTrue(Double.isFinite(e), "interior value must be finite");
                err = Math.max(err, e);
            }
        }
        return err;
    }

    private static void assertOrderTwo(double[] errors, String what) {
        for (int k = 1; k < errors.length; k++) {
            double order = Math.log(errors[k - 1] / errors[k]) / Math.log(2);
            assertEquals(2.0, order, 0.15, what + ": observed order " + order + " between resolutions " + (k - 1) + " and " + k);
        }
    }

    @Test
    void curlConvergesAtSecondOrder() {
        double[] spacing = {2.0, 1.0, 0.5};
        double[] errors = new double[3];
        for (int r = 0; r < 3; r++) {
            LonLatGrid g = grid(spacing[r]);
            double[] out = new double[g.size()];
            SphericalOperators.curl(g, sample(g, SphericalOperatorsTest::u), sample(g, SphericalOperatorsTest::v), out);
            errors[r] = interiorError(g, out, SphericalOperatorsTest::curlExact);
        }
        assertOrderTwo(errors, "curl");
        assertTrue(errors[2] * R < 1e-3, "fine-grid curl error relative to the O(1/R) field: " + errors[2] * R);
    }

    @Test
    void divergenceConvergesAtSecondOrder() {
        double[] spacing = {2.0, 1.0, 0.5};
        double[] errors = new double[3];
        for (int r = 0; r < 3; r++) {
            LonLatGrid g = grid(spacing[r]);
            double[] out = new double[g.size()];
            SphericalOperators.divergence(g, sample(g, SphericalOperatorsTest::u), sample(g, SphericalOperatorsTest::v), out);
            errors[r] = interiorError(g, out, SphericalOperatorsTest::divExact);
        }
        assertOrderTwo(errors, "divergence");
    }

    @Test
    void gradientConvergesAtSecondOrder() {
        double[] spacing = {2.0, 1.0, 0.5};
        double[] ex = new double[3], ey = new double[3];
        for (int r = 0; r < 3; r++) {
            LonLatGrid g = grid(spacing[r]);
            double[] gx = new double[g.size()], gy = new double[g.size()];
            SphericalOperators.gradient(g, sample(g, SphericalOperatorsTest::p), gx, gy);
            ex[r] = interiorError(g, gx, SphericalOperatorsTest::dpdxExact);
            ey[r] = interiorError(g, gy, SphericalOperatorsTest::dpdyExact);
        }
        assertOrderTwo(ex, "eastward gradient");
        assertOrderTwo(ey, "northward gradient");
    }

    @Test
    void edgeCellsUseSecondOrderOneSidedStencils() {
        // Including the outermost rows and columns, the error still falls by about 4 per halving
        // (one-sided second-order stencils at the edges); order ≥ 1.7 asserted.
        double[] spacing = {2.0, 1.0, 0.5};
        double[] errors = new double[3];
        for (int r = 0; r < 3; r++) {
            LonLatGrid g = grid(spacing[r]);
            double[] out = new double[g.size()];
            SphericalOperators.curl(g, sample(g, SphericalOperatorsTest::u), sample(g, SphericalOperatorsTest::v), out);
            double[] exact = sample(g, SphericalOperatorsTest::curlExact);
            double e = 0;
            for (int k = 0; k < out.length; k++) e = Math.max(e, Math.abs(out[k] - exact[k]));
            errors[r] = e;
        }
        for (int k = 1; k < 3; k++) {
            double order = Math.log(errors[k - 1] / errors[k]) / Math.log(2);
            assertTrue(order > 1.7, "edge-inclusive order " + order);
        }
    }

    @Test
    void uniformEastwardFieldHasCurlTanPhiOverR() {
        // Analytic: u = τ constant, v = 0 ⇒ curl = −(τ/(R cos φ)) d(cos φ)/dφ = τ tan φ / R (not zero on the sphere).
        // The centred stencil gives τ tan φ sin(Δφ)/(Δφ R), i.e. rel. error Δφ²/6 = 5.1e-5 at 1°; tol rel 1e-4.
        LonLatGrid g = LonLatGrid.covering(-20, 20, -60, 60, 1.0, R);
        double tau = 0.1;
        double[] u = new double[g.size()], v = new double[g.size()], out = new double[g.size()];
        java.util.Arrays.fill(u, tau);
        SphericalOperators.curl(g, u, v, out);
        for (int j = 1; j < g.ny() - 1; j++) {
            double expected = tau * Math.tan(Math.toRadians(g.latDeg(j))) / R;
            for (int i = 0; i < g.nx(); i++) {
                assertEquals(expected, out[g.index(i, j)], Math.abs(expected) * 1e-4 + 1e-22, "row " + j);
            }
        }
        // a zero field has exactly zero curl everywhere, edges included
        java.util.Arrays.fill(u, 0.0);
        SphericalOperators.curl(g, u, v, out);
        for (double c : out) assertEquals(0.0, c, 0.0);
    }

    @Test
    void landStaysNaNAndOneSidedStencilIsExactForLinearFields() {
        // v = λ (radians) and u = 0: curl = 1/(R cos φ) exactly for centred and one-sided stencils alike.
        int nx = 7, ny = 5;
        boolean[] ocean = new boolean[nx * ny];
        java.util.Arrays.fill(ocean, true);
        ocean[2 * nx + 3] = false;                 // a land cell in the middle
        for (int j = 0; j < ny; j++) ocean[j * nx + 6] = false;   // a land column on the east
        LonLatGrid g = new LonLatGrid(nx, ny, 0.5, 40.5, 1, 1, R, ocean);
        double[] u = new double[g.size()], v = new double[g.size()], out = new double[g.size()];
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                int k = g.index(i, j);
                v[k] = g.isOcean(k) ? Math.toRadians(g.lonDeg(i)) : Double.NaN;
            }
        }
        SphericalOperators.curl(g, u, v, out);
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                int k = g.index(i, j);
                if (!g.isOcean(k)) {
                    assertTrue(Double.isNaN(out[k]), "land cell must stay NaN");
                    continue;
                }
                double expected = 1.0 / (R * Math.cos(Math.toRadians(g.latDeg(j))));
                assertEquals(expected, out[k], expected * 1e-12, "cell " + i + "," + j);
            }
        }
    }

    @Test
    void isolatedOceanCellHasNoStencil() {
        boolean[] ocean = {false, false, false, false, true, false, false, false, false};
        LonLatGrid g = new LonLatGrid(3, 3, 0.5, 30.5, 1, 1, R, ocean);
        double[] u = {0, 0, 0, 0, 1, 0, 0, 0, 0};
        double[] out = new double[9];
        SphericalOperators.curl(g, u, u.clone(), out);
        for (double c : out) assertTrue(Double.isNaN(c));
        // a NaN value in an ocean cell also acts as missing
        LonLatGrid all = new LonLatGrid(3, 1, 0.5, 30.5, 1, 1, R, null);
        double[] p = {1, Double.NaN, 3};
        double[] gx = new double[3], gy = new double[3];
        SphericalOperators.gradient(all, p, gx, gy);
        assertTrue(Double.isNaN(gx[1]));
        assertTrue(Double.isNaN(gx[0]) && Double.isNaN(gy[0]), "no east neighbour and a single row: no stencil");
    }

    @Test
    void globalGridIsPeriodicInLongitude() {
        LonLatGrid g = LonLatGrid.covering(0, 360, -30, 30, 2.0, R);
        double[] pp = sample(g, SphericalOperatorsTest::p);
        double[] gx = new double[g.size()], gy = new double[g.size()];
        SphericalOperators.gradient(g, pp, gx, gy);
        for (int j = 0; j < g.ny(); j++) {
            for (int i : new int[] {0, g.nx() - 1}) {
                double lam = Math.toRadians(g.lonDeg(i)), phi = Math.toRadians(g.latDeg(j));
                double exact = dpdxExact(lam, phi);
                // centred across the seam: same accuracy as the interior (2° spacing, rel 1e-3 of the field scale)
                assertEquals(exact, gx[g.index(i, j)], 2.0 / R * 1e-3, "seam column " + i);
            }
        }
    }

    @Test
    void fieldFormsCarryUnits() {
        LonLatGrid g = grid(2.0);
        VectorField f = new VectorField(new ScalarField(g, sample(g, SphericalOperatorsTest::u), "tx", "Pa", null),
                new ScalarField(g, sample(g, SphericalOperatorsTest::v), "ty", "Pa", null));
        assertEquals("Pa m-1", SphericalOperators.curl(f).units());
        assertEquals("Pa m-1", SphericalOperators.divergence(f).units());
        assertEquals("Pa m-1", SphericalOperators.gradient(f.eastward()).units());
    }
}
