package org.gyreplan.solver.gyre;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.ProgressListener;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Contract every gyre solver configuration obeys (one subclass per configuration), on a spherical basin 60° wide
 * between 15° and 45° latitude in either hemisphere, 0.25° cells, uniform wind-stress curl.
 * <ul>
 *   <li>ψ = 0 on the coast (linear extrapolation of ψ to the eastern coast vanishes to second order);</li>
 *   <li>zero net meridional transport across every latitude row (closed basin, mass conservation);</li>
 *   <li>Sverdrup balance in the interior (Sverdrup 1947; CHECKS.md §7);</li>
 *   <li>western intensification in both hemispheres (Stommel 1948: β &gt; 0 in both);</li>
 *   <li>ψ changes sign exactly when the wind reverses (linearity).</li>
 * </ul>
 */
abstract class GyreSolverContract {
    static final double CURL = -1e-7;   // N m⁻³

    /** Adds the friction of this configuration to a builder. */
    abstract GyreProblem.Builder friction(GyreProblem.Builder b);

    /** Tolerance of the interior Sverdrup check, as a fraction of max |ψ_S| (stated per configuration). */
    abstract double interiorTolerance();

    static LonLatGrid basin(boolean north) {
        double d = 0.25;
        int nx = 240 + 2, ny = 120 + 2;
        double lat0 = (north ? 15 : -45) - d / 2;
        boolean[] ocean = new boolean[nx * ny];
        for (int j = 1; j < ny - 1; j++) for (int i = 1; i < nx - 1; i++) ocean[j * nx + i] = true;
        return new LonLatGrid(nx, ny, -70 - d / 2, lat0, d, d, PhysicalConstants.EARTH_RADIUS_MEAN, ocean);
    }

    static double maxAbs(ScalarField f) {
        return Math.max(Math.abs(f.range()[0]), Math.abs(f.range()[1]));
    }

    GyreSolution solve(boolean north, double curl) {
        LonLatGrid g = basin(north);
        ScalarField c = GyreTestSupport.curlLonLat(g, (lon, lat) -> curl);
        return GyreSolver.solve(friction(GyreProblem.on(g).curl(c).depth(1000)).build(), ProgressListener.NONE, CancelToken.none());
    }

    @Test
    void coastHoldsZeroAndEveryRowConservesMass() {
        for (boolean north : new boolean[] {true, false}) {
            GyreSolution s = solve(north, CURL);
            ScalarField psi = s.streamfunction();
            LonLatGrid g = psi.grid();
            double max = maxAbs(psi);
            for (int j = 1; j < g.ny() - 1; j++) {
                // eastern coast at the land cell centre i = nx − 1: 2ψ(nx−2) − ψ(nx−3) ≈ ψ(coast) = 0
                double extrap = 2 * psi.at(g.nx() - 2, j) - psi.at(g.nx() - 3, j);
                assertEquals(0.0, extrap, 0.01 * max, "row " + j);
                assertTrue(Double.isNaN(psi.at(0, j)) && Double.isNaN(psi.at(g.nx() - 1, j)), "land must be NaN");
            }
            assertEquals(0.0, s.diagnostics().maxNetTransportSv(), 1e-12 * max);
            assertEquals(g.ny() - 2, s.diagnostics().rows().size());
        }
    }

    @Test
    void interiorFollowsSverdrup() {
        for (boolean north : new boolean[] {true, false}) {
            GyreSolution s = solve(north, CURL);
            LonLatGrid g = s.streamfunction().grid();
            double maxS = maxAbs(s.sverdrup());
            double worst = 0;
            for (int j = g.ny() / 3; j < 2 * g.ny() / 3; j++) {
                for (int i = g.nx() / 3; i < 2 * g.nx() / 3; i++) {
                    worst = Math.max(worst, Math.abs(s.streamfunction().at(i, j) - s.sverdrup().at(i, j)));
                }
            }
            assertTrue(worst < interiorTolerance() * maxS, "interior departure from Sverdrup " + worst / maxS + " of max");
            // sanity: the Sverdrup transport of a row equals the cell sum of curl/(ρ₀β) Δx (CHECKS §7, D)
            var row = s.diagnostics().rows().get(g.ny() / 2);
            double beta = PhysicalConstants.DEFAULT.beta(row.latitudeDeg());
            double dx = g.dx(row.j());
            assertEquals(CURL / (1025 * beta) * dx * (g.nx() - 2) * 1e-6, row.interiorSverdrupSv(), 1e-9);
        }
    }

    @Test
    void westernIntensificationInBothHemispheres() {
        for (boolean north : new boolean[] {true, false}) {
            GyreSolution s = solve(north, CURL);
            LonLatGrid g = s.streamfunction().grid();
            int j = g.ny() / 2;
            double dx = g.dx(j);
            double west = 0, east = 0;
            for (int f = 0; f < g.nx() - 1; f++) {
                double a = f == 0 ? 0 : s.streamfunction().at(f, j), b = f + 1 == g.nx() - 1 ? 0 : s.streamfunction().at(f + 1, j);
                double v = Math.abs(b - a) * 1e6 / dx;
                if (f < g.nx() / 10) west = Math.max(west, v); else if (f > g.nx() / 2) east = Math.max(east, v);
            }
            assertTrue(west > 5 * east, (north ? "NH" : "SH") + ": western |V| " + west + " vs eastern " + east);
            // negative curl → southward interior → northward boundary current (positive transport)
            assertTrue(s.diagnostics().peakTransportSv() > 0);
            assertTrue(s.diagnostics().peak().zeroCrossingWidthKm() < 0.2 * 60 * 111 * Math.cos(Math.toRadians(30)));
        }
    }

    @Test
    void reversedWindReversesTheCirculation() {
        GyreSolution a = solve(true, CURL), b = solve(true, -CURL);
        double[] va = a.streamfunction().values(), vb = b.streamfunction().values();
        double max = maxAbs(a.streamfunction());
        for (int k = 0; k < va.length; k++) {
            if (Double.isNaN(va[k])) { assertTrue(Double.isNaN(vb[k])); continue; }
            assertEquals(-va[k], vb[k], 1e-8 * max);
        }
        assertEquals(-a.diagnostics().peakTransportSv(), b.diagnostics().peakTransportSv(), 1e-8 * max);
    }
}
